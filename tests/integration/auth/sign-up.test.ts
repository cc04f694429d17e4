// The sign-in journey through better-auth's real HTTP handler, with mail read back from the
// local catcher: sign up → verification mail → verify → sign in; wrong password; rate limit;
// forgotten password → reset mail → new password.
import { describe, expect, it } from "vitest";
import { env } from "@/lib/env";
import { callAuth, peerFor as ipFor } from "../../helpers/auth-http";
import { unique } from "../../helpers/factories";
import { waitForMail } from "../../helpers/mailbox";

// Each test's requests come from a socket address of its own (see tests/helpers/auth-http.ts).
const call = (pathAndQuery: string, init: { body?: unknown; ip: string; cookie?: string; method?: string; forwardedFor?: string }) =>
  callAuth(pathAndQuery, { ...init, peer: init.ip });

const linkWith = (links: string[], part: string) => {
  const link = links.find((l) => l.includes(part));
  if (!link) throw new Error(`no link containing ${part} in ${links.join(", ")}`);
  return new URL(link);
};

describe("sign-up, verification and sign-in", () => {
  it("verifies the address from the e-mail, then signs in", async () => {
    const email = `${unique("newcomer")}@example.test`;
    const password = "a-long-enough-password";
    const ip = ipFor(10);
    const signUp = await call("/sign-up/email", { ip, body: { name: "Nell Newcomer", email, password, callbackURL: "/verified" } });
    expect(signUp.status).toBe(200);

    // Not verified yet: sign-in is refused with a reason the form can show.
    const early = await call("/sign-in/email", { ip, body: { email, password } });
    expect(early.status).toBe(403);
    expect(((await early.json()) as { code: string }).code).toBe("EMAIL_NOT_VERIFIED");

    const mail = await waitForMail(env.MAIL_WEB_URL, { to: email, subjectIncludes: "Confirm your e-mail", timeoutMs: 10_000 });
    expect(mail.text).toContain("Nell Newcomer");
    expect(mail.html).toContain("Confirm my address");
    const verifyUrl = linkWith(mail.links, "/api/auth/verify-email");
    expect(verifyUrl.origin).toBe(new URL(env.APP_URL).origin);

    const verified = await call(`/verify-email${verifyUrl.search}`, { ip });
    expect(verified.status).toBe(302);
    expect(verified.headers.get("location")).toContain("/verified");

    const signIn = await call("/sign-in/email", { ip, body: { email, password } });
    expect(signIn.status).toBe(200);
    const body = (await signIn.json()) as { user: { email: string; emailVerified: boolean } };
    expect(body.user).toMatchObject({ email, emailVerified: true });
  });

  it("says plainly when the password is wrong", async () => {
    const email = `${unique("forgetful")}@example.test`;
    const ip = ipFor(11);
    await call("/sign-up/email", { ip, body: { name: "Fay Forgetful", email, password: "the-right-password" } });
    const res = await call("/sign-in/email", { ip, body: { email, password: "not-the-password" } });
    expect(res.status).toBe(401);
    const body = (await res.json()) as { code: string; message: string };
    expect(body.code).toBe("INVALID_EMAIL_OR_PASSWORD");
    expect(body.message).toMatch(/invalid email or password/i);
  });

  it("refuses a password shorter than 10 characters", async () => {
    const res = await call("/sign-up/email", { ip: ipFor(12), body: { name: "Short", email: `${unique("short")}@example.test`, password: "short" } });
    expect(res.status).toBe(400);
    expect(((await res.json()) as { code: string }).code).toBe("PASSWORD_TOO_SHORT");
  });

  it("rate-limits repeated sign-in attempts from one address", async () => {
    const ip = ipFor(13);
    const limit = env.AUTH_SIGN_IN_LIMIT_PER_MINUTE;
    const statuses: number[] = [];
    // A new address each time, so the per-account lock (account-throttle.test.ts) stays out of it.
    const nobody = () => `${unique("nobody")}@example.test`;
    for (let i = 0; i < limit + 2; i++) {
      const res = await call("/sign-in/email", { ip, body: { email: nobody(), password: "whatever-it-is" } });
      statuses.push(res.status);
    }
    expect(statuses.slice(0, limit).every((s) => s === 401)).toBe(true);
    expect(statuses.slice(limit)).toEqual([429, 429]);
    // Another address is not affected.
    const other = await call("/sign-in/email", { ip: ipFor(14), body: { email: nobody(), password: "whatever-it-is" } });
    expect(other.status).toBe(401);
  });

  it("keeps counting when each request claims a different X-Forwarded-For", async () => {
    // A client writes X-Forwarded-For itself; with no proxy configured (TRUSTED_PROXY_HOPS=0) the
    // socket's address decides the bucket (OWASP ASVS 4.0 §2.2.1, anti-automation).
    const ip = ipFor(16);
    const limit = env.AUTH_SIGN_IN_LIMIT_PER_MINUTE;
    const statuses: number[] = [];
    for (let i = 0; i < limit + 2; i++) {
      const forwardedFor = `2001:db8:${(0xa000 + i).toString(16)}::${i + 1}`; // a new "client" every time
      const email = `${unique("nobody")}@example.test`; // and a new account, so only the address limit applies
      const res = await call("/sign-in/email", { ip, forwardedFor, body: { email, password: "whatever-it-is" } });
      statuses.push(res.status);
    }
    expect(statuses.slice(0, limit).every((s) => s === 401)).toBe(true);
    expect(statuses.slice(limit)).toEqual([429, 429]);
  });

  it("resets a forgotten password from the e-mailed link", async () => {
    const email = `${unique("reset")}@example.test`;
    const ip = ipFor(15);
    await call("/sign-up/email", { ip, body: { name: "Rita Reset", email, password: "the-old-password" } });
    const confirm = await waitForMail(env.MAIL_WEB_URL, { to: email, subjectIncludes: "Confirm", timeoutMs: 10_000 });
    await call(`/verify-email${linkWith(confirm.links, "/verify-email").search}`, { ip });

    const asked = await call("/request-password-reset", { ip, body: { email, redirectTo: "/reset-password" } });
    expect(asked.status).toBe(200);
    const mail = await waitForMail(env.MAIL_WEB_URL, { to: email, subjectIncludes: "Reset your", timeoutMs: 10_000 });
    const link = linkWith(mail.links, "/api/auth/reset-password/");
    const landing = await call(`${link.pathname.replace("/api/auth", "")}${link.search}`, { ip });
    expect(landing.status).toBe(302);
    const token = new URL(landing.headers.get("location")!, env.APP_URL).searchParams.get("token");
    expect(token).toBeTruthy();

    const reset = await call("/reset-password", { ip, body: { newPassword: "the-new-password", token } });
    expect(reset.status).toBe(200);
    expect((await call("/sign-in/email", { ip, body: { email, password: "the-old-password" } })).status).toBe(401);
    expect((await call("/sign-in/email", { ip, body: { email, password: "the-new-password" } })).status).toBe(200);
  });
});
