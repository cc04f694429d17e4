// An entry's history from the audit log: who did what, when (in the show's zone), in plain words: sizes in
// inches and centimeters, money as money (components/chair-entries/history-words.ts).
import { History } from "lucide-react";
import { formatDateTime, isoDateTime } from "@/components/format/dates";
import { EmptyState } from "@/components/ui/empty-state";
import { actionLabel, changeLine, changedFields } from "./history-words";

export type HistoryItem = {
  id: number;
  action: string;
  at: Date;
  actorName: string | null;
  before: Record<string, unknown> | null;
  after: Record<string, unknown> | null;
};

export function EntryHistory({ items, timeZone, currency }: { items: HistoryItem[]; timeZone: string; currency: string }) {
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
          <p className="font-semibold">{actionLabel(h.action)}</p>
          <p className="text-sm text-ink-muted">
            <time dateTime={isoDateTime(h.at)}>{formatDateTime(h.at, timeZone)}</time> · {h.actorName ?? "The system"}
          </p>
          <ul className="mt-1 space-y-0.5">
            {changedFields(h.before, h.after).map((k) => (
              <li key={k}>{changeLine(k, h.before, h.after, { timeZone, currency })}</li>
            ))}
          </ul>
        </li>
      ))}
    </ol>
  );
}
