// The payments fake driven by the real Stripe SDK: Checkout Sessions, the hosted test page, signed
// webhook delivery (with retries, resends and arbitrary events), and the app's webhook route
// verifying and recording what the fake sends.
import { createHmac } from "node:crypto";
import http from "node:http";
import type { AddressInfo } from "node:net";
import { eq, inArray } from "drizzle-orm";
import Stripe from "stripe";
import { afterAll, beforeAll, beforeEach, describe, expect, it } from "vitest";
import { POST } from "@/app/api/payments/webhook/route";
import { db } from "@/db/client";
import { recordCardDetails } from "@/db/queries/payments";
import { paymentEvents, payments } from "@/db/schema";
import { cardWords } from "@/scoring/fees";
import { makeShow, makeUser } from "../../helpers/factories";
import { env } from "@/lib/env";
import { startPaymentsFake, type PaymentsFake } from "@/scripts/fakes/payments-fake";

const SECRET_KEY = "sk_test_fake_suite";
const WEBHOOK_SECRET = env.STRIPE_WEBHOOK_SECRET; // the route verifies with this one

type Received = { headers: http.IncomingHttpHeaders; body: string };
type Receiver = { url: string; received: Received[]; statuses: number[]; close(): Promise<void> };
type FakeEvent = Stripe.Event & { data: { object: Stripe.Checkout.Session } };
type EventList = { data: FakeEvent[]; deliveries: Record<string, { attempts: number; delivered: boolean; lastStatus: number | null }> };

/** A tiny webhook endpoint; `statuses` is a queue of answers to give before falling back to 200. */
async function startReceiver(): Promise<Receiver> {
  const received: Received[] = [];
  const statuses: number[] = [];
  const server = http.createServer((req, res) => {
    const chunks: Buffer[] = [];
    req.on("data", (c: Buffer) => chunks.push(c));
    req.on("end", () => {
      received.push({ headers: req.headers, body: Buffer.concat(chunks).toString("utf8") });
      res.writeHead(statuses.shift() ?? 200, { "content-type": "application/json" }).end("{}");
    });
  });
  await new Promise<void>((r) => server.listen(0, "127.0.0.1", r));
  const { port } = server.address() as AddressInfo;
  return {
    url: `http://127.0.0.1:${port}/webhook`,
    received,
    statuses,
    close: () => new Promise<void>((r) => server.close(() => r())),
  };
}

/** A loopback port nothing listens on (bound once, then released). */
async function closedPort(): Promise<number> {
  const s = http.createServer();
  await new Promise<void>((r) => s.listen(0, "127.0.0.1", r));
  const { port } = s.address() as AddressInfo;
  await new Promise<void>((r) => s.close(() => r()));
  return port;
}

const sdkFor = (fake: PaymentsFake, key = SECRET_KEY) =>
  new Stripe(key, { host: "127.0.0.1", port: Number(new URL(fake.url).port), protocol: "http", maxNetworkRetries: 0 });

async function until(cond: () => boolean, timeoutMs = 3_000): Promise<void> {
  const end = Date.now() + timeoutMs;
  while (!cond()) {
    if (Date.now() > end) throw new Error("condition not met in time");
    await new Promise((r) => setTimeout(r, 20));
  }
}

const sessionParams = (overrides: Partial<Stripe.Checkout.SessionCreateParams> = {}): Stripe.Checkout.SessionCreateParams => ({
  mode: "payment",
  line_items: [
    { price_data: { currency: "usd", unit_amount: 2500, product_data: { name: "Entry fee: Bed quilt" } }, quantity: 2 },
    { price_data: { currency: "usd", unit_amount: 1000, product_data: { name: "Late entry fee" } }, quantity: 1 },
  ],
  metadata: { entryId: "ent_42", showId: "show_7" },
  client_reference_id: "person_9",
  customer_email: "maker@example.test",
  success_url: "http://127.0.0.1:3100/entries/paid?session={CHECKOUT_SESSION_ID}",
  cancel_url: "http://127.0.0.1:3100/entries/cancelled",
  ...overrides,
});

const postWebhook = (body: string, signature: string | null) =>
  POST(
    new Request("http://127.0.0.1:3100/api/payments/webhook", {
      method: "POST",
      headers: { "content-type": "application/json", ...(signature ? { "stripe-signature": signature } : {}) },
      body,
    }),
  );

