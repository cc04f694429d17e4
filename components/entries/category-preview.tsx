"use client";
// The live category preview on the quilt step: as the entrant types the size or ticks techniques,
// the same pure engine the server decides with (scoring/) says which category the quilt will be
// in and why, and "Expected a different category?" says why another one does not fit.
import { useId, useMemo, useState } from "react";
import { Shapes } from "lucide-react";
import { SelectField } from "@/components/ui/field";
import { explainCategory, type EntryFacts, type OverlapMode } from "@/scoring/categories";
import { activeCategories, decideInSet, prepareSet, type ShowCategory } from "@/scoring/category-sets";
import { parseLength, type LengthUnit } from "@/scoring/measure";
import { pendingText, savedFactsLine, type SavedFacts } from "./category-facts";
import { categoryLabel, decisionHeadline, plainReasons, sizeFirst } from "./category-words";

export type CategoryContext = {
  categories: ShowCategory[];
  overlap: OverlapMode;
  saved: SavedFacts;
  /** Later steps not filled in yet, in words. */
  pending: string[];
  /** Set when the chair has placed the entry by hand: the rules no longer decide it. */
  chairPlaced: string | null;
};

/**
 * A length as typed, in µm: null while the field is empty; while the text can't be read (half
 * typed, "60 1/"), the last length that could, so the preview doesn't flicker or scold.
 */
function useTypedLength(text: string, unit: LengthUnit): number | null {
  const parsed = parseLength(text, unit);
  const [last, setLast] = useState<number | null>(parsed.ok ? parsed.um : null);
  const next = text.trim() === "" ? null : parsed.ok ? parsed.um : last;
  if (next !== last) setLast(next); // adjusting state while rendering, as React documents
  return next;
}

type Props = { context: CategoryContext; widthText: string; lengthText: string; unit: LengthUnit; techniques: readonly string[] };

export function CategoryPreview({ context, widthText, lengthText, unit, techniques }: Props) {
  const id = useId();
  const prepared = useMemo(() => prepareSet(context.categories, { overlap: context.overlap }), [context.categories, context.overlap]);
  const choices = useMemo(() => activeCategories(context.categories), [context.categories]);
  const widthUm = useTypedLength(widthText, unit);
  const lengthUm = useTypedLength(lengthText, unit);
  const [expectedId, setExpectedId] = useState("");

  const facts: EntryFacts | null = widthUm !== null && lengthUm !== null ? { ...context.saved, widthUm, lengthUm, techniques: [...techniques] } : null;
  const decision = facts && choices.length ? decideInSet(facts, prepared) : null;
  const expected = choices.find((c) => c.id === expectedId) ?? null;
  const explained = facts && expected ? explainCategory(facts, expected) : null;

  const headline = choices.length === 0
    ? "The show hasn't set up its categories yet."
    : decision
      ? decisionHeadline(decision)
      : "Type the width and length to see which category this quilt will be in.";
  const reasons = decision?.kind === "one" ? sizeFirst(plainReasons(decision.reasons, decision.category.name)) : decision?.kind === "several" ? decision.reasons.slice(1) : decision?.reasons ?? [];

  return (
    <section aria-labelledby={`${id}-title`} className="space-y-3 rounded-card border border-plum-300 bg-plum-50 p-4">
      <h3 id={`${id}-title`} className="flex items-center gap-2 font-display text-xl font-semibold">
        <Shapes aria-hidden className="size-5 shrink-0 text-plum-700" />
        Category
      </h3>
      {context.chairPlaced ? <p className="font-semibold">{context.chairPlaced}</p> : null}
      {/* Only the headline is announced: the reasons change on every keystroke. */}
      <p aria-live="polite" aria-atomic="true" className="text-lg font-semibold text-plum-800" data-testid="category-headline">
        {headline}
      </p>
      {decision && reasons.length ? (
        decision.kind === "one" ? (
          <ReasonList reasons={reasons} label="Why" />
        ) : (
          <details className="group">
            <summary className="inline-flex min-h-tap cursor-pointer items-center font-semibold text-brand-strong">Why, category by category</summary>
            <ReasonList reasons={reasons} />
          </details>
        )
      ) : null}
      {choices.length ? (
        <p className="text-sm text-ink-muted">
          {context.pending.length
            ? `This assumes ${savedFactsLine(context.saved)} until you fill in ${pendingText(context.pending)}; the category may change when you do.`
            : `This uses your answers on the later steps (${savedFactsLine(context.saved)}); changing them may change the category.`}{" "}
          The show confirms the category when you send the entry.
        </p>
      ) : null}
      {choices.length && facts ? (
        <div className="space-y-2 border-t border-plum-300/60 pt-3">
          <SelectField label="Expected a different category?" hint="Choose one to see why this quilt does or doesn't fit it." value={expectedId} onChange={(e) => setExpectedId(e.target.value)}>
            <option value="">Choose a category…</option>
            {choices.map((c) => (
              <option key={c.id} value={c.id}>
                {categoryLabel(c)}
              </option>
            ))}
          </SelectField>
          {expected && explained ? (
            <div aria-live="polite" className="rounded-control bg-surface p-3">
              <p className="font-semibold">{explained.fits ? `It fits ${categoryLabel(expected)}:` : `Why not ${categoryLabel(expected)}:`}</p>
              <ReasonList reasons={explained.fits ? plainReasons(explained.reasons, expected.name) : explained.reasons} />
            </div>
          ) : null}
        </div>
      ) : null}
    </section>
  );
}

function ReasonList({ reasons, label }: { reasons: string[]; label?: string }) {
  return (
    <ul aria-label={label} className="list-disc space-y-1 pl-5 break-words">
      {reasons.map((r, i) => (
        <li key={i}>{r}</li>
      ))}
    </ul>
  );
}
