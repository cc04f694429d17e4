// The entry form's schemas, one per step, shared by the form (react-hook-form resolver), the
// server actions and the route handlers. Client-safe: no Drizzle. Values stay as typed (lengths
// and dollars as text) so a parsed value parses again; the conversions below turn them into µm
// and cents for the database.
import { z } from "zod";
import { INT4_MAX, storableString } from "@/lib/validation";
import { PHOTO_FORMATS, photoFormatWords } from "@/lib/photo-formats";
import { countWords } from "@/scoring/entry-completeness";
import { parseLength, type LengthUnit } from "@/scoring/measure";

const id = z.uuid("This entry link is not valid.");
const text = (max: number, label: string) => storableString().trim().max(max, `Keep ${label} under ${max} characters.`);

// ---- Step 1: the quilt -------------------------------------------------------------------------

export const quiltStepSchema = z
  .object({
    title: text(120, "the title").min(1, "Give the quilt's title."),
    sizeUnit: z.enum(["in", "cm"], "Choose inches or centimetres."),
    width: storableString().trim().max(40),
    length: storableString().trim().max(40),
    // A lone checkbox (a show listing one technique) or a FormData post gives a string or false.
    techniques: z.preprocess(
      (v) => (typeof v === "string" ? [v] : v === false || v === undefined || v === null ? [] : v),
      z.array(storableString().trim().min(1).max(60)).max(20).min(1, "Tick at least one technique."),
    ),
  })
  .superRefine((v, ctx) => {
    for (const key of ["width", "length"] as const) {
      const parsed = parseLength(v[key], v.sizeUnit);
      if (!parsed.ok) ctx.addIssue({ code: "custom", path: [key], message: `${key === "width" ? "Width" : "Length"}: ${parsed.message}` });
    }
  });
export type QuiltStepInput = z.input<typeof quiltStepSchema>;

/** Width and length in µm from a valid quilt step (the schema has already checked them). */
export function quiltSizeUm(v: { width: string; length: string; sizeUnit: LengthUnit }): { widthUm: number; lengthUm: number } {
  const w = parseLength(v.width, v.sizeUnit);
  const l = parseLength(v.length, v.sizeUnit);
  if (!w.ok || !l.ok) throw new Error("quiltSizeUm: lengths were not validated");
  return { widthUm: w.um, lengthUm: l.um };
}

// ---- Step 2: the makers ------------------------------------------------------------------------

export const QUILTED_BY = ["self", "other", "hire"] as const;
export const QUILTING_METHODS = ["hand", "home_machine", "frame_machine"] as const;

export const makersStepSchema = z
  .object({
    madeBy: z
      .array(z.object({ name: text(80, "each name") }))
      .max(12, "List at most 12 makers.")
      .transform((rows) => rows.filter((r) => r.name !== ""))
      .refine((rows) => rows.length > 0, "Give the name of at least one maker."),
    quiltedByKind: z.enum(QUILTED_BY, "Say who quilted it."),
    quiltedByName: text(80, "the quilter's name"),
    quiltingMethod: z.enum(QUILTING_METHODS, "Choose how it was quilted."),
    patternSource: z.enum(["original", "pattern"], "Say whether the design is your own or from a pattern."),
    patternName: text(120, "the pattern's name"),
    patternDesigner: text(80, "the designer's name"),
  })
  .superRefine((v, ctx) => {
    if (v.quiltedByKind !== "self" && v.quiltedByName === "") {
      ctx.addIssue({ code: "custom", path: ["quiltedByName"], message: "Give the quilter's name." });
    }
    if (v.patternSource === "pattern") {
      if (v.patternName === "") ctx.addIssue({ code: "custom", path: ["patternName"], message: "Give the pattern's or design's name." });
      if (v.patternDesigner === "") ctx.addIssue({ code: "custom", path: ["patternDesigner"], message: "Credit the designer." });
    }
  });
export type MakersStepInput = z.input<typeof makersStepSchema>;

// ---- Step 3: about the quilt -------------------------------------------------------------------

/** "1,250", "$1250.50" → cents; null when it isn't an amount of dollars and cents. */
export function dollarsToCents(text: string): number | null {
  const m = /^\$?\s*(\d{1,3}(?:,\d{3})+|\d+)(?:\.(\d{1,2}))?$/.exec(text.trim());
  if (!m) return null;
  const dollars = Number(m[1]!.replace(/,/g, ""));
  const cents = Number((m[2] ?? "").padEnd(2, "0"));
  const total = dollars * 100 + cents;
  return Number.isSafeInteger(total) ? total : null;
}

/** Cents → "1250" or "1250.50", for putting a stored amount back into a field. */
export function centsForInput(cents: number | null): string {
  if (cents === null || cents <= 0) return "";
  const rest = cents % 100;
  return rest ? `${Math.floor(cents / 100)}.${String(rest).padStart(2, "0")}` : String(cents / 100);
}