let receiver: Receiver;
let fake: PaymentsFake;
let stripe: Stripe;
const eventIds: string[] = [];

beforeAll(async () => {
  receiver = await startReceiver();
  fake = await startPaymentsFake({
    port: 0,
    host: "127.0.0.1",
    secretKey: SECRET_KEY,
    webhookSecret: WEBHOOK_SECRET,
    webhookUrl: receiver.url,
    retryDelaysMs: [30, 60],
    quiet: true,
  });
  stripe = sdkFor(fake);
});

beforeEach(() => {
  receiver.received.length = 0;
  receiver.statuses.length = 0;
});

afterAll(async () => {
  await fake?.stop();
  await receiver?.close();
  if (eventIds.length) await db.delete(paymentEvents).where(inArray(paymentEvents.eventId, eventIds));
});

describe("payments fake: Checkout Sessions through the real SDK", () => {
  it("creates a session shaped like Stripe's and retrieves it", async () => {
    const before = Math.floor(Date.now() / 1000);
    const s = await stripe.checkout.sessions.create(sessionParams());
    expect(s.id).toMatch(/^cs_test_[0-9a-f]{24}$/);
    expect(s).toMatchObject({
      object: "checkout.session",
      amount_total: 2 * 2500 + 1000,
      amount_subtotal: 6000,
      currency: "usd",
      status: "open",
      payment_status: "unpaid",
      url: `${fake.url}/pay/${s.id}`,
      metadata: { entryId: "ent_42", showId: "show_7" },
      client_reference_id: "person_9",
      customer_email: "maker@example.test",
      success_url: "http://127.0.0.1:3100/entries/paid?session={CHECKOUT_SESSION_ID}",
      cancel_url: "http://127.0.0.1:3100/entries/cancelled",
      livemode: false,
      payment_intent: null,
      mode: "payment",
    });
    expect(s.created).toBeGreaterThanOrEqual(before);
    expect(s.created).toBeLessThanOrEqual(Math.floor(Date.now() / 1000));
    expect(s.lastResponse.requestId).toMatch(/^req_/);

    const again = await stripe.checkout.sessions.retrieve(s.id);
    expect(again.id).toBe(s.id);
    expect(again.amount_total).toBe(6000);
    expect(again.metadata).toEqual({ entryId: "ent_42", showId: "show_7" });
  });

  it("answers an unknown session with a Stripe-shaped 404", async () => {
    const err = await stripe.checkout.sessions.retrieve("cs_test_nope").catch((e: unknown) => e);
    expect(err).toBeInstanceOf(Stripe.errors.StripeInvalidRequestError);
    expect(err).toMatchObject({ statusCode: 404, code: "resource_missing", type: "StripeInvalidRequestError" });
    expect((err as Error).message).toContain("cs_test_nope");
  });

  it("refuses a wrong or missing API key with 401", async () => {
    const err = await sdkFor(fake, "sk_test_wrong").checkout.sessions.retrieve("cs_test_x").catch((e: unknown) => e);
    expect(err).toBeInstanceOf(Stripe.errors.StripeAuthenticationError);
    expect((err as Stripe.errors.StripeError).statusCode).toBe(401);

    const raw = await fetch(`${fake.url}/v1/checkout/sessions/cs_test_x`);
    expect(raw.status).toBe(401);
    expect(((await raw.json()) as { error: { type: string } }).error.type).toBe("authentication_error");
  });

  it("reports validation errors with the offending param", async () => {
    const noItems = await stripe.checkout.sessions.create(sessionParams({ line_items: undefined })).catch((e: unknown) => e);
    expect(noItems).toMatchObject({ statusCode: 400, param: "line_items", type: "StripeInvalidRequestError" });

    const negative = await stripe.checkout.sessions
      .create(sessionParams({ line_items: [{ price_data: { currency: "usd", unit_amount: -5, product_data: { name: "x" } }, quantity: 1 }] }))
      .catch((e: unknown) => e);
    expect(negative).toMatchObject({ statusCode: 400, param: "line_items[0][price_data][unit_amount]" });

    const typo = await stripe.checkout.sessions.create({ ...sessionParams(), sucess_url: "x" } as Stripe.Checkout.SessionCreateParams).catch((e: unknown) => e);
    expect(typo).toMatchObject({ statusCode: 400, param: "sucess_url" });
  });

  it("replays a request with the same Idempotency-Key and refuses the key with other params", async () => {
    const key = `idem-${Date.now()}`;
    const a = await stripe.checkout.sessions.create(sessionParams(), { idempotencyKey: key });
    const b = await stripe.checkout.sessions.create(sessionParams(), { idempotencyKey: key });
    expect(b.id).toBe(a.id);
    const other = await stripe.checkout.sessions.create(sessionParams({ client_reference_id: "someone_else" }), { idempotencyKey: key }).catch((e: unknown) => e);
    expect(other).toBeInstanceOf(Stripe.errors.StripeIdempotencyError);
  });

  it("expires an open session and sends checkout.session.expired", async () => {
    const s = await stripe.checkout.sessions.create(sessionParams());
    const expired = await stripe.checkout.sessions.expire(s.id);
    expect(expired.status).toBe("expired");
    expect(expired.url).toBeNull();
    await until(() => receiver.received.length === 1);
    const event = JSON.parse(receiver.received[0]!.body) as FakeEvent;
    expect(event.type).toBe("checkout.session.expired");
    expect(event.data.object.id).toBe(s.id);
    const twice = await stripe.checkout.sessions.expire(s.id).catch((e: unknown) => e);
    expect(twice).toMatchObject({ statusCode: 400 });
  });
});

