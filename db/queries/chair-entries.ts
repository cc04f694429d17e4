// The chair's view of a show's entries: the searchable table, one entry with its history, the
// bulk decisions and offline payments, the jurying round and the spreadsheet rows.
import "server-only";
import { and, asc, desc, eq, exists, ilike, inArray, isNotNull, isNull, ne, notInArray, or, sql, type SQL } from "drizzle-orm";
import { db } from "@/db/client";
import { writeAudit } from "@/db/queries/audit";
import { settingsForShowId } from "@/db/queries/settings";
import { chairMayWithdraw, refundIfWithdrawn } from "@/db/queries/withdrawals";
import {
  auditLog,
  categories,
  entrantProfiles,
  entries,
  entryPhotos,
  paymentItems,
  payments,
  showRulesVersions,
  shows,
  showSettings,
  user,
  type EntryStatus,
} from "@/db/schema";
import { conflict, notFound } from "@/lib/errors";
import type { EntriesListQuery, PaymentState } from "@/lib/schemas/chair-entries";
import { requireShowRole, type Viewer } from "@/lib/session";

const CHAIR = ["chair"] as const;

const entrantName = sql<string>`coalesce(nullif(${entrantProfiles.displayName}, ''), ${user.name})`;
const refunded = exists(
  db
    .select({ one: sql`1` })
    .from(paymentItems)
    .innerJoin(payments, eq(payments.id, paymentItems.paymentId))
    .where(and(eq(paymentItems.entryId, entries.id), inArray(payments.status, ["refunded", "partially_refunded"]))),
);
const paymentState = sql<PaymentState>`case when ${refunded} then 'refunded' when ${entries.paidAt} is not null then 'paid' else 'unpaid' end`;

async function showFacts(showId: string) {
  const [row] = await db
    .select({ timeZone: shows.timeZone, juried: sql<boolean>`coalesce(${showSettings.juried}, false)`, currency: sql<string>`coalesce(${showSettings.currency}, 'usd')` })
    .from(shows)
    .leftJoin(showSettings, eq(showSettings.showId, shows.id))
    .where(eq(shows.id, showId));
  return row!;
}

const escapeLike = (s: string) => s.replace(/[\\%_]/g, (c) => `\\${c}`);

