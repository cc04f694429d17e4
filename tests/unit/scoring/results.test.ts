// scoring/results.ts directly: judges' sheets in, each category ranked and placed under the show's
// result rules (ribbons, minimum scores, category-size and tie rules, the tie-break chain), the
// chair's changes, show-wide awards, what blocks publishing, and the published snapshot. Entry
// statistics are worked out here with simple-statistics the way db/totals.ts does (submitted sheets
// only; z with each judge's population SD within the category, 0 for a flat judge), not by the
// module under test.
import * as ss from "simple-statistics";
import { describe, expect, it } from "vitest";
import type { AwardDefinition, AwardPickInput } from "@/scoring/awards";
import {
  assembleResults, changedEntrants, DEFAULT_RESULT_RULES, isAwarded, resultRulesOf, resultWords, snapshotOf,
  type JudgingMethodCode, type PublishedEntry, type ResultCategory, type ResultEntry, type ResultRules, type ResultsInput, type ShowResults,
} from "@/scoring/results";

const JUDGES = [{ id: "j-ash", name: "Judge Ash" }, { id: "j-birch", name: "Judge Birch" }, { id: "j-cedar", name: "Judge Cedar" }];
const IN = 25_400; // µm per inch (1 in = 2.54 cm exactly, NIST SP 811)

type Spec = {
  n: number;
  /** Each judge's total, in JUDGES order; null: that judge has no sheet for the entry. */
  totals: (number | null)[];
  /** Judges (indices) whose sheet is saved but not submitted: its total must not count. */
  drafts?: number[];
  work?: (number | null)[];
  ranks?: (number | null)[];
  sort?: ("kept" | "set_aside" | null)[];
  entrant?: string;
  quiltingMethod?: string;
  discuss?: boolean;
  sizeFlag?: string;
};

/** Mean, median, spread, sample SD and z of each entry from its submitted totals (db/totals.ts's figures). */
function withStats(entries: ResultEntry[]): ResultEntry[] {
  const submitted = (e: ResultEntry) => e.sheets.filter((s) => s.submitted && s.total !== null) as { judgeId: string; total: number }[];
  const byJudge = new Map<string, number[]>();
  for (const e of entries) for (const s of submitted(e)) byJudge.set(s.judgeId, [...(byJudge.get(s.judgeId) ?? []), s.total]);
  const zOf = (judgeId: string, x: number) => {
    const mine = byJudge.get(judgeId)!;
    const sd = ss.standardDeviation(mine);
    return sd === 0 ? 0 : ss.zScore(x, ss.mean(mine), sd);
  };
  return entries.map((e) => {
    const rows = submitted(e);
    const xs = rows.map((r) => r.total);
    if (!xs.length) return { ...e, stats: null };
    return {
      ...e,
      stats: {
        count: xs.length, mean: ss.mean(xs), median: ss.median(xs), spread: ss.max(xs) - ss.min(xs),
        sampleSd: xs.length < 2 ? null : ss.sampleStandardDeviation(xs), z: ss.mean(rows.map((r) => zOf(r.judgeId, r.total))),
      },
    };
  });
}

function entryOf(s: Spec): ResultEntry {
  return {
    entryId: `e${s.n}`, entryNumber: s.n, title: `Quilt ${s.n}`, entrantUserId: s.entrant ?? `u${s.n}`, quiltingMethod: s.quiltingMethod ?? "hand", division: "open",
    widthUm: 60 * IN, lengthUm: 80 * IN, sizeFlag: s.sizeFlag ?? "",
    sheets: s.totals.flatMap((t, i) => (t === null && !s.ranks?.[i] && !s.sort?.[i] ? [] : [{
      judgeId: JUDGES[i]!.id, submitted: !s.drafts?.includes(i), total: t, sectionTotals: { workmanship: s.work?.[i] ?? null },
      sort: s.sort?.[i] ?? null, rank: s.ranks?.[i] ?? null, discuss: Boolean(s.discuss && i === 0),
    }])),
    stats: null,
  };
}

function category(specs: Spec[], over: Partial<Omit<ResultCategory, "entries">> & { judgeCount?: number; method?: JudgingMethodCode } = {}): ResultCategory {
  const { judgeCount = 2, ...rest } = over;
  return { id: "c10", code: "10", name: "Pieced", method: "points", judges: JUDGES.slice(0, judgeCount), entries: withStats(specs.map(entryOf)), ...rest };
}

const input = (cats: ResultCategory[], rules: Partial<ResultRules> = {}, over: Partial<Omit<ResultsInput, "rules">> = {}): ResultsInput => ({
  rules: resultRulesOf(rules), categories: cats, overrides: [], tieOrders: [], awards: [], picks: [], ...over,
});
const catOf = (r: ShowResults, i = 0) => r.categories[i]!;
const byNumber = (r: ShowResults, n: number, i = 0) => catOf(r, i).entries.find((o) => o.entry.entryNumber === n)!;
const placesOf = (r: ShowResults, i = 0) => catOf(r, i).entries.map((o) => [o.entry.entryNumber, o.placeLabel]);

// quiltingtales.blogspot.com/2016/10/three-quilts.html: a show's published two-judge scores.
const THREE_QUILTS: Spec[] = [{ n: 3, totals: [79, 85] }, { n: 1, totals: [94, 96] }, { n: 2, totals: [88, 93] }];

