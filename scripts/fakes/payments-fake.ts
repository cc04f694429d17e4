// A local, in-memory fake of the slice of the Stripe API Ribbonry uses for entry fees, so dev and
// tests run offline with the real `stripe` SDK pointed at it (host/port/protocol options).
//
// Covered (v1, form-encoded like the SDK sends it):
//   POST /v1/checkout/sessions                (mode "payment", line_items with price_data only)
//   GET  /v1/checkout/sessions/:id
//   POST /v1/checkout/sessions/:id/expire
//   POST /v1/refunds                          (payment_intent + amount, against a paid session)
//   GET  /v1/payment_intents/:id, GET /v1/charges/:id  (of paid sessions; the card is Visa 4242)
//   Bearer (or Basic) secret-key auth, Stripe-shaped errors, Request-Id, Idempotency-Key replay.
//   A hosted test checkout page (GET/POST /pay/:id, GET /pay/:id/cancel) and signed webhook events
//   checkout.session.completed / checkout.session.expired, retried with bounded backoff.
// Not covered: Prices/Products objects, customers, creating or confirming PaymentIntents, list endpoints,
//   `expand`, subscriptions/setup mode, refunds, API-version differences.
// Test controls (not Stripe): GET /_fake/health, GET /_fake/events, POST /_fake/events/:id/resend,
//   POST /_fake/sessions/:id/complete, POST /_fake/events/send.
//
// Written by hand: no npm package fakes Stripe offline (stripe-mock is a Go binary that has to be
// downloaded, and node_modules holds only the `stripe` SDK itself).
import { randomBytes } from "node:crypto";
import http from "node:http";
import Stripe from "stripe";

export type PaymentsFakeOptions = {
  port: number;
  host?: string;
  secretKey: string;
  webhookSecret: string;
  webhookUrl: string;
  /** Base URL browsers use to reach the hosted page; defaults to http://host:port. */
  publicUrl?: string;
  /** Waits between delivery attempts; the first attempt is immediate. Bounded on purpose. */
  retryDelaysMs?: number[];
  /** Suppress informational logs (delivery failures are always logged). */
  quiet?: boolean;
};

export type PaymentsFake = { url: string; stop(): Promise<void> };

type Json = Record<string, unknown>;

type LineItem = { name: string; unitAmount: number; quantity: number; currency: string };

type Session = {
  id: string;
  object: "checkout.session";
  amount_subtotal: number;
  amount_total: number;
  currency: string;
  status: "open" | "complete" | "expired";
  payment_status: "unpaid" | "paid";
  url: string | null;
  metadata: Record<string, string>;
  client_reference_id: string | null;
  customer_email: string | null;
  customer_details: { email: string | null } | null;
  success_url: string | null;
  cancel_url: string | null;
  mode: "payment";
  created: number;
  expires_at: number;
  livemode: false;
  payment_intent: string | null;
};

type FakeEvent = {
  id: string;
  object: "event";
  api_version: string;
  created: number;
  type: string;
  livemode: false;
  pending_webhooks: number;
  request: { id: null; idempotency_key: null };
  data: { object: Json };
};

type Delivery = { attempts: number; delivered: boolean; lastStatus: number | null; lastError: string | null };
type StoredEvent = { event: FakeEvent; payload: string; delivery: Delivery };

class ApiError extends Error {
  constructor(
    readonly status: number,
    readonly type: string,
    message: string,
    readonly extra: { param?: string; code?: string } = {},
  ) {
    super(message);
  }
}

const DEFAULT_RETRY_DELAYS_MS = [500, 2_000, 5_000];
const MAX_BODY_BYTES = 1_000_000;
// Currencies Stripe treats as having no minor unit (per Stripe's "zero-decimal currencies" docs).
const ZERO_DECIMAL = new Set(["bif", "clp", "djf", "gnf", "jpy", "kmf", "krw", "mga", "pyg", "rwf", "ugx", "vnd", "vuv", "xaf", "xof", "xpf"]);
const CREATE_PARAMS = new Set([
  "mode", "line_items", "success_url", "cancel_url", "customer_email", "client_reference_id", "metadata",
  "currency", "expires_at", "payment_method_types", "locale", "submit_type", "expand", "payment_intent_data",
]);

