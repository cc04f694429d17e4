// Input schemas for a show's settings, shared by the chair's forms (react-hook-form), the server
// actions and the route handler. Forms send what was typed (strings); these turn it into cents,
// counts and instants' wall-clock text, with a message naming the field when it can't.
import { z } from "zod";
import { storableString } from "@/lib/validation";
import { parseLength } from "@/scoring/measure";

// ── Money: "25", "25.00", "$25", "1,250.50" → integer cents, by integer arithmetic only ─────────

export type ParsedMoney = { ok: true; cents: number } | { ok: false; message: string };

/** Our own sanity limit for one fee: $100,000 (a mistyped digit is likelier than such a fee). */
export const MAX_FEE_CENTS = 10_000_000;

/**
 * Reads a dollar amount as digits, never through a float: "19.99" is 19 × 100 + 99 = 1999 cents.
 * Thousands separators must be in the usual places; more than two decimals are refused.
 */
export function parseMoneyToCents(text: string): ParsedMoney {
  const s = text.normalize("NFC").replace(/[\s\u00a0]/g, "");
  if (s === "") return { ok: false, message: "Enter an amount in dollars, e.g. 25 or 25.00." };
  if (s.startsWith("-") || s.startsWith("−") || s.startsWith("$-")) return { ok: false, message: "The amount can't be negative." };
  const m = /^\$?((?:\d{1,3}(?:,\d{3})+)|\d+)?(?:\.(\d*))?$/.exec(s);
  if (!m || (m[1] === undefined && !m[2])) {
    return { ok: false, message: "Enter dollars and cents with digits only, e.g. 25, 25.00 or $25." };
  }
  const whole = (m[1] ?? "0").replace(/,/g, "");
  const frac = m[2] ?? "";
  if (frac.length > 2) return { ok: false, message: "Give at most two digits of cents, e.g. 19.99." };
  if (whole.length > 9) return { ok: false, message: "That amount is too large." };
  const cents = Number(whole) * 100 + Number(frac.padEnd(2, "0"));
  if (cents > MAX_FEE_CENTS) return { ok: false, message: "That amount is too large; fees here go up to $100,000." };
  return { ok: true, cents };
}

/** Integer cents → "25.00" for an input; the reverse of parseMoneyToCents. */
export function centsToInput(cents: number | null | undefined): string {
  if (cents === null || cents === undefined) return "";
  return `${Math.trunc(cents / 100)}.${String(cents % 100).padStart(2, "0")}`;
}

const text = z.union([storableString(), z.number()]).transform((v) => String(v));

/** A required dollar amount (0 allowed) → integer cents. */
const money = (label: string) =>
  text.transform((v, ctx) => {
    const r = parseMoneyToCents(v);
    if (r.ok) return r.cents;
    ctx.addIssue({ code: "custom", message: `${label}: ${r.message}` });
    return z.NEVER;
  });

/** An amount that may be left blank (no cap) → cents or null. */
const optionalMoney = (label: string) =>
  text.transform((v, ctx) => {
    if (v.trim() === "") return null;
    const r = parseMoneyToCents(v);
    if (r.ok) return r.cents;
    ctx.addIssue({ code: "custom", message: `${label}: ${r.message}` });
    return z.NEVER;
  });

/** A whole number in a range; blank is null when `optional`. */
function wholeNumber(label: string, min: number, max: number): z.ZodType<number, string | number>;
function wholeNumber(label: string, min: number, max: number, optional: true): z.ZodType<number | null, string | number>;
function wholeNumber(label: string, min: number, max: number, optional?: true): z.ZodType<number | null, string | number> {
  return text.transform((v, ctx): number | null => {
    const s = v.trim().replace(/,/g, "");
    if (s === "") {
      if (optional) return null;
      ctx.addIssue({ code: "custom", message: `${label}: enter a whole number.` });
      return z.NEVER;
    }
    if (!/^\d+$/.test(s)) {
      ctx.addIssue({ code: "custom", message: `${label}: enter a whole number${optional ? ", or leave it blank for no limit" : ""}.` });
      return z.NEVER;
    }
    const n = Number(s);
    if (n < min || n > max) {
      ctx.addIssue({ code: "custom", message: `${label}: enter a number from ${min.toLocaleString("en-US")} to ${max.toLocaleString("en-US")}.` });
      return z.NEVER;
    }
    return n;
  });
}

