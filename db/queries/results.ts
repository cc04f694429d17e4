// Results: the inputs of scoring/results.ts read from the database (submitted sheets, totals from
// SQL, the chair's changes, awards and picks), the chair's review, and publishing / unpublishing.
import "server-only";
import { judgedEntries } from "@/db/queries/judged-entries";
import { and, asc, desc, eq, inArray, isNull, sql } from "drizzle-orm";
import { db, type Tx } from "@/db/client";
import {
  awardPicks, categories, entries, entryPhotos, judgeSheets, judgingPanels, panelCategories, panelMembers, placementOverrides, resultMails, resultPublications, scoreSheets, shows, showAwards, showSettings, tieOrders, user,
} from "@/db/schema";
import { writeAudit } from "@/db/queries/audit";
import { currentPublication } from "@/db/queries/published-results";
import { lockShow } from "@/db/queries/settings";
import { totalsInJs as totalsInJsWith, totalsInSql as totalsInSqlWith, type EntryTotals } from "@/db/totals";
import { conflict } from "@/lib/errors";
import { requireShowRole, type Viewer } from "@/lib/session";
import type { AwardDefinition } from "@/scoring/awards";
import { assembleResults, resultRulesOf, snapshotOf, type ResultCategory, type ResultsInput, type ResultSheet } from "@/scoring/results";
import { sheetTotal, type ScoreSheet } from "@/scoring/score-sheets";
import { DISCUSS_FIELD, marksOfState, RANK_FIELD, SORT_FIELD } from "@/scoring/sheet-sync";

export type { EntryTotals };
export const totalsInSql = (showId: string) => totalsInSqlWith(db, showId);
export const totalsInJs = (showId: string) => totalsInJsWith(db, showId);

type Reader = Pick<Tx, "select" | "execute">;

export async function resultRulesFor(reader: Pick<Tx, "select">, showId: string) {
  const [row] = await reader.select({ rules: showSettings.resultRules }).from(showSettings).where(eq(showSettings.showId, showId));
  return resultRulesOf(row?.rules);
}

function sheetOf(state: { fields: Record<string, { value: unknown }> }, sheet: ScoreSheet | null, status: string, total: unknown, judgeId: string): ResultSheet {
  const marks = marksOfState(state as never);
  const bySection = sheet ? sheetTotal(sheet, marks, { partial: true }).bySection : [];
  const sort = state.fields[SORT_FIELD]?.value;
  const rank = state.fields[RANK_FIELD]?.value;
  const t = (total as { total?: number | null } | null)?.total;
  return {
    judgeId, submitted: status === "submitted", total: typeof t === "number" ? t : null,
    sectionTotals: Object.fromEntries(bySection.map((s) => [s.sectionId, s.total])),
    sort: sort === "kept" || sort === "set_aside" ? sort : null, rank: typeof rank === "number" ? rank : null, discuss: state.fields[DISCUSS_FIELD]?.value === true,
  };
}