const newId = (prefix: string) => `${prefix}_${randomBytes(12).toString("hex")}`;
const nowSec = () => Math.floor(Date.now() / 1000);
const clone = <T>(v: T): T => JSON.parse(JSON.stringify(v)) as T;

export async function startPaymentsFake(opts: PaymentsFakeOptions): Promise<PaymentsFake> {
  const host = opts.host ?? "127.0.0.1";
  const retryDelays = opts.retryDelaysMs ?? DEFAULT_RETRY_DELAYS_MS;
  // Only the webhook helpers are used; constructing the client makes no network call.
  const signer = new Stripe("sk_test_payments_fake_signer");
  const sessions = new Map<string, Session>();
  const lineItems = new Map<string, LineItem[]>();
  const events = new Map<string, StoredEvent>();
  const idempotent = new Map<string, { fingerprint: string; status: number; body: string }>();
  const refundedByIntent = new Map<string, number>();
  const refunds: Json[] = [];
  // A paid session's PaymentIntent and its Charge, as the API returns them (Stripe API reference:
  // PaymentIntent.latest_charge, Charge.payment_method_details.card.brand / last4). The fake's test
  // card is always a Visa ending 4242, Stripe's own test card number.
  const intents = new Map<string, Json>();
  const charges = new Map<string, Json>();
  const timers = new Set<NodeJS.Timeout>();
  let stopped = false;
  let baseUrl = "";
  const info = (msg: string) => {
    if (!opts.quiet) console.log(`[payments-fake] ${msg}`);
  };

  // --- webhook events -------------------------------------------------------------------------

  function recordEvent(type: string, object: Json): StoredEvent {
    const event: FakeEvent = {
      id: newId("evt_test"),
      object: "event",
      api_version: Stripe.API_VERSION,
      created: nowSec(),
      type,
      livemode: false,
      pending_webhooks: 1,
      request: { id: null, idempotency_key: null },
      data: { object: clone(object) },
    };
    // The exact bytes are kept so a resend is byte-identical (replay tests depend on it).
    const stored = { event, payload: JSON.stringify(event, null, 2), delivery: { attempts: 0, delivered: false, lastStatus: null, lastError: null } };
    events.set(event.id, stored);
    return stored;
  }

  async function attempt(stored: StoredEvent): Promise<boolean> {
    const { delivery } = stored;
    delivery.attempts += 1;
    try {
      // Signed afresh on every attempt, like Stripe: the timestamp in the header is the send time.
      const signature = signer.webhooks.generateTestHeaderString({ payload: stored.payload, secret: opts.webhookSecret });
      const res = await fetch(opts.webhookUrl, {
        method: "POST",
        headers: { "content-type": "application/json; charset=utf-8", "stripe-signature": signature, "user-agent": "Stripe/1.0 (payments-fake)" },
        body: stored.payload,
        signal: AbortSignal.timeout(10_000),
      });
      await res.arrayBuffer().catch(() => undefined);
      delivery.lastStatus = res.status;
      delivery.lastError = res.ok ? null : `HTTP ${res.status}`;
      if (res.ok) delivery.delivered = true;
      return res.ok;
    } catch (err) {
      delivery.lastStatus = null;
      delivery.lastError = err instanceof Error ? `${err.name}: ${err.cause instanceof Error ? err.cause.message : err.message}` : String(err);
      return false;
    }
  }

  /** First attempt is awaited (so callers see its outcome); retries run in the background. */
  async function deliver(stored: StoredEvent): Promise<Delivery> {
    if (await attempt(stored)) return stored.delivery;
    const retry = (i: number) => {
      const delay = retryDelays[i];
      if (stopped || delay === undefined) {
        console.warn(`[payments-fake] giving up on ${stored.event.type} ${stored.event.id} to ${opts.webhookUrl} after ${stored.delivery.attempts} attempt(s): ${stored.delivery.lastError}`);
        return;
      }
      console.warn(`[payments-fake] delivery of ${stored.event.id} failed (${stored.delivery.lastError}); retrying in ${delay} ms`);
      const t = setTimeout(() => {
        timers.delete(t);
        void attempt(stored).then((ok) => ok || retry(i + 1));
      }, delay);
      timers.add(t);
    };
    retry(0);
    return stored.delivery;
  }

  // --- checkout sessions ----------------------------------------------------------------------

  function createSession(params: Json): Session {
    for (const key of Object.keys(params)) {
      if (!CREATE_PARAMS.has(key)) throw invalid(`Received unknown parameter: ${key}`, key);
    }
    if (params.mode !== "payment") throw invalid("This fake supports only `mode: payment`.", "mode");
    const successUrl = optionalString(params, "success_url");
    if (!successUrl) throw invalid("Missing required param: success_url.", "success_url");
    const items = parseLineItems(params.line_items, optionalString(params, "currency"));
    const first = items[0];
    if (!first) throw invalid("Missing required param: line_items.", "line_items");
    const email = optionalString(params, "customer_email");
    if (email !== null && !/^[^@\s]+@[^@\s]+$/.test(email)) throw invalid("Invalid email address: " + email, "customer_email");
    const clientRef = optionalString(params, "client_reference_id");
    if (clientRef !== null && clientRef.length > 200) throw invalid("client_reference_id must be at most 200 characters.", "client_reference_id");
    const total = items.reduce((sum, li) => sum + li.unitAmount * li.quantity, 0);
    const created = nowSec();
    const id = newId("cs_test");
    const session: Session = {
      id,
      object: "checkout.session",
      amount_subtotal: total,
      amount_total: total,
      currency: first.currency,
      status: "open",
      payment_status: "unpaid",
      url: `${baseUrl}/pay/${id}`,
      metadata: parseMetadata(params.metadata),
      client_reference_id: clientRef,
      customer_email: email,
      customer_details: null,
      success_url: successUrl,
      cancel_url: optionalString(params, "cancel_url"),
      mode: "payment",
      created,
      expires_at: params.expires_at !== undefined ? toInt(params.expires_at, "expires_at", created + 1800) : created + 24 * 3600,
      livemode: false,
      payment_intent: null,
    };
    sessions.set(id, session);
    lineItems.set(id, items);
    info(`session ${id} created for ${formatAmount(total, session.currency)}`);
    return session;
  }

  function getSession(id: string): Session {
    const s = sessions.get(id);
    if (!s) throw new ApiError(404, "invalid_request_error", `No such checkout.session: '${id}'`, { code: "resource_missing", param: "session" });
    return s;
  }

  function completeSession(id: string): StoredEvent {
    const s = getSession(id);
    if (s.status !== "open") throw invalid(`This Checkout Session is ${s.status} and can no longer be paid.`, "session");
    s.status = "complete";
    s.payment_status = "paid";
    s.payment_intent = newId("pi_test");
    const chargeId = newId("ch_test");
    const paymentMethodId = newId("pm_test");
    const created = nowSec();
    intents.set(s.payment_intent, {
      id: s.payment_intent, object: "payment_intent", amount: s.amount_total, amount_received: s.amount_total, currency: s.currency,
      status: "succeeded", latest_charge: chargeId, payment_method: paymentMethodId, payment_method_types: ["card"], created, livemode: false, metadata: {},
    });
    charges.set(chargeId, {
      id: chargeId, object: "charge", amount: s.amount_total, amount_captured: s.amount_total, currency: s.currency, paid: true, captured: true,
      status: "succeeded", payment_intent: s.payment_intent, payment_method: paymentMethodId, created, livemode: false, metadata: {},
      payment_method_details: { type: "card", card: { brand: "visa", last4: "4242", exp_month: 12, exp_year: new Date().getUTCFullYear() + 3, funding: "credit", country: "US" } },
    });
    s.customer_details = { email: s.customer_email };
    s.url = null;
    info(`session ${id} paid`);
    return recordEvent("checkout.session.completed", s as unknown as Json);
  }

  function expireSession(id: string): StoredEvent {
    const s = getSession(id);
    if (s.status !== "open") throw invalid("Only Checkout Sessions with a status of `open` can be expired.", "session");
    s.status = "expired";
    s.url = null;
    return recordEvent("checkout.session.expired", s as unknown as Json);
  }

  // --- HTTP -----------------------------------------------------------------------------------

  async function route(req: http.IncomingMessage, res: http.ServerResponse, body: string): Promise<void> {
    const url = new URL(req.url ?? "/", "http://fake.invalid");
    const path = url.pathname.replace(/\/+$/, "") || "/";
    const method = req.method ?? "GET";
    let m: RegExpMatchArray | null;

    if (path.startsWith("/v1/")) {
      if (!authorized(req.headers.authorization, opts.secretKey)) {
        throw new ApiError(401, "authentication_error", "Invalid API Key provided. The payments fake expects the STRIPE_SECRET_KEY it was started with.");
      }
      const idemKey = method === "POST" ? headerValue(req.headers["idempotency-key"]) : null;
      const fingerprint = `${method} ${path} ${body}`;
      if (idemKey) {
        const prior = idempotent.get(idemKey);
        if (prior && prior.fingerprint !== fingerprint) {
          throw new ApiError(400, "idempotency_error", "Keys for idempotent requests can only be used with the same parameters they were first used with.");
        }
        // A retried request (the SDK retries with the same key) gets the first answer back.
        if (prior) return send(res, prior.status, prior.body, "application/json", { "idempotent-replayed": "true" });
      }
      const [status, payload] = await v1(method, path, body);
      const text = JSON.stringify(payload, null, 2);
      if (idemKey) idempotent.set(idemKey, { fingerprint, status, body: text });
      return send(res, status, text, "application/json");
    }

    if (method === "GET" && path === "/_fake/health") return sendJson(res, 200, { ok: true });
    if (method === "GET" && path === "/_fake/refunds") return sendJson(res, 200, { data: refunds });
    if (method === "GET" && path === "/_fake/events") {
      const type = url.searchParams.get("type");
      const list = [...events.values()].reverse().filter((e) => !type || e.event.type === type);
      return sendJson(res, 200, {
        object: "list",
        data: list.map((e) => e.event),
        deliveries: Object.fromEntries(list.map((e) => [e.event.id, e.delivery])),
        has_more: false,
      });
    }
    if (method === "POST" && (m = path.match(/^\/_fake\/events\/([^/]+)\/resend$/))) {
      const stored = events.get(decodeURIComponent(m[1]!));
      if (!stored) throw new ApiError(404, "invalid_request_error", `No such event: '${m[1]}'`, { code: "resource_missing" });
      const delivery = await deliver(stored);
      return sendJson(res, 200, stored.event, { "x-fake-delivered": String(delivery.delivered) });
    }
    if (method === "POST" && path === "/_fake/events/send") {
      const input = parseJson(body);
      if (typeof input.type !== "string" || !input.type) throw invalid("`type` must be a non-empty string.", "type");
      if (!input.object || typeof input.object !== "object" || Array.isArray(input.object)) throw invalid("`object` must be a JSON object.", "object");
      const stored = recordEvent(input.type, input.object as Json);
      const delivery = await deliver(stored);
      return sendJson(res, 200, stored.event, { "x-fake-delivered": String(delivery.delivered) });
    }
    if (method === "POST" && (m = path.match(/^\/_fake\/sessions\/([^/]+)\/complete$/))) {
      const stored = completeSession(decodeURIComponent(m[1]!));
      const delivery = await deliver(stored);
      return sendJson(res, 200, stored.event, { "x-fake-delivered": String(delivery.delivered) });
    }

    if ((m = path.match(/^\/pay\/([^/]+)(\/cancel)?$/))) {
      const s = sessions.get(decodeURIComponent(m[1]!));
      if (!s) return send(res, 404, page("Payment not found", `<p>There is no test payment with this link.</p>`), "text/html; charset=utf-8");
      if (m[2] && method === "GET") {
        if (!s.cancel_url) return send(res, 200, page("Payment cancelled", `<p>You can close this page.</p>`), "text/html; charset=utf-8");
        return redirect(res, s.cancel_url.replaceAll("{CHECKOUT_SESSION_ID}", s.id));
      }
      if (!m[2] && method === "GET") return send(res, 200, checkoutPage(s, lineItems.get(s.id) ?? []), "text/html; charset=utf-8");
      if (!m[2] && method === "POST") {
        if (s.status !== "open") return send(res, 409, checkoutPage(s, lineItems.get(s.id) ?? []), "text/html; charset=utf-8");
        const stored = completeSession(s.id);
        await deliver(stored);
        return redirect(res, (s.success_url ?? baseUrl).replaceAll("{CHECKOUT_SESSION_ID}", s.id));
      }
    }

    throw new ApiError(404, "invalid_request_error", `Unrecognized request URL (${method}: ${path}).`);
  }

  async function v1(method: string, path: string, body: string): Promise<[number, unknown]> {
    let m: RegExpMatchArray | null;
    if (method === "POST" && path === "/v1/checkout/sessions") return [200, createSession(parseForm(body))];
    if (method === "GET" && (m = path.match(/^\/v1\/checkout\/sessions\/([^/]+)$/))) return [200, getSession(decodeURIComponent(m[1]!))];
    if (method === "POST" && (m = path.match(/^\/v1\/checkout\/sessions\/([^/]+)\/expire$/))) {
      const stored = expireSession(decodeURIComponent(m[1]!));
      void deliver(stored);
      return [200, stored.event.data.object];
    }
    if (method === "POST" && path === "/v1/refunds") return [200, createRefund(parseForm(body))];
    if (method === "GET" && (m = path.match(/^\/v1\/payment_intents\/([^/]+)$/))) return [200, lookUp(intents, "payment_intent", decodeURIComponent(m[1]!))];
    if (method === "GET" && (m = path.match(/^\/v1\/charges\/([^/]+)$/))) return [200, lookUp(charges, "charge", decodeURIComponent(m[1]!))];
    throw new ApiError(404, "invalid_request_error", `Unrecognized request URL (${method}: ${path}). The payments fake covers only Checkout Sessions, refunds, and reading payment intents and charges.`);
  }

  function lookUp(store: Map<string, Json>, kind: string, id: string): Json {
    const found = store.get(id);
    if (!found) throw new ApiError(404, "invalid_request_error", `No such ${kind}: '${id}'`, { code: "resource_missing", param: "id" });
    return found;
  }

  // A refund of part or all of a paid session's payment intent; never more than was paid.
  function createRefund(form: Record<string, unknown>): Json {
    const intent = typeof form.payment_intent === "string" ? form.payment_intent : "";
    const session = [...sessions.values()].find((x) => x.payment_intent === intent && x.payment_status === "paid");
    if (!session) throw new ApiError(404, "invalid_request_error", `No such payment_intent: '${intent}'`, { code: "resource_missing", param: "payment_intent" });
    const already = refundedByIntent.get(intent) ?? 0;
    const left = session.amount_total - already;
    const amount = form.amount === undefined ? left : Number(form.amount);
    if (!Number.isInteger(amount) || amount <= 0) throw new ApiError(400, "invalid_request_error", "Invalid positive integer", { param: "amount" });
    if (amount > left) {
      throw new ApiError(400, "invalid_request_error", `Refund amount (${amount}) is greater than the unrefunded amount on the charge (${left}).`, { code: "amount_too_large", param: "amount" });
    }
    refundedByIntent.set(intent, already + amount);
    info(`refunded ${amount} of ${intent}`);
    const refund = {
      id: newId("re_test"),
      object: "refund",
      amount,
      currency: session.currency,
      payment_intent: intent,
      status: "succeeded",
      created: nowSec(),
      metadata: (form.metadata as Json) ?? {},
    };
    refunds.push(refund);
    return refund;
  }

  const server = http.createServer((req, res) => {
    readBody(req)
      .then((body) => route(req, res, body))
      .catch((err: unknown) => {
        if (res.headersSent) return res.destroy();
        if (err instanceof ApiError) {
          return sendJson(res, err.status, { error: { type: err.type, message: err.message, ...err.extra } });
        }
        console.error("[payments-fake] unexpected error", err);
        sendJson(res, 500, { error: { type: "api_error", message: "The payments fake failed unexpectedly." } });
      });
  });

  await new Promise<void>((resolve, reject) => {
    server.once("error", reject);
    server.listen(opts.port, host, () => {
      server.off("error", reject);
      resolve();
    });
  });
  const address = server.address();
  const port = typeof address === "object" && address ? address.port : opts.port;
  const url = `http://${host}:${port}`;
  baseUrl = (opts.publicUrl ?? url).replace(/\/+$/, "");
  info(`listening on ${url}, webhooks to ${opts.webhookUrl}`);

  return {
    url,
    async stop() {
      stopped = true;
      for (const t of timers) clearTimeout(t);
      timers.clear();
      await new Promise<void>((resolve) => {
        server.close(() => resolve());
        server.closeAllConnections();
      });
    },
  };
}