describe("ranking by the judges' mean, with the show's ribbons", () => {
  it("two judges 94/96 → 95, 88/93 → 90.5, 79/85 → 82 place 1st, 2nd, 3rd in that order (quiltingtales.blogspot.com 2016)", () => {
    const r = assembleResults(input([category(THREE_QUILTS)]));
    const cat = catOf(r);
    // (94 + 96) / 2 = 95; (88 + 93) / 2 = 90.5; (79 + 85) / 2 = 82: best first whatever the input order.
    expect(cat.entries.map((o) => [o.entry.entryNumber, o.score])).toEqual([[1, 95], [2, 90.5], [3, 82]]);
    expect(cat.entries.map((o) => [o.ranked.rank, o.ranked.displayRank, o.placeLabel, o.place])).toEqual([[1, "1", "1st", 1], [2, "2", "2nd", 2], [3, "3", "3rd", 3]]);
    expect(cat.scoreLabel).toBe("Mean");
    expect(cat.direction).toBe("higherIsBetter");
    expect(r.blockers).toEqual([]);
    expect(r.warnings).toEqual([]);
  });

  it("each place wears the ribbon the rules set for it (the defaults here)", () => {
    const r = assembleResults(input([category(THREE_QUILTS)]));
    const ribbons = DEFAULT_RESULT_RULES.ribbons.places;
    expect(catOf(r).entries.map((o) => o.ribbon)).toEqual([ribbons[0], ribbons[1], ribbons[2]]);
    expect(catOf(r).entries.map((o) => o.honorableMention)).toEqual([false, false, false]);
  });

  it("a show's own ribbon set: four places and a mention, names and colours all from the rules", () => {
    const ribbons = {
      places: [{ name: "Gold", colour: "#ca8a04" }, { name: "Silver", colour: "#9ca3af" }, { name: "Bronze", colour: "#b45309" }, { name: "White", colour: "#ffffff" }],
      honorableMention: { name: "Lilac", colour: "#c4b5fd" },
    };
    const specs: Spec[] = [90, 86, 84, 80, 75, 70].map((t, i) => ({ n: i + 1, totals: [t, t] }));
    const r = assembleResults(input([category(specs)], { places: 4, ribbons, honorableMentions: 1 }));
    expect(catOf(r).entries.map((o) => [o.entry.entryNumber, o.placeLabel, o.honorableMention, o.ribbon])).toEqual([
      [1, "1st", false, ribbons.places[0]], [2, "2nd", false, ribbons.places[1]], [3, "3rd", false, ribbons.places[2]], [4, "4th", false, ribbons.places[3]],
      [5, null, true, ribbons.honorableMention], [6, null, false, null],
    ]);
    expect(snapshotOf(r, 1, new Date(0)).categories[0]!.entries.map(resultWords)).toEqual([
      "1st place (Gold)", "2nd place (Silver)", "3rd place (Bronze)", "4th place (White)", "Honorable mention (Lilac)", "No ribbon",
    ]);
  });

  it("a place with no ribbon set is a problem that blocks publishing", () => {
    const specs: Spec[] = [90, 86, 84, 80].map((t, i) => ({ n: i + 1, totals: [t, t] }));
    const r = assembleResults(input([category(specs)], { places: 4 })); // the default ribbons stop at 3rd
    expect(byNumber(r, 4).placeLabel).toBe("4th");
    expect(byNumber(r, 4).ribbon).toBeNull();
    expect(r.blockers).toEqual(["Category 10: No ribbon is set for 4th place (Result rules)."]);
  });

  it("severity-adjusted ranking uses z, and flags entries the mean would order differently", () => {
    // Judge Ash spreads wide (70, 90, 80: mean 80, population SD √(200/3) ≈ 8.165), Judge Birch
    // narrow (95, 90, 91: mean 92, SD √(14/3) ≈ 2.160). z of entry 1 = (−1.2247 + 1.3887) / 2 ≈ 0.082,
    // entry 2 = (1.2247 − 0.9258) / 2 ≈ 0.149, entry 3 = (0 − 0.4629) / 2 ≈ −0.231: 2, 1, 3.
    // By the mean: 82.5, 90, 85.5: 2, 3, 1. Entries 1 and 3 move.
    const specs: Spec[] = [{ n: 1, totals: [70, 95] }, { n: 2, totals: [90, 90] }, { n: 3, totals: [80, 91] }];
    const adjusted = catOf(assembleResults(input([category(specs)], { rankBy: "adjusted" })));
    expect(adjusted.scoreLabel).toBe("Adjusted (z)");
    expect(adjusted.entries.map((o) => [o.entry.entryNumber, o.placeLabel])).toEqual([[2, "1st"], [1, "2nd"], [3, "3rd"]]);
    expect(adjusted.entries[1]!.score!).toBeCloseTo((-10 / Math.sqrt(200 / 3) + 3 / Math.sqrt(14 / 3)) / 2, 12);
    expect(adjusted.entries.filter((o) => o.flags.includes("Order by the mean differs")).map((o) => o.entry.entryNumber)).toEqual([1, 3]);
    const mean = catOf(assembleResults(input([category(specs)])));
    expect(mean.entries.map((o) => [o.entry.entryNumber, o.placeLabel])).toEqual([[2, "1st"], [3, "2nd"], [1, "3rd"]]);
    expect(mean.entries.filter((o) => o.flags.includes("Severity-adjusted order differs")).map((o) => o.entry.entryNumber)).toEqual([3, 1]);
  });
});