async function loadCategories(reader: Reader, showId: string) {
  const [cats, placed, totals, panels, sheetRows, sheets] = await Promise.all([
    reader.select({ id: categories.id, code: categories.code, name: categories.name, method: categories.judgingMethod, scoreSheetId: categories.scoreSheetId }).from(categories).where(and(eq(categories.showId, showId), isNull(categories.mergedIntoId))).orderBy(asc(categories.precedence), asc(categories.code)),
    reader
      .select({ id: entries.id, entryNumber: entries.entryNumber, title: entries.title, entrantUserId: entries.entrantUserId, categoryId: entries.categoryId, quiltingMethod: entries.quiltingMethod, division: entries.division, widthUm: entries.widthUm, lengthUm: entries.lengthUm, measuredWidthUm: entries.measuredWidthUm, measuredLengthUm: entries.measuredLengthUm, sizeFlag: entries.sizeFlag, sizeFlagReviewedAt: entries.sizeFlagReviewedAt })
      .from(entries)
      .where(and(judgedEntries(showId), inArray(entries.categoryState, ["decided", "overridden"])))
      .orderBy(asc(entries.entryNumber)),
    // Through the same reader, so a publish transaction snapshots what it locked.
    totalsInSqlWith(reader as Parameters<typeof totalsInSqlWith>[0], showId),
    reader
      .select({ categoryId: panelCategories.categoryId, judgeId: panelMembers.userId, judgeName: user.name })
      .from(panelCategories)
      .innerJoin(judgingPanels, eq(judgingPanels.id, panelCategories.panelId))
      .innerJoin(panelMembers, and(eq(panelMembers.panelId, judgingPanels.id), eq(panelMembers.role, "judge")))
      .innerJoin(user, eq(user.id, panelMembers.userId))
      .where(eq(judgingPanels.showId, showId))
      .orderBy(asc(user.name)),
    reader.select({ entryId: judgeSheets.entryId, judgeId: judgeSheets.judgeUserId, status: judgeSheets.status, state: judgeSheets.state, total: judgeSheets.total, sheetId: judgeSheets.scoreSheetId }).from(judgeSheets).where(eq(judgeSheets.showId, showId)),
    reader.select({ id: scoreSheets.id, sheet: scoreSheets.sheet, isDefault: scoreSheets.isDefault }).from(scoreSheets).where(eq(scoreSheets.showId, showId)),
  ]);
  const sheetById = new Map(sheets.map((s) => [s.id, s.sheet]));
  const totalOf = new Map(totals.map((t) => [t.entryId, t]));
  const out: ResultCategory[] = cats.map((c) => ({
    id: c.id, code: c.code, name: c.name, method: c.method,
    judges: [...new Map(panels.filter((p) => p.categoryId === c.id).map((p) => [p.judgeId, { id: p.judgeId, name: p.judgeName }])).values()],
    entries: placed.filter((e) => e.categoryId === c.id && e.entryNumber !== null).map((e) => ({
      entryId: e.id, entryNumber: e.entryNumber!, title: e.title, entrantUserId: e.entrantUserId, quiltingMethod: e.quiltingMethod, division: e.division,
      widthUm: e.measuredWidthUm ?? e.widthUm, lengthUm: e.measuredLengthUm ?? e.lengthUm, sizeFlag: e.sizeFlagReviewedAt ? "" : e.sizeFlag,
      sheets: sheetRows.filter((s) => s.entryId === e.id).map((s) => sheetOf(s.state, s.sheetId ? (sheetById.get(s.sheetId) ?? null) : null, s.status, s.total, s.judgeId)),
      stats: totalOf.get(e.id) ?? null,
    })),
  }));
  const defaultSheet = sheets.find((s) => s.isDefault) ?? sheets[0];
  const sections = new Map<string, string>();
  for (const c of cats) for (const s of sheetById.get(c.scoreSheetId ?? defaultSheet?.id ?? "")?.sections ?? []) sections.set(s.id, s.title);
  return { categories: out, sections: [...sections].map(([id, title]) => ({ id, title })) };
}

async function loadAwards(reader: Pick<Tx, "select">, showId: string) {
  const [defs, picks] = await Promise.all([
    reader.select().from(showAwards).where(eq(showAwards.showId, showId)).orderBy(asc(showAwards.sortOrder), asc(showAwards.createdAt)),
    reader.select({ id: awardPicks.id, awardId: awardPicks.awardId, entryId: awardPicks.entryId, judgeId: awardPicks.judgeUserId, kind: awardPicks.kind, reason: awardPicks.reason, recordedAt: awardPicks.recordedAt }).from(awardPicks).where(eq(awardPicks.showId, showId)).orderBy(asc(awardPicks.recordedAt)),
  ]);
  const awards: AwardDefinition[] = defs.map((d) => ({ id: d.id, name: d.name, kind: d.kind, sponsor: d.sponsor, eligibility: d.eligibility, chooseBy: d.chooseBy, ribbon: d.ribbon, combinesWith: d.combinesWith, keepsCategoryPlace: d.keepsCategoryPlace }));
  return { awards, picks };
}