function listWhere(showId: string, q: EntriesListQuery): SQL {
  const conds: (SQL | undefined)[] = [eq(entries.showId, showId), ne(entries.status, "draft")];
  const text = q.q.replace(/^#/, "").trim();
  if (text) {
    // A bare number is an entry number and matches exactly, so "12" finds 12 and not 112.
    if (/^\d{1,9}$/.test(text)) conds.push(eq(entries.entryNumber, Number(text)));
    else {
      const like = `%${escapeLike(text)}%`;
      conds.push(or(ilike(entries.title, like), ilike(user.name, like), ilike(entrantProfiles.displayName, like), ilike(user.email, like)));
    }
  }
  if (q.category === "none") conds.push(isNull(entries.categoryId));
  else if (q.category) conds.push(eq(entries.categoryId, q.category));
  if (q.status) conds.push(eq(entries.status, q.status));
  if (q.division) conds.push(eq(entries.division, q.division));
  if (q.judged) conds.push(eq(entries.judged, q.judged === "judged"));
  if (q.payment === "refunded") conds.push(refunded);
  if (q.payment === "paid") conds.push(and(isNotNull(entries.paidAt), sql`not ${refunded}`));
  if (q.payment === "unpaid") conds.push(and(isNull(entries.paidAt), sql`not ${refunded}`));
  return and(...conds)!;
}

function listOrder(q: EntriesListQuery): SQL[] {
  const dir = q.dir === "desc" ? desc : asc;
  const key = {
    number: entries.entryNumber,
    title: sql`lower(${entries.title})`,
    entrant: sql`lower(${entrantName})`,
    // Size is the quilt's area: what decides where it can hang.
    size: sql`(${entries.widthUm}::bigint * ${entries.lengthUm})`,
    submitted: entries.submittedAt,
    // The enum's own order follows an entry's life: submitted, paid, accepted, …
    status: entries.status,
    // The show's own category order; entries with no category last.
    category: sql`coalesce(${categories.precedence}, 2147483647)`,
  }[q.sort];
  // Entry number, then id, break ties so pages never overlap or skip a row.
  return [dir(key), asc(entries.entryNumber), asc(entries.id)];
}

/** The show's categories in the show's own order (merged ones too: an entry may still sit in one). */
function categoriesInOrder(showId: string) {
  return db
    .select({ id: categories.id, code: categories.code, name: categories.name })
    .from(categories)
    .where(eq(categories.showId, showId))
    .orderBy(asc(categories.precedence), asc(categories.code));
}

export async function entriesForChair(viewer: Viewer, showSlug: string, q: EntriesListQuery) {
  const show = await requireShowRole(viewer, showSlug, CHAIR);
  const where = listWhere(show.showId, q);
  const from = () =>
    db
      .select({ n: sql<number>`count(*)::int` })
      .from(entries)
      .innerJoin(user, eq(user.id, entries.entrantUserId))
      .leftJoin(entrantProfiles, eq(entrantProfiles.userId, entries.entrantUserId))
      .where(where);
  const [rows, [count], facts, showCategories] = await Promise.all([
    db
      .select({
        id: entries.id,
        entryNumber: entries.entryNumber,
        title: entries.title,
        entrantName,
        entrantEmail: user.email,
        widthUm: entries.widthUm,
        lengthUm: entries.lengthUm,
        division: entries.division,
        judged: entries.judged,
        categoryState: entries.categoryState,
        categoryCode: categories.code,
        categoryName: categories.name,
        status: entries.status,
        paymentState,
        paymentReference: entries.paymentReference,
        declaredValueCents: entries.declaredValueCents,
        waitlisted: entries.waitlisted,
        submittedAt: entries.submittedAt,
        decisionReleasedAt: entries.decisionReleasedAt,
      })
      .from(entries)
      .innerJoin(user, eq(user.id, entries.entrantUserId))
      .leftJoin(entrantProfiles, eq(entrantProfiles.userId, entries.entrantUserId))
      .leftJoin(categories, eq(categories.id, entries.categoryId))
      .where(where)
      .orderBy(...listOrder(q))
      .limit(q.limit)
      .offset(q.offset),
    from(),
    showFacts(show.showId),
    categoriesInOrder(show.showId),
  ]);
  return {
    show: { slug: show.slug, name: show.name, timeZone: facts.timeZone, juried: facts.juried, currency: facts.currency },
    categories: showCategories,
    total: count?.n ?? 0,
    limit: q.limit,
    offset: q.offset,
    entries: rows.map((r) => ({
      ...r,
      submittedAt: r.submittedAt?.toISOString() ?? null,
      decisionReleasedAt: r.decisionReleasedAt?.toISOString() ?? null,
    })),
  };
}
export type ChairEntriesPage = Awaited<ReturnType<typeof entriesForChair>>;
export type ChairEntryRow = ChairEntriesPage["entries"][number];

/** Everything about one entry, with its payment lines and its history from the audit log. */
export async function entryDetailForChair(viewer: Viewer, showSlug: string, entryId: string) {
  const show = await requireShowRole(viewer, showSlug, CHAIR);
  if (!/^[0-9a-f-]{36}$/i.test(entryId)) throw notFound("That entry was not found at this show.");
  const [row] = await db
    .select({
      entry: entries,
      accountName: user.name,
      email: user.email,
      displayName: entrantProfiles.displayName,
      phone: entrantProfiles.phone,
      guild: entrantProfiles.guild,
      rulesVersion: showRulesVersions.version,
      rulesPublishedAt: showRulesVersions.publishedAt,
      paymentState,
      categoryCode: categories.code,
      categoryName: categories.name,
    })
    .from(entries)
    .innerJoin(user, eq(user.id, entries.entrantUserId))
    .leftJoin(entrantProfiles, eq(entrantProfiles.userId, entries.entrantUserId))
    .leftJoin(categories, eq(categories.id, entries.categoryId))
    .leftJoin(showRulesVersions, eq(showRulesVersions.id, entries.rulesVersionId))
    .where(and(eq(entries.id, entryId), eq(entries.showId, show.showId), ne(entries.status, "draft")));
  if (!row) throw notFound("That entry was not found at this show.");
  const [photos, lines, history, facts] = await Promise.all([
    db
      .select({ id: entryPhotos.id, view: entryPhotos.view, widthPx: entryPhotos.widthPx, heightPx: entryPhotos.heightPx })
      .from(entryPhotos)
      .where(eq(entryPhotos.entryId, entryId))
      .orderBy(asc(entryPhotos.view)),
    db
      .select({
        id: paymentItems.id,
        description: paymentItems.description,
        amountCents: paymentItems.amountCents,
        currency: payments.currency,
        status: payments.status,
        refundedCents: payments.refundedCents,
        createdAt: payments.createdAt,
        paidAt: payments.paidAt,
      })
      .from(paymentItems)
      .innerJoin(payments, eq(payments.id, paymentItems.paymentId))
      .where(eq(paymentItems.entryId, entryId))
      .orderBy(asc(payments.createdAt)),
    db
      .select({ id: auditLog.id, action: auditLog.action, at: auditLog.at, before: auditLog.before, after: auditLog.after, actorName: user.name })
      .from(auditLog)
      .leftJoin(user, eq(user.id, auditLog.actorUserId))
      .where(and(eq(auditLog.subjectType, "entry"), eq(auditLog.subjectId, entryId), eq(auditLog.showId, show.showId)))
      .orderBy(asc(auditLog.at), asc(auditLog.id)),
    showFacts(show.showId),
  ]);
  const { entry } = row;
  const canWithdraw = chairMayWithdraw(show.status, entry.status);
  const refund = canWithdraw && entry.paymentReference.startsWith("card ") ? await refundIfWithdrawn(db, entryId, (await settingsForShowId(show.showId)).withdrawalRefundPercent) : null;
  return {
    show: { slug: show.slug, name: show.name, timeZone: facts.timeZone, juried: facts.juried, currency: facts.currency },
    entry: { ...entry, paymentState: row.paymentState, categoryCode: row.categoryCode, categoryName: row.categoryName },
    withdrawal: { allowed: canWithdraw, paidByCard: entry.paymentReference.startsWith("card "), refundCents: refund?.refundCents ?? 0 },
    entrant: { name: row.displayName || row.accountName, email: row.email, phone: row.phone ?? "", guild: row.guild ?? "" },
    rules: row.rulesVersion === null ? null : { version: row.rulesVersion, publishedAt: row.rulesPublishedAt, acceptedAt: entry.rulesAcceptedAt },
    photos,
    paymentLines: lines,
    history: history.map((h) => ({ ...h, before: h.before as Record<string, unknown> | null, after: h.after as Record<string, unknown> | null })),
  };
}
export type ChairEntryDetail = Awaited<ReturnType<typeof entryDetailForChair>>;

type Decision = { status: "accepted" | "declined"; reason: string };

/** Statuses a decision may be taken (or changed) from: after intake the quilt is in the show. */
const DECIDABLE: EntryStatus[] = ["submitted", "paid", "accepted", "declined"];

/**
 * Records a decision on the chosen entries. An entry that already has this decision (same status
 * and reason) is left alone: no write, no audit row, and the caller mails only `entryIds`, the
 * entries that changed. The rows are locked `for update` first, so parallel requests queue and
 * each sees the status the one before it committed: twenty clicks on "Accept" change (and mail) once.
 */
async function decide(viewer: Viewer, showSlug: string, entryIds: string[], d: Decision) {
  const show = await requireShowRole(viewer, showSlug, CHAIR);
  const { juried } = await showFacts(show.showId);
  const ids = [...new Set(entryIds)];
  const { changed, unchanged } = await db.transaction(async (tx) => {
    const rows = await tx
      .select({ id: entries.id, entryNumber: entries.entryNumber, status: entries.status, decisionReason: entries.decisionReason })
      .from(entries)
      .where(and(eq(entries.showId, show.showId), inArray(entries.id, ids), ne(entries.status, "draft")))
      .orderBy(asc(entries.entryNumber))
      .for("update");
    if (rows.length !== ids.length) throw notFound("Some of the chosen entries are not at this show; reload the list and try again.");
    const stuck = rows.filter((r) => !DECIDABLE.includes(r.status));
    if (stuck.length) {
      throw conflict(
        `${stuck.map((r) => `No. ${r.entryNumber}`).join(", ")} ${stuck.length === 1 ? "is" : "are"} past the decision (${stuck[0]!.status}); nothing was changed.`,
      );
    }
    const toChange = rows.filter((r) => r.status !== d.status || r.decisionReason !== d.reason);
    if (toChange.length === 0) return { changed: [] as string[], unchanged: rows.length };
    const now = new Date();
    await tx
      .update(entries)
      // Juried shows keep decisions to themselves until the chair releases them.
      .set({ status: d.status, decisionReason: d.reason, decisionReleasedAt: juried ? null : now, updatedAt: now })
      .where(inArray(entries.id, toChange.map((r) => r.id)));
    for (const r of toChange) {
      await writeAudit(tx, {
        actorUserId: viewer.id,
        showId: show.showId,
        action: d.status === "accepted" ? "entry.accepted" : "entry.declined",
        subjectType: "entry",
        subjectId: r.id,
        before: { status: r.status, decisionReason: r.decisionReason },
        after: { status: d.status, decisionReason: d.reason },
      });
    }
    return { changed: toChange.map((r) => r.id), unchanged: rows.length - toChange.length };
  });
  return { show, juried, entryIds: changed, unchanged };
}

export const acceptEntries = (viewer: Viewer, showSlug: string, entryIds: string[]) =>
  decide(viewer, showSlug, entryIds, { status: "accepted", reason: "" });

export const declineEntries = (viewer: Viewer, showSlug: string, entryIds: string[], reason: string) =>
  decide(viewer, showSlug, entryIds, { status: "declined", reason });

/** Cash or a cheque handed to the treasurer: the entry counts as paid, with the reference kept. */
export async function markEntriesPaidOffline(viewer: Viewer, showSlug: string, entryIds: string[], reference: string) {
  const show = await requireShowRole(viewer, showSlug, CHAIR);
  const ids = [...new Set(entryIds)];
  return db.transaction(async (tx) => {
    const rows = await tx
      .select({ id: entries.id, entryNumber: entries.entryNumber, status: entries.status, paidAt: entries.paidAt, paymentReference: entries.paymentReference })
      .from(entries)
      .where(and(eq(entries.showId, show.showId), inArray(entries.id, ids), ne(entries.status, "draft")))
      .orderBy(asc(entries.entryNumber))
      .for("update");
    if (rows.length !== ids.length) throw notFound("Some of the chosen entries are not at this show; reload the list and try again.");
    const already = rows.filter((r) => r.paidAt !== null || r.status === "withdrawn");
    if (already.length) {
      throw conflict(`${already.map((r) => `No. ${r.entryNumber}`).join(", ")} ${already.length === 1 ? "is" : "are"} already paid or withdrawn; nothing was changed.`);
    }
    const now = new Date();
    for (const r of rows) {
      const status: EntryStatus = r.status === "submitted" ? "paid" : r.status;
      await tx.update(entries).set({ status, paidAt: now, paymentReference: reference, updatedAt: now }).where(eq(entries.id, r.id));
      await writeAudit(tx, {
        actorUserId: viewer.id,
        showId: show.showId,
        action: "entry.paid_offline",
        subjectType: "entry",
        subjectId: r.id,
        before: { status: r.status, paidAt: null, paymentReference: r.paymentReference },
        after: { status, paidAt: now.toISOString(), paymentReference: reference },
      });
    }
    return { show, entryIds: rows.map((r) => r.id) };
  });
}

const JURY_POOL: EntryStatus[] = ["submitted", "paid", "accepted", "declined"];

/**
 * The jurying round: the quilt's own facts and photos only. Like db/queries/judging.ts, the select
 * never names the entrant, maker, quilter or guild, so nothing identifying leaves the server.
 */
export async function juryRound(viewer: Viewer, showSlug: string) {
  const show = await requireShowRole(viewer, showSlug, CHAIR);
  const facts = await showFacts(show.showId);
  const rows = facts.juried
    ? await db
        .select({
          id: entries.id,
          entryNumber: entries.entryNumber,
          title: entries.title,
          widthUm: entries.widthUm,
          lengthUm: entries.lengthUm,
          techniques: entries.techniques,
          quiltingMethod: entries.quiltingMethod,
          division: entries.division,
          judged: entries.judged,
          status: entries.status,
          decisionReason: entries.decisionReason,
          decisionReleasedAt: entries.decisionReleasedAt,
        })
        .from(entries)
        .where(and(eq(entries.showId, show.showId), inArray(entries.status, JURY_POOL)))
        .orderBy(asc(entries.entryNumber))
    : [];
  const photos = rows.length
    ? await db
        .select({ id: entryPhotos.id, entryId: entryPhotos.entryId, view: entryPhotos.view })
        .from(entryPhotos)
        .where(inArray(entryPhotos.entryId, rows.map((r) => r.id)))
        .orderBy(asc(entryPhotos.view))
    : [];
  const decided = rows.filter((r) => r.status === "accepted" || r.status === "declined");
  return {
    show: { slug: show.slug, name: show.name, timeZone: facts.timeZone, juried: facts.juried },
    progress: { total: rows.length, decided: decided.length, unreleased: decided.filter((r) => !r.decisionReleasedAt).length },
    entries: rows.map((r) => ({ ...r, photos: photos.filter((p) => p.entryId === r.id).map(({ id, view }) => ({ id, view })) })),
  };
}

/** Marks every decided, unreleased entry of a juried show released; the caller sends the mails. */
export async function releaseDecisions(viewer: Viewer, showSlug: string) {
  const show = await requireShowRole(viewer, showSlug, CHAIR);
  const { juried } = await showFacts(show.showId);
  if (!juried) throw conflict("This show is not juried: decisions are mailed as they are made.");
  return db.transaction(async (tx) => {
    const rows = await tx
      .select({ id: entries.id, status: entries.status })
      .from(entries)
      .where(and(eq(entries.showId, show.showId), inArray(entries.status, ["accepted", "declined"]), isNull(entries.decisionReleasedAt)))
      .for("update");
    if (rows.length === 0) return { show, entryIds: [] as string[] };
    const now = new Date();
    await tx.update(entries).set({ decisionReleasedAt: now, updatedAt: now }).where(inArray(entries.id, rows.map((r) => r.id)));
    for (const r of rows) {
      await writeAudit(tx, {
        actorUserId: viewer.id,
        showId: show.showId,
        action: "entry.decision_released",
        subjectType: "entry",
        subjectId: r.id,
        before: { status: r.status, decisionReleasedAt: null },
        after: { status: r.status, decisionReleasedAt: now.toISOString() },
      });
    }
    return { show, entryIds: rows.map((r) => r.id) };
  });
}

/** Every submitted entry with what the treasurer and the hanging committee need, by number. */
export async function entriesForExport(viewer: Viewer, showSlug: string) {
  const show = await requireShowRole(viewer, showSlug, CHAIR);
  const facts = await showFacts(show.showId);
  const paidCents = sql<number>`coalesce((select sum(${paymentItems.amountCents}) from ${paymentItems} inner join ${payments} on ${payments.id} = ${paymentItems.paymentId} where ${paymentItems.entryId} = ${entries.id} and ${payments.status} in ('paid', 'partially_refunded', 'refunded')), 0)::int`;
  const rows = await db
    .select({
      entryNumber: entries.entryNumber,
      title: entries.title,
      entrantName,
      email: user.email,
      phone: sql<string>`coalesce(${entrantProfiles.phone}, '')`,
      division: entries.division,
      judged: entries.judged,
      categoryState: entries.categoryState,
      categoryCode: categories.code,
      categoryName: categories.name,
      widthUm: entries.widthUm,
      lengthUm: entries.lengthUm,
      techniques: entries.techniques,
      quiltingMethod: entries.quiltingMethod,
      quiltedBy: entries.quiltedBy,
      quiltedForHire: entries.quiltedForHire,
      declaredValueCents: entries.declaredValueCents,
      forSale: entries.forSale,
      priceCents: entries.priceCents,
      status: entries.status,
      paymentState,
      paidCents,
      paymentReference: entries.paymentReference,
      submittedAt: entries.submittedAt,
    })
    .from(entries)
    .innerJoin(user, eq(user.id, entries.entrantUserId))
    .leftJoin(entrantProfiles, eq(entrantProfiles.userId, entries.entrantUserId))
    .leftJoin(categories, eq(categories.id, entries.categoryId))
    .where(and(eq(entries.showId, show.showId), notInArray(entries.status, ["draft"])))
    .orderBy(asc(entries.entryNumber), asc(entries.id));
  return { show: { slug: show.slug, name: show.name, timeZone: facts.timeZone, currency: facts.currency }, rows };
}
export type ExportEntryRow = Awaited<ReturnType<typeof entriesForExport>>["rows"][number];
