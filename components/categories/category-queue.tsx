"use client";
// The chair's queue: entries the rules could not place (with the reasons and the categories they
// fit), quilts flagged for their size at intake, and each category's waiting list.
import type { ReactNode } from "react";
import { CircleCheck } from "lucide-react";
import { Badge } from "@/components/ui/badge";
import { Card, CardHeader } from "@/components/ui/card";
import { Alert } from "@/components/ui/alert";
import { AdmitForm, OverrideForm, ReviewedButton } from "./queue-forms";

type QueueEntry = {
  id: string;
  entryNumber: number | null;
  title: string;
  size: string;
  techniques: string[];
  state: string;
  category: string | null;
  candidates: { id: string; code: string; name: string }[];
  reasons: string[];
  sizeFlag: string;
  waitlistReason: string;
};
export type QueueData = {
  locked: boolean;
  categories: { id: string; code: string; name: string }[];
  unplaced: QueueEntry[];
  sizeFlags: QueueEntry[];
  waiting: QueueEntry[];
};

const STATE_WORDS: Record<string, string> = { fits_none: "Fits no category", fits_several: "Fits more than one", undecided: "Not decided yet" };
const label = (e: QueueEntry) => `#${e.entryNumber ?? "—"} ${e.title}`;

export function CategoryQueue({ showSlug, queue }: { showSlug: string; queue: QueueData }) {
  const n = queue.unplaced.length;
  const waitingBy = new Map<string, QueueEntry[]>();
  for (const e of queue.waiting) waitingBy.set(e.category ?? "No category", [...(waitingBy.get(e.category ?? "No category") ?? []), e]);
  return (
    <Card aria-labelledby="queue-title">
      <CardHeader id="queue-title" title="Queue" description="Entries that need you: no category or several, a size off at intake, a place on a waiting list." />
      <div className="space-y-8">
        <div className={n ? "rounded-card border-2 border-warning-700/40 bg-warning-50 p-4" : "rounded-card border border-success-700/30 bg-success-50 p-4"} data-testid="queue-count">
          <p className="flex flex-wrap items-baseline gap-x-3">
            <span className="text-4xl font-bold tabular-nums">{n}</span>
            <span className="text-lg font-semibold">{n === 1 ? "entry needs a category" : "entries need a category"}</span>
          </p>
          <p className="mt-1">{n ? "The queue must be empty before judging can start." : "Nothing in the way of judging, as far as categories go."}</p>
        </div>

        <section aria-labelledby="unplaced-title" className="space-y-3">
          <h3 id="unplaced-title" className="text-xl">Needs a category</h3>
          {n === 0 ? <Quiet>Every entry has its category.</Quiet> : null}
          <ul className="space-y-4">
            {queue.unplaced.map((e) => (
              <li key={e.id} className="space-y-3 rounded-card border border-line bg-white p-3 sm:p-4">
                <EntryHead entry={e} badge={STATE_WORDS[e.state] ?? e.state} />
                {e.candidates.length ? <p>It fits: {e.candidates.map((c) => `${c.code} ${c.name}`).join("; ")}.</p> : null}
                <Reasons reasons={e.reasons} />
                {queue.locked ? null : <OverrideForm showSlug={showSlug} entryId={e.id} entryLabel={label(e)} categories={queue.categories} candidates={e.candidates} />}
              </li>
            ))}
          </ul>
        </section>

        <section aria-labelledby="flags-title" className="space-y-3">
          <h3 id="flags-title" className="text-xl">Size flags from intake</h3>
          {queue.sizeFlags.length === 0 ? <Quiet>No quilt was found off its registered size.</Quiet> : null}
          <ul className="space-y-4">
            {queue.sizeFlags.map((e) => (
              <li key={e.id} className="space-y-2 rounded-card border border-line bg-white p-3 sm:p-4">
                <EntryHead entry={e} badge={e.category ? `In ${e.category}` : STATE_WORDS[e.state] ?? e.state} />
                <p>{e.sizeFlag}</p>
                <ReviewedButton showSlug={showSlug} entryId={e.id} entryLabel={label(e)} />
              </li>
            ))}
          </ul>
        </section>

        <section aria-labelledby="waiting-title" className="space-y-3">
          <h3 id="waiting-title" className="text-xl">Waiting lists</h3>
          {queue.waiting.length === 0 ? <Quiet>No entry is waiting for a place.</Quiet> : null}
          {[...waitingBy].map(([category, list]) => (
            <div key={category} className="space-y-3">
              <h4 className="text-lg">{category}: {list.length} waiting</h4>
              <ul className="space-y-4">
                {list.map((e) => (
                  <li key={e.id} className="space-y-2 rounded-card border border-line bg-white p-3 sm:p-4">
                    <EntryHead entry={e} />
                    {e.waitlistReason ? <p className="text-ink-muted">{e.waitlistReason}</p> : null}
                    <AdmitForm showSlug={showSlug} entryId={e.id} entryLabel={label(e)} />
                  </li>
                ))}
              </ul>
            </div>
          ))}
        </section>
        {queue.locked ? <Alert tone="info" title="Judging has started">Entries can no longer be placed by hand.</Alert> : null}
      </div>
    </Card>
  );
}

function EntryHead({ entry, badge }: { entry: QueueEntry; badge?: string }) {
  return (
    <div className="flex flex-wrap items-baseline justify-between gap-2">
      <p className="text-lg font-semibold break-words">{label(entry)}</p>
      <p className="flex flex-wrap items-center gap-2 text-ink-muted">
        <span>{entry.size}</span>
        {entry.techniques.length ? <span>· {entry.techniques.join(", ")}</span> : null}
        {badge ? <Badge tone="warning">{badge}</Badge> : null}
      </p>
    </div>
  );
}

function Reasons({ reasons }: { reasons: string[] }) {
  if (!reasons.length) return null;
  return (
    <details className="text-ink-muted">
      <summary className="min-h-tap cursor-pointer py-2 font-medium text-ink">Why ({reasons.length} {reasons.length === 1 ? "reason" : "reasons"})</summary>
      <ul className="list-disc space-y-1 pl-5 break-words">
        {reasons.map((r, i) => <li key={i}>{r}</li>)}
      </ul>
    </details>
  );
}

function Quiet({ children }: { children: ReactNode }) {
  return (
    <p className="flex items-center gap-2 text-ink-muted">
      <CircleCheck aria-hidden className="size-5 text-success-700" />
      {children}
    </p>
  );
}
