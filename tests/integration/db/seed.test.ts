// The demo seeder against a real, migrated PostgreSQL (DATABASE_URL), with an in-memory photo store.
//
// Independence from other tests sharing the database: each test runs inside a REPEATABLE READ
// transaction that is always rolled back (the seeder's own transaction becomes a savepoint), and
// compares row counts with counts taken in the same snapshot before seeding. Other files' writes
// are invisible to the snapshot, and nothing is left behind (audit_log is append-only, so a
// committed seed could never be cleaned up). If an earlier `db:seed` committed the demo here, it
// is deleted inside the transaction first and comes back when the transaction rolls back.
import { verifyPassword } from "better-auth/crypto";
import { count, eq, inArray } from "drizzle-orm";
import sharp from "sharp";
import { describe, expect, it } from "vitest";
import { db } from "@/db/client";
import * as schema from "@/db/schema";
import { DEMO_ACCOUNTS, DEMO_PASSWORD, DEMO_SHOW, demoScenario } from "@/db/seed/demo-data";
import { LAST_YEAR_SHOW, seedLastYear } from "@/db/seed/demo-last-year";
import { photoKey, seedDemo, type PutPhoto } from "@/db/seed/seed-demo";
import { loadResultsInput } from "@/db/queries/results";
import { assembleResults, isAwarded, snapshotOf, type PublishedResults } from "@/scoring/results";

type Tx = Parameters<Parameters<typeof db.transaction>[0]>[0];

const TABLES = {
  user: schema.user,
  session: schema.session,
  account: schema.account,
  verification: schema.verification,
  rate_limit: schema.rateLimit,
  shows: schema.shows,
  show_roles: schema.showRoles,
  show_invitations: schema.showInvitations,
  entrant_profiles: schema.entrantProfiles,
  entries: schema.entries,
  entry_photos: schema.entryPhotos,
  payment_events: schema.paymentEvents,
  audit_log: schema.auditLog,
} as const;
type Counts = Record<keyof typeof TABLES, number>;

async function countAll(tx: Tx): Promise<Counts> {
  const out = {} as Counts;
  for (const [name, table] of Object.entries(TABLES) as [keyof typeof TABLES, (typeof TABLES)[keyof typeof TABLES]][]) {
    const [row] = await tx.select({ n: count() }).from(table);
    out[name] = row!.n;
  }
  return out;
}

const ROLLBACK = new Error("rolled back on purpose");

/** Runs `fn` in a snapshot transaction that is always rolled back. */
async function inRolledBackTransaction(fn: (tx: Tx) => Promise<void>): Promise<void> {
  try {
    await db.transaction(
      async (tx) => {
        await fn(tx);
        throw ROLLBACK;
      },
      { isolationLevel: "repeatable read" },
    );
  } catch (err) {
    if (err !== ROLLBACK) throw err;
  }
}

/** Removes a demo that an earlier `db:seed` committed (only inside the rolled-back transaction). */
async function clearDemo(tx: Tx): Promise<void> {
  await tx.delete(schema.shows).where(inArray(schema.shows.slug, [DEMO_SHOW.slug, LAST_YEAR_SHOW.slug])); // cascades roles, entries, photos, sheets
  const emails = DEMO_ACCOUNTS.map((a) => a.email);
  const ids = (await tx.select({ id: schema.user.id }).from(schema.user).where(inArray(schema.user.email, emails))).map((r) => r.id);
  if (ids.length === 0) return;
  await tx.delete(schema.entries).where(inArray(schema.entries.entrantUserId, ids)); // entries restrict user deletion
  await tx.delete(schema.user).where(inArray(schema.user.id, ids)); // cascades accounts, sessions, profiles
}

function photoSpy() {
  const uploads = new Map<string, { body: Buffer; contentType: string }>();
  const putPhoto: PutPhoto = async (key, body, contentType) => {
    uploads.set(key, { body, contentType });
  };
  return { uploads, putPhoto };
}

const scenario = demoScenario();
const nonDrafts = scenario.quilts.filter((q) => q.status !== "draft").length;

