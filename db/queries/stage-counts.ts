// The counts the stage checks read (scoring/stage-moves.ts), gathered in one place, and the
// chair's preview of a move: what it will do, what refuses it, what to know first.
import "server-only";
import { and, count, eq, inArray, isNotNull, notInArray, sql } from "drizzle-orm";
import { db, type Tx } from "@/db/client";
import { categories, entries, judgeSheets, judgingPanels, panelCategories, panelMembers, showRoles, shows, user } from "@/db/schema";
import { categorySetFor } from "@/db/queries/categories";
import { conflictBlockers } from "@/db/queries/judge-conflicts";
import { clearedSql, forJudging, judgedEntries } from "@/db/queries/judged-entries";
import { currentRulesFor, settingsForShowId } from "@/db/queries/settings";
import { activeCategories } from "@/scoring/category-sets";
import { NEVER_JUDGED, RECEIPT_REQUIRED } from "@/scoring/judged-entries";
import { checkStageMove, needsReason, type Stage, type StageCounts } from "@/scoring/stage-moves";
import { requireShowRole, type Viewer } from "@/lib/session";

type Reader = Pick<Tx, "select">;
const UNDECIDED = ["undecided", "fits_none", "fits_several"] as const;

export async function stageCounts(reader: Reader, showId: string, now: Date = new Date()): Promise<StageCounts> {
  const n = (rows: { n: number }[]) => rows[0]?.n ?? 0;
  const [[show], settings, rules, set, conflicts, sent, drafts, notCleared, judged, exceptions, undecided] = await Promise.all([
    reader.select({ entryClosesAt: shows.entryClosesAt }).from(shows).where(eq(shows.id, showId)),
    settingsForShowId(showId, reader),
    currentRulesFor(reader, showId),
    categorySetFor(showId, reader),
    conflictBlockers(reader, showId),
    reader.select({ n: count() }).from(entries).where(and(eq(entries.showId, showId), notInArray(entries.status, [...NEVER_JUDGED]))),
    reader.select({ n: count() }).from(entries).where(and(eq(entries.showId, showId), eq(entries.status, "draft"))),
    reader.select({ n: count() }).from(entries).where(and(forJudging(showId), sql`not ${clearedSql}`, sql`${entries.judgeAnywayAt} is null`)),
    reader.select({ n: count() }).from(entries).where(judgedEntries(showId)),
    reader.select({ n: count() }).from(entries).where(and(judgedEntries(showId), sql`not ${clearedSql}`)),
    reader.select({ n: count() }).from(entries).where(and(eq(entries.showId, showId), notInArray(entries.status, [...NEVER_JUDGED]), inArray(entries.categoryState, [...UNDECIDED]))),
  ]);
  const panels = await panelFacts(reader, showId);
  return {
    now,
    entryClosesAt: show?.entryClosesAt ?? null,
    rulesPublished: Boolean(rules),
    juried: settings.juried,
    entries: n(sent),
    drafts: n(drafts),
    notCleared: n(notCleared),
    judged: n(judged),
    exceptions: n(exceptions),
    // No drop-off check-in yet: unknown, so no warning (see RECEIPT_REQUIRED).
    notReceived: RECEIPT_REQUIRED ? 0 : null,
    undecided: n(undecided),
    activeCategories: activeCategories(set).length,
    openConflicts: conflicts,
    ...panels,
  };
}

/** Panels against the judged entries: categories no one judges, judges on no panel, sheets. */
async function panelFacts(reader: Reader, showId: string) {
  const [judged, seats, teamJudges, submitted] = await Promise.all([
    reader
      .select({ categoryId: entries.categoryId, code: categories.code, name: categories.name, n: count() })
      .from(entries)
      .innerJoin(categories, eq(categories.id, entries.categoryId))
      .where(and(judgedEntries(showId), isNotNull(entries.categoryId)))
      .groupBy(entries.categoryId, categories.code, categories.name),
    reader
      .select({ categoryId: panelCategories.categoryId, userId: panelMembers.userId })
      .from(panelCategories)
      .innerJoin(judgingPanels, eq(judgingPanels.id, panelCategories.panelId))
      .innerJoin(panelMembers, and(eq(panelMembers.panelId, judgingPanels.id), eq(panelMembers.role, "judge")))
      .where(eq(judgingPanels.showId, showId)),
    reader
      .select({ userId: showRoles.userId, name: user.name })
      .from(showRoles)
      .innerJoin(user, eq(user.id, showRoles.userId))
      .where(and(eq(showRoles.showId, showId), eq(showRoles.role, "judge"))),
    reader
      .select({ n: count() })
      .from(judgeSheets)
      .innerJoin(entries, eq(entries.id, judgeSheets.entryId))
      .where(and(eq(judgeSheets.showId, showId), eq(judgeSheets.status, "submitted"), judgedEntries(showId))),
  ]);
  const judgesOf = new Map<string, Set<string>>();
  for (const s of seats) judgesOf.set(s.categoryId, (judgesOf.get(s.categoryId) ?? new Set()).add(s.userId));
  const seated = new Set(seats.map((s) => s.userId));
  const sheetsDue = judged.reduce((sum, c) => sum + c.n * (judgesOf.get(c.categoryId!)?.size ?? 0), 0);
  const sheetsSubmitted = submitted[0]?.n ?? 0;
  return {
    // Only categories holding judged entries need a panel: display-only ones never do.
    categoriesWithoutPanel: judged.filter((c) => !judgesOf.has(c.categoryId!)).map((c) => `${c.code} ${c.name}`),
    judgesWithoutPanel: teamJudges.filter((j) => !seated.has(j.userId)).map((j) => j.name).sort(),
    sheetsSubmitted,
    sheetsMissing: Math.max(0, sheetsDue - sheetsSubmitted),
  };
}

/** The chair's preview of a move, for the confirm step. */
export async function stageMovePreview(viewer: Viewer, slug: string, to: Stage, now: Date = new Date()) {
  const { showId } = await requireShowRole(viewer, slug, ["chair"]);
  const [show] = await db.select({ status: shows.status }).from(shows).where(eq(shows.id, showId));
  const counts = await stageCounts(db, showId, now);
  const check = checkStageMove(show!.status, to, counts);
  return { from: show!.status, to, ...check, needsReason: needsReason(check) };
}
