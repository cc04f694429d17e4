// Ranking a category: judges' averages from a published show, statistics and z-scores against
// simple-statistics (fast-check), standard competition ranks, the tie-break chain, and placements
// under minimum scores, category-size rules and tie rules from a guild's ribbons sheet.
import fc from "fast-check";
import * as ss from "simple-statistics";
import { describe, expect, it } from "vitest";
import { placeAwards, placesFor, type PlaceRules } from "@/scoring/placements";
import {
  competitionRanks, firstPlaceVotes, ordinal, rankCategory, severityAdjusted, summariseEntries, summariseScores,
  type JudgeTotal, type RankCandidate, type TieBreak,
} from "@/scoring/ranking";
import { formatScore } from "@/scoring/score-sheets";

const candidates = (scores: (number | null)[]): RankCandidate[] => scores.map((score, i) => ({ entryId: `e${i + 1}`, label: `entry ${i + 1}`, score }));
const rankScores = (scores: (number | null)[]) => rankCategory(candidates(scores), []);
const placesOf = (p: ReturnType<typeof placeAwards>) => p.entries.map((e) => e.place);

describe("judges' averages", () => {
  // A published show's results: two judges' totals and their averages (quiltingtales.blogspot.com,
  // 2016, "three quilts").
  it.each([
    [[94, 96], 95],
    [[88, 93], 90.5],
    [[79, 85], 82],
  ])("two judges %j average %d (quiltingtales.blogspot.com 2016)", (totals, mean) => {
    expect(summariseScores(totals).mean).toBe(mean);
  });

  it("three judges land on thirds, shown to two decimals (common practice)", () => {
    expect(formatScore(summariseScores([94, 95, 95]).mean)).toBe("94.67"); // 284 / 3 = 94.666…
    expect(formatScore(summariseScores([90, 91, 93]).mean)).toBe("91.33"); // 274 / 3 = 91.333…
    // The same three totals in any order give exactly the same mean, so they tie in the ranking.
    expect(summariseScores([95, 94, 95]).mean).toBe(summariseScores([95, 95, 94]).mean);
  });

  it("median, spread and sample SD of one entry's totals", () => {
    expect(summariseScores([88, 93])).toEqual({ count: 2, mean: 90.5, median: 90.5, spread: 5, sampleSd: Math.sqrt(12.5) });
    expect(summariseScores([94])).toEqual({ count: 1, mean: 94, median: 94, spread: 0, sampleSd: null });
    expect(summariseScores([])).toEqual({ count: 0, mean: null, median: null, spread: null, sampleSd: null });
  });

  it("groups judges' totals by entry, and refuses a judge's second total for one entry", () => {
    const sheets: JudgeTotal[] = [
      { entryId: "a", judgeId: "J1", total: 94 }, { entryId: "b", judgeId: "J1", total: 88 },
      { entryId: "a", judgeId: "J2", total: 96 }, { entryId: "b", judgeId: "J2", total: 93 },
    ];
    expect(summariseEntries(sheets).map((e) => [e.entryId, e.mean])).toEqual([["a", 95], ["b", 90.5]]);
    expect(() => summariseEntries([...sheets, { entryId: "a", judgeId: "J1", total: 90 }])).toThrow("Judge J1 has two totals for entry a; keep one.");
  });
});

// Generated judging: up to 4 judges × 8 entries, each judge scoring some entries, totals in hundredths.
const total = fc.integer({ min: 5_000, max: 10_000 }).map((h) => h / 100);
const judging: fc.Arbitrary<JudgeTotal[]> = fc.array(fc.array(fc.option(total, { nil: undefined }), { minLength: 8, maxLength: 8 }), { minLength: 1, maxLength: 4 })
  .map((grid) => grid.flatMap((row, j) => row.flatMap((t, e) => (t === undefined ? [] : [{ entryId: `e${e}`, judgeId: `J${j}`, total: t }]))))
  .filter((sheets) => sheets.length > 0);

