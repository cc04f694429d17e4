// Withdrawing an entry, and the refund it gives: the show's percent of the entry fee charged by
// card, refunded through the payments provider and recorded on the payment. The entrant may
// withdraw while the show takes entries; after that only the chair, with a reason.
import "server-only";
import { and, eq, inArray } from "drizzle-orm";
import { db, type Tx } from "@/db/client";
import { writeAudit } from "@/db/queries/audit";
import { expireOpenPaymentsFor } from "@/db/queries/payments";
import { settingsForShowId } from "@/db/queries/settings";
import { entries, paymentItems, payments, shows } from "@/db/schema";
import { conflict, notFound } from "@/lib/errors";
import { isUuid } from "@/lib/ids";
import { stripe } from "@/lib/payments";
import { requireShowRole, type Viewer } from "@/lib/session";
import { formatMoney, withdrawalRefundCents } from "@/scoring/fees";
import { errorSummary } from "@/lib/error-log";

const WITHDRAWABLE = new Set(["submitted", "paid", "accepted"]);
/** The chair may also take out a quilt already at the show (checked in, judged, hanging). */
const CHAIR_WITHDRAWABLE = new Set([...WITHDRAWABLE, "received", "judged", "hung"]);
/** Show statuses in which the show still takes entries. */
const TAKING_ENTRIES = new Set(["draft", "entries_open"]);
/** Once results are out, taking an entry out would change what was published. */
const RESULTS_OUT = new Set(["results_published", "archived"]);

/** Whether the chair's page offers "Withdraw": the same rule `withdrawEntryAsChair` enforces. */
export function chairMayWithdraw(showStatus: string, entryStatus: string): boolean {
  return !RESULTS_OUT.has(showStatus) && CHAIR_WITHDRAWABLE.has(entryStatus);
}

export const ENTRIES_CLOSED_MESSAGE = "Entries are closed; ask the show chair to withdraw this quilt.";

/**
 * Whether the entrant may withdraw their own entry now: only while the show takes entries, by
 * its status (entries closed, judging and later refuse) and by the closing time, whichever is first.
 */
export function entrantMayWithdraw(show: { status: string; entryClosesAt: Date | null }, now: Date): boolean {
  return TAKING_ENTRIES.has(show.status) && (!show.entryClosesAt || now.getTime() < show.entryClosesAt.getTime());
}

/** The refund a withdrawal would give now: the show's percent of the entry fee charged by card. */
export async function refundIfWithdrawn(reader: Pick<Tx, "select">, entryId: string, refundPercent: number) {
  const lines = await reader
    .select({ paymentId: payments.id, amountCents: paymentItems.amountCents, kind: paymentItems.kind })
    .from(paymentItems)
    .innerJoin(payments, eq(payments.id, paymentItems.paymentId))
    .where(and(eq(paymentItems.entryId, entryId), inArray(payments.status, ["paid", "partially_refunded"])));
  const entryFee = lines.find((l) => l.kind === "entry");
  if (!entryFee) return null;
  return { paymentId: entryFee.paymentId, refundCents: withdrawalRefundCents(entryFee.amountCents, refundPercent) };
}

export type Withdrawal = { entryNumber: number | null; refundCents: number; currency: string; message: string };

type LockedEntry = { id: string; showId: string; status: string; entryNumber: number | null; paymentReference: string; paidAt: Date | null };

const lockedEntryColumns = {
  id: entries.id,
  showId: entries.showId,
  status: entries.status,
  entryNumber: entries.entryNumber,
  paymentReference: entries.paymentReference,
  paidAt: entries.paidAt,
  showStatus: shows.status,
  closesAt: shows.entryClosesAt,
};

/**
 * The entrant withdraws one of their entries while the show takes entries. The entry keeps its
 * number (numbers are never reused). When it was paid by card, the show's share is refunded through
 * the provider inside the transaction: if the provider refuses, nothing is withdrawn. The
 * idempotency key is the entry's id, so a retry after a lost answer never refunds twice.
 */
export async function withdrawEntry(viewer: Viewer, entryId: string, now = new Date()): Promise<Withdrawal> {
  if (!isUuid(entryId)) throw notFound("That entry was not found among yours.");
  return db.transaction(async (tx) => {
    const [entry] = await tx
      .select(lockedEntryColumns)
      .from(entries)
      .innerJoin(shows, eq(shows.id, entries.showId))
      .where(and(eq(entries.id, entryId), eq(entries.entrantUserId, viewer.id)))
      .for("update", { of: entries });
    if (!entry) throw notFound("That entry was not found among yours.");
    if (entry.status === "withdrawn") throw conflict("This entry is already withdrawn.");
    if (!WITHDRAWABLE.has(entry.status)) {
      throw conflict(entry.status === "draft" ? "This entry has not been sent yet; there is nothing to withdraw." : `This entry is ${entry.status}; please contact the show to take it out.`);
    }
    if (!entrantMayWithdraw({ status: entry.showStatus, entryClosesAt: entry.closesAt }, now)) throw conflict(ENTRIES_CLOSED_MESSAGE);
    return withdrawTx(tx, viewer, entry, now, null);
  });
}

