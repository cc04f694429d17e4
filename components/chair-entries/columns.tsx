"use client";
// The entries table's columns (TanStack Table v9 column helper). Ids of sortable columns are the
// server's sort keys, so the table's sorting state is exactly what the route is asked for.
import Link from "next/link";
import { createColumnHelper, columnVisibilityFeature, rowSelectionFeature, rowSortingFeature, tableFeatures } from "@tanstack/react-table";
import { EntryStatusBadge } from "@/components/entries/entry-status";
import { DIVISION_LABELS, labelOf } from "@/components/entries/labels";
import { Badge } from "@/components/ui/badge";
import { formatDate, formatTime } from "@/components/format/dates";
import { UM_PER_CM, formatCm, formatInches } from "@/scoring/units";
import { categoryText } from "@/lib/category-text";
import type { ChairEntry } from "./types";

export const features = tableFeatures({ rowSelectionFeature, columnVisibilityFeature, rowSortingFeature });
const helper = createColumnHelper<typeof features, ChairEntry>();

export const PAYMENT_LABELS: Record<string, string> = { paid: "Paid", unpaid: "Not paid", refunded: "Refunded" };

export const COLUMN_LABELS: Record<string, string> = {
  number: "No.",
  title: "Title",
  entrant: "Entrant",
  email: "E-mail",
  category: "Category",
  size: "Size",
  division: "Division",
  judged: "Judged",
  payment: "Payment",
  value: "Declared value",
  submitted: "Submitted",
  status: "Status",
};

/**
 * Shown until the chair chooses otherwise; the e-mail, value and judged columns start hidden (the
 * division cell says "Display only" under it), so the table fits a 1280 px laptop.
 */
export const DEFAULT_VISIBILITY: Record<string, boolean> = {
  number: true,
  title: true,
  entrant: true,
  email: false,
  category: true,
  size: true,
  division: true,
  judged: false,
  payment: true,
  value: false,
  submitted: true,
  status: true,
};

export function entryColumns(showSlug: string, timeZone: string, currency: string) {
  const money = new Intl.NumberFormat("en-US", { style: "currency", currency: currency.toUpperCase() });
  return helper.columns([
    helper.display({ id: "select", enableHiding: false, enableSorting: false, header: () => null, cell: () => null }),
    helper.accessor("entryNumber", {
      id: "number",
      header: COLUMN_LABELS.number,
      enableHiding: false,
      cell: (c) => <span className="font-display text-lg tabular-nums">{c.getValue() ?? "—"}</span>,
    }),
    helper.accessor("title", {
      id: "title",
      header: COLUMN_LABELS.title,
      enableHiding: false,
      cell: (c) => (
        <Link href={`/shows/${showSlug}/manage/entries/${c.row.original.id}`} className="font-semibold">
          {c.getValue()}
        </Link>
      ),
    }),
    helper.accessor("entrantName", { id: "entrant", header: COLUMN_LABELS.entrant }),
    helper.accessor("entrantEmail", { id: "email", header: COLUMN_LABELS.email, enableSorting: false, cell: (c) => <span className="break-all">{c.getValue()}</span> }),
    helper.accessor((e) => categoryText(e), {
      id: "category",
      header: COLUMN_LABELS.category,
      cell: (c) => (c.row.original.categoryCode ? c.getValue() : <span className="text-ink-muted">{c.getValue()}</span>),
    }),
    helper.accessor((e) => e.widthUm * e.lengthUm, {
      id: "size",
      header: COLUMN_LABELS.size,
      // Inches on one line, centimeters below: the column stays narrow enough for a laptop.
      cell: (c) => (
        <span className="block whitespace-nowrap">
          {formatInches(c.row.original.widthUm, false)} × {formatInches(c.row.original.lengthUm)}
          <span className="block text-sm text-ink-muted">
            {(c.row.original.widthUm / UM_PER_CM).toFixed(1)} × {formatCm(c.row.original.lengthUm)}
          </span>
        </span>
      ),
    }),
    helper.accessor("division", {
      id: "division",
      header: COLUMN_LABELS.division,
      enableSorting: false,
      cell: (c) => (
        <span className="block">
          {labelOf(DIVISION_LABELS, c.getValue())}
          {c.row.original.judged ? null : <span className="block text-sm text-ink-muted">Display only</span>}
        </span>
      ),
    }),
    helper.accessor("judged", { id: "judged", header: COLUMN_LABELS.judged, enableSorting: false, cell: (c) => (c.getValue() ? "Judged" : "Display only") }),
    helper.accessor("paymentState", {
      id: "payment",
      header: COLUMN_LABELS.payment,
      enableSorting: false,
      cell: (c) => (
        <Badge tone={c.getValue() === "paid" ? "success" : c.getValue() === "refunded" ? "warning" : "neutral"}>{PAYMENT_LABELS[c.getValue()] ?? c.getValue()}</Badge>
      ),
    }),
    helper.accessor("declaredValueCents", { id: "value", header: COLUMN_LABELS.value, enableSorting: false, cell: (c) => <span className="tabular-nums">{money.format(c.getValue() / 100)}</span> }),
    helper.accessor("submittedAt", {
      id: "submitted",
      header: COLUMN_LABELS.submitted,
      cell: (c) =>
        c.getValue() ? (
          <span className="block">
            {formatDate(c.getValue(), timeZone)}
            <span className="block text-sm text-ink-muted">{formatTime(c.getValue(), timeZone)}</span>
          </span>
        ) : (
          "—"
        ),
    }),
    helper.accessor("status", {
      id: "status",
      header: COLUMN_LABELS.status,
      cell: (c) => (
        <span className="flex flex-wrap items-center gap-2">
          <EntryStatusBadge status={c.getValue()} />
          {c.row.original.waitlisted ? <Badge tone="warning">Waiting list</Badge> : null}
        </span>
      ),
    }),
  ]);
}