describe("payments fake: the card of a paid session", () => {
  it("answers the PaymentIntent and its latest Charge with the card's brand and last digits, as the API does", async () => {
    const s = await stripe.checkout.sessions.create(sessionParams());
    await fetch(`${fake.url}/_fake/sessions/${s.id}/complete`, { method: "POST" });
    const paid = await stripe.checkout.sessions.retrieve(s.id);
    const intent = await stripe.paymentIntents.retrieve(paid.payment_intent as string);
    expect(intent).toMatchObject({ object: "payment_intent", status: "succeeded", amount: 6000, latest_charge: expect.stringMatching(/^ch_test_/) });
    const charge = await stripe.charges.retrieve(intent.latest_charge as string);
    expect(charge.payment_method_details?.card).toMatchObject({ brand: "visa", last4: "4242" });
    await expect(stripe.charges.retrieve("ch_test_missing")).rejects.toMatchObject({ statusCode: 404, code: "resource_missing" });
  });

  it("recordCardDetails keeps them on our payment, for the receipt", async () => {
    const user = await makeUser();
    const show = await makeShow();
    const s = await stripe.checkout.sessions.create(sessionParams());
    await fetch(`${fake.url}/_fake/sessions/${s.id}/complete`, { method: "POST" });
    const [p] = await db.insert(payments).values({ showId: show.id, entrantUserId: user.id, checkoutSessionId: s.id, amountCents: 6000, currency: "usd", status: "paid", paidAt: new Date() }).returning({ id: payments.id });
    await recordCardDetails(p!.id, stripe);
    const [row] = await db.select({ brand: payments.cardBrand, last4: payments.cardLast4 }).from(payments).where(eq(payments.id, p!.id));
    expect(row).toEqual({ brand: "visa", last4: "4242" });
    expect(cardWords(row!.brand, row!.last4)).toBe("Visa card ending 4242");
  });
});

