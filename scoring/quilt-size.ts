// Whether a quilt's size is worth a second look before it is saved: below the show's own minimum
// (refused), smaller or larger than quilts usually are (a slipped unit or digit), or outside the
// sizes every category of the show takes. Pure: the entry form runs it live, the server the same.
import { explainCategory, type EntryFacts } from "./categories";
import { activeCategories, type ShowCategory } from "./category-sets";
import { formatInches, formatCm, UM_PER_INCH } from "./units";

/**
 * Common practice: miniature categories at guild shows start at a few inches a side, and the
 * largest bed quilts hung at shows are about 120 in; outside 6 in to 160 in a side is far more
 * likely a slipped unit (centimeters typed as inches) or digit than a real quilt.
 */
export const USUAL_MIN_SIDE_UM = 6 * UM_PER_INCH;
export const USUAL_MAX_SIDE_UM = 160 * UM_PER_INCH;

const both = (um: number) => `${formatInches(um)} (${formatCm(um)})`;

/** The show's minimum, when the quilt is below it: the reason it is refused; else null. */
export function belowShowMinimum(size: { widthUm: number; lengthUm: number }, minSideUm: number | null): string | null {
  if (minSideUm === null || Math.min(size.widthUm, size.lengthUm) >= minSideUm) return null;
  return `This show takes quilts at least ${both(minSideUm)} on each side.`;
}

/** Warnings in plain words; none when the size looks like a quilt this show takes. */
export function sizeWarnings(
  size: { widthUm: number; lengthUm: number },
  show: { minSideUm: number | null; categories: readonly ShowCategory[] },
): string[] {
  const out: string[] = [];
  const below = belowShowMinimum(size, show.minSideUm);
  if (below) out.push(below);
  const shortest = Math.min(size.widthUm, size.lengthUm);
  const longest = Math.max(size.widthUm, size.lengthUm);
  if (shortest < USUAL_MIN_SIDE_UM) out.push(`A side under ${both(USUAL_MIN_SIDE_UM)} is unusually small for a quilt: check the numbers and the unit (inches or centimeters).`);
  if (longest > USUAL_MAX_SIDE_UM) out.push(`A side over ${both(USUAL_MAX_SIDE_UM)} is unusually large for a quilt: check the numbers and the unit (inches or centimeters).`);
  // Only the size conditions count here: techniques and makers are other steps' business.
  const sizeOnly = activeCategories([...show.categories]).map((c) => ({ ...c, conditions: c.conditions.filter((k) => k.kind === "size") }));
  if (sizeOnly.length > 0) {
    const facts: EntryFacts = { ...size, techniques: [], quiltingMethod: "hand", makerCount: 1, quiltedForHire: false, division: "open", youthAge: null, judged: true };
    if (!sizeOnly.some((c) => explainCategory(facts, c).fits)) out.push("No category of this show takes a quilt of this size: check the size, or ask the show chair.");
  }
  return out;
}
