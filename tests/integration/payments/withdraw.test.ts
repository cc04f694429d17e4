// Withdrawing an entry: the entrant's own while the show takes entries (status and time, the
// entry number kept, the refund of the show's percent of the entry fee, rounded down, made through
// the payments fake and recorded on the card payment); after entries close only the chair's, with
// a reason in the audit row and the same refund rule.
import { eq } from "drizzle-orm";
import { beforeAll, describe, expect, it } from "vitest";
import { startCheckoutAction, withdrawEntryAction } from "@/app/(entrant)/my/actions";
import { withdrawEntryAsChairAction } from "@/app/(chair)/shows/[slug]/manage/entries/[entryId]/actions";
import { POST } from "@/app/api/payments/webhook/route";
import { db } from "@/db/client";
import { myEntriesByShow } from "@/db/queries/entrant-shows";
import { auditLog, entries, payments, showSettings, shows } from "@/db/schema";
import { env } from "@/lib/env";
import { stripe } from "@/lib/payments";
import { grantRole, makeEntry, makeShow, makeUser, type TestUser } from "../../helpers/factories";
import { actAs } from "../../helpers/request-context";

const FAKE = `http://127.0.0.1:${env.STRIPE_API_PORT}`;

/** Pays the entries by card through the fake and the webhook route; returns the payment id. */
async function payByCard(user: TestUser, showSlug: string, entryIds: string[]): Promise<string> {
  actAs(user.cookie);
  const started = await startCheckoutAction(null, { showSlug, entryIds });
  if (!started.ok) throw new Error(started.message);
  const [p] = await db.select().from(payments).where(eq(payments.id, started.data!.paymentId));
  const event = await (await fetch(`${FAKE}/_fake/sessions/${p!.checkoutSessionId}/complete`, { method: "POST" })).json();
  const body = JSON.stringify(event);
  const signature = stripe.webhooks.generateTestHeaderString({ payload: body, secret: env.STRIPE_WEBHOOK_SECRET });
  const res = await POST(new Request("http://127.0.0.1:3100/api/payments/webhook", { method: "POST", headers: { "stripe-signature": signature }, body }));
  expect(res.status).toBe(200);
  return p!.id;
}

async function showWithFees(refundPercent: number) {
  const show = await makeShow();
  await db.insert(showSettings).values({ showId: show.id, entryFeeCents: 2500, critiqueFeeCents: 1000, withdrawalRefundPercent: refundPercent });
  return show;
}

const entryRow = async (id: string) => (await db.select().from(entries).where(eq(entries.id, id)))[0]!;
const paymentRow = async (id: string) => (await db.select().from(payments).where(eq(payments.id, id)))[0]!;

let entrant: TestUser;
beforeAll(async () => {
  entrant = await makeUser({ name: "Ines Calloway" });
});

