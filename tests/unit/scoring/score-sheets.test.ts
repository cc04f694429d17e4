// Score sheets: the published weightings, N/A rescaling worked by hand, word scales, plain-words
// validation, and totals checked against simple-statistics on generated sheets (fast-check).
import fc from "fast-check";
import * as ss from "simple-statistics";
import { describe, expect, it } from "vitest";
import {
  checkSheet, formatScore, markPoints, runningTotal, sheetTotal, validateMark,
  type Criterion, type Mark, type Marks, type ScoreSheet, type WordLevel,
} from "@/scoring/score-sheets";

const points = (id: string, label: string, maxPoints: number, extra: Partial<Criterion> = {}): Criterion => ({
  id, label, maxPoints, scale: { kind: "points" }, allowNotApplicable: false, ...extra,
});
const oneSection = (...criteria: Criterion[]): ScoreSheet => ({ sections: [{ id: "all", title: "All", criteria }] });
const pts = (n: number): Mark => ({ kind: "points", points: n });
const word = (level: string): Mark => ({ kind: "word", level });
const NA: Mark = { kind: "na" };

// The level names are seen on published sheets (common practice: Excellent / Good / Satisfactory /
// Needs improvement / N/A); the fractions are ours.
const WORDS: WordLevel[] = [
  { label: "Excellent", fraction: 1 },
  { label: "Good", fraction: 0.8 },
  { label: "Satisfactory", fraction: 0.6 },
  { label: "Needs improvement", fraction: 0.4 },
];

describe("published weightings", () => {
  it("visual impact 40, design 20, workmanship 20, colour 20 totals 100 (Melody Crust, \"Judging Guidelines\")", () => {
    const sheet = oneSection(points("visual", "Visual impact", 40), points("design", "Design", 20), points("work", "Workmanship", 20), points("colour", "Colour", 20));
    expect(checkSheet(sheet)).toEqual({ ok: true, problems: [], notes: [], nominalMax: 100 });
  });

  it("the same weighting as 1-10 items with weights 4/2/2/2 also totals 100 (Melody Crust, as above)", () => {
    const w = (id: string, weight: number) => points(id, id, 10, { weight });
    expect(checkSheet(oneSection(w("visual", 4), w("design", 2), w("work", 2), w("colour", 2))).nominalMax).toBe(100);
  });

  it("the fair card 25/10/20/25/10/10 totals 100 (quiltingjetgirl.com, 2017 fair scorecards)", () => {
    const sheet = oneSection(
      points("visual", "Visual / colour", 25), points("difficulty", "Difficulty", 10), points("work", "Workmanship", 20),
      points("quilting", "Quilting", 25), points("edge", "Edge / binding", 10), points("design", "Design", 10),
    );
    const check = checkSheet(sheet);
    expect(check.ok).toBe(true);
    expect(check.nominalMax).toBe(100);
    // Full marks on every line give exactly the nominal 100.
    const full = sheetTotal(sheet, { visual: pts(25), difficulty: pts(10), work: pts(20), quilting: pts(25), edge: pts(10), design: pts(10) });
    expect(full.total).toBe(100);
  });
});

// A wholecloth quilt has no piecing and no appliqué: both are marked N/A, never zero (common
// practice on published judging sheets). The sheet and its weights are invented; they total 100.
const wholeclothSheet: ScoreSheet = {
  sections: [
    { id: "general", title: "General appearance", criteria: [points("visual", "Visual impact", 20)] },
    { id: "design", title: "Design", criteria: [points("design", "Design", 20)] },
    {
      id: "work", title: "Workmanship", criteria: [
        points("piecing", "Piecing", 15, { allowNotApplicable: true }),
        points("applique", "Appliqué", 15, { allowNotApplicable: true }),
        points("quilting", "Quilting", 20),
        points("binding", "Binding", 10),
      ],
    },
  ],
};
const wholeclothMarks: Marks = { visual: pts(18), design: pts(17), piecing: NA, applique: NA, quilting: pts(18), binding: pts(9) };

