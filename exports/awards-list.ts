// The awards list for the ribbon table: who gets which ribbon, one row per place or award, in the
// order the caller gives (the order the ribbons are laid out). Streamed with exceljs.
import type { Writable } from "node:stream";
import { addTableSheet, workbookWriter, type XlsxColumn } from "./xlsx-sheet";

export type AwardsListRow = {
  /** Empty for a show-wide award (Best of Show) when the caller gives no category. */
  categoryCode: string;
  categoryName: string;
  /** "1st", "Honorable mention", "Best of Show", … */
  award: string;
  ribbon: string;
  entryNumber: number;
  title: string;
  /** Empty when the show does not print the name. */
  entrantName: string;
};

export const AWARDS_SHEET = "Awards";

export const categoryLabel = (code: string, name: string) => [code.trim(), name.trim()].filter(Boolean).join(" ");

const COLUMNS: XlsxColumn<AwardsListRow>[] = [
  { header: "Category", width: 30, value: (r) => categoryLabel(r.categoryCode, r.categoryName) },
  { header: "Place or award", width: 24, value: (r) => r.award },
  { header: "Ribbon", width: 16, value: (r) => r.ribbon },
  { header: "Entry", width: 8, numFmt: "0", value: (r) => r.entryNumber },
  { header: "Title", width: 34, value: (r) => r.title },
  { header: "Entrant", width: 26, value: (r) => r.entrantName },
];

/** Writes the list to `out`; resolves with the rows written once the file is complete. */
export async function writeAwardsList(rows: readonly AwardsListRow[], opts: { showName: string }, out: Writable): Promise<number> {
  const wb = workbookWriter(out, `${opts.showName} awards`);
  const sheet = addTableSheet(wb, AWARDS_SHEET, COLUMNS);
  for (const r of rows) sheet.add(r);
  sheet.commit();
  await wb.commit();
  return sheet.rows();
}
