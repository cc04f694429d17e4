"use client";
// The judging session: read from the tablet first, then fetched (TanStack Query) and stored again
// whole, with every entry's web photo kept as a blob so the quilts show without a network.
import { useEffect, useState } from "react";
import { useQuery } from "@tanstack/react-query";
import { localDb, saveSession, type SessionPayload } from "./local-db";
import { useLive } from "./use-live";

export const judgingKeys = {
  session: (slug: string) => ["judging", slug, "session"] as const,
};

async function fetchSession(slug: string): Promise<SessionPayload> {
  const res = await fetch(`/api/shows/${encodeURIComponent(slug)}/judging/session`, { cache: "no-store", headers: { accept: "application/json" } });
  if (!res.ok) {
    const body = (await res.json().catch(() => null)) as { message?: string } | null;
    throw new Error(body?.message ?? `The server answered ${res.status}.`);
  }
  const payload = (await res.json()) as SessionPayload;
  await saveSession(localDb(), slug, payload);
  return payload;
}

/** Stores the photos this tablet doesn't have yet, three at a time; returns how many it holds. */
async function keepPhotos(slug: string, payload: SessionPayload, onProgress: (held: number, total: number) => void) {
  const db = localDb();
  const all = payload.entries.flatMap((e) => e.photos);
  const held = new Set((await db.photos.where("slug").equals(slug).primaryKeys()) as string[]);
  let count = all.filter((p) => held.has(p.id)).length;
  onProgress(count, all.length);
  const todo = all.filter((p) => !held.has(p.id));
  const worker = async () => {
    for (let p = todo.shift(); p; p = todo.shift()) {
      try {
        const res = await fetch(p.webUrl);
        if (!res.ok) continue;
        await db.photos.put({ id: p.id, slug, blob: await res.blob() });
        onProgress(++count, all.length);
      } catch {
        return; // offline: the next session fetch tries again
      }
    }
  };
  await Promise.all([worker(), worker(), worker()]);
}

export function useJudgingSession(slug: string) {
  const local = useLive(() => localDb().sessions.get(slug), `session:${slug}`, undefined);
  const query = useQuery({ queryKey: judgingKeys.session(slug), queryFn: () => fetchSession(slug), staleTime: 60_000, refetchInterval: 120_000, retry: 2, networkMode: "always" });
  const [photos, setPhotos] = useState({ held: 0, total: 0 });
  const payload = query.data;
  useEffect(() => {
    if (payload) void keepPhotos(slug, payload, (held, total) => setPhotos({ held, total }));
  }, [slug, payload]);
  return {
    session: local.value?.payload ?? query.data,
    fetchedAt: local.value?.fetchedAt ?? null,
    readLocal: local.ready,
    loading: !local.value && query.isPending,
    error: query.error ? (query.error as Error).message : null,
    photos,
  };
}
