// The entrants spreadsheet for the treasurer and the secretary: one row per entrant with a sent
// entry, their contact details, entries, fees due, paid and outstanding (money cells), the payment
// status in words, the last payment date (a date cell, the show's calendar day) and name consent.
// The rows come from exports/entrant-accounts.ts; streamed with exceljs.
import type { Writable } from "node:stream";
import { currencyFormat, wallClock } from "./entries-workbook";
import type { EntrantRow } from "./entrant-accounts";
import { addTableSheet, collect, workbookWriter, yesNo, type XlsxColumn } from "./xlsx-sheet";

export type EntrantsWorkbookOptions = { currency: string; timeZone: string; showName: string };

export const ENTRANTS_SHEET = "Entrants";

/** The show's calendar day of an instant, as a zone-less spreadsheet date at midnight. */
export function showDay(d: Date, timeZone: string): Date {
  const local = wallClock(d, timeZone);
  return new Date(Date.UTC(local.getUTCFullYear(), local.getUTCMonth(), local.getUTCDate()));
}

function columns(opts: EntrantsWorkbookOptions): XlsxColumn<EntrantRow>[] {
  const money = currencyFormat(opts.currency);
  const cents = (c: number) => c / 100;
  return [
    { header: "Name", width: 24, value: (r) => r.name },
    { header: "E-mail", width: 30, value: (r) => r.email },
    { header: "Phone", width: 16, value: (r) => r.phone },
    { header: "Address line 1", width: 26, value: (r) => r.addressLine1 },
    { header: "Address line 2", width: 18, value: (r) => r.addressLine2 },
    { header: "City", width: 16, value: (r) => r.city },
    { header: "Region", width: 12, value: (r) => r.region },
    { header: "Postal code", width: 11, value: (r) => r.postalCode },
    { header: "Country", width: 12, value: (r) => r.country },
    { header: "Guild", width: 22, value: (r) => r.guild },
    { header: "Member rate", width: 9, value: (r) => yesNo(r.member) },
    { header: "Entries", width: 8, numFmt: "0", value: (r) => r.entries },
    { header: "Withdrawn or declined", width: 11, numFmt: "0", value: (r) => r.withdrawnOrDeclined },
    { header: "Fees due", width: 12, numFmt: money, value: (r) => cents(r.feesDueCents) },
    { header: "Paid", width: 12, numFmt: money, value: (r) => cents(r.paidCents) },
    { header: "Outstanding", width: 12, numFmt: money, value: (r) => cents(r.outstandingCents) },
    { header: "Payment status", width: 13, value: (r) => r.paymentStatus },
    { header: "Refund to check (declined, paid, not refunded)", width: 18, value: (r) => r.refundToCheck.join(", ") },
    { header: `Last payment (${opts.timeZone})`, width: 14, numFmt: "yyyy-mm-dd", value: (r) => (r.lastPaymentAt ? showDay(r.lastPaymentAt, opts.timeZone) : null) },
    { header: "Name may be published", width: 11, value: (r) => yesNo(r.publishNameConsent) },
  ];
}

/** Writes the rows in the order given to `out`; resolves with the rows written. */
export async function writeEntrantsWorkbook(rows: readonly EntrantRow[], opts: EntrantsWorkbookOptions, out: Writable): Promise<number> {
  const wb = workbookWriter(out, `${opts.showName} entrants`);
  const sheet = addTableSheet(wb, ENTRANTS_SHEET, columns(opts));
  for (const r of rows) sheet.add(r);
  sheet.commit();
  await wb.commit();
  return sheet.rows();
}

/** The whole file in memory, for a route's response body. */
export const buildEntrantsWorkbook = (rows: readonly EntrantRow[], opts: EntrantsWorkbookOptions): Promise<Buffer> =>
  collect((out) => writeEntrantsWorkbook(rows, opts, out));