/**
 * The chair takes an entry out of the show at any time before results are out, with a reason kept
 * in the audit row. The refund follows the same rule as the entrant's own withdrawal.
 */
export async function withdrawEntryAsChair(viewer: Viewer, showSlug: string, entryId: string, reason: string, now = new Date()): Promise<Withdrawal> {
  const show = await requireShowRole(viewer, showSlug, ["chair"]);
  if (!isUuid(entryId)) throw notFound("That entry was not found at this show.");
  return db.transaction(async (tx) => {
    const [entry] = await tx
      .select(lockedEntryColumns)
      .from(entries)
      .innerJoin(shows, eq(shows.id, entries.showId))
      .where(and(eq(entries.id, entryId), eq(entries.showId, show.showId)))
      .for("update", { of: entries });
    if (!entry || entry.status === "draft") throw notFound("That entry was not found at this show.");
    if (entry.status === "withdrawn") throw conflict("This entry is already withdrawn.");
    if (RESULTS_OUT.has(entry.showStatus)) throw conflict("The results are out, so entries can no longer be withdrawn.");
    if (!CHAIR_WITHDRAWABLE.has(entry.status)) throw conflict(`This entry is ${entry.status}, so there is nothing to withdraw.`);
    return withdrawTx(tx, viewer, entry, now, reason);
  });
}

/** Refund (card payments), the status change and the audit rows, inside the caller's transaction. */
async function withdrawTx(tx: Tx, viewer: Viewer, entry: LockedEntry, now: Date, chairReason: string | null): Promise<Withdrawal> {
  const settings = await settingsForShowId(entry.showId, tx);
  await expireOpenPaymentsFor(tx, viewer.id, [entry.id]);

  let refundCents = 0;
  if (entry.paymentReference.startsWith("card ")) {
    const refund = await refundIfWithdrawn(tx, entry.id, settings.withdrawalRefundPercent);
    if (refund && refund.refundCents > 0) {
      refundCents = refund.refundCents;
      const [p] = await tx.select({ amountCents: payments.amountCents, refundedCents: payments.refundedCents, status: payments.status }).from(payments).where(eq(payments.id, refund.paymentId)).for("update");
      const paymentIntent = entry.paymentReference.slice("card ".length);
      try {
        await stripe.refunds.create(
          { payment_intent: paymentIntent, amount: refundCents, metadata: { entryId: entry.id, reason: "withdrawn" } },
          { idempotencyKey: `withdraw-${entry.id}` },
        );
      } catch (err) {
        console.error("[withdraw] refund failed", errorSummary(err));
        throw conflict("The refund could not be made just now, so the entry is not withdrawn yet. Please try again in a few minutes.");
      }
      const refunded = Math.min(p!.amountCents, p!.refundedCents + refundCents);
      const status = refunded >= p!.amountCents ? "refunded" : "partially_refunded";
      await tx.update(payments).set({ refundedCents: refunded, status }).where(eq(payments.id, refund.paymentId));
      await writeAudit(tx, { actorUserId: viewer.id, showId: entry.showId, action: "payment.refunded", subjectType: "payment", subjectId: refund.paymentId, before: { refundedCents: p!.refundedCents, status: p!.status }, after: { refundedCents: refunded, status, entryId: entry.id } });
    }
  }
  await tx.update(entries).set({ status: "withdrawn", withdrawnAt: now, updatedAt: now }).where(eq(entries.id, entry.id));
  await writeAudit(tx, {
    actorUserId: viewer.id,
    showId: entry.showId,
    action: "entry.withdrawn",
    subjectType: "entry",
    subjectId: entry.id,
    before: { status: entry.status },
    after: { status: "withdrawn", refundCents, ...(chairReason === null ? {} : { withdrawnBy: "chair", reason: chairReason }) },
  });

  const label = entry.entryNumber === null ? "The entry" : `Entry ${entry.entryNumber}`;
  const toWhom = chairReason === null ? "your" : "the entrant's";
  const message =
    refundCents > 0
      ? `${label} is withdrawn. A refund of ${formatMoney(refundCents, settings.currency)} is on its way to ${toWhom} card.`
      : entry.paidAt && !entry.paymentReference.startsWith("card ")
        ? chairReason === null
          ? `${label} is withdrawn. Please ask the show about any refund of what you paid in person.`
          : `${label} is withdrawn. It was paid in person: any refund is for the treasurer to make.`
        : `${label} is withdrawn.`;
  return { entryNumber: entry.entryNumber, refundCents, currency: settings.currency, message };
}
