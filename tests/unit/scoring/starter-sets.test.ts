// The starter category sets: no gaps, no overlaps, exactly one category for every plausible entry.
import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { checkRuleSet } from "@/scoring/category-checks";
import { decideAll, decideCategory, type EntryFacts } from "@/scoring/categories";
import { GUILD_STARTER, loadStarterSet, REGIONAL_STARTER, STARTER_SETS } from "@/scoring/starter-sets";
import { DEMO_TECHNIQUES, demoScenario } from "@/db/seed/demo-data";

const IN = 25_400; // µm, exactly (NIST SP 811, Appendix B)

// Plausible entries: sides from 6 to 130 in in eighths of an inch, any mix of the techniques an
// entry form offers (or none, or one typed in another case or without its accent), one to five
// makers, any division, judged or display only.
const techniques = fc.subarray([...DEMO_TECHNIQUES, "Applique", "MODERN", "thread painting"]);
const plausibleEntry: fc.Arbitrary<EntryFacts> = fc.record({
  widthUm: fc.integer({ min: 6 * 8, max: 130 * 8 }).map((e) => (e * IN) / 8),
  lengthUm: fc.integer({ min: 6 * 8, max: 130 * 8 }).map((e) => (e * IN) / 8),
  techniques,
  quiltingMethod: fc.constantFrom("hand", "home_machine", "frame_machine"),
  makerCount: fc.integer({ min: 1, max: 5 }),
  quiltedForHire: fc.boolean(),
  division: fc.constantFrom("open", "youth", "first_time"),
  youthAge: fc.option(fc.integer({ min: 5, max: 18 })),
  judged: fc.boolean(),
});

/** Sizes right on and beside each band limit of both sets, where off-by-one rules go wrong. */
const onTheLimits = fc.record({
  perimeterIn: fc.constantFrom(200, 240, 300),
  offsetEighths: fc.integer({ min: -1, max: 1 }),
  widthIn: fc.integer({ min: 25, max: 40 }),
}).map(({ perimeterIn, offsetEighths, widthIn }) => ({ widthUm: widthIn * IN, lengthUm: ((perimeterIn / 2 - widthIn) * 8 + offsetEighths) * (IN / 8) }));

describe.each(STARTER_SETS.map((s) => [s.name, s] as const))("starter set: %s", (_, set) => {
  it("has unique ids and codes and passes checkRuleSet with no gaps, overlaps or problems", () => {
    expect(new Set(set.rules.map((r) => r.id)).size).toBe(set.rules.length);
    expect(new Set(set.rules.map((r) => r.code)).size).toBe(set.rules.length);
    expect(checkRuleSet(set.rules)).toEqual({ gaps: [], overlaps: [], problems: [], samples: [] });
  });

  it("gives exactly one category to every plausible entry (property)", () => {
    fc.assert(fc.property(plausibleEntry, (e) => {
      const d = decideCategory(e, set.rules, { overlap: set.overlap });
      expect(d.kind, d.reasons.join("\n")).toBe("one");
    }), { numRuns: 2_000 });
  });

  it("gives exactly one category on and beside every size limit (property)", () => {
    fc.assert(fc.property(plausibleEntry, onTheLimits, (e, sizes) => {
      expect(decideCategory({ ...e, ...sizes }, set.rules).kind).toBe("one");
    }));
  });

  it("gives exactly one category to every quilt of the demo show", () => {
    const quilts = demoScenario().quilts.map((q): EntryFacts => ({
      widthUm: q.widthUm, lengthUm: q.lengthUm, techniques: q.techniques, quiltingMethod: q.quiltingMethod,
      makerCount: q.madeBy.length, quiltedForHire: q.quiltedForHire, division: q.division, judged: q.judged,
    }));
    expect(checkRuleSet(set.rules, quilts).samples).toEqual([]);
  });

  it("loads as a fresh copy, so a chair's edits leave the starter untouched", () => {
    const copy = loadStarterSet(set.key);
    expect(copy).toEqual(set.rules);
    copy[0]!.name = "Edited";
    expect(set.rules[0]!.name).not.toBe("Edited");
  });
});