/** Our own sanity limit: a declared value above $10 million is a slipped key. */
const MAX_VALUE_CENTS = 1_000_000_000;

/** What is wrong with an amount of dollars typed in a field, or null when it is fine. */
function moneyIssue(v: string, label: string, required: boolean): string | null {
  if (v === "" && !required) return null;
  const cents = dollarsToCents(v);
  if (cents === null) return `Give ${label} in dollars, e.g. 1200 or 1,250.50.`;
  if (cents <= 0) return `${label[0]!.toUpperCase()}${label.slice(1)} must be more than $0.`;
  if (cents > MAX_VALUE_CENTS) return `That's over $10,000,000: check ${label}.`;
  return null;
}

const money = (label: string, required: boolean) =>
  z
    .string()
    .trim()
    .max(20)
    .superRefine((v, ctx) => {
      const message = moneyIssue(v, label, required);
      if (message) ctx.addIssue({ code: "custom", message });
    });

export const aboutStepSchema = z
  .object({
    statement: storableString().trim().max(5000, "Keep the statement under 5,000 characters.").min(1, "Write a short artist statement."),
    declaredValue: money("the declared value", true),
    forSale: z.boolean(),
    // Checked only while "for sale" is ticked: a field the form hides never blocks a save.
    price: z.string().trim(),
    judged: z.enum(["judged", "display"], "Choose judged or display only."),
    division: z.enum(["open", "youth", "first_time"], "Choose a division."),
    // Checked only for the youth division, the only time the form shows it.
    youthAge: z.string().trim(),
    /** Asks for a judge's critique (the show's critique fee is charged in checkout). */
    critiqueRequested: z.boolean().optional(),
  })
  .superRefine((v, ctx) => {
    if (v.forSale) {
      const message = v.price.length > 20 ? "Give the price in dollars, e.g. 1200 or 1,250.50." : moneyIssue(v.price, "the price", false);
      if (message) ctx.addIssue({ code: "custom", path: ["price"], message });
    }
    if (v.division === "youth") {
      const age = Number(v.youthAge);
      if (!/^\d{1,2}$/.test(v.youthAge) || age < 3 || age > 18) {
        ctx.addIssue({ code: "custom", path: ["youthAge"], message: "Give the youth entrant's age (3 to 18)." });
      }
    }
  });
export type AboutStepInput = z.input<typeof aboutStepSchema>;

/** The about step with this show's statement word limit; the server parses with the same one. */
export function aboutStepSchemaFor(wordLimit: number) {
  return aboutStepSchema.superRefine((v, ctx) => {
    const words = countWords(v.statement);
    if (words > wordLimit) {
      ctx.addIssue({ code: "custom", path: ["statement"], message: `The statement has ${words} words; this show allows ${wordLimit}.` });
    }
  });
}

// ---- Step 5: review and submit -----------------------------------------------------------------

export const submitSchema = z.object({
  acceptRules: z.literal(true, "Tick the box to accept the show's rules and release."),
  /** The rules version the entrant read; empty when the show has published none. */
  rulesVersionId: z.union([z.uuid(), z.literal("")]),
});
export type SubmitInput = z.input<typeof submitSchema>;

// ---- Actions and routes: the same schemas with the entry they act on ----------------------------

export const quiltActionSchema = quiltStepSchema.extend({ entryId: id });
export const makersActionSchema = makersStepSchema.extend({ entryId: id });
export const aboutActionSchema = aboutStepSchema.extend({ entryId: id });
export const submitActionSchema = submitSchema.extend({ entryId: id });

export const PHOTO_VIEWS = ["full", "detail", "other"] as const;
export type PhotoView = (typeof PHOTO_VIEWS)[number];
export const PHOTO_CONTENT_TYPES = ["image/jpeg", "image/png", "image/webp", "image/heic", "image/heif"] as const;
const ALL_PHOTO_FORMATS = photoFormatWords(PHOTO_FORMATS.map((f) => f.label));

export const presignPhotoSchema = z.object({
  view: z.enum(PHOTO_VIEWS, "Choose which view this photo is."),
  contentType: z.enum(PHOTO_CONTENT_TYPES, `Upload a ${ALL_PHOTO_FORMATS} photo.`),
  bytes: z.number().int().positive("The file is empty.").max(INT4_MAX, "That file is too large."),
});
export const attachPhotoSchema = z.object({ uploadKey: storableString().min(1).max(300) });
export const PHOTO_SIZES = ["thumb", "web", "original"] as const;
export type PhotoSize = (typeof PHOTO_SIZES)[number];

// ---- What the form shows ------------------------------------------------------------------------

export type EntryPhotoView = { id: string; view: string; widthPx: number; heightPx: number; bytes: number };
