// Last year's show for the demo, already judged and its results published, so the results side
// can be tried at once: the public results page, each entrant's results and critique on "My
// entries", and the chair's Results page. The same invented guild and people as this year's show
// (db/seed/demo-data.ts); its quilts are this year's scenario re-titled, with photos of their own.
// Marks are drawn from a seeded generator; totals, ranks, places and awards are computed by the
// same pure code the server uses (scoring/results.ts), and the publication is its snapshot.
import { randomUUID } from "node:crypto";
import { eq, inArray } from "drizzle-orm";
import * as schema from "../schema";
import { photoSizeFor, renderPatchwork } from "../../storage/patchwork";
import type { AwardDefinition, AwardPickInput } from "../../scoring/awards";
import { factsOf, placeEntry, prepareSet, type ShowCategory } from "../../scoring/category-sets";
import type { JudgeTotal } from "../../scoring/ranking";
import { categoryTotals } from "../totals";
import { assembleResults, resultRulesOf, snapshotOf, type ResultCategory, type ResultEntry, type ResultsInput, type TieOrderInput } from "../../scoring/results";
import { sheetTotal, type Mark, type ScoreSheet } from "../../scoring/score-sheets";
import { GUILD_STARTER } from "../../scoring/starter-sets";
import { DEMO_SETTINGS, DEMO_SHOW, demoScenario, mulberry32 } from "./demo-data";
import { DEMO_QUICK_PHRASES, DEMO_RESULT_RULES, DEMO_SHEET } from "./demo-judging";
import { mapLimit, photoKey, type SeedDemoOptions } from "./seed-demo";

export const LAST_YEAR_SHOW = {
  ...DEMO_SHOW,
  slug: "pennywhistle-falls-quilt-show-2026",
  name: "Pennywhistle Falls Quilt Show 2026",
  status: "results_published" as const,
  entryOpensAt: "2026-05-01T14:00:00.000Z",
  entryClosesAt: "2026-08-01T04:59:00.000Z",
  dropOffStartsAt: "2026-09-08T15:00:00.000Z",
  dropOffEndsAt: "2026-09-09T23:00:00.000Z",
  judgingStartsAt: "2026-09-10T13:30:00.000Z",
  judgingEndsAt: "2026-09-11T22:00:00.000Z",
  showOpensAt: "2026-09-12T14:00:00.000Z",
  showClosesAt: "2026-09-14T21:00:00.000Z",
  pickUpStartsAt: "2026-09-14T21:30:00.000Z",
  pickUpEndsAt: "2026-09-14T23:30:00.000Z",
};
const PUBLISHED_AT = new Date("2026-09-12T02:00:00.000Z");
const QUILTS = 30;
const JUDGES = ["judge1@ribbonry.test", "judge2@ribbonry.test"];
const TEAM: [string, "chair" | "judge" | "scribe" | "intake"][] = [["chair@ribbonry.test", "chair"], ...JUDGES.map((e): [string, "judge"] => [e, "judge"]), ["scribe1@ribbonry.test", "scribe"], ["intake@ribbonry.test", "intake"]];

// Invented titles, none of them this year's.
const TITLES = [
  "Mill Pond at Dusk", "Shelf of Jars", "Barn Swallow Weather", "Creek Stones", "Late Plums", "Lantern Row", "Hayloft Light", "Second Frost",
  "Orchard Ladder", "Window Box", "Cedar Smoke", "Porch Swing", "Fieldstone Wall", "River Ferry", "Wren House", "Apple Cellar",
  "Sunday Tablecloth", "Kettle Steam", "Fence Line", "Granary Stars", "Foxglove Path", "Quarry Blue", "Woodpile", "Bramble Gate",
  "Harvest Moon Rising", "Picket Shadows", "Goose Tracks Home", "Chimney Swifts", "Rain Barrel", "Falls Overlook",
];
const TO_IMPROVE = ["Check that the corners lie flat.", "A few points are cut off in the border.", "The binding could be filled more firmly.", "More quilting in the open areas would help."];

function marksFor(sheet: ScoreSheet, quality: number, rand: () => number, wholecloth: boolean): Record<string, Mark> {
  const marks: Record<string, Mark> = {};
  for (const c of sheet.sections.flatMap((s) => s.criteria)) {
    if (wholecloth && c.allowNotApplicable) marks[c.id] = { kind: "na" };
    else if (c.scale.kind === "words") {
      const levels = c.scale.levels;
      const at = Math.min(levels.length - 1, Math.max(0, Math.round((1 - quality) * levels.length + (rand() - 0.5))));
      marks[c.id] = { kind: "word", level: levels[at]!.label };
    } else marks[c.id] = { kind: "points", points: Math.max(0, Math.min(c.maxPoints, Math.round(c.maxPoints * (quality + (rand() - 0.5) * 0.12)))) };
  }
  return marks;
}

