"use client";
// Sends the outbox in the background: a TanStack Query mutation per flush, retried with backoff,
// kicked after every change, on the browser's `online` event and on an interval. Answers update
// the tablet's sheets and outbox (local-db.ts applyAnswer). A 409 (the show isn't judging) keeps
// every change queued; a 403 naming entries sets aside only those entries' changes; nothing is
// ever dropped because the network failed.
import { useCallback, useEffect, useRef, useState } from "react";
import { useMutation } from "@tanstack/react-query";
import { applyAnswer, deviceId, localDb, pendingRows, refuseRows } from "./local-db";
import { batches, wireChange, type ServerSheet, type SyncResultRow } from "./outbox";

export type SyncProblem = { kind: "offline" | "closed" | "signed-out" | "server"; text: string } | null;

class SyncError extends Error {
  constructor(
    public problem: NonNullable<SyncProblem>,
    public retry: boolean,
  ) {
    super(problem.text);
  }
}

async function flush(slug: string): Promise<number> {
  const db = localDb();
  const device = await deviceId(db);
  let sent = 0;
  let resend = false;
  for (const batch of batches(await pendingRows(db, slug))) {
    let res: Response;
    try {
      res = await fetch(`/api/shows/${encodeURIComponent(slug)}/judging/sync`, {
        method: "POST",
        headers: { "content-type": "application/json" },
        body: JSON.stringify({ deviceId: device, forJudge: batch.judgeId, changes: batch.rows.map(wireChange) }),
        cache: "no-store",
      });
    } catch {
      throw new SyncError({ kind: "offline", text: "No connection to the server. Changes are saved on this tablet and will be sent when it is back." }, true);
    }
    const body = (await res.json().catch(() => null)) as { results?: SyncResultRow[]; sheets?: ServerSheet[]; message?: string; error?: string; fieldErrors?: Record<string, string[]> } | null;
    const message = body?.message ?? body?.error;
    const perEntry = res.status === 403 ? batch.rows.filter((r) => body?.fieldErrors?.[r.entryId]?.length) : [];
    if (perEntry.length) {
      // Refused for some entries only (the chair has a conflict on record for the judge): those
      // changes are set aside with the server's words, the others are sent again at once.
      for (const r of perEntry) await refuseRows(db, [r.key], body!.fieldErrors![r.entryId]![0]!);
      if (perEntry.length < batch.rows.length) resend = true;
      continue;
    }
    if (res.status === 409) throw new SyncError({ kind: "closed", text: message ?? "Judging isn't open at this show; changes stay on this tablet until it is." }, false);
    if (res.status === 401) throw new SyncError({ kind: "signed-out", text: "Sign in again to send your changes; they are kept on this tablet." }, false);
    if (res.status === 403 || res.status === 400 || res.status === 404) {
      // Turned away as a whole: show why on each change rather than retry for ever.
      await refuseRows(db, batch.rows.map((r) => r.key), message ?? "The server did not accept these changes.");
      continue;
    }
    if (!res.ok || !body?.results) throw new SyncError({ kind: "server", text: "The server had a problem. Changes are saved on this tablet; trying again shortly." }, true);
    await applyAnswer(db, slug, { results: body.results, sheets: body.sheets ?? [] });
    sent += batch.rows.length;
  }
  // Each refusal above left fewer rows pending, so this ends.
  return resend ? sent + (await flush(slug)) : sent;
}

const INTERVAL_MS = 15_000;

/** Background sending for one show; `kick()` asks for a send soon. */
export function useJudgingSync(slug: string) {
  const [problem, setProblem] = useState<SyncProblem>(null);
  const [lastSyncedAt, setLastSyncedAt] = useState<Date | null>(null);
  const running = useRef(false);
  const again = useRef(false);
  const timer = useRef<ReturnType<typeof setTimeout> | null>(null);

  const { mutateAsync } = useMutation({
    mutationKey: ["judging", slug, "sync"],
    mutationFn: async () => {
      try {
        return await flush(slug);
      } catch (err) {
        // Said at once, not only after the last retry.
        if (err instanceof SyncError) setProblem(err.problem);
        throw err;
      }
    },
    networkMode: "always",
    retry: (count, err) => err instanceof SyncError && err.retry && count < 4,
    retryDelay: (attempt) => Math.min(1000 * 2 ** attempt, 20_000),
  });

  const run = useCallback(async () => {
    if (running.current) {
      again.current = true;
      return;
    }
    running.current = true;
    try {
      do {
        again.current = false;
        await mutateAsync();
        setProblem(null);
        setLastSyncedAt(new Date());
      } while (again.current);
    } catch (err) {
      setProblem(err instanceof SyncError ? err.problem : { kind: "server", text: "Sending failed; changes are kept on this tablet." });
    } finally {
      running.current = false;
    }
  }, [mutateAsync]);

  /** Send soon: changes made in a burst (typing a comment) go together. */
  const kick = useCallback(
    (delayMs = 600) => {
      if (timer.current) clearTimeout(timer.current);
      timer.current = setTimeout(() => void run(), delayMs);
    },
    [run],
  );

  useEffect(() => {
    const onOnline = () => kick(0);
    const onOffline = () => setProblem({ kind: "offline", text: "This tablet is offline. Changes are saved on it and will be sent when Wi-Fi is back." });
    window.addEventListener("online", onOnline);
    window.addEventListener("offline", onOffline);
    const interval = setInterval(() => void run(), INTERVAL_MS);
    kick(0);
    return () => {
      window.removeEventListener("online", onOnline);
      window.removeEventListener("offline", onOffline);
      clearInterval(interval);
      if (timer.current) clearTimeout(timer.current);
    };
  }, [kick, run]);

  return { problem, lastSyncedAt, kick };
}
