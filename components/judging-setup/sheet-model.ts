// The score-sheet editor's form model: what the chair types (a scale kind with its step or its
// levels, each level's share of the points as a percentage) and how it becomes a ScoreSheet.
// The form schema checks in the browser; saveSheetSchema checks again in the action.
import { z } from "zod";
import type { Criterion, ScoreSheet } from "@/scoring/score-sheets";

const newId = (prefix: string) => `${prefix}-${Math.random().toString(36).slice(2, 8)}`;

/** Our own starting levels for a word scale (the chair renames them). */
export const STARTER_LEVELS: LevelForm[] = [
  { label: "Outstanding", percent: 100 },
  { label: "Strong", percent: 80 },
  { label: "Fair", percent: 60 },
  { label: "Needs work", percent: 40 },
];

export const blankCriterion = (): CriterionForm => ({ id: newId("c"), label: "", maxPoints: undefined, weight: undefined, kind: "points", step: undefined, levels: [], allowNotApplicable: false });
export const blankSection = (): SectionForm => ({ id: newId("s"), title: "", criteria: [blankCriterion()] });
export const blankSheet = (): SheetForm => ({ name: "", isDefault: false, sheet: { sections: [blankSection()] } });

/** A number input's value: blank is "not given", a comma is a decimal point. */
export const numberOrUndefined = (v: unknown): number | undefined => {
  if (v === "" || v === null || v === undefined) return undefined;
  if (typeof v === "number") return Number.isNaN(v) ? undefined : v;
  const n = Number(String(v).trim().replace(",", "."));
  return Number.isNaN(n) ? Number.NaN : n;
};

// A percentage to a fraction on its decimal digits: 33.3 % is 0.333, never 0.33299999999999996.
const toFraction = (percent: number) => Number((percent / 100).toPrecision(12));
const toPercent = (fraction: number) => Number((fraction * 100).toPrecision(12));

export function sheetToForm(row: { id: string; name: string; isDefault: boolean; sheet: ScoreSheet }): SheetForm {
  return {
    id: row.id,
    name: row.name,
    isDefault: row.isDefault,
    sheet: {
      sections: row.sheet.sections.map((s) => ({
        id: s.id,
        title: s.title,
        criteria: s.criteria.map((c) => ({
          id: c.id,
          label: c.label,
          maxPoints: c.maxPoints,
          weight: c.weight,
          kind: c.scale.kind,
          step: c.scale.kind === "points" ? c.scale.step : undefined,
          levels: c.scale.kind === "words" ? c.scale.levels.map((l) => ({ label: l.label, percent: toPercent(l.fraction) })) : [],
          allowNotApplicable: c.allowNotApplicable,
        })),
      })),
    },
  };
}

// Loose shapes, so the live total can read a half-typed form (and the schema's own types stay acyclic).
type LooseCriterion = { id: string; label?: string; maxPoints?: number; weight?: number; kind?: "points" | "words"; step?: number; levels?: { label?: string; percent?: number }[]; allowNotApplicable?: boolean };
type LooseSheet = { sections?: { id: string; title?: string; criteria?: LooseCriterion[] }[] };

function toCriterion(c: LooseCriterion): Criterion {
  const weight = c.weight;
  return {
    id: c.id,
    label: (c.label ?? "").trim(),
    maxPoints: c.maxPoints ?? 0,
    ...(weight === undefined ? {} : { weight }),
    scale:
      c.kind === "words"
        ? { kind: "words", levels: (c.levels ?? []).map((l) => ({ label: (l.label ?? "").trim(), fraction: typeof l.percent === "number" && Number.isFinite(l.percent) ? toFraction(l.percent) : Number.NaN })) }
        : c.step === undefined
          ? { kind: "points" }
          : { kind: "points", step: c.step },
    allowNotApplicable: c.allowNotApplicable ?? false,
  };
}

/** The sheet as typed so far, for the live total; blanks become 0 so checkSheet names them. */
export function formToSheet(form: LooseSheet | undefined): ScoreSheet {
  return { sections: (form?.sections ?? []).map((s) => ({ id: s.id, title: (s.title ?? "").trim(), criteria: (s.criteria ?? []).map(toCriterion) })) };
}

const id = z.string().regex(/^[A-Za-z0-9_-]+$/).max(40);
const amount = (what: string) => z.number({ error: `${what} must be a number.` }).positive(`${what} must be more than 0.`).max(1000, `${what} is too large.`);
// Blank boxes are undefined while the chair types; a required one says so on submit.
const required = <T extends z.ZodType>(schema: T, message: string) => schema.optional().refine((v) => v !== undefined, { message });

const criterionForm = z
  .object({
    id,
    label: z.string().trim().min(1, "Name the criterion.").max(80),
    maxPoints: required(amount("Most points"), "Most points must be a number."),
    weight: amount("Weight").optional(),
    kind: z.enum(["points", "words"]),
    step: amount("Step").optional(),
    levels: z.array(
      z.object({
        label: z.string().trim().min(1, "Name the level.").max(40),
        percent: required(z.number({ error: "Give the level's share, 0 to 100 %." }).min(0, "A share is 0 to 100 %.").max(100, "A share is 0 to 100 %."), "Give the level's share, 0 to 100 %."),
      }),
    ),
    allowNotApplicable: z.boolean(),
  })
  .superRefine((c, ctx) => {
    if (c.kind === "words" && c.levels.length < 2) ctx.addIssue({ code: "custom", path: ["levels"], message: "A word scale needs at least two levels." });
  });

export const sheetFormSchema = z
  .object({
    id: z.uuid().optional(),
    name: z.string().trim().min(1, "Name the sheet.").max(80),
    isDefault: z.boolean(),
    sheet: z.object({
      sections: z
        .array(z.object({ id, title: z.string().trim().min(1, "Name the section.").max(80), criteria: z.array(criterionForm).min(1, "A section needs at least one criterion.").max(30) }))
        .min(1, "A sheet needs at least one section.")
        .max(12),
    }),
  })
  .transform((v) => ({ ...(v.id ? { id: v.id } : {}), name: v.name, isDefault: v.isDefault, sheet: formToSheet(v.sheet) }));

export type SheetForm = z.input<typeof sheetFormSchema>;
export type SectionForm = SheetForm["sheet"]["sections"][number];
export type CriterionForm = SectionForm["criteria"][number];
export type LevelForm = CriterionForm["levels"][number];
export type SheetOutput = z.output<typeof sheetFormSchema>;
