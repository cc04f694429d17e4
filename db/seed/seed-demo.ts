// Writes the demo scenario (db/seed/demo-data.ts) into an empty or already-seeded database, once:
// every row in one transaction, and the generated photos uploaded before it commits.
// No "server-only" here: it runs from the seed script and from tests, never from a page.
import { randomUUID } from "node:crypto";
import { hashPassword } from "better-auth/crypto";
import { eq } from "drizzle-orm";
import type { PgDatabase } from "drizzle-orm/pg-core";
import type { PostgresJsQueryResultHKT } from "drizzle-orm/postgres-js";
import * as schema from "../schema";
import { photoSizeFor, renderPatchwork, type PatchworkView } from "../../storage/patchwork";
import { factsOf, placeEntry, prepareSet, type ShowCategory } from "../../scoring/category-sets";
import { GUILD_STARTER } from "../../scoring/starter-sets";
import { DEMO_AWARDS, DEMO_PANELS, DEMO_QUICK_PHRASES, DEMO_RESULT_RULES, DEMO_SHEET } from "./demo-judging";
import { DEMO_PASSWORD, DEMO_RULES, DEMO_SETTINGS, demoScenario, type DemoQuilt, type DemoShowRole } from "./demo-data";

/**
 * The database handle the seeder needs. A PostgresJsDatabase<typeof schema> fits; so does one of
 * its transactions, which lets a test run the seeder inside a transaction it rolls back (the
 * seeder's own transaction then becomes a savepoint).
 */
export type SeedDb = PgDatabase<PostgresJsQueryResultHKT, typeof schema>;

export type PutPhoto = (key: string, body: Buffer, contentType: string) => Promise<void>;

export interface SeedDemoOptions {
  db: SeedDb;
  putPhoto: PutPhoto;
  log?: (msg: string) => void;
}

const PHOTO_CONCURRENCY = 4;
const PHOTO_VIEWS: PatchworkView[] = ["full", "detail"];
const CONTENT_TYPE = "image/jpeg";

// The demo's literal types must stay the schema's enum values; these lines fail to compile if not.
type EntryRow = typeof schema.entries.$inferInsert;
const _statusFits = (s: DemoQuilt["status"]): EntryRow["status"] => s;
const _methodFits = (m: DemoQuilt["quiltingMethod"]): EntryRow["quiltingMethod"] => m;
const _divisionFits = (d: DemoQuilt["division"]): EntryRow["division"] => d;
const _roleFits = (r: DemoShowRole): (typeof schema.showRoles.$inferInsert)["role"] => r;
void [_statusFits, _methodFits, _divisionFits, _roleFits];

export function photoKey(showId: string, entryId: string, view: PatchworkView): string {
  return `shows/${showId}/entries/${entryId}/${view}.jpg`;
}