describe("the guild starter", () => {
  const pieced = (w: number, l: number, extra: Partial<EntryFacts> = {}): EntryFacts => ({
    widthUm: w * IN, lengthUm: l * IN, techniques: ["pieced"], quiltingMethod: "home_machine",
    makerCount: 1, quiltedForHire: false, division: "open", judged: true, ...extra,
  });
  const name = (e: EntryFacts) => {
    const d = decideCategory(e, GUILD_STARTER.rules);
    return d.kind === "one" ? d.category.name : d.kind;
  };

  it.each([
    [40, 59, "Pieced, Small"], // perimeter 198 in
    [40, 60, "Pieced, Medium"], // 200 in, exactly on the limit
    [60, 89.875, "Pieced, Medium"], // 299¾ in
    [60, 90, "Pieced, Large"], // 300 in
    [91, 104, "Pieced, Large"], // 390 in
  ])("puts a pieced %d × %d in quilt in %s", (w, l, expected) => {
    expect(name(pieced(w, l))).toBe(expected);
  });

  it("places mixed techniques by the chain art → modern → wholecloth → appliqué → pieced", () => {
    expect(name(pieced(50, 50, { techniques: ["pieced", "appliqué"] }))).toBe("Appliqué");
    expect(name(pieced(50, 50, { techniques: ["appliqué", "modern"] }))).toBe("Modern");
    expect(name(pieced(50, 50, { techniques: ["modern", "art"] }))).toBe("Art quilt (original design)");
    expect(name(pieced(50, 50, { techniques: ["wholecloth"] }))).toBe("Wholecloth");
    expect(name(pieced(50, 50, { techniques: ["embroidery"] }))).toBe("Pieced, Medium");
    expect(name(pieced(50, 50, { division: "youth", techniques: ["art"] }))).toBe("Youth");
    expect(name(pieced(50, 50, { judged: false, division: "youth" }))).toBe("Display only");
  });
});

describe("the regional starter", () => {
  const base: EntryFacts = {
    widthUm: 60 * IN, lengthUm: 80 * IN, techniques: ["pieced"], quiltingMethod: "frame_machine",
    makerCount: 1, quiltedForHire: false, division: "open", judged: true,
  };
  const codeOf = (e: Partial<EntryFacts>) => {
    const d = decideCategory({ ...base, ...e }, REGIONAL_STARTER.rules);
    return d.kind === "one" ? d.category.code : d.kind;
  };

  it("crosses technique × size × makers, with miniatures, youth and display only apart", () => {
    expect(REGIONAL_STARTER.rules).toHaveLength(27);
    expect(codeOf({})).toBe("112"); // one maker, pieced, large (perimeter 280 in)
    expect(codeOf({ widthUm: 50 * IN, lengthUm: 69 * IN })).toBe("111"); // 238 in: small
    expect(codeOf({ widthUm: 50 * IN, lengthUm: 70 * IN })).toBe("112"); // 240 in: large
    expect(codeOf({ quiltedForHire: true })).toBe("212");
    expect(codeOf({ makerCount: 2, quiltedForHire: true })).toBe("312");
    expect(codeOf({ makerCount: 3, techniques: ["Applique"] })).toBe("322");
    expect(codeOf({ techniques: ["art", "appliqué"] })).toBe("132");
    expect(codeOf({ techniques: ["modern"] })).toBe("142");
    expect(codeOf({ widthUm: 24 * IN, lengthUm: 24 * IN })).toBe("400"); // no side over 24 in
    expect(codeOf({ widthUm: 24 * IN, lengthUm: 24 * IN + 3_175 })).toBe("111"); // 24⅛ in
    expect(codeOf({ division: "youth", makerCount: 2 })).toBe("500");
    expect(codeOf({ judged: false })).toBe("900");
  });

  it("decides the demo show's quilts in bulk with the same results as one by one", () => {
    const quilts = demoScenario().quilts.slice(0, 30).map((q): EntryFacts => ({
      ...base, widthUm: q.widthUm, lengthUm: q.lengthUm, techniques: q.techniques, makerCount: q.madeBy.length, quiltedForHire: q.quiltedForHire,
    }));
    expect(decideAll(quilts, REGIONAL_STARTER.rules)).toEqual(quilts.map((q) => decideCategory(q, REGIONAL_STARTER.rules)));
  });
});
