// Asking for a judge's critique: on the entry form's About step, then on "My entries" until entries
// close; the critique fee in checkout (with the entry fee, or on its own for an entry already paid),
// and the critique then available once results are out.
import { and, eq } from "drizzle-orm";
import type Stripe from "stripe";
import { beforeAll, describe, expect, it } from "vitest";
import { saveAboutAction } from "@/app/(entrant)/entries/[id]/actions";
import { setCritiqueRequestAction, startCheckoutAction } from "@/app/(entrant)/my/actions";
import { POST } from "@/app/api/payments/webhook/route";
import { db } from "@/db/client";
import { myEntriesByShow } from "@/db/queries/entrant-shows";
import { critiqueAvailability } from "@/db/queries/published-results";
import { auditLog, entries, paymentItems, payments, showSettings, shows } from "@/db/schema";
import { env } from "@/lib/env";
import { stripe } from "@/lib/payments";
import { makeEntry, makeShow, makeUser, type TestUser } from "../../helpers/factories";
import { actAs } from "../../helpers/request-context";

const FAKE = `http://127.0.0.1:${env.STRIPE_API_PORT}`;

async function payAtFake(sessionId: string) {
  const res = await fetch(`${FAKE}/_fake/sessions/${sessionId}/complete`, { method: "POST" });
  expect(res.status).toBe(200);
  const event = (await res.json()) as Stripe.Event;
  const body = JSON.stringify(event);
  const signature = stripe.webhooks.generateTestHeaderString({ payload: body, secret: env.STRIPE_WEBHOOK_SECRET });
  const answer = await POST(new Request("http://127.0.0.1:3100/api/payments/webhook", { method: "POST", headers: { "content-type": "application/json", "stripe-signature": signature }, body }));
  expect(answer.status).toBe(200);
}

async function checkout(user: TestUser, showSlug: string, entryIds: string[]) {
  actAs(user.cookie);
  const result = await startCheckoutAction(null, { showSlug, entryIds });
  if (!result.ok) throw new Error(`checkout refused: ${result.status} ${result.message}`);
  const [row] = await db.select().from(payments).where(eq(payments.id, result.data!.paymentId));
  return { ...result.data!, sessionId: row!.checkoutSessionId ?? "" };
}

const asked = async (id: string) => (await db.select({ v: entries.critiqueRequested }).from(entries).where(eq(entries.id, id)))[0]!.v;
const placed = { entryId: "x", place: 1, ribbon: null, awards: [] } as unknown as Parameters<typeof critiqueAvailability>[2];

let entrant: TestUser;
let show: { id: string; slug: string; name: string };

beforeAll(async () => {
  entrant = await makeUser({ name: "Iris Calloway" });
  show = await makeShow({ name: "Critique Test Quilt Show" });
  // Invented fees: entry 25.00, critique 5.00.
  await db.insert(showSettings).values({ showId: show.id, entryFeeCents: 2500, memberEntryFeeCents: 2500, critiqueFeeCents: 500 });
});

describe("asking for a critique while entering", () => {
  it("the About step saves the request on a draft", async () => {
    const draft = await makeEntry(show.id, entrant.id, { status: "draft" });
    actAs(entrant.cookie);
    const r = await saveAboutAction(null, { entryId: draft.id, statement: "Scraps from my grandmother.", declaredValue: "800", forSale: false, price: "", judged: "judged", division: "open", youthAge: "", critiqueRequested: true });
    expect(r).toMatchObject({ ok: true });
    expect(await asked(draft.id)).toBe(true);
  });

  it("the request is charged with the entry fee in checkout", async () => {
    const e = await makeEntry(show.id, entrant.id, { title: "Grandmother's Garden", critiqueRequested: true });
    const c = await checkout(entrant, show.slug, [e.id]);
    expect(c.totalCents).toBe(3000);
    const kinds = (await db.select({ kind: paymentItems.kind }).from(paymentItems).where(eq(paymentItems.paymentId, c.paymentId))).map((i) => i.kind).sort();
    expect(kinds).toEqual(["critique", "entry"]);
  });
});

