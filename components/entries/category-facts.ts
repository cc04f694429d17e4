// The facts the category rules read, from what the entry form has saved so far: the quilt step's
// size and techniques come live from the form; makers, quilting, judging and division from the
// later steps as saved (the same placeholders the server decides a draft with until then).
import type { Division, EntryFacts, QuiltingMethod } from "@/scoring/categories";
import { makerCount } from "@/scoring/category-sets";
import type { Gap } from "@/scoring/entry-completeness";

/** Everything but the size and techniques, which the quilt step supplies as the entrant types. */
export type SavedFacts = Omit<EntryFacts, "widthUm" | "lengthUm" | "techniques">;

type SavedEntry = {
  madeBy: readonly string[];
  quiltedBy: string;
  quiltedByKind: "self" | "other" | "hire";
  quiltingMethod: QuiltingMethod | null;
  division: Division;
  youthAge: number | null;
  judged: boolean;
};

export function savedFactsOf(e: SavedEntry): SavedFacts {
  return {
    makerCount: makerCount(e.madeBy, e.quiltedBy),
    quiltedForHire: e.quiltedByKind === "hire",
    // Until the makers step is saved the row holds home_machine, and the server decides with it.
    quiltingMethod: e.quiltingMethod ?? "home_machine",
    division: e.division,
    youthAge: e.youthAge,
    judged: e.judged,
  };
}

/** Which later steps the rules read are not filled in yet, by their names in the step list. */
export function pendingSteps(gaps: readonly Gap[]): string[] {
  const out: string[] = [];
  if (gaps.some((g) => g.step === "makers")) out.push("Makers");
  if (gaps.some((g) => g.step === "about")) out.push("About");
  return out;
}

/** "the Makers step", "the Makers and About steps". */
export function pendingText(pending: readonly string[]): string {
  return `the ${pending.join(" and ")} step${pending.length === 1 ? "" : "s"}`;
}

const METHOD_WORDS: Record<QuiltingMethod, string> = { hand: "hand quilted", home_machine: "home machine", frame_machine: "frame machine" };
const DIVISION_WORDS: Record<Division, string> = { open: "open division", youth: "youth division", first_time: "first-time entrant" };

/** "1 maker · home machine · open division · judged": what the preview assumed. */
export function savedFactsLine(f: SavedFacts): string {
  return [
    `${f.makerCount} maker${f.makerCount === 1 ? "" : "s"}`,
    f.quiltedForHire ? "quilted for hire" : null,
    METHOD_WORDS[f.quiltingMethod],
    f.division === "youth" && f.youthAge ? `youth division, age ${f.youthAge}` : DIVISION_WORDS[f.division],
    f.judged ? "judged" : "display only",
  ]
    .filter(Boolean)
    .join(" · ");
}
