// What an entry still lacks before it can be sent to the show: a plain list, step by step, that
// the review page shows and submission checks. Pure: the browser can run it too.

export type EntryStep = "quilt" | "makers" | "about" | "photos" | "review";
export const ENTRY_STEPS: readonly EntryStep[] = ["quilt", "makers", "about", "photos", "review"];

/**
 * A new draft has no size yet, but the entries table insists on a positive one; drafts hold this
 * placeholder (1 µm) until the entrant saves the quilt step. Anything at or below it is "not given".
 */
export const UNSET_LENGTH_UM = 1;

export type CompletenessEntry = {
  title: string;
  widthUm: number;
  lengthUm: number;
  techniques: readonly string[];
  madeBy: readonly string[];
  quiltedBy: string;
  quiltedForHire: boolean;
  patternSource: string;
  patternName: string;
  patternDesigner: string;
  statement: string;
  declaredValueCents: number;
  division: string;
  youthAge: number | null;
  photoViews: readonly string[];
};

export type CompletenessRules = { statementWordLimit: number; requiredPhotoViews: readonly string[] };

export type Gap = { step: EntryStep; field: string; message: string };

/** Words as a reader counts them: runs of letters or digits, so "hand-quilted" is one and "—" none. */
export function countWords(text: string): number {
  return text.match(/[\p{L}\p{N}]+(?:['’\-][\p{L}\p{N}]+)*/gu)?.length ?? 0;
}

export const PHOTO_VIEW_LABELS: Record<string, string> = {
  full: "Full view showing all four edges",
  detail: "Detail showing the quilting",
  other: "Another view",
};

export function entryGaps(entry: CompletenessEntry, rules: CompletenessRules): Gap[] {
  const gaps: Gap[] = [];
  const add = (step: EntryStep, field: string, message: string) => gaps.push({ step, field, message });

  if (entry.title.trim() === "") add("quilt", "title", "The quilt's title");
  if (entry.widthUm <= UNSET_LENGTH_UM || entry.lengthUm <= UNSET_LENGTH_UM) add("quilt", "size", "The quilt's width and length");
  if (entry.techniques.length === 0) add("quilt", "techniques", "At least one technique");

  if (entry.madeBy.filter((n) => n.trim() !== "").length === 0) add("makers", "madeBy", "Who made the quilt");
  if (entry.quiltedForHire && entry.quiltedBy.trim() === "") add("makers", "quiltedByName", "The name of the quilter you hired");
  if (entry.patternSource !== "original" && (entry.patternName.trim() === "" || entry.patternDesigner.trim() === "")) {
    add("makers", "patternName", "The pattern's name and designer");
  }

  const words = countWords(entry.statement);
  if (words === 0) add("about", "statement", "An artist statement");
  else if (words > rules.statementWordLimit) {
    add("about", "statement", `A shorter artist statement (${words} words; the limit is ${rules.statementWordLimit})`);
  }
  if (entry.declaredValueCents <= 0) add("about", "declaredValue", "The quilt's declared value");
  if (entry.division === "youth" && entry.youthAge === null) add("about", "youthAge", "The youth entrant's age");

  for (const view of rules.requiredPhotoViews) {
    if (!entry.photoViews.includes(view)) add("photos", view, `Photo: ${(PHOTO_VIEW_LABELS[view] ?? view).toLowerCase()}`);
  }
  return gaps;
}
