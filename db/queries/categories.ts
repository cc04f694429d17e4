// A show's categories and where each entry falls: the chair's editor (save with the moves shown
// first), placing on submission, the per-category caps and the lock once judging starts (the
// queue, overrides and the intake re-measure are in ./category-queue.ts). The decisions themselves are the pure
// engine's (scoring/categories.ts, scoring/category-sets.ts); this file stores them.
import "server-only";
import { and, asc, eq, inArray, notInArray, sql } from "drizzle-orm";
import { db, type Tx } from "@/db/client";
import { categories, entries, showSettings, shows, type Entry } from "@/db/schema";
import { writeAudit } from "@/db/queries/audit";
import { conflictBlockers, noteConflicts } from "@/db/queries/judge-conflicts";
import { lockShow, settingsForShowId } from "@/db/queries/settings";
import { badInput, conflict, notFound } from "@/lib/errors";
import { asConditions, type CategorySetInput } from "@/lib/schemas/categories";
import { requireShowRole, type Viewer } from "@/lib/session";
import {
  activeCategories,
  describeOutcome,
  factsOf,
  movesDigest,
  placeEntry,
  planMoves,
  prepareSet,
  sameOutcome,
  type CategoryOutcome,
  type EntryInSet,
  type Placement,
  type PreparedSet,
  type ShowCategory,
} from "@/scoring/category-sets";
import { STARTER_SETS } from "@/scoring/starter-sets";

/** Once judging starts the categories hold still: no edits, moves or overrides. */
export const CATEGORY_LOCKED_STATUSES = ["judging", "results_published", "archived"] as const;
export const categoriesLocked = (status: string) => (CATEGORY_LOCKED_STATUSES as readonly string[]).includes(status);
export const LOCKED_MESSAGE = "Judging has started, so the categories are locked.";

/** Entries that are in the show and so need a category (not drafts, withdrawn or declined ones). */
export const NOT_PLACED = ["draft", "withdrawn", "declined"] as const;

type Reader = Pick<Tx, "select">;

// ---- Reading the set ---------------------------------------------------------------------------

const categoryColumns = {
  id: categories.id,
  code: categories.code,
  name: categories.name,
  description: categories.description,
  precedence: categories.precedence,
  conditions: categories.conditions,
  cap: categories.cap,
  mergedIntoId: categories.mergedIntoId,
};

/** Every category of the show, merged ones included (they still decide, for their new home). */
export async function categorySetFor(showId: string, reader: Reader = db): Promise<ShowCategory[]> {
  const rows = await reader.select(categoryColumns).from(categories).where(eq(categories.showId, showId)).orderBy(asc(categories.precedence), asc(categories.code));
  return rows.map((r) => ({ ...r, description: r.description || undefined }));
}

/** The current outcome an entry row holds. */
export function outcomeOfRow(e: Pick<Entry, "categoryState" | "categoryId" | "categoryCandidateIds">): CategoryOutcome {
  switch (e.categoryState) {
    case "decided":
    case "overridden":
      return e.categoryId ? { state: e.categoryState, categoryId: e.categoryId } : { state: "undecided" };
    case "fits_several":
      return { state: "fits_several", candidateIds: e.categoryCandidateIds };
    case "fits_none":
      return { state: "fits_none" };
    default:
      return { state: "undecided" };
  }
}

export function columnsForPlacement(p: Placement, overrideReason: string, now: Date) {
  const o = p.outcome;
  return {
    categoryState: o.state,
    categoryId: o.state === "decided" || o.state === "overridden" ? o.categoryId : null,
    categoryCandidateIds: o.state === "fits_several" ? o.candidateIds : [],
    categoryReasons: p.reasons,
    categoryOverrideReason: o.state === "overridden" ? overrideReason : "",
    categoryDecidedAt: now,
  };
}

export async function preparedFor(reader: Reader, showId: string): Promise<{ prepared: PreparedSet; set: ShowCategory[]; toleranceUm: number; overlap: "flag" | "firstByPrecedence" }> {
  const [set, settings] = await Promise.all([categorySetFor(showId, reader), settingsForShowId(showId, reader)]);
  return { set, prepared: prepareSet(set, { overlap: settings.categoryOverlap }), toleranceUm: settings.sizeToleranceUm, overlap: settings.categoryOverlap };
}

/**
 * Decides (or re-decides) one entry and stores the result, inside the caller's transaction, which
 * must hold the entry's row. Writes an audit row when the outcome changes. Returns the placement.
 */
