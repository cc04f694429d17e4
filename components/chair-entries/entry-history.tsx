// An entry's history from the audit log: who did what, when (in the show's zone), before → after.
import { History } from "lucide-react";
import { formatDateTime, isoDateTime } from "@/components/format/dates";
import { entryStatusInfo } from "@/components/entries/entry-status";
import { EmptyState } from "@/components/ui/empty-state";

export type HistoryItem = {
  id: number;
  action: string;
  at: Date;
  actorName: string | null;
  before: Record<string, unknown> | null;
  after: Record<string, unknown> | null;
};

const ACTION_LABELS: Record<string, string> = {
  "entry.accepted": "Accepted",
  "entry.declined": "Declined",
  "entry.paid_offline": "Marked paid offline",
  "entry.decision_released": "Decision released to the entrant",
  "entry.withdrawn": "Withdrawn",
};

const FIELD_LABELS: Record<string, string> = {
  status: "Status",
  decisionReason: "Reason",
  paidAt: "Paid",
  paymentReference: "Payment reference",
  decisionReleasedAt: "Released",
  reason: "Reason",
  refundCents: "Refund (cents)",
  withdrawnBy: "Withdrawn by",
};

function show(key: string, value: unknown, timeZone: string): string {
  if (value === null || value === undefined || value === "") return "—";
  if (key === "status") return entryStatusInfo(String(value)).label;
  if (key.endsWith("At")) return formatDateTime(String(value), timeZone) ?? String(value);
  return typeof value === "string" ? value : JSON.stringify(value);
}

/** The fields that changed, in the order they were written. */
function changes(before: Record<string, unknown> | null, after: Record<string, unknown> | null) {
  const keys = [...new Set([...Object.keys(after ?? {}), ...Object.keys(before ?? {})])];
  return keys.filter((k) => JSON.stringify(before?.[k] ?? null) !== JSON.stringify(after?.[k] ?? null));
}

export function EntryHistory({ items, timeZone }: { items: HistoryItem[]; timeZone: string }) {
  if (items.length === 0) {
    return (
      <EmptyState icon={History} title="No changes recorded yet">
        Decisions, payments and check-ins appear here as they happen.
      </EmptyState>
    );
  }
  return (
    <ol className="space-y-4">
      {items.map((h) => (
        <li key={h.id} className="border-l-4 border-line pl-4">
          <p className="font-semibold">{ACTION_LABELS[h.action] ?? h.action}</p>
          <p className="text-sm text-ink-muted">
            <time dateTime={isoDateTime(h.at)}>{formatDateTime(h.at, timeZone)}</time> · {h.actorName ?? "The system"}
          </p>
          <ul className="mt-1 space-y-0.5">
            {changes(h.before, h.after).map((k) => (
              <li key={k}>
                <span className="text-ink-muted">{FIELD_LABELS[k] ?? k}:</span> {show(k, h.before?.[k], timeZone)} → {show(k, h.after?.[k], timeZone)}
              </li>
            ))}
          </ul>
        </li>
      ))}
    </ol>
  );
}