// --- request parsing --------------------------------------------------------------------------

function invalid(message: string, param: string): ApiError {
  return new ApiError(400, "invalid_request_error", message, { param });
}

function authorized(header: string | undefined, secretKey: string): boolean {
  if (!header) return false;
  const [scheme, value = ""] = header.split(" ", 2);
  if (scheme === "Bearer") return value === secretKey;
  // `curl -u sk_test_...:` sends the key as the Basic user name, which Stripe accepts too.
  if (scheme === "Basic") return Buffer.from(value, "base64").toString().split(":")[0] === secretKey;
  return false;
}

function headerValue(v: string | string[] | undefined): string | null {
  return (Array.isArray(v) ? v[0] : v) ?? null;
}

function readBody(req: http.IncomingMessage): Promise<string> {
  return new Promise((resolve, reject) => {
    const chunks: Buffer[] = [];
    let size = 0;
    req.on("data", (c: Buffer) => {
      size += c.length;
      if (size > MAX_BODY_BYTES) {
        reject(new ApiError(413, "invalid_request_error", "Request body too large."));
        req.destroy();
      } else chunks.push(c);
    });
    req.on("end", () => resolve(Buffer.concat(chunks).toString("utf8")));
    req.on("error", reject);
  });
}

function parseJson(body: string): Json {
  try {
    const v: unknown = JSON.parse(body || "{}");
    if (v && typeof v === "object" && !Array.isArray(v)) return v as Json;
  } catch {
    // fall through to the error below
  }
  throw invalid("The body must be a JSON object.", "body");
}

