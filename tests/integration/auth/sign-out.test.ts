// Sign-out ends the session at once: the cookies it was using are refused straight away, the
// session token and any cached copy of the session alike (OWASP ASVS 4.0 §3.3.1).
import { describe, expect, it } from "vitest";
import { getViewer } from "@/lib/session";
import { callAuth, cookiesFrom, peerFor } from "../../helpers/auth-http";
import { makeUser, TEST_PASSWORD } from "../../helpers/factories";

const merge = (...cookieHeaders: string[]) => {
  const jar = new Map<string, string>();
  for (const header of cookieHeaders) {
    for (const pair of header.split("; ").filter(Boolean)) jar.set(pair.split("=")[0]!, pair);
  }
  return [...jar.values()].join("; ");
};

describe("sign-out", () => {
  it("refuses the old cookies at once, session token and cached session alike", async () => {
    const person = await makeUser();
    const peer = peerFor(0x200);
    const signIn = await callAuth("/sign-in/email", { peer, body: { email: person.email, password: TEST_PASSWORD } });
    expect(signIn.status).toBe(200);
    let cookie = cookiesFrom(signIn);
    // Reading the session once more picks up any cookie the server adds on a read.
    cookie = merge(cookie, cookiesFrom(await callAuth("/get-session", { peer, cookie })));
    expect((await getViewer(new Headers({ cookie })))?.email).toBe(person.email);

    const signOut = await callAuth("/sign-out", { peer, cookie, method: "POST", body: {} });
    expect(signOut.status).toBe(200);

    // Someone still holding the old cookies (a copied cookie, another tab) is signed out too.
    expect(await getViewer(new Headers({ cookie }))).toBeNull();
    const session = await callAuth("/get-session", { peer, cookie });
    expect(await session.json()).toBeNull();
  });
});