describe("seedDemo", () => {
  it("seeds the demo show once, with every photo uploaded, and a second run changes nothing", async () => {
    await inRolledBackTransaction(async (tx) => {
      await clearDemo(tx);
      const before = await countAll(tx);
      const spy = photoSpy();

      const first = await seedDemo({ db: tx, putPhoto: spy.putPhoto });
      expect(first).toEqual({ created: true });
      const after = await countAll(tx);
      const delta = Object.fromEntries(Object.keys(TABLES).map((k) => [k, after[k as keyof Counts] - before[k as keyof Counts]]));
      expect(delta).toEqual({
        user: 48,
        session: 0,
        account: 48,
        verification: 0,
        rate_limit: 0,
        shows: 1,
        show_roles: 7,
        show_invitations: 0,
        entrant_profiles: 40,
        entries: 120,
        entry_photos: 2 * nonDrafts,
        payment_events: 0,
        audit_log: 8, // show.created + 7 × role.granted
      });

      const uploadsAfterFirst = spy.uploads.size;
      const second = await seedDemo({ db: tx, putPhoto: spy.putPhoto });
      expect(second).toEqual({ created: false });
      expect(await countAll(tx)).toEqual(after);
      expect(spy.uploads.size).toBe(uploadsAfterFirst);

      // Every photo row points at an uploaded JPEG of the recorded size.
      const [show] = await tx.select().from(schema.shows).where(eq(schema.shows.slug, DEMO_SHOW.slug));
      expect(show).toMatchObject({ name: DEMO_SHOW.name, status: "entries_open", timeZone: "America/Chicago" });
      const photos = await tx
        .select({ photo: schema.entryPhotos, status: schema.entries.status })
        .from(schema.entryPhotos)
        .innerJoin(schema.entries, eq(schema.entries.id, schema.entryPhotos.entryId))
        .where(eq(schema.entries.showId, show!.id));
      expect(photos).toHaveLength(2 * nonDrafts);
      expect(spy.uploads.size).toBe(photos.length);
      for (const { photo, status } of photos) {
        expect(status).not.toBe("draft");
        expect(photo.storageKey).toBe(photoKey(show!.id, photo.entryId, photo.view as "full" | "detail"));
        const upload = spy.uploads.get(photo.storageKey);
        expect(upload, photo.storageKey).toBeDefined();
        expect(upload!.body.length).toBe(photo.bytes);
        expect(upload!.contentType).toBe("image/jpeg");
        expect(photo.contentType).toBe("image/jpeg");
        const meta = await sharp(upload!.body).metadata();
        expect([meta.format, meta.width, meta.height]).toEqual(["jpeg", photo.widthPx, photo.heightPx]);
      }

      // Roles as the scenario has them, granted by the admin (chair) and the chair (the rest).
      const roles = await tx.select().from(schema.showRoles).where(eq(schema.showRoles.showId, show!.id));
      const byRole = (r: string) => roles.filter((x) => x.role === r).length;
      expect([byRole("chair"), byRole("judge"), byRole("scribe"), byRole("intake")]).toEqual([1, 3, 2, 1]);
      const actions = await tx.select().from(schema.auditLog).where(eq(schema.auditLog.showId, show!.id));
      expect(actions.filter((a) => a.action === "show.created")).toHaveLength(1);
      expect(actions.filter((a) => a.action === "role.granted")).toHaveLength(7);

      // The admin can sign in with the demo password: better-auth's own scrypt check accepts it.
      const [admin] = await tx
        .select({ role: schema.user.role, verified: schema.user.emailVerified, hash: schema.account.password, accountId: schema.account.accountId, userId: schema.user.id })
        .from(schema.user)
        .innerJoin(schema.account, eq(schema.account.userId, schema.user.id))
        .where(eq(schema.user.email, "admin@ribbonry.test"));
      expect(admin).toMatchObject({ role: "admin", verified: true });
      expect(admin!.accountId).toBe(admin!.userId);
      expect(await verifyPassword({ hash: admin!.hash!, password: DEMO_PASSWORD })).toBe(true);
      expect(await verifyPassword({ hash: admin!.hash!, password: "not-the-password" })).toBe(false);
      const [entrant] = await tx.select({ role: schema.user.role }).from(schema.user).where(eq(schema.user.email, "entrant1@ribbonry.test"));
      expect(entrant!.role).toBe("user");
    });
  }, 180_000);

  it("writes nothing when a photo upload fails", async () => {
    await inRolledBackTransaction(async (tx) => {
      await clearDemo(tx);
      const before = await countAll(tx);
      let calls = 0;
      const putPhoto: PutPhoto = async () => {
        if (++calls === 3) throw new Error("photo store is down");
      };
      await expect(seedDemo({ db: tx, putPhoto })).rejects.toThrow("photo store is down");
      expect(await countAll(tx)).toEqual(before);
      expect(calls).toBeLessThan(10); // it stops starting new uploads after the failure
    });
  }, 60_000);

  it("seeds last year's show judged and published, and the server's own results give the same publication", async () => {
    await inRolledBackTransaction(async (tx) => {
      await clearDemo(tx);
      const spy = photoSpy();
      await seedDemo({ db: tx, putPhoto: spy.putPhoto });
      expect(await seedLastYear({ db: tx, putPhoto: spy.putPhoto })).toEqual({ created: true });
      expect(await seedLastYear({ db: tx, putPhoto: spy.putPhoto })).toEqual({ created: false });
      const [show] = await tx.select().from(schema.shows).where(eq(schema.shows.slug, LAST_YEAR_SHOW.slug));
      expect(show!.status).toBe("results_published");
      const entries = await tx.select().from(schema.entries).where(eq(schema.entries.showId, show!.id));
      expect(entries).toHaveLength(30);
      expect(entries.every((e) => e.categoryState === "decided" && e.status === "returned")).toBe(true);
      const sheets = await tx.select().from(schema.judgeSheets).where(eq(schema.judgeSheets.showId, show!.id));
      expect(sheets).toHaveLength(2 * 30);
      expect(sheets.every((s) => s.status === "submitted")).toBe(true);
      const photos = await tx.select().from(schema.entryPhotos).where(inArray(schema.entryPhotos.entryId, entries.map((e) => e.id)));
      expect(photos).toHaveLength(2 * 30);
      for (const p of photos) expect(spy.uploads.has(p.storageKey), p.storageKey).toBe(true);

      // The stored publication is what the chair's Results page computes from the stored sheets.
      const [pub] = await tx.select().from(schema.resultPublications).where(eq(schema.resultPublications.showId, show!.id));
      const snapshot = pub!.snapshot as PublishedResults;
      const { input } = await loadResultsInput(tx, show!.id);
      const live = assembleResults(input);
      expect(live.blockers).toEqual([]);
      expect(snapshotOf(live, 1, pub!.publishedAt)).toEqual(snapshot);
      const awarded = snapshot.categories.flatMap((c) => c.entries.filter(isAwarded));
      expect(awarded.length).toBeGreaterThan(5);
      expect(snapshot.awards.map((a) => [a.name, a.entryIds.length])).toEqual([["Best of Show", 1], ["Judge's choice", 2]]);
    });
  }, 180_000);
});
