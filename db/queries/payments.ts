// Entry fees: starting a checkout for an entrant's entries and applying the provider's webhook
// events (stored once per event id so redelivered or replayed events change nothing).
//
// The rule for events arriving out of order: a payment only moves forward. open → paid,
// open → expired, expired → paid (the provider took the money, so that wins), and paid never goes
// back to open or expired. A second "completed" for a payment already paid (a different event id
// for the same session) changes nothing. Entries are marked paid only while still unpaid.
import "server-only";
import { randomUUID } from "node:crypto";
import { and, asc, eq, inArray, isNotNull, isNull, ne } from "drizzle-orm";
import type Stripe from "stripe";
import { db, type Tx } from "@/db/client";
import { writeAudit } from "@/db/queries/audit";
import { settingsForShowId } from "@/db/queries/settings";
import { entrantProfiles, entries, paymentEvents, paymentItems, payments, shows, user } from "@/db/schema";
import { env } from "@/lib/env";
import { badInput, conflict, notFound } from "@/lib/errors";
import { stripe } from "@/lib/payments";
import type { Viewer } from "@/lib/session";
import { takenSoFar, type AccountEntry, type AccountPayment } from "@/exports/entrant-accounts";
import { critiqueFeeDue, isMember, quoteFees, type FeeSchedule } from "@/scoring/fees";

/** Entry statuses in which a critique fee asked for after paying can still be paid (before intake). */
export const CRITIQUE_PAYABLE = new Set(["paid", "accepted"]);

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

// Statuses in which the money was taken (some may since have been refunded).

type ShowForFees = { id: string; slug: string; name: string; guildName: string; entryClosesAt: Date | null; timeZone: string };

async function showBySlug(reader: Pick<Tx, "select">, slug: string): Promise<ShowForFees> {
  const [show] = await reader
    .select({ id: shows.id, slug: shows.slug, name: shows.name, guildName: shows.guildName, entryClosesAt: shows.entryClosesAt, timeZone: shows.timeZone })
    .from(shows)
    .where(eq(shows.slug, slug))
    .limit(1);
  if (!show) throw notFound("There is no show at this address.");
  return show;
}

/** Whether the entrant pays the member rate at the show (the rule: isMember in scoring/fees.ts). */
async function memberAt(reader: Pick<Tx, "select">, userId: string, show: { guildName: string; memberEmails: readonly string[] }): Promise<boolean> {
  const [row] = await reader
    .select({ email: user.email, guild: entrantProfiles.guild })
    .from(user)
    .leftJoin(entrantProfiles, eq(entrantProfiles.userId, user.id))
    .where(eq(user.id, userId))
    .limit(1);
  return row ? isMember(row, show) : false;
}

/**
 * A show's sent entries and its payments with their lines, by entrant (only `entrantUserId`'s when
 * given), as exports/entrant-accounts.ts reads them: for checkout's cap and the entrants spreadsheet.
 */
export async function accountFactsOf(reader: Pick<Tx, "select">, showId: string, entrantUserId?: string) {
  const mineOnly = (column: typeof entries.entrantUserId | typeof payments.entrantUserId) => (entrantUserId ? eq(column, entrantUserId) : undefined);
  const [sent, paid, lines] = await Promise.all([
    reader
      .select({ id: entries.id, entrantUserId: entries.entrantUserId, entryNumber: entries.entryNumber, title: entries.title, status: entries.status, waitlisted: entries.waitlisted, critiqueRequested: entries.critiqueRequested, paidAt: entries.paidAt, paymentReference: entries.paymentReference })
      .from(entries)
      .where(and(eq(entries.showId, showId), ne(entries.status, "draft"), mineOnly(entries.entrantUserId)))
      .orderBy(asc(entries.entryNumber), asc(entries.id)),
    reader
      .select({ id: payments.id, entrantUserId: payments.entrantUserId, status: payments.status, amountCents: payments.amountCents, refundedCents: payments.refundedCents, paidAt: payments.paidAt })
      .from(payments)
      .where(and(eq(payments.showId, showId), mineOnly(payments.entrantUserId))),
    reader
      .select({ paymentId: paymentItems.paymentId, entryId: paymentItems.entryId, amountCents: paymentItems.amountCents, kind: paymentItems.kind, description: paymentItems.description })
      .from(paymentItems)
      .innerJoin(payments, eq(payments.id, paymentItems.paymentId))
      .where(and(eq(payments.showId, showId), mineOnly(payments.entrantUserId))),
  ]);
  const itemsOf = new Map<string, AccountPayment["items"]>();
  for (const { paymentId, ...line } of lines) itemsOf.set(paymentId, [...(itemsOf.get(paymentId) ?? []), line]);
  const entriesBy = new Map<string, AccountEntry[]>();
  for (const { entrantUserId: who, ...e } of sent) entriesBy.set(who, [...(entriesBy.get(who) ?? []), e]);
  const paymentsBy = new Map<string, AccountPayment[]>();
  for (const { id, entrantUserId: who, ...p } of paid) paymentsBy.set(who, [...(paymentsBy.get(who) ?? []), { ...p, items: itemsOf.get(id) ?? [] }]);
  return { entries: entriesBy, payments: paymentsBy };
}