export async function decideEntryTx(tx: Tx, entry: Entry, actorUserId: string | null, cause: string): Promise<Placement> {
  const { prepared, toleranceUm } = await preparedFor(tx, entry.showId);
  const current = outcomeOfRow(entry);
  const placement = placeEntry(factsOf(entry, toleranceUm), current, prepared);
  const now = new Date();
  await tx.update(entries).set({ ...columnsForPlacement(placement, entry.categoryOverrideReason, now) }).where(eq(entries.id, entry.id));
  if (!sameOutcome(current, placement.outcome)) {
    await writeAudit(tx, {
      actorUserId,
      showId: entry.showId,
      action: "entry.category_decided",
      subjectType: "entry",
      subjectId: entry.id,
      before: { category: describeOutcome(current, prepared.byId), ...current },
      after: { category: describeOutcome(placement.outcome, prepared.byId), ...placement.outcome, reasons: placement.reasons, cause },
    });
  }
  // A judge of its category may now have a conflict with this entry (a move, a maker's name
  // changed): kept for the chair.
  await noteConflicts(tx, entry.showId, { entryIds: [entry.id] }, "category_move", actorUserId);
  return placement;
}

// ---- The entry form's view (public facts of the set) -------------------------------------------

/** The rules the entry form decides with in the browser: the same set and options the server uses. */
export async function categoriesForEntryForm(showId: string) {
  const { set, overlap } = await preparedFor(db, showId);
  return { categories: set, overlap };
}

/**
 * Where one entry stands now, for its owner's review page: the stored outcome with the category's
 * code and name, its reasons and any waiting-list reason. No role check: callers already checked
 * the viewer (entryForEntrant), like categoriesForEntryForm.
 */
export async function categoryOfEntry(entryId: string) {
  const [row] = await db
    .select({
      categoryState: entries.categoryState,
      categoryId: entries.categoryId,
      categoryCandidateIds: entries.categoryCandidateIds,
      categoryReasons: entries.categoryReasons,
      waitlisted: entries.waitlisted,
      waitlistReason: entries.waitlistReason,
      code: categories.code,
      name: categories.name,
    })
    .from(entries)
    .leftJoin(categories, eq(categories.id, entries.categoryId))
    .where(eq(entries.id, entryId));
  if (!row) throw notFound("There is no such entry.");
  return {
    state: row.categoryState,
    category: row.categoryId && row.code !== null && row.name !== null ? { id: row.categoryId, code: row.code, name: row.name } : null,
    candidateIds: row.categoryCandidateIds,
    reasons: row.categoryReasons,
    waitlistReason: row.waitlisted ? row.waitlistReason : "",
  };
}
export type EntryCategoryView = Awaited<ReturnType<typeof categoryOfEntry>>;

// ---- The chair's editor ------------------------------------------------------------------------

export async function categoryEditor(viewer: Viewer, slug: string) {
  const { showId } = await requireShowRole(viewer, slug, ["chair"]);
  const [show] = await db.select({ name: shows.name, slug: shows.slug, status: shows.status }).from(shows).where(eq(shows.id, showId));
  if (!show) throw notFound("There is no such show.");
  const [{ set, toleranceUm, overlap }, settings, rows] = await Promise.all([
    preparedFor(db, showId),
    settingsForShowId(showId),
    db.select().from(entries).where(and(eq(entries.showId, showId), notInArray(entries.status, [...NOT_PLACED]))).orderBy(asc(entries.entryNumber)),
  ]);
  const counts = new Map<string, { entries: number; waiting: number }>();
  for (const r of rows) {
    if (!r.categoryId) continue;
    const c = counts.get(r.categoryId) ?? { entries: 0, waiting: 0 };
    if (r.waitlisted) c.waiting++;
    else c.entries++;
    counts.set(r.categoryId, c);
  }
  return {
    show: { ...show, locked: categoriesLocked(show.status) },
    overlap,
    toleranceUm,
    techniques: settings.techniques,
    maxEntriesPerCategory: settings.maxEntriesPerCategory,
    categories: set.map((c) => ({ ...c, entryCount: counts.get(c.id)?.entries ?? 0, waitingCount: counts.get(c.id)?.waiting ?? 0 })),
    entries: rows.map((r) => ({
      id: r.id,
      entryNumber: r.entryNumber,
      title: r.title,
      facts: factsOf(r, toleranceUm),
      current: outcomeOfRow(r),
    })) satisfies EntryInSet[],
    starterSets: STARTER_SETS.map((s) => ({ key: s.key, name: s.name, description: s.description, overlap: s.overlap, rules: s.rules })),
  };
}
export type CategoryEditorData = Awaited<ReturnType<typeof categoryEditor>>;

