// Failed sign-ins are limited per e-mail address whatever address they come from, and answered the
// same for an account that exists and one that does not (OWASP ASVS 4.0 §2.2.1 anti-automation;
// OWASP Authentication Cheat Sheet: no account enumeration). Each attempt below comes from a new
// socket address, so the per-address limit never applies.
import { describe, expect, it } from "vitest";
import { env } from "@/lib/env";
import { callAuth, peerFor } from "../../helpers/auth-http";
import { makeUser, TEST_PASSWORD, unique } from "../../helpers/factories";

const limit = env.AUTH_ACCOUNT_FAILURE_LIMIT;
let nextPeer = 0x100;
const signIn = (email: string, password: string) =>
  callAuth("/sign-in/email", { peer: peerFor(nextPeer++), body: { email, password } });

async function failTimes(email: string, times: number): Promise<number[]> {
  const statuses: number[] = [];
  for (let i = 0; i < times; i++) statuses.push((await signIn(email, `wrong-guess-number-${i}`)).status);
  return statuses;
}

// Every attempt hashes a password (scrypt), so these take a while on a busy machine.
describe("failed sign-ins per account", { timeout: 90_000 }, () => {
  it("locks an address after the limit of failures from many addresses, the right password included", async () => {
    const person = await makeUser();
    expect(await failTimes(person.email, limit)).toEqual(Array(limit).fill(401));

    const locked = await signIn(person.email, TEST_PASSWORD);
    expect(locked.status).toBe(429);
    const body = (await locked.json()) as { code: string; message: string };
    expect(body.code).toBe("TOO_MANY_FAILED_SIGN_INS");
    expect(body.message).toBe(
      `Too many failed sign-ins for this e-mail address. Try again in ${env.AUTH_ACCOUNT_LOCK_MINUTES} minutes, or reset your password.`,
    );
    // RFC 9110 §10.2.3: seconds until the lock ends.
    const retryAfter = Number(locked.headers.get("retry-after"));
    expect(retryAfter).toBeGreaterThan(0);
    expect(retryAfter).toBeLessThanOrEqual(env.AUTH_ACCOUNT_LOCK_MINUTES * 60);
  });

  it("answers an address with no account exactly like one with an account", async () => {
    const person = await makeUser();
    const nobody = `${unique("nobody")}@example.test`;
    const known = await failTimes(person.email, limit + 1);
    const unknown = await failTimes(nobody, limit + 1);
    expect(unknown).toEqual(known);
    expect(known.at(-1)).toBe(429);
    const a = (await (await signIn(person.email, "one-more-guess-here")).json()) as { code: string; message: string };
    const b = (await (await signIn(nobody, "one-more-guess-here")).json()) as { code: string; message: string };
    expect(b).toEqual(a);
  });

  it("counts only failures: a successful sign-in starts the count again", async () => {
    const person = await makeUser();
    for (let round = 0; round < 2; round++) {
      expect(await failTimes(person.email, limit - 1)).toEqual(Array(limit - 1).fill(401));
      expect((await signIn(person.email, TEST_PASSWORD)).status).toBe(200);
    }
    // Many successful sign-ins in a row, as the browser tests do, never lock anyone out.
    for (let i = 0; i < limit + 1; i++) expect((await signIn(person.email, TEST_PASSWORD)).status).toBe(200);
  });

  it("does not count a right password refused for an unconfirmed address", async () => {
    const email = `${unique("unconfirmed")}@example.test`;
    const password = "my-own-quilting-phrase";
    const up = await callAuth("/sign-up/email", { peer: peerFor(nextPeer++), body: { name: "Una Confirmed", email, password } });
    expect(up.status).toBe(200);
    for (let i = 0; i < limit + 2; i++) expect((await signIn(email, password)).status).toBe(403);
  });
});
