// The category form's values and their conversion to and from the engine's rules. Form values
// are strings and flat rows (one shape for every kind of condition), which suits react-hook-form
// and useFieldArray; the schema turns them into a ShowCategory and then checks it with the same
// categorySchema the server uses, so a message lands beside the field it names.
import { z } from "zod";
import { categorySchema } from "@/lib/schemas/categories";
import type { Bound, BoundUnit, Condition, Division, MakerCount, Measure, QuiltingMethod } from "@/scoring/categories";
import type { ShowCategory } from "@/scoring/category-sets";

export type Op = Bound["op"];
export type BoundForm = { op: Op; value: string; unit: BoundUnit };
export type ConditionKind = Condition["kind"];
export type ConditionForm = {
  kind: ConditionKind;
  measure: Measure;
  bounds: BoundForm[];
  mode: "anyOf" | "allOf" | "noneOf";
  techniques: string[];
  methods: QuiltingMethod[];
  count: MakerCount;
  /** quiltedForHire and judged: "yes" or "no". */
  yesNo: "yes" | "no";
  divisions: Division[];
  youthMinAge: string;
  youthMaxAge: string;
};
export type CategoryForm = {
  id: string;
  code: string;
  name: string;
  description: string;
  precedence: string;
  cap: string;
  mergedIntoId: string | null;
  conditions: ConditionForm[];
};

// ---- Words for every option (no formulas) ------------------------------------------------------

export const KIND_WORDS: Record<ConditionKind, string> = {
  size: "Size",
  techniques: "Techniques",
  quiltingMethod: "Quilting method",
  makers: "Number of makers",
  quiltedForHire: "Quilted for hire",
  division: "Division",
  judged: "Judged or display only",
};
export const MEASURE_WORDS: Record<Measure, string> = {
  width: "Width",
  length: "Length",
  perimeter: "Perimeter (all four sides)",
  area: "Area",
  longestSide: "Longest side",
  shortestSide: "Shortest side",
};
export const OP_WORDS: Record<Op, string> = { "<": "under (<)", "<=": "at most (≤)", ">=": "at least (≥)", ">": "over (>)" };
export const OP_SHORT: Record<Op, string> = { "<": "under", "<=": "at most", ">=": "at least", ">": "over" };
export const MODE_WORDS = { anyOf: "has any of", allOf: "has all of", noneOf: "has none of" } as const;
export const METHOD_WORDS: Record<QuiltingMethod, string> = { hand: "Hand", home_machine: "Home (stationary) machine", frame_machine: "Frame-mounted machine" };
export const MAKERS_WORDS: Record<MakerCount, string> = { one: "One maker", two: "Two makers", twoOrMore: "Two or more makers", threeOrMore: "Three or more makers (a group)" };
export const DIVISION_WORDS: Record<Division, string> = { open: "Open", youth: "Youth", first_time: "First-time entrant" };

export const lengthUnits = (m: Measure): BoundUnit[] => (m === "area" ? ["sq in", "sq cm"] : ["in", "cm"]);

// ---- Blank rows ---------------------------------------------------------------------------------

export function blankCondition(kind: ConditionKind): ConditionForm {
  return {
    kind,
    measure: "perimeter",
    bounds: [{ op: "<", value: "", unit: "in" }],
    mode: "anyOf",
    techniques: [],
    methods: [],
    count: "one",
    yesNo: kind === "quiltedForHire" ? "no" : "yes",
    divisions: kind === "division" ? ["youth"] : [],
    youthMinAge: "",
    youthMaxAge: "",
  };
}

export function blankCategory(id: string, precedence: number): CategoryForm {
  return { id, code: "", name: "", description: "", precedence: String(precedence), cap: "", mergedIntoId: null, conditions: [blankCondition("judged")] };
}

// ---- Rule → form ------------------------------------------------------------------------------

function conditionToForm(c: Condition): ConditionForm {
  const row = blankCondition(c.kind);
  switch (c.kind) {
    case "size":
      return { ...row, measure: c.measure, bounds: c.bounds.map((b) => ({ op: b.op, value: String(b.value), unit: b.unit })) };
    case "techniques":
      return { ...row, mode: c.mode, techniques: [...c.techniques] };
    case "quiltingMethod":
      return { ...row, methods: [...c.methods] };
    case "makers":
      return { ...row, count: c.count };
    case "quiltedForHire":
    case "judged":
      return { ...row, yesNo: c.value ? "yes" : "no" };
    case "division":
      return { ...row, divisions: [...c.divisions], youthMinAge: c.youthMinAge === undefined ? "" : String(c.youthMinAge), youthMaxAge: c.youthMaxAge === undefined ? "" : String(c.youthMaxAge) };
  }
}

export function categoryToForm(c: ShowCategory): CategoryForm {
  return {
    id: c.id,
    code: c.code,
    name: c.name,
    description: c.description ?? "",
    precedence: String(c.precedence),
    cap: c.cap == null ? "" : String(c.cap),
    mergedIntoId: c.mergedIntoId ?? null,
    conditions: c.conditions.map(conditionToForm),
  };
}

