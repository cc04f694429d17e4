// The awards list for the ribbon table read back with SheetJS: the rows in the order given, the
// category as code and name, entry numbers as numbers, a frozen and filtered header.
import { describe, expect, it } from "vitest";
import * as XLSX from "xlsx";
import { AWARDS_SHEET, categoryLabel, writeAwardsList, type AwardsListRow } from "@/exports/awards-list";
import { FROZEN_HEADER, readXlsx } from "./read-back";

// Invented; Best of Show first and then each category's places is common practice for the table.
const ROWS: AwardsListRow[] = [
  { categoryCode: "", categoryName: "", award: "Best of Show", ribbon: "Purple rosette", entryNumber: 112, title: "Harbor Lights", entrantName: "Wren Castellano" },
  { categoryCode: "101", categoryName: "Large Pieced", award: "1st", ribbon: "Blue", entryNumber: 112, title: "Harbor Lights", entrantName: "Wren Castellano" },
  { categoryCode: "101", categoryName: "Large Pieced", award: "2nd", ribbon: "Red", entryNumber: 131, title: "Salt Marsh at Dusk", entrantName: "" },
  { categoryCode: "101", categoryName: "Large Pieced", award: "Honorable mention", ribbon: "Green", entryNumber: 140, title: "Tide Chart", entrantName: "Odile Faraday" },
  { categoryCode: "205", categoryName: "Small Appliqué", award: "1st", ribbon: "Blue", entryNumber: 207, title: "Fern Hollow", entrantName: "Basil Okonkwo" },
];

describe("awards list", () => {
  it("has the rows in the order given with the category as code and name", async () => {
    let written = 0;
    const { wb } = await readXlsx(async (out) => (written = await writeAwardsList(ROWS, { showName: "Cedar Hollow Quilt Show 2027" }, out)));
    expect(written).toBe(5);
    expect(wb.SheetNames).toEqual([AWARDS_SHEET]);
    const data = XLSX.utils.sheet_to_json<Record<string, unknown>>(wb.Sheets[AWARDS_SHEET]!, { raw: true });
    expect(data).toHaveLength(5);
    expect(data.map((d) => [d["Place or award"], d.Entry])).toEqual([["Best of Show", 112], ["1st", 112], ["2nd", 131], ["Honorable mention", 140], ["1st", 207]]);
    expect(data[1]).toEqual({ Category: "101 Large Pieced", "Place or award": "1st", Ribbon: "Blue", Entry: 112, Title: "Harbor Lights", Entrant: "Wren Castellano" });
    // A show-wide award without a category leaves the cell empty; so does an unprinted name.
    expect(data[0]!.Category).toBeUndefined();
    expect(data[2]!.Entrant).toBeUndefined();
    expect(data[4]).toMatchObject({ Category: "205 Small Appliqué", Title: "Fern Hollow" });
  });

  it("types entry numbers as numbers and freezes and filters the header", async () => {
    const { wb, xml } = await readXlsx((out) => writeAwardsList(ROWS, { showName: "Cedar Hollow Quilt Show 2027" }, out));
    const ws = wb.Sheets[AWARDS_SHEET]!;
    expect(ws.D2!.t).toBe("n");
    expect(ws.E2!.t).toBe("s");
    expect(ws["!autofilter"]).toEqual({ ref: "A1:F1" });
    expect(xml(1)).toMatch(FROZEN_HEADER);
    expect(XLSX.utils.decode_range(ws["!ref"]!).e.r).toBe(ROWS.length);
  });

  it("joins code and name without stray spaces", () => {
    expect(categoryLabel(" 101 ", "Large Pieced")).toBe("101 Large Pieced");
    expect(categoryLabel("", "Show-wide")).toBe("Show-wide");
    expect(categoryLabel("", "")).toBe("");
  });
});