describe("ties: standard competition ranking \"1224\" (Wikipedia \"Ranking\")", () => {
  // 95; 90.5 twice (88/93 and 93/88); 82. No tie-break chain, so the tie stands.
  const specs: Spec[] = [{ n: 1, totals: [94, 96] }, { n: 2, totals: [88, 93] }, { n: 3, totals: [93, 88] }, { n: 4, totals: [79, 85] }];

  it("tied entries share the better rank and the next rank skips: 1, =2, =2, 4", () => {
    const cat = catOf(assembleResults(input([category(specs)], { tieBreaks: [] })));
    expect(cat.entries.map((o) => [o.entry.entryNumber, o.ranked.rank, o.ranked.displayRank, o.ranked.tied])).toEqual([
      [1, 1, "1", false], [2, 2, "=2", true], [3, 2, "=2", true], [4, 4, "4", false],
    ]);
    expect(cat.tiedForPlace).toEqual([["e2", "e3"]]);
  });

  it("a tie for 2nd → no 3rd, so the entry ranked 4th gets nothing (one guild's Ribbons Chair sheet, docsbay.net/ribbons-chair)", () => {
    const cat = catOf(assembleResults(input([category(specs)], { tieBreaks: [] })));
    expect(cat.entries.map((o) => [o.entry.entryNumber, o.placeLabel, o.ribbon?.name ?? null])).toEqual([[1, "1st", "Blue"], [2, "2nd", "Red"], [3, "2nd", "Red"], [4, null, null]]);
    expect(cat.notAwarded.map((n) => [n.placeLabel, n.why])).toEqual([["3rd", "tie"]]);
    expect(cat.entries[1]!.text).toBe("2nd place (shared).");
  });

  it("a tie for 1st → no 3rd either: 1st, 1st, 2nd (same guild sheet)", () => {
    const tie1: Spec[] = [{ n: 1, totals: [94, 96] }, { n: 2, totals: [96, 94] }, { n: 3, totals: [88, 93] }, { n: 4, totals: [79, 85] }];
    const r = assembleResults(input([category(tie1)], { tieBreaks: [] }));
    expect(placesOf(r)).toEqual([[1, "1st"], [2, "1st"], [3, "2nd"], [4, null]]);
    expect(catOf(r).notAwarded.map((n) => n.text)).toEqual(["Entry 1 and entry 2 tied for 1st, so there is no 3rd."]);
    // Under shareAndSkip the same scores give 1st, 1st, 3rd instead: the rule is the show's to set.
    expect(placesOf(assembleResults(input([category(tie1)], { tieBreaks: [], ties: "shareAndSkip" })))).toEqual([[1, "1st"], [2, "1st"], [3, "3rd"], [4, null]]);
  });

  it("a tie sharing 3rd at rank 4 (shareNoSkip) is offered to the chair to order, like the tie for 2nd", () => {
    const five: Spec[] = [{ n: 1, totals: [95, 95] }, { n: 2, totals: [90, 90] }, { n: 3, totals: [88, 92] }, { n: 4, totals: [85, 85] }, { n: 5, totals: [84, 86] }];
    const cat = catOf(assembleResults(input([category(five)], { tieBreaks: [], ties: "shareNoSkip" })));
    expect(cat.entries.map((o) => o.placeLabel)).toEqual(["1st", "2nd", "2nd", "3rd", "3rd"]);
    expect(cat.tiedForPlace).toEqual([["e2", "e3"], ["e4", "e5"]]);
  });

  it("a tie for a place passed down by an award that does not keep its category place is offered too", () => {
    const four: Spec[] = [{ n: 1, totals: [95, 95] }, { n: 2, totals: [88, 93] }, { n: 3, totals: [93, 88] }, { n: 4, totals: [80, 80] }];
    const award: AwardDefinition = { id: "bos", name: "Best of Show", kind: "best_of_show", sponsor: "", eligibility: { categoryWinnersOnly: true }, chooseBy: "chair", ribbon: { name: "Purple rosette", colour: "#6b21a8" }, combinesWith: [], keepsCategoryPlace: false };
    const picks: AwardPickInput[] = [{ awardId: "bos", entryId: "e1", judgeId: null, kind: "choice", reason: "" }];
    const cat = catOf(assembleResults(input([category(four)], { tieBreaks: [], sizeRules: [{ maxEntries: 4, places: 1 }] }, { awards: [award], picks })));
    expect(cat.entries.map((o) => o.placeLabel)).toEqual([null, "1st", "1st", null]);
    expect(cat.tiedForPlace).toEqual([["e2", "e3"]]);
  });
});

