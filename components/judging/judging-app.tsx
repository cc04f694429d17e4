"use client";
// The judging tablet: reads the tablet's own copy first (IndexedDB), then the network; a scribe
// picks the judge they enter for; the queue; one entry's sheet. Every change is written to the
// tablet at once and sent in the background (use-judging-sync.ts).
import { useCallback, useMemo, type ReactNode } from "react";
import { CloudOff, ImageDown, UserRound } from "lucide-react";
import { Alert } from "@/components/ui/alert";
import { Button } from "@/components/ui/button";
import { dismissRow, localDb, recordChange, setMeta, sheetId, type SessionPayload } from "./local-db";
import { EntryView } from "./entry-view";
import { EntryQueue } from "./entry-queue";
import { JudgePicker } from "./judge-picker";
import { judgingOrder } from "./queue-groups";
import { viewSheet, type LocalChange, type SheetView, type SyncState } from "./outbox";
import { SyncBadge } from "./sync-badge";
import { useJudgingSession } from "./use-session";
import { useJudgingSync } from "./use-judging-sync";
import { useLive } from "./use-live";

/** `notOnPanel`: what to show someone with the judging role who is on no panel yet (the show's list). */
export function JudgingApp({ slug, notOnPanel }: { slug: string; notOnPanel?: ReactNode }) {
  const { session, loading, error, photos, readLocal } = useJudgingSession(slug);
  const sync = useJudgingSync(slug);
  const db = typeof window === "undefined" ? null : localDb();
  const place = useLive(async () => ({ judge: (await localDb().meta.get(`judge:${slug}`))?.value as string | undefined, entry: (await localDb().meta.get(`entry:${slug}`))?.value as string | undefined }), `place:${slug}`, { judge: undefined, entry: undefined });
  const sheets = useLive(() => localDb().sheets.where("slug").equals(slug).toArray(), `sheets:${slug}`, []);
  const rows = useLive(() => localDb().outbox.where("slug").equals(slug).toArray(), `outbox:${slug}`, []);

  const judges = session?.judges ?? [];
  const judgeId = judges.length === 1 ? judges[0]!.id : judges.find((j) => j.id === place.value.judge)?.id;
  const judge = judges.find((j) => j.id === judgeId);

  const entries = useMemo(() => (session && judge ? session.entries.filter((e) => judge.categoryIds.includes(e.categoryId)) : []), [session, judge]);
  const views = useMemo(() => {
    const bySheet = new Map(sheets.value.map((s) => [s.id, s]));
    return new Map<string, SheetView>(entries.map((e) => [e.id, viewSheet(bySheet.get(sheetId(slug, e.id, judgeId ?? "")), rows.value, e.id, judgeId ?? "")]));
  }, [entries, sheets.value, rows.value, slug, judgeId]);

  const { kick } = sync;
  const change = useCallback(
    async (entryId: string, c: LocalChange) => {
      if (!judgeId) return;
      await recordChange(localDb(), slug, judgeId, entryId, c);
      kick();
    },
    [judgeId, slug, kick],
  );
  const open = (entryId: string | null) => void setMeta(localDb(), `entry:${slug}`, entryId);

  if (!db || (!readLocal && !session)) return <p className="text-lg text-ink-muted">Opening the judging session on this tablet…</p>;
  if (!session) {
    return loading ? (
      <p className="text-lg text-ink-muted">Loading the judging session…</p>
    ) : (
      <Alert tone="error" title="The judging session could not be loaded.">{error ?? "Connect this tablet to the show's Wi-Fi once, then try again."}</Alert>
    );
  }

  if (judges.length === 0) {
    return (
      <div className="space-y-6">
        <Alert tone="info" title="You are not on a judging panel of this show yet.">The chair puts judges and scribes on panels. Once you are on one, the quilts of your sessions are listed here.</Alert>
        {notOnPanel}
      </div>
    );
  }

  const mine = [...views.values()];
  const overall: SyncState = mine.some((v) => v.sync === "conflict") ? "conflict" : mine.some((v) => v.sync === "refused") ? "refused" : rows.value.some((r) => r.state === "pending") ? "saved" : "synced";
  const pending = rows.value.filter((r) => r.state === "pending").length;
  const entry = entries.find((e) => e.id === place.value.entry);
  const ordered = judgingOrder(session, entries);
  const next = entry ? ordered[ordered.indexOf(entry) + 1] : undefined;
  const scribing = judge && judge.id !== session.me.id;

  return (
    <div className="space-y-5">
      <SessionBar session={session} judgeName={judge?.name ?? null} scribing={!!scribing} canSwitch={judges.length > 1} onSwitch={() => void setMeta(localDb(), `judge:${slug}`, null)} state={overall} pending={pending} problem={sync.problem?.text ?? null} photos={photos} />
      {!session.show.judgingOpen ? (
        <Alert tone="info" title="Judging hasn't been opened at this show yet.">You can look through the queue. Anything you score stays on this tablet until the chair opens judging.</Alert>
      ) : null}
      {!judge ? (
        <JudgePicker judges={judges} meId={session.me.id} onPick={(id) => void setMeta(localDb(), `judge:${slug}`, id)} />
      ) : entry ? (
        <EntryView key={entry.id} session={session} entry={entry} view={views.get(entry.id)!} onChange={(c) => void change(entry.id, c)} onDismiss={(key) => void dismissRow(localDb(), key)} onBack={() => open(null)} onNext={next ? () => open(next.id) : null} />
      ) : (
        <EntryQueue session={session} entries={entries} views={views} onOpen={open} />
      )}
    </div>
  );
}

type BarProps = { session: SessionPayload; judgeName: string | null; scribing: boolean; canSwitch: boolean; onSwitch: () => void; state: SyncState; pending: number; problem: string | null; photos: { held: number; total: number } };

function SessionBar({ session, judgeName, scribing, canSwitch, onSwitch, state, pending, problem, photos }: BarProps) {
  return (
    <div className="space-y-3 rounded-card border-2 border-plum-200 bg-plum-50 p-4">
      <div className="flex flex-wrap items-center gap-x-4 gap-y-2">
        <p className="flex w-full min-w-0 items-center gap-2 text-xl font-semibold text-plum-800 sm:w-auto sm:flex-1" data-testid="entering-for">
          <UserRound aria-hidden className="size-6 shrink-0" />
          {judgeName ? (scribing ? `Entering for Judge ${judgeName}` : `Scoring as Judge ${judgeName}`) : "Choose the judge you are entering for"}
        </p>
        {canSwitch && judgeName ? (
          <Button variant="secondary" size="lg" onClick={onSwitch}>Change judge</Button>
        ) : null}
        <span data-testid="session-sync">
          <SyncBadge state={state} />
        </span>
      </div>
      <p className="flex flex-wrap gap-x-4 gap-y-1 text-base text-ink-muted">
        <span>{session.show.name}</span>
        <span>{pending ? `${pending} ${pending === 1 ? "change" : "changes"} waiting to send` : "All changes sent"}</span>
        {photos.total ? (
          <span className="inline-flex items-center gap-1">
            <ImageDown aria-hidden className="size-4" /> Photos on this tablet: {photos.held} of {photos.total}
          </span>
        ) : null}
      </p>
      {problem ? (
        <p role="status" className="flex items-center gap-2 font-medium text-warning-700">
          <CloudOff aria-hidden className="size-5 shrink-0" /> {problem}
        </p>
      ) : null}
    </div>
  );
}