/** A checkbox from react-hook-form (boolean) or a plain form post ("on"). */
const checkbox = z.union([z.boolean(), storableString(), z.undefined()]).transform((v) => v === true || v === "on" || v === "true");

// ── Dates ───────────────────────────────────────────────────────────────────────────────────────

const LOCAL = /^\d{4}-\d{2}-\d{2}T\d{2}:\d{2}$/;

/** A datetime-local value in the show's zone ("2027-03-13T09:00"), or blank → null. */
const localTime = (label: string) =>
  z
    .union([storableString(), z.null(), z.undefined()])
    .transform((v, ctx) => {
      const s = (v ?? "").trim();
      if (s === "") return null;
      if (!LOCAL.test(s)) {
        ctx.addIssue({ code: "custom", message: `${label}: enter a date and time, e.g. 2027-03-13 09:00.` });
        return z.NEVER;
      }
      return s;
    });

export const DATE_FIELDS = {
  entryOpensAt: "Entries open",
  entryClosesAt: "Entries close",
  lateFeeFromAt: "Late fee from",
  dropOffStartsAt: "Drop-off starts",
  dropOffEndsAt: "Drop-off ends",
  judgingStartsAt: "Judging starts",
  judgingEndsAt: "Judging ends",
  showOpensAt: "Show opens",
  showClosesAt: "Show closes",
  pickUpStartsAt: "Pick-up starts",
  pickUpEndsAt: "Pick-up ends",
} as const;
export type DateField = keyof typeof DATE_FIELDS;

/**
 * Pairs whose second must come after their first (compared as wall-clock text, which sorts like
 * time within one zone). Between stages, the next may start the moment the last one ends.
 */
const ORDER: [DateField, DateField, "after" | "not_before"][] = [
  ["entryOpensAt", "entryClosesAt", "after"],
  ["entryOpensAt", "lateFeeFromAt", "after"],
  ["lateFeeFromAt", "entryClosesAt", "after"],
  ["dropOffStartsAt", "dropOffEndsAt", "after"],
  ["judgingStartsAt", "judgingEndsAt", "after"],
  ["showOpensAt", "showClosesAt", "after"],
  ["pickUpStartsAt", "pickUpEndsAt", "after"],
  ["entryClosesAt", "dropOffStartsAt", "not_before"],
  ["showClosesAt", "pickUpStartsAt", "not_before"],
];

export const datesSchema = z
  .object(Object.fromEntries(Object.entries(DATE_FIELDS).map(([k, label]) => [k, localTime(label)])) as Record<DateField, ReturnType<typeof localTime>>)
  .superRefine((d, ctx) => {
    for (const [a, b, rule] of ORDER) {
      const first = d[a];
      const second = d[b];
      if (!first || !second) continue;
      if (rule === "after" ? second <= first : second < first) {
        const word = rule === "after" ? "come after" : "not come before";
        ctx.addIssue({ code: "custom", path: [b], message: `${DATE_FIELDS[b]} must ${word} ${DATE_FIELDS[a].toLowerCase()}.` });
      }
    }
  });
export type DatesInput = z.output<typeof datesSchema>;
export type DatesFormValues = z.input<typeof datesSchema>;

// ── Fees, limits, photos, options: each section is saved on its own ─────────────────────────────

