// Every JSON route handler, called with thousands of hostile requests built from its access-table
// row (valid shape, one field spoiled; or anything at all), answers a 4xx or a 2xx: never a 500.
// Bodies go as JSON from the app's own origin; a second pass sends wrong content types.
import fc from "fast-check";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { env } from "@/lib/env";
import type { Case, Role, World } from "../authz/table";
import { allowedRole, cookieOf, discoverRoutes, fcParams, hostile, inputFrom, jsonText, loadRows, makeWorld, OUTSIDERS, RUNS, SEED, type RouteFn } from "./harness";

const { routes: ROWS, delegated: DELEGATED } = await loadRows();
let world: World;
let routes: Map<string, RouteFn>;
const valid = new Map<string, { params: Record<string, string>; body?: unknown; query: Record<string, string> }>();
let tried = 0;
const statuses = new Map<number, number>();

beforeAll(async () => {
  world = await makeWorld();
  routes = await discoverRoutes();
  for (const [key, c] of Object.entries(ROWS)) {
    if (!routes.has(key) || DELEGATED.has(key)) continue;
    const req = c.request ? await c.request(world, allowedRole(c)) : {};
    valid.set(key, { params: req.params ?? {}, body: req.body, query: Object.fromEntries(new URLSearchParams(req.query ?? "")) });
  }
}, 180_000);

afterAll(() => {
  console.log(`[fuzz] routes: ${tried} requests, seed ${SEED} (FUZZ_SEED to replay, FUZZ_RUNS=${RUNS} per route and pass); statuses ${JSON.stringify(Object.fromEntries(statuses))}`);
});

type Call = { role: Role; params: Record<string, string>; query: Record<string, unknown> | unknown; body?: string; contentType?: string | null };

/** A URL can't carry half a surrogate pair (WHATWG URL: UTF-8 percent-encode); the handler still gets the raw parameter. */
const wellFormed = (s: string) => s.replace(/[\ud800-\udbff](?![\udc00-\udfff])|(?<![\ud800-\udbff])[\udc00-\udfff]/g, "\ufffd");

async function send(key: string, call: Call): Promise<Response> {
  const [method, pattern] = key.split(" ") as [string, string];
  const url = new URL(`${env.APP_URL}${pattern.replace(/\[\.{0,3}([^\]]+)\]/g, (_, k: string) => encodeURIComponent(wellFormed(call.params[k] ?? k)))}`);
  if (call.query && typeof call.query === "object" && !Array.isArray(call.query)) {
    for (const [k, v] of Object.entries(call.query)) url.searchParams.append(k, typeof v === "string" ? v : jsonText(v));
  }
  const headers = new Headers({ origin: new URL(env.APP_URL).origin });
  const cookie = cookieOf(world, call.role);
  if (cookie) headers.set("cookie", cookie);
  if (call.contentType) headers.set("content-type", call.contentType);
  const hasBody = method !== "GET" && method !== "HEAD" && call.body !== undefined;
  tried++;
  const res = await routes.get(key)!(new Request(url, { method, headers, body: hasBody ? call.body : undefined }), { params: Promise.resolve(call.params) });
  statuses.set(res.status, (statuses.get(res.status) ?? 0) + 1);
  return res;
}

const stringParams = (params: Record<string, string>) =>
  fc.tuple(fc.nat(), hostile).map(([i, bad]) => {
    const keys = Object.keys(params);
    if (!keys.length) return params;
    const k = keys[i % keys.length]!;
    return { ...params, [k]: typeof bad === "string" ? bad : jsonText(bad) };
  });

function callsFor(key: string, c: Case): fc.Arbitrary<Call> {
  const v = valid.get(key)!;
  const role = fc.oneof({ weight: 5, arbitrary: fc.constant(allowedRole(c)) }, { weight: 1, arbitrary: fc.constantFrom(...OUTSIDERS) });
  const params = fc.oneof({ weight: 3, arbitrary: fc.constant(v.params) }, { weight: 1, arbitrary: stringParams(v.params) });
  const query = fc.oneof({ weight: 1, arbitrary: fc.constant(v.query as unknown) }, { weight: 3, arbitrary: inputFrom(v.query) });
  const body = v.body === undefined ? fc.option(hostile.map(jsonText), { nil: undefined }) : inputFrom(v.body).map(jsonText);
  return fc.record({ role, params, query, body, contentType: fc.constant("application/json") });
}

function assertNo500(res: Response, text: string, call: Call) {
  expect(res.status, `${res.status} ${text.slice(0, 300)} for ${jsonText({ ...call, body: call.body?.slice(0, 300) }).slice(0, 600)}`).not.toBe(500);
  expect(res.status).toBeLessThan(500);
}

describe("JSON routes never answer 500", () => {
  const keys = Object.keys(ROWS).filter((k) => !DELEGATED.has(k) && k !== "POST /api/payments/webhook");

  it.each(keys)("%s", async (key) => {
    await fc.assert(
      fc.asyncProperty(callsFor(key, ROWS[key]!), async (call) => {
        const res = await send(key, call);
        assertNo500(res, await res.text(), call);
      }),
      fcParams(),
    );
  });

  const WRONG_TYPES = [null, "text/plain", "application/x-www-form-urlencoded", "multipart/form-data; boundary=x", "application/json; charset=utf-16", "application/jsonx", "text/html", "*/*", "application/xml"];

  it.each(keys.filter((k) => !k.startsWith("GET ")))("%s with a wrong content type answers 415 or 400", async (key) => {
    const v = valid.get(key)!;
    await fc.assert(
      fc.asyncProperty(fc.constantFrom(...WRONG_TYPES), fc.oneof(fc.constant(v.body), inputFrom(v.body ?? {})), async (contentType, body) => {
        const call: Call = { role: allowedRole(ROWS[key]!), params: v.params, query: {}, body: contentType?.startsWith("application/x-www") ? new URLSearchParams({ a: "1" }).toString() : jsonText(body), contentType };
        const res = await send(key, call);
        const text = await res.text();
        assertNo500(res, text, call);
        const media = contentType?.split(";")[0]!.trim() ?? null;
        const wrong = media === null ? v.body !== undefined : media !== "application/json";
        if (wrong) expect([400, 415], text).toContain(res.status);
      }),
      fcParams(Math.max(10, Math.floor(RUNS / 3))),
    );
  });
});
