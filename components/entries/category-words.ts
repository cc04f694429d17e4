// An entry's category in the entrant's words: the one-line headline and the plain-word reasons,
// shared by the live preview in the form (browser), the review step and "My entries" (server).
import type { Decision } from "@/scoring/categories";

export type CategoryLabel = { code: string; name: string };

export const categoryLabel = (c: CategoryLabel) => `${c.code} ${c.name}`;

function listOf(items: string[]): string {
  if (items.length <= 1) return items[0] ?? "";
  return `${items.slice(0, -1).join(", ")} and ${items[items.length - 1]}`;
}

/** "This quilt will be in 11 Pieced, Medium" / fits none / fits several, for a decision of the engine. */
export function decisionHeadline(d: Decision): string {
  if (d.kind === "one") return `This quilt will be in ${categoryLabel(d.category)}`;
  if (d.kind === "several") return `This quilt fits several categories (${listOf(d.categories.map(categoryLabel))}): the chair will place it`;
  return "This quilt fits no category yet: the chair will place it";
}

/**
 * The reasons without the category's name repeated after each one: the headline names it already
 * ("perimeter 256 in is at least 200 in and under 300 in (Pieced, Medium)" → without the bracket).
 */
export function plainReasons(reasons: readonly string[], categoryName?: string): string[] {
  if (!categoryName) return [...reasons];
  const tail = ` (${categoryName})`;
  return reasons.map((r) => (r.endsWith(tail) ? r.slice(0, -tail.length) : r));
}

const SIZE_WORDS = /^(width|length|perimeter|area|longest side|shortest side) /;

/** Size reasons first: on the quilt step they are the ones that move as the entrant types. */
export function sizeFirst(reasons: readonly string[]): string[] {
  return [...reasons.filter((r) => SIZE_WORDS.test(r)), ...reasons.filter((r) => !SIZE_WORDS.test(r))];
}

/** The stored outcome of a sent entry in plain words, for the review step and "My entries". */
export function storedHeadline(v: { state: string; category: CategoryLabel | null; candidates?: CategoryLabel[] }): string | null {
  switch (v.state) {
    case "decided":
      return v.category ? `In ${categoryLabel(v.category)}` : null;
    case "overridden":
      return v.category ? `In ${categoryLabel(v.category)}, placed by the chair` : null;
    case "fits_none":
      return "Fits no category yet: the chair will place it";
    case "fits_several":
      return v.candidates?.length
        ? `Fits several categories (${listOf(v.candidates.map(categoryLabel))}): the chair will place it`
        : "Fits several categories: the chair will place it";
    default:
      return null;
  }
}
