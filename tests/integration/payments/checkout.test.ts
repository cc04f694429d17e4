// Paying entry fees: a checkout for two entries at the payments fake, the signed webhook that
// marks them paid (replays, out-of-order events, tampering), and the receipt mail.
import { and, eq, inArray } from "drizzle-orm";
import type Stripe from "stripe";
import { beforeAll, describe, expect, it } from "vitest";
import { startCheckoutAction } from "@/app/(entrant)/my/actions";
import { POST } from "@/app/api/payments/webhook/route";
import { db } from "@/db/client";
import { auditLog, entries, paymentItems, payments, showSettings } from "@/db/schema";
import { env } from "@/lib/env";
import { stripe } from "@/lib/payments";
import { makeEntry, makeShow, makeUser, type TestUser } from "../../helpers/factories";
import { waitForMail } from "../../helpers/mailbox";
import { actAs } from "../../helpers/request-context";

const FAKE = `http://127.0.0.1:${env.STRIPE_API_PORT}`;
type FakeEvent = Stripe.Event & { data: { object: Stripe.Checkout.Session } };

/** Signs like the provider does (Stripe webhook docs: t=…,v1=HMAC-SHA256) and posts to the route handler. */
function deliver(event: unknown, opts: { tamper?: (body: string) => string } = {}) {
  const body = JSON.stringify(event);
  const signature = stripe.webhooks.generateTestHeaderString({ payload: body, secret: env.STRIPE_WEBHOOK_SECRET });
  return POST(
    new Request("http://127.0.0.1:3100/api/payments/webhook", {
      method: "POST",
      headers: { "content-type": "application/json", "stripe-signature": signature },
      body: opts.tamper ? opts.tamper(body) : body,
    }),
  );
}

async function fakeEvent(path: string, body?: unknown): Promise<FakeEvent> {
  const res = await fetch(`${FAKE}${path}`, {
    method: "POST",
    headers: body ? { "content-type": "application/json" } : {},
    body: body ? JSON.stringify(body) : undefined,
  });
  expect(res.status, await res.clone().text()).toBe(200);
  return (await res.json()) as FakeEvent;
}

async function checkout(user: TestUser, showSlug: string, entryIds: string[]) {
  actAs(user.cookie);
  const result = await startCheckoutAction(null, { showSlug, entryIds });
  if (!result.ok) throw new Error(`checkout refused: ${result.status} ${result.message}`);
  const { paymentId, url, totalCents } = result.data!;
  const [row] = await db.select().from(payments).where(eq(payments.id, paymentId));
  return { paymentId, url, totalCents, sessionId: row!.checkoutSessionId ?? "" };
}

const stateOf = async (paymentId: string, entryIds: string[]) => ({
  payment: (await db.select().from(payments).where(eq(payments.id, paymentId)))[0],
  entries: await db
    .select({ id: entries.id, status: entries.status, paidAt: entries.paidAt, ref: entries.paymentReference })
    .from(entries)
    .where(inArray(entries.id, entryIds))
    .orderBy(entries.entryNumber),
  audit: (await db.select({ id: auditLog.id }).from(auditLog).where(inArray(auditLog.subjectId, [paymentId, ...entryIds]))).length,
});

let entrant: TestUser;
let show: { id: string; slug: string; name: string };
let a: { id: string; entryNumber: number | null };
let b: { id: string; entryNumber: number | null };

beforeAll(async () => {
  entrant = await makeUser({ name: "Rosa Pennington" });
  show = await makeShow({ name: "Lakeside Test Quilt Show" });
  // Invented fees: non-member 25.00, member 15.00, critique 10.00, late fee from a date far ahead.
  await db.insert(showSettings).values({
    showId: show.id,
    entryFeeCents: 2500,
    memberEntryFeeCents: 1500,
    lateFeeCents: 500,
    lateFeeFromAt: new Date(Date.now() + 60 * 86_400_000),
    critiqueFeeCents: 1000,
    withdrawalRefundPercent: 50,
    replyToEmail: "entries@lakeside.example.test",
  });
  a = await makeEntry(show.id, entrant.id, { title: "Harbour Lights" });
  b = await makeEntry(show.id, entrant.id, { title: "Wild Geese Flying", critiqueRequested: true });
});

