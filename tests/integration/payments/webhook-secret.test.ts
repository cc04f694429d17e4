// A forged "checkout completed" event must not mark an unpaid entry paid: the webhook route
// checks the signature with the secret generated into .data/secrets.json, never a value anyone
// can read in the project's history.
import { createHmac, randomUUID } from "node:crypto";
import { eq } from "drizzle-orm";
import { describe, expect, it } from "vitest";
import { POST } from "@/app/api/payments/webhook/route";
import { db } from "@/db/client";
import { entries, paymentEvents, paymentItems, payments } from "@/db/schema";
import { env } from "@/lib/env";
import { makeEntry, makeShow, makeUser } from "../../helpers/factories";

const OLD_DEFAULT = "whsec_ribbonry_local";

/** Stripe's webhook signature, made by hand (Stripe docs, "Verify webhook signatures manually": v1 = HMAC-SHA256 of `${t}.${body}`). */
function signature(body: string, secret: string): string {
  const t = Math.floor(Date.now() / 1000);
  const v1 = createHmac("sha256", secret).update(`${t}.${body}`, "utf8").digest("hex");
  return `t=${t},v1=${v1}`;
}

async function unpaidCheckout() {
  const entrant = await makeUser();
  const show = await makeShow();
  const entry = await makeEntry(show.id, entrant.id);
  const sessionId = `cs_test_${randomUUID().replaceAll("-", "")}`;
  const [payment] = await db
    .insert(payments)
    .values({ showId: show.id, entrantUserId: entrant.id, checkoutSessionId: sessionId, amountCents: 4500, currency: "usd" })
    .returning({ id: payments.id });
  await db.insert(paymentItems).values({ paymentId: payment!.id, entryId: entry.id, amountCents: 4500, kind: "entry", description: "Entry fee" });
  return { paymentId: payment!.id, entryId: entry.id, sessionId };
}

function completedEvent(sessionId: string, paymentId: string) {
  return {
    id: `evt_${randomUUID().replaceAll("-", "")}`,
    object: "event",
    api_version: "2024-06-20",
    created: Math.floor(Date.now() / 1000),
    type: "checkout.session.completed",
    livemode: false,
    pending_webhooks: 1,
    request: { id: null, idempotency_key: null },
    data: {
      object: {
        id: sessionId,
        object: "checkout.session",
        status: "complete",
        payment_status: "paid",
        amount_total: 4500,
        currency: "usd",
        metadata: { paymentId },
        payment_intent: `pi_${randomUUID().replaceAll("-", "")}`,
      },
    },
  };
}

function deliver(body: string, secret: string) {
  return POST(
    new Request("http://127.0.0.1:3100/api/payments/webhook", {
      method: "POST",
      headers: { "content-type": "application/json", "stripe-signature": signature(body, secret) },
      body,
    }),
  );
}

async function stateOf(paymentId: string, entryId: string, eventId: string) {
  const [payment] = await db.select({ status: payments.status }).from(payments).where(eq(payments.id, paymentId));
  const [entry] = await db.select({ status: entries.status, paidAt: entries.paidAt }).from(entries).where(eq(entries.id, entryId));
  const events = await db.select({ id: paymentEvents.eventId }).from(paymentEvents).where(eq(paymentEvents.eventId, eventId));
  return { payment: payment!.status, entry: entry!.status, paidAt: entry!.paidAt, recorded: events.length };
}

describe("payments webhook secret", () => {
  it("is not the old published default", () => {
    expect(env.STRIPE_WEBHOOK_SECRET).not.toBe(OLD_DEFAULT);
    expect(env.STRIPE_WEBHOOK_SECRET.length).toBeGreaterThanOrEqual(32);
  });

  for (const [what, secret] of [
    ["the old default secret", OLD_DEFAULT],
    ["a guessed secret", "whsec_test_secret"],
  ] as const) {
    it(`refuses a "checkout completed" event signed with ${what}, and the entry stays unpaid`, async () => {
      const { paymentId, entryId, sessionId } = await unpaidCheckout();
      const event = completedEvent(sessionId, paymentId);
      const res = await deliver(JSON.stringify(event), secret);
      expect(res.status).toBe(400);
      expect(await res.json()).toMatchObject({ error: "invalid_signature" });
      expect(await stateOf(paymentId, entryId, event.id)).toEqual({ payment: "open", entry: "submitted", paidAt: null, recorded: 0 });
    });
  }

  it("accepts the same event signed with the configured secret (the forgery above is faithful)", async () => {
    const { paymentId, entryId, sessionId } = await unpaidCheckout();
    const event = completedEvent(sessionId, paymentId);
    const res = await deliver(JSON.stringify(event), env.STRIPE_WEBHOOK_SECRET);
    expect(res.status).toBe(200);
    expect(await stateOf(paymentId, entryId, event.id)).toMatchObject({ payment: "paid", entry: "paid", recorded: 1 });
  });
});
