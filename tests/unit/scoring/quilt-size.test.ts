// Size warnings on the quilt step: the show's minimum, the usual range of quilt sizes (common
// practice) and the sizes the show's categories take.
import { describe, expect, it } from "vitest";
import { belowShowMinimum, sizeWarnings } from "@/scoring/quilt-size";
import type { ShowCategory } from "@/scoring/category-sets";

const IN = 25_400;
const small: ShowCategory = { id: "c1", code: "1", name: "Small quilts", precedence: 1, conditions: [{ kind: "size", measure: "perimeter", bounds: [{ op: ">=", value: 48, unit: "in" }, { op: "<", value: 200, unit: "in" }] }] };
const large: ShowCategory = { id: "c2", code: "2", name: "Large quilts", precedence: 2, conditions: [{ kind: "size", measure: "perimeter", bounds: [{ op: ">=", value: 200, unit: "in" }] }] };

describe("sizeWarnings", () => {
  it("a 3 × 2 in quilt: below the usual size and outside every category", () => {
    const w = sizeWarnings({ widthUm: 3 * IN, lengthUm: 2 * IN }, { minSideUm: null, categories: [small, large] });
    expect(w).toHaveLength(2);
    expect(w[0]).toMatch(/unusually small/);
    expect(w[1]).toMatch(/No category of this show takes/);
  });

  it("a 60 × 80 in quilt in a show whose categories take it: no warning", () => {
    expect(sizeWarnings({ widthUm: 60 * IN, lengthUm: 80 * IN }, { minSideUm: 12 * IN, categories: [small, large] })).toEqual([]);
  });

  it("2,000 in typed instead of 200 cm: unusually large", () => {
    expect(sizeWarnings({ widthUm: 2000 * IN, lengthUm: 60 * IN }, { minSideUm: null, categories: [] })[0]).toMatch(/unusually large/);
  });

  it("the show's minimum refuses a side under it, and names it", () => {
    expect(belowShowMinimum({ widthUm: 10 * IN, lengthUm: 40 * IN }, 12 * IN)).toMatch(/at least 12 in/);
    expect(belowShowMinimum({ widthUm: 12 * IN, lengthUm: 40 * IN }, 12 * IN)).toBeNull();
    expect(belowShowMinimum({ widthUm: 1 * IN, lengthUm: 1 * IN }, null)).toBeNull();
  });
});
