"use client";
// TanStack Query for the intake desk: several desks work at once, so the list refreshes itself
// from /api/shows/[slug]/desk/entries and keeps the last good copy when the network drops.
import { useQuery } from "@tanstack/react-query";
import type { DeskEntry } from "./intake-table";

export const deskKeys = {
  all: ["desk"] as const,
  entries: (showSlug: string) => [...deskKeys.all, "entries", showSlug] as const,
};

async function fetchDeskEntries(showSlug: string): Promise<DeskEntry[]> {
  const res = await fetch(`/api/shows/${encodeURIComponent(showSlug)}/desk/entries`, { headers: { accept: "application/json" } });
  if (!res.ok) {
    const body = (await res.json().catch(() => null)) as { message?: string } | null;
    throw new Error(body?.message ?? `The list could not be refreshed (HTTP ${res.status}).`);
  }
  return ((await res.json()) as { entries: DeskEntry[] }).entries;
}

export function useDeskEntries(showSlug: string, initial: DeskEntry[]) {
  return useQuery({
    queryKey: deskKeys.entries(showSlug),
    queryFn: () => fetchDeskEntries(showSlug),
    initialData: initial,
    refetchInterval: 30_000,
    staleTime: 10_000,
  });
}