// ---- Form → rule ------------------------------------------------------------------------------

/** A typed number the way the server reads it ("152,4" is 152.4); null when it isn't one yet. */
export function typedNumber(s: string): number | null {
  const t = s.trim().replace(/,(?=\d{1,2}$)/, ".").replace(/,/g, "");
  if (t === "") return null;
  const n = Number(t);
  return Number.isFinite(n) ? n : null;
}

const age = (s: string): number | undefined => (/^\d{1,2}$/.test(s.trim()) ? Number(s.trim()) : undefined);

/** The rule as typed so far. Lenient: a limit that isn't a number yet is left out (for the preview). */
export function conditionFromForm(f: ConditionForm, lenient = false): Condition {
  switch (f.kind) {
    case "size": {
      const bounds = f.bounds.flatMap((b) => {
        const n = typedNumber(b.value);
        if (lenient && (n === null || n < 0)) return [];
        return [{ op: b.op, value: (n ?? b.value) as number, unit: b.unit }];
      });
      return { kind: "size", measure: f.measure, bounds };
    }
    case "techniques":
      return { kind: "techniques", mode: f.mode, techniques: [...f.techniques] };
    case "quiltingMethod":
      return { kind: "quiltingMethod", methods: [...f.methods] };
    case "makers":
      return { kind: "makers", count: f.count };
    case "quiltedForHire":
      return { kind: "quiltedForHire", value: f.yesNo === "yes" };
    case "judged":
      return { kind: "judged", value: f.yesNo === "yes" };
    case "division": {
      const youth = f.divisions.includes("youth");
      const min = youth ? age(f.youthMinAge) : undefined;
      const max = youth ? age(f.youthMaxAge) : undefined;
      return { kind: "division", divisions: [...f.divisions], ...(min === undefined ? {} : { youthMinAge: min }), ...(max === undefined ? {} : { youthMaxAge: max }) };
    }
  }
}

export function categoryFromForm(f: CategoryForm, lenient = false): ShowCategory {
  const precedence = Number.parseInt(f.precedence, 10);
  const capText = f.cap.trim();
  const cap = capText === "" ? null : Number(capText);
  return {
    id: f.id,
    code: f.code.trim(),
    name: f.name.trim(),
    description: f.description.trim() || undefined,
    precedence: Number.isFinite(precedence) ? precedence : lenient ? 0 : precedence,
    // Strict: a cap of 0 goes on to the schema, which names the field; lenient: no cap yet.
    cap: cap === null || !lenient ? cap : Number.isInteger(cap) && cap > 0 ? cap : null,
    mergedIntoId: f.mergedIntoId,
    conditions: f.conditions.map((c) => conditionFromForm(c, lenient)),
  };
}

// ---- The form's schema ---------------------------------------------------------------------------

const ageText = z.string().trim().regex(/^(\d{1,2})?$/, "Enter an age in whole years, or leave it empty.");
const conditionForm = z.object({
  kind: z.enum(["size", "techniques", "quiltingMethod", "makers", "quiltedForHire", "division", "judged"]),
  measure: z.enum(["width", "length", "perimeter", "area", "longestSide", "shortestSide"]),
  bounds: z.array(z.object({ op: z.enum(["<", "<=", ">", ">="]), value: z.string(), unit: z.enum(["in", "cm", "sq in", "sq cm"]) })),
  mode: z.enum(["anyOf", "allOf", "noneOf"]),
  techniques: z.array(z.string()),
  methods: z.array(z.enum(["hand", "home_machine", "frame_machine"])),
  count: z.enum(["one", "two", "twoOrMore", "threeOrMore"]),
  yesNo: z.enum(["yes", "no"]),
  divisions: z.array(z.enum(["open", "youth", "first_time"])),
  youthMinAge: ageText,
  youthMaxAge: ageText,
});

/** The form's schema; `otherCodes` are the codes of the set's other categories (codes must differ). */
export function categoryFormSchema(otherCodes: readonly string[]) {
  const taken = new Set(otherCodes.map((c) => c.trim().toLowerCase()));
  return z
    .object({
      id: z.string(),
      code: z.string().refine((c) => !taken.has(c.trim().toLowerCase()), "Another category has this code; codes must differ."),
      name: z.string(),
      description: z.string(),
      precedence: z.string().trim().regex(/^\d{1,6}$/, "Precedence is a whole number, e.g. 10 (lower comes first)."),
      cap: z.string().trim().regex(/^(\d{1,5})?$/, "A cap is a whole number of entries, or empty for none."),
      mergedIntoId: z.string().nullable(),
      conditions: z.array(conditionForm),
    })
    // The typed limits go on as typed (string or number); categorySchema reads and checks them.
    .transform((f) => categoryFromForm(f as CategoryForm) as unknown as z.input<typeof categorySchema>)
    .pipe(categorySchema)
    .transform((c): ShowCategory => ({ ...c, description: c.description || undefined, conditions: c.conditions as Condition[] }));
}
