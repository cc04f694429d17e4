// Payment webhook events, stored once per event id so redelivered or replayed events change nothing.
import "server-only";
import type Stripe from "stripe";
import { db, type Tx } from "@/db/client";
import { paymentEvents } from "@/db/schema";

/**
 * Records the event; `apply` (e.g. marking an entry fee paid) runs in the same transaction and only
 * for the first delivery, so bookkeeping can never be applied twice for one event.
 */
export async function recordPaymentEvent(
  event: Stripe.Event,
  apply?: (tx: Tx, event: Stripe.Event) => Promise<void>,
): Promise<{ duplicate: boolean }> {
  const object = event.data.object as { id?: unknown };
  return db.transaction(async (tx) => {
    const inserted = await tx
      .insert(paymentEvents)
      .values({
        eventId: event.id,
        type: event.type,
        objectId: typeof object.id === "string" ? object.id : "",
        payload: event,
        createdAt: new Date(event.created * 1000),
      })
      .onConflictDoNothing({ target: paymentEvents.eventId })
      .returning({ eventId: paymentEvents.eventId });
    if (inserted.length === 0) return { duplicate: true };
    if (apply) await apply(tx, event);
    return { duplicate: false };
  });
}