describe("withdrawEntryAction", () => {
  it("withdraws a card-paid entry, keeps its number and records 50% of the entry fee as due: 2500 × 50% = 1250", async () => {
    const show = await showWithFees(50);
    const a = await makeEntry(show.id, entrant.id, { title: "Morning Glory" });
    const b = await makeEntry(show.id, entrant.id, { title: "Night Sky", critiqueRequested: true });
    const paymentId = await payByCard(entrant, show.slug, [a.id, b.id]); // 2500 + 2500 + 1000 = 6000

    actAs(entrant.cookie);
    const r = await withdrawEntryAction(null, { entryId: a.id });
    expect(r).toMatchObject({ ok: true, message: `Entry ${a.entryNumber} is withdrawn. A refund of $12.50 is on its way to your card.` });
    const after = await entryRow(a.id);
    expect(after.status).toBe("withdrawn");
    expect(after.withdrawnAt).toBeInstanceOf(Date);
    expect(after.entryNumber).toBe(a.entryNumber);
    expect(await paymentRow(paymentId)).toMatchObject({ amountCents: 6000, refundedCents: 1250, status: "partially_refunded" });

    // The second entry: its entry fee only, never the critique fee: 1250 + 1250 = 2500 of 6000.
    await withdrawEntryAction(null, { entryId: b.id });
    expect(await paymentRow(paymentId)).toMatchObject({ refundedCents: 2500, status: "partially_refunded" });
    const audit = await db.select({ action: auditLog.action }).from(auditLog).where(eq(auditLog.subjectId, paymentId));
    expect(audit.filter((x) => x.action === "payment.refunded")).toHaveLength(2);
    // The provider really refunded both shares, once each (idempotency key per entry).
    const { data: refunds } = (await (await fetch(`${FAKE}/_fake/refunds`)).json()) as { data: { amount: number; metadata: { entryId?: string } }[] };
    const mine = refunds.filter((x) => x.metadata.entryId === a.id || x.metadata.entryId === b.id);
    expect(mine.map((x) => x.amount)).toEqual([1250, 1250]);
  });

  it("marks the payment refunded when the whole amount is due back (100% of a lone 2500 entry fee)", async () => {
    const show = await showWithFees(100);
    const a = await makeEntry(show.id, entrant.id);
    const paymentId = await payByCard(entrant, show.slug, [a.id]);
    actAs(entrant.cookie);
    expect(await withdrawEntryAction(null, { entryId: a.id })).toMatchObject({ ok: true, message: expect.stringContaining("$25.00") });
    expect(await paymentRow(paymentId)).toMatchObject({ refundedCents: 2500, status: "refunded" });
  });

  it("rounds the refund down to the cent: 1999 × 33% = 659.67 → 659", async () => {
    const show = await makeShow();
    await db.insert(showSettings).values({ showId: show.id, entryFeeCents: 1999, withdrawalRefundPercent: 33 });
    const a = await makeEntry(show.id, entrant.id);
    const paymentId = await payByCard(entrant, show.slug, [a.id]);
    actAs(entrant.cookie);
    expect(await withdrawEntryAction(null, { entryId: a.id })).toMatchObject({ ok: true, message: expect.stringContaining("$6.59") });
    expect((await paymentRow(paymentId)).refundedCents).toBe(659);
  });

  it("withdraws an unpaid entry with no refund, and refuses a second withdrawal", async () => {
    const show = await showWithFees(50);
    const a = await makeEntry(show.id, entrant.id);
    actAs(entrant.cookie);
    expect(await withdrawEntryAction(null, { entryId: a.id })).toMatchObject({ ok: true, message: `Entry ${a.entryNumber} is withdrawn.` });
    expect(await withdrawEntryAction(null, { entryId: a.id })).toMatchObject({ ok: false, status: 409, message: "This entry is already withdrawn." });
  });

  it("refuses after entries close, with the closing time in the show's zone, and changes nothing", async () => {
    const show = await showWithFees(50);
    await db.update(shows).set({ entryClosesAt: new Date("2026-03-01T06:00:00Z") }).where(eq(shows.id, show.id));
    const a = await makeEntry(show.id, entrant.id);
    actAs(entrant.cookie);
    const r = await withdrawEntryAction(null, { entryId: a.id });
    expect(r).toMatchObject({ ok: false, status: 409, message: "Entries are closed; ask the show chair to withdraw this quilt." });
    expect((await entryRow(a.id)).status).toBe("submitted");
  });

  it("refuses the entrant while the show is judging, even before the closing time, and changes nothing", async () => {
    for (const status of ["entries_closed", "judging", "results_published"] as const) {
      const show = await showWithFees(50);
      const a = await makeEntry(show.id, entrant.id, { status: "accepted" });
      await db.update(shows).set({ status }).where(eq(shows.id, show.id)); // closing time still 30 days ahead
      actAs(entrant.cookie);
      const r = await withdrawEntryAction(null, { entryId: a.id });
      expect(r, status).toMatchObject({ ok: false, status: 409, message: "Entries are closed; ask the show chair to withdraw this quilt." });
      expect((await entryRow(a.id)).status).toBe("accepted");
      expect(await db.select().from(auditLog).where(eq(auditLog.subjectId, a.id))).toEqual([]);
      const [group] = await myEntriesByShow({ id: entrant.id, name: entrant.name, email: entrant.email, isAdmin: false, roles: [] }).then((gs) => gs.filter((g) => g.show.id === show.id));
      expect(group!.withdrawOpen).toBe(false);
      expect(group!.entries.find((e) => e.id === a.id)!.canWithdraw).toBe(false);
    }
  });

  it("answers 404 for someone else's entry and 400 for a malformed id", async () => {
    const show = await showWithFees(50);
    const other = await makeUser();
    const theirs = await makeEntry(show.id, other.id);
    actAs(entrant.cookie);
    expect(await withdrawEntryAction(null, { entryId: theirs.id })).toMatchObject({ ok: false, status: 404 });
    expect((await entryRow(theirs.id)).status).toBe("submitted");
    expect(await withdrawEntryAction(null, { entryId: "nope" })).toMatchObject({ ok: false, status: 400, fieldErrors: { entryId: [expect.any(String)] } });
  });
});

