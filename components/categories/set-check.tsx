// The rule-set check in plain words: sizes no category takes (gaps), sizes two take (overlaps),
// rules that can't work, and the current entries that would fit none or several.
import { CircleCheck, TriangleAlert } from "lucide-react";
import { Alert } from "@/components/ui/alert";
import type { DraftPreview, Placed } from "./preview";
import { entryLabel } from "./preview";

const capital = (s: string) => s.charAt(0).toUpperCase() + s.slice(1);

export function SetCheck({ preview, editing }: { preview: DraftPreview; editing: boolean }) {
  const { check, none, several, set } = preview;
  const issues = check.gaps.length + check.overlaps.length + check.problems.length;
  const heading = editing ? "Check, with your edit" : "Check";
  if (set.length === 0) {
    return (
      <section aria-labelledby="set-check" className="space-y-2">
        <h3 id="set-check" className="text-xl">{heading}</h3>
        <p className="text-ink-muted">No categories yet: add one, or load a starter set.</p>
      </section>
    );
  }
  return (
    <section aria-labelledby="set-check" aria-live="polite" className="space-y-3">
      <h3 id="set-check" className="text-xl">{heading}</h3>
      {issues === 0 ? (
        <p className="flex items-center gap-2 font-medium text-success-700">
          <CircleCheck aria-hidden className="size-5 shrink-0" />
          No gaps or overlaps between size bands, and no rule that can’t work.
        </p>
      ) : null}
      {check.gaps.length ? (
        <Alert tone="error" title={check.gaps.length === 1 ? "A gap: a size no category takes" : `${check.gaps.length} gaps: sizes no category takes`}>
          <ul className="list-disc space-y-1 pl-5" data-testid="gaps">
            {check.gaps.map((g) => (
              <li key={`${g.measure}-${g.fromUm}`}>{capital(g.text)}.</li>
            ))}
          </ul>
        </Alert>
      ) : null}
      {check.overlaps.length ? (
        <Alert tone="warning" title={check.overlaps.length === 1 ? "An overlap: a size two categories take" : `${check.overlaps.length} overlaps: sizes two categories take`}>
          <ul className="list-disc space-y-1 pl-5" data-testid="overlaps">
            {check.overlaps.map((o) => (
              <li key={`${o.measure}-${o.atOrFromUm}-${o.categories.map((c) => c.id).join("-")}`}>{capital(o.text)}.</li>
            ))}
          </ul>
        </Alert>
      ) : null}
      {check.problems.length ? (
        <Alert tone="error" title="Rules that need fixing">
          <ul className="list-disc space-y-1 pl-5">
            {check.problems.map((p) => (
              <li key={p.text}>{capital(p.text)}.</li>
            ))}
          </ul>
        </Alert>
      ) : null}
      <EntryList title="Entries that would fit no category" items={none} empty="Every current entry fits a category." tone="none" />
      <EntryList title="Entries that would fit more than one" items={several} empty="No current entry fits more than one category." tone="several" />
    </section>
  );
}

function EntryList({ title, items, empty, tone }: { title: string; items: Placed[]; empty: string; tone: "none" | "several" }) {
  if (items.length === 0) {
    return (
      <p className="flex items-start gap-2 text-ink-muted">
        <CircleCheck aria-hidden className="mt-0.5 size-5 shrink-0 text-success-700" />
        {empty}
      </p>
    );
  }
  return (
    <div className="space-y-1" data-testid={`entries-${tone}`}>
      <p className="flex items-start gap-2 font-semibold text-warning-700">
        <TriangleAlert aria-hidden className="mt-0.5 size-5 shrink-0" />
        {title}: {items.length}
      </p>
      <ul className="space-y-1 pl-7">
        {items.slice(0, 25).map(({ entry, placement }) => (
          <li key={entry.id}>
            <span className="font-medium">{entryLabel(entry)}</span>
            <span className="block text-sm break-words text-ink-muted">{placement.reasons[0]}</span>
          </li>
        ))}
        {items.length > 25 ? <li className="text-ink-muted">and {items.length - 25} more</li> : null}
      </ul>
    </div>
  );
}

/** Which current entries the rule being edited takes. */
export function RulePreview({ takes, name, check }: { takes: DraftPreview["takes"]; name: string; check?: DraftPreview["check"] }) {
  const near = [...(check?.gaps ?? []), ...(check?.overlaps ?? [])];
  return (
    <section aria-labelledby="rule-preview" aria-live="polite" className="rounded-control border border-plum-200 bg-plum-50/60 p-3 sm:p-4">
      <h4 id="rule-preview" className="text-lg">
        {name || "This category"} would take {takes.length} current {takes.length === 1 ? "entry" : "entries"}
      </h4>
      {takes.length ? (
        <ul className="mt-2 grid gap-x-6 gap-y-1 sm:grid-cols-2" data-testid="rule-takes">
          {takes.slice(0, 40).map((e) => (
            <li key={e.id} className="break-words">{entryLabel(e)}</li>
          ))}
          {takes.length > 40 ? <li className="text-ink-muted">and {takes.length - 40} more</li> : null}
        </ul>
      ) : (
        <p className="mt-1 text-ink-muted">None of the current entries fits these conditions.</p>
      )}
      {/* Below the wide layout the check sits under the editor: repeat its gaps and overlaps here. */}
      {near.length ? (
        <ul className="mt-3 space-y-1 font-semibold text-danger-700 lg:hidden">
          {near.map((x) => (
            <li key={x.text} className="flex items-start gap-2">
              <TriangleAlert aria-hidden className="mt-0.5 size-5 shrink-0" />
              {capital(x.text)}.
            </li>
          ))}
        </ul>
      ) : null}
    </section>
  );
}
