// The current results (published or not) as rows for the committee's spreadsheets and printouts:
// results by category, the awards list for the ribbon table, award cards and the judges' summary.
// Entrant names appear only on the committee's spreadsheets; cards and the summary stay blind.
import "server-only";
import { inArray } from "drizzle-orm";
import { db } from "@/db/client";
import { entrantProfiles, user } from "@/db/schema";
import { resultsReview, type ResultsReview } from "@/db/queries/results";
import type { AwardCard } from "@/exports/award-cards";
import type { AwardsListRow } from "@/exports/awards-list";
import type { JudgesSummaryCategory } from "@/exports/judges-summary-pdf";
import type { ResultsWorkbookRow } from "@/exports/results-workbook";
import type { Viewer } from "@/lib/session";
import type { EntryOutcome } from "@/scoring/results";

const placeAwardsOf = (o: EntryOutcome) => [...(o.placeLabel ? [o.placeLabel] : o.honorableMention ? ["Honorable mention"] : []), ...o.awards.map((a) => a.name)];

async function namesOf(review: ResultsReview): Promise<Map<string, string>> {
  const ids = [...new Set(review.results.categories.flatMap((c) => c.entries.map((e) => e.entry.entrantUserId)))];
  if (!ids.length) return new Map();
  const [users, profiles] = await Promise.all([
    db.select({ id: user.id, name: user.name }).from(user).where(inArray(user.id, ids)),
    db.select({ id: entrantProfiles.userId, name: entrantProfiles.displayName }).from(entrantProfiles).where(inArray(entrantProfiles.userId, ids)),
  ]);
  const byId = new Map(users.map((u) => [u.id, u.name]));
  for (const p of profiles) if (p.name) byId.set(p.id, p.name);
  return byId;
}

export async function resultExports(viewer: Viewer, slug: string) {
  const review = await resultsReview(viewer, slug);
  const names = await namesOf(review);
  const cats = review.results.categories;
  const resultRows: ResultsWorkbookRow[] = cats.flatMap((c) =>
    c.entries.map((o) => ({
      categoryCode: c.category.code, categoryName: c.category.name, rank: o.ranked.rank, displayRank: o.ranked.displayRank, placeAwards: placeAwardsOf(o), ribbon: o.ribbon?.name ?? "",
      entryNumber: o.entry.entryNumber, title: o.entry.title, entrantName: names.get(o.entry.entrantUserId) ?? "", judges: o.entry.stats?.count ?? 0,
      mean: o.entry.stats?.mean ?? null, median: o.entry.stats?.median ?? null, spread: o.entry.stats?.spread ?? null, adjusted: o.entry.stats?.z ?? null, flags: o.flags,
    })),
  );
  const placed = cats.flatMap((c) => c.entries.filter((o) => o.place !== null || o.honorableMention).sort((a, b) => (a.place ?? 99) - (b.place ?? 99)).map((o) => ({ c, o })));
  const awarded = review.results.awards.flatMap((a) => a.winners.map((w) => {
    const c = cats.find((x) => x.entries.some((e) => e.entry.entryId === w.entryId))!;
    return { c, o: c.entries.find((e) => e.entry.entryId === w.entryId)!, award: a.name, ribbon: a.ribbon.name };
  }));
  const awardsList: AwardsListRow[] = [
    ...awarded.map(({ c, o, award, ribbon }) => ({ categoryCode: c.category.code, categoryName: c.category.name, award, ribbon, entryNumber: o.entry.entryNumber, title: o.entry.title, entrantName: names.get(o.entry.entrantUserId) ?? "" })),
    ...placed.map(({ c, o }) => ({ categoryCode: c.category.code, categoryName: c.category.name, award: o.placeLabel ?? "Honorable mention", ribbon: o.ribbon?.name ?? "", entryNumber: o.entry.entryNumber, title: o.entry.title, entrantName: names.get(o.entry.entrantUserId) ?? "" })),
  ];
  const cards: AwardCard[] = awardsList.map(({ entrantName: _n, ...card }) => card);
  const summary: JudgesSummaryCategory[] = cats.map((c) => ({
    code: c.category.code, name: c.category.name, judges: c.category.judges,
    entries: c.entries.map((o) => ({
      displayRank: o.ranked.displayRank, entryNumber: o.entry.entryNumber, title: o.entry.title, totals: Object.fromEntries(o.entry.sheets.filter((s) => s.submitted).map((s) => [s.judgeId, s.total])),
      mean: o.entry.stats?.mean ?? null, median: o.entry.stats?.median ?? null, spread: o.entry.stats?.spread ?? null, adjusted: o.entry.stats?.z ?? null, placeAwards: placeAwardsOf(o),
    })),
  }));
  return { show: review.show, resultRows, awardsList, cards, summary };
}
