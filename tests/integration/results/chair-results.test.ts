// The chair's side of results against the real database: the rules saved and used, a placement
// changed with a reason (audited), a tie ordered by the chair, awards with votes and a tied vote,
// combinations refused, publishing blocked by missing sheets, publish / unpublish / republish
// audited, and nothing changeable while published.
import { describe, expect, it } from "vitest";
import { and, asc, eq, like } from "drizzle-orm";
import { db } from "@/db/client";
import { auditLog, judgeSheets, judgingPanels, panelCategories, panelMembers, resultPublications, shows } from "@/db/schema";
import { clearPlacement, overridePlacement, recordPick, saveAward, saveResultRules, saveTieOrder } from "@/db/queries/result-changes";
import { publishResults, resultsReview, unpublishResults } from "@/db/queries/results";
import { changeShowStatus } from "@/db/queries/settings";
import { resultRulesSchema } from "@/lib/schemas/results";
import { DEFAULT_RESULT_RULES } from "@/scoring/results";
import { emptySheet } from "@/scoring/sheet-sync";
import { grantRole, makeCategory, makeEntry, makeShow, makeUser } from "../../helpers/factories";
import { viewerOf } from "../entries/helpers";

async function judgedShow(scores: [number, number | null][]) {
  const show = await makeShow({ status: "judging" });
  const [chair, a, b, entrant] = await Promise.all([makeUser({ name: "Chair Wren" }), makeUser({ name: "Judge Ash" }), makeUser({ name: "Judge Birch" }), makeUser()]);
  await grantRole(chair.id, show.id, "chair");
  const cat = await makeCategory(show.id, { code: "10", name: "Pieced" });
  const [panel] = await db.insert(judgingPanels).values({ showId: show.id, name: "P" }).returning();
  await db.insert(panelMembers).values([{ panelId: panel!.id, userId: a.id, role: "judge" }, { panelId: panel!.id, userId: b.id, role: "judge" }]);
  await db.insert(panelCategories).values({ panelId: panel!.id, categoryId: cat.id });
  const entries = [];
  for (const [x, y] of scores) {
    const e = await makeEntry(show.id, entrant.id, { categoryId: cat.id, categoryState: "decided", paidAt: new Date(), quiltingMethod: "hand" });
    entries.push(e);
    const put = (judge: string, total: number) => db.insert(judgeSheets).values({ showId: show.id, entryId: e.id, judgeUserId: judge, status: "submitted", state: { ...emptySheet(), status: "submitted" }, total: { total, complete: true, percent: total } });
    await put(a.id, x);
    if (y !== null) await put(b.id, y);
  }
  return { show, chair: await viewerOf(chair), judges: [a, b], cat, entries };
}

const rules = (over: Partial<typeof DEFAULT_RESULT_RULES>) => resultRulesSchema.parse({ ...DEFAULT_RESULT_RULES, ...over });
const audits = (showId: string) => db.select({ action: auditLog.action, after: auditLog.after }).from(auditLog).where(and(eq(auditLog.showId, showId), like(auditLog.action, "results.%"))).orderBy(asc(auditLog.id));

describe("placements and the chair's changes", () => {
  it("uses the saved rules (a category of 3 gets 1st only, as one guild's ribbon sheet has it) and records a changed placement with its reason", async () => {
    const { show, chair, entries } = await judgedShow([[90, 92], [85, 87], [80, 82]]);
    await saveResultRules(chair, show.slug, rules({ sizeRules: [{ maxEntries: 3, places: 1 }] }));
    let [cat] = (await resultsReview(chair, show.slug)).results.categories;
    expect(cat!.entries.map((e) => e.placeLabel)).toEqual(["1st", null, null]);
    await overridePlacement(chair, show.slug, { entryId: entries[1]!.id, place: null, honorableMention: true, reason: "Judges' discretion: a mention for the border." });
    [cat] = (await resultsReview(chair, show.slug)).results.categories;
    expect(cat!.entries[1]!.honorableMention).toBe(true);
    expect(cat!.entries[1]!.proposed.honorableMention).toBe(false);
    expect(cat!.entries[1]!.text).toContain("Judges' discretion");
    await clearPlacement(chair, show.slug, { entryId: entries[1]!.id, reason: "Mentions are not given at this show." });
    [cat] = (await resultsReview(chair, show.slug)).results.categories;
    expect(cat!.entries[1]!.honorableMention).toBe(false);
    expect((await audits(show.id)).map((a) => a.action)).toEqual(["results.rules_saved", "results.placement_changed", "results.placement_restored"]);
  });

  it("orders a tie left after every tie-break as the chair decides", async () => {
    // 90/92 and 92/90: same mean, each judge's first place differs → still tied.
    const { show, chair, cat, entries } = await judgedShow([[90, 92], [92, 90], [80, 82]]);
    let review = await resultsReview(chair, show.slug);
    expect(review.results.categories[0]!.tiedForPlace).toHaveLength(1);
    await saveTieOrder(chair, show.slug, { categoryId: cat.id, entryIds: [entries[1]!.id, entries[0]!.id], reason: "Chair's decision after looking at both again." });
    review = await resultsReview(chair, show.slug);
    const byId = new Map(review.results.categories[0]!.entries.map((e) => [e.entry.entryId, e]));
    expect(byId.get(entries[1]!.id)!.placeLabel).toBe("1st");
    expect(byId.get(entries[0]!.id)!.placeLabel).toBe("2nd");
    expect(byId.get(entries[1]!.id)!.ranked.decidedBy).toBe("The chair's decision");
  });
});