describe("payments fake: hosted test page", () => {
  it("shows the amount, e-mail and a Pay now button, and says it is a test page", async () => {
    const s = await stripe.checkout.sessions.create(sessionParams());
    const res = await fetch(s.url!);
    expect(res.status).toBe(200);
    expect(res.headers.get("content-type")).toContain("text/html");
    const html = await res.text();
    expect(html).toContain("<title>Test payment</title>");
    expect(html).toContain("$60.00");
    expect(html).toContain("maker@example.test");
    expect(html).toContain(">Pay now</button>");
    expect(html).toContain(`href="/pay/${s.id}/cancel">Cancel</a>`);
    expect(html).toMatch(/Local test payment page/);
    expect(html).toContain("Entry fee: Bed quilt × 2");
  });

  it("pays from the form: 303 to success_url with the session id, and a signed completed event", async () => {
    const s = await stripe.checkout.sessions.create(sessionParams());
    const res = await fetch(s.url!, { method: "POST", redirect: "manual" });
    expect(res.status).toBe(303);
    // {CHECKOUT_SESSION_ID} substitution per Stripe's Checkout docs ("custom success page").
    expect(res.headers.get("location")).toBe(`http://127.0.0.1:3100/entries/paid?session=${s.id}`);
    expect(receiver.received).toHaveLength(1);
    const event = stripe.webhooks.constructEvent(receiver.received[0]!.body, receiver.received[0]!.headers["stripe-signature"] as string, WEBHOOK_SECRET);
    expect(event.type).toBe("checkout.session.completed");
    expect((event.data.object as Stripe.Checkout.Session).id).toBe(s.id);

    const paid = await stripe.checkout.sessions.retrieve(s.id);
    expect(paid).toMatchObject({ status: "complete", payment_status: "paid", url: null });
    expect(paid.payment_intent).toMatch(/^pi_test_/);

    const again = await fetch(`${fake.url}/pay/${s.id}`);
    expect(await again.text()).toContain("already paid");
  });

  it("cancel redirects to cancel_url and leaves the session open", async () => {
    const s = await stripe.checkout.sessions.create(sessionParams());
    const res = await fetch(`${fake.url}/pay/${s.id}/cancel`, { redirect: "manual" });
    expect(res.status).toBe(303);
    expect(res.headers.get("location")).toBe("http://127.0.0.1:3100/entries/cancelled");
    expect((await stripe.checkout.sessions.retrieve(s.id)).status).toBe("open");
    expect(receiver.received).toHaveLength(0);
  });
});