/** Everything scoring/results.ts needs for one show, plus the sheet sections and the pick rows. */
export async function loadResultsInput(reader: Reader, showId: string) {
  const [rules, cats, awards, overrides, orders] = await Promise.all([
    resultRulesFor(reader, showId),
    loadCategories(reader, showId),
    loadAwards(reader, showId),
    reader.select({ entryId: placementOverrides.entryId, place: placementOverrides.place, honorableMention: placementOverrides.honorableMention, reason: placementOverrides.reason, decidedAt: placementOverrides.decidedAt }).from(placementOverrides).where(eq(placementOverrides.showId, showId)),
    reader.select({ categoryId: tieOrders.categoryId, entryIds: tieOrders.entryIds, reason: tieOrders.reason }).from(tieOrders).where(eq(tieOrders.showId, showId)),
  ]);
  const input: ResultsInput = { rules, categories: cats.categories, overrides, tieOrders: orders, awards: awards.awards, picks: awards.picks.map((p) => ({ awardId: p.awardId, entryId: p.entryId, judgeId: p.judgeId, kind: p.kind, reason: p.reason })) };
  return { input, sections: cats.sections, pickRows: awards.picks };
}

/** The chair's review: ranked categories with scores, spreads, flags and photos; awards; blockers; publications. */
export async function resultsReview(viewer: Viewer, slug: string) {
  const { showId } = await requireShowRole(viewer, slug, ["chair"]);
  const [{ input, sections, pickRows }, [show], publications, judges] = await Promise.all([
    loadResultsInput(db, showId),
    db.select({ id: shows.id, name: shows.name, slug: shows.slug, status: shows.status, timeZone: shows.timeZone }).from(shows).where(eq(shows.id, showId)),
    db.select({ id: resultPublications.id, version: resultPublications.version, reason: resultPublications.reason, publishedAt: resultPublications.publishedAt, unpublishedAt: resultPublications.unpublishedAt, unpublishReason: resultPublications.unpublishReason }).from(resultPublications).where(eq(resultPublications.showId, showId)).orderBy(desc(resultPublications.version)),
    db.selectDistinct({ id: user.id, name: user.name }).from(panelMembers).innerJoin(judgingPanels, eq(judgingPanels.id, panelMembers.panelId)).innerJoin(user, eq(user.id, panelMembers.userId)).where(and(eq(judgingPanels.showId, showId), eq(panelMembers.role, "judge"))).orderBy(asc(user.name)),
  ]);
  const results = assembleResults(input);
  const entryIds = input.categories.flatMap((c) => c.entries.map((e) => e.entryId));
  const photos = entryIds.length ? await db.select({ entryId: entryPhotos.entryId, id: entryPhotos.id }).from(entryPhotos).where(and(inArray(entryPhotos.entryId, entryIds), eq(entryPhotos.view, "full"))) : [];
  const current = publications.find((p) => !p.unpublishedAt) ?? null;
  const mails = current ? await db.select({ sentAt: resultMails.sentAt, error: resultMails.error }).from(resultMails).where(eq(resultMails.publicationId, current.id)) : [];
  const mailStatus = current ? { sent: mails.filter((m) => m.sentAt).length, failed: mails.filter((m) => !m.sentAt).length, lastError: mails.find((m) => !m.sentAt)?.error ?? "" } : null;
  return {
    mailStatus,
    show: show!, rules: input.rules, sections, results, awards: input.awards, picks: pickRows, judges,
    photoOf: Object.fromEntries(photos.map((p) => [p.entryId, p.id])), publications, current,
  };
}
export type ResultsReview = Awaited<ReturnType<typeof resultsReview>>;

