// "Results by category" read back with SheetJS: one row per entry in the order given, a Category
// column for filtering, numbers typed as numbers with their formats, the frozen header, the
// autofilter and a summary per category.
import { describe, expect, it } from "vitest";
import * as XLSX from "xlsx";
import { RESULTS_SHEET, SUMMARY_SHEET, writeResultsWorkbook, type ResultsWorkbookRow } from "@/exports/results-workbook";
import { FROZEN_HEADER, readXlsx } from "./read-back";

const row = (r: Partial<ResultsWorkbookRow> & Pick<ResultsWorkbookRow, "entryNumber" | "title">): ResultsWorkbookRow => ({
  categoryCode: "101",
  categoryName: "Large Pieced",
  rank: null,
  displayRank: "—",
  placeAwards: [],
  ribbon: "",
  entrantName: "",
  judges: 3,
  mean: null,
  median: null,
  spread: null,
  adjusted: null,
  flags: [],
  ...r,
});

// Invented results. Ribbon colours are common practice in US shows (1st blue, 2nd red, 3rd yellow).
const ROWS: ResultsWorkbookRow[] = [
  row({ rank: 1, displayRank: "1", placeAwards: ["1st", "Best of Show"], ribbon: "Blue", entryNumber: 112, title: "Harbor Lights", entrantName: "Wren Castellano", mean: 94.333333, median: 95, spread: 4, adjusted: 1.224745 }),
  row({ rank: 2, displayRank: "=2", placeAwards: ["2nd"], ribbon: "Red", entryNumber: 118, title: "Marigold Crossing", entrantName: "Odile Faraday", mean: 90.5, median: 90.5, spread: 3, adjusted: 0.1 }),
  row({ rank: 2, displayRank: "=2", placeAwards: ["2nd"], ribbon: "Red", entryNumber: 131, title: "Salt Marsh at Dusk", entrantName: "", mean: 90.5, median: 91, spread: 7, adjusted: -0.05, flags: ["Spread of 7 is over the show's 6", "Tie kept: no tie-break separated it"] }),
  row({ rank: 4, displayRank: "4", placeAwards: ["Honorable mention"], ribbon: "Green", entryNumber: 140, title: "Tide Chart", mean: 85, median: 84, spread: 2, adjusted: -1.274745 }),
  row({ entryNumber: 145, title: "Granary Door", judges: 0, flags: ["No submitted sheets"] }),
  row({ categoryCode: "205", categoryName: "Small Appliqué", rank: 1, displayRank: "1", placeAwards: ["1st"], ribbon: "Blue", entryNumber: 207, title: "Fern Hollow", entrantName: "Basil Okonkwo", judges: 2, mean: 88, median: 88, spread: 0, adjusted: 0 }),
];

async function* streamed(rows: ResultsWorkbookRow[]): AsyncGenerator<ResultsWorkbookRow> {
  for (const r of rows) yield r;
}

describe("results workbook", () => {
  it("has one typed row per entry in the order given, filterable by category", async () => {
    let written = 0;
    const { wb } = await readXlsx(async (out) => (written = await writeResultsWorkbook(streamed(ROWS), { showName: "Cedar Hollow Quilt Show 2027" }, out)));
    expect(written).toBe(ROWS.length);
    expect(wb.SheetNames).toEqual([RESULTS_SHEET, SUMMARY_SHEET]);
    const ws = wb.Sheets[RESULTS_SHEET]!;
    expect(XLSX.utils.decode_range(ws["!ref"]!).e.r).toBe(ROWS.length); // header + one row each
    const data = XLSX.utils.sheet_to_json<Record<string, unknown>>(ws, { raw: true });
    expect(data.map((d) => d.Entry)).toEqual([112, 118, 131, 140, 145, 207]);
    expect(data[0]).toEqual({
      Category: "101", "Category name": "Large Pieced", Rank: 1, "Rank shown": "1", "Place / award": "1st, Best of Show", Ribbon: "Blue",
      Entry: 112, Title: "Harbor Lights", Entrant: "Wren Castellano", Judges: 3, Mean: 94.333333, Median: 95, Spread: 4, "Adjusted (z)": 1.224745,
    });
    expect(data[2]).toMatchObject({ Rank: 2, "Rank shown": "=2", "Adjusted (z)": -0.05, Flags: "Spread of 7 is over the show's 6; Tie kept: no tie-break separated it" });
    // An empty entrant name and an unranked entry leave their cells empty, not "null" or 0.
    expect(data[2]!.Entrant).toBeUndefined();
    expect(data[4]).toMatchObject({ "Rank shown": "—", Judges: 0, Flags: "No submitted sheets" });
    expect(data[4]!.Rank).toBeUndefined();
    expect(data[4]!.Mean).toBeUndefined();
    expect(data.filter((d) => d.Category === "205").map((d) => d.Title)).toEqual(["Fern Hollow"]);
  });

  it("types numbers as numbers with score formats, and freezes and filters the header", async () => {
    const { wb, xml } = await readXlsx((out) => writeResultsWorkbook(ROWS, { showName: "Cedar Hollow Quilt Show 2027" }, out));
    const ws = wb.Sheets[RESULTS_SHEET]!;
    for (const ref of ["C2", "G2", "J2", "K2", "L2", "M2", "N2"]) expect(ws[ref]!.t, ref).toBe("n");
    expect(ws.D3!.t).toBe("s"); // "=2" stays text, never a formula or a number
    expect(ws.D3!.v).toBe("=2");
    expect(ws.K2!.z).toBe("0.00");
    expect(ws.N2!.z).toBe("0.000");
    expect(ws.N2!.w).toBe("1.225"); // shown to 3 places, stored in full
    expect(ws["!autofilter"]).toEqual({ ref: "A1:O1" });
    expect(xml(1)).toMatch(FROZEN_HEADER);
    expect(xml(1)).toMatch(/<col [^>]*width=/);
  });

  it("summarises each category: entries, ranked, placed and ribbons", async () => {
    const { wb } = await readXlsx((out) => writeResultsWorkbook(ROWS, { showName: "Cedar Hollow Quilt Show 2027" }, out));
    const summary = XLSX.utils.sheet_to_json<Record<string, unknown>>(wb.Sheets[SUMMARY_SHEET]!, { raw: true });
    expect(summary).toEqual([
      { Category: "101", "Category name": "Large Pieced", Entries: 5, Ranked: 4, "With a place or award": 4, Ribbons: 4 },
      { Category: "205", "Category name": "Small Appliqué", Entries: 1, Ranked: 1, "With a place or award": 1, Ribbons: 1 },
    ]);
  });

  it("writes a header-only sheet when there are no results", async () => {
    const { wb } = await readXlsx((out) => writeResultsWorkbook([], { showName: "Empty" }, out));
    const ws = wb.Sheets[RESULTS_SHEET]!;
    expect(XLSX.utils.sheet_to_json(ws)).toEqual([]);
    expect(ws.A1!.v).toBe("Category");
    expect(ws.O1!.v).toBe("Flags");
  });
});