export type MoveView = { entryId: string; entryNumber: number | null; title: string; from: string; to: string; reasons: string[] };
export type SaveSetResult =
  | { saved: true; moved: number; categories: number }
  | { saved: false; moves: MoveView[]; digest: string; stale: boolean };

function toShowCategory(c: CategorySetInput["categories"][number]): ShowCategory {
  return { id: c.id, code: c.code, name: c.name, description: c.description || undefined, precedence: c.precedence, conditions: asConditions(c.conditions), cap: c.cap, mergedIntoId: c.mergedIntoId };
}

const ruleJson = (c: ShowCategory) => ({ code: c.code, name: c.name, description: c.description ?? "", precedence: c.precedence, conditions: c.conditions, cap: c.cap ?? null, mergedIntoId: c.mergedIntoId ?? null });

/**
 * Saves the whole set. When the change would move entries, nothing is written the first time:
 * the moves come back with their fingerprint, and a second call carrying that fingerprint applies
 * them (if the entries changed meanwhile, the fresh moves come back instead, marked stale).
 */
export async function saveCategorySet(viewer: Viewer, slug: string, input: CategorySetInput): Promise<SaveSetResult> {
  const { showId } = await requireShowRole(viewer, slug, ["chair"]);
  return db.transaction(async (tx) => {
    const show = await lockShow(tx, showId);
    if (categoriesLocked(show.status)) throw conflict(LOCKED_MESSAGE);
    const settings = await settingsForShowId(showId, tx);
    const before = await categorySetFor(showId, tx);
    const next = input.categories.map(toShowCategory);
    const foreign = await tx.select({ id: categories.id }).from(categories).where(and(inArray(categories.id, next.length ? next.map((c) => c.id) : ["00000000-0000-0000-0000-000000000000"]), sql`${categories.showId} <> ${showId}`));
    if (foreign.length) throw badInput("Some categories belong to another show; reload the page.");

    const rows = await tx.select().from(entries).where(and(eq(entries.showId, showId), notInArray(entries.status, [...NOT_PLACED]))).for("update");
    const inSet: EntryInSet[] = rows.map((r) => ({ id: r.id, entryNumber: r.entryNumber, title: r.title, facts: factsOf(r, settings.sizeToleranceUm), current: outcomeOfRow(r) }));
    const moves = planMoves(inSet, next, { overlap: input.overlap });
    const digest = movesDigest(moves);
    const byIdAfter = new Map(next.map((c) => [c.id, c]));
    const byIdBoth = new Map([...before.map((c) => [c.id, c] as const), ...next.map((c) => [c.id, c] as const)]);
    if (moves.length && input.confirmMoves !== digest) {
      return {
        saved: false,
        digest,
        stale: input.confirmMoves !== undefined,
        moves: moves.map((m) => ({ entryId: m.entryId, entryNumber: m.entryNumber, title: m.title, from: describeOutcome(m.from, byIdBoth), to: describeOutcome(m.to, byIdAfter), reasons: m.reasons })),
      };
    }

    const now = new Date();
    // Codes are unique per show; park the old ones so two categories may swap codes in one save.
    await tx.update(categories).set({ code: sql`'~' || ${categories.id}::text` }).where(eq(categories.showId, showId));
    for (const c of next) {
      const values = { showId, code: c.code, name: c.name, description: c.description ?? "", precedence: c.precedence, conditions: c.conditions, cap: c.cap ?? null, mergedIntoId: null, updatedAt: now };
      await tx.insert(categories).values({ id: c.id, ...values }).onConflictDoUpdate({ target: categories.id, set: values });
    }
    for (const c of next) if (c.mergedIntoId) await tx.update(categories).set({ mergedIntoId: c.mergedIntoId }).where(eq(categories.id, c.id));

    // Every entry is placed again: moves are recorded one by one, reasons refreshed for the rest.
    const prepared = prepareSet(next, { overlap: input.overlap });
    const moved = new Set(moves.map((m) => m.entryId));
    for (const r of rows) {
      const placement = placeEntry(factsOf(r, settings.sizeToleranceUm), outcomeOfRow(r), prepared);
      const sameReasons = placement.reasons.join("\n") === r.categoryReasons.join("\n");
      if (!moved.has(r.id) && sameReasons) continue;
      await tx.update(entries).set(columnsForPlacement(placement, r.categoryOverrideReason, now)).where(eq(entries.id, r.id));
      if (moved.has(r.id)) {
        const from = outcomeOfRow(r);
        await writeAudit(tx, {
          actorUserId: viewer.id,
          showId,
          action: "entry.category_moved",
          subjectType: "entry",
          subjectId: r.id,
          before: { category: describeOutcome(from, byIdBoth), ...from },
          after: { category: describeOutcome(placement.outcome, byIdAfter), ...placement.outcome, reasons: placement.reasons, cause: input.note || "categories changed" },
        });
      }
    }
    if (moved.size) await noteConflicts(tx, showId, { entryIds: [...moved] }, "category_move", viewer.id);
    const removed = before.filter((c) => !byIdAfter.has(c.id)).map((c) => c.id);
    if (removed.length) await tx.delete(categories).where(inArray(categories.id, removed));
    await tx
      .insert(showSettings)
      .values({ showId, categoryOverlap: input.overlap })
      .onConflictDoUpdate({ target: showSettings.showId, set: { categoryOverlap: input.overlap, updatedAt: now } });
    await writeAudit(tx, {
      actorUserId: viewer.id,
      showId,
      action: "categories.saved",
      subjectType: "show",
      subjectId: showId,
      before: { overlap: settings.categoryOverlap, categories: before.map(ruleJson) },
      after: { overlap: input.overlap, categories: next.map(ruleJson), moved: moves.length, note: input.note },
    });
    return { saved: true, moved: moves.length, categories: next.length };
  });
}

