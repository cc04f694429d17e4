// Input schemas for a show's categories: the chair's editor (react-hook-form), its server actions
// and the intake desk's re-measure. A category is a rule of conditions (scoring/categories.ts);
// these check every part with a message that names it, so a bad rule is refused, not half saved.
import { z } from "zod";
import { storableString } from "@/lib/validation";
import type { Condition } from "@/scoring/categories";
import { parseLength } from "@/scoring/measure";

const MEASURES = ["width", "length", "perimeter", "area", "longestSide", "shortestSide"] as const;
const OPS = ["<", "<=", ">", ">="] as const;
const UNITS = ["in", "cm", "sq in", "sq cm"] as const;

/** A bound's number as typed ("60", "60.5", "152,4") or sent (60.5): positive, finite, not absurd. */
const boundValue = z
  .union([z.number(), storableString()])
  .transform((v, ctx) => {
    const s = typeof v === "number" ? String(v) : v.trim().replace(/,(?=\d{1,2}$)/, ".").replace(/,/g, "");
    const n = Number(s);
    if (s === "" || !Number.isFinite(n)) {
      ctx.addIssue({ code: "custom", message: "Enter the limit as a number, e.g. 280 or 72.5." });
      return z.NEVER;
    }
    if (n < 0) {
      ctx.addIssue({ code: "custom", message: "A limit can't be negative." });
      return z.NEVER;
    }
    if (n > 1_000_000) {
      ctx.addIssue({ code: "custom", message: "That limit is larger than any quilt; check the number." });
      return z.NEVER;
    }
    return n;
  });

export const boundSchema = z.object({ op: z.enum(OPS), value: boundValue, unit: z.enum(UNITS) });

const sizeCondition = z
  .object({ kind: z.literal("size"), measure: z.enum(MEASURES), bounds: z.array(boundSchema).min(1, "Give at least one limit.").max(4) })
  .superRefine((c, ctx) => {
    const area = c.measure === "area";
    c.bounds.forEach((b, i) => {
      const areaUnit = b.unit === "sq in" || b.unit === "sq cm";
      if (area !== areaUnit) ctx.addIssue({ code: "custom", path: ["bounds", i, "unit"], message: area ? "Area limits are in sq in or sq cm." : "Length limits are in in or cm." });
    });
  });

const techniqueName = storableString().trim().min(1).max(60);

export const conditionSchema = z.discriminatedUnion("kind", [
  sizeCondition,
  z.object({ kind: z.literal("techniques"), mode: z.enum(["anyOf", "allOf", "noneOf"]), techniques: z.array(techniqueName).min(1, "Choose at least one technique.").max(40) }),
  z.object({ kind: z.literal("quiltingMethod"), methods: z.array(z.enum(["hand", "home_machine", "frame_machine"])).min(1, "Choose at least one quilting method.") }),
  z.object({ kind: z.literal("makers"), count: z.enum(["one", "two", "twoOrMore", "threeOrMore"]) }),
  z.object({ kind: z.literal("quiltedForHire"), value: z.boolean() }),
  z
    .object({
      kind: z.literal("division"),
      divisions: z.array(z.enum(["open", "youth", "first_time"])).min(1, "Choose at least one division."),
      youthMaxAge: z.number().int().min(1).max(25).optional(),
      youthMinAge: z.number().int().min(1).max(25).optional(),
    })
    .refine((c) => c.youthMinAge === undefined || c.youthMaxAge === undefined || c.youthMinAge <= c.youthMaxAge, {
      message: "The youngest age is above the oldest.",
      path: ["youthMinAge"],
    }),
  z.object({ kind: z.literal("judged"), value: z.boolean() }),
]);

const uuid = z.uuid("That category id isn't valid.");
const optionalCap = z
  .union([z.number(), storableString(), z.null()])
  .optional()
  .transform((v, ctx) => {
    if (v === null || v === undefined || (typeof v === "string" && v.trim() === "")) return null;
    const n = typeof v === "number" ? v : Number(v.trim());
    if (!Number.isInteger(n) || n < 1 || n > 10_000) {
      ctx.addIssue({ code: "custom", message: "A cap is a whole number of entries from 1 to 10,000, or empty for none." });
      return z.NEVER;
    }
    return n;
  });

