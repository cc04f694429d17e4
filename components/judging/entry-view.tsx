"use client";
// One entry at the judging table: large photos (pinch to zoom), category and the released facts
// only (no maker names ever reach the tablet), the sheet, and a bar that always shows the running
// total, where the sheet's changes are, and Submit. A submitted sheet is read-only.
import { useState } from "react";
import { ArrowLeft, ArrowRight, Lock, Send } from "lucide-react";
import { DIVISION_LABELS, labelOf, QUILTING_METHOD_LABELS } from "@/components/entries/labels";
import { Badge } from "@/components/ui/badge";
import { Button } from "@/components/ui/button";
import { formatScore, runningTotal } from "@/scoring/score-sheets";
import type { SessionEntry, SessionPayload } from "./local-db";
import { marksOf, submitBlocker, type LocalChange, type SheetView } from "./outbox";
import { PhotoZoom } from "./photo-zoom";
import { SheetForm } from "./sheet-form";
import { SyncBadge } from "./sync-badge";

type Props = {
  session: SessionPayload;
  entry: SessionEntry;
  view: SheetView;
  onChange: (change: LocalChange) => void;
  onDismiss: (key: string) => void;
  onBack: () => void;
  onNext: (() => void) | null;
};

const VIEW_NAMES: Record<string, string> = { full: "Full view", detail: "Detail", other: "Other view" };