describe("payments fake: signed webhooks", () => {
  let session: Stripe.Checkout.Session;
  let event: FakeEvent;
  let delivered: Received;

  beforeAll(async () => {
    receiver.received.length = 0;
    session = await stripe.checkout.sessions.create(sessionParams());
    const res = await fetch(`${fake.url}/_fake/sessions/${session.id}/complete`, { method: "POST" });
    expect(res.status).toBe(200);
    expect(res.headers.get("x-fake-delivered")).toBe("true");
    event = (await res.json()) as FakeEvent;
    expect(receiver.received).toHaveLength(1);
    delivered = receiver.received[0]!;
    eventIds.push(event.id);
  });

  it("completes the session and returns the event it delivered", () => {
    expect(event.id).toMatch(/^evt_test_/);
    expect(event).toMatchObject({ object: "event", type: "checkout.session.completed", livemode: false, api_version: Stripe.API_VERSION });
    expect(event.data.object).toMatchObject({ id: session.id, status: "complete", payment_status: "paid", amount_total: 6000, metadata: { entryId: "ent_42", showId: "show_7" } });
    expect(event.data.object.payment_intent).toMatch(/^pi_test_/);
    expect(JSON.parse(delivered.body)).toEqual(event);
    expect(delivered.headers["content-type"]).toContain("application/json");
  });

  it("signs with the documented scheme: t=<unix>,v1=HMAC-SHA256(secret, `${t}.${body}`)", () => {
    // Header format and signed payload per Stripe's "Verify webhook signatures manually" docs.
    const header = delivered.headers["stripe-signature"] as string;
    const m = /^t=(\d+),v1=([0-9a-f]{64})$/.exec(header);
    expect(m).not.toBeNull();
    expect(Math.abs(Number(m![1]) - Date.now() / 1000)).toBeLessThan(30);
    const expected = createHmac("sha256", WEBHOOK_SECRET).update(`${m![1]}.${delivered.body}`).digest("hex");
    expect(m![2]).toBe(expected);
  });

  it("is accepted by the SDK's constructEvent; a one-byte change or a wrong secret is refused", () => {
    const sig = delivered.headers["stripe-signature"] as string;
    const ok = stripe.webhooks.constructEvent(delivered.body, sig, WEBHOOK_SECRET);
    expect(ok.id).toBe(event.id);

    const tampered = delivered.body.replace('"amount_total": 6000', '"amount_total": 6001');
    expect(tampered.length).toBe(delivered.body.length);
    expect(tampered).not.toBe(delivered.body);
    expect(() => stripe.webhooks.constructEvent(tampered, sig, WEBHOOK_SECRET)).toThrow(Stripe.errors.StripeSignatureVerificationError);
    expect(() => stripe.webhooks.constructEvent(delivered.body, sig, "whsec_not_the_right_one")).toThrow(Stripe.errors.StripeSignatureVerificationError);
  });

  it("refuses to complete a session twice", async () => {
    const res = await fetch(`${fake.url}/_fake/sessions/${session.id}/complete`, { method: "POST" });
    expect(res.status).toBe(400);
    expect(((await res.json()) as { error: { type: string } }).error.type).toBe("invalid_request_error");
    expect(receiver.received).toHaveLength(0);
  });

  it("resends an event with the same id and byte-identical payload", async () => {
    const res = await fetch(`${fake.url}/_fake/events/${event.id}/resend`, { method: "POST" });
    expect(res.status).toBe(200);
    expect(receiver.received).toHaveLength(1);
    expect(receiver.received[0]!.body).toBe(delivered.body);
    const again = stripe.webhooks.constructEvent(receiver.received[0]!.body, receiver.received[0]!.headers["stripe-signature"] as string, WEBHOOK_SECRET);
    expect(again.id).toBe(event.id);
  });

  it("lists events newest first with their delivery state", async () => {
    const res = await fetch(`${fake.url}/_fake/events?type=checkout.session.completed`);
    const list = (await res.json()) as EventList;
    const mine = list.data.find((e) => e.id === event.id);
    expect(mine?.data.object.id).toBe(session.id);
    expect(list.data.every((e) => e.type === "checkout.session.completed")).toBe(true);
    expect(list.deliveries[event.id]).toMatchObject({ delivered: true, lastStatus: 200, attempts: 2 }); // first send + resend
    expect((await fetch(`${fake.url}/_fake/health`)).status).toBe(200);
  });

  it("sends an arbitrary signed event (for out-of-order tests)", async () => {
    const res = await fetch(`${fake.url}/_fake/events/send`, {
      method: "POST",
      headers: { "content-type": "application/json" },
      body: JSON.stringify({ type: "checkout.session.expired", object: { id: "cs_test_out_of_order", object: "checkout.session", status: "expired" } }),
    });
    expect(res.status).toBe(200);
    const sent = (await res.json()) as FakeEvent;
    expect(sent.type).toBe("checkout.session.expired");
    const got = stripe.webhooks.constructEvent(receiver.received[0]!.body, receiver.received[0]!.headers["stripe-signature"] as string, WEBHOOK_SECRET);
    expect(got.id).toBe(sent.id);
    expect((got.data.object as { id: string }).id).toBe("cs_test_out_of_order");
    eventIds.push(sent.id);

    const bad = await fetch(`${fake.url}/_fake/events/send`, { method: "POST", body: JSON.stringify({ type: "x" }) });
    expect(bad.status).toBe(400);
  });

  it("retries a failed delivery with the same payload until the endpoint accepts it", async () => {
    receiver.statuses.push(500);
    const s = await stripe.checkout.sessions.create(sessionParams());
    const warn = console.warn;
    console.warn = () => {}; // the fake logs the failed first attempt before it answers; expected here
    const res = await fetch(`${fake.url}/_fake/sessions/${s.id}/complete`, { method: "POST" }).finally(() => {
      console.warn = warn;
    });
    expect(res.headers.get("x-fake-delivered")).toBe("false");
    const ev = (await res.json()) as FakeEvent;
    await until(() => receiver.received.length === 2);
    expect(receiver.received[1]!.body).toBe(receiver.received[0]!.body);
    const list = (await (await fetch(`${fake.url}/_fake/events`)).json()) as EventList;
    expect(list.deliveries[ev.id]).toMatchObject({ attempts: 2, delivered: true, lastStatus: 200 });
  });

  it("gives up after a bounded number of attempts when nothing listens, and keeps serving", async () => {
    const lonely = await startPaymentsFake({
      port: 0,
      secretKey: SECRET_KEY,
      webhookSecret: WEBHOOK_SECRET,
      webhookUrl: `http://127.0.0.1:${await closedPort()}/webhook`,
      retryDelaysMs: [10, 20],
      quiet: true,
    });
    const warn = console.warn;
    console.warn = () => {}; // the fake logs each failed attempt; expected here
    try {
      const sdk = sdkFor(lonely);
      const s = await sdk.checkout.sessions.create(sessionParams());
      const res = await fetch(`${lonely.url}/_fake/sessions/${s.id}/complete`, { method: "POST" });
      expect(res.status).toBe(200);
      const ev = (await res.json()) as FakeEvent;
      let state: EventList["deliveries"][string] | undefined;
      const deadline = Date.now() + 3_000;
      do {
        await new Promise((r) => setTimeout(r, 30));
        state = ((await (await fetch(`${lonely.url}/_fake/events`)).json()) as EventList).deliveries[ev.id];
      } while (state!.attempts < 3 && Date.now() < deadline);
      await new Promise((r) => setTimeout(r, 100)); // no fourth attempt comes
      state = ((await (await fetch(`${lonely.url}/_fake/events`)).json()) as EventList).deliveries[ev.id];
      expect(state).toMatchObject({ attempts: 3, delivered: false, lastStatus: null });
      expect((await sdk.checkout.sessions.retrieve(s.id)).status).toBe("complete");
    } finally {
      console.warn = warn;
      await lonely.stop();
    }
  });
});