/**
 * Decodes the SDK's form encoding (`a[b][0][c]=v`) into nested objects; numeric segments become
 * arrays. Values stay strings, as Stripe receives them; the caller coerces.
 */
export function parseForm(body: string): Json {
  const root: Json = {};
  for (const [rawKey, value] of new URLSearchParams(body)) {
    const m = rawKey.match(/^([^[\]]+)((?:\[[^[\]]*\])*)$/);
    if (!m) throw invalid(`Invalid parameter name: ${rawKey}`, rawKey);
    const segments = [m[1]!, ...[...m[2]!.matchAll(/\[([^[\]]*)\]/g)].map((s) => s[1]!)];
    let node: Json | unknown[] = root;
    segments.forEach((seg, i) => {
      if (seg === "__proto__" || seg === "constructor" || seg === "prototype") throw invalid(`Invalid parameter name: ${rawKey}`, rawKey);
      const last = i === segments.length - 1;
      const nextIsIndex = !last && /^\d*$/.test(segments[i + 1]!);
      const container = node as Record<string, unknown>;
      let key: string | number = seg;
      if (Array.isArray(node)) {
        if (seg !== "" && !/^\d+$/.test(seg)) throw invalid(`Invalid array index in ${rawKey}`, rawKey);
        key = seg === "" ? node.length : Number(seg);
        if (key > 1000) throw invalid(`Array index too large in ${rawKey}`, rawKey);
      }
      if (last) {
        container[key] = value;
        return;
      }
      const existing = container[key];
      if (existing === undefined || typeof existing !== "object" || existing === null) container[key] = nextIsIndex ? [] : {};
      node = container[key] as Json | unknown[];
    });
  }
  return root;
}

