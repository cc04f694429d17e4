// Cookies and links signed with a secret someone could know are refused: the old published
// default BETTER_AUTH_SECRET and guessed ones. The forgeries follow better-auth 1.7's own formats,
// written here by hand from its source (node_modules/better-call/dist/crypto.mjs: a signed cookie is
// `value.base64(HMAC-SHA256)`; node_modules/better-auth/dist/cookies/index.mjs: the "compact"
// session_data cookie is base64url JSON { session, expiresAt, signature = base64url(HMAC-SHA256) };
// node_modules/better-auth/dist/api/routes/email-verification.mjs: an HS256 JWT { email }).
// A control signed with the configured secret shows each forgery would otherwise be accepted.
import { createHmac, randomUUID } from "node:crypto";
import { eq } from "drizzle-orm";
import { describe, expect, it } from "vitest";
import { GET as getMe } from "@/app/api/me/route";
import { db } from "@/db/client";
import { user } from "@/db/schema";
import { auth } from "@/lib/auth";
import { env } from "@/lib/env";
import { getViewer } from "@/lib/session";
import { makeUser, unique } from "../../helpers/factories";

const OLD_DEFAULT = "dev-only-secret-change-me-0123456789abcdef";
const GUESSES = ["better-auth-secret-12345678901234567890", "change-me-change-me-change-me-change-me", "secret"];
// APP_URL is plain http here, so better-auth uses the names without the __Secure- prefix.
const TOKEN_COOKIE = "better-auth.session_token";
const DATA_COOKIE = "better-auth.session_data";

const hmac = (secret: string, value: string) => createHmac("sha256", secret).update(value, "utf8");

function signedCookieValue(value: string, secret: string): string {
  return encodeURIComponent(`${value}.${hmac(secret, value).digest("base64")}`);
}

/** The cookie-cache cookie claiming `who` is a platform administrator. */
function forgedSessionData(secret: string, token: string, who: { id: string; email: string; name: string }): string {
  const now = new Date();
  const inAWeek = new Date(now.getTime() + 7 * 86_400_000);
  const sessionData = {
    session: { id: randomUUID(), token, userId: who.id, expiresAt: inAWeek, createdAt: now, updatedAt: now, ipAddress: null, userAgent: null },
    user: { id: who.id, email: who.email, name: who.name, emailVerified: true, image: null, createdAt: now, updatedAt: now, role: "admin", banned: false },
    updatedAt: now.getTime(),
    version: "1",
  };
  const expiresAt = now.getTime() + 60_000;
  const signature = hmac(secret, JSON.stringify({ ...sessionData, expiresAt })).digest("base64url");
  return Buffer.from(JSON.stringify({ session: sessionData, expiresAt, signature })).toString("base64url");
}

function forgedCookies(secret: string, token: string, who: { id: string; email: string; name: string }): string {
  return `${TOKEN_COOKIE}=${signedCookieValue(token, secret)}; ${DATA_COOKIE}=${forgedSessionData(secret, token, who)}`;
}

/** The session token inside a real signed-in cookie (`token.signature`, URI-encoded). */
function tokenOf(cookie: string): string {
  const raw = cookie.split(/;\s*/).find((c) => c.startsWith(`${TOKEN_COOKIE}=`));
  if (!raw) throw new Error(`no ${TOKEN_COOKIE} in ${cookie}`);
  const value = decodeURIComponent(raw.slice(TOKEN_COOKIE.length + 1));
  return value.slice(0, value.lastIndexOf("."));
}

async function asViewer(cookie: string) {
  return getViewer(new Headers({ cookie }));
}

async function meStatus(cookie: string): Promise<number> {
  const res = await getMe(new Request("http://127.0.0.1:3100/api/me", { headers: { cookie } }), { params: Promise.resolve({}) });
  return res.status;
}

describe("sessions signed with a known or guessed secret", () => {
  it("the configured secret is generated, not the old default", () => {
    expect(env.BETTER_AUTH_SECRET).not.toBe(OLD_DEFAULT);
    expect(env.BETTER_AUTH_SECRET.length).toBeGreaterThanOrEqual(32);
  });

  for (const secret of [OLD_DEFAULT, ...GUESSES]) {
    it(`refuses an invented admin session signed with "${secret}"`, async () => {
      const cookie = forgedCookies(secret, `forged${randomUUID().replaceAll("-", "")}`, { id: randomUUID(), email: "nobody@example.test", name: "Nobody" });
      expect(await asViewer(cookie)).toBeNull();
      expect(await meStatus(cookie)).toBe(401);
    });
  }

  it("refuses an entrant's own session token re-signed with the old default and an admin cookie cache", async () => {
    const entrant = await makeUser();
    const cookie = forgedCookies(OLD_DEFAULT, tokenOf(entrant.cookie), entrant);
    expect(await asViewer(cookie)).toBeNull();
    expect(await meStatus(cookie)).toBe(401);
  });

  it("control: the same cookies signed with the configured secret are read (the forgery is faithful)", async () => {
    const entrant = await makeUser();
    const cookie = forgedCookies(env.BETTER_AUTH_SECRET, tokenOf(entrant.cookie), entrant);
    expect((await asViewer(cookie))?.id).toBe(entrant.id);
    expect(await meStatus(cookie)).toBe(200);
  });
});

/** An HS256 JWT (RFC 7519, RFC 7515) like better-auth's e-mail verification link carries. */
function verificationJwt(email: string, secret: string): string {
  const now = Math.floor(Date.now() / 1000);
  const part = (o: object) => Buffer.from(JSON.stringify(o)).toString("base64url");
  const unsigned = `${part({ alg: "HS256" })}.${part({ email, iat: now, exp: now + 3600 })}`;
  return `${unsigned}.${hmac(secret, unsigned).digest("base64url")}`;
}

async function unverifiedUser() {
  const id = randomUUID();
  const email = `${unique("unverified")}@example.test`;
  await db.insert(user).values({ id, email, name: "Una Verified", emailVerified: false, role: "user" });
  return { id, email };
}

async function verify(token: string) {
  return auth.handler(new Request(new URL(`/api/auth/verify-email?token=${encodeURIComponent(token)}`, env.APP_URL), { headers: { origin: env.APP_URL } }));
}

const isVerified = async (id: string) => (await db.select({ v: user.emailVerified }).from(user).where(eq(user.id, id)))[0]!.v;

describe("e-mail verification links signed with a known or guessed secret", () => {
  for (const secret of [OLD_DEFAULT, GUESSES[0]!]) {
    it(`refuses a link signed with "${secret}": the address stays unverified and no session is made`, async () => {
      const who = await unverifiedUser();
      const res = await verify(verificationJwt(who.email, secret));
      expect(res.status).not.toBe(200);
      expect(res.headers.getSetCookie().some((c) => c.startsWith(`${TOKEN_COOKIE}=`) && !c.startsWith(`${TOKEN_COOKIE}=;`))).toBe(false);
      expect(await isVerified(who.id)).toBe(false);
    });
  }

  it("control: a link signed with the configured secret verifies (the forgery is faithful)", async () => {
    const who = await unverifiedUser();
    const res = await verify(verificationJwt(who.email, env.BETTER_AUTH_SECRET));
    expect(res.status).toBe(200);
    expect(await isVerified(who.id)).toBe(true);
  });
});
