// The category engine: exact boundaries, the boundary traps seen in published show rules, plain-words
// reasons, the overlap option, rule-set checks and the editor's preview.
import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { checkRuleSet } from "@/scoring/category-checks";
import {
  decideAll, decideCategory, explainCategory, previewRule,
  type Bound, type CategoryRule, type Condition, type Decision, type EntryFacts, type Measure,
} from "@/scoring/categories";
import { parseLength } from "@/scoring/measure";

// 1 in = 25,400 µm exactly (NIST SP 811, Appendix B).
const IN = 25_400;

function entry(widthIn: number, lengthIn: number, facts: Partial<EntryFacts> = {}): EntryFacts {
  return {
    widthUm: Math.round(widthIn * IN), // test sizes are eighths of an inch: exact
    lengthUm: Math.round(lengthIn * IN),
    techniques: ["pieced"],
    quiltingMethod: "home_machine",
    makerCount: 1,
    quiltedForHire: false,
    division: "open",
    judged: true,
    ...facts,
  };
}

/** A quilt with this perimeter: a 20-in-wide strip, the rest in its length. */
const withPerimeter = (perimeterIn: number) => entry(20, perimeterIn / 2 - 20);

const b = (op: Bound["op"], value: number, unit: Bound["unit"] = "in"): Bound => ({ op, value, unit });
let precedence = 0;
function rule(name: string, conditions: Condition[], extra: Partial<CategoryRule> = {}): CategoryRule {
  precedence += 1;
  return { id: name.toLowerCase().replace(/\W+/g, "-"), code: name.slice(0, 3).toUpperCase(), name, precedence, conditions, ...extra };
}
const size = (measure: Measure, ...bounds: Bound[]): Condition => ({ kind: "size", measure, bounds });

const codes = (d: Decision) => (d.kind === "one" ? [d.category.name] : d.kind === "several" ? d.categories.map((c) => c.name) : []);
const outcome = (d: Decision) => `${d.kind}:${codes(d).join("+")}`;

