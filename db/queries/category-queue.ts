// The chair's queue of entries the category rules could not place (none or several), quilts off
// their registered size at intake, and entries waiting for a place; the overrides with their
// reasons, and the intake desk's re-measure. Every change is audited.
import "server-only";
import { and, asc, eq, inArray, notInArray, or, sql } from "drizzle-orm";
import { db, type Tx } from "@/db/client";
import { entries, showSettings, shows, type Entry } from "@/db/schema";
import { writeAudit } from "@/db/queries/audit";
import { noteConflicts } from "@/db/queries/judge-conflicts";
import { categoriesLocked, categorySetFor, columnsForPlacement, decideEntryTx, LOCKED_MESSAGE, NOT_PLACED, outcomeOfRow, preparedFor } from "@/db/queries/categories";
import { lockShow, settingsForShowId } from "@/db/queries/settings";
import { badInput, conflict, notFound } from "@/lib/errors";
import { AREA_ROLES, requireShowRole, type Viewer } from "@/lib/session";
import type { z } from "zod";
import type { admitSchema, measureSchema, overrideSchema, reviewSizeSchema, toleranceSchema } from "@/lib/schemas/categories";
import { activeCategories, describeOutcome, factsOf, placeEntry, sizeCheck, type Placement } from "@/scoring/category-sets";
import { parseLength } from "@/scoring/measure";
import { formatInches } from "@/scoring/units";

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
    await noteConflicts(tx, showId, { entryIds: [entry.id] }, "category_move", viewer.id);
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