/**
 * Entry fees the per-entrant cap counts already: paid by card or marked paid offline, for entries
 * still in the show. The same rule as the entrants spreadsheet (exports/entrant-accounts.ts).
 */
async function entryFeesPaidCents(reader: Pick<Tx, "select">, userId: string, showId: string, ctx: { schedule: FeeSchedule; member: boolean }): Promise<number> {
  const facts = await accountFactsOf(reader, showId, userId);
  return takenSoFar({ entries: facts.entries.get(userId) ?? [], payments: facts.payments.get(userId) ?? [] }, ctx).capCountedCents;
}

const scheduleOf = (s: Awaited<ReturnType<typeof settingsForShowId>>): FeeSchedule => ({
  entryFeeCents: s.entryFeeCents,
  memberEntryFeeCents: s.memberEntryFeeCents,
  lateFeeCents: s.lateFeeCents,
  lateFeeFromAt: s.lateFeeFromAt,
  critiqueFeeCents: s.critiqueFeeCents,
  feeCapCents: s.feeCapCents,
});

/**
 * Open checkouts holding any of these entries are expired first, so one entry can never be paid
 * through two live sessions. A session the provider already completed is left to its webhook.
 */
async function expireOpenPaymentsFor(tx: Tx, actorUserId: string, entryIds: string[]): Promise<void> {
  if (entryIds.length === 0) return;
  const open = await tx
    .selectDistinct({ id: payments.id, showId: payments.showId, checkoutSessionId: payments.checkoutSessionId })
    .from(payments)
    .innerJoin(paymentItems, eq(paymentItems.paymentId, payments.id))
    .where(and(inArray(paymentItems.entryId, entryIds), eq(payments.status, "open")));
  for (const p of open) {
    if (p.checkoutSessionId) {
      try {
        await stripe.checkout.sessions.expire(p.checkoutSessionId);
      } catch (err) {
        // Already expired, or unknown to the provider (e.g. a restarted test fake): it cannot be paid.
        const session = await stripe.checkout.sessions.retrieve(p.checkoutSessionId).catch((e: unknown) => {
          if ((e as { statusCode?: number }).statusCode === 404) return { status: "expired" as const };
          throw e;
        });
        if (session.status === "complete") {
          throw conflict("A payment for these entries has just gone through and is being confirmed. Reload this page in a minute.");
        }
        if (session.status !== "expired") throw err;
      }
    }
    const updated = await tx
      .update(payments)
      .set({ status: "expired" })
      .where(and(eq(payments.id, p.id), eq(payments.status, "open")))
      .returning({ id: payments.id });
    if (updated.length) {
      await writeAudit(tx, { actorUserId, showId: p.showId, action: "payment.expired", subjectType: "payment", subjectId: p.id, before: { status: "open" }, after: { status: "expired", reason: "replaced" } });
    }
  }
}

export type CheckoutStarted = { paymentId: string; url: string; totalCents: number };