describe("statistics against simple-statistics (fast-check)", () => {
  it("mean, median, spread and sample SD", () => {
    fc.assert(fc.property(fc.array(total, { minLength: 1, maxLength: 9 }), (xs) => {
      const s = summariseScores(xs);
      expect(s.mean!).toBeCloseTo(ss.mean(xs), 9);
      expect(s.median!).toBeCloseTo(ss.median(xs), 9);
      expect(s.spread!).toBeCloseTo(ss.max(xs) - ss.min(xs), 9);
      if (xs.length < 2) expect(s.sampleSd).toBeNull();
      else expect(s.sampleSd!).toBeCloseTo(ss.sampleStandardDeviation(xs), 9);
    }), { numRuns: 1_000 });
  });

  it.each(["population", "sample"] as const)("severity-adjusted z-scores with the %s SD", (sd) => {
    const sdOf = sd === "population" ? ss.standardDeviation : ss.sampleStandardDeviation;
    fc.assert(fc.property(judging, (sheets) => {
      const result = severityAdjusted(sheets, { sd });
      for (const entry of result.entries) {
        const zs = entry.byJudge.map(({ judgeId, z }) => {
          const mine = sheets.filter((s) => s.judgeId === judgeId).map((s) => s.total);
          const x = sheets.find((s) => s.judgeId === judgeId && s.entryId === entry.entryId)!.total;
          const spread = mine.length < 2 ? 0 : sdOf(mine);
          const expected = spread === 0 ? 0 : ss.zScore(x, ss.mean(mine), spread);
          expect(z).toBeCloseTo(expected, 9);
          return expected;
        });
        expect(entry.z).toBeCloseTo(ss.mean(zs), 9);
      }
      // Within one judge the z-scores average 0.
      for (const j of result.judges) {
        if (j.flat) continue;
        const zs = result.entries.flatMap((e) => e.byJudge.filter((b) => b.judgeId === j.judgeId).map((b) => b.z));
        expect(ss.mean(zs)).toBeCloseTo(0, 9);
      }
    }), { numRuns: 500 });
  });
});

describe("severityAdjusted", () => {
  it("a harsh and a generous judge who order the quilts alike give the same z-scores", () => {
    const sheets: JudgeTotal[] = [
      { entryId: "a", judgeId: "harsh", total: 80 }, { entryId: "b", judgeId: "harsh", total: 70 }, { entryId: "c", judgeId: "harsh", total: 75 },
      { entryId: "a", judgeId: "kind", total: 95 }, { entryId: "b", judgeId: "kind", total: 85 }, { entryId: "c", judgeId: "kind", total: 90 },
    ];
    // Each judge: mean 75 (or 90), population SD √(50/3) ≈ 4.0825, so a: +5 / 4.0825 = 1.2247.
    const r = severityAdjusted(sheets);
    expect(r.entries.map((e) => e.entryId)).toEqual(["a", "b", "c"]);
    expect(r.entries[0]!.z).toBeCloseTo(5 / Math.sqrt(50 / 3), 12);
    expect(r.entries[0]!.byJudge[0]!.z).toBeCloseTo(r.entries[0]!.byJudge[1]!.z, 12);
    expect(r.entries[2]!.z).toBeCloseTo(0, 12);
    expect(r.notes).toEqual([]);
  });

  it("a judge with one entry, or the same total for all, adds z = 0 and a note", () => {
    const r = severityAdjusted([
      { entryId: "a", judgeId: "J1", total: 91 },
      { entryId: "a", judgeId: "J2", total: 88 }, { entryId: "b", judgeId: "J2", total: 88 },
    ]);
    expect(r.judges.map((j) => [j.judgeId, j.flat])).toEqual([["J1", true], ["J2", true]]);
    expect(r.entries.map((e) => e.z)).toEqual([0, 0]);
    expect(r.notes).toEqual([
      "Judge J1 scored only one entry in this category, so their total doesn't change the order after adjustment.",
      "Judge J2 gave every entry in this category the same total (88), so their totals don't change the order after adjustment.",
    ]);
  });
});

