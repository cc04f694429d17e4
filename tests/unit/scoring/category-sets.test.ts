// A stored category set on top of the engine: makers counted from the entry, the intake
// re-measure against the tolerance, merges followed, the moves a changed set makes and their
// fingerprint, and the split and merge helpers the chair's editor offers.
import fc from "fast-check";
import { describe, expect, it } from "vitest";
import type { CategoryRule, EntryFacts } from "@/scoring/categories";
import {
  checkSet,
  decideInSet,
  describeOutcome,
  factsOf,
  makerCount,
  mergeInto,
  movesDigest,
  placeEntry,
  planMoves,
  prepareSet,
  sizeCheck,
  splitBySize,
  type EntryForCategory,
  type EntryInSet,
  type ShowCategory,
} from "@/scoring/category-sets";

// 1 in = 25,400 µm exactly (NIST SP 811, Appendix B).
const IN = 25_400;

const perimeterBand = (id: string, code: string, bounds: [op: "<" | "<=" | ">" | ">=", inches: number][]): ShowCategory => ({
  id,
  code,
  name: code,
  precedence: Number(code),
  conditions: [{ kind: "size", measure: "perimeter", bounds: bounds.map(([op, value]) => ({ op, value, unit: "in" })) }],
});

function row(widthIn: number, lengthIn: number, extra: Partial<EntryForCategory> = {}): EntryForCategory {
  return {
    widthUm: widthIn * IN,
    lengthUm: lengthIn * IN,
    techniques: ["pieced"],
    madeBy: ["Ada Byrd"],
    quiltedBy: "",
    quiltedForHire: false,
    quiltingMethod: "home_machine",
    division: "open",
    youthAge: null,
    judged: true,
    ...extra,
  };
}

const facts = (widthIn: number, lengthIn: number): EntryFacts => factsOf(row(widthIn, lengthIn), IN);

describe("makerCount", () => {
  it("counts distinct makers plus a quilter who is someone else (common practice: one pieced, one quilted is two)", () => {
    expect(makerCount(["Ada Byrd"], "")).toBe(1);
    expect(makerCount(["Ada Byrd"], "Cleo Marsh")).toBe(2);
    expect(makerCount(["Ada Byrd", "ada  byrd"], "ADA BYRD")).toBe(1);
    expect(makerCount(["Zoë Park", "Zoe Park"], "")).toBe(1);
    expect(makerCount(["A", "B", "C"], "")).toBe(3);
    expect(makerCount([], "")).toBe(1);
  });
});

describe("sizeCheck at intake", () => {
  // "Within 1 in of the registered size" is one show's published rule (Harvest Quilt Show NY, quilt handling).
  it("within the tolerance keeps the registered size; beyond it the measured size decides", () => {
    const within = sizeCheck({ ...row(60, 80), measuredWidthUm: 61 * IN, measuredLengthUm: 80 * IN }, IN)!;
    expect(within).toMatchObject({ offByUm: IN, outside: false });
    expect(within.text).toBe("Measured 61 × 80 in, registered 60 × 80 in: off by 1 in, within the 1 in allowed.");
    const outside = sizeCheck({ ...row(60, 80), measuredWidthUm: 62 * IN, measuredLengthUm: 80 * IN }, IN)!;
    expect(outside).toMatchObject({ offByUm: 2 * IN, outside: true });
    expect(outside.text).toContain("more than the 1 in allowed");
    expect(factsOf({ ...row(60, 80), measuredWidthUm: 61 * IN, measuredLengthUm: 80 * IN }, IN).widthUm).toBe(60 * IN);
    expect(factsOf({ ...row(60, 80), measuredWidthUm: 62 * IN, measuredLengthUm: 80 * IN }, IN).widthUm).toBe(62 * IN);
  });

  it("exactly on the tolerance is within it, one micrometre more is outside", () => {
    expect(sizeCheck({ ...row(60, 80), measuredWidthUm: 60 * IN + IN, measuredLengthUm: 80 * IN }, IN)!.outside).toBe(false);
    expect(sizeCheck({ ...row(60, 80), measuredWidthUm: 60 * IN + IN + 1, measuredLengthUm: 80 * IN }, IN)!.outside).toBe(true);
  });

  it("a quilt measured turned a quarter is compared the way it fits", () => {
    expect(sizeCheck({ ...row(60, 80), measuredWidthUm: 80 * IN, measuredLengthUm: 60 * IN }, IN)).toMatchObject({ offByUm: 0, outside: false, text: "Measured 80 × 60 in, as registered." });
  });

  it("no measurement, no check", () => {
    expect(sizeCheck(row(60, 80), IN)).toBeNull();
  });
});

