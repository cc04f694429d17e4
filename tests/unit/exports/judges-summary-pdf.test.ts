// The judges' summary read back with pdfjs-dist: a new page per category, the judges' names, one
// table row per entry with each judge's total and the statistics, long titles cut to their column,
// the column headings repeated when a category runs over a page, and no entrant names.
import { describe, expect, it } from "vitest";
import { writeJudgesSummary, type JudgesSummaryCategory, type JudgesSummaryEntry } from "@/exports/judges-summary-pdf";
import { linesOf, readPdf, type PdfPage } from "./read-back";

const SHOW = "Cedar Hollow Quilt Show 2027";
const JUDGES = [
  { id: "j-holt", name: "Maren Holt" },
  { id: "j-ashby", name: "Dolores Ashby" },
  { id: "j-ng", name: "Theodora Ng-Villanueva" },
];
const LONG_TITLE = "Grandmother's Flower Garden Revisited in Indigo, Madder and Weld-Dyed Cottons from the Old Mill";

type Named = JudgesSummaryEntry & { entrantName: string };
const entry = (n: number, title: string, totals: (number | null)[], rest: Partial<JudgesSummaryEntry> = {}): Named => ({
  displayRank: "—", entryNumber: n, title, totals: Object.fromEntries(JUDGES.map((j, i) => [j.id, totals[i] ?? null])),
  mean: null, median: null, spread: null, adjusted: null, placeAwards: [], entrantName: `Entrant of ${n}`, ...rest,
});

// Invented scores: 95, 92, 96 → mean 94.33, median 95, spread 4.
const LARGE: JudgesSummaryCategory = {
  code: "101", name: "Large Pieced", judges: JUDGES,
  entries: [
    entry(112, "Harbor Lights", [95, 92, 96], { displayRank: "1", mean: 94.333333, median: 95, spread: 4, adjusted: 1.224745, placeAwards: ["1st", "Best of Show"] }),
    entry(131, LONG_TITLE, [90, 88.5, 93], { displayRank: "=2", mean: 90.5, median: 90, spread: 4.5, adjusted: -0.0504, placeAwards: ["2nd"] }),
    entry(140, "Tide Chart", [86, null, 84], { displayRank: "4", mean: 85, median: 85, spread: 2, adjusted: -1.1743, placeAwards: ["Honorable mention"] }),
  ],
};
const SMALL: JudgesSummaryCategory = {
  code: "205", name: "Small Appliqué", judges: [JUDGES[0]!, { id: "j-okafor", name: "Clement Okafor" }],
  entries: [{ ...entry(207, "Fern Hollow", []), totals: { "j-holt": 88, "j-okafor": 90 }, displayRank: "1", mean: 89, median: 89, spread: 2, adjusted: 0.707107, placeAwards: ["1st"] }],
};
const BIG: JudgesSummaryCategory = {
  code: "310", name: "Art Quilts", judges: JUDGES,
  entries: Array.from({ length: 70 }, (_, i) => entry(500 + i, `Study in Ochre No. ${i + 1}`, [70 + (i % 20), 71, 72], { displayRank: String(i + 1), mean: 71 })),
};

const rowOf = (page: PdfPage, entryNumber: number) => linesOf(page).find((l) => l.some((i) => i.str === String(entryNumber)))?.map((i) => i.str);