describe("boundary traps from published show rules", () => {
  // Broward Quilt Expo, 2013 show categories (browardquiltexpo.com): miniature ≤ 96 in perimeter,
  // small 96–280, large ≥ 280, as published, so both 96 and 280 fall in two bands.
  const broward = [
    rule("Miniature", [size("perimeter", b("<=", 96))]),
    rule("Small", [size("perimeter", b(">=", 96), b("<=", 280))]),
    rule("Large", [size("perimeter", b(">=", 280))]),
  ];

  it.each([
    [80, "one:Miniature"],
    [95.75, "one:Miniature"],
    [96, "several:Miniature+Small"],
    [96.25, "one:Small"],
    [200, "one:Small"],
    [279.75, "one:Small"],
    [280, "several:Small+Large"],
    [280.25, "one:Large"],
  ])("Broward Quilt Expo 2013 bands: perimeter %d in → %s", (perimeterIn, expected) => {
    expect(outcome(decideCategory(withPerimeter(perimeterIn), broward))).toBe(expected);
  });

  it("Broward Quilt Expo 2013 bands: checkRuleSet finds the overlaps at exactly 96 and 280 in and no gap", () => {
    const check = checkRuleSet(broward);
    expect(check.gaps).toEqual([]);
    expect(check.overlaps.map((o) => [o.atOrFromUm, o.toUm, o.text])).toEqual([
      [96 * IN, 96 * IN, "perimeter exactly 96 in fits both Miniature and Small"],
      [280 * IN, 280 * IN, "perimeter exactly 280 in fits both Small and Large"],
    ]);
  });

  // Tree City Quilt Guild, 2014 show categories (treecityquiltguild.blogspot.com): wall < 200,
  // small 200–300, medium 300–400, large > 400: 300 is in two bands, 200 and 400 in one.
  const treeCity = [
    rule("Wall", [size("perimeter", b("<", 200))]),
    rule("Small", [size("perimeter", b(">=", 200), b("<=", 300))]),
    rule("Medium", [size("perimeter", b(">=", 300), b("<=", 400))]),
    rule("Large", [size("perimeter", b(">", 400))]),
  ];

  it.each([
    [199.75, "one:Wall"],
    [200, "one:Small"],
    [299.75, "one:Small"],
    [300, "several:Small+Medium"],
    [300.25, "one:Medium"],
    [400, "one:Medium"],
    [400.25, "one:Large"],
  ])("Tree City Quilt Guild 2014 bands: perimeter %d in → %s", (perimeterIn, expected) => {
    expect(outcome(decideCategory(withPerimeter(perimeterIn), treeCity))).toBe(expected);
  });

  it("Tree City Quilt Guild 2014 bands: the only overlap is at exactly 300 in", () => {
    const check = checkRuleSet(treeCity);
    expect(check.gaps).toEqual([]);
    expect(check.overlaps.map((o) => o.text)).toEqual(["perimeter exactly 300 in fits both Small and Medium"]);
  });

  // Heritage Quilters of Huntsville (hsvquilters.org): small < 160, medium 160–240, large 241–320,
  // extra large > 320, so a perimeter between 240 and 241 in fits nothing.
  const huntsville = [
    rule("Small", [size("perimeter", b("<", 160))]),
    rule("Medium", [size("perimeter", b(">=", 160), b("<=", 240))]),
    rule("Large", [size("perimeter", b(">=", 241), b("<=", 320))]),
    rule("Extra large", [size("perimeter", b(">", 320))]),
  ];

  it.each([
    [159.75, "one:Small"],
    [160, "one:Medium"],
    [240, "one:Medium"],
    [240.5, "none:"],
    [240.875, "none:"],
    [241, "one:Large"],
    [320, "one:Large"],
    [320.125, "one:Extra large"],
  ])("Heritage Quilters of Huntsville bands: perimeter %d in → %s", (perimeterIn, expected) => {
    expect(outcome(decideCategory(withPerimeter(perimeterIn), huntsville))).toBe(expected);
  });

  it("Heritage Quilters of Huntsville bands: 240.5 in fits none, saying why for each band, and the gap is reported", () => {
    const d = decideCategory(withPerimeter(240.5), huntsville);
    expect(d.reasons).toEqual([
      "perimeter 240½ in is over the 160 in limit of Small",
      "perimeter 240½ in is over the 240 in limit of Medium",
      "perimeter 240½ in is under the 241 in minimum of Large",
      "perimeter 240½ in is under the 320 in minimum of Extra large",
    ]);
    const check = checkRuleSet(huntsville);
    expect(check.overlaps).toEqual([]);
    expect(check.gaps).toEqual([
      {
        measure: "perimeter", fromUm: 240 * IN + 1, toUm: 241 * IN - 1, where: "between",
        categories: [huntsville[1]!, huntsville[2]!].map(({ id, code, name }) => ({ id, code, name })),
        text: "perimeter over 240 in and under 241 in fits no category: between Medium and Large",
      },
    ]);
  });

  // Desert Sage Quilters, 2015 show (desertsagequiltersofmagicvalley.blogspot.com): small ≤ 3,520
  // sq in, medium to 6,786, large ≥ 6,873: nothing between 6,786 and 6,873 sq in.
  const desertSage = [
    rule("Small", [size("area", b("<=", 3_520, "sq in"))]),
    rule("Medium", [size("area", b(">", 3_520, "sq in"), b("<=", 6_786, "sq in"))]),
    rule("Large", [size("area", b(">=", 6_873, "sq in"))]),
  ];

  it.each([
    [55, 64, "one:Small"], // 3,520 sq in exactly
    [78, 87, "one:Medium"], // 6,786 sq in exactly
    [80, 85, "none:"], // 6,800 sq in
    [79, 87, "one:Large"], // 6,873 sq in exactly
  ])("Desert Sage Quilters 2015 area bands: %d × %d in → %s", (w, l, expected) => {
    expect(outcome(decideCategory(entry(w, l), desertSage))).toBe(expected);
  });

  it("Desert Sage Quilters 2015 area bands: the 6,786–6,873 sq in gap is reported, in sq in", () => {
    const d = decideCategory(entry(80, 85), desertSage);
    expect(d.reasons).toContain("area 6,800 sq in is over the 6,786 sq in limit of Medium");
    expect(d.reasons).toContain("area 6,800 sq in is under the 6,873 sq in minimum of Large");
    const [gap, ...rest] = checkRuleSet(desertSage).gaps;
    expect(rest).toEqual([]);
    expect(gap).toMatchObject({ measure: "area", fromUm: 6_786 * 645_160_000 + 1, toUm: 6_873 * 645_160_000 - 1 });
    expect(gap!.text).toBe("area over 6,786 sq in and under 6,873 sq in fits no category: between Medium and Large");
  });

  // AQS contest categories (aqsblog.com): miniature ≤ 24 × 24 in, wall 30–60 in wide; an entrant's
  // account (blog.bjfabricartist.com, 2015) of a 27 × 37 in quilt that fitted neither.
  it("AQS categories and an entrant's account: a 27 × 37 in quilt fits neither a ≤ 24 × 24 in miniature nor a 30–60 in wide wall category", () => {
    const aqs = [
      rule("Miniature", [size("width", b("<=", 24)), size("length", b("<=", 24))]),
      rule("Wall", [size("width", b(">=", 30), b("<=", 60))]),
    ];
    const d = decideCategory(entry(27, 37), aqs);
    expect(d).toEqual({
      kind: "none",
      reasons: ["width 27 in is over the 24 in limit of Miniature", "width 27 in is under the 30 in minimum of Wall"],
    });
    expect(explainCategory(entry(27, 37), aqs[0]!)).toEqual({
      fits: false,
      reasons: ["width 27 in is over the 24 in limit of Miniature", "length 37 in is over the 24 in limit of Miniature"],
    });
  });

  it("a queen-size 60 × 80 in quilt sits exactly on a 280 in perimeter limit, and the limit's own < or >= decides", () => {
    const bands = [rule("Small", [size("perimeter", b("<", 280))]), rule("Large", [size("perimeter", b(">=", 280))])];
    expect(outcome(decideCategory(entry(60, 80), bands))).toBe("one:Large");
    expect(explainCategory(entry(60, 80), bands[0]!).reasons).toEqual([
      "perimeter 280 in is at the 280 in limit of Small, which takes only under 280 in",
    ]);
    // The same quilt typed as 152.4 × 203.2 cm (1 in = 2.54 cm, NIST SP 811) and a limit set in cm.
    const cm = (text: string) => { const r = parseLength(text, "cm"); if (!r.ok) throw new Error(r.message); return r.um; };
    const typedInCm = { ...entry(60, 80), widthUm: cm("152.4"), lengthUm: cm("203.2") };
    expect(outcome(decideCategory(typedInCm, bands))).toBe("one:Large");
    const cmBands = [rule("Small", [size("perimeter", b("<", 711.2, "cm"))]), rule("Large", [size("perimeter", b(">=", 711.2, "cm"))])];
    expect(outcome(decideCategory(entry(60, 80), cmBands))).toBe("one:Large");
    expect(explainCategory(entry(60, 80), cmBands[1]!).reasons).toEqual(["perimeter 711.2 cm is at least 711.2 cm (Large)"]);
  });
});

