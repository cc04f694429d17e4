// Small helpers the judging set-up forms share: a nested field's error message, and the words
// for methods, relations and released fields (our own wording).
import { get, type FieldErrors, type FieldValues } from "react-hook-form";
import type { JudgeField } from "@/lib/schemas/judging";

/** The message for a nested field path such as "sheet.sections.0.title", if any. */
export function errorAt<T extends FieldValues>(errors: FieldErrors<T>, path: string): string | undefined {
  const e = get(errors, path) as { message?: unknown; root?: { message?: unknown } } | undefined;
  if (typeof e?.message === "string") return e.message;
  if (typeof e?.root?.message === "string") return e.root.message;
  return undefined;
}

export const METHOD_WORDS = {
  points: "Points",
  sort_then_points: "Sorting pass, then points",
  sort_then_rank: "Sorting pass, then ranking",
  rank: "Ranking only",
} as const;
export type MethodKey = keyof typeof METHOD_WORDS;

export const RELATION_WORDS = { household: "Household member", student: "Student", client: "Client", other: "Other" } as const;

export const FIELD_WORDS: Record<JudgeField, string> = {
  title: "Title",
  size: "Size",
  techniques: "Techniques",
  quiltingMethod: "Quilting method",
  pattern: "Pattern and designer",
  statement: "Entrant's statement",
  division: "Division",
};

export const COMMENT_POLICY_WORDS = {
  all: "Comments on every entry",
  placed: "Comments on placed entries only",
  none: "No written comments",
} as const;
