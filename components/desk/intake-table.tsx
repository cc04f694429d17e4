"use client";
// The intake desk's list with a search box: by entry number, entrant or title, in the browser.
import { useDeferredValue, useId, useMemo, useState } from "react";
import { Search, SearchX } from "lucide-react";
import { EntryStatusBadge } from "@/components/entries/entry-status";
import { controlClasses } from "@/components/ui/field";
import { cx } from "@/components/ui/cx";
import { EmptyState } from "@/components/ui/empty-state";
import { Table, TBody, Td, Th, THead, Tr } from "@/components/ui/table";
import { formatSize } from "@/scoring/units";
import { useDeskEntries } from "./queries";

export type DeskEntry = {
  entryNumber: number | null;
  title: string;
  entrantName: string;
  status: string;
  widthUm: number;
  lengthUm: number;
};

const norm = (s: string) =>
  s
    .toLowerCase()
    .normalize("NFKD")
    .replace(/[\u0300-\u036f]/g, "");

export function IntakeTable({ showSlug, initialEntries }: { showSlug: string; initialEntries: DeskEntry[] }) {
  const { data: entries, error, dataUpdatedAt, isFetching } = useDeskEntries(showSlug, initialEntries);
  const [query, setQuery] = useState("");
  const deferred = useDeferredValue(query);
  const id = useId();

  const shown = useMemo(() => {
    const q = norm(deferred.trim().replace(/^#/, ""));
    if (!q) return entries;
    // A number matches entry numbers exactly, so "12" finds 12 and not 112.
    if (/^\d+$/.test(q)) return entries.filter((e) => String(e.entryNumber ?? "") === q);
    return entries.filter((e) => norm(e.entrantName).includes(q) || norm(e.title).includes(q));
  }, [entries, deferred]);

  return (
    <div className="space-y-4">
      <div className="space-y-2">
        <label htmlFor={`${id}-q`} className="block text-lg font-semibold">
          Find an entry
        </label>
        <div className="relative max-w-xl">
          <Search aria-hidden className="pointer-events-none absolute top-1/2 left-3 size-6 -translate-y-1/2 text-ink-muted" />
          <input
            id={`${id}-q`}
            type="search"
            autoComplete="off"
            enterKeyHint="search"
            placeholder="Entry number, entrant or title"
            value={query}
            onChange={(e) => setQuery(e.target.value)}
            aria-describedby={`${id}-count`}
            className={cx(controlClasses("lg"), "pl-12")}
          />
        </div>
        <p id={`${id}-count`} aria-live="polite" className="text-ink-muted">
          {query.trim() ? `${shown.length} of ${entries.length} entries match.` : `${entries.length} entries.`}
        </p>
        <p className="text-sm text-ink-muted" aria-live="polite" suppressHydrationWarning>
          {error
            ? `Showing the list from ${new Date(dataUpdatedAt).toLocaleTimeString()}: ${error.message}`
            : isFetching
              ? "Refreshing…"
              : `Up to date as of ${new Date(dataUpdatedAt).toLocaleTimeString()}; refreshes every 30 seconds.`}
        </p>
      </div>
      {shown.length === 0 ? (
        <EmptyState icon={SearchX} title="No entry matches">
          Check the number on the claim ticket, or search by the entrant’s last name.
        </EmptyState>
      ) : (
        <Table caption="Entries at this show">
          <THead>
            <tr>
              <Th>No.</Th>
              <Th>Title</Th>
              <Th>Entrant</Th>
              <Th>Size</Th>
              <Th>Status</Th>
            </tr>
          </THead>
          <TBody>
            {shown.map((e, i) => (
              <Tr key={`${e.entryNumber ?? "x"}-${i}`}>
                <Td label="No." primary>
                  <span className="font-display text-2xl tabular-nums">
                    {e.entryNumber ?? <span className="font-sans text-base font-normal text-ink-muted">No number yet</span>}
                  </span>
                </Td>
                <Td label="Title">{e.title}</Td>
                <Td label="Entrant">{e.entrantName}</Td>
                <Td label="Size">{formatSize(e.widthUm, e.lengthUm)}</Td>
                <Td label="Status">
                  <EntryStatusBadge status={e.status} />
                </Td>
              </Tr>
            ))}
          </TBody>
        </Table>
      )}
    </div>
  );
}