/**
 * Starts one checkout for several of the viewer's own entries at a show (sent, not on the waiting
 * list, not paid). The payment row, its lines and the audit row are written in one transaction
 * together with the provider's session, so a failure leaves nothing behind. With nothing to pay
 * (free show, or the cap already reached) the entries are marked paid at once.
 */
export async function startCheckout(viewer: Viewer, input: { showSlug: string; entryIds: string[] }): Promise<CheckoutStarted> {
  const show = await showBySlug(db, input.showSlug);
  const settings = await settingsForShowId(show.id);
  const ids = [...new Set(input.entryIds)];
  if (ids.length === 0) throw badInput("Choose at least one entry to pay for.", { entryIds: ["Choose at least one entry to pay for."] });
  const paymentId = randomUUID();
  const now = new Date();

  return db.transaction(async (tx) => {
    const rows = await tx
      .select({ id: entries.id, entryNumber: entries.entryNumber, title: entries.title, status: entries.status, waitlisted: entries.waitlisted, paidAt: entries.paidAt, paymentReference: entries.paymentReference, critiqueRequested: entries.critiqueRequested })
      .from(entries)
      .where(and(inArray(entries.id, ids), eq(entries.entrantUserId, viewer.id), eq(entries.showId, show.id)))
      .orderBy(asc(entries.entryNumber))
      .for("update");
    if (rows.length !== ids.length) throw notFound("One of these entries is not yours at this show.");
    // A paid entry whose critique was asked for afterwards pays the critique fee on its own.
    const critiquePaid = await critiqueLinesPaid(tx, ids);
    const critiqueOnly = new Set(rows.filter((r) => CRITIQUE_PAYABLE.has(r.status) && critiqueFeeDue(r, settings.critiqueFeeCents, critiquePaid.has(r.id))).map((r) => r.id));
    const unpayable = rows.find((r) => !critiqueOnly.has(r.id) && (r.status !== "submitted" || r.waitlisted || r.paidAt !== null));
    if (unpayable) {
      const why = unpayable.paidAt ? "is already paid" : unpayable.waitlisted ? "is on the waiting list" : `is ${unpayable.status}`;
      throw conflict(`Entry ${unpayable.entryNumber ?? unpayable.title} ${why}, so it cannot be paid now.`, { entryIds: [`Entry ${unpayable.entryNumber ?? unpayable.title} ${why}.`] });
    }
    await expireOpenPaymentsFor(tx, viewer.id, ids);

    const member = await memberAt(tx, viewer.id, { guildName: show.guildName, memberEmails: settings.memberEmails });
    const quote = quoteFees({
      schedule: scheduleOf(settings),
      member,
      at: now,
      entries: rows.map((r) => ({ entryId: r.id, entryNumber: r.entryNumber, title: r.title, critiqueRequested: r.critiqueRequested, critiqueOnly: critiqueOnly.has(r.id) })),
      entryFeesAlreadyPaidCents: await entryFeesPaidCents(tx, viewer.id, show.id, { schedule: scheduleOf(settings), member }),
    });
    const back = (q: string) => new URL(`/my?${q}`, env.APP_URL).toString();

    if (quote.totalCents === 0) {
      await tx.insert(payments).values({ id: paymentId, showId: show.id, entrantUserId: viewer.id, amountCents: 0, currency: settings.currency, status: "paid", paidAt: now });
      const unpaid = ids.filter((id) => !critiqueOnly.has(id));
      if (unpaid.length) await tx.update(entries).set({ status: "paid", paidAt: now, paymentReference: "no fee due", updatedAt: now }).where(inArray(entries.id, unpaid));
      await writeAudit(tx, { actorUserId: viewer.id, showId: show.id, action: "payment.no_fee_due", subjectType: "payment", subjectId: paymentId, after: { entryIds: ids } });
      return { paymentId, url: back(`paid=${paymentId}`), totalCents: 0 };
    }

    const session = await stripe.checkout.sessions.create(
      {
        mode: "payment",
        line_items: quote.lines.map((l) => ({
          price_data: { currency: settings.currency, unit_amount: l.amountCents, product_data: { name: l.description.slice(0, 250) } },
          quantity: 1,
        })),
        metadata: { paymentId, showId: show.id },
        client_reference_id: viewer.id,
        customer_email: viewer.email,
        success_url: back(`paid=${paymentId}`),
        cancel_url: back(`cancelled=${paymentId}`),
      },
      { idempotencyKey: `checkout-${paymentId}` },
    );
    if (!session.url) throw new Error(`checkout session ${session.id} came back without a URL`);
    await tx.insert(payments).values({ id: paymentId, showId: show.id, entrantUserId: viewer.id, checkoutSessionId: session.id, amountCents: quote.totalCents, currency: settings.currency, status: "open" });
    await tx.insert(paymentItems).values(quote.lines.map((l) => ({ paymentId, entryId: l.entryId, amountCents: l.amountCents, kind: l.kind, description: l.description })));
    await writeAudit(tx, {
      actorUserId: viewer.id,
      showId: show.id,
      action: "payment.started",
      subjectType: "payment",
      subjectId: paymentId,
      after: { checkoutSessionId: session.id, amountCents: quote.totalCents, entryIds: ids, member: quote.member, late: quote.late },
    });
    return { paymentId, url: session.url, totalCents: quote.totalCents };
  });
}

