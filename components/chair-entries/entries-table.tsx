"use client";
// The chair's entries table: search, filters, sorting and paging run on the server (TanStack
// Query against /api/shows/[slug]/entries); TanStack Table v9 holds the sorting, the chosen
// columns (kept in localStorage) and the row selection for bulk actions.
import { useEffect, useId, useMemo, useState } from "react";
import { useQueryClient } from "@tanstack/react-query";
import { useTable, type RowSelectionState, type SortingState, type Updater } from "@tanstack/react-table";
import { ArrowDown, ArrowUp, ArrowUpDown, ChevronLeft, ChevronRight, Download, SearchX } from "lucide-react";
import { DIVISION_LABELS } from "@/components/entries/labels";
import { ENTRY_STATUS } from "@/components/entries/entry-status";
import { ButtonLink, Button } from "@/components/ui/button";
import { SelectField, TextField } from "@/components/ui/field";
import { EmptyState } from "@/components/ui/empty-state";
import { Table, TBody, Td, Th, THead, Tr } from "@/components/ui/table";
import { CHAIR_STATUSES, DIVISIONS, PAGE_SIZES, PAYMENT_STATES, SORT_KEYS, type EntriesListQuery, type SortKey } from "@/lib/schemas/chair-entries";
import { BulkActions } from "./bulk-actions";
import { useColumnVisibility } from "./column-prefs";
import { COLUMN_LABELS, DEFAULT_VISIBILITY, PAYMENT_LABELS, entryColumns, features } from "./columns";
import { chairEntryKeys, useChairEntries } from "./queries";
import type { ChairEntriesPage } from "./types";

type Props = { showSlug: string; initial: { query: EntriesListQuery; page: ChairEntriesPage } };

