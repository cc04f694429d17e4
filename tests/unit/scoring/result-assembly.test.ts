// scoring/results.ts on its own: a show's categories, rules, chair's changes and awards in, the
// ranked and placed results out. Entry statistics are computed here with simple-statistics (a
// reference library), not with the module under test.
import { describe, expect, it } from "vitest";
import { mean, median } from "simple-statistics";
import type { AwardDefinition } from "@/scoring/awards";
import {
  assembleResults, changedEntrants, DEFAULT_RESULT_RULES, isAwarded, resultRulesOf, resultWords, snapshotOf,
  type ResultCategory, type ResultEntry, type ResultRules, type ResultsInput,
} from "@/scoring/results";

const JUDGES = [{ id: "j1", name: "Judge Ash" }, { id: "j2", name: "Judge Birch" }];

/** An entry judged by j1 and j2 with these totals (null: that judge's sheet is not submitted). */
function entry(n: number, totals: (number | null)[], opts: { workmanship?: number[]; entrant?: string; discuss?: boolean } = {}): ResultEntry {
  const given = totals.filter((t): t is number => t !== null);
  return {
    entryId: `e${n}`, entryNumber: n, title: `Quilt ${n}`, entrantUserId: opts.entrant ?? `u${n}`, quiltingMethod: "hand", division: "open",
    widthUm: 1_524_000, lengthUm: 1_828_800, sizeFlag: "",
    sheets: totals.map((t, i) => ({
      judgeId: JUDGES[i]!.id, submitted: t !== null, total: t, sectionTotals: { workmanship: opts.workmanship?.[i] ?? null },
      sort: null, rank: null, discuss: Boolean(opts.discuss && i === 0),
    })),
    stats: given.length
      ? { count: given.length, mean: mean(given), median: median(given), spread: Math.max(...given) - Math.min(...given), sampleSd: null, z: null }
      : null,
  };
}

const category = (entries: ResultEntry[], over: Partial<ResultCategory> = {}): ResultCategory => ({ id: "c1", code: "10", name: "Pieced", method: "points", judges: JUDGES, entries, ...over });
const input = (cats: ResultCategory[], over: Partial<ResultsInput> = {}, rules: Partial<ResultRules> = {}): ResultsInput => ({
  rules: resultRulesOf(rules), categories: cats, overrides: [], tieOrders: [], awards: [], picks: [], ...over,
});
const placesOf = (r: ReturnType<typeof assembleResults>, c = 0) => r.categories[c]!.entries.map((o) => [o.entry.entryNumber, o.placeLabel, o.honorableMention ? "HM" : o.ribbon?.name ?? null]);