describe("sheetTotal: not applicable rescales", () => {
  it("a wholecloth quilt with piecing and appliqué N/A, worked by hand", () => {
    // earned = 18 + 17 + 18 + 9 = 62; applicable max = 20 + 20 + 20 + 10 = 70 (piecing and appliqué left out)
    // total = 62 / 70 × 100 = 88.571428…; scoring them zero would have given 62.
    const t = sheetTotal(wholeclothSheet, wholeclothMarks);
    expect(t.complete).toBe(true);
    expect(t.naCriteria).toEqual(["piecing", "applique"]);
    expect(t.earned).toBe(62);
    expect(t.applicableMax).toBe(70);
    expect(t.nominalMax).toBe(100);
    expect(t.total).toBe(6200 / 70);
    expect(formatScore(t.total)).toBe("88.57");
    expect(t.percent).toBe(6200 / 70);
    // Workmanship: earned 18 + 9 = 27 of 30 applicable, out of its nominal 60: 27 / 30 × 60 = 54.
    const work = t.bySection.find((s) => s.sectionId === "work")!;
    expect(work).toMatchObject({ earned: 27, applicableMax: 30, nominalMax: 60, total: 54, naCriteria: ["piecing", "applique"], reason: null });
    expect(t.bySection.map((s) => s.total)).toEqual([18, 17, 54]);
  });

  it("N/A is never zero: zero marks would give 62, N/A gives 88.57", () => {
    const zeros = sheetTotal(wholeclothSheet, { ...wholeclothMarks, piecing: pts(0), applique: pts(0) });
    expect(zeros.total).toBe(62);
    expect(sheetTotal(wholeclothSheet, wholeclothMarks).total!).toBeGreaterThan(zeros.total!);
  });

  it("every criterion N/A: no total, with a reason", () => {
    const sheet = oneSection(points("a", "Piecing", 50, { allowNotApplicable: true }), points("b", "Appliqué", 50, { allowNotApplicable: true }));
    const t = sheetTotal(sheet, { a: NA, b: NA });
    expect(t.total).toBeNull();
    expect(t.percent).toBeNull();
    expect(t.reason).toBe("Every criterion in this sheet is marked not applicable, so there is nothing to total.");
    expect(t.bySection[0]!.reason).toBe("Every criterion in the section \"All\" is marked not applicable, so there is nothing to total.");
  });

  it("a section entirely N/A has no subtotal while the sheet still totals", () => {
    const sheet: ScoreSheet = {
      sections: [
        { id: "a", title: "Appliqué", criteria: [points("app", "Appliqué stitches", 30, { allowNotApplicable: true })] },
        { id: "b", title: "Quilting", criteria: [points("q", "Quilting", 70)] },
      ],
    };
    const t = sheetTotal(sheet, { app: NA, q: pts(63) }); // 63 / 70 × 100 = 90
    expect(t.total).toBe(90);
    expect(t.bySection[0]!.total).toBeNull();
    expect(t.bySection[1]!.total).toBe(63);
  });
});

describe("sheetTotal: unfinished, invalid and unknown marks", () => {
  it("an unfinished sheet has no total unless partial", () => {
    const marks = { visual: pts(18), design: pts(17) };
    const t = sheetTotal(wholeclothSheet, marks);
    expect(t.complete).toBe(false);
    expect(t.missing).toEqual(["piecing", "applique", "quilting", "binding"]);
    expect(t.total).toBeNull();
    expect(t.reason).toBe("Not finished: 4 criteria still to score in this sheet.");
    // So far: 35 of 40 → 35 / 40 × 100 = 87.5
    expect(sheetTotal(wholeclothSheet, marks, { partial: true }).total).toBe(87.5);
  });

  it("an invalid mark counts as not scored and is listed; a mark for another sheet's criterion is ignored", () => {
    const t = sheetTotal(wholeclothSheet, { ...wholeclothMarks, binding: pts(12), borders: pts(5) });
    expect(t.complete).toBe(false);
    expect(t.missing).toEqual(["binding"]);
    expect(t.invalid).toEqual([{ criterionId: "binding", text: "Binding: 12 is more than the 10 points this criterion gives." }]);
    expect(t.unknownMarks).toEqual(["borders"]);
  });

  it("a sheet with problems is not totalled", () => {
    const t = sheetTotal(oneSection(points("a", "Design", 0)), { a: pts(0) });
    expect(t.total).toBeNull();
    expect(t.reason).toBe("The score sheet needs fixing first: Design: the most points must be more than 0 (it is 0).");
  });
});