/** Seeds the demo show unless its slug is already there; never duplicates anything. */
export async function seedDemo(opts: SeedDemoOptions): Promise<{ created: boolean }> {
  const { db, putPhoto } = opts;
  const log = opts.log ?? (() => {});
  const scenario = demoScenario();
  const { show } = scenario;

  if (await demoShowExists(db, show.slug)) {
    log(`demo show "${show.slug}" is already there; nothing to do`);
    return { created: false };
  }

  // Build every row in memory first, so the transaction only writes rows and uploads photos.
  const passwordHash = await hashPassword(DEMO_PASSWORD); // one scrypt hash shared by every demo account
  const userIds = new Map(scenario.people.map((p) => [p.email, randomUUID()] as const));
  const idOf = (email: string) => userIds.get(email)!;
  const adminId = idOf(scenario.people.find((p) => p.role === "admin")!.email);
  const chairId = idOf(scenario.people.find((p) => p.role === "chair")!.email);
  const showId = randomUUID();

  const users = scenario.people.map((p) => ({
    id: idOf(p.email),
    name: p.name,
    email: p.email,
    emailVerified: true,
    role: p.role === "admin" ? "admin" : "user",
    createdAt: new Date(p.joinedAt),
    updatedAt: new Date(p.joinedAt),
  }));
  const accounts = users.map((u) => ({
    id: randomUUID(),
    accountId: u.id, // better-auth looks up the credential account by providerId and accountId = user id
    providerId: "credential",
    userId: u.id,
    password: passwordHash,
    createdAt: u.createdAt,
    updatedAt: u.updatedAt,
  }));
  const profiles = scenario.people.flatMap((p) =>
    p.profile ? [{ userId: idOf(p.email), ...p.profile, updatedAt: new Date(p.joinedAt) }] : [],
  );
  const showCreatedAt = new Date(Date.parse(show.entryOpensAt) - 30 * 86_400_000);
  const showRow = {
    id: showId,
    slug: show.slug,
    name: show.name,
    guildName: show.guildName,
    venueName: show.venueName,
    venueAddress: show.venueAddress,
    timeZone: show.timeZone,
    status: show.status,
    entryOpensAt: new Date(show.entryOpensAt),
    entryClosesAt: new Date(show.entryClosesAt),
    dropOffStartsAt: new Date(show.dropOffStartsAt),
    dropOffEndsAt: new Date(show.dropOffEndsAt),
    judgingStartsAt: new Date(show.judgingStartsAt),
    judgingEndsAt: new Date(show.judgingEndsAt),
    showOpensAt: new Date(show.showOpensAt),
    showClosesAt: new Date(show.showClosesAt),
    pickUpStartsAt: new Date(show.pickUpStartsAt),
    pickUpEndsAt: new Date(show.pickUpEndsAt),
    createdAt: showCreatedAt,
    updatedAt: showCreatedAt,
  };
  // The admin appoints the chair; the chair appoints everyone else.
  const roles = scenario.people.flatMap((p) => {
    if (p.role === "admin" || p.role === "entrant") return [];
    const grantedBy = p.role === "chair" ? adminId : chairId;
    return [{ id: randomUUID(), showId, userId: idOf(p.email), role: p.role, grantedBy, createdAt: new Date(p.joinedAt) }];
  });
  const rulesVersionId = randomUUID();
  const entryRows: EntryRow[] = scenario.quilts.map((q) => ({
    id: randomUUID(),
    showId,
    entrantUserId: idOf(q.entrantEmail),
    entryNumber: q.entryNumber,
    title: q.title,
    widthUm: q.widthUm,
    lengthUm: q.lengthUm,
    techniques: q.techniques,
    madeBy: q.madeBy,
    quiltedBy: q.quiltedBy,
    quiltedForHire: q.quiltedForHire,
    quiltingMethod: q.quiltingMethod,
    patternSource: q.patternSource,
    statement: q.statement,
    declaredValueCents: q.declaredValueCents,
    judged: q.judged,
    division: q.division,
    status: q.status,
    rulesVersionId: q.status === "draft" ? null : rulesVersionId,
    rulesAcceptedAt: q.status === "draft" ? null : new Date(q.updatedAt),
    submittedAt: q.status === "draft" ? null : new Date(q.updatedAt),
    paidAt: q.status === "paid" ? new Date(q.updatedAt) : null,
    paymentReference: q.status === "paid" ? "demo" : "",
    createdAt: new Date(q.createdAt),
    updatedAt: new Date(q.updatedAt),
  }));
  // The demo runs on the small guild starter set; each sent entry is placed as submission would.
  const categoryIds = new Map(GUILD_STARTER.rules.map((r) => [r.id, randomUUID()] as const));
  const categorySet: ShowCategory[] = GUILD_STARTER.rules.map((r) => ({ ...r, id: categoryIds.get(r.id)! }));
  const categoryRows = categorySet.map((c) => ({ id: c.id, showId, code: c.code, name: c.name, description: c.description ?? "", precedence: c.precedence, conditions: c.conditions, createdAt: showCreatedAt, updatedAt: showCreatedAt }));
  const prepared = prepareSet(categorySet, { overlap: GUILD_STARTER.overlap });
  for (const row of entryRows) {
    if (row.status === "draft") continue;
    const placed = placeEntry(factsOf({ ...row, techniques: row.techniques ?? [], madeBy: row.madeBy ?? [], quiltedBy: row.quiltedBy ?? "", quiltedForHire: row.quiltedForHire ?? false, judged: row.judged ?? true, division: row.division ?? "open" }, 25_400), { state: "undecided" }, prepared);
    const o = placed.outcome;
    Object.assign(row, {
      categoryState: o.state,
      categoryId: o.state === "decided" ? o.categoryId : null,
      categoryCandidateIds: o.state === "fits_several" ? o.candidateIds : [],
      categoryReasons: placed.reasons,
      categoryDecidedAt: row.submittedAt,
    });
  }
  const photoJobs = scenario.quilts.flatMap((q, i) =>
    q.status === "draft"
      ? [] // drafts have no photos yet
      : PHOTO_VIEWS.map((view) => ({
          entryId: entryRows[i]!.id!,
          view,
          seed: q.photoSeed,
          ...photoSizeFor(q.widthUm, q.lengthUm, view),
          storageKey: photoKey(showId, entryRows[i]!.id!, view),
          createdAt: new Date(q.updatedAt),
        })),
  );
  const audit = [
    { actorUserId: adminId, showId, action: "show.created", subjectType: "show", subjectId: showId, after: { slug: show.slug, name: show.name }, at: showCreatedAt },
    ...roles.map((r) => ({
      actorUserId: r.grantedBy,
      showId,
      action: "role.granted",
      subjectType: "show_role",
      subjectId: r.id,
      after: { userId: r.userId, role: r.role },
      at: r.createdAt,
    })),
  ];

  const started = Date.now();
  await db.transaction(async (tx) => {
    await tx.insert(schema.user).values(users);
    await tx.insert(schema.account).values(accounts);
    await tx.insert(schema.entrantProfiles).values(profiles);
    await tx.insert(schema.shows).values(showRow);
    await tx.insert(schema.showRoles).values(roles);
    await tx.insert(schema.showSettings).values({ showId, ...DEMO_SETTINGS, lateFeeFromAt: new Date(DEMO_SETTINGS.lateFeeFromAt), quickPhrases: DEMO_QUICK_PHRASES, resultRules: DEMO_RESULT_RULES });
    await tx.insert(schema.showRulesVersions).values({ id: rulesVersionId, showId, version: 1, ...DEMO_RULES, publishedBy: chairId, publishedAt: showCreatedAt });
    const lastNumber = Math.max(100, ...entryRows.map((e) => e.entryNumber ?? 0));
    await tx.insert(schema.showEntryCounters).values({ showId, lastNumber });
    await tx.insert(schema.categories).values(categoryRows);
    await tx.insert(schema.entries).values(entryRows);
    await tx.insert(schema.scoreSheets).values({ showId, name: DEMO_SHEET.name, sheet: DEMO_SHEET.sheet, isDefault: true, createdAt: showCreatedAt, updatedAt: showCreatedAt });
    const codeToId = new Map(categorySet.map((c) => [c.code, c.id]));
    for (const p of DEMO_PANELS) {
      const [panel] = await tx.insert(schema.judgingPanels).values({ showId, name: p.name, day: p.day, room: p.room, createdAt: showCreatedAt }).returning({ id: schema.judgingPanels.id });
      await tx.insert(schema.panelMembers).values([
        ...p.judges.map((email) => ({ panelId: panel!.id, userId: idOf(email), role: "judge" as const })),
        ...p.scribes.map((email) => ({ panelId: panel!.id, userId: idOf(email), role: "scribe" as const })),
      ]);
      await tx.insert(schema.panelCategories).values(p.categoryCodes.map((code) => ({ panelId: panel!.id, categoryId: codeToId.get(code)! })));
    }
    const awardRows = await tx.insert(schema.showAwards).values(DEMO_AWARDS.map((a, i) => ({ showId, ...a, sponsor: a.sponsor ?? "", sortOrder: i, createdAt: showCreatedAt }))).returning({ id: schema.showAwards.id, kind: schema.showAwards.kind });
    // Any two of the demo awards may go to the same entry.
    const ids = awardRows.map((a) => a.id);
    for (const a of awardRows) await tx.update(schema.showAwards).set({ combinesWith: ids.filter((id) => id !== a.id) }).where(eq(schema.showAwards.id, a.id));
    log(`rows written for ${users.length} people and ${entryRows.length} entries; rendering ${photoJobs.length} photos`);

    // Upload inside the transaction: if any upload fails, the rows roll back with it. Objects
    // already uploaded stay behind, but under this run's random show id, so nothing refers to them.
    const photos = await mapLimit(photoJobs, PHOTO_CONCURRENCY, async (job) => {
      const body = await renderPatchwork({ seed: job.seed, widthPx: job.widthPx, heightPx: job.heightPx, view: job.view });
      await putPhoto(job.storageKey, body, CONTENT_TYPE);
      return {
        entryId: job.entryId,
        view: job.view,
        storageKey: job.storageKey,
        widthPx: job.widthPx,
        heightPx: job.heightPx,
        bytes: body.length,
        contentType: CONTENT_TYPE,
        createdAt: job.createdAt,
      };
    });
    await tx.insert(schema.entryPhotos).values(photos);
    await tx.insert(schema.auditLog).values(audit);
  });
  log(`transaction committed after ${((Date.now() - started) / 1000).toFixed(1)} s`);
  return { created: true };
}

async function demoShowExists(db: SeedDb, slug: string): Promise<boolean> {
  const rows = await db.select({ id: schema.shows.id }).from(schema.shows).where(eq(schema.shows.slug, slug)).limit(1);
  return rows.length > 0;
}

/**
 * Runs `fn` over `items` with at most `limit` at once, keeping the order of results. On a failure
 * no new items start, and it waits for those in flight before rejecting, so no upload is still
 * running when the transaction rolls back.
 */
export async function mapLimit<T, R>(items: T[], limit: number, fn: (item: T) => Promise<R>): Promise<R[]> {
  const results = new Array<R>(items.length);
  let next = 0;
  let failed = false;
  const worker = async () => {
    while (!failed && next < items.length) {
      const i = next++;
      try {
        results[i] = await fn(items[i]!);
      } catch (err) {
        failed = true;
        throw err;
      }
    }
  };
  const settled = await Promise.allSettled(Array.from({ length: Math.min(limit, items.length) }, worker));
  const rejected = settled.find((s): s is PromiseRejectedResult => s.status === "rejected");
  if (rejected) throw rejected.reason;
  return results;
}