/**
 * Applies a verified webhook event inside recordPaymentEvent's transaction. Returns the payment
 * that became paid, so the caller can mail the receipt once the transaction has committed.
 */
export async function applyPaymentEvent(tx: Tx, event: Stripe.Event): Promise<{ paidPaymentId: string | null }> {
  const isPaid =
    (event.type === "checkout.session.completed" || event.type === "checkout.session.async_payment_succeeded") &&
    event.data.object.payment_status === "paid";
  const isExpired = event.type === "checkout.session.expired" || event.type === "checkout.session.async_payment_failed";
  if (!isPaid && !isExpired) return { paidPaymentId: null };
  const session = event.data.object as Stripe.Checkout.Session;
  const [payment] = await tx
    .select({ id: payments.id, showId: payments.showId, status: payments.status, entrantUserId: payments.entrantUserId })
    .from(payments)
    .where(eq(payments.checkoutSessionId, session.id))
    .for("update");
  // Events about sessions we did not create (or whose metadata disagrees) are kept, not applied.
  if (!payment || (session.metadata?.paymentId && session.metadata.paymentId !== payment.id)) return { paidPaymentId: null };

  if (isExpired) {
    if (payment.status !== "open") return { paidPaymentId: null };
    await tx.update(payments).set({ status: "expired" }).where(eq(payments.id, payment.id));
    await writeAudit(tx, { actorUserId: null, showId: payment.showId, action: "payment.expired", subjectType: "payment", subjectId: payment.id, before: { status: "open" }, after: { status: "expired", eventId: event.id } });
    return { paidPaymentId: null };
  }

  if (payment.status !== "open" && payment.status !== "expired") return { paidPaymentId: null };
  const now = new Date();
  const intent = typeof session.payment_intent === "string" ? session.payment_intent : (session.payment_intent?.id ?? session.id);
  const reference = `card ${intent}`;
  await tx.update(payments).set({ status: "paid", paidAt: now }).where(eq(payments.id, payment.id));
  await writeAudit(tx, { actorUserId: null, showId: payment.showId, action: "payment.paid", subjectType: "payment", subjectId: payment.id, before: { status: payment.status }, after: { status: "paid", eventId: event.id, reference } });

  const items = await tx.select({ entryId: paymentItems.entryId, kind: paymentItems.kind }).from(paymentItems).where(eq(paymentItems.paymentId, payment.id));
  // Lines carrying only a critique fee are for entries already paid: nothing to mark on the entry.
  const critiqueOnlyIds = new Set(items.filter((i) => i.kind === "critique" && !items.some((o) => o.entryId === i.entryId && o.kind !== "critique")).map((i) => i.entryId));
  const paidAlready = critiqueOnlyIds.size
    ? new Set((await tx.select({ id: entries.id }).from(entries).where(and(inArray(entries.id, [...critiqueOnlyIds]), isNotNull(entries.paidAt)))).map((r) => r.id))
    : new Set<string>();
  for (const id of paidAlready) {
    await writeAudit(tx, { actorUserId: null, showId: payment.showId, action: "entry.critique_paid", subjectType: "entry", subjectId: id, after: { reference, paymentId: payment.id } });
  }
  const itemEntryIds = [...new Set(items.map((i) => i.entryId))].filter((id) => !paidAlready.has(id));
  if (itemEntryIds.length) {
    const marked = await tx
      .update(entries)
      .set({ status: "paid", paidAt: now, paymentReference: reference, updatedAt: now })
      .where(and(inArray(entries.id, itemEntryIds), eq(entries.status, "submitted"), isNull(entries.paidAt)))
      .returning({ id: entries.id });
    for (const e of marked) {
      await writeAudit(tx, { actorUserId: null, showId: payment.showId, action: "entry.paid", subjectType: "entry", subjectId: e.id, before: { status: "submitted" }, after: { status: "paid", reference, paymentId: payment.id } });
    }
    // Money taken for entries already paid another way or withdrawn meanwhile: the chair must refund it.
    const unmarked = itemEntryIds.filter((id) => !marked.some((m) => m.id === id));
    if (unmarked.length) {
      await writeAudit(tx, { actorUserId: null, showId: payment.showId, action: "payment.needs_review", subjectType: "payment", subjectId: payment.id, after: { reason: "entries not payable when the payment completed", entryIds: unmarked } });
    }
  }
  return { paidPaymentId: payment.id };
}

