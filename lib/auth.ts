// The better-auth instance: e-mail and password with verification and reset, sessions and rate
// limits in PostgreSQL, and the admin plugin for platform administrators. Requests come in
// through `handleAuthRequest`, which fixes the client's address first (lib/client-address.ts).
import "server-only";
import { betterAuth } from "better-auth";
import { drizzleAdapter } from "better-auth/adapters/drizzle";
import { nextCookies } from "better-auth/next-js";
import { admin } from "better-auth/plugins";
import { db } from "@/db/client";
import * as schema from "@/db/schema";
import { CLIENT_ADDRESS_HEADER, withClientAddress } from "@/lib/client-address";
import { env } from "@/lib/env";
import { linkMail, sendMail, type Mail } from "@/lib/mail";
import { trustedOrigins } from "@/lib/origins";
import { passwordPolicy } from "@/lib/password-policy";
import { signInThrottle } from "@/lib/sign-in-throttle";

const MIN_PASSWORD_LENGTH = 10;

// Reset and verification mails leave after the answer, never inside the request: awaiting the
// SMTP send made a known address answer several times slower than an unknown one, which told
// anyone who timed it which addresses have accounts (OWASP Forgot Password Cheat Sheet: answer
// in the same way and the same time whether or not the account exists). The app runs as one
// long-lived Node server, so the send goes on after the response; a failure is logged.
function sendInBackground(mail: Mail, what: string): void {
  void sendMail(mail).catch((error: unknown) => {
    console.error(`[auth] the ${what} mail to ${mail.to} could not be sent`, error);
  });
}

export const auth = betterAuth({
  appName: "Ribbonry",
  baseURL: env.APP_URL,
  secret: env.BETTER_AUTH_SECRET,
  trustedOrigins: trustedOrigins(),
  database: drizzleAdapter(db, { provider: "pg", schema }),
  telemetry: { enabled: false },
  // Served over HTTPS: cookies carry `Secure` (OWASP ASVS 4.0 V3.4.1).
  advanced: {
    useSecureCookies: env.APP_URL.startsWith("https:"),
    // Only the address handleAuthRequest worked out; never a header a client can set itself.
    ipAddress: { ipAddressHeaders: [CLIENT_ADDRESS_HEADER] },
  },
  session: {
    // No signed copy of the session in a cookie: with one, a session ended by sign-out, a
    // password reset or an administrator still read as valid for the cache's lifetime to anyone
    // holding the old cookies (OWASP ASVS 4.0 §3.3.1: logout invalidates the session at once).
    // Every session check is a database lookup by the token's primary key instead.
    cookieCache: { enabled: false },
  },
  emailAndPassword: {
    enabled: true,
    requireEmailVerification: true,
    minPasswordLength: MIN_PASSWORD_LENGTH,
    revokeSessionsOnPasswordReset: true,
    sendResetPassword: async ({ user, url }) => {
      const mail = linkMail({
        heading: "Reset your password",
        lines: [
          `Someone (we hope you) asked to reset the password for ${user.email}.`,
          "The link works once and expires in an hour. If you did not ask, ignore this message.",
        ],
        linkText: "Choose a new password",
        url,
      });
      sendInBackground({ to: user.email, subject: "Reset your Ribbonry password", ...mail }, "password reset");
    },
  },
  emailVerification: {
    sendOnSignUp: true,
    autoSignInAfterVerification: true,
    sendVerificationEmail: async ({ user, url }) => {
      const mail = linkMail({
        heading: `Welcome to Ribbonry, ${user.name}`,
        lines: ["Please confirm that this address is yours so we can send you show news and results."],
        linkText: "Confirm my address",
        url,
      });
      const subject = "Confirm your e-mail address for Ribbonry";
      sendInBackground({ to: user.email, subject, ...mail }, "address confirmation");
    },
  },
  // Per client address (see advanced.ipAddress); failed sign-ins per account are signInThrottle's.
  rateLimit: {
    enabled: true,
    storage: "database",
    window: 60,
    max: 200,
    customRules: {
      "/sign-in/email": { window: 60, max: env.AUTH_SIGN_IN_LIMIT_PER_MINUTE },
      "/sign-up/email": { window: 60, max: 10 },
      "/request-password-reset": { window: 60, max: 5 },
    },
  },
  plugins: [admin(), passwordPolicy({ minLength: MIN_PASSWORD_LENGTH }), signInThrottle(), nextCookies()],
});

/** Every request to /api/auth: the client's address from the socket or trusted proxies, then better-auth. */
export function handleAuthRequest(request: Request): Promise<Response> {
  return auth.handler(withClientAddress(request, env.TRUSTED_PROXY_HOPS));
}

export type Session = typeof auth.$Infer.Session;
