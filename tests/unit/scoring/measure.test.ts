// Typed lengths → exact micrometres, back to text the field accepts, and the sizes derived from them.
import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { areaUm2, formatForInput, longestSideUm, parseLength, perimeterUm, shortestSideUm } from "@/scoring/measure";

// 1 in = 25,400 µm exactly (NIST SP 811, Appendix B).
const IN = 25_400;
const umOf = (text: string, unit: "in" | "cm") => {
  const r = parseLength(text, unit);
  if (!r.ok) throw new Error(`${text}: ${r.message}`);
  return r.um;
};
const messageOf = (text: string, unit: "in" | "cm") => {
  const r = parseLength(text, unit);
  if (r.ok) throw new Error(`${text} was accepted as ${r.um} µm`);
  return r.message;
};

describe("parseLength in inches", () => {
  it.each([
    ["60", 60 * IN],
    ["60.5", 1_536_700],
    ["60½", 1_536_700],
    ["60 ½", 1_536_700],
    ["60 1/2", 1_536_700],
    ["60-1/2", 1_536_700],
    ["60 - 1/2", 1_536_700],
    ["60⁄2", null], // fraction slash with no whole part: "60/2" is a whole inch or more
    ["1/2", 12_700],
    ["½", 12_700],
    [".5", 12_700],
    ['60"', 60 * IN],
    ["60″", 60 * IN],
    ["60 in", 60 * IN],
    ["60in.", 60 * IN],
    ["60 inches", 60 * IN],
    ["  60¼  ", 60 * IN + 6_350],
    ["60¾", 60 * IN + 19_050],
    ["60⅛", 60 * IN + 3_175],
    ["60⅜", 60 * IN + 9_525],
    ["60⅝", 60 * IN + 15_875],
    ["60⅞", 60 * IN + 22_225],
    ["60 3/8 in", 60 * IN + 9_525],
    ["1000", 1_000 * IN],
  ])("reads %j exactly", (text, um) => {
    if (um === null) expect(parseLength(text, "in").ok).toBe(false);
    else expect(umOf(text, "in")).toBe(um);
  });

  it("converts decimals by integer arithmetic, not by float multiplication", () => {
    // In floating point 0.29 × 25,400 is 7365.999999999999 (truncating would give 7,365 µm); the
    // exact value is 7,366 µm. 60.1 in is exactly 1,526,540 µm.
    expect(0.29 * 25_400).not.toBe(7_366);
    expect(umOf("0.29", "in")).toBe(7_366);
    expect(umOf("0.57", "in")).toBe(14_478);
    expect(umOf("60.1", "in")).toBe(1_526_540);
    expect(umOf("0.01", "in")).toBe(254);
    expect(umOf("60.125", "in")).toBe(umOf("60⅛", "in"));
  });

  it("rounds odd sixteenths (1,587.5 µm) and thousandths (25.4 µm) half-up to the micrometre", () => {
    expect(umOf("1/16", "in")).toBe(1_588);
    expect(umOf("60 1/16", "in")).toBe(1_525_588); // 1,525,587.5
    expect(umOf("60 2/16", "in")).toBe(umOf("60⅛", "in")); // even sixteenths are exact
    expect(umOf("60.001", "in")).toBe(1_524_025); // 1,524,025.4
    expect(umOf("60.003", "in")).toBe(1_524_076); // 1,524,076.2
    expect(umOf("0.005", "in")).toBe(127); // exactly 127
  });

  it.each([
    ["", /enter a length/i],
    ["   ", /enter a length/i],
    ["0", /more than 0/],
    ["0 0/2", /more than 0/],
    ["-5", /negative/],
    ["−5", /negative/],
    ["60 1/3", /nearest ⅛ in.*1\/3/],
    ["60⅓", /nearest ⅛ in/],
    ["60 3/10", /nearest ⅛ in.*1\/10/],
    ["60 1/32", /nearest ⅛ in/],
    ["60 1/0", /0 below the line/],
    ["60 5/4", /whole inch or more: write 61 1\/4/],
    ["60 8/8", /write 61\b/],
    ["60.1234", /at most 3 decimals/],
    ["60.0625", /at most 3 decimals.*60 1\/16/],
    ["1000.001", /over 1,000 in/],
    ["1001", /over 1,000 in/],
    ["99999999999999999999", /over 1,000 in/],
    ["sixty", /isn't a length/],
    ["60 1/2 1/4", /isn't a length/],
    ["6O", /isn't a length/],
    ["60,5", /with a point/],
    ["5 ft", /in inches/],
    ["5'", /in inches/],
    ["152 cm", /centimetres: switch the unit/],
    ["1524 mm", /millimetres/],
  ])("rejects %j with a message naming what is wrong", (text, message) => {
    expect(messageOf(text, "in")).toMatch(message);
  });
});

describe("parseLength in centimetres", () => {
  // 1 in = 2.54 cm exactly (NIST SP 811, Appendix B): 60 in = 152.4 cm.
  it.each([
    ["152.4", 60 * IN],
    ["152,4", 60 * IN],
    ["152.4 cm", 60 * IN],
    ["152.4cm", 60 * IN],
    [" 152 ", 1_520_000],
    ["0.01", 100],
    ["152.45", 1_524_500],
    ["228.6", 90 * IN], // 90 in = 228.6 cm (NIST SP 811, Appendix B)
    ["243.84", 96 * IN], // 96 in = 243.84 cm
    ["0.635", null], // ¼ in in cm needs 3 decimals: more than the field takes
    ["2540", 1_000 * IN],
  ])("reads %j exactly", (text, um) => {
    if (um === null) expect(messageOf(text, "cm")).toMatch(/at most 2 decimals/);
    else expect(umOf(text, "cm")).toBe(um);
  });

  it.each([
    ["", /enter a length/i],
    ["0", /more than 0/],
    ["-1", /negative/],
    ["152.456", /at most 2 decimals \(0\.1 mm\)/],
    ["152½", /decimal.*not a fraction/],
    ["2540.01", /over 2,540 cm/],
    ['60"', /inches: switch the unit/],
    ["abc", /isn't a length/],
    ["1.524,4", /isn't a length/],
  ])("rejects %j", (text, message) => {
    expect(messageOf(text, "cm")).toMatch(message);
  });
});

describe("formatForInput", () => {
  it.each([
    [1_536_700, "in", "60½"],
    [60 * IN, "in", "60"],
    [12_700, "in", "½"],
    [1_525_588, "in", "60 1/16"],
    [1_526_540, "in", "60.1"],
    [1_524_025, "in", "60.001"],
    [60 * IN, "cm", "152.4"],
    [1_524_500, "cm", "152.45"],
    [0, "in", ""],
  ] as const)("%d µm in %s → %j", (um, unit, text) => {
    expect(formatForInput(um, unit)).toBe(text);
  });

  it("gives back text that parses to the same micrometres, for every length the parser makes", () => {
    const inchTexts = fc.oneof(
      fc.integer({ min: 1, max: 8_000 }).map((eighths) => `${Math.floor(eighths / 8)} ${eighths % 8}/8`.replace(/ 0\/8$/, "")),
      fc.integer({ min: 1, max: 16_000 }).filter((n) => n % 16 !== 0).map((n) => `${Math.floor(n / 16)} ${n % 16}/16`),
      fc.integer({ min: 1, max: 1_000_000 }).map((thousandths) => (thousandths / 1000).toFixed(3)),
    );
    fc.assert(fc.property(inchTexts, (text) => {
      const um = umOf(text, "in");
      expect(umOf(formatForInput(um, "in"), "in")).toBe(um);
    }));
    fc.assert(fc.property(fc.integer({ min: 1, max: 254_000 }), (hundredths) => {
      const um = umOf((hundredths / 100).toFixed(2), "cm");
      expect(um).toBe(hundredths * 100);
      expect(umOf(formatForInput(um, "cm"), "cm")).toBe(um);
    }));
  });
});

describe("sizes derived from width × length", () => {
  it("91 × 104 in: perimeter 390 in, area 9,464 sq in, 231.14 × 264.16 cm (1 in = 2.54 cm, NIST SP 811)", () => {
    const w = umOf("91", "in");
    const l = umOf("104", "in");
    expect(perimeterUm(w, l)).toBe(390 * IN);
    expect(areaUm2(w, l)).toBe(9_464 * 645_160_000); // 1 sq in = 645,160,000 µm²
    expect(w).toBe(umOf("231.14", "cm"));
    expect(l).toBe(umOf("264.16", "cm"));
    expect(longestSideUm(w, l)).toBe(l);
    expect(shortestSideUm(w, l)).toBe(w);
  });

  it("¼ in = 0.635 cm, 90 in = 228.6 cm, 96 in = 243.84 cm (NIST SP 811, Appendix B)", () => {
    expect(umOf("¼", "in")).toBe(6_350); // 0.635 cm = 6,350 µm
    expect(umOf("90", "in")).toBe(umOf("228.6", "cm"));
    expect(umOf("96", "in")).toBe(umOf("243.84", "cm"));
  });

  it("a queen-size 60 × 80 in quilt has a perimeter of exactly 280 in (queen mattress 60 × 80 in, quilters' reference tables, common practice)", () => {
    expect(perimeterUm(umOf("60", "in"), umOf("80", "in"))).toBe(280 * IN);
  });

  it("keeps the area of the largest accepted quilt (1,000 × 1,000 in) an exact integer", () => {
    const side = umOf("1000", "in");
    expect(areaUm2(side, side)).toBeLessThan(Number.MAX_SAFE_INTEGER);
    expect(Number.isSafeInteger(areaUm2(side, side))).toBe(true);
  });

  it("grows perimeter and area with each side", () => {
    const side = fc.integer({ min: 1, max: 1_000 * IN });
    fc.assert(fc.property(side, side, fc.integer({ min: 1, max: 10_000 }), (w, l, d) => {
      expect(perimeterUm(w + d, l)).toBeGreaterThan(perimeterUm(w, l));
      expect(perimeterUm(w, l + d)).toBeGreaterThan(perimeterUm(w, l));
      expect(areaUm2(w + d, l)).toBeGreaterThan(areaUm2(w, l));
      expect(areaUm2(w, l + d)).toBeGreaterThan(areaUm2(w, l));
    }));
  });
});