describe("word scales", () => {
  const sheet = oneSection(
    { id: "visual", label: "Visual impact", maxPoints: 40, scale: { kind: "words", levels: WORDS }, allowNotApplicable: false },
    { id: "work", label: "Workmanship", maxPoints: 60, scale: { kind: "words", levels: WORDS }, allowNotApplicable: false },
  );

  it("maps each level to fraction × most points", () => {
    const c = sheet.sections[0]!.criteria[0]!;
    expect(WORDS.map((l) => markPoints(c, word(l.label)))).toEqual([40, 32, 24, 16]);
    // Good on visual (0.8 × 40 = 32) + Satisfactory on workmanship (0.6 × 60 = 36) = 68 of 100.
    expect(sheetTotal(sheet, { visual: word("Good"), work: word("Satisfactory") }).total).toBe(68);
  });

  it("matches level names without case or surrounding spaces", () => {
    expect(markPoints(sheet.sections[0]!.criteria[0]!, word("  needs IMPROVEMENT "))).toBe(16);
  });

  it("is exact where floats drift: 0.7 × 3 is 2.1, not 2.0999999999999996", () => {
    expect(0.7 * 3).not.toBe(2.1); // why the module works on decimal digits
    const c: Criterion = { id: "c", label: "Colour", maxPoints: 3, scale: { kind: "words", levels: [{ label: "Fair", fraction: 0.7 }, { label: "Top", fraction: 1 }] }, allowNotApplicable: false };
    expect(markPoints(c, word("Fair"))).toBe(2.1);
    // 2.1 + 94.9 = 97 of 3 + 97 = 100.
    expect(sheetTotal(oneSection(c, points("d", "Design", 97, { scale: { kind: "points", step: 0.1 } })), { c: word("Fair"), d: pts(94.9) }).total).toBe(97);
  });
});

describe("validateMark", () => {
  const binding = points("binding", "Binding", 10, { scale: { kind: "points", step: 0.5 } });
  const words: Criterion = { id: "v", label: "Visual impact", maxPoints: 20, scale: { kind: "words", levels: WORDS }, allowNotApplicable: true };

  it("accepts marks on the scale, and no mark at all", () => {
    expect(validateMark(binding, pts(7.5))).toBeNull();
    expect(validateMark(binding, pts(0))).toBeNull();
    expect(validateMark(binding, pts(10))).toBeNull();
    expect(validateMark(binding, undefined)).toBeNull();
    expect(validateMark(words, word("Good"))).toBeNull();
    expect(validateMark(words, NA)).toBeNull();
  });

  it("accepts tenths exactly, where 0.3 / 0.1 is 2.9999999999999996 in floats", () => {
    expect(validateMark(points("x", "Borders", 1, { scale: { kind: "points", step: 0.1 } }), pts(0.3))).toBeNull();
  });

  it("says what is wrong in plain words", () => {
    expect(validateMark(binding, pts(12))).toBe("Binding: 12 is more than the 10 points this criterion gives.");
    expect(validateMark(binding, pts(-1))).toBe("Binding: points can't be below 0 (-1 was given).");
    expect(validateMark(binding, pts(7.3))).toBe("Binding: 7.3 is not a mark on this scale, which goes in steps of 0.5 (try 7 or 7.5).");
    expect(validateMark(binding, pts(Number.NaN))).toBe("Binding: the points must be a number.");
    expect(validateMark(binding, NA)).toBe("Binding can't be marked not applicable on this sheet; give it a mark.");
    expect(validateMark(binding, word("Good"))).toBe("Binding is marked in points (0 to 10), not in words.");
    expect(validateMark(words, pts(16))).toBe("Visual impact is marked in words (Excellent, Good, Satisfactory, Needs improvement), not in points.");
    expect(validateMark(words, word("Superb"))).toBe("Visual impact: \"Superb\" is not one of its levels (Excellent, Good, Satisfactory, Needs improvement).");
  });
});

