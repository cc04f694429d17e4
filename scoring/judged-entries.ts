// Who is judged, in one rule: an entry reaches the judges' lists when it is sent and still in the
// show, entered for judging (not display-only), cleared (paid; at a juried show accepted) and,
// once the drop-off check-in exists, received — or when the chair recorded an exception for it.
// db/queries/judged-entries.ts says the same in SQL for every list; this one is for tests and screens.

/** Statuses that are out of judging whatever else holds. */
export const NEVER_JUDGED = ["draft", "withdrawn", "declined"] as const;
/** Statuses a juried show's accepted entry can have (accepted, then on through the show). */
export const ACCEPTED_OR_LATER = ["accepted", "received", "judged", "hung", "returned"] as const;
/**
 * The drop-off check-in does not exist yet, so "received" is not required. When it does, set this
 * to true and make `isReceived` (and `receivedSql` in db/queries/judged-entries.ts) read it.
 */
export const RECEIPT_REQUIRED = false;

export type JudgedEntryFacts = {
  status: string;
  judged: boolean;
  entryNumber: number | null;
  paidAt: Date | null;
  judgeAnywayAt: Date | null;
};

export function isReceived(_e: JudgedEntryFacts): boolean {
  return true;
}

/** Paid (or accepted, at a juried show) and, once check-in exists, received. */
export function isCleared(e: JudgedEntryFacts, juried: boolean): boolean {
  const paidOrAccepted = juried ? (ACCEPTED_OR_LATER as readonly string[]).includes(e.status) : e.paidAt !== null;
  return paidOrAccepted && (!RECEIPT_REQUIRED || isReceived(e));
}

export function isJudgedEntry(e: JudgedEntryFacts, juried: boolean): boolean {
  if ((NEVER_JUDGED as readonly string[]).includes(e.status) || !e.judged || e.entryNumber === null) return false;
  return isCleared(e, juried) || e.judgeAnywayAt !== null;
}

/** A category for display-only quilts (its rules take only entries not judged): it needs no panel. */
export function isDisplayOnlyCategory(conditions: readonly { kind: string; value?: unknown }[] | null | undefined): boolean {
  return (conditions ?? []).some((c) => c.kind === "judged" && c.value === false);
}