describe("judges' summary PDF", () => {
  it("starts each category on a new page with its judges and one row per entry", async () => {
    const pages = await readPdf((out) => writeJudgesSummary({ showName: SHOW, categories: [LARGE, SMALL] }, out));
    expect(pages).toHaveLength(2);
    expect([pages[0]!.width, pages[0]!.height]).toEqual([792, 612]); // Letter, landscape
    expect(pages[0]!.text).toContain("101 Large Pieced");
    expect(pages[0]!.text).toContain("Judges: Maren Holt; Dolores Ashby; Theodora Ng-Villanueva");
    expect(pages[1]!.text).toContain("205 Small Appliqué");
    expect(pages[1]!.text).toContain("Judges: Maren Holt; Clement Okafor");
    // Nothing of one category on the other's page.
    expect(pages[0]!.text).not.toContain("Fern Hollow");
    expect(pages[0]!.text).not.toContain("Okafor");
    expect(pages[1]!.text).not.toContain("Harbor Lights");
    expect(pages[1]!.text).not.toContain("Ashby");
  });

  it("lists each judge's total, the statistics and the place in the entry's row", async () => {
    const [page] = await readPdf((out) => writeJudgesSummary({ showName: SHOW, categories: [LARGE] }, out));
    expect(rowOf(page!, 112)).toEqual(["1", "112", "Harbor Lights", "95", "92", "96", "94.33", "95", "4", "1.225", "1st, Best of Show"]);
    expect(rowOf(page!, 131)).toEqual(["=2", "131", expect.stringMatching(/^Grandmother's Flower.*…$/), "90", "88.5", "93", "90.5", "90", "4.5", "-0.05", "2nd"]);
    // A judge with no submitted sheet shows a dash, not 0.
    expect(rowOf(page!, 140)).toEqual(["4", "140", "Tide Chart", "86", "—", "84", "85", "85", "2", "-1.174", "Honorable mention"]);
  });

  it("cuts long titles with an ellipsis so no cell runs into the next", async () => {
    const [page] = await readPdf((out) => writeJudgesSummary({ showName: SHOW, categories: [LARGE] }, out));
    expect(page!.text).not.toContain("Old Mill");
    for (const line of linesOf(page!)) {
      for (let k = 1; k < line.length; k++) expect(line[k - 1]!.x + line[k - 1]!.width, line.map((i) => i.str).join(" | ")).toBeLessThanOrEqual(line[k]!.x + 0.5);
    }
    // Column headings take up to two lines, so a judge's full name fits above a narrow column.
    const lines = linesOf(page!);
    const at = lines.findIndex((l) => l.some((i) => i.str === "Mean"));
    expect(lines[at]!.map((i) => i.str).join(" ")).toMatch(/^Rank Entry Title Maren Holt Dolores Theodora.* Mean Median Spread Adjusted Place \/ award$/);
    const heading = [...lines[at]!, ...lines[at + 1]!].map((i) => i.str).join(" ");
    expect(heading).not.toContain("…");
    for (const part of ["Ashby", "Ng-", "Villanueva"]) expect(heading).toContain(part);
  });

  it("continues a long category on the next page under its heading and the column headings", async () => {
    const pages = await readPdf((out) => writeJudgesSummary({ showName: SHOW, categories: [BIG, SMALL] }, out));
    const big = pages.filter((p) => p.text.includes("310 Art Quilts"));
    expect(big.length).toBeGreaterThan(1);
    expect(pages.at(-1)!.text).toContain("205 Small Appliqué");
    big.forEach((p, k) => {
      expect(p.text.includes("310 Art Quilts (continued)")).toBe(k > 0);
      expect(linesOf(p).some((l) => /^Rank Entry Title Maren Holt .* Mean Median Spread Adjusted Place \/ award$/.test(l.map((i) => i.str).join(" ")))).toBe(true);
      expect(Math.min(...p.items.map((i) => i.y))).toBeGreaterThanOrEqual(40 - 3); // nothing under the bottom margin
    });
    // Every entry exactly once across the pages, in the order given.
    const numbers = big.flatMap((p) => linesOf(p).map((l) => l[1]?.str).filter((s): s is string => !!s && /^5\d\d$/.test(s)));
    expect(numbers).toEqual(BIG.entries.map((e) => String(e.entryNumber)));
  });

  it("never prints an entrant's name, even when the rows carry one", async () => {
    const pages = await readPdf((out) => writeJudgesSummary({ showName: SHOW, categories: [LARGE, SMALL, BIG] }, out));
    expect(pages.map((p) => p.text).join(" ")).not.toContain("Entrant of");
  });
});
