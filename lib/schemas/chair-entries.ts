// Input schemas for the chair's entries table and its bulk actions, shared by the client island,
// the route handler and the server actions.
import { z } from "zod";
import { storableString } from "@/lib/validation";

/** Statuses a chair sees in the table; drafts are the entrant's own unfinished work. */
export const CHAIR_STATUSES = ["submitted", "paid", "accepted", "declined", "received", "judged", "hung", "returned", "withdrawn"] as const;
export const PAYMENT_STATES = ["paid", "unpaid", "refunded"] as const;
export const DIVISIONS = ["open", "youth", "first_time"] as const;
export const SORT_KEYS = ["number", "title", "entrant", "category", "size", "submitted", "status"] as const;
export const PAGE_SIZES = [25, 50, 100, 200] as const;

export type PaymentState = (typeof PAYMENT_STATES)[number];
export type SortKey = (typeof SORT_KEYS)[number];

// An empty select sends "", which means "any".
const anyOf = <T extends readonly [string, ...string[]]>(values: T, message: string) =>
  z.preprocess((v) => (v === "" ? undefined : v), z.enum(values, message).optional());

export const entriesListSchema = z.object({
  q: storableString().trim().max(200, "Search at most 200 characters.").default(""),
  status: anyOf(CHAIR_STATUSES, "Choose a status from the list."),
  payment: anyOf(PAYMENT_STATES, "Choose paid, unpaid or refunded."),
  division: anyOf(DIVISIONS, "Choose a division from the list."),
  // A category's id, or "none" for entries not in a category yet.
  category: z.preprocess((v) => (v === "" ? undefined : v), z.union([z.literal("none"), z.uuid()], "Choose a category from the list.").optional()),
  judged: anyOf(["judged", "display"] as const, "Choose judged or display only."),
  sort: z.enum(SORT_KEYS, "Sort by number, title, entrant, category, size, submitted date or status.").default("number"),
  dir: z.enum(["asc", "desc"], "Sort direction is asc or desc.").default("asc"),
  limit: z.coerce.number("Page size must be a number.").int().min(1, "Page size is at least 1.").max(200, "Page size is at most 200.").default(50),
  offset: z.coerce.number("The page start must be a number.").int().min(0, "The page start cannot be negative.").max(1_000_000).default(0),
});
export type EntriesListInput = z.input<typeof entriesListSchema>;
export type EntriesListQuery = z.output<typeof entriesListSchema>;
export const DEFAULT_ENTRIES_QUERY: EntriesListQuery = { q: "", sort: "number", dir: "asc", limit: 50, offset: 0 };

// FormData sends one id as a string and several as an array.
const entryIds = z.preprocess(
  (v) => (typeof v === "string" ? v.split(",").filter(Boolean) : v),
  z.array(z.uuid("An entry id is not valid."), "Choose at least one entry.").min(1, "Choose at least one entry.").max(1000, "Choose at most 1,000 entries at once."),
);
const showSlug = storableString().min(1, "The show is missing.").max(120);

export const acceptEntriesSchema = z.object({ showSlug, entryIds });
export const declineEntriesSchema = z.object({
  showSlug,
  entryIds,
  reason: storableString("Give a reason for declining.").trim().min(1, "Give a reason for declining; the entrant reads it.").max(1000, "Keep the reason under 1,000 characters."),
});
export const markPaidOfflineSchema = z.object({
  showSlug,
  entryIds,
  reference: storableString("Give the cash or cheque reference.").trim().min(1, "Give the cash or cheque reference, e.g. “cheque 1042”.").max(200, "Keep the reference under 200 characters."),
});
export const releaseDecisionsSchema = z.object({ showSlug });

export type DeclineEntriesInput = z.input<typeof declineEntriesSchema>;
export type MarkPaidOfflineInput = z.input<typeof markPaidOfflineSchema>;