describe("checkout for two entries and the webhook that marks them paid", () => {
  let c: Awaited<ReturnType<typeof checkout>>;
  let completed: FakeEvent;

  beforeAll(async () => {
    c = await checkout(entrant, show.slug, [a.id, b.id]);
  });

  it("creates a session with one line per fee and the right total: 2500 + 2500 + 1000 = 6000", async () => {
    expect(c.totalCents).toBe(6000);
    expect(c.url).toBe(`${FAKE}/pay/${c.sessionId}`);
    const session = await stripe.checkout.sessions.retrieve(c.sessionId);
    expect(session).toMatchObject({
      amount_total: 6000,
      currency: "usd",
      status: "open",
      metadata: { paymentId: c.paymentId, showId: show.id },
      client_reference_id: entrant.id,
      customer_email: entrant.email,
      success_url: `${env.APP_URL}/my?paid=${c.paymentId}`,
      cancel_url: `${env.APP_URL}/my?cancelled=${c.paymentId}`,
    });
    // The fake has no line-items endpoint; its hosted page lists each line.
    const page = await (await fetch(c.url)).text();
    expect(page).toContain(`Entry fee — entry ${a.entryNumber}: Harbour Lights</span><span>$25.00`);
    expect(page).toContain(`Entry fee — entry ${b.entryNumber}: Wild Geese Flying</span><span>$25.00`);
    expect(page).toContain(`Critique fee — entry ${b.entryNumber}: Wild Geese Flying</span><span>$10.00`);
  });

  it("writes the payment (open) and its lines", async () => {
    const { payment } = await stateOf(c.paymentId, [a.id, b.id]);
    expect(payment).toMatchObject({ status: "open", amountCents: 6000, currency: "usd", entrantUserId: entrant.id, showId: show.id });
    const items = await db.select().from(paymentItems).where(eq(paymentItems.paymentId, c.paymentId));
    expect(items.map((i) => i.amountCents).sort()).toEqual([1000, 2500, 2500]);
  });

  it("marks the entries paid when the completed event arrives, and mails the receipt", async () => {
    completed = await fakeEvent(`/_fake/sessions/${c.sessionId}/complete`);
    const intent = completed.data.object.payment_intent as string;
    expect(intent).toMatch(/^pi_test_/);
    const res = await deliver(completed);
    expect(res.status).toBe(200);
    expect(await res.json()).toMatchObject({ received: true });

    const s = await stateOf(c.paymentId, [a.id, b.id]);
    expect(s.payment).toMatchObject({ status: "paid" });
    expect(s.payment!.paidAt).toBeInstanceOf(Date);
    for (const e of s.entries) {
      expect(e).toMatchObject({ status: "paid", ref: `card ${intent}` });
      expect(e.paidAt).toBeInstanceOf(Date);
    }
    const audit = await db.select({ action: auditLog.action }).from(auditLog).where(inArray(auditLog.subjectId, [c.paymentId, a.id, b.id]));
    expect(audit.map((r) => r.action).sort()).toEqual(["entry.paid", "entry.paid", "payment.paid", "payment.started"]);

    const mail = await waitForMail(env.MAIL_WEB_URL, { to: entrant.email, subjectIncludes: "Payment received", timeoutMs: 10_000 });
    expect(mail.to).toEqual([entrant.email]);
    expect(mail.subject).toBe(`Payment received: ${show.name} ($60.00)`);
    for (const part of [mail.text, mail.html]) {
      expect(part).toContain(`${a.entryNumber}, ${b.entryNumber}`);
      expect(part).toContain("Total: $60.00");
      // Our receipt number, never the provider's id (the card's words: fake.test.ts and entry-mails.test.ts).
      expect(part).toContain(`Receipt number: ${s.payment!.receiptNumber}. Paid by `);
      expect(part).not.toContain(intent);
    }
    expect(mail.html).toContain("<li>Critique fee — entry");
  });

  it("a replay of the same event changes nothing", async () => {
    const before = await stateOf(c.paymentId, [a.id, b.id]);
    const res = await deliver(completed);
    expect(await res.json()).toEqual({ received: true, duplicate: true });
    expect(await stateOf(c.paymentId, [a.id, b.id])).toEqual(before);
  });

  it("a second completed event (another id, same session) and a late expired event leave it paid", async () => {
    const before = await stateOf(c.paymentId, [a.id, b.id]);
    const again = await fakeEvent("/_fake/events/send", { type: "checkout.session.completed", object: { ...completed.data.object, payment_intent: "pi_test_other" } });
    expect(again.id).not.toBe(completed.id);
    expect(await (await deliver(again)).json()).toMatchObject({ received: true });
    const expired = await fakeEvent("/_fake/events/send", { type: "checkout.session.expired", object: { id: c.sessionId, object: "checkout.session", status: "expired", metadata: { paymentId: c.paymentId } } });
    expect(await (await deliver(expired)).json()).toMatchObject({ received: true });
    expect(await stateOf(c.paymentId, [a.id, b.id])).toEqual(before);
  });
});