export const categorySchema = z.object({
  id: uuid,
  code: storableString().trim().min(1, "Give the category a code, e.g. 10 or A1.").max(12, "Keep the code to 12 characters.").regex(/^[\p{L}\p{N}][\p{L}\p{N}.\-]*$/u, "Use letters, digits, dots and dashes in the code."),
  name: storableString().trim().min(1, "Give the category a name.").max(80, "Keep the name to 80 characters."),
  description: storableString().trim().max(600, "Keep the description to 600 characters.").default(""),
  precedence: z.number().int().min(0).max(100_000),
  conditions: z.array(conditionSchema).max(20, "That is more conditions than one category needs."),
  cap: optionalCap,
  mergedIntoId: uuid.nullable().optional().transform((v) => v ?? null),
});

export type CategoryInput = z.output<typeof categorySchema>;

export const categorySetSchema = z
  .object({
    categories: z.array(categorySchema).max(200, "A show can have up to 200 categories."),
    overlap: z.enum(["flag", "firstByPrecedence"]),
    /** The fingerprint of the moves the chair saw; absent on the first try. */
    confirmMoves: storableString().max(40).optional(),
    /** Why, for the audit log (e.g. "merged the two small art categories"). */
    note: storableString().trim().max(300).default(""),
  })
  .superRefine((s, ctx) => {
    const seenCode = new Map<string, number>();
    const ids = new Set(s.categories.map((c) => c.id));
    s.categories.forEach((c, i) => {
      const key = c.code.toLowerCase();
      if (seenCode.has(key)) ctx.addIssue({ code: "custom", path: ["categories", i, "code"], message: `Code ${c.code} is used twice; codes must differ.` });
      seenCode.set(key, i);
      if (c.mergedIntoId && !ids.has(c.mergedIntoId)) ctx.addIssue({ code: "custom", path: ["categories", i, "mergedIntoId"], message: "It is merged into a category that isn't in the set." });
      if (c.mergedIntoId === c.id) ctx.addIssue({ code: "custom", path: ["categories", i, "mergedIntoId"], message: "A category can't be merged into itself." });
    });
    if (ids.size !== s.categories.length) ctx.addIssue({ code: "custom", path: ["categories"], message: "Two categories share an id." });
  });

export type CategorySetInput = z.output<typeof categorySetSchema>;

// The parsed condition is the engine's Condition type exactly.
export const asConditions = (c: CategoryInput["conditions"]): Condition[] => c as Condition[];

export const overrideSchema = z.object({
  entryId: uuid,
  /** A category id, or "rules" to hand the entry back to the rules. */
  categoryId: z.union([uuid, z.literal("rules")]),
  reason: storableString().trim().min(3, "Say why, in a few words (it goes in the audit log).").max(300, "Keep the reason to 300 characters."),
});

export const measureFields = z.object({
  entryId: uuid,
  width: storableString().trim().min(1, "Enter the measured width.").max(20),
  length: storableString().trim().min(1, "Enter the measured length.").max(20),
  unit: z.enum(["in", "cm"]),
});

/** Text that is not a length ("abc") gets the parser's own message beside its field, on the
 * tablet before sending and in the action alike. */
export function checkMeasuredLengths(v: { width: string; length: string; unit: "in" | "cm" }, ctx: z.RefinementCtx) {
  for (const field of ["width", "length"] as const) {
    if (!v[field]) continue;
    const parsed = parseLength(v[field], v.unit);
    if (!parsed.ok) ctx.addIssue({ code: "custom", path: [field], message: parsed.message });
  }
}

export const measureSchema = measureFields.superRefine(checkMeasuredLengths);

export const reviewSizeSchema = z.object({ entryId: uuid });

export const admitSchema = z.object({
  entryId: uuid,
  reason: storableString().trim().min(3, "Say why, in a few words (it goes in the audit log).").max(300),
});

export const toleranceSchema = z.object({
  tolerance: storableString().trim().min(1, "Enter the tolerance, e.g. 1 or 0.5."),
  unit: z.enum(["in", "cm"]),
});
