// Factories for integration tests: each call makes its own uniquely named rows, so test files
// can share the test database and run in parallel without seeing each other's data.
import { randomUUID } from "node:crypto";
import { hashPassword } from "better-auth/crypto";
import { db } from "@/db/client";
import { account, categories, entries, showRoles, shows, user, type ShowRole } from "@/db/schema";
import type { Condition } from "@/scoring/categories";
import { auth } from "@/lib/auth";
import { inchesToUm } from "@/scoring/units";

export const TEST_PASSWORD = "correct-horse-quilt";
let hashed: Promise<string> | undefined;

export const unique = (prefix: string) => `${prefix}-${randomUUID().slice(0, 8)}`;

export type TestUser = { id: string; email: string; name: string; cookie: string };

export async function makeUser(opts: { admin?: boolean; name?: string; email?: string } = {}): Promise<TestUser> {
  const id = randomUUID();
  const email = opts.email ?? `${unique("user")}@example.test`;
  const name = opts.name ?? "Test Person";
  hashed ??= hashPassword(TEST_PASSWORD);
  await db.insert(user).values({ id, email, name, emailVerified: true, role: opts.admin ? "admin" : "user" });
  await db.insert(account).values({
    id: randomUUID(),
    accountId: id,
    providerId: "credential",
    userId: id,
    password: await hashed,
    updatedAt: new Date(),
  });
  return { id, email, name, cookie: await signIn(email, TEST_PASSWORD) };
}

/** Signs in through better-auth's API and returns the Cookie header value for later requests. */
export async function signIn(email: string, password: string): Promise<string> {
  const res = await auth.api.signInEmail({ body: { email, password }, asResponse: true });
  if (!res.ok) throw new Error(`sign-in failed for ${email}: ${res.status} ${await res.text()}`);
  return cookieFrom(res);
}

export function cookieFrom(res: Response): string {
  return res.headers
    .getSetCookie()
    .map((c) => c.split(";")[0])
    .join("; ");
}

export async function makeShow(opts: { status?: (typeof shows.$inferInsert)["status"]; name?: string } = {}) {
  const slug = unique("show");
  const [row] = await db
    .insert(shows)
    .values({
      slug,
      name: opts.name ?? `Test Show ${slug}`,
      guildName: "Test Guild",
      venueName: "Test Hall",
      timeZone: "America/Chicago",
      status: opts.status ?? "entries_open",
      entryClosesAt: new Date(Date.now() + 30 * 86_400_000),
    })
    .returning({ id: shows.id, slug: shows.slug, name: shows.name });
  return row!;
}

export async function grantRole(userId: string, showId: string, role: ShowRole) {
  await db.insert(showRoles).values({ userId, showId, role });
}

let nextNumber = 1000;
/** Statuses an entry reaches only after it is paid, so the factory marks them paid unless told. */
const PAID_BY_THEN = new Set(["paid", "received", "judged", "hung", "returned"]);

export async function makeEntry(showId: string, entrantUserId: string, fields: Partial<typeof entries.$inferInsert> = {}) {
  const paidAt = "paidAt" in fields ? fields.paidAt : PAID_BY_THEN.has(fields.status ?? "submitted") ? new Date() : null;
  const [row] = await db
    .insert(entries)
    .values({
      showId,
      entrantUserId,
      entryNumber: nextNumber++,
      title: "Test Quilt",
      widthUm: inchesToUm(60),
      lengthUm: inchesToUm(80),
      quiltingMethod: "home_machine",
      status: "submitted",
      madeBy: ["Test Maker"],
      ...fields,
      paidAt,
    })
    .returning();
  return row!;
}

/** A category of the show; by default one that takes every judged quilt ("All judged quilts"). */
export async function makeCategory(showId: string, fields: { code?: string; name?: string; precedence?: number; conditions?: Condition[]; cap?: number | null } = {}) {
  const [row] = await db
    .insert(categories)
    .values({
      showId,
      code: fields.code ?? unique("C").slice(0, 10),
      name: fields.name ?? "All judged quilts",
      precedence: fields.precedence ?? 10,
      conditions: fields.conditions ?? [{ kind: "judged", value: true }],
      cap: fields.cap ?? null,
    })
    .returning();
  return row!;
}
