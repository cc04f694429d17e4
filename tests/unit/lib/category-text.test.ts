// An entry's category in the committee's words: code and name, or why there is none yet.
import { describe, expect, it } from "vitest";
import { categoryText } from "@/lib/category-text";

describe("categoryText", () => {
  it("gives the code with the category's name, never the code alone", () => {
    expect(categoryText({ categoryState: "decided", categoryCode: "11", categoryName: "Pieced, Medium" })).toBe("11 Pieced, Medium");
  });
  it("says in plain words why an entry has no category", () => {
    expect(categoryText({ categoryState: "fits_none", categoryCode: null, categoryName: null })).toBe("Fits no category: chair to place");
    expect(categoryText({ categoryState: "fits_several", categoryCode: null, categoryName: null })).toBe("Fits several: chair to place");
    expect(categoryText({ categoryState: "undecided", categoryCode: null, categoryName: null })).toBe("Not decided yet");
  });
});