/** Members' e-mail addresses, one per line (or separated by commas), kept lower case and once each. */
const memberEmailList = z
  .string()
  .max(200_000, "Members' e-mail addresses: that list is too long.")
  .optional()
  .transform((v, ctx) => {
    if (v === undefined) return undefined;
    const list = [...new Set(v.split(/[\s,;]+/).map((e) => e.trim().toLowerCase()).filter(Boolean))];
    const bad = list.find((e) => e.length > 254 || !z.email().safeParse(e).success);
    if (bad) {
      ctx.addIssue({ code: "custom", message: `Members' e-mail addresses: "${bad.slice(0, 60)}" is not an e-mail address.` });
      return z.NEVER;
    }
    if (list.length > 5000) {
      ctx.addIssue({ code: "custom", message: "Members' e-mail addresses: list at most 5,000." });
      return z.NEVER;
    }
    return list;
  });

export const feesSchema = z
  .object({
    section: z.literal("fees"),
    entryFeeCents: money("Entry fee"),
    memberEntryFeeCents: money("Member entry fee"),
    lateFeeCents: money("Late fee"),
    critiqueFeeCents: money("Critique fee"),
    feeCapCents: optionalMoney("Fee cap per entrant"),
    withdrawalRefundPercent: wholeNumber("Refund on withdrawal", 0, 100),
    memberEmails: memberEmailList,
  })
  .superRefine((f, ctx) => {
    if (f.memberEntryFeeCents > f.entryFeeCents) {
      ctx.addIssue({ code: "custom", path: ["memberEntryFeeCents"], message: "Member entry fee: the member rate can't be more than the entry fee." });
    }
    if (f.feeCapCents !== null && f.feeCapCents < Math.max(f.entryFeeCents, f.memberEntryFeeCents)) {
      ctx.addIssue({ code: "custom", path: ["feeCapCents"], message: "Fee cap per entrant: the cap can't be less than one entry fee; leave it blank for no cap." });
    }
  })
  // A save without the list (an older form, a script) leaves the saved list alone.
  .transform(({ memberEmails, ...rest }) => (memberEmails === undefined ? rest : { ...rest, memberEmails }));

/** "12" or "12.5" inches → µm; blank = no minimum. */
const smallestSide = z
  .string()
  .max(40)
  .optional()
  .transform((v, ctx): number | null | undefined => {
    if (v === undefined) return undefined;
    const s = v.trim();
    if (s === "") return null;
    const parsed = parseLength(s, "in");
    if (!parsed.ok || parsed.um > 100 * 25_400) {
      ctx.addIssue({ code: "custom", message: "Smallest quilt side: enter inches from 1 to 100, e.g. 12 or 12.5, or leave it blank." });
      return z.NEVER;
    }
    return parsed.um;
  });

export const limitsSchema = z.object({
  section: z.literal("limits"),
  maxEntriesPerEntrant: wholeNumber("Entries per entrant", 1, 1000, true),
  maxEntriesPerCategory: wholeNumber("Entries per entrant in one category", 1, 1000, true),
  capacity: wholeNumber("Total capacity", 1, 100_000, true),
  minQuiltSideUm: smallestSide,
});

export const PHOTO_VIEWS = ["full", "detail"] as const;
export const PHOTO_VIEW_LABELS: Record<(typeof PHOTO_VIEWS)[number], string> = { full: "Full view", detail: "Detail view" };

/** "5" or "2.5" megabytes (1 MB = 1,000,000 bytes, as cameras and phones count) → bytes. */
const megabytes = text.transform((v, ctx) => {
  const m = /^(\d{1,3})(?:\.(\d))?$/.exec(v.trim());
  const bytes = m ? Number(m[1]) * 1_000_000 + Number(m[2] ?? "0") * 100_000 : NaN;
  if (!m || bytes < 100_000 || bytes > 100_000_000) {
    ctx.addIssue({ code: "custom", message: "Largest photo file: enter megabytes from 0.1 to 100, e.g. 5." });
    return z.NEVER;
  }
  return bytes;
});