describe("the tie-break chain, link by link", () => {
  // Four entries all at a mean of 90. Workmanship (mean of the judges' section totals): entry 1 38,
  // the rest 36. First places: Judge Ash's best total is entry 2's 92, Judge Birch's is entry 3's 92;
  // so entries 2 and 3 have one vote each, entries 1 and 4 none.
  const specs: Spec[] = [
    { n: 1, totals: [90, 90], work: [38, 38] },
    { n: 2, totals: [92, 88], work: [36, 36] },
    { n: 3, totals: [88, 92], work: [37, 35] },
    { n: 4, totals: [89, 91], work: [36, 36] },
  ];
  const chain: ResultRules["tieBreaks"] = [{ kind: "section", sectionId: "workmanship", label: "Workmanship" }, { kind: "firstPlaceVotes" }, { kind: "chair" }];
  const chairOrder = { categoryId: "c10", entryIds: ["e3", "e2"], reason: "Looked at both again." };

  it("section score, then first-place votes, then the chair's recorded order", () => {
    const cat = catOf(assembleResults(input([category(specs)], { tieBreaks: chain }, { tieOrders: [chairOrder] })));
    expect(cat.entries.map((o) => [o.entry.entryNumber, o.ranked.rank, o.ranked.decidedBy, o.placeLabel])).toEqual([
      [1, 1, "The higher Workmanship score", "1st"],
      [3, 2, "The chair's decision", "2nd"],
      [2, 3, "The chair's decision", "3rd"],
      [4, 4, "More judges placing it first", null],
    ]);
    expect(cat.tiedForPlace).toEqual([]);
  });

  it("without the chair's order, the two still level share 2nd and the chair is asked to order them", () => {
    const cat = catOf(assembleResults(input([category(specs)], { tieBreaks: chain })));
    expect(cat.entries.map((o) => [o.entry.entryNumber, o.ranked.displayRank, o.placeLabel])).toEqual([[1, "1", "1st"], [2, "=2", "2nd"], [3, "=2", "2nd"], [4, "4", null]]);
    expect(cat.tiedForPlace).toEqual([["e2", "e3"]]);
    // A tie order recorded for another category does not apply here.
    const other = catOf(assembleResults(input([category(specs)], { tieBreaks: chain }, { tieOrders: [{ ...chairOrder, categoryId: "c99" }] })));
    expect(other.tiedForPlace).toEqual([["e2", "e3"]]);
  });

  it("the chain's order matters: votes first puts the two one-vote entries ahead of the best workmanship", () => {
    const votesFirst: ResultRules["tieBreaks"] = [{ kind: "firstPlaceVotes" }, chain[0]!, { kind: "chair" }];
    const cat = catOf(assembleResults(input([category(specs)], { tieBreaks: votesFirst }, { tieOrders: [chairOrder] })));
    // Votes: 2 and 3 (one each) before 1 and 4 (none); 1 beats 4 on workmanship (38 vs 36); the chair orders 3 before 2.
    expect(cat.entries.map((o) => o.entry.entryNumber)).toEqual([3, 2, 1, 4]);
    expect(cat.entries.map((o) => o.placeLabel)).toEqual(["1st", "2nd", "3rd", null]);
  });

  it("an unsubmitted sheet's total does not count toward first-place votes", () => {
    // Judge Birch's 99 for entry 2 is a draft: only Ash's submitted 90s count (both entries have a vote).
    const cat = catOf(assembleResults(input([category([{ n: 1, totals: [90, 80] }, { n: 2, totals: [90, 99], drafts: [1] }])], { tieBreaks: [{ kind: "firstPlaceVotes" }] })));
    // Entry 1: mean 85 from two sheets; entry 2: mean 90 from Ash alone.
    expect(cat.entries.map((o) => [o.entry.entryNumber, o.score])).toEqual([[2, 90], [1, 85]]);
  });
});

describe("minimum scores, category size and honorable mentions", () => {
  it("withholds a ribbon no entry reaches; the entry is considered for the next place", () => {
    const specs: Spec[] = [{ n: 1, totals: [92, 92] }, { n: 2, totals: [82, 84] }, { n: 3, totals: [81, 81] }];
    const cat = catOf(assembleResults(input([category(specs)], { minimumScores: [90, 85, 80] })));
    // 92 ≥ 90: 1st. 83 < 85: no 2nd; 83 ≥ 80: 3rd. 81 has nothing left.
    expect(cat.entries.map((o) => [o.entry.entryNumber, o.placeLabel])).toEqual([[1, "1st"], [2, "3rd"], [3, null]]);
    expect(cat.notAwarded.map((n) => [n.placeLabel, n.why])).toEqual([["2nd", "minimum"]]);
    expect(cat.notAwarded[0]!.text).toBe("No entry reached the 85-point minimum for 2nd (the best left, entry 2, has 83), so the 2nd-place ribbon is withheld.");
  });

  it("minimum scores do not apply to the severity-adjusted view, and say so", () => {
    const specs: Spec[] = [{ n: 1, totals: [92, 92] }, { n: 2, totals: [82, 84] }, { n: 3, totals: [70, 72] }];
    const cat = catOf(assembleResults(input([category(specs)], { rankBy: "adjusted", minimumScores: [95, 95, 95] })));
    expect(cat.entries.map((o) => o.placeLabel)).toEqual(["1st", "2nd", "3rd"]);
    expect(cat.notes).toContain("Minimum scores apply only to points ranked by the mean; none applied here.");
  });

  it("a category of 3 or fewer entries gets 1st only (one guild's Ribbons Chair sheet, docsbay.net/ribbons-chair)", () => {
    const size = { sizeRules: [{ maxEntries: 3, places: 1 }] };
    const three = catOf(assembleResults(input([category(THREE_QUILTS)], size)));
    expect(three.entries.map((o) => [o.entry.entryNumber, o.placeLabel])).toEqual([[1, "1st"], [2, null], [3, null]]);
    expect(three.notes).toEqual(["3 entries in the category: 1st only (the rule for 3 or fewer entries)."]);
    const four = catOf(assembleResults(input([category([...THREE_QUILTS, { n: 4, totals: [70, 70] }])], size)));
    expect(four.entries.map((o) => o.placeLabel)).toEqual(["1st", "2nd", "3rd", null]);
  });

  it("counted honorable mentions go to the best unplaced entries above their minimum", () => {
    const specs: Spec[] = [95, 90, 85, 80, 78, 70].map((t, i) => ({ n: i + 1, totals: [t, t] }));
    const cat = catOf(assembleResults(input([category(specs)], { honorableMentions: 2, honorableMentionMinimum: 79 })));
    // 80 ≥ 79 gets one; 78 < 79 stops the count at 1 of 2.
    expect(cat.entries.filter((o) => o.honorableMention).map((o) => [o.entry.entryNumber, o.ribbon])).toEqual([[4, DEFAULT_RESULT_RULES.ribbons.honorableMention]]);
    expect(cat.notes).toEqual(["Only 1 of 2 honorable mentions were given: no other kept entry reached 79."]);
  });
});