/** The chair's current publication (for sending its mails again); 409 when nothing is published. */
export async function currentPublicationForChair(viewer: Viewer, slug: string) {
  const { showId } = await requireShowRole(viewer, slug, ["chair"]);
  const row = await currentPublication(db, showId);
  if (!row) throw conflict("The results are not published, so there are no mails to send.");
  return row;
}

/** Refuses changes to results while they are published or before judging. */
export function assertResultsOpen(status: string) {
  if (status === "results_published") throw conflict("The results are published. Unpublish them (with a reason) before changing anything.");
  if (status !== "judging") throw conflict("Results can be changed once judging has started.");
}

/** Publishes the current results: refused while anything blocks; audited; the mails go after commit. */
export async function publishResults(viewer: Viewer, slug: string, input: { reason: string }, now: Date = new Date()) {
  const { showId } = await requireShowRole(viewer, slug, ["chair"]);
  const publication = await db.transaction(async (tx) => {
    const show = await lockShow(tx, showId);
    if (show.status !== "judging") throw conflict(show.status === "results_published" ? "The results are already published." : "Results are published after judging; this show is not at judging yet.");
    const { input: results } = await loadResultsInput(tx, showId);
    const assembled = assembleResults(results);
    if (assembled.blockers.length) throw conflict(`Not yet: ${assembled.blockers.join(" ")}`, { blockers: assembled.blockers });
    const [last] = await tx.select({ version: resultPublications.version }).from(resultPublications).where(eq(resultPublications.showId, showId)).orderBy(desc(resultPublications.version)).limit(1);
    const version = (last?.version ?? 0) + 1;
    if (version > 1 && input.reason.trim().length < 3) throw conflict("Say why the results go out again (a few words); it goes in the audit log and the entrants' mail.", { reason: ["Give a reason."] });
    const snapshot = snapshotOf(assembled, version, now);
    const [row] = await tx.insert(resultPublications).values({ showId, version, snapshot: sql`${JSON.stringify(snapshot)}::jsonb` as never, reason: input.reason.trim(), publishedBy: viewer.id, publishedAt: now }).returning({ id: resultPublications.id });
    await tx.update(shows).set({ status: "results_published", updatedAt: now }).where(eq(shows.id, showId));
    await writeAudit(tx, { actorUserId: viewer.id, showId, action: "results.published", subjectType: "result_publication", subjectId: row!.id, before: { status: show.status }, after: { version, reason: input.reason.trim(), entries: snapshot.categories.reduce((n, c) => n + c.entries.length, 0) } });
    return { id: row!.id, version };
  });
  return publication;
}

/** Takes the results down (the public page and entrants see nothing again); the show goes back to judging. */
export async function unpublishResults(viewer: Viewer, slug: string, input: { reason: string }, now: Date = new Date()) {
  const { showId } = await requireShowRole(viewer, slug, ["chair"]);
  return db.transaction(async (tx) => {
    const show = await lockShow(tx, showId);
    const [current] = await tx.select({ id: resultPublications.id, version: resultPublications.version }).from(resultPublications).where(and(eq(resultPublications.showId, showId), isNull(resultPublications.unpublishedAt))).for("update");
    if (!current || show.status !== "results_published") throw conflict("The results are not published, so there is nothing to take down.");
    await tx.update(resultPublications).set({ unpublishedAt: now, unpublishedBy: viewer.id, unpublishReason: input.reason }).where(eq(resultPublications.id, current.id));
    await tx.update(shows).set({ status: "judging", updatedAt: now }).where(eq(shows.id, showId));
    await writeAudit(tx, { actorUserId: viewer.id, showId, action: "results.unpublished", subjectType: "result_publication", subjectId: current.id, before: { version: current.version, status: show.status }, after: { status: "judging", reason: input.reason } });
    return { version: current.version };
  });
}
