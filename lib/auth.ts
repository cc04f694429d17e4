// The better-auth instance: e-mail and password with verification and reset, sessions and rate
// limits in PostgreSQL, and the admin plugin for platform administrators.
import "server-only";
import { betterAuth } from "better-auth";
import { drizzleAdapter } from "better-auth/adapters/drizzle";
import { nextCookies } from "better-auth/next-js";
import { admin } from "better-auth/plugins";
import { db } from "@/db/client";
import * as schema from "@/db/schema";
import { env } from "@/lib/env";
import { linkMail, sendMail } from "@/lib/mail";
import { trustedOrigins } from "@/lib/origins";

export const auth = betterAuth({
  appName: "Ribbonry",
  baseURL: env.APP_URL,
  secret: env.BETTER_AUTH_SECRET,
  trustedOrigins: trustedOrigins(),
  database: drizzleAdapter(db, { provider: "pg", schema }),
  telemetry: { enabled: false },
  // Served over HTTPS: cookies carry `Secure` (OWASP ASVS 4.0 V3.4.1).
  advanced: { useSecureCookies: env.APP_URL.startsWith("https:") },
  session: {
    // A signed copy of the session in a cookie spares a database lookup on every request. The
    // price: a session revoked elsewhere (password reset, sign-out on another device) still
    // reads as valid here for up to a minute.
    cookieCache: { enabled: true, maxAge: 60 },
  },
  emailAndPassword: {
    enabled: true,
    requireEmailVerification: true,
    minPasswordLength: 10,
    revokeSessionsOnPasswordReset: true,
    sendResetPassword: async ({ user, url }) => {
      await sendMail({
        to: user.email,
        subject: "Reset your Ribbonry password",
        ...linkMail({
          heading: "Reset your password",
          lines: [
            `Someone (we hope you) asked to reset the password for ${user.email}.`,
            "The link works once and expires in an hour. If you did not ask, ignore this message.",
          ],
          linkText: "Choose a new password",
          url,
        }),
      });
    },
  },
  emailVerification: {
    sendOnSignUp: true,
    autoSignInAfterVerification: true,
    sendVerificationEmail: async ({ user, url }) => {
      await sendMail({
        to: user.email,
        subject: "Confirm your e-mail address for Ribbonry",
        ...linkMail({
          heading: `Welcome to Ribbonry, ${user.name}`,
          lines: ["Please confirm that this address is yours so we can send you show news and results."],
          linkText: "Confirm my address",
          url,
        }),
      });
    },
  },
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
  plugins: [admin(), nextCookies()],
});

export type Session = typeof auth.$Infer.Session;
