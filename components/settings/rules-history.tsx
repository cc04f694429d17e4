// Every published version of the rules and release, newest first.
import { History } from "lucide-react";
import { formatDateTime, isoDateTime } from "@/components/format/dates";
import { Badge } from "@/components/ui/badge";

type Version = { id: string; version: number; rulesText: string; releaseText: string; publishedAt: Date; publishedByName: string | null };

export function RulesHistory({ versions, timeZone }: { versions: Version[]; timeZone: string }) {
  if (versions.length === 0) {
    return <p className="text-ink-muted italic">No version published yet. Entries can’t open until one is.</p>;
  }
  return (
    <ol className="space-y-3">
      {versions.map((v, i) => (
        <li key={v.id} className="rounded-control border border-line bg-paper-50 p-3">
          <details>
            <summary className="flex min-h-tap cursor-pointer flex-wrap items-center gap-2">
              <History aria-hidden className="size-5 text-plum-500" />
              <span className="font-semibold">Version {v.version}</span>
              {i === 0 ? <Badge tone="success">Current</Badge> : null}
              <span className="text-sm text-ink-muted">
                published <time dateTime={isoDateTime(v.publishedAt)}>{formatDateTime(v.publishedAt, timeZone)}</time>
                {v.publishedByName ? ` by ${v.publishedByName}` : ""}
              </span>
            </summary>
            <div className="mt-3 space-y-3">
              <h4 className="font-semibold">Rules</h4>
              <p className="whitespace-pre-line">{v.rulesText}</p>
              <h4 className="font-semibold">Release</h4>
              <p className="whitespace-pre-line">{v.releaseText}</p>
            </div>
          </details>
        </li>
      ))}
    </ol>
  );
}
