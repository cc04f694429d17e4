// The entries spreadsheet for the treasurer and the hanging committee, written with exceljs's
// streaming writer into memory: numbers as numbers, money with a currency format, dates as dates.
import { PassThrough } from "node:stream";
import ExcelJS from "exceljs";
import { DIVISION_LABELS, QUILTING_METHOD_LABELS, labelOf } from "@/components/entries/labels";
import { UM_PER_CM, UM_PER_INCH } from "@/scoring/units";
import { categoryText, type CategoryOfEntry } from "@/lib/category-text";

export type WorkbookEntry = CategoryOfEntry & {
  entryNumber: number | null;
  title: string;
  entrantName: string;
  email: string;
  phone: string;
  division: string;
  judged: boolean;
  widthUm: number;
  lengthUm: number;
  techniques: string[];
  quiltingMethod: string;
  quiltedBy: string;
  quiltedForHire: boolean;
  declaredValueCents: number;
  forSale: boolean;
  priceCents: number | null;
  status: string;
  paymentState: string;
  paidCents: number;
  paymentReference: string;
  submittedAt: Date | null;
};

type Col = { header: string; key: string; width: number; numFmt?: string; value: (e: WorkbookEntry) => ExcelJS.CellValue };

const SYMBOLS: Record<string, string> = { usd: "$", cad: "$", aud: "$", nzd: "$", gbp: "£", eur: "€" };

/** e.g. `"$"#,##0.00`; an unknown currency shows its code after the amount. */
export function currencyFormat(currency: string): string {
  const symbol = SYMBOLS[currency.toLowerCase()];
  return symbol ? `"${symbol}"#,##0.00` : `#,##0.00 "${currency.toUpperCase()}"`;
}

const round = (n: number, places: number) => Math.round(n * 10 ** places) / 10 ** places;
const inches = (um: number) => round(um / UM_PER_INCH, 4);
const cm = (um: number) => round(um / UM_PER_CM, 2);
const yesNo = (b: boolean) => (b ? "yes" : "no");

/**
 * A spreadsheet date has no zone, so the instant is written as the wall-clock time in the show's
 * zone (what the committee reads on its own clocks); the header names the zone.
 */
export function wallClock(d: Date, timeZone: string): Date {
  const parts = Object.fromEntries(
    new Intl.DateTimeFormat("en-US", { timeZone, hourCycle: "h23", year: "numeric", month: "2-digit", day: "2-digit", hour: "2-digit", minute: "2-digit", second: "2-digit" })
      .formatToParts(d)
      .map((p) => [p.type, p.value]),
  );
  return new Date(Date.UTC(+parts.year!, +parts.month! - 1, +parts.day!, +parts.hour!, +parts.minute!, +parts.second!));
}

function columns(currency: string, timeZone: string): Col[] {
  const money = currencyFormat(currency);
  return [
    { header: "Entry number", key: "number", width: 10, numFmt: "0", value: (e) => e.entryNumber },
    { header: "Title", key: "title", width: 32, value: (e) => e.title },
    { header: "Entrant", key: "entrant", width: 24, value: (e) => e.entrantName },
    { header: "E-mail", key: "email", width: 30, value: (e) => e.email },
    { header: "Phone", key: "phone", width: 16, value: (e) => e.phone },
    { header: "Category code", key: "categoryCode", width: 10, value: (e) => e.categoryCode ?? "" },
    { header: "Category", key: "category", width: 28, value: (e) => (e.categoryCode ? (e.categoryName ?? "") : categoryText(e)) },
    { header: "Division", key: "division", width: 16, value: (e) => labelOf(DIVISION_LABELS, e.division) },
    { header: "Judged", key: "judged", width: 9, value: (e) => yesNo(e.judged) },
    { header: "Width in", key: "widthIn", width: 10, numFmt: "0.###", value: (e) => inches(e.widthUm) },
    { header: "Length in", key: "lengthIn", width: 10, numFmt: "0.###", value: (e) => inches(e.lengthUm) },
    { header: "Width cm", key: "widthCm", width: 10, numFmt: "0.0", value: (e) => cm(e.widthUm) },
    { header: "Length cm", key: "lengthCm", width: 10, numFmt: "0.0", value: (e) => cm(e.lengthUm) },
    { header: "Perimeter in", key: "perimeterIn", width: 12, numFmt: "0.###", value: (e) => inches(2 * (e.widthUm + e.lengthUm)) },
    { header: "Techniques", key: "techniques", width: 24, value: (e) => e.techniques.join(", ") },
    { header: "Quilting method", key: "method", width: 24, value: (e) => labelOf(QUILTING_METHOD_LABELS, e.quiltingMethod) },
    { header: "Quilted by", key: "quiltedBy", width: 20, value: (e) => e.quiltedBy },
    { header: "For hire", key: "forHire", width: 9, value: (e) => yesNo(e.quiltedForHire) },
    { header: "Declared value $", key: "value", width: 14, numFmt: money, value: (e) => e.declaredValueCents / 100 },
    { header: "For sale", key: "forSale", width: 9, value: (e) => yesNo(e.forSale) },
    { header: "Price $", key: "price", width: 12, numFmt: money, value: (e) => (e.priceCents === null ? null : e.priceCents / 100) },
    { header: "Status", key: "status", width: 12, value: (e) => e.status },
    { header: "Paid", key: "paid", width: 10, value: (e) => e.paymentState },
    { header: "Amount paid $", key: "amountPaid", width: 14, numFmt: money, value: (e) => e.paidCents / 100 },
    { header: "Payment reference", key: "reference", width: 20, value: (e) => e.paymentReference },
    { header: `Submitted at (${timeZone})`, key: "submittedAt", width: 20, numFmt: "yyyy-mm-dd hh:mm", value: (e) => (e.submittedAt ? wallClock(e.submittedAt, timeZone) : null) },
  ];
}

export const ENTRIES_SHEET = "Entries";

export async function buildEntriesWorkbook(rows: WorkbookEntry[], opts: { currency: string; timeZone: string; showName: string }): Promise<Buffer> {
  const out = new PassThrough();
  const chunks: Buffer[] = [];
  out.on("data", (c: Buffer) => chunks.push(c));
  const finished = new Promise<void>((resolve, reject) => {
    out.on("end", resolve);
    out.on("error", reject);
  });
  const wb = new ExcelJS.stream.xlsx.WorkbookWriter({ stream: out, useStyles: true, useSharedStrings: false });
  wb.creator = "Ribbonry";
  wb.title = `${opts.showName} entries`;
  const cols = columns(opts.currency, opts.timeZone);
  const ws = wb.addWorksheet(ENTRIES_SHEET, { views: [{ state: "frozen", ySplit: 1, xSplit: 0 }] });
  ws.columns = cols.map((c) => ({ header: c.header, key: c.key, width: c.width, style: c.numFmt ? { numFmt: c.numFmt } : {} }));
  ws.autoFilter = { from: { row: 1, column: 1 }, to: { row: 1, column: cols.length } };
  // The header row is styled before it is committed: a committed row can no longer change.
  const header = ws.getRow(1);
  header.font = { bold: true };
  header.fill = { type: "pattern", pattern: "solid", fgColor: { argb: "FFEDE7DC" } };
  header.alignment = { vertical: "middle", wrapText: true };
  header.commit();
  for (const e of rows) {
    const row = ws.addRow(Object.fromEntries(cols.map((c) => [c.key, c.value(e)])));
    row.commit();
  }
  ws.commit();
  await wb.commit();
  await finished;
  return Buffer.concat(chunks);
}