describe("other judging methods", () => {
  it("ranking categories rank by the mean rank, lower first, with no spread flags or minimums", () => {
    const specs: Spec[] = [
      { n: 1, totals: [null, null], ranks: [2, 3] }, // mean 2.5
      { n: 2, totals: [null, null], ranks: [1, 1] }, // mean 1
      { n: 3, totals: [null, null], ranks: [3, 2] }, // mean 2.5
    ];
    const cat = catOf(assembleResults(input([category(specs, { method: "rank" })], { minimumScores: [99] })));
    expect(cat.scoreLabel).toBe("Mean rank");
    expect(cat.direction).toBe("lowerIsBetter");
    // Entries 1 and 3 tie on 2.5; first-place votes: each judge's rank 1 is entry 2, so 0 and 0: a shared 2nd.
    expect(cat.entries.map((o) => [o.entry.entryNumber, o.score, o.ranked.displayRank, o.placeLabel])).toEqual([[2, 1, "1", "1st"], [1, 2.5, "=2", "2nd"], [3, 2.5, "=2", "2nd"]]);
    expect(cat.notes).toContain("Minimum scores apply only to points ranked by the mean; none applied here.");
  });

  it("sort-then-points places only entries kept by at least as many judges as set them aside", () => {
    const specs: Spec[] = [
      { n: 1, totals: [97, 95], sort: ["set_aside", "set_aside"] }, // set aside by both: not placed however high
      { n: 2, totals: [88, 90], sort: ["kept", "set_aside"] }, // one each: kept (our rule)
      { n: 3, totals: [80, 84], sort: ["kept", "kept"] },
    ];
    const cat = catOf(assembleResults(input([category(specs, { method: "sort_then_points" })])));
    expect(cat.entries.map((o) => [o.entry.entryNumber, o.kept, o.placeLabel])).toEqual([[1, false, null], [2, true, "1st"], [3, true, "2nd"]]);
    expect(cat.entries[0]!.text).toBe("Set aside in the sorting pass: no placement.");
  });
});

describe("the chair's changes", () => {
  it("a changed place shows with its reason, beside what the rules proposed, and a shared place is warned about", () => {
    const reason = "Judges re-inspected the binding.";
    const r = assembleResults(input([category(THREE_QUILTS)], {}, { overrides: [{ entryId: "e3", place: 1, honorableMention: false, reason }] }));
    const third = byNumber(r, 3);
    expect([third.place, third.placeLabel, third.ribbon]).toEqual([1, "1st", DEFAULT_RESULT_RULES.ribbons.places[0]]);
    expect(third.proposed).toEqual({ place: 3, honorableMention: false, text: "3rd place." });
    expect(third.text).toBe(`1st place, changed by the chair: ${reason}`);
    expect(third.override).toEqual({ entryId: "e3", place: 1, honorableMention: false, reason });
    // Entry 1 keeps its 1st: two entries now hold it.
    expect(byNumber(r, 1).placeLabel).toBe("1st");
    expect(r.warnings).toEqual(["Category 10: entry 3 and entry 1 hold 1st; the chair changed entry 3."]);
    expect(r.blockers).toEqual([]);
  });

  it("an honorable mention given by the chair, and a placement taken away", () => {
    const specs: Spec[] = [...THREE_QUILTS, { n: 4, totals: [70, 74] }];
    const r = assembleResults(input([category(specs)], {}, {
      overrides: [
        { entryId: "e4", place: null, honorableMention: true, reason: "Judges' discretion: a mention for the border." },
        { entryId: "e2", place: null, honorableMention: false, reason: "Entered in the wrong category." },
      ],
    }));
    const fourth = byNumber(r, 4);
    expect([fourth.place, fourth.honorableMention, fourth.ribbon]).toEqual([null, true, DEFAULT_RESULT_RULES.ribbons.honorableMention]);
    expect(fourth.proposed.honorableMention).toBe(false);
    expect(fourth.text).toBe("Honorable mention, changed by the chair: Judges' discretion: a mention for the border.");
    const second = byNumber(r, 2);
    expect([second.place, second.placeLabel, second.honorableMention, second.ribbon]).toEqual([null, null, false, null]);
    expect(second.proposed.place).toBe(2);
    expect(second.text).toBe("No placement, changed by the chair: Entered in the wrong category.");
    expect(r.warnings).toEqual([]); // nobody shares a place
  });

  it("a place given by the chair wins over an honorable mention in the same change", () => {
    const r = assembleResults(input([category(THREE_QUILTS)], {}, { overrides: [{ entryId: "e3", place: 2, honorableMention: true, reason: "Tidy-up." }] }));
    expect([byNumber(r, 3).placeLabel, byNumber(r, 3).honorableMention]).toEqual(["2nd", false]);
  });
});

