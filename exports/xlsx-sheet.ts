// Shared set-up for the streamed spreadsheets: a workbook writer on a stream, and table worksheets
// with a bold frozen header row, an autofilter over it, and a width and number format per column.
import { PassThrough, type Writable } from "node:stream";
import ExcelJS from "exceljs";

export type XlsxColumn<T> = {
  header: string;
  width: number;
  /** Excel number format, e.g. "0.00"; none for text. */
  numFmt?: string;
  value: (row: T) => ExcelJS.CellValue;
};

export type TableSheet<T> = { add: (row: T) => void; commit: () => void; rows: () => number };

export function workbookWriter(out: Writable, title: string): ExcelJS.stream.xlsx.WorkbookWriter {
  const wb = new ExcelJS.stream.xlsx.WorkbookWriter({ stream: out, useStyles: true, useSharedStrings: false });
  wb.creator = "Ribbonry";
  wb.title = title;
  return wb;
}

/** Worksheet names: at most 31 characters, none of : \ / ? * [ ]. */
export const safeSheetName = (name: string) => name.replace(/[:\\/?*[\]]/g, " ").slice(0, 31).trim() || "Sheet";

// An empty text is written as no cell, so a filter lists it under "(Blanks)" with the other gaps.
const blankIfEmpty = (v: ExcelJS.CellValue): ExcelJS.CellValue => (v === "" ? null : v);

/**
 * Adds a worksheet whose header row is styled and committed at once (a committed row can no longer
 * change); each `add` writes and commits one row, so nothing is held in memory.
 */
export function addTableSheet<T>(wb: ExcelJS.stream.xlsx.WorkbookWriter, name: string, cols: XlsxColumn<T>[]): TableSheet<T> {
  const ws = wb.addWorksheet(safeSheetName(name), { views: [{ state: "frozen", ySplit: 1, xSplit: 0 }] });
  ws.columns = cols.map((c, i) => ({ header: c.header, key: `c${i}`, width: c.width, style: c.numFmt ? { numFmt: c.numFmt } : {} }));
  ws.autoFilter = { from: { row: 1, column: 1 }, to: { row: 1, column: cols.length } };
  const header = ws.getRow(1);
  header.font = { bold: true };
  header.fill = { type: "pattern", pattern: "solid", fgColor: { argb: "FFEDE7DC" } };
  header.alignment = { vertical: "middle", wrapText: true };
  header.commit();
  let count = 0;
  return {
    add(row) {
      ws.addRow(Object.fromEntries(cols.map((c, i) => [`c${i}`, blankIfEmpty(c.value(row))]))).commit();
      count++;
    },
    commit: () => ws.commit(),
    rows: () => count,
  };
}

/** Runs a writer into memory and returns the whole file (for a route's response body). */
export async function collect(write: (out: Writable) => Promise<unknown>): Promise<Buffer> {
  const out = new PassThrough();
  const chunks: Buffer[] = [];
  out.on("data", (c: Buffer) => chunks.push(c));
  const ended = new Promise<void>((resolve, reject) => {
    out.on("end", resolve);
    out.on("error", reject);
  });
  await write(out);
  await ended;
  return Buffer.concat(chunks);
}

export const yesNo = (b: boolean) => (b ? "yes" : "no");