export function EntriesTable({ showSlug, initial }: Props) {
  const id = useId();
  const queryClient = useQueryClient();
  const [query, setQuery] = useState<EntriesListQuery>(initial.query);
  const [text, setText] = useState(initial.query.q);
  const [rowSelection, setRowSelection] = useState<RowSelectionState>({});
  const [columnVisibility, setColumnVisibility] = useColumnVisibility(DEFAULT_VISIBILITY);
  const { data, error, isFetching, isPlaceholderData } = useChairEntries(showSlug, query, initial);
  const page = data ?? initial.page;

  // Search as the chair types, a moment after the last key, from the first page.
  useEffect(() => {
    const t = setTimeout(() => setQuery((q) => (q.q === text.trim() ? q : { ...q, q: text.trim(), offset: 0 })), 300);
    return () => clearTimeout(t);
  }, [text]);

  const change = (patch: Partial<EntriesListQuery>) => setQuery((q) => ({ ...q, ...patch, offset: "offset" in patch ? patch.offset! : 0 }));
  const sorting = useMemo<SortingState>(() => [{ id: query.sort, desc: query.dir === "desc" }], [query.sort, query.dir]);
  const onSortingChange = (u: Updater<SortingState>) => {
    const next = typeof u === "function" ? u(sorting) : u;
    const first = next[0];
    if (first && (SORT_KEYS as readonly string[]).includes(first.id)) change({ sort: first.id as SortKey, dir: first.desc ? "desc" : "asc" });
    else change({ sort: "number", dir: "asc" });
  };

  const columns = useMemo(() => entryColumns(showSlug, page.show.timeZone, page.show.currency), [showSlug, page.show.timeZone, page.show.currency]);
  const table = useTable({
    features,
    columns,
    data: page.entries,
    getRowId: (row) => row.id,
    manualSorting: true,
    enableMultiSort: false,
    enableSortingRemoval: false,
    state: { sorting, rowSelection, columnVisibility },
    onSortingChange,
    onRowSelectionChange: setRowSelection,
    onColumnVisibilityChange: setColumnVisibility,
  });

  const selectedIds = Object.keys(rowSelection).filter((k) => rowSelection[k]);
  const from = page.total === 0 ? 0 : page.offset + 1;
  const to = page.offset + page.entries.length;
  const exportHref = `/api/shows/${encodeURIComponent(showSlug)}/entries/export`;

  return (
    <div className="space-y-5">
      <div className="grid gap-4 sm:grid-cols-2 lg:grid-cols-4">
        <TextField
          className="sm:col-span-2"
          label="Search"
          type="search"
          hint="Entry number, title, entrant name or e-mail"
          autoComplete="off"
          enterKeyHint="search"
          value={text}
          onChange={(e) => setText(e.target.value)}
        />
        <SelectField label="Status" value={query.status ?? ""} onChange={(e) => change({ status: (e.target.value || undefined) as EntriesListQuery["status"] })}>
          <option value="">Any status</option>
          {CHAIR_STATUSES.map((s) => (
            <option key={s} value={s}>
              {ENTRY_STATUS[s]?.label ?? s}
            </option>
          ))}
        </SelectField>
        <SelectField label="Payment" value={query.payment ?? ""} onChange={(e) => change({ payment: (e.target.value || undefined) as EntriesListQuery["payment"] })}>
          <option value="">Any payment</option>
          {PAYMENT_STATES.map((s) => (
            <option key={s} value={s}>
              {PAYMENT_LABELS[s]}
            </option>
          ))}
        </SelectField>
        <SelectField label="Division" value={query.division ?? ""} onChange={(e) => change({ division: (e.target.value || undefined) as EntriesListQuery["division"] })}>
          <option value="">Any division</option>
          {DIVISIONS.map((d) => (
            <option key={d} value={d}>
              {DIVISION_LABELS[d]}
            </option>
          ))}
        </SelectField>
        <SelectField label="Category" value={query.category ?? ""} onChange={(e) => change({ category: (e.target.value || undefined) as EntriesListQuery["category"] })}>
          <option value="">Any category</option>
          {page.categories.map((c) => (
            <option key={c.id} value={c.id}>
              {c.code} {c.name}
            </option>
          ))}
          <option value="none">Not in a category yet</option>
        </SelectField>
        <SelectField label="Judged" value={query.judged ?? ""} onChange={(e) => change({ judged: (e.target.value || undefined) as EntriesListQuery["judged"] })}>
          <option value="">Judged and display</option>
          <option value="judged">Judged</option>
          <option value="display">Display only</option>
        </SelectField>
      </div>

      <div className="flex flex-wrap items-start justify-between gap-3">
        <details className="rounded-card border border-line bg-surface">
          <summary className="flex min-h-tap cursor-pointer items-center px-4 font-semibold">Choose columns</summary>
          <fieldset className="grid gap-1 px-4 pb-3 sm:grid-cols-2">
            <legend className="sr-only">Columns to show</legend>
            {table
              .getAllLeafColumns()
              .filter((c) => c.getCanHide())
              .map((c) => (
                <label key={c.id} className="flex min-h-tap cursor-pointer items-center gap-3">
                  <input type="checkbox" className="size-5 accent-plum-600" checked={c.getIsVisible()} onChange={c.getToggleVisibilityHandler()} />
                  {COLUMN_LABELS[c.id] ?? c.id}
                </label>
              ))}
          </fieldset>
        </details>
        <ButtonLink href={exportHref} variant="secondary" prefetch={false} icon={<Download aria-hidden className="size-5" />}>
          Download spreadsheet
        </ButtonLink>
      </div>

      <BulkActions
        showSlug={showSlug}
        juried={page.show.juried}
        entryIds={selectedIds}
        onDone={() => {
          setRowSelection({});
          void queryClient.invalidateQueries({ queryKey: chairEntryKeys.show(showSlug) });
        }}
      />

      <p id={`${id}-count`} aria-live="polite" className="text-ink-muted">
        {error ? `The list could not be refreshed: ${error.message}` : isFetching && isPlaceholderData ? "Loading…" : `Entries ${from}–${to} of ${page.total}.`}
      </p>

      {page.entries.length === 0 ? (
        <EmptyState icon={SearchX} title="No entry matches">
          Try fewer filters, or search by the entry number.
        </EmptyState>
      ) : (
        // Tighter cell padding than the house table: eleven columns fit from 1280 px without scrolling sideways.
        <Table className="[&_th]:px-2.5 sm:[&_td]:px-2.5" caption={`Entries at ${page.show.name}, sorted by ${COLUMN_LABELS[query.sort]}`}>
          <THead>
            {table.getHeaderGroups().map((group) => (
              <tr key={group.id}>
                {group.headers.map((header) => {
                  const col = header.column;
                  if (col.id === "select") {
                    return (
                      <Th key={header.id} className="w-12">
                        <input
                          type="checkbox"
                          aria-label="Choose every entry on this page"
                          className="size-6 accent-plum-600"
                          checked={table.getIsAllPageRowsSelected()}
                          ref={(el) => {
                            if (el) el.indeterminate = table.getIsSomePageRowsSelected();
                          }}
                          onChange={table.getToggleAllPageRowsSelectedHandler()}
                        />
                      </Th>
                    );
                  }
                  const sorted = col.getIsSorted();
                  const Icon = sorted === "asc" ? ArrowUp : sorted === "desc" ? ArrowDown : ArrowUpDown;
                  return (
                    <Th key={header.id} aria-sort={sorted === "asc" ? "ascending" : sorted === "desc" ? "descending" : undefined}>
                      {col.getCanSort() ? (
                        <button type="button" onClick={col.getToggleSortingHandler()} className="inline-flex min-h-tap items-center gap-1 font-semibold">
                          <table.FlexRender header={header} />
                          <Icon aria-hidden className="size-4" />
                        </button>
                      ) : (
                        <table.FlexRender header={header} />
                      )}
                    </Th>
                  );
                })}
              </tr>
            ))}
          </THead>
          <TBody>
            {table.getRowModel().rows.map((row) => (
              <Tr key={row.id} aria-selected={row.getIsSelected()}>
                {row.getVisibleCells().map((cell) =>
                  cell.column.id === "select" ? (
                    <Td key={cell.id} label="Choose">
                      <label className="flex min-h-tap min-w-tap cursor-pointer items-center">
                        <input
                          type="checkbox"
                          className="size-6 accent-plum-600"
                          aria-label={`Choose No. ${row.original.entryNumber ?? ""} ${row.original.title}`}
                          checked={row.getIsSelected()}
                          onChange={row.getToggleSelectedHandler()}
                        />
                      </label>
                    </Td>
                  ) : (
                    <Td key={cell.id} label={COLUMN_LABELS[cell.column.id] ?? cell.column.id} primary={cell.column.id === "title"}>
                      <table.FlexRender cell={cell} />
                    </Td>
                  ),
                )}
              </Tr>
            ))}
          </TBody>
        </Table>
      )}

      <nav aria-label="Pages of entries" className="flex flex-wrap items-end gap-3">
        <Button variant="secondary" disabled={page.offset === 0} onClick={() => change({ offset: Math.max(0, page.offset - query.limit) })} icon={<ChevronLeft aria-hidden className="size-5" />}>
          Previous
        </Button>
        <Button variant="secondary" disabled={to >= page.total} onClick={() => change({ offset: page.offset + query.limit })} icon={<ChevronRight aria-hidden className="size-5" />}>
          Next
        </Button>
        <SelectField label="Per page" className="w-36" value={String(query.limit)} onChange={(e) => change({ limit: Number(e.target.value) })}>
          {PAGE_SIZES.map((n) => (
            <option key={n} value={n}>
              {n}
            </option>
          ))}
        </SelectField>
      </nav>
    </div>
  );
}