describe("what blocks publishing", () => {
  it("missing and unsubmitted sheets are named, entry and judge", () => {
    const specs: Spec[] = [
      { n: 1, totals: [94, 96] },
      { n: 2, totals: [88, 93], drafts: [1] }, // Judge Birch saved but did not submit
      { n: 3, totals: [79, null] }, // Judge Birch has no sheet at all
    ];
    const r = assembleResults(input([category(specs)]));
    expect(catOf(r).missing).toEqual([{ entryNumber: 2, judge: "Judge Birch" }, { entryNumber: 3, judge: "Judge Birch" }]);
    expect(r.blockers).toEqual(["Category 10: 2 sheets not submitted (entry 2, Judge Birch; entry 3, Judge Birch)."]);
    // Meanwhile entry 2 ranks on Judge Ash's 88 alone.
    expect(byNumber(r, 2).score).toBe(88);
  });

  it("one missing sheet is singular; more than three are cut short", () => {
    const one = assembleResults(input([category([{ n: 1, totals: [90, null] }])]));
    expect(one.blockers).toEqual(["Category 10: 1 sheet not submitted (entry 1, Judge Birch)."]);
    const many = assembleResults(input([category([1, 2, 3, 4].map((n) => ({ n, totals: [90 - n, null] })))]));
    expect(many.blockers).toEqual(["Category 10: 4 sheets not submitted (entry 1, Judge Birch; entry 2, Judge Birch; entry 3, Judge Birch; …)."]);
  });

  it("an entry without any submitted sheet is unranked and unplaced", () => {
    const r = assembleResults(input([category([{ n: 1, totals: [90, 92] }, { n: 2, totals: [95, 95], drafts: [0, 1] }])]));
    expect([byNumber(r, 2).score, byNumber(r, 2).ranked.displayRank, byNumber(r, 2).place, byNumber(r, 2).text]).toEqual([null, "—", null, "Not ranked: no score yet."]);
    expect(byNumber(r, 1).placeLabel).toBe("1st");
  });
});

describe("flags for a second look", () => {
  it("judges at least the spread-flag apart (default 10) are flagged; closer ones are not", () => {
    const specs: Spec[] = [{ n: 1, totals: [80, 95] }, { n: 2, totals: [84, 94] }, { n: 3, totals: [88, 93] }];
    const r = assembleResults(input([category(specs)]));
    const spreadFlags = (n: number) => byNumber(r, n).flags.filter((f) => f.startsWith("Judges"));
    expect(spreadFlags(1)).toEqual(["Judges 15 points apart"]);
    expect(spreadFlags(2)).toEqual(["Judges 10 points apart"]); // exactly the threshold: "at least" (ResultRules.spreadFlag)
    expect(spreadFlags(3)).toEqual([]);
    // A flag is for the chair's eye, not a blocker.
    expect(r.blockers).toEqual([]);
    const tighter = assembleResults(input([category(specs)], { spreadFlag: 5 }));
    expect(byNumber(tighter, 3).flags.filter((f) => f.startsWith("Judges"))).toEqual(["Judges 5 points apart"]);
  });

  it("a judge's request to discuss and an unreviewed size flag show too", () => {
    const r = assembleResults(input([category([{ n: 1, totals: [90, 91], discuss: true, sizeFlag: "measured 2 in wider than entered" }])]));
    expect(byNumber(r, 1).flags).toEqual(["A judge asked to discuss it", "Size: measured 2 in wider than entered"]);
  });
});