describe("reasons in plain words", () => {
  const large = rule("Large", [size("perimeter", b(">=", 300))]);

  it("91 × 104 in: perimeter 390 in is at least 300 in (Large)", () => {
    expect(decideCategory(entry(91, 104), [large])).toEqual({
      kind: "one",
      category: { id: large.id, code: large.code, name: "Large" },
      reasons: ["perimeter 390 in is at least 300 in (Large)"],
    });
  });

  it("91 × 104 in: area 9,464 sq in, and 231.14 × 264.16 cm when the limit is in cm (NIST SP 811)", () => {
    const bed = rule("Bed", [size("area", b(">", 3_600, "sq in"))]);
    expect(explainCategory(entry(91, 104), bed).reasons).toEqual(["area 9,464 sq in is over 3,600 sq in (Bed)"]);
    const wide = rule("Wide", [size("width", b(">=", 200, "cm"))]);
    expect(explainCategory(entry(91, 104), wide).reasons).toEqual(["width 231.14 cm is at least 200 cm (Wide)"]);
  });

  it("shows enough decimals to tell a value from the limit it just misses", () => {
    const mini = rule("Mini", [size("width", b("<=", 24))]);
    const justOver = { ...entry(24, 20), widthUm: 24 * IN + 1 };
    expect(explainCategory(justOver, mini).reasons).toEqual(["width 24.00004 in is over the 24 in limit of Mini"]);
    expect(explainCategory(entry(24.5, 20), mini).reasons).toEqual(["width 24½ in is over the 24 in limit of Mini"]);
  });

  it("explains techniques (ignoring case and accents), quilting method, makers, hire, division and judging", () => {
    const e = entry(50, 60, { techniques: ["Pieced", "Applique"], quiltingMethod: "hand", makerCount: 2, quiltedForHire: true, division: "youth", youthAge: 16 });
    const cases: [Condition, boolean, string][] = [
      [{ kind: "techniques", mode: "anyOf", techniques: ["appliqué"] }, true, "techniques include appliqué (X)"],
      [{ kind: "techniques", mode: "anyOf", techniques: ["art", "modern"] }, false, "X takes quilts with art or modern; this one lists Pieced and Applique"],
      [{ kind: "techniques", mode: "allOf", techniques: ["pieced", "wholecloth"] }, false, "X takes quilts with pieced and wholecloth; this one lacks wholecloth"],
      [{ kind: "techniques", mode: "noneOf", techniques: ["appliqué", "art"] }, false, "techniques include appliqué, and X takes no quilt with appliqué or art"],
      [{ kind: "techniques", mode: "noneOf", techniques: ["art"] }, true, "no art among the techniques (X)"],
      [{ kind: "quiltingMethod", methods: ["home_machine", "frame_machine"] }, false, "quilted by hand: X takes quilting by home (stationary) machine or frame-mounted machine"],
      [{ kind: "quiltingMethod", methods: ["hand"] }, true, "quilted by hand (X)"],
      [{ kind: "makers", count: "one" }, false, "2 makers: X takes one maker"],
      [{ kind: "makers", count: "twoOrMore" }, true, "2 makers (X)"],
      [{ kind: "makers", count: "threeOrMore" }, false, "2 makers: X takes three or more makers"],
      [{ kind: "quiltedForHire", value: false }, false, "quilted for hire: X takes only quilts quilted by their makers"],
      [{ kind: "division", divisions: ["open", "first_time"] }, false, "youth division: X takes the open or first-time entrant division"],
      [{ kind: "division", divisions: ["youth"], youthMaxAge: 15 }, false, "youth entrant aged 16: X takes youth aged 15 and under"],
      [{ kind: "division", divisions: ["youth"], youthMaxAge: 18 }, true, "youth entrant aged 16 (X)"],
      [{ kind: "judged", value: false }, false, "entered for judging: X is for display-only quilts"],
    ];
    for (const [condition, fits, text] of cases) {
      const r = explainCategory(e, { id: "x", code: "X", name: "X", precedence: 1, conditions: [condition] });
      expect([r.fits, r.reasons]).toEqual([fits, [text]]);
    }
    const noAge = explainCategory({ ...e, youthAge: null }, { id: "y", code: "Y", name: "Y", precedence: 1, conditions: [{ kind: "division", divisions: ["youth"], youthMaxAge: 18 }] });
    expect(noAge).toEqual({ fits: false, reasons: ["youth entrant's age not given: Y takes youth aged 18 and under"] });
  });
});