describe("POST /api/payments/webhook", () => {
  let body: string;
  let signature: string;
  let eventId: string;
  let sessionId: string;

  beforeAll(async () => {
    receiver.received.length = 0;
    const s = await stripe.checkout.sessions.create(sessionParams());
    sessionId = s.id;
    const ev = (await (await fetch(`${fake.url}/_fake/sessions/${s.id}/complete`, { method: "POST" })).json()) as FakeEvent;
    eventId = ev.id;
    eventIds.push(eventId);
    body = receiver.received[0]!.body;
    signature = receiver.received[0]!.headers["stripe-signature"] as string;
  });

  const rowsFor = (id: string) => db.select().from(paymentEvents).where(eq(paymentEvents.eventId, id));

  it("records a correctly signed event once", async () => {
    const res = await postWebhook(body, signature);
    expect(res.status).toBe(200);
    expect(await res.json()).toEqual({ received: true, duplicate: false });
    const rows = await rowsFor(eventId);
    expect(rows).toHaveLength(1);
    const event = JSON.parse(body) as FakeEvent;
    expect(rows[0]).toMatchObject({ eventId, type: "checkout.session.completed", objectId: sessionId });
    expect(rows[0]!.createdAt.getTime()).toBe(event.created * 1000);
    expect((rows[0]!.payload as FakeEvent).data.object.amount_total).toBe(6000);
  });

  it("answers a replay of the same event with duplicate: true and keeps one row", async () => {
    const res = await postWebhook(body, signature);
    expect(res.status).toBe(200);
    expect(await res.json()).toEqual({ received: true, duplicate: true });
    // A redelivery by the fake (new timestamp, same bytes) is a duplicate as well.
    receiver.received.length = 0;
    await fetch(`${fake.url}/_fake/events/${eventId}/resend`, { method: "POST" });
    const resent = await postWebhook(receiver.received[0]!.body, receiver.received[0]!.headers["stripe-signature"] as string);
    expect(await resent.json()).toEqual({ received: true, duplicate: true });
    expect(await rowsFor(eventId)).toHaveLength(1);
  });

  it("refuses a tampered body, a missing signature and an expired signature with 400", async () => {
    const tampered = body.replace('"amount_total": 6000', '"amount_total": 6001');
    expect(tampered).not.toBe(body);
    const bad = await postWebhook(tampered, signature);
    expect(bad.status).toBe(400);
    expect(await bad.json()).toMatchObject({ error: "invalid_signature" });

    const missing = await postWebhook(body, null);
    expect(missing.status).toBe(400);
    expect(await missing.json()).toMatchObject({ error: "invalid_signature", message: expect.stringContaining("missing") });

    // The SDK's default tolerance is 300 s (Stripe webhook docs: "replay attacks").
    const old = stripe.webhooks.generateTestHeaderString({ payload: body, secret: WEBHOOK_SECRET, timestamp: Math.floor(Date.now() / 1000) - 600 });
    const stale = await postWebhook(body, old);
    expect(stale.status).toBe(400);
    expect(await rowsFor(eventId)).toHaveLength(1);
  });

  it("records an out-of-order event for an unknown session without failing", async () => {
    const res = await fetch(`${fake.url}/_fake/events/send`, {
      method: "POST",
      headers: { "content-type": "application/json" },
      body: JSON.stringify({ type: "checkout.session.expired", object: { id: "cs_test_never_created", object: "checkout.session" } }),
    });
    const sent = (await res.json()) as FakeEvent;
    eventIds.push(sent.id);
    const last = receiver.received.at(-1)!;
    const routed = await postWebhook(last.body, last.headers["stripe-signature"] as string);
    expect(routed.status).toBe(200);
    expect((await rowsFor(sent.id))[0]).toMatchObject({ type: "checkout.session.expired", objectId: "cs_test_never_created" });
  });
});
