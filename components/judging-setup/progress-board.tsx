"use client";
// The chair's live progress board: per panel, category and judge, sheets scored and remaining,
// open conflicts and reopened sheets; the slowest panel and its expected finish in the show's
// time zone; categories no panel judges; and every judge's sheet by entry (Reopen, History).
import { Gauge, RefreshCw, TriangleAlert } from "lucide-react";
import { formatDate, formatDateTime, formatTime } from "@/components/format/dates";
import { Alert } from "@/components/ui/alert";
import { Badge } from "@/components/ui/badge";
import { Table, TBody, Td, Th, THead, Tr } from "@/components/ui/table";
import { POLL_MS, useProgressBoard, type Board } from "./progress-queries";
import { SheetsByEntry } from "./sheets-by-entry";

type Tally = { scored: number; remaining: number; conflicts: number; reopened: number; total: number };

function finishText(at: string | null, remaining: number, timeZone: string, now: Date): string {
  if (remaining === 0) return "Done";
  if (!at) return "Not enough sheets yet to tell";
  const sameDay = formatDate(at, timeZone) === formatDate(now, timeZone);
  return (sameDay ? formatTime(at, timeZone) : formatDateTime(at, timeZone)) ?? "—";
}

function Progress({ t, label }: { t: Tally; label: string }) {
  const pct = t.total ? Math.round((t.scored / t.total) * 100) : 0;
  return (
    <div className="min-w-24">
      <div className="h-2 overflow-hidden rounded-full bg-paper-300" role="progressbar" aria-label={`${label}: ${t.scored} of ${t.total} sheets`} aria-valuemin={0} aria-valuemax={t.total} aria-valuenow={t.scored}>
        <div className="h-full bg-plum-600" style={{ width: `${pct}%` }} />
      </div>
      <span className="text-sm text-ink-muted">
        {t.scored} of {t.total}
      </span>
    </div>
  );
}

function Counts({ t }: { t: Tally }) {
  return (
    <>
      <Td label="Remaining">{t.remaining}</Td>
      <Td label="Conflicts">{t.conflicts ? <Badge tone="danger" icon={TriangleAlert}>{t.conflicts}</Badge> : 0}</Td>
      <Td label="Reopened">{t.reopened}</Td>
    </>
  );
}

export function ProgressBoard({ showSlug, initial, renderedAt }: { showSlug: string; initial: Board; renderedAt: string }) {
  const { data, error, dataUpdatedAt, isFetching } = useProgressBoard(showSlug, initial, renderedAt);
  const board = data ?? initial;
  const tz = board.timeZone;
  const now = new Date(dataUpdatedAt || Date.parse(renderedAt));
  const slowest = board.slowest;
  const totals = board.panels.reduce((a, p) => ({ scored: a.scored + p.scored, total: a.total + p.total }), { scored: 0, total: 0 });

  return (
    <div className="space-y-6">
      <div className="flex flex-wrap items-center gap-x-4 gap-y-2 text-ink-muted" aria-live="polite">
        <span className="inline-flex items-center gap-1.5" suppressHydrationWarning>
          <RefreshCw aria-hidden className={`size-4 ${isFetching ? "animate-spin" : ""}`} />
          Live: updates every {POLL_MS / 1000} seconds · last at {formatTime(now, tz)}
        </span>
        <span className="font-semibold text-ink">
          {totals.scored} of {totals.total} sheets submitted
        </span>
      </div>
      {error ? <Alert tone="error" title="The board couldn’t refresh; it will try again.">{error.message}</Alert> : null}
      {board.status !== "judging" ? <Alert tone="info" title="Judging hasn’t started at this show.">Sheets come in once the show’s stage is Judging.</Alert> : null}
      {board.unassigned.length ? (
        <Alert tone="warning" title={`${board.unassigned.length === 1 ? "One category has" : `${board.unassigned.length} categories have`} no panel, so no one will judge ${board.unassigned.length === 1 ? "it" : "them"}.`}>
          {board.unassigned.join(", ")}
        </Alert>
      ) : null}
      {slowest ? (
        <Alert tone="info" title={`Slowest: ${slowest.name}`}>
          {slowest.remaining} sheets to go{slowest.perHour ? ` at about ${slowest.perHour.toFixed(1)} an hour` : ""}; expected to finish: <strong>{finishText(slowest.expectedFinish, slowest.remaining, tz, now)}</strong>.
        </Alert>
      ) : board.panels.length && board.panels.every((p) => p.remaining === 0 && p.total > 0) ? (
        <Alert tone="success" title="Every panel has finished." />
      ) : null}

      <section aria-labelledby="by-panel" className="space-y-3">
        <h2 id="by-panel" className="flex items-center gap-2 text-2xl">
          <Gauge aria-hidden className="size-6 text-plum-600" />
          Panels
        </h2>
        {board.panels.length === 0 ? (
          <p className="text-ink-muted">No panels yet; add them on the Judging set-up page.</p>
        ) : (
          <Table caption="Progress per panel">
            <THead>
              <Tr>
                <Th>Panel</Th>
                <Th>Scored</Th>
                <Th>Remaining</Th>
                <Th>Conflicts</Th>
                <Th>Reopened</Th>
                <Th>Pace</Th>
                <Th>Expected finish</Th>
              </Tr>
            </THead>
            <TBody>
              {board.panels.map((p) => (
                <Tr key={p.id}>
                  <Td label="Panel" primary>
                    {p.name}
                    <span className="block text-sm font-normal text-ink-muted">{[p.day, p.room].filter(Boolean).join(" · ")}</span>
                  </Td>
                  <Td label="Scored">
                    <Progress t={p} label={p.name} />
                  </Td>
                  <Counts t={p} />
                  <Td label="Pace">{p.perHour ? `${p.perHour.toFixed(1)} / hour` : "—"}</Td>
                  <Td label="Expected finish">{finishText(p.expectedFinish, p.remaining, tz, now)}</Td>
                </Tr>
              ))}
            </TBody>
          </Table>
        )}
      </section>

      <TallyTable id="by-category" title="Categories" one="Category" rows={board.categories} empty="No entries in the panels’ categories yet." />
      <TallyTable id="by-judge" title="Judges" one="Judge" rows={board.judges} empty="No judge has sheets to score yet." />

      <SheetsByEntry showSlug={showSlug} sheets={board.sheets} categories={board.categories} timeZone={tz} />
    </div>
  );
}

function TallyTable({ id, title, one, rows, empty }: { id: string; title: string; one: string; rows: (Tally & { id: string; name: string })[]; empty: string }) {
  return (
    <section aria-labelledby={id} className="min-w-0 space-y-3">
      <h2 id={id} className="text-2xl">
        {title}
      </h2>
      {rows.length === 0 ? (
        <p className="text-ink-muted">{empty}</p>
      ) : (
        <Table caption={`Progress per ${one.toLowerCase()}`}>
          <THead>
            <Tr>
              <Th>{one}</Th>
              <Th>Scored</Th>
              <Th>Remaining</Th>
              <Th>Conflicts</Th>
              <Th>Reopened</Th>
            </Tr>
          </THead>
          <TBody>
            {rows.map((r) => (
              <Tr key={r.id}>
                <Td label={one} primary>
                  {r.name}
                </Td>
                <Td label="Scored">
                  <Progress t={r} label={r.name} />
                </Td>
                <Counts t={r} />
              </Tr>
            ))}
          </TBody>
        </Table>
      )}
    </section>
  );
}