function optionalString(params: Json, key: string): string | null {
  const v = params[key];
  if (v === undefined || v === "") return null;
  if (typeof v !== "string") throw invalid(`Invalid string: ${key}`, key);
  return v;
}

function toInt(v: unknown, param: string, min = 0): number {
  const n = typeof v === "string" && /^-?\d+$/.test(v) ? Number(v) : NaN;
  if (!Number.isSafeInteger(n) || n < min) throw invalid(`Invalid integer: ${String(v)} (param ${param} must be an integer ≥ ${min})`, param);
  return n;
}

function parseLineItems(raw: unknown, currency: string | null): LineItem[] {
  if (raw === undefined) return [];
  if (!Array.isArray(raw)) throw invalid("Invalid array", "line_items");
  const items = raw.filter((x) => x !== undefined);
  return items.map((item: unknown, i) => {
    const p = `line_items[${i}]`;
    if (!item || typeof item !== "object") throw invalid("Invalid object", p);
    const li = item as Json;
    if (li.price !== undefined) throw new ApiError(400, "invalid_request_error", `No such price: '${String(li.price)}' (the payments fake supports price_data only)`, { param: `${p}[price]`, code: "resource_missing" });
    const pd = li.price_data as Json | undefined;
    if (!pd || typeof pd !== "object") throw invalid(`Missing required param: ${p}[price_data].`, `${p}[price_data]`);
    const cur = typeof pd.currency === "string" ? pd.currency.toLowerCase() : "";
    if (!/^[a-z]{3}$/.test(cur)) throw invalid(`Missing required param: ${p}[price_data][currency].`, `${p}[price_data][currency]`);
    if (currency && currency.toLowerCase() !== cur) throw invalid("All line items must use the session's currency.", `${p}[price_data][currency]`);
    if (pd.unit_amount === undefined) throw invalid(`Missing required param: ${p}[price_data][unit_amount].`, `${p}[price_data][unit_amount]`);
    const unitAmount = toInt(pd.unit_amount, `${p}[price_data][unit_amount]`);
    const product = pd.product_data as Json | undefined;
    const name = product && typeof product.name === "string" ? product.name : "";
    if (!name) throw invalid(`Missing required param: ${p}[price_data][product_data][name].`, `${p}[price_data][product_data][name]`);
    if (li.quantity === undefined) throw invalid(`Missing required param: ${p}[quantity].`, `${p}[quantity]`);
    const quantity = toInt(li.quantity, `${p}[quantity]`, 1);
    return { name, unitAmount, quantity, currency: cur };
  }).map((li, i, all) => {
    if (li.currency !== all[0]!.currency) throw invalid("All line items must use the same currency.", `line_items[${i}][price_data][currency]`);
    return li;
  });
}