describe("precedence and the overlap option", () => {
  const bands = [
    rule("Small", [size("perimeter", b("<=", 200))], { precedence: 2 }),
    rule("Large", [size("perimeter", b(">=", 200))], { precedence: 1 }),
  ];

  it("flags any overlap as several by default, listed in precedence order", () => {
    const d = decideCategory(withPerimeter(200), bands);
    expect(d.kind).toBe("several");
    expect(codes(d)).toEqual(["Large", "Small"]);
    expect(d.reasons[0]).toBe("fits 2 categories, Large and Small: the category rules overlap here, so the chair places it");
  });

  it("takes the lowest precedence value only when the chair opts in, and says so", () => {
    const d = decideCategory(withPerimeter(200), bands, { overlap: "firstByPrecedence" });
    expect(outcome(d)).toBe("one:Large");
    expect(d.reasons).toContain("also fits Small; Large comes first by precedence");
    expect(outcome(decideCategory(withPerimeter(100), bands, { overlap: "firstByPrecedence" }))).toBe("one:Small");
  });

  it("never picks between categories tied on precedence", () => {
    const tied = bands.map((r) => ({ ...r, precedence: 5 }));
    expect(decideCategory(withPerimeter(200), tied, { overlap: "firstByPrecedence" }).kind).toBe("several");
  });

  it("decideAll gives the same decisions as deciding one by one", () => {
    const entries = [80, 200, 300].map(withPerimeter);
    expect(decideAll(entries, bands)).toEqual(entries.map((e) => decideCategory(e, bands)));
  });
});

