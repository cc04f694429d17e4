// Reset and confirmation mails are sent after the answer, not inside the request, so a known
// address is not told apart from an unknown one by how long the answer takes (OWASP Forgot
// Password Cheat Sheet: same answer, same time, whether or not the account exists). Proved by
// structure, not by timing: a send that never finishes must not hold the answer back.
import { afterEach, describe, expect, it, vi } from "vitest";
import { env } from "@/lib/env";
import type { Mail } from "@/lib/mail";
import { callAuth, peerFor } from "../../helpers/auth-http";
import { makeUser, unique } from "../../helpers/factories";
import { waitForMail } from "../../helpers/mailbox";

const smtp = vi.hoisted(() => ({
  hang: new Set<string>(), // sends to these addresses never finish
  fail: new Set<string>(), // sends to these addresses fail
  started: [] as { to: string; subject: string }[],
}));

vi.mock("@/lib/mail", async (importOriginal) => {
  const real = await importOriginal<typeof import("@/lib/mail")>();
  return {
    ...real,
    sendMail: (mail: Mail) => {
      smtp.started.push({ to: mail.to, subject: mail.subject });
      if (smtp.hang.has(mail.to)) return new Promise<void>(() => {});
      if (smtp.fail.has(mail.to)) return Promise.reject(new Error("the relay said no"));
      return real.sendMail(mail);
    },
  };
});

const STILL_WAITING = "still waiting for the answer";
// A generous guard so a request that waits for the never-ending send fails the test instead of
// hanging it; an answer that does not wait for the send comes back far sooner.
const answerOrGiveUp = (res: Promise<Response>) =>
  Promise.race([res, new Promise<string>((resolve) => setTimeout(() => resolve(STILL_WAITING), 10_000))]);

afterEach(() => vi.restoreAllMocks());

describe("mails sent by sign-up and password reset", () => {
  it("answers a reset request for a known address while the mail is still being sent", async () => {
    const person = await makeUser();
    smtp.hang.add(person.email);
    const res = await answerOrGiveUp(
      callAuth("/request-password-reset", { peer: peerFor(0x300), body: { email: person.email, redirectTo: "/reset-password" } }),
    );
    expect(res).not.toBe(STILL_WAITING);
    expect((res as Response).status).toBe(200);
    expect(smtp.started).toContainEqual({ to: person.email, subject: "Reset your Ribbonry password" });
  });

  it("still delivers the reset mail", async () => {
    const person = await makeUser();
    const res = await callAuth("/request-password-reset", { peer: peerFor(0x301), body: { email: person.email, redirectTo: "/reset-password" } });
    expect(res.status).toBe(200);
    const mail = await waitForMail(env.MAIL_WEB_URL, { to: person.email, subjectIncludes: "Reset your", timeoutMs: 10_000 });
    expect(mail.links.some((l) => l.includes("/api/auth/reset-password/"))).toBe(true);
  });

  it("answers a sign-up while the confirmation mail is still being sent", async () => {
    const email = `${unique("slowmail")}@example.test`;
    smtp.hang.add(email);
    const res = await answerOrGiveUp(
      callAuth("/sign-up/email", { peer: peerFor(0x302), body: { name: "Sal Slowmail", email, password: "my-own-quilting-phrase" } }),
    );
    expect(res).not.toBe(STILL_WAITING);
    expect((res as Response).status).toBe(200);
    expect(smtp.started).toContainEqual({ to: email, subject: "Confirm your e-mail address for Ribbonry" });
  });

  it("logs a mail that could not be sent", async () => {
    const person = await makeUser();
    smtp.fail.add(person.email);
    const logged = vi.spyOn(console, "error").mockImplementation(() => {});
    const res = await callAuth("/request-password-reset", { peer: peerFor(0x303), body: { email: person.email, redirectTo: "/reset-password" } });
    expect(res.status).toBe(200);
    await vi.waitFor(() => expect(logged).toHaveBeenCalledWith(expect.stringContaining(person.email), expect.any(Error)));
  });
});