describe("withdrawEntryAsChairAction", () => {
  it("lets the chair withdraw a card-paid entry during judging, with the reason audited and the show's refund: 2500 × 50% = 1250", async () => {
    const show = await showWithFees(50);
    const chair = await makeUser({ name: "Chair Wren" });
    await grantRole(chair.id, show.id, "chair");
    const a = await makeEntry(show.id, entrant.id, { title: "Late Change" });
    const paymentId = await payByCard(entrant, show.slug, [a.id]);
    await db.update(entries).set({ status: "received" }).where(eq(entries.id, a.id)); // checked in at the desk
    await db.update(shows).set({ status: "judging" }).where(eq(shows.id, show.id));

    actAs(chair.cookie);
    const missing = await withdrawEntryAsChairAction(null, { showSlug: show.slug, entryId: a.id, reason: "   " });
    expect(missing).toMatchObject({ ok: false, status: 400, fieldErrors: { reason: [expect.any(String)] } });
    expect((await entryRow(a.id)).status).toBe("received");

    const r = await withdrawEntryAsChairAction(null, { showSlug: show.slug, entryId: a.id, reason: "  The entrant is unwell and asked for it back  " });
    expect(r).toMatchObject({ ok: true, message: `Entry ${a.entryNumber} is withdrawn. A refund of $12.50 is on its way to the entrant's card.` });
    const after = await entryRow(a.id);
    expect([after.status, after.entryNumber]).toEqual(["withdrawn", a.entryNumber]);
    expect(await paymentRow(paymentId)).toMatchObject({ refundedCents: 1250, status: "partially_refunded" });
    const audit = await db.select().from(auditLog).where(eq(auditLog.subjectId, a.id));
    expect(audit.filter((x) => x.action === "entry.withdrawn")).toEqual([
      expect.objectContaining({
        actorUserId: chair.id,
        before: { status: "received" },
        after: { status: "withdrawn", refundCents: 1250, withdrawnBy: "chair", reason: "The entrant is unwell and asked for it back" },
      }),
    ]);

    expect(await withdrawEntryAsChairAction(null, { showSlug: show.slug, entryId: a.id, reason: "Again" })).toMatchObject({ ok: false, status: 409, message: "This entry is already withdrawn." });
  });

  it("refuses once results are out, and refuses an entry of another show as not found", async () => {
    const show = await showWithFees(50);
    const chair = await makeUser();
    await grantRole(chair.id, show.id, "chair");
    const a = await makeEntry(show.id, entrant.id, { status: "judged" });
    const elsewhere = await makeEntry((await makeShow()).id, entrant.id);
    await db.update(shows).set({ status: "results_published" }).where(eq(shows.id, show.id));
    actAs(chair.cookie);
    expect(await withdrawEntryAsChairAction(null, { showSlug: show.slug, entryId: a.id, reason: "Asked" })).toMatchObject({ ok: false, status: 409, message: "The results are out, so entries can no longer be withdrawn." });
    expect(await withdrawEntryAsChairAction(null, { showSlug: show.slug, entryId: elsewhere.id, reason: "Asked" })).toMatchObject({ ok: false, status: 404 });
    expect((await entryRow(a.id)).status).toBe("judged");
    expect((await entryRow(elsewhere.id)).status).toBe("submitted");
  });
});

describe("My entries: what each entry shows", () => {
  it("gives the refund a withdrawal would give, the waiting list, and decisions only once released", async () => {
    const person = await makeUser();
    const show = await showWithFees(50);
    const paid = await makeEntry(show.id, person.id, { title: "Paid By Card" });
    await payByCard(person, show.slug, [paid.id]);
    const waiting = await makeEntry(show.id, person.id, { waitlisted: true });
    const unreleased = await makeEntry(show.id, person.id, { status: "accepted", paidAt: new Date(), paymentReference: "cash" });
    const declined = await makeEntry(show.id, person.id, { status: "declined", decisionReason: "Over the size limit.", decisionReleasedAt: new Date() });
    const unpaid = await makeEntry(show.id, person.id);

    const [group] = await myEntriesByShow({ id: person.id, name: person.name, email: person.email, isAdmin: false, roles: [] });
    expect(group!.show.id).toBe(show.id);
    expect(group!.refundPercent).toBe(50);
    const byId = new Map(group!.entries.map((e) => [e.id, e]));
    expect(byId.get(paid.id)).toMatchObject({ status: "paid", paidByCard: true, refundIfWithdrawnCents: 1250, canWithdraw: true, canPay: false });
    expect(byId.get(waiting.id)).toMatchObject({ status: "waitlisted", canPay: false });
    expect(byId.get(unreleased.id)).toMatchObject({ status: "paid", paidByCard: false, refundIfWithdrawnCents: 0 });
    expect(byId.get(declined.id)).toMatchObject({ status: "declined", decisionReason: "Over the size limit.", canWithdraw: false });
    expect(byId.get(unpaid.id)).toMatchObject({ status: "submitted", canPay: true });
    // Toward the cap: the card payment and the entry paid in cash (2500 + 2500), not the declined one.
    expect(group!.entryFeesAlreadyPaidCents).toBe(2500 + 2500);
  });
});
