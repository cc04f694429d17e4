// An entry's history in plain words: what happened, which field, and each value as the committee
// reads it (sizes in inches and centimeters, money as money, choices by their labels). Pure.
import { entryStatusInfo } from "@/components/entries/entry-status";
import { DIVISION_LABELS, QUILTING_METHOD_LABELS, labelOf } from "@/components/entries/labels";
import { formatDateTime } from "@/components/format/dates";
import { UM_PER_CM, formatInches } from "@/scoring/units";

const ACTION_LABELS: Record<string, string> = {
  "entry.draft_created": "Entry started",
  "entry.quilt_saved": "Quilt details saved",
  "entry.makers_saved": "Makers saved",
  "entry.about_saved": "Story and value saved",
  "entry.submitted": "Sent to the show",
  "entry.paid": "Paid online",
  "entry.paid_offline": "Marked paid offline",
  "entry.accepted": "Accepted",
  "entry.declined": "Declined",
  "entry.decision_released": "Decision released to the entrant",
  "entry.withdrawn": "Withdrawn",
  "entry.admitted_from_waitlist": "Taken off the waiting list",
  "entry.photo_added": "Photo added",
  "entry.photo_replaced": "Photo replaced",
  "entry.category_decided": "Category decided",
  "entry.category_moved": "Category changed by new rules",
  "entry.category_overridden": "Category set by the chair",
  "entry.category_override_cleared": "Chair's category cleared",
  "entry.measured": "Measured at intake",
  "entry.size_flag_reviewed": "Size check reviewed",
  "entry.critique_requested": "Critique requested",
  "entry.critique_paid": "Critique paid",
  "entry.critique_cancelled": "Critique canceled",
  "entry.judge_anyway": "Judged despite a conflict",
  "entry.judge_anyway_removed": "Conflict allowance removed",
};

const FIELD_LABELS: Record<string, string> = {
  title: "Title",
  status: "Status",
  sizeUnit: "Size typed in",
  widthUm: "Width",
  lengthUm: "Length",
  measuredWidthUm: "Measured width",
  measuredLengthUm: "Measured length",
  techniques: "Techniques",
  madeBy: "Made by",
  quiltedBy: "Quilted by",
  quiltedForHire: "Quilted for hire",
  quiltingMethod: "Quilting",
  patternSource: "Pattern",
  patternName: "Pattern name",
  patternDesigner: "Pattern designer",
  statement: "Statement",
  declaredValueCents: "Declared value",
  forSale: "For sale",
  priceCents: "Price",
  judged: "Judged",
  division: "Division",
  youthAge: "Youth age",
  critiqueRequested: "Critique",
  decisionReason: "Reason",
  paidAt: "Paid",
  paymentReference: "Payment reference",
  decisionReleasedAt: "Released",
  reason: "Reason",
  refundCents: "Refund",
  withdrawnBy: "Withdrawn by",
  entryNumber: "Entry number",
  waitlisted: "Waiting list",
  waitlistReason: "Waiting list reason",
  category: "Category",
  categoryReasons: "Why",
  sizeFlag: "Size check",
};

/** Ids and engine states: the plain-word fields beside them say the same for people. */
const HIDDEN = new Set(["rulesVersionId", "categoryId", "categoryCandidateIds", "categoryState", "photoId", "id"]);

export const actionLabel = (action: string): string => ACTION_LABELS[action] ?? labelOf({}, action.replace(/^[a-z]+\./, ""));
export const fieldLabel = (key: string): string => FIELD_LABELS[key] ?? key.replace(/([A-Z])/g, " $1").replace(/^./, (c) => c.toUpperCase()).replace(/ (Um|Cents)$/, "");
export const shownField = (key: string): boolean => !HIDDEN.has(key);

type Ctx = { timeZone: string; currency: string };

export function fieldValue(key: string, value: unknown, { timeZone, currency }: Ctx): string {
  if (value === null || value === undefined || value === "") return "—";
  if (Array.isArray(value)) return value.length ? value.map((v) => (typeof v === "string" ? v : JSON.stringify(v))).join(", ") : "—";
  if (typeof value === "boolean") return value ? "Yes" : "No";
  if (key === "status") return entryStatusInfo(String(value)).label;
  if (key === "quiltingMethod") return labelOf(QUILTING_METHOD_LABELS, String(value));
  if (key === "division") return labelOf(DIVISION_LABELS, String(value));
  if (key === "sizeUnit") return value === "cm" ? "centimeters" : "inches";
  if (key === "patternSource") return value === "original" ? "Original design" : "From a pattern";
  if (key.endsWith("Um") && typeof value === "number") return `${formatInches(value)} (${(value / UM_PER_CM).toFixed(1)} cm)`;
  if (key.endsWith("Cents") && typeof value === "number") {
    return new Intl.NumberFormat("en-US", { style: "currency", currency: currency.toUpperCase() }).format(value / 100);
  }
  if (key.endsWith("At")) return formatDateTime(String(value), timeZone) ?? String(value);
  if (typeof value === "string") return value.replace(/_/g, " ");
  if (typeof value === "number") return String(value);
  return JSON.stringify(value);
}

/** The fields that changed, in the order they were written, without ids. */
export function changedFields(before: Record<string, unknown> | null, after: Record<string, unknown> | null): string[] {
  const keys = [...new Set([...Object.keys(after ?? {}), ...Object.keys(before ?? {})])];
  return keys.filter((k) => shownField(k) && JSON.stringify(before?.[k] ?? null) !== JSON.stringify(after?.[k] ?? null));
}

/** "Width: 50 in (127.0 cm)" for a value first set; "Status: Paid → Accepted" for a change. */
export function changeLine(key: string, before: Record<string, unknown> | null, after: Record<string, unknown> | null, ctx: Ctx): string {
  const to = fieldValue(key, after?.[key], ctx);
  if (before === null || !(key in before)) return `${fieldLabel(key)}: ${to}`;
  return `${fieldLabel(key)}: ${fieldValue(key, before[key], ctx)} → ${to}`;
}