describe("deciding against a stored set", () => {
  const small = perimeterBand("a", "10", [["<", 200]]);
  const medium = perimeterBand("b", "11", [[">=", 200], ["<", 300]]);
  const large = perimeterBand("c", "12", [[">=", 300]]);

  it("a merged category's entries belong to the category it was merged into, with the reason said", () => {
    const set = mergeInto([small, medium, large], "a", "b");
    const d = decideInSet(facts(40, 50), prepareSet(set)); // perimeter 180 in
    expect(d).toMatchObject({ kind: "one", category: { id: "b", code: "11" } });
    expect(d.reasons.at(-1)).toBe("10 10 was merged into 11 11");
  });

  it("an overlap between two categories merged into one is no longer an overlap", () => {
    // Bands meeting with "<=" and ">=" at 280 in overlap there (the trap in published rules, e.g. Broward Quilt Expo 2013).
    const lo = perimeterBand("lo", "20", [["<=", 280]]);
    const hi = perimeterBand("hi", "21", [[">=", 280]]);
    expect(decideInSet(facts(60, 80), prepareSet([lo, hi])).kind).toBe("several");
    const merged = mergeInto([lo, hi], "hi", "lo");
    expect(decideInSet(facts(60, 80), prepareSet(merged))).toMatchObject({ kind: "one", category: { id: "lo" } });
    expect(checkSet([lo, hi]).overlaps).toHaveLength(1);
    expect(checkSet(merged).overlaps).toHaveLength(0);
  });

  it("merges chain: merging into a category that is itself merged ends at the last one", () => {
    const set = mergeInto(mergeInto([small, medium, large], "a", "b"), "b", "c");
    expect(set.find((c) => c.id === "a")!.mergedIntoId).toBe("c");
    expect(decideInSet(facts(40, 50), prepareSet(set))).toMatchObject({ kind: "one", category: { id: "c" } });
  });

  it("an override stands while its category exists, and goes back to the rules when it is removed", () => {
    const current = { state: "overridden", categoryId: "c" } as const;
    expect(placeEntry(facts(40, 50), current, prepareSet([small, medium, large])).outcome).toEqual(current);
    expect(placeEntry(facts(40, 50), current, prepareSet([small, medium])).outcome).toEqual({ state: "decided", categoryId: "a" });
  });

  it("a show with no categories leaves entries undecided", () => {
    expect(placeEntry(facts(40, 50), { state: "undecided" }, prepareSet([])).outcome).toEqual({ state: "undecided" });
  });
});