function parseMetadata(raw: unknown): Record<string, string> {
  if (raw === undefined || raw === "") return {};
  if (typeof raw !== "object" || raw === null || Array.isArray(raw)) throw invalid("Invalid object", "metadata");
  const entries = Object.entries(raw as Json);
  // Limits per Stripe's metadata docs: 50 keys, 40-character keys, 500-character values.
  if (entries.length > 50) throw invalid("Metadata can have at most 50 keys.", "metadata");
  for (const [k, v] of entries) {
    if (k.length > 40) throw invalid(`Metadata keys can be at most 40 characters (${k}).`, `metadata[${k}]`);
    if (typeof v !== "string" || v.length > 500) throw invalid(`Metadata values must be strings of at most 500 characters (${k}).`, `metadata[${k}]`);
  }
  return Object.fromEntries(entries) as Record<string, string>;
}

// --- responses --------------------------------------------------------------------------------

function send(res: http.ServerResponse, status: number, body: string, type: string, headers: Record<string, string> = {}): void {
  res.writeHead(status, { "content-type": type, "request-id": newId("req"), "cache-control": "no-store", ...headers });
  res.end(body);
}

function sendJson(res: http.ServerResponse, status: number, body: unknown, headers: Record<string, string> = {}): void {
  send(res, status, JSON.stringify(body, null, 2), "application/json", headers);
}

