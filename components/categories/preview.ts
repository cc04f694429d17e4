// What the draft set (with the category being edited, as typed so far) does to the show's current
// entries: the same pure modules the server decides with, so the preview is what saving does.
import { previewRule, type OverlapMode } from "@/scoring/categories";
import { checkSet, placeEntry, planMoves, prepareSet, type EntryInSet, type Placement, type ShowCategory } from "@/scoring/category-sets";

export type Placed = { entry: EntryInSet; placement: Placement };

export function withEdited(set: readonly ShowCategory[], edited: ShowCategory | null): ShowCategory[] {
  if (!edited) return [...set];
  return set.some((c) => c.id === edited.id) ? set.map((c) => (c.id === edited.id ? edited : c)) : [...set, edited];
}

export function previewDraft(set: readonly ShowCategory[], entries: readonly EntryInSet[], overlap: OverlapMode, edited: ShowCategory | null) {
  const opts = { overlap };
  const all = withEdited(set, edited);
  const prepared = prepareSet(all, opts);
  const placed: Placed[] = entries.map((entry) => ({ entry, placement: placeEntry(entry.facts, entry.current, prepared) }));
  const takes = edited ? previewRule(edited, all, entries.map((e) => e.facts), opts).takes.map((i) => entries[i]!) : [];
  return {
    set: all,
    byId: prepared.byId,
    none: placed.filter((p) => p.placement.outcome.state === "fits_none"),
    several: placed.filter((p) => p.placement.outcome.state === "fits_several"),
    takes,
    check: checkSet(all, undefined, opts),
    moves: planMoves(entries, all, opts),
  };
}
export type DraftPreview = ReturnType<typeof previewDraft>;

export const entryLabel = (e: { entryNumber: number | null; title: string }) => `#${e.entryNumber ?? "—"} ${e.title}`;
