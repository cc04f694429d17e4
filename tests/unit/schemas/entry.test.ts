// The entry form's step schemas: what they accept, what they refuse (with a message naming the
// field), and the unit arithmetic behind the size.
import { describe, expect, it } from "vitest";
import {
  aboutStepSchema,
  aboutStepSchemaFor,
  centsForInput,
  dollarsToCents,
  makersStepSchema,
  quiltSizeUm,
  quiltStepSchema,
  submitSchema,
} from "@/lib/schemas/entry";
import { formatForInput, perimeterUm } from "@/scoring/measure";
import { umToCm, umToInches } from "@/scoring/units";
import { sizeSummary } from "@/components/entries/size-summary";

const quilt = { title: "Prairie Stars", sizeUnit: "in" as const, width: "60½", length: "72", techniques: ["pieced"] };
const errorsOf = (r: { success: boolean; error?: { issues: { path: PropertyKey[]; message: string }[] } }) =>
  Object.fromEntries((r.error?.issues ?? []).map((i) => [i.path.join("."), i.message]));

describe("quilt step", () => {
  it.each(["60½", "60 1/2", "60.5", "60-1/2", '60½"'])("reads %s in as 1,536,700 µm (60.5 × 25,400, NIST SP 811)", (width) => {
    const parsed = quiltStepSchema.parse({ ...quilt, width });
    expect(quiltSizeUm(parsed).widthUm).toBe(1_536_700);
  });

  it("converts a 91 × 104 in bed quilt exactly: 231.14 × 264.16 cm, perimeter 390 in (1 in = 2.54 cm, NIST SP 811)", () => {
    const { widthUm, lengthUm } = quiltSizeUm(quiltStepSchema.parse({ ...quilt, width: "91", length: "104" }));
    expect([widthUm, lengthUm]).toEqual([2_311_400, 2_641_600]);
    expect(umToCm(widthUm)).toBe(231.14);
    expect(umToCm(lengthUm)).toBe(264.16);
    expect(umToInches(perimeterUm(widthUm, lengthUm))).toBe(390);
  });

  it("reads centimetres exactly and shows both units", () => {
    const { widthUm, lengthUm } = quiltSizeUm(quiltStepSchema.parse({ ...quilt, sizeUnit: "cm", width: "153,67", length: "182.88" }));
    expect([widthUm, lengthUm]).toEqual([1_536_700, 1_828_800]);
    expect(sizeSummary(1_536_700, 1_828_800, "in")).toBe("60½ × 72 in = 153.7 × 182.9 cm");
    expect(sizeSummary(1_536_700, 1_828_800, "cm")).toBe("153.7 × 182.9 cm = 60½ × 72 in");
  });

  it("puts a stored size back into the field as typed", () => {
    expect(formatForInput(1_536_700, "in")).toBe("60½");
    expect(formatForInput(1_536_700, "cm")).toBe("153.67");
  });

  it("refuses a missing title, a bad length and no technique, naming each field", () => {
    const r = quiltStepSchema.safeParse({ ...quilt, title: " ", width: "sixty", length: "0", techniques: [] });
    const errors = errorsOf(r);
    expect(errors.title).toBe("Give the quilt's title.");
    expect(errors.width).toMatch(/^Width: "sixty" isn't a length/);
    expect(errors.length).toBe("Length: A length must be more than 0.");
    expect(errors.techniques).toBe("Tick at least one technique.");
  });

  it("reads a lone technique checkbox (a string) as a list", () => {
    expect(quiltStepSchema.parse({ ...quilt, techniques: "pieced" }).techniques).toEqual(["pieced"]);
    expect(errorsOf(quiltStepSchema.safeParse({ ...quilt, techniques: false })).techniques).toBe("Tick at least one technique.");
  });

  it("refuses centimetres typed into an inch field", () => {
    expect(errorsOf(quiltStepSchema.safeParse({ ...quilt, width: "153 cm" })).width).toBe(
      "Width: That's in centimetres: switch the unit to cm, or give inches.",
    );
  });
});

describe("makers step", () => {
  const makers = { madeBy: [{ name: "Ada Quilter" }, { name: " " }], quiltedByKind: "self" as const, quiltedByName: "", quiltingMethod: "hand" as const, patternSource: "original" as const, patternName: "", patternDesigner: "" };

  it("drops empty maker rows", () => {
    expect(makersStepSchema.parse(makers).madeBy).toEqual([{ name: "Ada Quilter" }]);
  });

  it("needs a maker, the quilter's name when someone else quilted it, and credit for a pattern", () => {
    const r = makersStepSchema.safeParse({ ...makers, madeBy: [{ name: "" }], quiltedByKind: "hire", patternSource: "pattern" });
    const errors = errorsOf(r);
    expect(errors.madeBy).toBe("Give the name of at least one maker.");
    const r2 = makersStepSchema.safeParse({ ...makers, quiltedByKind: "hire", patternSource: "pattern" });
    expect(errorsOf(r2)).toEqual({ quiltedByName: "Give the quilter's name.", patternName: "Give the pattern's or design's name.", patternDesigner: "Credit the designer." });
  });

  it("refuses a quilting method that is not on the list", () => {
    expect(errorsOf(makersStepSchema.safeParse({ ...makers, quiltingMethod: "robot" })).quiltingMethod).toBe("Choose how it was quilted.");
  });
});

describe("about step", () => {
  const about = { statement: "Scraps from my grandmother's sewing box.", declaredValue: "1,250.50", forSale: false, price: "", judged: "judged" as const, division: "open" as const, youthAge: "" };

  it("turns dollars into cents exactly", () => {
    expect(aboutStepSchema.parse(about).declaredValue).toBe("1,250.50");
    expect(dollarsToCents("1,250.50")).toBe(125_050);
    expect(dollarsToCents("$800")).toBe(80_000);
    expect(dollarsToCents("12.5")).toBe(1_250);
    expect(dollarsToCents("12.505")).toBeNull();
    expect(dollarsToCents("1,25")).toBeNull();
    expect(centsForInput(125_050)).toBe("1250.50");
    expect(centsForInput(80_000)).toBe("800");
  });

  it("counts the statement against the show's word limit", () => {
    const limited = aboutStepSchemaFor(5);
    expect(limited.safeParse({ ...about, statement: "One two three four five." }).success).toBe(true);
    expect(errorsOf(limited.safeParse({ ...about, statement: "One two three four five six." })).statement).toBe("The statement has 6 words; this show allows 5.");
  });

  it("needs a value, a youth age in the youth division, and a price that is an amount", () => {
    const errors = errorsOf(aboutStepSchema.safeParse({ ...about, declaredValue: "", division: "youth", youthAge: "40", forSale: true, price: "lots" }));
    expect(errors.declaredValue).toBe("Give the declared value in dollars, e.g. 1200 or 1,250.50.");
    expect(errors.youthAge).toBe("Give the youth entrant's age (3 to 18).");
    expect(errors.price).toBe("Give the price in dollars, e.g. 1200 or 1,250.50.");
    expect(errorsOf(aboutStepSchema.safeParse({ ...about, declaredValue: "0" })).declaredValue).toBe("The declared value must be more than $0.");
  });
});

describe("submit", () => {
  it("needs the rules accepted", () => {
    expect(errorsOf(submitSchema.safeParse({ acceptRules: false, rulesVersionId: "" })).acceptRules).toBe("Tick the box to accept the show's rules and release.");
    expect(submitSchema.safeParse({ acceptRules: true, rulesVersionId: "" }).success).toBe(true);
  });
});
