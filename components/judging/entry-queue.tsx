"use client";
// The panel's queue for one judge in judging order: by session, then category with its progress,
// then entry number (queue-groups.ts); overall progress, each entry's sheet state, and "jump to
// entry number" for the judging table. Blind: numbers, released titles and categories only.
import { useState, type FormEvent } from "react";
import { ArrowRight, Hash, Lock } from "lucide-react";
import { Badge } from "@/components/ui/badge";
import { Button } from "@/components/ui/button";
import { controlClasses, FieldError } from "@/components/ui/field";
import { cx } from "@/components/ui/cx";
import type { SessionEntry, SessionPayload } from "./local-db";
import type { SheetView } from "./outbox";
import { groupQueue } from "./queue-groups";
import { SyncBadge } from "./sync-badge";

type Props = { session: SessionPayload; entries: SessionEntry[]; views: Map<string, SheetView>; onOpen: (entryId: string) => void };

export function EntryQueue({ session, entries, views, onOpen }: Props) {
  const [number, setNumber] = useState("");
  const [problem, setProblem] = useState<string | null>(null);
  const done = entries.filter((e) => views.get(e.id)?.locked).length;
  const groups = groupQueue(session, entries, (id) => !!views.get(id)?.locked);

  const jump = (e: FormEvent) => {
    e.preventDefault();
    const n = Number.parseInt(number.trim().replace(/^#/, ""), 10);
    if (!Number.isInteger(n)) return setProblem("Type an entry number, for example 112.");
    const entry = entries.find((x) => x.entryNumber === n);
    if (!entry) return setProblem(`Entry ${n} is not in this judge's queue.`);
    setProblem(null);
    setNumber("");
    onOpen(entry.id);
  };

  return (
    <div className="space-y-6">
      <div className="rounded-card border border-line bg-surface p-4 shadow-card">
        <p className="text-lg font-semibold" id="progress-label">
          {done} of {entries.length} submitted
        </p>
        <div className="mt-2 h-4 overflow-hidden rounded-full bg-paper-300" role="progressbar" aria-labelledby="progress-label" aria-valuemin={0} aria-valuemax={entries.length} aria-valuenow={done}>
          <div className="h-full bg-success-700" style={{ width: `${entries.length ? (done / entries.length) * 100 : 0}%` }} />
        </div>
        <form onSubmit={jump} noValidate className="mt-4" aria-label="Jump to an entry">
          <label htmlFor="jump" className="mb-2 block text-lg font-semibold">Jump to entry number</label>
          <div className="flex gap-3">
            <div className="relative flex-1">
              <Hash aria-hidden className="pointer-events-none absolute top-1/2 left-3 size-6 -translate-y-1/2 text-ink-muted" />
              <input id="jump" type="text" inputMode="numeric" autoComplete="off" enterKeyHint="go" value={number} onChange={(e) => setNumber(e.target.value)} aria-invalid={problem ? true : undefined} aria-describedby={problem ? "jump-error" : undefined} className={cx(controlClasses("lg"), "pl-12 font-semibold tabular-nums")} />
            </div>
            <Button type="submit" size="lg" icon={<ArrowRight aria-hidden className="size-6" />}>Open</Button>
          </div>
          <div aria-live="polite">
            <FieldError id="jump-error" message={problem ?? undefined} />
          </div>
        </form>
      </div>

      {groups.map((group) => (
        <section key={group.id || "session"} aria-labelledby={`session-${group.id || "own"}`} className="space-y-4">
          <h2 id={`session-${group.id || "own"}`} className="text-2xl">{group.label}</h2>
          {group.categories.map((cat) => (
            <section key={cat.id} aria-labelledby={`cat-${cat.id}`} className="space-y-3">
              <div className="flex flex-wrap items-end justify-between gap-x-4 gap-y-1 border-b border-line pb-2">
                <h3 id={`cat-${cat.id}`} className="text-xl">
                  {cat.code} {cat.name}
                </h3>
                <p className="text-base font-semibold text-ink-muted tabular-nums" id={`cat-progress-${cat.id}`}>
                  {cat.done} of {cat.entries.length} sheets submitted
                </p>
              </div>
              <div className="h-2 overflow-hidden rounded-full bg-paper-300" role="progressbar" aria-labelledby={`cat-${cat.id} cat-progress-${cat.id}`} aria-valuemin={0} aria-valuemax={cat.entries.length} aria-valuenow={cat.done}>
                <div className="h-full bg-success-700" style={{ width: `${(cat.done / cat.entries.length) * 100}%` }} />
              </div>
              <ol className="space-y-3" aria-label={`${cat.code} ${cat.name}, by entry number`}>
                {cat.entries.map((e) => {
                  const view = views.get(e.id);
                  return (
                    <li key={e.id}>
                      <button type="button" onClick={() => onOpen(e.id)} data-entry={e.entryNumber} className={cx("flex min-h-20 w-full items-center gap-5 rounded-card border-2 bg-surface p-4 text-left shadow-card hover:border-plum-400 active:bg-plum-50", view?.locked ? "border-success-700/40" : "border-line")}>
                        <span className="w-24 shrink-0 font-display text-5xl leading-none font-semibold text-plum-700 tabular-nums">
                          <span className="sr-only">Entry </span>
                          {e.entryNumber}
                        </span>
                        <span className="min-w-0 flex-1">
                          <span className="block truncate text-2xl font-semibold">{e.title ?? `Entry ${e.entryNumber}`}</span>
                        </span>
                        <span className="flex flex-col items-end gap-1">
                          {view?.locked ? <Badge tone="success" icon={Lock}>Submitted</Badge> : Object.keys(view?.values ?? {}).length ? <Badge tone="brand">Started</Badge> : <Badge>Not started</Badge>}
                          {view && (view.sync !== "synced" || Object.keys(view.values).length) ? <SyncBadge state={view.sync} /> : null}
                        </span>
                      </button>
                    </li>
                  );
                })}
              </ol>
            </section>
          ))}
        </section>
      ))}
    </div>
  );
}