describe("checkSheet", () => {
  it("finds every kind of problem, in plain words", () => {
    const sheet: ScoreSheet = {
      sections: [
        {
          id: "s", title: "Workmanship", criteria: [
            points("a", "Piecing", 10),
            points("a", "Piecing again", 10),
            points("b", "Quilting", 10, { weight: 0 }),
            points("c", "Binding", -1),
            points("d", "Borders", 10, { scale: { kind: "points", step: 3 } }),
            points("e", "Corners", 10, { scale: { kind: "points", step: 0 } }),
            { id: "f", label: "Colour", maxPoints: 10, scale: { kind: "words", levels: [] }, allowNotApplicable: false },
            { id: "g", label: "Design", maxPoints: 10, scale: { kind: "words", levels: [{ label: "Good", fraction: 0.8 }, { label: "good ", fraction: 1.2 }] }, allowNotApplicable: false },
          ],
        },
        { id: "s", title: "Empty", criteria: [] },
      ],
    };
    expect(checkSheet(sheet).problems.map((p) => p.text)).toEqual([
      "Two criteria share the id \"a\" (Piecing and Piecing again).",
      "Quilting: the weight must be more than 0 (it is 0).",
      "Binding: the most points must be more than 0 (it is -1).",
      "Borders: the top mark 10 can't be reached in steps of 3.",
      "Corners: the step between marks must be more than 0 (it is 0).",
      "Colour is marked in words but has no levels.",
      "Design has the level \"good \" twice.",
      "Design: the level \"good \" is worth 1.2 of the points; it must be between 0 and 1.",
      "Two sections share the id \"s\".",
      "The section \"Empty\" has no criteria.",
    ]);
    expect(checkSheet(sheet).ok).toBe(false);
  });

  it("a sheet with no criteria", () => {
    expect(checkSheet({ sections: [] }).problems).toEqual([{ text: "The score sheet has no criteria." }]);
  });

  it("notes a sheet that is not out of 100, and a word scale with no full-marks level", () => {
    const sheet = oneSection(points("a", "Design", 50), { id: "b", label: "Colour", maxPoints: 40, scale: { kind: "words", levels: [{ label: "Good", fraction: 0.8 }] }, allowNotApplicable: false });
    const check = checkSheet(sheet);
    expect(check.ok).toBe(true);
    expect(check.nominalMax).toBe(90);
    expect(check.notes).toEqual(["Colour: no level gives full marks, so no entry can reach the sheet's full total.", "The sheet adds up to 90 points, not the usual 100."]);
  });

  it("weights add up exactly: ten lines of 10 × 0.1 weight total 10, not 9.999999999999998", () => {
    const sheet = oneSection(...Array.from({ length: 10 }, (_, i) => points(`c${i}`, `Line ${i}`, 10, { weight: 0.1 })));
    expect(checkSheet(sheet).nominalMax).toBe(10);
  });
});

describe("runningTotal", () => {
  it("shows the total so far, what is open, and the lowest and highest finish", () => {
    // Scored: visual 18/20, design 17/20, piecing N/A → 35 of 40 → 87.5 so far.
    // Open: appliqué 15, quilting 20, binding 10 = 45. Lowest finish 35 / 85 × 100 = 41.18;
    // highest (35 + 45) / 85 × 100 = 94.12.
    const r = runningTotal(wholeclothSheet, { visual: pts(18), design: pts(17), piecing: NA });
    expect(r).toMatchObject({ scoredCount: 3, criteriaCount: 6, complete: false, total: 87.5, openMax: 45, missing: ["applique", "quilting", "binding"] });
    expect(r.lowestFinal).toBe(3500 / 85);
    expect(r.highestFinal).toBe(8000 / 85);
  });

  it("nothing scored yet", () => {
    const r = runningTotal(wholeclothSheet, {});
    expect(r.total).toBeNull();
    expect(r.reason).toBe("Nothing in this sheet is scored yet.");
    expect([r.lowestFinal, r.highestFinal]).toEqual([0, 100]);
  });
});

describe("formatScore", () => {
  it("rounds half away from zero on the decimal digits and drops trailing zeros", () => {
    expect(formatScore(284 / 3)).toBe("94.67"); // three judges: 94, 95, 95
    expect(formatScore(90.5)).toBe("90.5");
    expect(formatScore(95)).toBe("95");
    expect(formatScore(1.005)).toBe("1.01"); // (1.005).toFixed(2) is "1.00"
    expect(formatScore(88.5714, 0)).toBe("89");
    expect(formatScore(-0.004)).toBe("0");
    expect(formatScore(-1.235)).toBe("-1.24");
    expect(formatScore(null)).toBe("—");
  });
});

// ---------------------------------------------------------------------------------------------
// Properties on generated sheets, checked against simple-statistics where a reference exists.