export function EntryView({ session, entry, view, onChange, onDismiss, onBack, onNext }: Props) {
  const [confirming, setConfirming] = useState(false);
  const category = session.categories.find((c) => c.id === entry.categoryId);
  const method = category?.method ?? "points";
  const sheet = session.sheets.find((s) => s.id === category?.sheetId)?.sheet ?? null;
  const running = sheet ? runningTotal(sheet, marksOf(view.values)) : null;
  const blocker = submitBlocker(method, view.values, running?.complete ?? false, running?.missing.length ?? 0);
  const scored = method === "points" || method === "sort_then_points";
  const facts: [string, string | undefined][] = [
    ["Size", entry.size],
    ["Quilting", entry.quiltingMethod ? labelOf(QUILTING_METHOD_LABELS, entry.quiltingMethod) : undefined],
    ["Techniques", entry.techniques?.join(", ") || undefined],
    ["Pattern", entry.pattern],
    ["Division", entry.division ? labelOf(DIVISION_LABELS, entry.division) : undefined],
  ];

  return (
    <article aria-labelledby="entry-h" className="space-y-6 pb-40">
      <div className="flex flex-wrap items-center justify-between gap-3">
        <Button variant="secondary" size="lg" icon={<ArrowLeft aria-hidden className="size-6" />} onClick={onBack}>
          All entries
        </Button>
        {onNext ? (
          <Button variant="secondary" size="lg" icon={<ArrowRight aria-hidden className="size-6" />} onClick={onNext}>
            Next entry
          </Button>
        ) : null}
      </div>
      <header className="flex flex-wrap items-end gap-x-6 gap-y-2">
        <p className="font-display text-6xl leading-none font-semibold text-plum-700 tabular-nums">
          <span className="sr-only">Entry </span>
          {entry.entryNumber}
        </p>
        <div className="min-w-0 flex-1">
          <h2 id="entry-h" className="text-3xl">{entry.title ?? `Entry ${entry.entryNumber}`}</h2>
          <p className="text-lg text-ink-muted">{category ? `${category.code} ${category.name}` : "No category"}</p>
        </div>
        <SyncBadge state={view.sync} />
      </header>

      {entry.photos.length ? (
        <div className="grid gap-4 lg:grid-cols-2">
          {entry.photos.map((p) => (
            <PhotoZoom key={p.id} photoId={p.id} url={p.webUrl} widthPx={p.widthPx} heightPx={p.heightPx} alt={`Entry ${entry.entryNumber}, ${VIEW_NAMES[p.view] ?? p.view}`} />
          ))}
        </div>
      ) : (
        <p className="text-lg text-ink-muted">No photos for this entry.</p>
      )}

      <dl className="grid gap-x-6 gap-y-2 rounded-card border border-line bg-surface p-4 text-lg sm:grid-cols-2">
        {facts.filter(([, v]) => v).map(([k, v]) => (
          <div key={k} className="flex gap-2">
            <dt className="font-semibold">{k}:</dt>
            <dd>{v}</dd>
          </div>
        ))}
        {entry.statement ? (
          <div className="sm:col-span-2">
            <dt className="font-semibold">Statement</dt>
            <dd className="whitespace-pre-line">{entry.statement}</dd>
          </div>
        ) : null}
      </dl>

      {view.locked ? (
        <p className="flex items-center gap-2 rounded-card border-2 border-success-700/30 bg-success-50 p-4 text-lg font-semibold text-success-700">
          <Lock aria-hidden className="size-6" />
          {view.submittedOnServer ? "Submitted. The sheet is locked; the chair can reopen it." : "Submitted on this tablet; it locks on the server when it syncs."}
        </p>
      ) : null}

      <SheetForm sheet={sheet} method={method} view={view} commentPolicy={session.commentPolicy} quickPhrases={session.quickPhrases} onChange={onChange} onDismiss={onDismiss} />

      <div className="fixed inset-x-0 bottom-0 z-20 border-t-2 border-plum-200 bg-surface/95 px-4 py-3 shadow-card backdrop-blur">
        <div className="mx-auto flex max-w-5xl flex-wrap items-center gap-x-6 gap-y-3">
          <p className="min-w-0 flex-1" aria-live="polite">
            <span className="block text-sm font-semibold text-ink-muted uppercase">Entry {entry.entryNumber}{scored ? " · running total" : ""}</span>
            {scored && running ? (
              <span className="flex flex-wrap items-baseline gap-x-3">
                <span className="font-display text-4xl font-semibold tabular-nums" data-testid="running-total">
                  {formatScore(running.total)}
                  <span className="text-xl text-ink-muted"> / {formatScore(running.nominalMax)}</span>
                </span>
                <span className="text-base text-ink-muted">
                  {running.scoredCount} of {running.criteriaCount} scored
                  {!running.complete && running.lowestFinal !== null ? ` · ends ${formatScore(running.lowestFinal, 1)}–${formatScore(running.highestFinal, 1)}` : ""}
                </span>
              </span>
            ) : (
              <span className="font-display text-3xl font-semibold">{view.values.sort === "set_aside" ? "Set aside" : typeof view.values.rank === "number" ? `Rank ${view.values.rank}` : "No rank yet"}</span>
            )}
          </p>
          {view.locked ? (
            <Badge tone="success" icon={Lock} className="px-4 py-2 text-lg">Submitted</Badge>
          ) : confirming ? (
            <div className="flex flex-wrap gap-2">
              <Button size="lg" icon={<Send aria-hidden className="size-6" />} onClick={() => { onChange({ kind: "submit" }); setConfirming(false); }}>
                Yes, submit{scored && running ? ` ${formatScore(running.total)}` : ""}
              </Button>
              <Button size="lg" variant="secondary" onClick={() => setConfirming(false)}>Not yet</Button>
            </div>
          ) : (
            <div className="flex flex-col items-end gap-1">
              <Button size="lg" icon={<Send aria-hidden className="size-6" />} disabled={!!blocker || view.conflicts.length > 0} onClick={() => setConfirming(true)} aria-describedby={blocker ? "submit-why" : undefined}>
                Submit sheet
              </Button>
              {blocker || view.conflicts.length ? <span id="submit-why" className="text-sm text-ink-muted">{view.conflicts.length ? "Resolve the conflict first." : blocker}</span> : null}
            </div>
          )}
        </div>
      </div>
    </article>
  );
}