describe("asking on My entries until entries close", () => {
  it("an entry already paid gets a critique-only line, paid on its own, and its critique becomes available", async () => {
    const e = await makeEntry(show.id, entrant.id, { title: "Late Thoughts" });
    await payAtFake((await checkout(entrant, show.slug, [e.id])).sessionId);
    const [paid] = await db.select({ status: entries.status }).from(entries).where(eq(entries.id, e.id));
    expect(paid!.status).toBe("paid");
    expect(critiqueAvailability({ commentPolicy: "all", critiqueFeeCents: 500 }, { critiqueRequested: false }, placed)).toMatchObject({ available: false });

    actAs(entrant.cookie);
    expect(await setCritiqueRequestAction(null, { entryId: e.id, requested: true })).toMatchObject({ ok: true });
    expect(await asked(e.id)).toBe(true);

    const mine = (await myEntriesByShow({ id: entrant.id, email: entrant.email } as never)).find((g) => g.show.id === show.id)!;
    const card = mine.entries.find((x) => x.id === e.id)!;
    expect(card).toMatchObject({ critiqueRequested: true, critiqueDue: true, canPay: true, critiqueChangeable: true });

    const c = await checkout(entrant, show.slug, [e.id]);
    expect(c.totalCents).toBe(500);
    const items = await db.select({ kind: paymentItems.kind, amountCents: paymentItems.amountCents }).from(paymentItems).where(eq(paymentItems.paymentId, c.paymentId));
    expect(items).toEqual([{ kind: "critique", amountCents: 500 }]);
    await payAtFake(c.sessionId);
    const [p] = await db.select({ status: payments.status }).from(payments).where(eq(payments.id, c.paymentId));
    expect(p!.status).toBe("paid");
    const review = await db.select({ id: auditLog.id }).from(auditLog).where(and(eq(auditLog.subjectId, c.paymentId), eq(auditLog.action, "payment.needs_review")));
    expect(review).toHaveLength(0);

    const after = (await myEntriesByShow({ id: entrant.id, email: entrant.email } as never)).find((g) => g.show.id === show.id)!.entries.find((x) => x.id === e.id)!;
    expect(after).toMatchObject({ critiqueDue: false, critiquePaid: true, canPay: false, critiqueChangeable: false });
    // Paid for: it cannot be taken back here.
    expect(await setCritiqueRequestAction(null, { entryId: e.id, requested: false })).toMatchObject({ ok: false, status: 409 });
    expect(critiqueAvailability({ commentPolicy: "all", critiqueFeeCents: 500 }, { critiqueRequested: await asked(e.id) }, placed)).toEqual({ available: true });
  });

  it("turning the request on or off expires an open checkout priced the other way", async () => {
    const e = await makeEntry(show.id, entrant.id, { title: "Second Guess" });
    const c = await checkout(entrant, show.slug, [e.id]);
    actAs(entrant.cookie);
    expect(await setCritiqueRequestAction(null, { entryId: e.id, requested: true })).toMatchObject({ ok: true });
    const [old] = await db.select({ status: payments.status }).from(payments).where(eq(payments.id, c.paymentId));
    expect(old!.status).toBe("expired");
    expect((await checkout(entrant, show.slug, [e.id])).totalCents).toBe(3000);
  });

  it("after entries close the request can't be changed; another entrant's entry answers 404", async () => {
    const closed = await makeShow({ name: "Closed Critique Show" });
    await db.insert(showSettings).values({ showId: closed.id, critiqueFeeCents: 500 });
    await db.update(shows).set({ entryClosesAt: new Date(Date.now() - 60_000) }).where(eq(shows.id, closed.id));
    const e = await makeEntry(closed.id, entrant.id);
    actAs(entrant.cookie);
    expect(await setCritiqueRequestAction(null, { entryId: e.id, requested: true })).toMatchObject({ ok: false, status: 409, message: expect.stringContaining("Entries are closed") });
    expect(await asked(e.id)).toBe(false);
    const other = await makeUser();
    actAs(other.cookie);
    expect(await setCritiqueRequestAction(null, { entryId: e.id, requested: true })).toMatchObject({ ok: false, status: 404 });
  });

  it("an entry paid to the show directly is sent to the chair for a critique", async () => {
    const e = await makeEntry(show.id, entrant.id, { status: "paid", paidAt: new Date(), paymentReference: "cash" });
    actAs(entrant.cookie);
    expect(await setCritiqueRequestAction(null, { entryId: e.id, requested: true })).toMatchObject({ ok: false, status: 409, message: expect.stringContaining("chair") });
  });
});


