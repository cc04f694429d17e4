// "Results by category" for the committee: one worksheet with a row per ranked entry and a
// Category column (so one filter shows one category), then a summary sheet per category.
// Streamed with exceljs, row by row; scores are numbers with a number format, never text.
import type { Writable } from "node:stream";
import { addTableSheet, workbookWriter, type XlsxColumn } from "./xlsx-sheet";

export type ResultsWorkbookRow = {
  categoryCode: string;
  categoryName: string;
  /** Rank after tie-breaks; null when the entry was not ranked (no scores). */
  rank: number | null;
  /** The rank as shown: "1", "=2" for a tie still shared, "—" when not ranked. */
  displayRank: string;
  /** Places and awards in the order to print, e.g. ["1st", "Best of Show"]; empty when none. */
  placeAwards: string[];
  /** The ribbon's name, e.g. "Blue"; empty when none. */
  ribbon: string;
  entryNumber: number;
  title: string;
  /** Empty when the show does not print the name. */
  entrantName: string;
  /** Judges whose submitted sheets count. */
  judges: number;
  mean: number | null;
  median: number | null;
  spread: number | null;
  /** Severity-adjusted score: the mean of the entry's z-scores. */
  adjusted: number | null;
  flags: string[];
};

export const RESULTS_SHEET = "Results by category";
export const SUMMARY_SHEET = "Summary";

const COLUMNS: XlsxColumn<ResultsWorkbookRow>[] = [
  { header: "Category", width: 10, value: (r) => r.categoryCode },
  { header: "Category name", width: 26, value: (r) => r.categoryName },
  { header: "Rank", width: 7, numFmt: "0", value: (r) => r.rank },
  { header: "Rank shown", width: 8, value: (r) => r.displayRank },
  { header: "Place / award", width: 26, value: (r) => r.placeAwards.join(", ") },
  { header: "Ribbon", width: 14, value: (r) => r.ribbon },
  { header: "Entry", width: 8, numFmt: "0", value: (r) => r.entryNumber },
  { header: "Title", width: 32, value: (r) => r.title },
  { header: "Entrant", width: 24, value: (r) => r.entrantName },
  { header: "Judges", width: 8, numFmt: "0", value: (r) => r.judges },
  { header: "Mean", width: 9, numFmt: "0.00", value: (r) => r.mean },
  { header: "Median", width: 9, numFmt: "0.00", value: (r) => r.median },
  { header: "Spread", width: 9, numFmt: "0.00", value: (r) => r.spread },
  { header: "Adjusted (z)", width: 11, numFmt: "0.000", value: (r) => r.adjusted },
  { header: "Flags", width: 40, value: (r) => r.flags.join("; ") },
];

type CategoryCount = { code: string; name: string; entries: number; ranked: number; placed: number; ribbons: number };

const SUMMARY_COLUMNS: XlsxColumn<CategoryCount>[] = [
  { header: "Category", width: 10, value: (c) => c.code },
  { header: "Category name", width: 26, value: (c) => c.name },
  { header: "Entries", width: 9, numFmt: "0", value: (c) => c.entries },
  { header: "Ranked", width: 9, numFmt: "0", value: (c) => c.ranked },
  { header: "With a place or award", width: 12, numFmt: "0", value: (c) => c.placed },
  { header: "Ribbons", width: 9, numFmt: "0", value: (c) => c.ribbons },
];

function count(counts: Map<string, CategoryCount>, r: ResultsWorkbookRow): void {
  const key = `${r.categoryCode}\u0000${r.categoryName}`;
  const c = counts.get(key) ?? { code: r.categoryCode, name: r.categoryName, entries: 0, ranked: 0, placed: 0, ribbons: 0 };
  c.entries++;
  if (r.rank !== null) c.ranked++;
  if (r.placeAwards.length) c.placed++;
  if (r.ribbon) c.ribbons++;
  counts.set(key, c);
}

/**
 * Writes the rows in the order given (the caller sorts: category, then rank) to `out`, then the
 * summary, and resolves with the number of result rows once the file is complete.
 */
export async function writeResultsWorkbook(
  rows: Iterable<ResultsWorkbookRow> | AsyncIterable<ResultsWorkbookRow>,
  opts: { showName: string },
  out: Writable,
): Promise<number> {
  const wb = workbookWriter(out, `${opts.showName} results`);
  const sheet = addTableSheet(wb, RESULTS_SHEET, COLUMNS);
  const counts = new Map<string, CategoryCount>();
  for await (const r of rows) {
    sheet.add(r);
    count(counts, r);
  }
  sheet.commit();
  const summary = addTableSheet(wb, SUMMARY_SHEET, SUMMARY_COLUMNS);
  for (const c of counts.values()) summary.add(c);
  summary.commit();
  await wb.commit();
  return sheet.rows();
}