function redirect(res: http.ServerResponse, location: string): void {
  res.writeHead(303, { location, "cache-control": "no-store" });
  res.end();
}

function formatAmount(amount: number, currency: string): string {
  const major = ZERO_DECIMAL.has(currency) ? amount : amount / 100;
  try {
    return new Intl.NumberFormat("en-US", { style: "currency", currency: currency.toUpperCase() }).format(major);
  } catch {
    return `${major} ${currency.toUpperCase()}`;
  }
}

const escapeHtml = (s: string) =>
  s.replace(/[&<>"']/g, (c) => ({ "&": "&amp;", "<": "&lt;", ">": "&gt;", '"': "&quot;", "'": "&#39;" })[c]!);

function checkoutPage(s: Session, items: LineItem[]): string {
  const amount = escapeHtml(formatAmount(s.amount_total, s.currency));
  const rows = items
    .map((li) => `<li><span>${escapeHtml(li.name)}${li.quantity > 1 ? ` × ${li.quantity}` : ""}</span><span>${escapeHtml(formatAmount(li.unitAmount * li.quantity, li.currency))}</span></li>`)
    .join("");
  const email = s.customer_email ? `<p class="muted">Receipt to <strong>${escapeHtml(s.customer_email)}</strong></p>` : "";
  const action =
    s.status === "open"
      ? `<form method="post" action="/pay/${encodeURIComponent(s.id)}"><button type="submit">Pay now</button></form>
         <a class="cancel" href="/pay/${encodeURIComponent(s.id)}/cancel">Cancel</a>`
      : `<p class="state" role="status">This payment is ${s.status === "complete" ? "already paid" : "expired"}.</p>`;
  return page(
    "Test payment",
    `<p class="amount">${amount}</p>${email}<ul class="items">${rows}</ul>${action}`,
  );
}

function page(title: string, inner: string): string {
  return `<!doctype html>
<html lang="en"><head><meta charset="utf-8"><meta name="viewport" content="width=device-width, initial-scale=1">
<title>${escapeHtml(title)}</title>
<style>
  body { margin: 0; font: 16px/1.5 system-ui, sans-serif; background: #f4f1ea; color: #1f2328; }
  main { max-width: 26rem; margin: 3rem auto; background: #fff; border-radius: 12px; padding: 2rem; box-shadow: 0 2px 12px rgb(0 0 0 / 0.08); }
  .notice { background: #fff4ce; border: 1px solid #e0c36a; border-radius: 8px; padding: 0.6rem 0.8rem; font-size: 0.9rem; }
  h1 { font-size: 1.4rem; margin: 1rem 0 0.25rem; }
  .amount { font-size: 2.25rem; font-weight: 700; margin: 0.25rem 0; }
  .muted { color: #57606a; margin: 0 0 1rem; }
  .items { list-style: none; padding: 0; margin: 0 0 1.5rem; border-top: 1px solid #e5e5e5; }
  .items li { display: flex; justify-content: space-between; gap: 1rem; padding: 0.5rem 0; border-bottom: 1px solid #e5e5e5; }
  button { width: 100%; font: inherit; font-size: 1.15rem; font-weight: 600; padding: 0.9rem; border: 0; border-radius: 8px; background: #2f5d50; color: #fff; cursor: pointer; }
  button:focus-visible, a:focus-visible { outline: 3px solid #e0a030; outline-offset: 2px; }
  .cancel { display: block; text-align: center; margin-top: 1rem; color: #2f5d50; }
  .state { font-weight: 600; }
</style></head>
<body><main>
  <p class="notice" role="note"><strong>Local test payment page.</strong> No real card is charged and no money moves; this page is served by Ribbonry's development payments fake.</p>
  <h1>${escapeHtml(title)}</h1>
  ${inner}
</main></body></html>`;
}