describe("show-wide awards in the results", () => {
  const ribbon = { name: "Purple rosette", colour: "#6b21a8" };
  const bestOfShow = (over: Partial<AwardDefinition> = {}): AwardDefinition => ({
    id: "bos", name: "Best of Show", kind: "best_of_show", sponsor: "", eligibility: { categoryWinnersOnly: true }, chooseBy: "judges_vote", ribbon, combinesWith: [], keepsCategoryPlace: true, ...over,
  });
  const vote = (entryId: string, judgeId: string | null): AwardPickInput => ({ awardId: "bos", entryId, judgeId, kind: "vote", reason: "" });
  const pieced = category(THREE_QUILTS);
  const applique = { ...category([{ n: 11, totals: [91, 89] }, { n: 12, totals: [85, 86] }, { n: 13, totals: [80, 81] }, { n: 14, totals: [75, 76] }]), id: "c20", code: "20", name: "Appliqué" };

  it("the judges' vote among category winners; the winner keeps its category place", () => {
    const r = assembleResults(input([pieced, applique], {}, { awards: [bestOfShow()], picks: [vote("e1", "j-ash"), vote("e1", "j-birch"), vote("e11", "j-cedar")] }));
    expect(r.awards[0]!.winners).toEqual([{ entryId: "e1", judgeId: null, how: "The judges' vote (2 of 3)." }]);
    expect(r.awards[0]!.votes).toEqual({ e1: 2, e11: 1 });
    const one = byNumber(r, 1);
    expect([one.placeLabel, one.awards]).toEqual(["1st", [{ awardId: "bos", name: "Best of Show", ribbon, how: "The judges' vote (2 of 3)." }]]);
    expect(resultWords(snapshotOf(r, 1, new Date(0)).categories[0]!.entries[0]!)).toBe("1st place (Blue) · Best of Show");
    expect(r.blockers).toEqual([]);
  });

  it("keepsCategoryPlace false: the winner's category place passes down to the next entries", () => {
    const r = assembleResults(input([pieced, applique], {}, { awards: [bestOfShow({ keepsCategoryPlace: false })], picks: [vote("e11", "j-ash"), vote("e11", "j-birch")] }));
    const cat = catOf(r, 1);
    expect(cat.entries.map((o) => [o.entry.entryNumber, o.placeLabel, o.awards.map((a) => a.name)])).toEqual([
      [11, null, ["Best of Show"]], [12, "1st", []], [13, "2nd", []], [14, "3rd", []],
    ]);
    expect(cat.entries[0]!.ribbon).toBeNull();
    expect(cat.entries[0]!.text).toBe("Holds Best of Show; its category place passes to the next entry.");
    // The winner still shows as awarded, by its rosette.
    const published = snapshotOf(r, 1, new Date(0)).categories[1]!.entries[0]!;
    expect([isAwarded(published), resultWords(published)]).toEqual([true, "Best of Show"]);
    // The other category is untouched.
    expect(placesOf(r, 0)).toEqual([[1, "1st"], [2, "2nd"], [3, "3rd"]]);
  });

  it("a tied vote and an entry holding two awards that may not combine both block publishing", () => {
    const tied = assembleResults(input([pieced, applique], {}, { awards: [bestOfShow()], picks: [vote("e1", "j-ash"), vote("e11", "j-birch")] }));
    expect(tied.awards[0]!.winners).toEqual([]);
    expect(tied.blockers).toEqual(["Best of Show: the vote is tied between entry 1 and entry 11 (1 each); the chair decides."]);
    const hand: AwardDefinition = { ...bestOfShow(), id: "hand", name: "Best hand quilting", kind: "best_hand_quilting", chooseBy: "chair", eligibility: { quiltingMethods: ["hand"] } };
    const picks = [vote("e1", "j-ash"), vote("e1", "j-birch"), { awardId: "hand", entryId: "e1", judgeId: null, kind: "choice" as const, reason: "" }];
    const both = assembleResults(input([pieced, applique], {}, { awards: [bestOfShow(), hand], picks }));
    expect(both.blockers).toEqual(["entry 1 holds Best of Show and Best hand quilting, which this show does not allow together."]);
    expect(byNumber(both, 1).awards.map((a) => a.name)).toEqual(["Best of Show", "Best hand quilting"]);
    const allowed = assembleResults(input([pieced, applique], {}, { awards: [bestOfShow(), { ...hand, combinesWith: ["bos"] }], picks }));
    expect(allowed.blockers).toEqual([]);
  });
});

describe("resultRulesOf", () => {
  it("no stored rules: the defaults", () => {
    expect(resultRulesOf(null)).toEqual(DEFAULT_RESULT_RULES);
    expect(resultRulesOf(undefined)).toEqual(DEFAULT_RESULT_RULES);
    expect(resultRulesOf({})).toEqual(DEFAULT_RESULT_RULES);
  });

  it("stored values win; everything not stored comes from the defaults", () => {
    const r = resultRulesOf({ places: 2, spreadFlag: 6, ties: "shareAndSkip", sizeRules: [{ maxEntries: 3, places: 1 }] });
    expect(r).toEqual({ ...DEFAULT_RESULT_RULES, places: 2, spreadFlag: 6, ties: "shareAndSkip", sizeRules: [{ maxEntries: 3, places: 1 }] });
    expect(r.ribbons).toEqual(DEFAULT_RESULT_RULES.ribbons);
  });

  it("stored ribbons replace the default ones, and a stored set without a mention ribbon keeps the default mention", () => {
    const places = [{ name: "Rosette 1", colour: "#000001" }];
    expect(resultRulesOf({ ribbons: { places, honorableMention: { name: "Pink", colour: "#f9a8d4" } } }).ribbons).toEqual({ places, honorableMention: { name: "Pink", colour: "#f9a8d4" } });
    // Stored JSON is not checked by the type system: a half-filled ribbons object.
    const partial = { ribbons: { places } } as unknown as Partial<ResultRules>;
    expect(resultRulesOf(partial).ribbons).toEqual({ places, honorableMention: DEFAULT_RESULT_RULES.ribbons.honorableMention });
  });

  it("does not change the defaults it starts from", () => {
    const before = JSON.stringify(DEFAULT_RESULT_RULES);
    const r = resultRulesOf({ places: 5 });
    r.ribbons.honorableMention = { name: "Changed", colour: "#000000" };
    expect(JSON.stringify(DEFAULT_RESULT_RULES)).toBe(before);
  });
});

