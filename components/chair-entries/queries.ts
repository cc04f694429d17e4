"use client";
// TanStack Query for the chair's entries table: every server-side slice (search, filters, sort,
// page) is in the key, and the previous page stays on screen while the next one loads.
import { keepPreviousData, useQuery } from "@tanstack/react-query";
import type { EntriesListQuery } from "@/lib/schemas/chair-entries";
import type { ChairEntriesPage } from "./types";

export const chairEntryKeys = {
  all: ["chair-entries"] as const,
  show: (showSlug: string) => [...chairEntryKeys.all, showSlug] as const,
  page: (showSlug: string, q: EntriesListQuery) => [...chairEntryKeys.show(showSlug), q] as const,
};

export function entriesSearchParams(q: EntriesListQuery): URLSearchParams {
  const out = new URLSearchParams();
  for (const [k, v] of Object.entries(q)) if (v !== undefined && v !== "") out.set(k, String(v));
  return out;
}

async function fetchPage(showSlug: string, q: EntriesListQuery): Promise<ChairEntriesPage> {
  const res = await fetch(`/api/shows/${encodeURIComponent(showSlug)}/entries?${entriesSearchParams(q)}`, { headers: { accept: "application/json" } });
  if (!res.ok) {
    const body = (await res.json().catch(() => null)) as { message?: string } | null;
    throw new Error(body?.message ?? `The entries could not be loaded (HTTP ${res.status}).`);
  }
  return (await res.json()) as ChairEntriesPage;
}

export function useChairEntries(showSlug: string, q: EntriesListQuery, initial?: { query: EntriesListQuery; page: ChairEntriesPage }) {
  const isInitial = initial !== undefined && JSON.stringify(initial.query) === JSON.stringify(q);
  return useQuery({
    queryKey: chairEntryKeys.page(showSlug, q),
    queryFn: () => fetchPage(showSlug, q),
    initialData: isInitial ? initial.page : undefined,
    placeholderData: keepPreviousData,
    staleTime: 15_000,
  });
}