describe("checkRuleSet", () => {
  it("groups only rules that differ in size on one measure: technique bands are checked apart", () => {
    const pieced: Condition = { kind: "techniques", mode: "anyOf", techniques: ["pieced"] };
    const applique: Condition = { kind: "techniques", mode: "anyOf", techniques: ["appliqué"] };
    const rules = [
      rule("Pieced small", [pieced, size("perimeter", b("<", 200))]),
      rule("Pieced large", [pieced, size("perimeter", b(">=", 200))]),
      rule("Appliqué small", [applique, size("perimeter", b("<", 180))]),
      rule("Appliqué large", [applique, size("perimeter", b(">", 190))]),
      rule("Appliqué any size", [{ kind: "techniques", mode: "anyOf", techniques: ["Applique"] }]),
    ];
    // Without the any-size rule the appliqué bands leave 180 to 190 in uncovered…
    const bandsOnly = checkRuleSet(rules.slice(0, 4));
    expect(bandsOnly.overlaps).toEqual([]);
    expect(bandsOnly.gaps.map((g) => g.text)).toEqual(["perimeter at least 180 in and at most 190 in fits no category: between Appliqué small and Appliqué large"]);
    // …with it, every size is covered, twice where a band also applies.
    const check = checkRuleSet(rules);
    expect(check.gaps).toEqual([]);
    expect(check.overlaps.map((o) => o.text)).toEqual([
      "perimeter under 180 in fits both Appliqué small and Appliqué any size",
      "perimeter over 190 in fits both Appliqué any size and Appliqué large",
    ]);
    expect(check.overlaps[1]!.toUm).toBeNull();
  });

  it("reports a missing band below or above, unusable limits, impossible rules and twins", () => {
    const rules = [
      rule("Medium", [size("perimeter", b(">=", 100), b("<", 200))]),
      rule("Large", [size("perimeter", b(">=", 200), b("<", 400))]),
      rule("Bad unit", [size("area", b(">", 3_600, "in"))]),
      rule("Never", [size("width", b(">", 60), b("<", 30))]),
      rule("Twin", [size("width", b(">", 60), b("<", 30))]),
    ];
    const check = checkRuleSet(rules);
    expect(check.gaps.map((g) => [g.where, g.text])).toEqual([
      ["below", "perimeter under 100 in fits no category: below Medium"],
      ["above", "perimeter at least 400 in fits no category: above Large"],
    ]);
    expect(check.problems.map((p) => p.text)).toEqual([
      "Bad unit: the area limit 3600 in can't be used (area limits are in sq in or sq cm)",
      "Never can never fit: its width limits contradict each other",
      "Twin can never fit: its width limits contradict each other",
      "Never and Twin have the same conditions, so every entry fitting one fits both",
    ]);
    expect(decideCategory(entry(91, 104), [rules[2]!]).reasons[0]).toMatch(/can't be used/);
  });

  it("decides sample entries and lists those fitting none or several", () => {
    const rules = [rule("Pieced", [{ kind: "techniques", mode: "anyOf", techniques: ["pieced"] }]), rule("Appliqué", [{ kind: "techniques", mode: "anyOf", techniques: ["appliqué"] }])];
    const check = checkRuleSet(rules, [entry(50, 50), entry(50, 50, { techniques: ["pieced", "appliqué"] }), entry(50, 50, { techniques: [] })]);
    expect(check.samples.map((s) => [s.index, s.kind])).toEqual([[1, "several"], [2, "none"]]);
  });
});

describe("previewRule", () => {
  const huntsville = [
    rule("Small", [size("perimeter", b("<", 160))], { id: "s" }),
    rule("Medium", [size("perimeter", b(">=", 160), b("<=", 240))], { id: "m" }),
    rule("Large", [size("perimeter", b(">=", 241), b("<=", 320))], { id: "l" }),
  ];
  const entries = [150, 240, 240.5, 241, 300, 330].map(withPerimeter);

  it("shows which entries an edited rule takes and which then fit none or several", () => {
    const closesGap = { ...huntsville[2]!, conditions: [size("perimeter", b(">", 240), b("<=", 320))] };
    expect(previewRule(closesGap, huntsville, entries)).toEqual({ takes: [2, 3, 4], none: [5], several: [], changed: [2] });
    const overlaps = { ...huntsville[2]!, conditions: [size("perimeter", b(">=", 240))] };
    expect(previewRule(overlaps, huntsville, entries)).toEqual({ takes: [1, 2, 3, 4, 5], none: [], several: [1], changed: [1, 2, 5] });
  });

  it("adds a rule whose id is new", () => {
    const extraLarge = rule("Extra large", [size("perimeter", b(">", 320))], { id: "xl" });
    expect(previewRule(extraLarge, huntsville, entries)).toEqual({ takes: [5], none: [2], several: [], changed: [5] });
  });
});

describe("properties", () => {
  // Cut points for perimeter bands, in eighths of an inch, distinct and sorted.
  const cuts = fc.uniqueArray(fc.integer({ min: 8, max: 8 * 800 }), { minLength: 1, maxLength: 6 }).map((xs) => xs.sort((a, c) => a - c));
  const side = fc.integer({ min: 1, max: 400 * IN });

  /** Bands meeting at each cut with "<" below and ">=" above, or "<=" below and ">" above. */
  function bandsAt(cutEighths: number[], closedBelow: boolean[], overlapAt = -1): CategoryRule[] {
    const limits = cutEighths.map((e) => e / 8);
    return limits.concat(Infinity).map((upper, i) => {
      const bounds: Bound[] = [];
      if (i > 0) bounds.push(b(i - 1 === overlapAt ? ">=" : closedBelow[i - 1] ? ">" : ">=", limits[i - 1]!));
      if (upper !== Infinity) bounds.push(b(closedBelow[i] || i === overlapAt ? "<=" : "<", upper));
      return { id: `band${i}`, code: `B${i}`, name: `Band ${i}`, precedence: i, conditions: [size("perimeter", ...bounds)] };
    });
  }

  it("a perimeter band set with no gap and no overlap gives exactly one category, the right one, for every size", () => {
    fc.assert(fc.property(cuts, fc.array(fc.boolean(), { minLength: 6, maxLength: 6 }), side, side, (c, closed, w, l) => {
      const rules = bandsAt(c, closed);
      const check = checkRuleSet(rules);
      expect([check.gaps, check.overlaps]).toEqual([[], []]);
      const perimeter = 2 * (w + l);
      const d = decideCategory({ ...entry(1, 1), widthUm: w, lengthUm: l }, rules);
      const expected = c.filter((cut, i) => perimeter > cut * (IN / 8) || (perimeter === cut * (IN / 8) && !closed[i])).length;
      expect(d.kind === "one" && d.category.id).toBe(`band${expected}`);
    }));
  });

  it("a band set overlapping at one cut gives several exactly on that cut, and checkRuleSet finds it", () => {
    fc.assert(fc.property(cuts, fc.array(fc.boolean(), { minLength: 6, maxLength: 6 }), fc.nat(), fc.integer({ min: 1, max: 9 * IN }), fc.boolean(), side, side,
      (c, closed, pick, w, onCut, rw, rl) => {
        const at = pick % c.length;
        const rules = bandsAt(c, closed, at);
        const cutUm = c[at]! * (IN / 8);
        const check = checkRuleSet(rules);
        expect(check.gaps).toEqual([]);
        expect(check.overlaps.map((o) => [o.atOrFromUm, o.toUm])).toEqual([[cutUm, cutUm]]);
        // Half the cases sit exactly on the cut (perimeter 2 × (w + l) = cut), the others anywhere.
        const [width, length] = onCut && cutUm % 2 === 0 && cutUm / 2 - w > 0 ? [w, cutUm / 2 - w] : [rw, rl];
        const d = decideCategory({ ...entry(1, 1), widthUm: width, lengthUm: length }, rules);
        expect(d.kind).toBe(2 * (width + length) === cutUm ? "several" : "one");
      }));
  });

  it("the same quilt typed in centimetres or in inches lands in the same category, with the same reasons", () => {
    // Exact in both units to the field's precision (0.01 cm = 100 µm, ⅛ in = 3,175 µm): multiples of
    // ½ in (12,700 µm = 1.27 cm), the least common multiple. Rules mix inch and cm limits.
    const rules = [
      rule("Miniature", [size("longestSide", b("<=", 24))]),
      rule("Small", [size("longestSide", b(">", 24)), size("perimeter", b("<", 160))]),
      rule("Medium", [size("longestSide", b(">", 24)), size("perimeter", b(">=", 406.4, "cm"), b("<=", 240))]),
      rule("Large", [size("perimeter", b(">=", 241), b("<=", 812.8, "cm"))]), // 812.8 cm = 320 in
      rule("Extra large", [size("perimeter", b(">", 320))]),
      rule("Wide", [size("width", b(">=", 152.4, "cm"))]),
      rule("Bed", [size("area", b(">", 3_600, "sq in"))]),
    ];
    const halves = fc.integer({ min: 1, max: 2 * 200 });
    const typed = (text: string, unit: "in" | "cm") => { const r = parseLength(text, unit); if (!r.ok) throw new Error(r.message); return r.um; };
    const cmText = (h: number) => { const hundredths = h * 127; return `${Math.floor(hundredths / 100)},${String(hundredths % 100).padStart(2, "0")}`; };
    const inText = (h: number) => (h % 2 ? `${(h - 1) / 2} 1/2` : `${h / 2}`);
    fc.assert(fc.property(halves, halves, (w, l) => {
      const inches = { ...entry(1, 1), widthUm: typed(inText(w), "in"), lengthUm: typed(inText(l), "in") };
      const cm = { ...entry(1, 1), widthUm: typed(cmText(w), "cm"), lengthUm: typed(cmText(l), "cm") };
      expect(cm).toEqual(inches);
      expect(decideCategory(cm, rules)).toEqual(decideCategory(inches, rules));
    }));
  });
});