const WEIGHTS = [0.25, 0.5, 1, 1, 1, 1.5, 2, 2.5, 3];
const criterionArb = (id: string): fc.Arbitrary<Criterion> => fc.record({
  id: fc.constant(id),
  label: fc.constant(`Criterion ${id}`),
  maxPoints: fc.integer({ min: 1, max: 20 }),
  weight: fc.constantFrom(...WEIGHTS),
  scale: fc.oneof(
    fc.constantFrom({ kind: "points" as const }, { kind: "points" as const, step: 0.5 }),
    fc.constant({ kind: "words" as const, levels: WORDS }),
  ),
  allowNotApplicable: fc.boolean(),
});
const sheetArb: fc.Arbitrary<ScoreSheet> = fc.array(fc.integer({ min: 1, max: 5 }), { minLength: 1, maxLength: 4 }).chain((sizes) =>
  fc.tuple(...sizes.map((n, s) => fc.tuple(...Array.from({ length: n }, (_, i) => criterionArb(`s${s}c${i}`))))).map((sections) => ({
    sections: sections.map((criteria, s) => ({ id: `s${s}`, title: `Section ${s}`, criteria })),
  })),
);
function markArb(c: Criterion, allowNa = true): fc.Arbitrary<Mark> {
  const scored: fc.Arbitrary<Mark> = c.scale.kind === "words"
    ? fc.constantFrom(...c.scale.levels.map((l) => word(l.label)))
    : fc.integer({ min: 0, max: c.maxPoints / (c.scale.step ?? 1) }).map((k) => pts(k * (c.scale.kind === "points" ? (c.scale.step ?? 1) : 1)));
  return allowNa && c.allowNotApplicable ? fc.oneof(scored, fc.constant(NA)) : scored;
}
const criteriaOf = (sheet: ScoreSheet) => sheet.sections.flatMap((s) => s.criteria);
const marksArb = (sheet: ScoreSheet, allowNa = true): fc.Arbitrary<Record<string, Mark>> =>
  fc.tuple(...criteriaOf(sheet).map((c) => markArb(c, allowNa))).map((ms) => Object.fromEntries(criteriaOf(sheet).map((c, i) => [c.id, ms[i]!])));
const sheetWithMarks = sheetArb.chain((sheet) => marksArb(sheet).map((marks) => ({ sheet, marks })));
const fullMark = (c: Criterion): Mark => (c.scale.kind === "words" ? word("Excellent") : pts(c.maxPoints));