// ---- Submission and the start of judging -------------------------------------------------------

/**
 * At submission, inside its transaction: the entry's category, the entrant's per-category limit
 * (refused, draft kept) and the category's cap (over it, the entry waits). Returns the columns to
 * store with the submission.
 */
export async function placeOnSubmission(tx: Tx, entry: Entry, limits: { maxEntriesPerCategory: number | null; toleranceUm: number }) {
  const { prepared } = await preparedFor(tx, entry.showId);
  const placement = placeEntry(factsOf(entry, limits.toleranceUm), outcomeOfRow(entry), prepared);
  const o = placement.outcome;
  let waitlistReason = "";
  if (o.state === "decided" || o.state === "overridden") {
    const category = prepared.byId.get(o.categoryId)!;
    const placed = and(eq(entries.showId, entry.showId), eq(entries.categoryId, category.id), notInArray(entries.status, [...NOT_PLACED]), sql`${entries.id} <> ${entry.id}`);
    if (limits.maxEntriesPerCategory !== null) {
      const [mine] = await tx.select({ n: sql<number>`count(*)::int` }).from(entries).where(and(placed, eq(entries.entrantUserId, entry.entrantUserId)));
      if ((mine?.n ?? 0) >= limits.maxEntriesPerCategory) {
        throw conflict(
          `This quilt falls in ${category.code} ${category.name}, and the show takes at most ${limits.maxEntriesPerCategory} per entrant in one category; you have sent that many there. Your draft is kept.`,
        );
      }
    }
    if (category.cap) {
      const [taken] = await tx.select({ n: sql<number>`count(*)::int` }).from(entries).where(and(placed, eq(entries.waitlisted, false)));
      if ((taken?.n ?? 0) >= category.cap) waitlistReason = `${category.code} ${category.name} is full (${category.cap} entries).`;
    }
  }
  return { columns: columnsForPlacement(placement, "", new Date()), placement, waitlistReason };
}

/** Why judging can't start yet (categories, judges' open conflicts); empty when it can. */
export async function judgingBlockers(tx: Reader, showId: string): Promise<string[]> {
  const [set, [open], conflicts] = await Promise.all([
    categorySetFor(showId, tx),
    tx
      .select({ n: sql<number>`count(*)::int` })
      .from(entries)
      .where(and(eq(entries.showId, showId), notInArray(entries.status, [...NOT_PLACED]), inArray(entries.categoryState, ["undecided", "fits_none", "fits_several"]))),
    conflictBlockers(tx, showId),
  ]);
  const reasons: string[] = [];
  if (activeCategories(set).length === 0) reasons.push("Set up the categories first (Categories).");
  const n = open?.n ?? 0;
  if (n > 0) reasons.push(`${n} ${n === 1 ? "entry has" : "entries have"} no category yet; place ${n === 1 ? "it" : "them"} from the queue first (Categories).`);
  reasons.push(...conflicts);
  return reasons;
}