describe("ranking by the judges' mean", () => {
  it("averages two judges as a published show did: 94/96 → 95, 88/93 → 90.5, 79/85 → 82, and places them in that order", () => {
    // quiltingtales.blogspot.com/2016/10/three-quilts.html (a show's published two-judge scores).
    const r = assembleResults(input([category([entry(3, [79, 85]), entry(1, [94, 96]), entry(2, [88, 93])])]));
    const cat = r.categories[0]!;
    expect(cat.entries.map((o) => [o.entry.entryNumber, o.score])).toEqual([[1, 95], [2, 90.5], [3, 82]]);
    // The default ribbons, US custom: 1st blue, 2nd red (common practice); 3rd yellow (from memory).
    expect(placesOf(r)).toEqual([[1, "1st", "Blue"], [2, "2nd", "Red"], [3, "3rd", "Yellow"]]);
    expect(r.blockers).toEqual([]);
  });

  it("takes ribbon names and colours from the show's rules, nothing built in", () => {
    const ribbons = { places: [{ name: "Gold", colour: "#ca8a04" }, { name: "Silver", colour: "#9ca3af" }, { name: "Bronze", colour: "#b45309" }], honorableMention: { name: "Lilac", colour: "#c4b5fd" } };
    const r = assembleResults(input([category([entry(1, [90, 90]), entry(2, [80, 80]), entry(3, [70, 70]), entry(4, [60, 60])])], {}, { ribbons, honorableMentions: 1 }));
    expect(placesOf(r)).toEqual([[1, "1st", "Gold"], [2, "2nd", "Silver"], [3, "3rd", "Bronze"], [4, null, "HM"]]);
    expect(r.categories[0]!.entries[3]!.ribbon).toEqual({ name: "Lilac", colour: "#c4b5fd" });
  });

  it("shows a tie that no tie-break settles as standard competition ranking, 1224", () => {
    // Standard competition ranking ("1224"): equal scores share the rank, the next rank skips.
    // Judges' firsts: j1 gives 92 to entry 2 and entry 3 alike, j2 gives 90 to both: the votes tie too.
    const r = assembleResults(input([category([entry(1, [95, 95]), entry(2, [92, 90]), entry(3, [92, 90]), entry(4, [70, 70])])], {}, { tieBreaks: [{ kind: "firstPlaceVotes" }] }));
    expect(r.categories[0]!.entries.map((o) => o.ranked.rank)).toEqual([1, 2, 2, 4]);
    expect(r.categories[0]!.tiedForPlace).toEqual([["e2", "e3"]]);
  });

  it("applies the tie-break chain in order: the workmanship section first, then votes, then the chair's order", () => {
    const tied = () => [entry(1, [90, 88], { workmanship: [30, 30] }), entry(2, [88, 90], { workmanship: [34, 34] })];
    const section = { kind: "section" as const, sectionId: "workmanship", label: "Workmanship" };
    // Same mean (89); entry 2's workmanship (34) beats entry 1's (30).
    let r = assembleResults(input([category(tied())], {}, { tieBreaks: [section, { kind: "firstPlaceVotes" }, { kind: "chair" }] }));
    expect(placesOf(r).slice(0, 2)).toEqual([[2, "1st", "Blue"], [1, "2nd", "Red"]]);
    expect(r.categories[0]!.entries[0]!.ranked.decidedBy).toBe("The higher Workmanship score");
    // Equal workmanship and one first place each: the chair's recorded order decides.
    const even = [entry(1, [90, 88], { workmanship: [30, 30] }), entry(2, [88, 90], { workmanship: [30, 30] })];
    r = assembleResults(input([category(even)], { tieOrders: [{ categoryId: "c1", entryIds: ["e2", "e1"], reason: "Chair's call." }] }, { tieBreaks: [section, { kind: "firstPlaceVotes" }, { kind: "chair" }] }));
    expect(placesOf(r)).toEqual([[2, "1st", "Blue"], [1, "2nd", "Red"]]);
    expect(r.categories[0]!.entries[0]!.ranked.decidedBy).toBe("The chair's decision");
    // Without the chair's order the tie stays, and both share 1st.
    r = assembleResults(input([category(even)], {}, { tieBreaks: [section, { kind: "firstPlaceVotes" }, { kind: "chair" }] }));
    expect(r.categories[0]!.entries.map((o) => o.placeLabel)).toEqual(["1st", "1st"]);
  });

  it("withholds a ribbon no entry earns under the show's minimum score", () => {
    // Minimum scores per place: exact cut-offs vary by show (common practice; none published found).
    const r = assembleResults(input([category([entry(1, [91, 93]), entry(2, [84, 86]), entry(3, [70, 72])])], {}, { minimumScores: [90, 80, 75] }));
    expect(placesOf(r)).toEqual([[1, "1st", "Blue"], [2, "2nd", "Red"], [3, null, null]]);
    expect(r.categories[0]!.notAwarded).toMatchObject([{ place: 3, why: "minimum" }]);
  });

  it("gives only 1st in a category of three or fewer (one show's rule)", () => {
    const r = assembleResults(input([category([entry(1, [90, 90]), entry(2, [80, 80]), entry(3, [70, 70])])], {}, { sizeRules: [{ maxEntries: 3, places: 1 }] }));
    expect(placesOf(r)).toEqual([[1, "1st", "Blue"], [2, null, null], [3, null, null]]);
  });

  it("gives no 3rd after a tie for 2nd (one guild's ribbon sheet)", () => {
    const r = assembleResults(input([category([entry(1, [95, 95]), entry(2, [85, 85]), entry(3, [85, 85]), entry(4, [75, 75])])], {}, { tieBreaks: [], ties: "shareWithinCount" }));
    expect(placesOf(r)).toEqual([[1, "1st", "Blue"], [2, "2nd", "Red"], [3, "2nd", "Red"], [4, null, null]]);
  });
});

describe("the chair's changes, flags and blockers", () => {
  it("shows a changed placement with its reason beside the proposal", () => {
    const overrides = [{ entryId: "e4", place: null, honorableMention: true, reason: "A mention for the hand-quilted border." }];
    const r = assembleResults(input([category([entry(1, [90, 90]), entry(2, [80, 80]), entry(3, [70, 70]), entry(4, [60, 60])])], { overrides }));
    const o = r.categories[0]!.entries[3]!;
    expect(o.proposed).toMatchObject({ place: null, honorableMention: false });
    expect([o.place, o.honorableMention, o.ribbon?.name]).toEqual([null, true, "Green"]);
    expect(o.text).toBe("Honorable mention, changed by the chair: A mention for the hand-quilted border.");
  });

  it("warns when a change makes two entries hold one place", () => {
    const overrides = [{ entryId: "e2", place: 1, honorableMention: false, reason: "Judges' recount." }];
    const r = assembleResults(input([category([entry(1, [90, 90]), entry(2, [80, 80])])], { overrides }));
    expect(r.categories[0]!.entries.map((o) => o.placeLabel)).toEqual(["1st", "1st"]);
    expect(r.warnings).toEqual(["Category 10: entry 2 and entry 1 hold 1st; the chair changed entry 2."]);
  });

  it("blocks publishing while a judge's sheet is missing, naming the entry and the judge", () => {
    const r = assembleResults(input([category([entry(1, [90, 90]), entry(2, [80, null])])]));
    expect(r.categories[0]!.missing).toEqual([{ entryNumber: 2, judge: "Judge Birch" }]);
    expect(r.blockers).toEqual(["Category 10: 1 sheet not submitted (entry 2, Judge Birch)."]);
  });

  it("flags judges far apart (at the show's spread), and a judge's request to discuss", () => {
    const r = assembleResults(input([category([entry(1, [95, 84]), entry(2, [80, 78], { discuss: true })])], {}, { spreadFlag: 10 }));
    expect(r.categories[0]!.entries[0]!.flags).toContain("Judges 11 points apart");
    expect(r.categories[0]!.entries[1]!.flags).toContain("A judge asked to discuss it");
    expect(r.categories[0]!.entries[1]!.flags.join(" ")).not.toMatch(/points apart/);
  });
});

