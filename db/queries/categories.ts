// A show's categories and where each entry falls: the chair's editor (save with the moves shown
// first), the queue of entries the rules could not place, overrides, the intake re-measure, the
// per-category caps and the lock once judging starts. The decisions themselves are the pure
// engine's (scoring/categories.ts, scoring/category-sets.ts); this file stores them.
import "server-only";
import { and, asc, eq, inArray, notInArray, or, sql } from "drizzle-orm";
import { db, type Tx } from "@/db/client";
import { categories, entries, showSettings, shows, type Entry } from "@/db/schema";
import { writeAudit } from "@/db/queries/audit";
import { lockShow, settingsForShowId } from "@/db/queries/settings";
import { badInput, conflict, notFound } from "@/lib/errors";
import { asConditions, type CategorySetInput } from "@/lib/schemas/categories";
import { AREA_ROLES, requireShowRole, type Viewer } from "@/lib/session";
import type { z } from "zod";
import type { admitSchema, measureSchema, overrideSchema, reviewSizeSchema, toleranceSchema } from "@/lib/schemas/categories";
import {
  activeCategories,
  describeOutcome,
  factsOf,
  movesDigest,
  placeEntry,
  planMoves,
  prepareSet,
  sameOutcome,
  sizeCheck,
  type CategoryOutcome,
  type EntryInSet,
  type Placement,
  type PreparedSet,
  type ShowCategory,
} from "@/scoring/category-sets";
import { parseLength } from "@/scoring/measure";
import { STARTER_SETS } from "@/scoring/starter-sets";
import { formatInches } from "@/scoring/units";

/** Once judging starts the categories hold still: no edits, moves or overrides. */
export const CATEGORY_LOCKED_STATUSES = ["judging", "results_published", "archived"] as const;
export const categoriesLocked = (status: string) => (CATEGORY_LOCKED_STATUSES as readonly string[]).includes(status);
const LOCKED_MESSAGE = "Judging has started, so the categories are locked.";

/** Entries that are in the show and so need a category (not drafts, withdrawn or declined ones). */
const NOT_PLACED = ["draft", "withdrawn", "declined"] as const;

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

