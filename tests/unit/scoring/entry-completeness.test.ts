// What an entry still lacks before it can be sent, and how words are counted.
import { describe, expect, it } from "vitest";
import { countWords, entryGaps, UNSET_LENGTH_UM, type CompletenessEntry } from "@/scoring/entry-completeness";

const complete: CompletenessEntry = {
  title: "Prairie Stars",
  widthUm: 1_536_700,
  lengthUm: 1_828_800,
  techniques: ["pieced"],
  madeBy: ["Ada Quilter"],
  quiltedBy: "",
  quiltedForHire: false,
  patternSource: "original",
  patternName: "",
  patternDesigner: "",
  statement: "Scraps from a sewing box.",
  declaredValueCents: 80_000,
  division: "open",
  youthAge: null,
  photoViews: ["full", "detail"],
};
const rules = { statementWordLimit: 150, requiredPhotoViews: ["full", "detail"] };

describe("entryGaps", () => {
  it("finds nothing missing in a complete entry", () => {
    expect(entryGaps(complete, rules)).toEqual([]);
  });

  it("lists everything a fresh draft lacks, step by step", () => {
    const draft = { ...complete, title: "", widthUm: UNSET_LENGTH_UM, lengthUm: UNSET_LENGTH_UM, techniques: [], madeBy: [], statement: "", declaredValueCents: 0, photoViews: [] };
    expect(entryGaps(draft, rules).map((g) => `${g.step}:${g.field}`)).toEqual([
      "quilt:title",
      "quilt:size",
      "quilt:techniques",
      "makers:madeBy",
      "about:statement",
      "about:declaredValue",
      "photos:full",
      "photos:detail",
    ]);
  });

  it("asks for pattern credit, the hired quilter and the youth age", () => {
    const gaps = entryGaps({ ...complete, patternSource: "pattern", patternName: "Star Path", quiltedForHire: true, division: "youth" }, rules);
    expect(gaps.map((g) => g.message)).toEqual(["The name of the quilter you hired", "The pattern's name and designer", "The youth entrant's age"]);
  });

  it("flags a statement over the show's limit with the count", () => {
    expect(entryGaps({ ...complete, statement: "one two three four" }, { ...rules, statementWordLimit: 3 })).toEqual([
      { step: "about", field: "statement", message: "A shorter artist statement (4 words; the limit is 3)" },
    ]);
  });

  it("follows the show's own list of photo views", () => {
    expect(entryGaps({ ...complete, photoViews: ["full"] }, { ...rules, requiredPhotoViews: ["full"] })).toEqual([]);
    expect(entryGaps({ ...complete, photoViews: ["full"] }, rules).map((g) => g.message)).toEqual(["Photo: detail showing the quilting"]);
  });
});

describe("countWords", () => {
  it.each([
    ["", 0],
    ["   ", 0],
    ["Hand-quilted over one winter.", 4],
    ["My grandmother's scraps — all of them", 6],
    ["Ünïcode quilts, 1930s feed sacks", 5],
  ])("%j has %i words", (text, n) => {
    expect(countWords(text)).toBe(n);
  });
});
