// Withdrawing an entry before entries close, and the refund it gives: the show's percent of the
// entry fee charged by card, refunded through the payments provider and recorded on the payment.
import "server-only";
import { and, eq, inArray } from "drizzle-orm";
import { db, type Tx } from "@/db/client";
import { writeAudit } from "@/db/queries/audit";
import { expireOpenPaymentsFor } from "@/db/queries/payments";
import { settingsForShowId } from "@/db/queries/settings";
import { entries, paymentItems, payments, shows } from "@/db/schema";
import { formatDateTime } from "@/components/format/dates";
import { conflict, notFound } from "@/lib/errors";
import { stripe } from "@/lib/payments";
import type { Viewer } from "@/lib/session";
import { formatMoney, withdrawalRefundCents } from "@/scoring/fees";

const WITHDRAWABLE = new Set(["submitted", "paid", "accepted"]);

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

/**
 * The entrant withdraws one of their entries before entries close. The entry keeps its number
 * (numbers are never reused). When it was paid by card, the show's share is refunded through the
 * provider inside the transaction: if the provider refuses, nothing is withdrawn. The idempotency
 * key is the entry's id, so a retry after a lost answer never refunds twice.
 */
export async function withdrawEntry(viewer: Viewer, entryId: string, now = new Date()): Promise<Withdrawal> {
  return db.transaction(async (tx) => {
    const [entry] = await tx
      .select({ id: entries.id, showId: entries.showId, status: entries.status, entryNumber: entries.entryNumber, paymentReference: entries.paymentReference, paidAt: entries.paidAt, closesAt: shows.entryClosesAt, timeZone: shows.timeZone })
      .from(entries)
      .innerJoin(shows, eq(shows.id, entries.showId))
      .where(and(eq(entries.id, entryId), eq(entries.entrantUserId, viewer.id)))
      .for("update", { of: entries });
    if (!entry) throw notFound("That entry was not found among yours.");
    if (entry.status === "withdrawn") throw conflict("This entry is already withdrawn.");
    if (!WITHDRAWABLE.has(entry.status)) {
      throw conflict(entry.status === "draft" ? "This entry has not been sent yet; there is nothing to withdraw." : `This entry is ${entry.status}; please contact the show to take it out.`);
    }
    if (entry.closesAt && now.getTime() >= entry.closesAt.getTime()) {
      throw conflict(`Entries closed on ${formatDateTime(entry.closesAt, entry.timeZone)}, so withdrawals can no longer be made here. Please contact the show.`);
    }
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
          console.error("[withdraw] refund failed", err);
          throw conflict("The refund could not be made just now, so the entry is not withdrawn yet. Please try again in a few minutes.");
        }
        const refunded = Math.min(p!.amountCents, p!.refundedCents + refundCents);
        const status = refunded >= p!.amountCents ? "refunded" : "partially_refunded";
        await tx.update(payments).set({ refundedCents: refunded, status }).where(eq(payments.id, refund.paymentId));
        await writeAudit(tx, { actorUserId: viewer.id, showId: entry.showId, action: "payment.refunded", subjectType: "payment", subjectId: refund.paymentId, before: { refundedCents: p!.refundedCents, status: p!.status }, after: { refundedCents: refunded, status, entryId: entry.id } });
      }
    }
    await tx.update(entries).set({ status: "withdrawn", withdrawnAt: now, updatedAt: now }).where(eq(entries.id, entry.id));
    await writeAudit(tx, { actorUserId: viewer.id, showId: entry.showId, action: "entry.withdrawn", subjectType: "entry", subjectId: entry.id, before: { status: entry.status }, after: { status: "withdrawn", refundCents } });

    const label = entry.entryNumber === null ? "The entry" : `Entry ${entry.entryNumber}`;
    const message =
      refundCents > 0
        ? `${label} is withdrawn. A refund of ${formatMoney(refundCents, settings.currency)} is on its way to your card.`
        : entry.paidAt && !entry.paymentReference.startsWith("card ")
          ? `${label} is withdrawn. Please ask the show about any refund of what you paid in person.`
          : `${label} is withdrawn.`;
    return { entryNumber: entry.entryNumber, refundCents, currency: settings.currency, message };
  });
}