describe("competitionRanks (standard competition ranking \"1224\", Wikipedia \"Ranking\")", () => {
  it("equal values share the best rank and the next rank skips", () => {
    expect(competitionRanks([95, 90.5, 90.5, 82])).toEqual([1, 2, 2, 4]);
    expect(competitionRanks([82, 90.5, 95, 90.5])).toEqual([4, 2, 1, 2]);
    expect(competitionRanks([3, 1, 1, 2], "lowerIsBetter")).toEqual([4, 1, 1, 3]);
    expect(competitionRanks([])).toEqual([]);
  });

  it("float drift does not split a tie; decimals: 2 ties what reads the same", () => {
    expect(competitionRanks([0.1 + 0.2, 0.3])).toEqual([1, 1]);
    expect(competitionRanks([90.333, 90.334])).toEqual([2, 1]);
    expect(competitionRanks([90.333, 90.334], "higherIsBetter", { decimals: 2 })).toEqual([1, 1]);
  });

  it("rank = 1 + count strictly better; non-decreasing in sorted order; tied values share a rank (property)", () => {
    fc.assert(fc.property(fc.array(fc.integer({ min: 80, max: 90 }), { maxLength: 20 }), fc.constantFrom("higherIsBetter", "lowerIsBetter" as const), (xs, dir) => {
      const ranks = competitionRanks(xs, dir);
      const better = (a: number, b: number) => (dir === "higherIsBetter" ? a > b : a < b);
      xs.forEach((x, i) => expect(ranks[i]).toBe(1 + xs.filter((y) => better(y, x)).length));
      const order = xs.map((_, i) => i).sort((a, b) => (dir === "higherIsBetter" ? xs[b]! - xs[a]! : xs[a]! - xs[b]!));
      order.forEach((idx, k) => { if (k > 0) expect(ranks[idx]!).toBeGreaterThanOrEqual(ranks[order[k - 1]!]!); });
      xs.forEach((x, i) => xs.forEach((y, j) => { if (x === y) expect(ranks[i]).toBe(ranks[j]); }));
    }), { numRuns: 500 });
  });
});

describe("rankCategory", () => {
  // Tie-breaks like those shows use: higher workmanship subtotal, then more judges ranking it first,
  // then the chair's recorded decision (common practice; the values here are invented).
  const work: TieBreak = { kind: "value", key: "workmanship", label: "Workmanship subtotal", direction: "higherIsBetter" };
  const votes: TieBreak = { kind: "value", key: "firstVotes", label: "First-place votes", direction: "higherIsBetter" };
  const chair: TieBreak = { kind: "order", label: "The chair's decision", entryIds: ["d", "c"] };
  const entries: RankCandidate[] = [
    { entryId: "a", label: "entry A", score: 90.5, tieBreakValues: { workmanship: 38, firstVotes: 0 } },
    { entryId: "b", label: "entry B", score: 90.5, tieBreakValues: { workmanship: 36, firstVotes: 2 } },
    { entryId: "c", label: "entry C", score: 90.5, tieBreakValues: { workmanship: 36, firstVotes: 1 } },
    { entryId: "d", label: "entry D", score: 90.5, tieBreakValues: { workmanship: 36, firstVotes: 1 } },
    { entryId: "e", label: "entry E", score: 95 },
  ];

  it("applies the tie-break chain in order and says which link decided", () => {
    const r = rankCategory(entries, [work, votes, chair]);
    expect(r.map((e) => [e.entryId, e.rank, e.scoreRank, e.displayRank, e.decidedBy])).toEqual([
      ["e", 1, 1, "1", null],
      ["a", 2, 2, "2", "Workmanship subtotal"],
      ["b", 3, 2, "3", "First-place votes"],
      ["d", 4, 2, "4", "The chair's decision"],
      ["c", 5, 2, "5", "The chair's decision"],
    ]);
    expect(r[0]!.explanation).toBe("Score 95: 1st.");
    expect(r[3]!.explanation).toBe(
      "Tied on 90.5 with entry A, entry B and entry C. Workmanship subtotal: entry A 38, entry B 36, entry D 36, entry C 36. " +
      "First-place votes: entry B 2, entry D 1, entry C 1. The chair's decision: entry D listed 1st, entry C listed 2nd. " +
      "The chair's decision decided its place: 4th.",
    );
  });

  it("a different chain order gives a different result", () => {
    const r = rankCategory(entries, [votes, work, chair]);
    expect(r.map((e) => e.entryId)).toEqual(["e", "b", "d", "c", "a"]);
    expect(r.find((e) => e.entryId === "d")!.explanation).toContain("Workmanship subtotal: no difference (entry D 36, entry C 36).");
  });

  it("ties left after the chain share the rank and the next rank skips", () => {
    const r = rankCategory([
      { entryId: "x", label: "entry 7", score: 88, tieBreakValues: { workmanship: 35 } },
      { entryId: "y", label: "entry 9", score: 88, tieBreakValues: { workmanship: 35 } },
      { entryId: "z", label: "entry 4", score: 92 },
      { entryId: "w", label: "entry 2", score: 80 },
    ], [work]);
    expect(r.map((e) => [e.entryId, e.rank, e.displayRank, e.tied])).toEqual([["z", 1, "1", false], ["x", 2, "=2", true], ["y", 2, "=2", true], ["w", 4, "4", false]]);
    expect(r[1]!.explanation).toBe("Tied on 88 with entry 9. Workmanship subtotal: no difference (entry 7 35, entry 9 35). Still tied with entry 9 after every tie-break, so they share 2nd.");
  });

  it("a missing tie-break value counts as worst; unscored entries come last, unranked", () => {
    const r = rankCategory([
      { entryId: "p", score: 90, tieBreakValues: {} },
      { entryId: "q", score: 90, tieBreakValues: { workmanship: 10 } },
      { entryId: "u", score: null },
    ], [work]);
    expect(r.map((e) => [e.entryId, e.rank, e.displayRank])).toEqual([["q", 1, "1"], ["p", 2, "2"], ["u", null, "—"]]);
    expect(r[1]!.explanation).toContain("entry p none recorded");
    expect(r[2]!.explanation).toBe("Not ranked: no score yet.");
  });

  it("without tie-breaks, ranks are the competition ranks of the scores (property)", () => {
    fc.assert(fc.property(fc.array(fc.integer({ min: 0, max: 6 }), { maxLength: 15 }), (xs) => {
      const r = rankCategory(candidates(xs), []);
      const ranks = competitionRanks(xs);
      for (const e of r) expect(e.rank).toBe(ranks[Number(e.entryId.slice(1)) - 1]);
    }), { numRuns: 300 });
  });
});