describe("awards in the results", () => {
  const bos: AwardDefinition = { id: "bos", name: "Best of Show", kind: "best_of_show", sponsor: "", eligibility: { categoryWinnersOnly: true }, chooseBy: "chair", ribbon: { name: "Purple rosette", colour: "#6b21a8" }, combinesWith: [], keepsCategoryPlace: true };

  it("lists the award on the winning entry; with 'keeps its category place' off, the next entry moves up", () => {
    const cats = [category([entry(1, [95, 95]), entry(2, [85, 85]), entry(3, [75, 75]), entry(4, [65, 65])])];
    const picks = [{ awardId: "bos", entryId: "e1", judgeId: null, kind: "choice" as const, reason: "" }];
    let r = assembleResults(input(cats, { awards: [bos], picks }));
    expect(r.categories[0]!.entries[0]!.awards.map((a) => a.name)).toEqual(["Best of Show"]);
    expect(placesOf(r)[0]).toEqual([1, "1st", "Blue"]);
    r = assembleResults(input(cats, { awards: [{ ...bos, keepsCategoryPlace: false }], picks }));
    expect(placesOf(r)).toEqual([[1, null, null], [2, "1st", "Blue"], [3, "2nd", "Red"], [4, "3rd", "Yellow"]]);
  });

  it("refuses an award to an entry that is not eligible, and says so as a blocker", () => {
    const picks = [{ awardId: "bos", entryId: "e2", judgeId: null, kind: "choice" as const, reason: "" }];
    const r = assembleResults(input([category([entry(1, [95, 95]), entry(2, [85, 85])])], { awards: [bos], picks }));
    expect(r.awards[0]!.winners).toEqual([]);
    expect(r.blockers).toEqual(["Best of Show: entry 2 did not win 1st in its category; Best of Show goes to a category winner."]);
  });
});

describe("rules, words and publications", () => {
  it("fills what the show has not set from the defaults", () => {
    expect(resultRulesOf(null)).toEqual(DEFAULT_RESULT_RULES);
    const partial = resultRulesOf({ places: 2, ribbons: { honorableMention: { name: "Pink", colour: "#f9a8d4" } } as ResultRules["ribbons"] });
    expect(partial.places).toBe(2);
    expect(partial.tieBreaks).toEqual(DEFAULT_RESULT_RULES.tieBreaks);
    expect(partial.ribbons.places).toEqual(DEFAULT_RESULT_RULES.ribbons.places);
    expect(partial.ribbons.honorableMention.name).toBe("Pink");
  });

  it("says each result in plain words", () => {
    const blue = { name: "Blue", colour: "#1d4ed8" };
    expect(resultWords({ placeLabel: "1st", honorableMention: false, ribbon: blue, awards: [{ name: "Best of Show", ribbon: blue }] })).toBe("1st place (Blue) · Best of Show");
    expect(resultWords({ placeLabel: null, honorableMention: true, ribbon: { name: "Green", colour: "#15803d" }, awards: [] })).toBe("Honorable mention (Green)");
    expect(resultWords({ placeLabel: null, honorableMention: false, ribbon: null, awards: [] })).toBe("No ribbon");
  });

  it("keeps no scores and no judges in a publication, and finds the entrants a correction changes", () => {
    const cats = [category([entry(1, [95, 95], { entrant: "wren" }), entry(2, [85, 85], { entrant: "sol" }), entry(3, [75, 75], { entrant: "wren" }), entry(4, [65, 65], { entrant: "ida" })])];
    const first = snapshotOf(assembleResults(input(cats)), 1, new Date("2026-10-03T18:00:00Z"));
    const text = JSON.stringify(first);
    expect(text).not.toMatch(/Judge Ash|Judge Birch|"score"|"mean"|95|85/);
    expect(first.categories[0]!.entries.filter(isAwarded).map((e) => e.entryNumber)).toEqual([1, 2, 3]);
    // Sol's 2nd becomes a mention: only Sol's result changes (the others keep theirs).
    const overrides = [{ entryId: "e2", place: null, honorableMention: true, reason: "Moved to a mention." }];
    const second = snapshotOf(assembleResults(input(cats, { overrides })), 2, new Date("2026-10-03T19:00:00Z"));
    expect([...changedEntrants(first, second)]).toEqual(["sol"]);
    expect(changedEntrants(null, first)).toEqual(new Set(["wren", "sol", "ida"]));
  });
});
