// Results, first part: each entry's panel totals from the submitted sheets (mean, median, spread,
// standard deviation, and the severity-adjusted z-score view), computed in SQL, with the same
// figures from the pure module (scoring/ranking.ts) for checking; completeness (sheets still
// missing); and the proposed ranking and places per category.
import "server-only";
import { and, asc, eq, inArray, notInArray, sql } from "drizzle-orm";
import { db } from "@/db/client";
import { categories, entries, judgeSheets, judgingPanels, panelCategories, panelMembers, user } from "@/db/schema";
import { JUDGED_OUT } from "@/db/queries/judging-setup";
import { requireShowRole, type Viewer } from "@/lib/session";
import { placeAwards, rankCategory } from "@/scoring/ranking";
import { totalsInJs as totalsInJsWith, totalsInSql as totalsInSqlWith, type EntryTotals } from "@/db/totals";

export type { EntryTotals };
export const totalsInSql = (showId: string) => totalsInSqlWith(db, showId);
export const totalsInJs = (showId: string) => totalsInJsWith(db, showId);


/**
 * Per category: the entries ranked by the panel's mean (severity-adjusted view beside it), the
 * places the rules would give, and the sheets still missing (which block publishing).
 */
export async function proposedResults(viewer: Viewer, slug: string) {
  const { showId } = await requireShowRole(viewer, slug, ["chair"]);
  const [cats, placed, totals, panels] = await Promise.all([
    db.select({ id: categories.id, code: categories.code, name: categories.name, method: categories.judgingMethod }).from(categories).where(and(eq(categories.showId, showId), sql`${categories.mergedIntoId} is null`)).orderBy(asc(categories.precedence), asc(categories.code)),
    db
      .select({ id: entries.id, entryNumber: entries.entryNumber, title: entries.title, categoryId: entries.categoryId })
      .from(entries)
      .where(and(eq(entries.showId, showId), eq(entries.judged, true), notInArray(entries.status, [...JUDGED_OUT]), inArray(entries.categoryState, ["decided", "overridden"])))
      .orderBy(asc(entries.entryNumber)),
    totalsInSql(showId),
    db
      .select({ categoryId: panelCategories.categoryId, judgeId: panelMembers.userId, judgeName: user.name })
      .from(panelCategories)
      .innerJoin(judgingPanels, eq(judgingPanels.id, panelCategories.panelId))
      .innerJoin(panelMembers, and(eq(panelMembers.panelId, judgingPanels.id), eq(panelMembers.role, "judge")))
      .innerJoin(user, eq(user.id, panelMembers.userId))
      .where(eq(judgingPanels.showId, showId)),
  ]);
  const submitted = await db.select({ entryId: judgeSheets.entryId, judgeId: judgeSheets.judgeUserId }).from(judgeSheets).where(and(eq(judgeSheets.showId, showId), eq(judgeSheets.status, "submitted")));
  const done = new Set(submitted.map((s) => `${s.entryId}|${s.judgeId}`));
  const totalOf = new Map(totals.map((t) => [t.entryId, t]));
  return cats.map((c) => {
    const mine = placed.filter((e) => e.categoryId === c.id);
    const judges = panels.filter((p) => p.categoryId === c.id);
    const missing = mine.flatMap((e) => judges.filter((j) => !done.has(`${e.id}|${j.judgeId}`)).map((j) => ({ entryNumber: e.entryNumber, judge: j.judgeName })));
    const ranked = rankCategory(
      mine.map((e) => ({ entryId: e.id, label: `entry ${e.entryNumber}`, score: totalOf.get(e.id)?.mean ?? null })),
      [],
    );
    const placements = placeAwards(ranked, { ties: "shareWithinCount" });
    return {
      category: c,
      judges: judges.map((j) => j.judgeName),
      missing,
      entries: ranked.map((r) => ({ ...r, entry: mine.find((e) => e.id === r.entryId)!, totals: totalOf.get(r.entryId) ?? null, place: placements.entries.find((p) => p.entryId === r.entryId) ?? null })),
      notAwarded: placements.notAwarded,
    };
  });
}