describe("resultWords and isAwarded", () => {
  const blue = { name: "Blue", colour: "#1d4ed8" };
  const green = { name: "Green", colour: "#15803d" };
  const rosette = { name: "Purple rosette", colour: "#6b21a8" };
  const published = (over: Partial<PublishedEntry>): PublishedEntry => ({
    entryId: "e1", entryNumber: 1, title: "Quilt 1", entrantUserId: "u1", categoryId: "c10", place: null, placeLabel: null, honorableMention: false, ribbon: null, awards: [], ...over,
  });

  it("a place with its ribbon, then the awards", () => {
    const e = published({ place: 1, placeLabel: "1st", ribbon: blue, awards: [{ name: "Best of Show", ribbon: rosette }, { name: "Judge's choice", ribbon: rosette }] });
    expect(resultWords(e)).toBe("1st place (Blue) · Best of Show · Judge's choice");
    expect(resultWords(published({ place: 4, placeLabel: "4th" }))).toBe("4th place");
    expect(isAwarded(e)).toBe(true);
  });

  it("an honorable mention, an award alone, nothing", () => {
    expect(resultWords(published({ honorableMention: true, ribbon: green }))).toBe("Honorable mention (Green)");
    expect(resultWords(published({ honorableMention: true }))).toBe("Honorable mention");
    expect(resultWords(published({ awards: [{ name: "Viewers' choice", ribbon: rosette }] }))).toBe("Viewers' choice");
    expect(resultWords(published({}))).toBe("No ribbon");
    expect([published({ honorableMention: true }), published({ awards: [{ name: "X", ribbon: rosette }] }), published({})].map(isAwarded)).toEqual([true, true, false]);
  });
});

describe("snapshotOf", () => {
  const judgesChoice: AwardDefinition = {
    id: "jc", name: "Judge's choice", kind: "judges_choice", sponsor: "", eligibility: {}, chooseBy: "chair", ribbon: { name: "Gold", colour: "#ca8a04" }, combinesWith: [], keepsCategoryPlace: true,
  };
  const results = assembleResults(input([category(THREE_QUILTS)], {}, {
    awards: [judgesChoice], picks: [{ awardId: "jc", entryId: "e2", judgeId: "j-ash", kind: "choice", reason: "The border." }],
  }));

  it("keeps places, ribbons and awards, with the version and the time", () => {
    const snap = snapshotOf(results, 3, new Date("2027-04-18T20:15:00Z"));
    expect([snap.version, snap.publishedAt]).toEqual([3, "2027-04-18T20:15:00.000Z"]);
    expect(snap.categories.map((c) => [c.id, c.code, c.name])).toEqual([["c10", "10", "Pieced"]]);
    expect(snap.categories[0]!.entries.map((e) => [e.entryNumber, e.title, e.entrantUserId, e.categoryId, e.placeLabel, e.ribbon?.name, e.awards.map((a) => a.name)])).toEqual([
      [1, "Quilt 1", "u1", "c10", "1st", "Blue", []], [2, "Quilt 2", "u2", "c10", "2nd", "Red", ["Judge's choice"]], [3, "Quilt 3", "u3", "c10", "3rd", "Yellow", []],
    ]);
    expect(snap.awards).toEqual([{ awardId: "jc", name: "Judge's choice", ribbon: judgesChoice.ribbon, entryIds: ["e2"] }]);
  });

  it("holds no scores and no judges", () => {
    const text = JSON.stringify(snapshotOf(results, 1, new Date(0)));
    for (const word of ['"score"', '"mean"', '"stats"', '"sheets"', '"total"', '"spread"', '"flags"', '"ranked"', '"judgeId"', '"judges"', '"how"', "90.5", "Judge Ash", "Judge Birch", "j-ash", "j-birch", "The border."]) {
      expect(text).not.toContain(word);
    }
  });
});

describe("changedEntrants", () => {
  const at = new Date("2027-04-18T20:00:00Z");
  const first = snapshotOf(assembleResults(input([category(THREE_QUILTS)])), 1, at);

  it("a first publication: every entrant", () => {
    expect(changedEntrants(null, first)).toEqual(new Set(["u1", "u2", "u3"]));
  });

  it("the same results again: nobody", () => {
    expect(changedEntrants(first, snapshotOf(assembleResults(input([category(THREE_QUILTS)])), 2, at))).toEqual(new Set());
  });

  it("only the entrants whose place, mention or awards changed", () => {
    const swapped = assembleResults(input([category([...THREE_QUILTS])], {}, {
      overrides: [{ entryId: "e2", place: 3, honorableMention: false, reason: "Re-inspected." }, { entryId: "e3", place: 2, honorableMention: false, reason: "Re-inspected." }],
    }));
    expect(changedEntrants(first, snapshotOf(swapped, 2, at))).toEqual(new Set(["u2", "u3"]));
    const mention = assembleResults(input([category([...THREE_QUILTS, { n: 4, totals: [70, 70] }])], { honorableMentions: 1 }));
    const before = snapshotOf(assembleResults(input([category([...THREE_QUILTS, { n: 4, totals: [70, 70] }])])), 1, at);
    expect(changedEntrants(before, snapshotOf(mention, 2, at))).toEqual(new Set(["u4"]));
  });

  it("an entrant with two entries is listed once, when either changed", () => {
    const specs: Spec[] = [{ n: 1, totals: [94, 96], entrant: "ada" }, { n: 2, totals: [88, 93], entrant: "ada" }, { n: 3, totals: [79, 85], entrant: "bea" }];
    const before = snapshotOf(assembleResults(input([category(specs)])), 1, at);
    const after = snapshotOf(assembleResults(input([category(specs)], {}, { overrides: [{ entryId: "e2", place: null, honorableMention: false, reason: "One ribbon per quilter per category." }] })), 2, at);
    expect(changedEntrants(before, after)).toEqual(new Set(["ada"]));
  });
});

