// The entry's category on the review step: for a draft, what the rules would decide with what is
// saved (the same engine as the live preview); once sent, what the show stored, with its reasons
// and any waiting-list reason.
import Link from "next/link";
import { Card, CardHeader } from "@/components/ui/card";
import type { EntryFacts, OverlapMode } from "@/scoring/categories";
import { activeCategories, decideInSet, prepareSet, type ShowCategory } from "@/scoring/category-sets";
import { pendingText, savedFactsLine, type SavedFacts } from "./category-facts";
import { decisionHeadline, plainReasons, sizeFirst, storedHeadline } from "./category-words";

export type CategorySummaryView = { headline: string; reasons: string[]; note: string; waitlistReason: string };

type Stored = {
  state: string;
  category: { id: string; code: string; name: string } | null;
  candidateIds: string[];
  reasons: string[];
  waitlistReason: string;
};

/** What the review step shows, from the entry's saved facts (null size: not given yet) and its stored outcome. */
export function categorySummaryOf(opts: {
  draft: boolean;
  size: { widthUm: number; lengthUm: number } | null;
  techniques: readonly string[];
  saved: SavedFacts;
  pending: string[];
  set: { categories: ShowCategory[]; overlap: OverlapMode };
  stored: Stored;
}): CategorySummaryView | null {
  const { stored, set } = opts;
  if (activeCategories(set.categories).length === 0) return null;
  if (!opts.draft) {
    const byId = new Map(set.categories.map((c) => [c.id, c]));
    const candidates = stored.candidateIds.flatMap((id) => (byId.has(id) ? [byId.get(id)!] : []));
    const headline = storedHeadline({ state: stored.state, category: stored.category, candidates });
    if (!headline) return null;
    return { headline, reasons: sizeFirst(plainReasons(stored.reasons, stored.category?.name)), note: "", waitlistReason: stored.waitlistReason };
  }
  if (!opts.size) return { headline: "Give the quilt's width and length to see its category.", reasons: [], note: "", waitlistReason: "" };
  const facts: EntryFacts = { ...opts.saved, ...opts.size, techniques: [...opts.techniques] };
  const d = decideInSet(facts, prepareSet(set.categories, { overlap: set.overlap }));
  const reasons = d.kind === "one" ? sizeFirst(plainReasons(d.reasons, d.category.name)) : d.kind === "several" ? d.reasons.slice(1) : d.reasons;
  const note = opts.pending.length
    ? `This assumes ${savedFactsLine(opts.saved)} until you fill in ${pendingText(opts.pending)}; the category may change when you do.`
    : "The show confirms the category when you send the entry.";
  return { headline: decisionHeadline(d), reasons, note, waitlistReason: "" };
}

export function CategorySummary({ view, entryId, editable }: { view: CategorySummaryView; entryId: string; editable: boolean }) {
  return (
    <Card aria-labelledby="review-category">
      <CardHeader
        id="review-category"
        title="Category"
        actions={editable ? <Link className="inline-flex min-h-tap items-center px-2 font-semibold" href={`/entries/${entryId}?step=quilt`}>Check another category<span className="sr-only"> on the quilt step</span></Link> : null}
      />
      <p className="text-lg font-semibold text-plum-800">{view.headline}</p>
      {view.reasons.length ? (
        <ul aria-label="Why" className="mt-2 list-disc space-y-1 pl-5 break-words">
          {view.reasons.map((r, i) => (
            <li key={i}>{r}</li>
          ))}
        </ul>
      ) : null}
      {view.waitlistReason ? (
        <p className="mt-3 font-semibold text-warning-700">Waiting list: {view.waitlistReason}</p>
      ) : null}
      {view.note ? <p className="mt-3 text-sm text-ink-muted">{view.note}</p> : null}
    </Card>
  );
}
