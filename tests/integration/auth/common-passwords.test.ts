// The commonest passwords are refused wherever a password is chosen, with a message that says
// what to do (OWASP ASVS 4.0 §2.1.7; NIST SP 800-63B §5.1.1.2). The list is the `passwords-common`
// dictionary of @zxcvbn-ts/language-common (about 49,000 passwords most seen in breach corpora).
import { describe, expect, it } from "vitest";
import { DEMO_PASSWORD } from "@/db/seed/demo-data";
import { env } from "@/lib/env";
import { COMMON_PASSWORD_MESSAGE, isCommonPassword } from "@/lib/password-policy";
import { callAuth, peerFor } from "../../helpers/auth-http";
import { makeUser, TEST_PASSWORD, unique } from "../../helpers/factories";
import { waitForMail } from "../../helpers/mailbox";

const refusal = { code: "PASSWORD_TOO_COMMON", message: COMMON_PASSWORD_MESSAGE };

describe("common passwords", () => {
  it("the message says what to do instead", () => {
    expect(COMMON_PASSWORD_MESSAGE).toBe("This password is one of the most common ones; pick a longer phrase of your own.");
  });

  it("knows the commonest ones, in any case, and not the demo or test passwords", () => {
    for (const p of ["password123", "qwertyuiop", "1234567890", "Iloveyou123", "PASSWORDPASSWORD"]) expect(isCommonPassword(p), p).toBe(true);
    for (const p of [DEMO_PASSWORD, TEST_PASSWORD, "my-own-quilting-phrase"]) expect(isCommonPassword(p), p).toBe(false);
  });

  it("refuses one on sign-up and creates no account", async () => {
    const email = `${unique("common")}@example.test`;
    const peer = peerFor(0x400);
    const res = await callAuth("/sign-up/email", { peer, body: { name: "Cora Common", email, password: "password123" } });
    expect(res.status).toBe(400);
    expect(await res.json()).toMatchObject(refusal);
    const again = await callAuth("/sign-up/email", { peer, body: { name: "Cora Common", email, password: "a-phrase-of-my-own" } });
    expect(again.status).toBe(200);
  });

  it("refuses one when a password is reset", async () => {
    const person = await makeUser();
    const peer = peerFor(0x401);
    await callAuth("/request-password-reset", { peer, body: { email: person.email, redirectTo: "/reset-password" } });
    const mail = await waitForMail(env.MAIL_WEB_URL, { to: person.email, subjectIncludes: "Reset your", timeoutMs: 10_000 });
    const link = new URL(mail.links.find((l) => l.includes("/api/auth/reset-password/"))!);
    const landing = await callAuth(`${link.pathname.replace("/api/auth", "")}${link.search}`, { peer });
    const token = new URL(landing.headers.get("location")!, env.APP_URL).searchParams.get("token");

    const res = await callAuth("/reset-password", { peer, body: { newPassword: "qwertyuiop", token } });
    expect(res.status).toBe(400);
    expect(await res.json()).toMatchObject(refusal);
    expect((await callAuth("/reset-password", { peer, body: { newPassword: "a-phrase-of-my-own", token } })).status).toBe(200);
  });

  it("refuses one when a signed-in person changes their password", async () => {
    const person = await makeUser();
    const peer = peerFor(0x402);
    const body = { currentPassword: TEST_PASSWORD, newPassword: "1234567890" };
    const res = await callAuth("/change-password", { peer, cookie: person.cookie, body });
    expect(res.status).toBe(400);
    expect(await res.json()).toMatchObject(refusal);
    const ok = await callAuth("/change-password", { peer, cookie: person.cookie, body: { ...body, newPassword: "a-phrase-of-my-own" } });
    expect(ok.status).toBe(200);
  });

  it("leaves a short password to the length rule", async () => {
    const res = await callAuth("/sign-up/email", { peer: peerFor(0x403), body: { name: "Sid Short", email: `${unique("short")}@example.test`, password: "password" } });
    expect(res.status).toBe(400);
    expect(((await res.json()) as { code: string }).code).toBe("PASSWORD_TOO_SHORT");
  });
});