function stateOf(marks: Record<string, Mark>, comment: string, at: number) {
  const field = (value: unknown, seq: number) => ({ value, version: 1, deviceId: "demo-tablet", seq, changeKey: randomUUID() });
  const fields: Record<string, unknown> = Object.fromEntries(Object.entries(marks).map(([id, m], i) => [`mark:${id}`, field(m, at + i)]));
  fields["comment:overall"] = field(comment, at + 99);
  return { status: "submitted" as const, version: Object.keys(fields).length + 1, fields, conflicts: [] } as never;
}

/** Seeds last year's published show unless its slug is there; needs this year's demo people. */
export async function seedLastYear(opts: SeedDemoOptions): Promise<{ created: boolean }> {
  const { db, putPhoto } = opts;
  const log = opts.log ?? (() => {});
  if ((await db.select({ id: schema.shows.id }).from(schema.shows).where(eq(schema.shows.slug, LAST_YEAR_SHOW.slug))).length) return { created: false };
  const scenario = demoScenario();
  const emails = [...new Set([...TEAM.map(([e]) => e), ...scenario.quilts.map((q) => q.entrantEmail)])];
  const people = await db.select({ id: schema.user.id, email: schema.user.email, name: schema.user.name }).from(schema.user).where(inArray(schema.user.email, emails));
  const idOf = new Map(people.map((p) => [p.email, p.id]));
  const chairId = idOf.get("chair@ribbonry.test");
  if (!chairId || JUDGES.some((e) => !idOf.has(e))) {
    log("last year's show needs the demo people; seed this year's show first");
    return { created: false };
  }

  const rand = mulberry32(2026);
  const showId = randomUUID();
  const createdAt = new Date(LAST_YEAR_SHOW.entryOpensAt);
  const categoryIds = new Map(GUILD_STARTER.rules.map((r) => [r.id, randomUUID()] as const));
  const set: ShowCategory[] = GUILD_STARTER.rules.map((r) => ({ ...r, id: categoryIds.get(r.id)! }));
  const prepared = prepareSet(set, { overlap: GUILD_STARTER.overlap });
  const sheetId = randomUUID();

  // This year's judged, sent quilts, re-titled; only those the rules place in one category.
  const entryRows: (typeof schema.entries.$inferInsert)[] = [];
  for (const q of scenario.quilts) {
    if (entryRows.length === QUILTS) break;
    if (q.status === "draft" || !q.judged || !idOf.has(q.entrantEmail)) continue;
    const row = {
      id: randomUUID(), showId, entrantUserId: idOf.get(q.entrantEmail)!, entryNumber: 101 + entryRows.length, title: TITLES[entryRows.length]!,
      widthUm: q.widthUm, lengthUm: q.lengthUm, techniques: q.techniques, madeBy: q.madeBy, quiltedBy: q.quiltedBy, quiltedForHire: q.quiltedForHire,
      quiltingMethod: q.quiltingMethod, patternSource: q.patternSource, statement: q.statement, declaredValueCents: q.declaredValueCents, judged: true,
      division: q.division, status: "returned" as const, critiqueRequested: rand() < 0.6, submittedAt: createdAt, paidAt: createdAt, paymentReference: "demo",
      createdAt, updatedAt: new Date(LAST_YEAR_SHOW.pickUpEndsAt),
    };
    const placed = placeEntry(factsOf({ ...row, measuredWidthUm: null, measuredLengthUm: null }, 25_400), { state: "undecided" }, prepared);
    if (placed.outcome.state !== "decided") continue;
    entryRows.push({ ...row, categoryState: "decided", categoryId: placed.outcome.categoryId, categoryReasons: placed.reasons, categoryDecidedAt: createdAt });
  }

  // Every quilt judged by both judges: a quality of its own, each judge a little harder or softer.
  const severity = JUDGES.map(() => (rand() - 0.5) * 0.06);
  const sheetRows: (typeof schema.judgeSheets.$inferInsert)[] = [];
  const resultEntries = new Map<string, ResultEntry>();
  entryRows.forEach((e, i) => {
    const quality = 0.62 + rand() * 0.34;
    const wholecloth = (e.techniques ?? []).includes("wholecloth");
    const sheets = JUDGES.map((email, j) => {
      const marks = marksFor(DEMO_SHEET.sheet, Math.min(1, quality + severity[j]!), rand, wholecloth);
      const total = sheetTotal(DEMO_SHEET.sheet, marks);
      const phrases = [DEMO_QUICK_PHRASES[(i + j) % DEMO_QUICK_PHRASES.length]!, quality < 0.85 ? TO_IMPROVE[(i + 2 * j) % TO_IMPROVE.length]! : "A joy to look at up close."];
      sheetRows.push({ showId, entryId: e.id!, judgeUserId: idOf.get(email)!, scoreSheetId: sheetId, status: "submitted", version: 1, state: stateOf(marks, phrases.join(" "), i * 100), total: { total: total.total, complete: true, percent: total.percent }, submittedAt: new Date(LAST_YEAR_SHOW.judgingStartsAt), updatedAt: new Date(LAST_YEAR_SHOW.judgingStartsAt) });
      return { judgeId: idOf.get(email)!, submitted: true, total: total.total, sectionTotals: Object.fromEntries(total.bySection.map((s) => [s.sectionId, s.total])), sort: null, rank: null, discuss: false };
    });
    resultEntries.set(e.id!, { entryId: e.id!, entryNumber: e.entryNumber!, title: e.title!, entrantUserId: e.entrantUserId, quiltingMethod: e.quiltingMethod!, division: e.division!, widthUm: e.widthUm, lengthUm: e.lengthUm, sizeFlag: "", sheets, stats: null });
  });

  // Totals per category as db/totals.ts computes them, then the results as the server would.
  const judges = JUDGES.map((email) => ({ id: idOf.get(email)!, name: people.find((p) => p.email === email)!.name }));
  const categories: ResultCategory[] = set.flatMap((c) => {
    const mine = [...resultEntries.values()].filter((e) => entryRows.find((r) => r.id === e.entryId)!.categoryId === c.id);
    if (!mine.length) return [{ id: c.id, code: c.code, name: c.name, method: "points" as const, judges, entries: [] }];
    const totals: JudgeTotal[] = mine.flatMap((e) => e.sheets.map((s) => ({ entryId: e.entryId, judgeId: s.judgeId, total: s.total! })));
    const stats = new Map(categoryTotals(c.id, totals).map((t) => [t.entryId, t]));
    const entries = mine.map((e) => ({ ...e, stats: stats.get(e.entryId)! }));
    return [{ id: c.id, code: c.code, name: c.name, method: "points" as const, judges, entries }];
  });
  const awardIds = { bos: randomUUID(), choice: randomUUID() };
  const awards: AwardDefinition[] = [
    { id: awardIds.bos, name: "Best of Show", kind: "best_of_show", sponsor: "", eligibility: { categoryWinnersOnly: true }, chooseBy: "chair", ribbon: { name: "Purple rosette", colour: "#6b21a8" }, combinesWith: [awardIds.choice], keepsCategoryPlace: true },
    { id: awardIds.choice, name: "Judge's choice", kind: "judges_choice", sponsor: "", eligibility: {}, chooseBy: "chair", ribbon: { name: "Teal ribbon", colour: "#0f766e" }, combinesWith: [awardIds.bos], keepsCategoryPlace: true },
  ];
  const rules = resultRulesOf(DEMO_RESULT_RULES);
  const base: ResultsInput = { rules, categories, overrides: [], tieOrders: [], awards: [], picks: [] };
  // Ties no tie-break settles go to the chair, who orders them by entry number here.
  const tieOrders: TieOrderInput[] = assembleResults(base).categories.flatMap((c) =>
    c.tiedForPlace.length ? [{ categoryId: c.category.id, entryIds: c.entries.map((o) => o.entry.entryId), reason: "The chair's decision after looking at both quilts again." }] : [],
  );
  const ranked = assembleResults({ ...base, tieOrders });
  const winners = ranked.categories.flatMap((c) => c.entries.filter((o) => o.place === 1));
  const best = winners.sort((a, b) => (b.score ?? 0) - (a.score ?? 0))[0]!;
  const picks: AwardPickInput[] = [
    { awardId: awardIds.bos, entryId: best.entry.entryId, judgeId: null, kind: "choice", reason: "" },
    ...judges.map((j) => {
      const favourite = [...resultEntries.values()].filter((e) => e.entryId !== best.entry.entryId).sort((a, b) => b.sheets.find((s) => s.judgeId === j.id)!.total! - a.sheets.find((s) => s.judgeId === j.id)!.total!)[0]!;
      return { awardId: awardIds.choice, entryId: favourite.entryId, judgeId: j.id, kind: "choice" as const, reason: "" };
    }),
  ];
  const results = assembleResults({ ...base, tieOrders, awards, picks });
  if (results.blockers.length) throw new Error(`last year's demo results do not add up: ${results.blockers.join(" ")}`);
  const snapshot = snapshotOf(results, 1, PUBLISHED_AT);

  const photoJobs = entryRows.flatMap((e, i) => (["full", "detail"] as const).map((view) => ({ entryId: e.id!, view, seed: 20_260_000 + i * 7, ...photoSizeFor(e.widthUm, e.lengthUm, view), storageKey: photoKey(showId, e.id!, view) })));
  await db.transaction(async (tx) => {
    await tx.insert(schema.shows).values({ ...LAST_YEAR_SHOW, id: showId, ...dates(LAST_YEAR_SHOW), createdAt, updatedAt: PUBLISHED_AT });
    await tx.insert(schema.showRoles).values(TEAM.map(([email, role]) => ({ showId, userId: idOf.get(email)!, role, grantedBy: chairId, createdAt })));
    await tx.insert(schema.showSettings).values({ showId, ...DEMO_SETTINGS, lateFeeFromAt: new Date("2026-07-15T05:00:00.000Z"), quickPhrases: DEMO_QUICK_PHRASES, resultRules: DEMO_RESULT_RULES });
    await tx.insert(schema.showEntryCounters).values({ showId, lastNumber: 100 + entryRows.length });
    await tx.insert(schema.categories).values(set.map((c) => ({ id: c.id, showId, code: c.code, name: c.name, description: c.description ?? "", precedence: c.precedence, conditions: c.conditions, createdAt, updatedAt: createdAt })));
    await tx.insert(schema.entries).values(entryRows);
    await tx.insert(schema.scoreSheets).values({ id: sheetId, showId, name: DEMO_SHEET.name, sheet: DEMO_SHEET.sheet, isDefault: true, createdAt, updatedAt: createdAt });
    const [panel] = await tx.insert(schema.judgingPanels).values({ showId, name: "Panel A", day: "2026-09-10", room: "Fellowship Hall", createdAt }).returning({ id: schema.judgingPanels.id });
    await tx.insert(schema.panelMembers).values([...judges.map((j) => ({ panelId: panel!.id, userId: j.id, role: "judge" as const })), { panelId: panel!.id, userId: idOf.get("scribe1@ribbonry.test")!, role: "scribe" as const }]);
    await tx.insert(schema.panelCategories).values(categories.map((c) => ({ panelId: panel!.id, categoryId: c.id })));
    await tx.insert(schema.judgeSheets).values(sheetRows);
    await tx.insert(schema.showAwards).values(awards.map((a, i) => ({ id: a.id, showId, name: a.name, kind: a.kind, sponsor: a.sponsor, chooseBy: a.chooseBy, ribbon: a.ribbon, eligibility: a.eligibility, combinesWith: [...a.combinesWith], keepsCategoryPlace: a.keepsCategoryPlace, sortOrder: i, createdAt })));
    await tx.insert(schema.awardPicks).values(picks.map((p) => ({ showId, awardId: p.awardId, entryId: p.entryId, judgeUserId: p.judgeId, kind: p.kind, reason: p.reason, recordedBy: chairId, recordedAt: PUBLISHED_AT })));
    if (tieOrders.length) await tx.insert(schema.tieOrders).values(tieOrders.map((t) => ({ showId, categoryId: t.categoryId, entryIds: t.entryIds, reason: t.reason, decidedBy: chairId })));
    const [pub] = await tx.insert(schema.resultPublications).values({ showId, version: 1, snapshot, reason: "", publishedBy: chairId, publishedAt: PUBLISHED_AT }).returning({ id: schema.resultPublications.id });
    await tx.insert(schema.auditLog).values([
      { actorUserId: chairId, showId, action: "show.created", subjectType: "show", subjectId: showId, after: { slug: LAST_YEAR_SHOW.slug, name: LAST_YEAR_SHOW.name }, at: createdAt },
      { actorUserId: chairId, showId, action: "results.published", subjectType: "result_publication", subjectId: pub!.id, after: { version: 1, reason: "", entries: entryRows.length }, at: PUBLISHED_AT },
    ]);
    log(`last year's show: ${entryRows.length} entries judged and published; rendering ${photoJobs.length} photos`);
    const photos = await mapLimit(photoJobs, 4, async (job) => {
      const body = await renderPatchwork({ seed: job.seed, widthPx: job.widthPx, heightPx: job.heightPx, view: job.view });
      await putPhoto(job.storageKey, body, "image/jpeg");
      return { entryId: job.entryId, view: job.view, storageKey: job.storageKey, widthPx: job.widthPx, heightPx: job.heightPx, bytes: body.length, contentType: "image/jpeg", createdAt };
    });
    await tx.insert(schema.entryPhotos).values(photos);
  });
  return { created: true };
}

function dates(s: typeof LAST_YEAR_SHOW) {
  const d = (x: string) => new Date(x);
  return {
    entryOpensAt: d(s.entryOpensAt), entryClosesAt: d(s.entryClosesAt), dropOffStartsAt: d(s.dropOffStartsAt), dropOffEndsAt: d(s.dropOffEndsAt),
    judgingStartsAt: d(s.judgingStartsAt), judgingEndsAt: d(s.judgingEndsAt), showOpensAt: d(s.showOpensAt), showClosesAt: d(s.showClosesAt),
    pickUpStartsAt: d(s.pickUpStartsAt), pickUpEndsAt: d(s.pickUpEndsAt),
  };
}