describe("sheetTotal properties (fast-check, against simple-statistics)", () => {
  it("earned, applicable max and total agree with simple-statistics' sum and weightedMean", () => {
    fc.assert(fc.property(sheetWithMarks, ({ sheet, marks }) => {
      const applicable = criteriaOf(sheet).filter((c) => marks[c.id]!.kind !== "na");
      const t = sheetTotal(sheet, marks);
      expect(t.complete).toBe(true);
      const w = (c: Criterion) => c.weight ?? 1;
      const nominal = ss.sum(criteriaOf(sheet).map((c) => c.maxPoints * w(c)));
      expect(t.nominalMax).toBeCloseTo(nominal, 9);
      if (applicable.length === 0) {
        expect(t.total).toBeNull();
        return;
      }
      const p = applicable.map((c) => markPoints(c, marks[c.id])!);
      const earned = ss.sum(applicable.map((c, i) => p[i]! * w(c)));
      const max = ss.sum(applicable.map((c) => c.maxPoints * w(c)));
      expect(t.earned).toBeCloseTo(earned, 9);
      expect(t.applicableMax).toBeCloseTo(max, 9);
      // A weighted mean of each line's fraction of its maximum, weighted by maxPoints × weight:
      const fractions = applicable.map((c, i) => p[i]! / c.maxPoints);
      const weights = applicable.map((c) => c.maxPoints * w(c));
      expect(t.percent!).toBeCloseTo(100 * ss.weightedMean(fractions, weights), 9);
      expect(t.percent!).toBeCloseTo((100 * ss.sum(fractions.map((f, i) => f * weights[i]!))) / ss.sum(weights), 9);
      expect(t.total!).toBeCloseTo((earned / max) * nominal, 9);
    }), { numRuns: 500 });
  });

  it("the total lies between 0 and the nominal maximum", () => {
    fc.assert(fc.property(sheetWithMarks, ({ sheet, marks }) => {
      const t = sheetTotal(sheet, marks);
      if (t.total === null) return;
      expect(t.total).toBeGreaterThanOrEqual(0);
      expect(t.total).toBeLessThanOrEqual(t.nominalMax);
      for (const s of t.bySection) if (s.total !== null) expect(s.total).toBeLessThanOrEqual(s.nominalMax);
    }), { numRuns: 500 });
  });

  it("full marks give exactly the nominal maximum, whatever is marked N/A", () => {
    fc.assert(fc.property(sheetArb, fc.infiniteStream(fc.boolean()), (sheet, naStream) => {
      const wantNa = [...naStream.take(criteriaOf(sheet).length)];
      const marks = Object.fromEntries(criteriaOf(sheet).map((c, i) => [c.id, c.allowNotApplicable && wantNa[i] ? NA : fullMark(c)]));
      const t = sheetTotal(sheet, marks);
      if (t.naCriteria.length === criteriaOf(sheet).length) return;
      expect(t.total).toBe(t.nominalMax);
      expect(t.percent).toBe(100);
    }), { numRuns: 300 });
  });

  it("marking a criterion N/A never gives less than marking it zero", () => {
    const withZeroable = sheetWithMarks.filter(({ sheet }) => criteriaOf(sheet).some((c) => c.allowNotApplicable && c.scale.kind === "points"));
    fc.assert(fc.property(withZeroable, fc.nat(), ({ sheet, marks }, pick) => {
      const options = criteriaOf(sheet).filter((c) => c.allowNotApplicable && c.scale.kind === "points");
      const c = options[pick % options.length]!;
      const na = sheetTotal(sheet, { ...marks, [c.id]: NA });
      const zero = sheetTotal(sheet, { ...marks, [c.id]: pts(0) });
      if (na.total === null) return; // everything else is N/A too
      expect(na.total).toBeGreaterThanOrEqual(zero.total!);
    }), { numRuns: 500 });
  });

  // Scaling factors keep every weight an exact short decimal (0.1 × 1.5 is 0.15000000000000002 in floats).
  it("scaling every weight by one constant leaves the percent unchanged and scales the total with the nominal maximum", () => {
    fc.assert(fc.property(sheetWithMarks, fc.constantFrom(0.5, 2, 3, 4, 10), ({ sheet, marks }, k) => {
      const scaled: ScoreSheet = { sections: sheet.sections.map((s) => ({ ...s, criteria: s.criteria.map((c) => ({ ...c, weight: (c.weight ?? 1) * k })) })) };
      const a = sheetTotal(sheet, marks);
      const b = sheetTotal(scaled, marks);
      expect(b.percent).toBe(a.percent);
      if (a.total === null) return;
      expect(b.total!).toBeCloseTo(a.total * k, 9);
      expect(b.total! / b.nominalMax).toBeCloseTo(a.total / a.nominalMax, 12);
    }), { numRuns: 300 });
  });

  it("putting the criteria in another order, or all in one section, leaves the total exactly the same", () => {
    fc.assert(fc.property(sheetWithMarks.chain(({ sheet, marks }) => fc.shuffledSubarray(criteriaOf(sheet), { minLength: criteriaOf(sheet).length }).map((order) => ({ sheet, marks, order }))), ({ sheet, marks, order }) => {
      const reordered: ScoreSheet = { sections: [...sheet.sections].reverse().map((s) => ({ ...s, criteria: [...s.criteria].reverse() })) };
      const merged: ScoreSheet = { sections: [{ id: "one", title: "One", criteria: order }] };
      const t = sheetTotal(sheet, marks);
      expect(sheetTotal(reordered, marks).total).toBe(t.total);
      expect(sheetTotal(merged, marks).total).toBe(t.total);
      expect(sheetTotal(merged, marks).earned).toBe(t.earned);
    }), { numRuns: 300 });
  });

  it("the running total's lowest and highest finish bound every finish that marks no open criterion N/A", () => {
    const partly = sheetArb.chain((sheet) => fc.tuple(fc.constant(sheet), marksArb(sheet), marksArb(sheet, false), fc.array(fc.boolean(), { minLength: criteriaOf(sheet).length, maxLength: criteriaOf(sheet).length })));
    fc.assert(fc.property(partly, ([sheet, marks, later, scoredNow]) => {
      const now = Object.fromEntries(criteriaOf(sheet).filter((_, i) => scoredNow[i]).map((c) => [c.id, marks[c.id]!]));
      const r = runningTotal(sheet, now);
      const final = sheetTotal(sheet, { ...later, ...now });
      if (final.total === null || r.lowestFinal === null) return;
      expect(final.total).toBeGreaterThanOrEqual(r.lowestFinal);
      expect(final.total).toBeLessThanOrEqual(r.highestFinal!);
      expect(r.scoredCount + r.missing.length).toBe(r.criteriaCount);
    }), { numRuns: 500 });
  });
});