describe("firstPlaceVotes", () => {
  it("counts, per entry, the judges who gave it their top total (ties count for each)", () => {
    expect(firstPlaceVotes([
      { entryId: "e1", judgeId: "J1", total: 95 }, { entryId: "e2", judgeId: "J1", total: 95 }, { entryId: "e3", judgeId: "J1", total: 90 },
      { entryId: "e3", judgeId: "J2", total: 92 }, { entryId: "e1", judgeId: "J2", total: 91 },
      { entryId: "e4", judgeId: "J2", total: 70 },
    ])).toEqual({ e1: 1, e2: 1, e3: 1, e4: 0 });
  });
});

// The guild "Ribbons Chair" duties sheet (docsbay.net/ribbons-chair): 3 or fewer entries → 1st only;
// 6 or fewer → 1st and 2nd; a tie for 1st or 2nd → no 3rd; a tie for 3rd → four ribbons.
// (Another year's copy of the same sheet, on docest.com, says 4 or fewer and 8 or fewer: shows set these.)
const GUILD_SIZES = [{ maxEntries: 3, places: 1 }, { maxEntries: 6, places: 2 }];

describe("placeAwards", () => {
  it("tie for 2nd → no 3rd (shareAndSkip)", () => {
    const p = placeAwards(rankScores([95, 90, 90, 85, 80, 75, 70]), { ties: "shareAndSkip" });
    expect(placesOf(p)).toEqual([1, 2, 2, null, null, null, null]);
    expect(p.entries[1]!).toMatchObject({ placeLabel: "2nd", shared: true, text: "2nd place (shared)." });
    expect(p.notAwarded).toEqual([{ place: 3, placeLabel: "3rd", why: "tie", text: "Entry 2 and entry 3 tied for 2nd, so there is no 3rd." }]);
  });

  it("shareNoSkip gives the next entry the next place", () => {
    expect(placesOf(placeAwards(rankScores([95, 90, 90, 85]), { ties: "shareNoSkip" }))).toEqual([1, 2, 2, 3]);
    expect(placesOf(placeAwards(rankScores([95, 95, 90, 85]), { ties: "shareNoSkip" }))).toEqual([1, 1, 2, 3]);
  });

  it("shareWithinCount follows the whole guild rule: a tie for 1st or 2nd → no 3rd, a tie for 3rd → four ribbons (docsbay.net/ribbons-chair)", () => {
    const tie1 = placeAwards(rankScores([95, 95, 90, 85]), { ties: "shareWithinCount" });
    expect(placesOf(tie1)).toEqual([1, 1, 2, null]);
    expect(tie1.notAwarded.map((n) => n.text)).toEqual(["Entry 1 and entry 2 tied for 1st, so there is no 3rd."]);
    expect(placesOf(placeAwards(rankScores([95, 90, 90, 85]), { ties: "shareWithinCount" }))).toEqual([1, 2, 2, null]);
    expect(placesOf(placeAwards(rankScores([95, 90, 85, 85, 80]), { ties: "shareWithinCount" }))).toEqual([1, 2, 3, 3, null]);
  });

  it("shareAndSkip after a tie for 1st still gives a 3rd (1, 1, 3), unlike the guild sheet", () => {
    expect(placesOf(placeAwards(rankScores([95, 95, 90, 85]), { ties: "shareAndSkip" }))).toEqual([1, 1, 3, null]);
  });

  it("withholds a ribbon no entry reaches, and says so; the entry is considered for the next place", () => {
    const p = placeAwards(rankScores([92, 83, 81]), { ties: "shareAndSkip", minimumScores: [90, 85, 80] });
    expect(placesOf(p)).toEqual([1, 3, null]);
    expect(p.notAwarded).toEqual([{
      place: 2, placeLabel: "2nd", why: "minimum",
      text: "No entry reached the 85-point minimum for 2nd (the best left, entry 2, has 83), so the 2nd-place ribbon is withheld.",
    }]);
    const none = placeAwards(rankScores([79.5]), { ties: "shareAndSkip", minimumScores: [80, 80, 80] });
    expect(placesOf(none)).toEqual([null]);
    expect(none.notAwarded.map((n) => [n.place, n.why])).toEqual([[1, "minimum"], [2, "minimum"], [3, "minimum"]]);
  });

  it("small categories: 3 or fewer entries → 1st only; 6 or fewer → 1st and 2nd (docsbay.net/ribbons-chair)", () => {
    const three = placeAwards(rankScores([95, 90, 85]), { ties: "shareAndSkip", sizeRules: GUILD_SIZES });
    expect(placesOf(three)).toEqual([1, null, null]);
    expect(three.placesOffered).toBe(1);
    expect(three.notes).toEqual(["3 entries in the category: 1st only (the rule for 3 or fewer entries)."]);
    const six = placeAwards(rankScores([95, 90, 85, 80, 75, 70]), { ties: "shareAndSkip", sizeRules: GUILD_SIZES });
    expect(placesOf(six)).toEqual([1, 2, null, null, null, null]);
    expect(six.notes).toEqual(["6 entries in the category: 1st and 2nd only (the rule for 6 or fewer entries)."]);
    expect(placeAwards(rankScores([95, 90, 85, 80, 75, 70, 65]), { ties: "shareAndSkip", sizeRules: GUILD_SIZES }).placesOffered).toBe(3);
    expect([1, 3, 4, 6, 7, 50].map((n) => placesFor(n, 3, GUILD_SIZES).places)).toEqual([1, 1, 2, 2, 3, 3]);
  });

  it("sorting pass: only kept entries are placed; set-aside entries get none", () => {
    const p = placeAwards(rankScores([97, 90, 88, 85, 80]), { ties: "shareAndSkip", keptEntryIds: ["e2", "e4", "e5", "e9"] });
    expect(placesOf(p)).toEqual([null, 1, null, 2, 3]);
    expect(p.entries[0]!.text).toBe("Set aside in the sorting pass: no placement.");
    expect(p.problems).toEqual(["Entry e9 is on the kept list but not in this category."]);
  });

  it("says when there are too few entries for every place", () => {
    const p = placeAwards(rankScores([90, 80]), { ties: "shareAndSkip" });
    expect(p.notAwarded).toEqual([{ place: 3, placeLabel: "3rd", why: "tooFewEntries", text: "No 3rd: only 2 ranked entries to place." }]);
  });

  it("honorable mentions: a count (ties at the edge share) or the judges' own list", () => {
    const ranked = rankScores([95, 90, 85, 80, 75, 75, 70]);
    const counted = placeAwards(ranked, { ties: "shareAndSkip", honorableMentions: { count: 2 } });
    expect(counted.entries.filter((e) => e.honorableMention).map((e) => e.entryId)).toEqual(["e4", "e5", "e6"]);
    expect(counted.notes).toEqual(["Entry 5 and entry 6 tied for the last honorable mention, so each gets one."]);
    const floor = placeAwards(ranked, { ties: "shareAndSkip", honorableMentions: { count: 2 }, honorableMentionMinimum: 78 });
    expect(floor.entries.filter((e) => e.honorableMention).map((e) => e.entryId)).toEqual(["e4"]);
    expect(floor.notes).toEqual(["Only 1 of 2 honorable mentions were given: no other kept entry reached 78."]);
    const listed = placeAwards(ranked, { ties: "shareAndSkip", honorableMentions: { entryIds: ["e6", "e1", "zz"] } });
    expect(listed.entries.filter((e) => e.honorableMention).map((e) => [e.entryId, e.text])).toEqual([["e6", "Honorable mention."]]);
    expect(listed.problems).toEqual([
      "Entry 1 already has 1st place, so it gets no honorable mention as well.",
      "Entry zz is listed for an honorable mention but is not in this category.",
    ]);
  });

  // Properties over many ties: scores from a narrow band.
  const scores = fc.array(fc.integer({ min: 80, max: 85 }), { maxLength: 12 });
  const places = fc.integer({ min: 1, max: 4 });

  it("shareAndSkip places each entry at its competition rank when that is within the places (property)", () => {
    fc.assert(fc.property(scores, places, (xs, n) => {
      const p = placeAwards(rankScores(xs), { ties: "shareAndSkip", places: n } satisfies PlaceRules);
      const ranks = competitionRanks(xs);
      for (const e of p.entries) {
        const r = ranks[Number(e.entryId.slice(1)) - 1]!;
        expect(e.place).toBe(r <= n ? r : null);
      }
    }), { numRuns: 500 });
  });

  it("shareNoSkip places each entry at its dense rank when that is within the places (property)", () => {
    fc.assert(fc.property(scores, places, (xs, n) => {
      const p = placeAwards(rankScores(xs), { ties: "shareNoSkip", places: n });
      const distinct = [...new Set(xs)].sort((a, b) => b - a);
      for (const e of p.entries) {
        const dense = distinct.indexOf(xs[Number(e.entryId.slice(1)) - 1]!) + 1;
        expect(e.place).toBe(dense <= n ? dense : null);
      }
    }), { numRuns: 500 });
  });

  it("shareWithinCount places no more entries than places, except all of a tie at the last place (property)", () => {
    fc.assert(fc.property(scores, places, (xs, n) => {
      const p = placeAwards(rankScores(xs), { ties: "shareWithinCount", places: n });
      const placed = p.entries.filter((e) => e.place !== null);
      const last = Math.max(0, ...placed.map((e) => e.place!));
      const beforeLast = placed.filter((e) => e.place! < last).length;
      expect(beforeLast).toBeLessThan(n);
      expect(placed.length).toBeGreaterThanOrEqual(Math.min(n, xs.length));
      // Every entry scoring at least as well as a placed one is placed too.
      for (const e of p.entries) if (e.place === null && placed.length) expect(e.rank!).toBeGreaterThan(Math.max(...placed.map((q) => q.rank!)));
    }), { numRuns: 500 });
  });
});

describe("ordinal", () => {
  it("writes places the usual way", () => {
    expect([1, 2, 3, 4, 11, 12, 13, 21, 22, 23, 101, 111].map(ordinal)).toEqual(["1st", "2nd", "3rd", "4th", "11th", "12th", "13th", "21st", "22nd", "23rd", "101st", "111th"]);
  });
});
