"use client";
// The intake desk's list with a search box: by entry number, entrant or title, in the browser;
// each entry's category (code and name), the size measured at the desk with its flag, and a Measure form.
import { Fragment, useDeferredValue, useId, useMemo, useState } from "react";
import { CircleCheck, Ruler, Search, SearchX, TriangleAlert } from "lucide-react";
import { EntryStatusBadge } from "@/components/entries/entry-status";
import { Badge } from "@/components/ui/badge";
import { Button } from "@/components/ui/button";
import { controlClasses } from "@/components/ui/field";
import { cx } from "@/components/ui/cx";
import { EmptyState } from "@/components/ui/empty-state";
import { Table, TBody, Td, Th, THead, Tr } from "@/components/ui/table";
import { formatSize } from "@/scoring/units";
import { MeasureForm } from "./measure-form";
import { useDeskEntries } from "./queries";

export type DeskEntry = {
  id: string;
  entryNumber: number | null;
  title: string;
  entrantName: string;
  status: string;
  widthUm: number;
  lengthUm: number;
  categoryState: string;
  categoryCode: string | null;
  categoryName: string | null;
  measuredWidthUm: number | null;
  measuredLengthUm: number | null;
  sizeFlag: string;
};

/** Entries out of the show can't be measured (the server refuses them too). */
const OUT_OF_SHOW = new Set(["withdrawn", "declined"]);
const canMeasure = (e: DeskEntry) => !OUT_OF_SHOW.has(e.status);

/** The code with the category's name: "11" alone means nothing to a volunteer at the desk. */
function categoryCell(e: DeskEntry) {
  if (e.categoryCode) {
    return (
      <>
        <span className="font-semibold tabular-nums">{e.categoryCode}</span> {e.categoryName}
      </>
    );
  }
  if (e.categoryState === "fits_none" || e.categoryState === "fits_several") return <span className="font-semibold">Chair to place</span>;
  return "—";
}

const norm = (s: string) =>
  s
    .toLowerCase()
    .normalize("NFKD")
    .replace(/[\u0300-\u036f]/g, "");

export function IntakeTable({ showSlug, initialEntries }: { showSlug: string; initialEntries: DeskEntry[] }) {
  const { data: entries, error, dataUpdatedAt, isFetching } = useDeskEntries(showSlug, initialEntries);
  const [query, setQuery] = useState("");
  const [measuring, setMeasuring] = useState<string | null>(null);
  const deferred = useDeferredValue(query);
  const id = useId();

  const measureButton = (e: DeskEntry, className?: string) => (
    <Button
      size="lg"
      variant="secondary"
      icon={<Ruler aria-hidden className="size-5" />}
      aria-expanded={measuring === e.id}
      aria-controls={measuring === e.id ? `measure-${e.id}` : undefined}
      onClick={() => setMeasuring(measuring === e.id ? null : e.id)}
      className={className}
    >
      Measure<span className="sr-only"> entry {e.entryNumber ?? ""}</span>
    </Button>
  );

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
              <Th>Category</Th>
              <Th>Size</Th>
              <Th>Status</Th>
            </tr>
          </THead>
          <TBody>
            {shown.map((e) => (
              <Fragment key={e.id}>
                <Tr>
                  <Td label="No." primary>
                    <span className="font-display text-2xl tabular-nums">
                      {e.entryNumber ?? <span className="font-sans text-base font-normal text-ink-muted">No number yet</span>}
                    </span>
                  </Td>
                  <Td label="Title">{e.title}</Td>
                  <Td label="Entrant">{e.entrantName}</Td>
                  <Td label="Category">
                    {categoryCell(e)}
                  </Td>
                  <Td label="Size">
                    <SizeCell entry={e} />
                  </Td>
                  <Td label="Status">
                    <div className="flex flex-col items-start gap-2">
                      <EntryStatusBadge status={e.status} />
                      {/* Beside the status from tablets up, so the table fits 820 px; full width on phones. */}
                      {canMeasure(e) ? <div className="hidden sm:block">{measureButton(e)}</div> : null}
                    </div>
                  </Td>
                  {canMeasure(e) ? (
                    <td role="cell" className="block pt-2 sm:hidden">
                      {measureButton(e, "w-full")}
                    </td>
                  ) : null}
                </Tr>
                {measuring === e.id ? (
                  <tr role="row" id={`measure-${e.id}`} className="block sm:table-row">
                    <td role="cell" colSpan={6} className="block sm:table-cell sm:px-4 sm:pb-4">
                      <MeasureForm showSlug={showSlug} entry={e} onClose={() => setMeasuring(null)} />
                    </td>
                  </tr>
                ) : null}
              </Fragment>
            ))}
          </TBody>
        </Table>
      )}
    </div>
  );
}

function SizeCell({ entry: e }: { entry: DeskEntry }) {
  return (
    <div className="space-y-1">
      <p>{formatSize(e.widthUm, e.lengthUm)}</p>
      {e.measuredWidthUm !== null && e.measuredLengthUm !== null ? (
        <p className="flex flex-wrap items-center gap-2 text-sm">
          <span>Measured {formatSize(e.measuredWidthUm, e.measuredLengthUm)}</span>
          {e.sizeFlag ? (
            <Badge tone="warning" icon={TriangleAlert} title={e.sizeFlag}>
              Size flagged
            </Badge>
          ) : (
            <Badge tone="success" icon={CircleCheck}>
              Size OK
            </Badge>
          )}
        </p>
      ) : null}
    </div>
  );
}
