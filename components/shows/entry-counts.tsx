// How many entries stand at each status, for the chair.
import { Inbox } from "lucide-react";
import { ENTRY_STATUS } from "@/components/entries/entry-status";
import { EmptyState } from "@/components/ui/empty-state";

export function EntryCounts({ counts, total }: { counts: { status: string; n: number }[]; total: number }) {
  if (total === 0) {
    return <EmptyState icon={Inbox} title="No entries yet">Entries appear here as quilters send them in.</EmptyState>;
  }
  const byStatus = new Map(counts.map((c) => [c.status, c.n]));
  const rows = Object.entries(ENTRY_STATUS).filter(([status]) => byStatus.get(status));
  return (
    <div>
      <p className="mb-4 text-lg">
        <span className="font-display text-4xl font-semibold tabular-nums">{total}</span> {total === 1 ? "entry" : "entries"} in all
      </p>
      <ul className="grid grid-cols-2 gap-3 sm:grid-cols-3 lg:grid-cols-5">
        {rows.map(([status, info]) => (
          <li key={status} className="rounded-control border border-line bg-paper-50 p-3">
            <p className="flex items-center gap-1.5 text-sm font-semibold text-ink-muted">
              <info.icon aria-hidden className="size-4" />
              {info.label}
            </p>
            <p className="font-display text-2xl font-semibold tabular-nums">{byStatus.get(status)}</p>
          </li>
        ))}
      </ul>
    </div>
  );
}