/** Where a checkout stands, for the banner on return from the payment page (own payments only). */
export async function paymentStatusForEntrant(viewer: Viewer, paymentId: string) {
  if (!/^[0-9a-f-]{36}$/i.test(paymentId)) return null;
  const [row] = await db
    .select({ id: payments.id, status: payments.status, amountCents: payments.amountCents, currency: payments.currency, receiptNumber: payments.receiptNumber })
    .from(payments)
    .where(and(eq(payments.id, paymentId), eq(payments.entrantUserId, viewer.id)))
    .limit(1);
  return row ?? null;
}

/**
 * Keeps the card's brand and last four digits on a paid payment, read from the provider after the
 * payment is committed (Stripe API: Checkout Session → PaymentIntent.latest_charge →
 * Charge.payment_method_details.card). Unknown stays empty; the receipt then says "card".
 */
export async function recordCardDetails(paymentId: string, provider: Stripe = stripe): Promise<void> {
  const [p] = await db.select({ sessionId: payments.checkoutSessionId, last4: payments.cardLast4 }).from(payments).where(eq(payments.id, paymentId));
  if (!p?.sessionId || p.last4) return;
  const session = await provider.checkout.sessions.retrieve(p.sessionId);
  const intentId = typeof session.payment_intent === "string" ? session.payment_intent : session.payment_intent?.id;
  if (!intentId) return;
  const intent = await provider.paymentIntents.retrieve(intentId);
  const chargeId = typeof intent.latest_charge === "string" ? intent.latest_charge : intent.latest_charge?.id;
  if (!chargeId) return;
  const card = (await provider.charges.retrieve(chargeId)).payment_method_details?.card;
  if (!card?.last4 || !/^\d{4}$/.test(card.last4)) return;
  await db.update(payments).set({ cardBrand: (card.brand ?? "").slice(0, 40), cardLast4: card.last4 }).where(eq(payments.id, paymentId));
}

/** Entries among `entryIds` whose critique line was on a checkout that was paid (even if refunded since). */
export async function critiqueLinesPaid(reader: Pick<Tx, "select">, entryIds: string[]): Promise<Set<string>> {
  if (entryIds.length === 0) return new Set();
  const rows = await reader
    .select({ entryId: paymentItems.entryId })
    .from(paymentItems)
    .innerJoin(payments, eq(payments.id, paymentItems.paymentId))
    .where(and(inArray(paymentItems.entryId, entryIds), eq(paymentItems.kind, "critique"), inArray(payments.status, ["paid", "refunded", "partially_refunded"])));
  return new Set(rows.map((r) => r.entryId));
}

export { entryFeesPaidCents, expireOpenPaymentsFor, memberAt, scheduleOf };