export const photosSchema = z
  .object({
    section: z.literal("photos"),
    requireFullView: checkbox,
    requireDetailView: checkbox,
    photoMinWidthPx: wholeNumber("Smallest photo width", 100, 20_000),
    photoMinHeightPx: wholeNumber("Smallest photo height", 100, 20_000),
    photoMaxBytes: megabytes,
    statementWordLimit: wholeNumber("Statement word limit", 0, 2000),
    techniques: text.transform((v, ctx) => {
      const seen = new Set<string>();
      const list: string[] = [];
      for (const line of v.split(/\r?\n/)) {
        const t = line.trim().replace(/\s+/g, " ");
        if (!t || seen.has(t.toLowerCase())) continue;
        if (t.length > 60) {
          ctx.addIssue({ code: "custom", message: `Techniques: "${t.slice(0, 20)}…" is longer than 60 characters.` });
          return z.NEVER;
        }
        seen.add(t.toLowerCase());
        list.push(t);
      }
      if (list.length === 0) {
        ctx.addIssue({ code: "custom", message: "Techniques: list at least one, one per line." });
        return z.NEVER;
      }
      if (list.length > 50) {
        ctx.addIssue({ code: "custom", message: "Techniques: list at most 50." });
        return z.NEVER;
      }
      return list;
    }),
  })
  .transform(({ requireFullView, requireDetailView, ...rest }) => ({
    ...rest,
    requiredPhotoViews: PHOTO_VIEWS.filter((v) => (v === "full" ? requireFullView : requireDetailView)),
  }));

export const optionsSchema = z.object({
  section: z.literal("options"),
  juried: checkbox,
  publishNames: checkbox,
  replyToEmail: z
    .string()
    .trim()
    .toLowerCase()
    .refine((v) => v === "" || z.email().safeParse(v).success, "Reply-to address: enter an e-mail address like show@example.org, or leave it blank."),
});

export const settingsSectionSchema = z.discriminatedUnion("section", [feesSchema, limitsSchema, photosSchema, optionsSchema]);
export type SettingsSectionInput = z.output<typeof settingsSectionSchema>;
export type FeesFormValues = z.input<typeof feesSchema>;
export type LimitsFormValues = z.input<typeof limitsSchema>;
export type PhotosFormValues = z.input<typeof photosSchema>;
export type OptionsFormValues = z.input<typeof optionsSchema>;

// ── Rules and status ────────────────────────────────────────────────────────────────────────────

export const publishRulesSchema = z.object({
  rulesText: storableString().trim().min(20, "Rules: write at least a few sentences (20 characters or more).").max(50_000, "Rules: at most 50,000 characters."),
  releaseText: storableString().trim().min(20, "Release: write at least a few sentences (20 characters or more).").max(20_000, "Release: at most 20,000 characters."),
});
export type PublishRulesInput = z.output<typeof publishRulesSchema>;

export const SHOW_STATUSES = ["draft", "entries_open", "entries_closed", "judging", "results_published", "archived"] as const;
export type ShowStatusValue = (typeof SHOW_STATUSES)[number];

/** The moves a chair may make: the usual next step first, then the step back (with a reason). */
export const STATUS_MOVES: Record<ShowStatusValue, readonly ShowStatusValue[]> = {
  draft: ["entries_open"],
  entries_open: ["entries_closed"],
  entries_closed: ["judging", "entries_open"],
  // Results go out (and come down) from the Results page, which checks every sheet first.
  judging: ["entries_closed"],
  results_published: ["archived"],
  archived: [],
};

export const statusChangeSchema = z.object({
  status: z.enum(SHOW_STATUSES, "Status: choose one of the show's stages."),
  /** Needed for a step back, or to go ahead despite warnings; kept in the audit row. */
  reason: storableString().trim().max(2000, "Reason: at most 2,000 characters.").optional(),
});
export type StatusChangeInput = z.output<typeof statusChangeSchema>;