describe("planMoves and its fingerprint", () => {
  const small = perimeterBand("a", "10", [["<", 240]]);
  const large = perimeterBand("b", "11", [[">=", 241]]);
  // The 240 → 241 gap leaves 240.5 in nowhere (Heritage Quilters of Huntsville's published bands).
  const entries: EntryInSet[] = [
    { id: "e1", entryNumber: 101, title: "Small", facts: facts(50, 60), current: { state: "decided", categoryId: "a" } }, // 220 in
    { id: "e2", entryNumber: 102, title: "Gap", facts: factsOf(row(0, 0, { widthUm: 60 * IN, lengthUm: 60.25 * IN }), IN), current: { state: "fits_none" } }, // 240.5 in
    { id: "e3", entryNumber: 103, title: "Large", facts: facts(60, 80), current: { state: "decided", categoryId: "b" } }, // 280 in
  ];

  it("only entries whose outcome changes move, in entry-number order", () => {
    expect(planMoves(entries, [small, large])).toEqual([]);
    const fixed = [small, perimeterBand("b", "11", [[">=", 240]])];
    const moves = planMoves(entries, fixed);
    expect(moves.map((m) => [m.entryNumber, m.from, m.to])).toEqual([[102, { state: "fits_none" }, { state: "decided", categoryId: "b" }]]);
  });

  it("the fingerprint is the same for the same moves and differs when they differ", () => {
    const fixed = [small, perimeterBand("b", "11", [[">=", 240]])];
    const a = movesDigest(planMoves(entries, fixed));
    expect(movesDigest(planMoves([...entries].reverse(), fixed))).toBe(a);
    const other = movesDigest(planMoves(entries, [perimeterBand("a", "10", [["<", 300]]), large]));
    expect(other).not.toBe(a);
    expect(movesDigest([])).toBe("0-811c9dc5");
  });

  it("describes outcomes in words", () => {
    const byId = new Map([small, large].map((c) => [c.id, c]));
    expect(describeOutcome({ state: "decided", categoryId: "a" }, byId)).toBe("10 10");
    expect(describeOutcome({ state: "overridden", categoryId: "b" }, byId)).toBe("11 11 (chair's choice)");
    expect(describeOutcome({ state: "fits_several", candidateIds: ["a", "b"] }, byId)).toBe("fits several: 10, 11");
    expect(describeOutcome({ state: "fits_none" }, byId)).toBe("fits no category");
    expect(describeOutcome({ state: "decided", categoryId: "zz" }, byId)).toBe("a removed category");
  });
});

describe("splitBySize", () => {
  const everything: ShowCategory = { id: "all", code: "10", name: "Pieced", precedence: 10, conditions: [{ kind: "techniques", mode: "anyOf", techniques: ["pieced"] }] };

  it("the two halves meet with < and ≥, so every size fits exactly one (property, fast-check)", () => {
    const split = splitBySize([everything], "all", { measure: "perimeter", value: 240, unit: "in" }, { id: "big", code: "11", name: "Pieced, large" });
    expect(split.map((c) => c.id)).toEqual(["all", "big"]);
    expect(checkSet(split).gaps).toEqual([]);
    expect(checkSet(split).overlaps).toEqual([]);
    const prepared = prepareSet(split);
    fc.assert(
      fc.property(fc.integer({ min: 1, max: 200 * IN }), fc.integer({ min: 1, max: 200 * IN }), (w, l) => {
        const d = decideInSet(factsOf(row(0, 0, { widthUm: w, lengthUm: l }), IN), prepared);
        expect(d.kind).toBe("one");
        const perimeter = 2 * (w + l);
        expect(d.kind === "one" && d.category.id).toBe(perimeter < 240 * IN ? "all" : "big");
      }),
      { numRuns: 500 },
    );
  });

  it("splitting moves only the entries on the new side", () => {
    const before: EntryInSet[] = [
      { id: "s", entryNumber: 1, title: "s", facts: facts(50, 60), current: { state: "decided", categoryId: "all" } }, // 220 in
      { id: "l", entryNumber: 2, title: "l", facts: facts(60, 80), current: { state: "decided", categoryId: "all" } }, // 280 in
    ];
    const split = splitBySize([everything], "all", { measure: "perimeter", value: 240, unit: "in" }, { id: "big", code: "11", name: "Pieced, large" });
    expect(planMoves(before, split).map((m) => [m.entryId, m.to])).toEqual([["l", { state: "decided", categoryId: "big" }]]);
  });
});

describe("starter-like rules stay exact through factsOf", () => {
  it("60 × 80 in is perimeter 280 in exactly, whether typed in inches or as 152.4 × 203.2 cm", () => {
    const rule: CategoryRule = perimeterBand("x", "10", [[">=", 280]]);
    const inches = factsOf(row(60, 80), IN);
    const cm = factsOf(row(0, 0, { widthUm: 152.4 * 10_000, lengthUm: 203.2 * 10_000 }), IN);
    expect(cm.widthUm).toBe(inches.widthUm);
    expect(decideInSet(cm, prepareSet([rule]))).toMatchObject({ kind: "one" });
  });
});