function columnsForPlacement(p: Placement, overrideReason: string, now: Date) {
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

async function preparedFor(reader: Reader, showId: string): Promise<{ prepared: PreparedSet; set: ShowCategory[]; toleranceUm: number; overlap: "flag" | "firstByPrecedence" }> {
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

// ---- The queue and overrides ---------------------------------------------------------------------

/** Entries the rules could not place, quilts off their size at intake, and entries waiting for a place. */
export async function categoryQueue(viewer: Viewer, slug: string) {
  const { showId } = await requireShowRole(viewer, slug, ["chair"]);
  const [show] = await db.select({ status: shows.status }).from(shows).where(eq(shows.id, showId));
  const set = await categorySetFor(showId);
  const byId = new Map(set.map((c) => [c.id, c]));
  const rows = await db
    .select()
    .from(entries)
    .where(
      and(
        eq(entries.showId, showId),
        notInArray(entries.status, [...NOT_PLACED]),
        or(
          inArray(entries.categoryState, ["undecided", "fits_none", "fits_several"]),
          and(sql`${entries.sizeFlag} <> ''`, sql`${entries.sizeFlagReviewedAt} is null`),
          eq(entries.waitlisted, true),
        ),
      ),
    )
    .orderBy(asc(entries.entryNumber));
  const view = (r: Entry) => ({
    id: r.id,
    entryNumber: r.entryNumber,
    title: r.title,
    size: `${formatInches(r.widthUm, false)} × ${formatInches(r.lengthUm)}`,
    techniques: r.techniques,
    state: r.categoryState,
    category: r.categoryId ? describeOutcome(outcomeOfRow(r), byId) : null,
    candidates: r.categoryCandidateIds.map((id) => ({ id, code: byId.get(id)?.code ?? "?", name: byId.get(id)?.name ?? "removed" })),
    reasons: r.categoryReasons,
    sizeFlag: r.sizeFlag,
    waitlistReason: r.waitlistReason,
  });
  return {
    locked: categoriesLocked(show?.status ?? "draft"),
    categories: activeCategories(set).map((c) => ({ id: c.id, code: c.code, name: c.name })),
    unplaced: rows.filter((r) => r.categoryState !== "decided" && r.categoryState !== "overridden").map(view),
    sizeFlags: rows.filter((r) => r.sizeFlag && !r.sizeFlagReviewedAt).map(view),
    waiting: rows.filter((r) => r.waitlisted).map(view),
  };
}
export type CategoryQueue = Awaited<ReturnType<typeof categoryQueue>>;

async function lockedEntryOfShow(tx: Tx, showId: string, entryId: string): Promise<Entry> {
  const [row] = await tx.select().from(entries).where(and(eq(entries.id, entryId), eq(entries.showId, showId))).for("update");
  if (!row || row.status === "draft") throw notFound("There is no such entry in this show.");
  return row;
}

/** The chair places an entry by hand (or hands it back to the rules), with a reason for the audit log. */
export async function overrideEntryCategory(viewer: Viewer, slug: string, input: z.output<typeof overrideSchema>) {
  const { showId } = await requireShowRole(viewer, slug, ["chair"]);
  return db.transaction(async (tx) => {
    const show = await lockShow(tx, showId);
    if (categoriesLocked(show.status)) throw conflict(LOCKED_MESSAGE);
    const entry = await lockedEntryOfShow(tx, showId, input.entryId);
    if ((NOT_PLACED as readonly string[]).includes(entry.status)) throw conflict(`Entry ${entry.entryNumber} is ${entry.status}, so it takes no category.`);
    const { prepared, toleranceUm } = await preparedFor(tx, showId);
    const before = outcomeOfRow(entry);
    let placement: Placement;
    if (input.categoryId === "rules") {
      placement = placeEntry(factsOf(entry, toleranceUm), { state: "undecided" }, prepared);
    } else {
      const target = prepared.byId.get(input.categoryId);
      if (!target) throw badInput("Some fields need attention.", { categoryId: ["That category isn't in this show."] });
      if (target.mergedIntoId) throw badInput("Some fields need attention.", { categoryId: [`${target.code} ${target.name} was merged into another category; choose that one.`] });
      placement = { outcome: { state: "overridden", categoryId: target.id }, reasons: [`placed by the chair in ${target.code} ${target.name}: ${input.reason}`] };
    }
    await tx.update(entries).set({ ...columnsForPlacement(placement, input.reason, new Date()), updatedAt: new Date() }).where(eq(entries.id, entry.id));
    await writeAudit(tx, {
      actorUserId: viewer.id,
      showId,
      action: input.categoryId === "rules" ? "entry.category_override_cleared" : "entry.category_overridden",
      subjectType: "entry",
      subjectId: entry.id,
      before: { category: describeOutcome(before, prepared.byId), ...before },
      after: { category: describeOutcome(placement.outcome, prepared.byId), ...placement.outcome, reason: input.reason },
    });
    return { entryNumber: entry.entryNumber, category: describeOutcome(placement.outcome, prepared.byId) };
  });
}

/** The chair has looked at a quilt flagged for its size at intake. */
export async function reviewSizeFlag(viewer: Viewer, slug: string, input: z.output<typeof reviewSizeSchema>) {
  const { showId } = await requireShowRole(viewer, slug, ["chair"]);
  return db.transaction(async (tx) => {
    const entry = await lockedEntryOfShow(tx, showId, input.entryId);
    if (!entry.sizeFlag) throw conflict(`Entry ${entry.entryNumber} has no size flag.`);
    await tx.update(entries).set({ sizeFlagReviewedAt: new Date() }).where(eq(entries.id, entry.id));
    await writeAudit(tx, { actorUserId: viewer.id, showId, action: "entry.size_flag_reviewed", subjectType: "entry", subjectId: entry.id, after: { sizeFlag: entry.sizeFlag } });
    return { entryNumber: entry.entryNumber };
  });
}

/** Gives a waiting entry its place, with the chair's reason. */
export async function admitFromWaitlist(viewer: Viewer, slug: string, input: z.output<typeof admitSchema>) {
  const { showId } = await requireShowRole(viewer, slug, ["chair"]);
  return db.transaction(async (tx) => {
    const entry = await lockedEntryOfShow(tx, showId, input.entryId);
    if (!entry.waitlisted) throw conflict(`Entry ${entry.entryNumber} is not on the waiting list.`);
    await tx.update(entries).set({ waitlisted: false, waitlistReason: "", updatedAt: new Date() }).where(eq(entries.id, entry.id));
    await writeAudit(tx, { actorUserId: viewer.id, showId, action: "entry.admitted_from_waitlist", subjectType: "entry", subjectId: entry.id, before: { waitlisted: true, waitlistReason: entry.waitlistReason }, after: { waitlisted: false, reason: input.reason } });
    return { entryNumber: entry.entryNumber };
  });
}

/** The intake tolerance, typed in inches or centimetres. */
export async function updateSizeTolerance(viewer: Viewer, slug: string, input: z.output<typeof toleranceSchema>) {
  const { showId } = await requireShowRole(viewer, slug, ["chair"]);
  const parsed = parseLength(input.tolerance, input.unit);
  if (!parsed.ok) throw badInput("Some fields need attention.", { tolerance: [parsed.message] });
  if (parsed.um > 12 * 25_400) throw badInput("Some fields need attention.", { tolerance: ["A tolerance over 12 in would let any size through; check the number."] });
  return db.transaction(async (tx) => {
    const before = await settingsForShowId(showId, tx);
    await tx.insert(showSettings).values({ showId, sizeToleranceUm: parsed.um }).onConflictDoUpdate({ target: showSettings.showId, set: { sizeToleranceUm: parsed.um, updatedAt: new Date() } });
    await writeAudit(tx, { actorUserId: viewer.id, showId, action: "settings.size_tolerance_updated", subjectType: "show_settings", subjectId: showId, before: { sizeToleranceUm: before.sizeToleranceUm }, after: { sizeToleranceUm: parsed.um } });
    return { toleranceUm: parsed.um };
  });
}

// ---- Intake ------------------------------------------------------------------------------------

/**
 * The intake desk records the size it measured. Off by more than the show's tolerance, the
 * entry is flagged for the chair and, before judging starts, decided again on the measured size.
 */
export async function recordMeasurement(viewer: Viewer, slug: string, input: z.output<typeof measureSchema>) {
  const { showId } = await requireShowRole(viewer, slug, AREA_ROLES.desk);
  const width = parseLength(input.width, input.unit);
  const length = parseLength(input.length, input.unit);
  if (!width.ok || !length.ok) {
    throw badInput("Some fields need attention.", { ...(width.ok ? {} : { width: [width.message] }), ...(length.ok ? {} : { length: [length.message] }) });
  }
  return db.transaction(async (tx) => {
    const show = await lockShow(tx, showId);
    const entry = await lockedEntryOfShow(tx, showId, input.entryId);
    if ((NOT_PLACED as readonly string[]).includes(entry.status)) throw conflict(`Entry ${entry.entryNumber} is ${entry.status}; it isn't in the show.`);
    const settings = await settingsForShowId(showId, tx);
    const measured = { ...entry, measuredWidthUm: width.um, measuredLengthUm: length.um };
    const check = sizeCheck(measured, settings.sizeToleranceUm)!;
    const locked = categoriesLocked(show.status);
    const sizeFlag = check.outside ? (locked ? `${check.text} Judging had started, so the category was not changed.` : check.text) : "";
    const now = new Date();
    await tx
      .update(entries)
      .set({ measuredWidthUm: width.um, measuredLengthUm: length.um, measuredAt: now, measuredBy: viewer.id, sizeFlag, sizeFlagReviewedAt: null, updatedAt: now })
      .where(eq(entries.id, entry.id));
    await writeAudit(tx, {
      actorUserId: viewer.id,
      showId,
      action: "entry.measured",
      subjectType: "entry",
      subjectId: entry.id,
      before: { measuredWidthUm: entry.measuredWidthUm, measuredLengthUm: entry.measuredLengthUm },
      after: { measuredWidthUm: width.um, measuredLengthUm: length.um, offByUm: check.offByUm, outside: check.outside },
    });
    let category: string | null = null;
    if (!locked) {
      const placement = await decideEntryTx(tx, { ...measured, sizeFlag }, viewer.id, "re-measured at intake");
      const { prepared } = await preparedFor(tx, showId);
      category = describeOutcome(placement.outcome, prepared.byId);
    }
    return { entryNumber: entry.entryNumber, flagged: check.outside, text: check.text, category };
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

/** Why judging can't start yet, as far as categories go; empty when it can. */
export async function judgingBlockers(tx: Reader, showId: string): Promise<string[]> {
  const [set, [open]] = await Promise.all([
    categorySetFor(showId, tx),
    tx
      .select({ n: sql<number>`count(*)::int` })
      .from(entries)
      .where(and(eq(entries.showId, showId), notInArray(entries.status, [...NOT_PLACED]), inArray(entries.categoryState, ["undecided", "fits_none", "fits_several"]))),
  ]);
  const reasons: string[] = [];
  if (activeCategories(set).length === 0) reasons.push("Set up the categories first (Categories).");
  const n = open?.n ?? 0;
  if (n > 0) reasons.push(`${n} ${n === 1 ? "entry has" : "entries have"} no category yet; place ${n === 1 ? "it" : "them"} from the queue first (Categories).`);
  return reasons;
}