describe("show-wide awards", () => {
  it("tallies the judges' votes for Best of Show among category winners, and a tie waits for the chair", async () => {
    const { show, chair, judges, entries } = await judgedShow([[90, 92], [85, 87]]);
    const { id } = await saveAward(chair, show.slug, { name: "Best of Show", kind: "best_of_show", sponsor: "", chooseBy: "judges_vote", ribbon: { name: "Purple rosette", colour: "#6b21a8" }, eligibility: { categoryWinnersOnly: true }, combinesWith: [], keepsCategoryPlace: true });
    await recordPick(chair, show.slug, { awardId: id, entryId: entries[0]!.id, judgeUserId: judges[0]!.id, reason: "" });
    await recordPick(chair, show.slug, { awardId: id, entryId: entries[1]!.id, judgeUserId: judges[1]!.id, reason: "" });
    let review = await resultsReview(chair, show.slug);
    // Entry 2 is not a category winner, so its vote is refused and entry 1 wins nothing yet: tie 1–1.
    expect(review.results.awards[0]!.winners).toEqual([]);
    expect(review.results.blockers.join(" ")).toMatch(/tied/);
    await recordPick(chair, show.slug, { awardId: id, entryId: entries[0]!.id, judgeUserId: "", reason: "" });
    review = await resultsReview(chair, show.slug);
    expect(review.results.awards[0]!.winners.map((w) => w.entryId)).toEqual([entries[0]!.id]);
    expect(review.results.categories[0]!.entries[0]!.awards.map((a) => a.name)).toEqual(["Best of Show"]);
  });

  it("refuses an entry holding two awards the show does not allow together, until they are allowed", async () => {
    const { show, chair, entries } = await judgedShow([[90, 92], [85, 87]]);
    const base = { sponsor: "", chooseBy: "chair" as const, ribbon: { name: "Gold", colour: "#ca8a04" }, eligibility: {}, combinesWith: [], keepsCategoryPlace: true };
    const bos = await saveAward(chair, show.slug, { ...base, name: "Best of Show", kind: "best_of_show" });
    const hand = await saveAward(chair, show.slug, { ...base, name: "Best hand quilting", kind: "best_hand_quilting", eligibility: { quiltingMethods: ["hand"] } });
    for (const awardId of [bos.id, hand.id]) await recordPick(chair, show.slug, { awardId, entryId: entries[0]!.id, judgeUserId: "", reason: "" });
    expect((await resultsReview(chair, show.slug)).results.blockers.join(" ")).toMatch(/does not allow together/);
    await saveAward(chair, show.slug, { ...base, id: hand.id, name: "Best hand quilting", kind: "best_hand_quilting", eligibility: { quiltingMethods: ["hand"] }, combinesWith: [bos.id] });
    const review = await resultsReview(chair, show.slug);
    expect(review.results.blockers).toEqual([]);
    // Kept symmetric: Best of Show now lists the hand-quilting award too.
    expect(review.awards.find((a) => a.id === bos.id)!.combinesWith).toEqual([hand.id]);
  });
});

describe("publishing", () => {
  it("is blocked while a sheet is missing, with the entry and judge named", async () => {
    const { show, chair } = await judgedShow([[90, 92], [85, null]]);
    await expect(publishResults(chair, show.slug, { reason: "" })).rejects.toThrow(/1 sheet not submitted \(entry \d+, Judge Birch\)/);
    expect(await db.select().from(resultPublications).where(eq(resultPublications.showId, show.id))).toEqual([]);
  });

  it("publishes, locks changes, unpublishes and republishes with reasons, all audited", async () => {
    const { show, chair, entries } = await judgedShow([[90, 92], [85, 87]]);
    await expect(changeShowStatus(chair, show.slug, { status: "results_published" })).rejects.toThrow(/from Results/);
    const first = await publishResults(chair, show.slug, { reason: "" });
    expect(first.version).toBe(1);
    const [row] = await db.select({ status: shows.status }).from(shows).where(eq(shows.id, show.id));
    expect(row!.status).toBe("results_published");
    await expect(overridePlacement(chair, show.slug, { entryId: entries[1]!.id, place: 1, honorableMention: false, reason: "late change" })).rejects.toThrow(/Unpublish/);
    await expect(unpublishResults(chair, show.slug, { reason: "Wrong ribbon for entry 2." })).resolves.toEqual({ version: 1 });
    await overridePlacement(chair, show.slug, { entryId: entries[1]!.id, place: 1, honorableMention: false, reason: "Judges re-inspected; shared 1st." });
    await expect(publishResults(chair, show.slug, { reason: "" })).rejects.toThrow(/Say why/);
    const second = await publishResults(chair, show.slug, { reason: "Corrected 2nd place." });
    expect(second.version).toBe(2);
    const pubs = await db.select().from(resultPublications).where(eq(resultPublications.showId, show.id)).orderBy(asc(resultPublications.version));
    expect(pubs.map((p) => [p.version, p.unpublishedAt === null, p.unpublishReason])).toEqual([[1, false, "Wrong ribbon for entry 2."], [2, true, ""]]);
    const snapshotPlaces = pubs[1]!.snapshot.categories[0]!.entries.map((e) => e.placeLabel);
    expect(snapshotPlaces).toEqual(["1st", "1st"]);
    expect(JSON.stringify(pubs[1]!.snapshot)).not.toMatch(/"mean"|"score"/);
    expect((await audits(show.id)).map((a) => a.action)).toEqual(["results.published", "results.unpublished", "results.placement_changed", "results.published"]);
  });

  it("refuses someone who is not the show's chair", async () => {
    const { show, judges } = await judgedShow([[90, 92]]);
    await expect(publishResults(await viewerOf(judges[0]!), show.slug, { reason: "" })).rejects.toThrow();
    await expect(resultsReview(await viewerOf(judges[0]!), show.slug)).rejects.toThrow();
  });
});