describe("checkout edge cases", () => {
  it("refuses a tampered signature with 400 and changes nothing", async () => {
    const e = await makeEntry(show.id, entrant.id, { title: "Tampered Test" });
    const c = await checkout(entrant, show.slug, [e.id]);
    const event = await fakeEvent(`/_fake/sessions/${c.sessionId}/complete`);
    const before = await stateOf(c.paymentId, [e.id]);
    const res = await deliver(event, { tamper: (body) => body.replace(`"amount_total":${c.totalCents}`, `"amount_total":${c.totalCents + 1}`) });
    expect(res.status).toBe(400);
    expect(await res.json()).toMatchObject({ error: "invalid_signature" });
    expect(await stateOf(c.paymentId, [e.id])).toEqual(before);
    expect(before.payment!.status).toBe("open");
    expect(before.entries[0]!.status).toBe("submitted");
  });

  it("starting again for the same entry expires the earlier session, so it cannot be paid twice", async () => {
    const e = await makeEntry(show.id, entrant.id, { title: "Second Thoughts" });
    const first = await checkout(entrant, show.slug, [e.id]);
    const second = await checkout(entrant, show.slug, [e.id]);
    expect(second.sessionId).not.toBe(first.sessionId);
    expect((await stripe.checkout.sessions.retrieve(first.sessionId)).status).toBe("expired");
    const [old] = await db.select({ status: payments.status }).from(payments).where(eq(payments.id, first.paymentId));
    expect(old!.status).toBe("expired");
  });

  it("refuses entries that are not the viewer's, already paid, drafts or on the waiting list", async () => {
    const other = await makeUser();
    const theirs = await makeEntry(show.id, other.id);
    actAs(entrant.cookie);
    expect(await startCheckoutAction(null, { showSlug: show.slug, entryIds: [theirs.id] })).toMatchObject({ ok: false, status: 404 });
    const waiting = await makeEntry(show.id, entrant.id, { waitlisted: true });
    expect(await startCheckoutAction(null, { showSlug: show.slug, entryIds: [waiting.id] })).toMatchObject({ ok: false, status: 409, message: expect.stringContaining("waiting list") });
    const draft = await makeEntry(show.id, entrant.id, { status: "draft" });
    expect(await startCheckoutAction(null, { showSlug: show.slug, entryIds: [draft.id] })).toMatchObject({ ok: false, status: 409 });
    expect(await startCheckoutAction(null, { showSlug: show.slug, entryIds: [a.id] })).toMatchObject({ ok: false, status: 409, message: expect.stringContaining("already paid") });
    expect(await startCheckoutAction(null, { showSlug: show.slug, entryIds: [] })).toMatchObject({ ok: false, status: 400, fieldErrors: { entryIds: [expect.stringContaining("at least one")] } });
  });

  it("refuses to start again while the earlier session was paid but its webhook has not arrived", async () => {
    const e = await makeEntry(show.id, entrant.id, { title: "In Flight" });
    const first = await checkout(entrant, show.slug, [e.id]);
    await fakeEvent(`/_fake/sessions/${first.sessionId}/complete`); // paid at the provider, not yet delivered to us
    actAs(entrant.cookie);
    expect(await startCheckoutAction(null, { showSlug: show.slug, entryIds: [e.id] })).toMatchObject({ ok: false, status: 409, message: expect.stringContaining("being confirmed") });
    const [row] = await db.select({ status: payments.status }).from(payments).where(eq(payments.id, first.paymentId));
    expect(row!.status).toBe("open");
  });

  it("counts entry fees already paid toward the cap: cap 3000, first 2500, then 3000 − 2500 = 500", async () => {
    const capped = await makeShow();
    await db.insert(showSettings).values({ showId: capped.id, entryFeeCents: 2500, critiqueFeeCents: 1000, feeCapCents: 3000 });
    const payer = await makeUser();
    const one = await makeEntry(capped.id, payer.id);
    const first = await checkout(payer, capped.slug, [one.id]);
    expect(first.totalCents).toBe(2500);
    await deliver(await fakeEvent(`/_fake/sessions/${first.sessionId}/complete`));
    const two = await makeEntry(capped.id, payer.id, { critiqueRequested: true });
    const second = await checkout(payer, capped.slug, [two.id]);
    expect(second.totalCents).toBe(500 + 1000); // capped entry fee, critique on top
  });

  it("counts an entry marked paid offline toward the cap, and not a declined one: the same figure as the entrants spreadsheet", async () => {
    const capped = await makeShow();
    await db.insert(showSettings).values({ showId: capped.id, entryFeeCents: 2500, feeCapCents: 4000 });
    const payer = await makeUser();
    // Paid in cash at a guild meeting (2500 counted), and a declined one paid by cheque (not counted).
    await makeEntry(capped.id, payer.id, { status: "paid", paidAt: new Date(), paymentReference: "cash, receipt 0042" });
    await makeEntry(capped.id, payer.id, { status: "declined", paidAt: new Date(), paymentReference: "cheque 311" });
    const next = await makeEntry(capped.id, payer.id);
    const c = await checkout(payer, capped.slug, [next.id]);
    expect(c.totalCents).toBe(4000 - 2500);
  });

  it("marks entries paid at once when nothing is due (a show with no fees)", async () => {
    const free = await makeShow();
    const payer = await makeUser();
    const e = await makeEntry(free.id, payer.id);
    const c = await checkout(payer, free.slug, [e.id]);
    expect(c.totalCents).toBe(0);
    expect(c.url).toBe(`${env.APP_URL}/my?paid=${c.paymentId}`);
    expect(c.sessionId).toBe(""); // no checkout session at the provider
    const s = await stateOf(c.paymentId, [e.id]);
    expect(s.payment).toMatchObject({ status: "paid", amountCents: 0 });
    expect(s.entries[0]).toMatchObject({ status: "paid", ref: "no fee due" });
  });

  it("charges the member rate when the profile's guild matches the show's (any capitals)", async () => {
    const member = await makeUser();
    const { entrantProfiles } = await import("@/db/schema");
    await db.insert(entrantProfiles).values({ userId: member.id, displayName: "Member", guild: "test GUILD" });
    const e = await makeEntry(show.id, member.id);
    const c = await checkout(member, show.slug, [e.id]);
    expect(c.totalCents).toBe(1500);
    const rows = await db.select().from(payments).where(and(eq(payments.entrantUserId, member.id), eq(payments.showId, show.id)));
    expect(rows).toHaveLength(1);
  });
});
