"use client";
// TanStack Query for the chair's progress board: the progress route, polled every 10 seconds
// while the page is open, starting from what the server rendered.
import { useQuery } from "@tanstack/react-query";
import type { progressBoard } from "@/db/queries/judging-setup";

/** The board as it arrives over JSON: times are ISO strings. */
type Jsonified<T> = T extends Date ? string : T extends (infer U)[] ? Jsonified<U>[] : T extends object ? { [K in keyof T]: Jsonified<T[K]> } : T;
export type Board = Jsonified<Awaited<ReturnType<typeof progressBoard>>>;
export type BoardSheet = Board["sheets"][number];

export const POLL_MS = 10_000;

export const progressKeys = {
  all: ["judging-progress"] as const,
  show: (showSlug: string) => [...progressKeys.all, showSlug] as const,
};

async function fetchBoard(showSlug: string): Promise<Board> {
  const res = await fetch(`/api/shows/${encodeURIComponent(showSlug)}/judging/progress`, { headers: { accept: "application/json" } });
  if (!res.ok) {
    const body = (await res.json().catch(() => null)) as { message?: string } | null;
    throw new Error(body?.message ?? `The progress board could not be loaded (HTTP ${res.status}).`);
  }
  return (await res.json()) as Board;
}

/** renderedAt: when the server made `initial` (ISO), so the first render and hydration agree. */
export function useProgressBoard(showSlug: string, initial: Board, renderedAt: string) {
  return useQuery({
    queryKey: progressKeys.show(showSlug),
    queryFn: () => fetchBoard(showSlug),
    initialData: initial,
    initialDataUpdatedAt: Date.parse(renderedAt),
    refetchInterval: POLL_MS,
    refetchIntervalInBackground: false,
    staleTime: 5_000,
  });
}
