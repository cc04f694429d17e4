// The entrant's words for a category decision: the live headline, reasons without the name
// repeated, size reasons first, the stored outcome, and the facts the preview assumed.
import { describe, expect, it } from "vitest";
import { decideCategory, type CategoryRule } from "@/scoring/categories";
import { decisionHeadline, plainReasons, sizeFirst, storedHeadline } from "@/components/entries/category-words";
import { pendingSteps, pendingText, savedFactsOf } from "@/components/entries/category-facts";

// 1 in = 25,400 µm exactly (NIST SP 811, Appendix B).
const IN = 25_400;
const band = (id: string, code: string, name: string, op: ">=" | "<", value: number): CategoryRule => ({
  id, code, name, precedence: Number(code),
  conditions: [{ kind: "techniques", mode: "anyOf", techniques: ["pieced"] }, { kind: "size", measure: "perimeter", bounds: [{ op, value, unit: "in" }] }],
});
const rules = [band("s", "10", "Pieced, Small", "<", 200), band("l", "11", "Pieced, Large", ">=", 200)];
const facts = (w: number, l: number) => ({ widthUm: w * IN, lengthUm: l * IN, techniques: ["pieced"], quiltingMethod: "home_machine" as const, makerCount: 1, quiltedForHire: false, division: "open" as const, judged: true });

describe("the live headline and reasons", () => {
  it("names the category, and the reasons lose the repeated name with size first", () => {
    const d = decideCategory(facts(60, 68), rules);
    expect(decisionHeadline(d)).toBe("This quilt will be in 11 Pieced, Large");
    const reasons = sizeFirst(plainReasons(d.reasons, "Pieced, Large"));
    expect(reasons[0]).toBe("perimeter 256 in is at least 200 in");
    expect(reasons.every((r) => !r.endsWith("(Pieced, Large)"))).toBe(true);
  });

  it("says the chair will place a quilt that fits none", () => {
    const d = decideCategory({ ...facts(60, 68), techniques: ["appliqué"] }, rules);
    expect(decisionHeadline(d)).toBe("This quilt fits no category yet: the chair will place it");
  });
});

describe("the stored outcome", () => {
  it("reads each state", () => {
    const c = { code: "11", name: "Pieced, Large" };
    expect(storedHeadline({ state: "decided", category: c })).toBe("In 11 Pieced, Large");
    expect(storedHeadline({ state: "overridden", category: c })).toBe("In 11 Pieced, Large, placed by the chair");
    expect(storedHeadline({ state: "fits_several", category: null, candidates: [c, { code: "20", name: "Art" }] })).toBe("Fits several categories (11 Pieced, Large and 20 Art): the chair will place it");
    expect(storedHeadline({ state: "undecided", category: null })).toBeNull();
  });
});

describe("the facts the preview assumes", () => {
  it("counts a quilter for hire as a second maker and names the steps still to fill in", () => {
    expect(savedFactsOf({ madeBy: ["Ada"], quiltedBy: "Lou", quiltedByKind: "hire", quiltingMethod: null, division: "open", youthAge: null, judged: true })).toMatchObject({ makerCount: 2, quiltedForHire: true, quiltingMethod: "home_machine" });
    const steps = pendingSteps([{ step: "makers", message: "" }, { step: "about", message: "" }] as never);
    expect(steps).toEqual(["Makers", "About"]);
    expect(pendingText(steps)).toBe("the Makers and About steps");
    expect(pendingText(["Makers"])).toBe("the Makers step");
  });
});
