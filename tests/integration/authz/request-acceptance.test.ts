// How route handlers accept requests, checked on every route found under app/api (the same walk
// as the access table): a write from a foreign Origin is refused (OWASP CSRF Prevention Cheat
// Sheet), bodies are JSON only (OWASP ASVS 4.0 V13.1.5), and a broken %-escape or a NUL in the
// address is a 400 (RFC 3986 §2.1), never a 500.
import { readFileSync } from "node:fs";
import path from "node:path";
import { beforeAll, describe, expect, it } from "vitest";
import { env } from "@/lib/env";
import { discoverRoutes, fill, loadRows, makeWorld, type RouteHandler } from "./discover";
import { ROLES, type Case, type Role, type World } from "./table";

const { routes: ROUTES } = await loadRows();

/** Not made with defineRoute, each for its reason. */
const OWN_RULES: Record<string, string> = {
  // Called server to server by the payments provider; authenticated by its signature over the raw body.
  "POST /api/payments/webhook": "signature",
  "GET /api/health": "no input, no session",
};
const WRITES = new Set(["POST", "PUT", "PATCH", "DELETE"]);
const APP_ORIGIN = new URL(env.APP_URL).origin;

let world: World;
let routes: Map<string, Record<string, unknown>>;

beforeAll(async () => {
  world = await makeWorld();
  routes = await discoverRoutes();
}, 120_000);

/** The caller the row lets through (the first role with a 2xx), so only the check under test can refuse. */
function allowedRole(c: Case): Exclude<Role, "anonymous"> {
  const role = ROLES.find((r) => r !== "anonymous" && c.expect[r] < 300);
  return (role ?? "chair") as Exclude<Role, "anonymous">;
}

type Call = { headers?: Record<string, string>; body?: BodyInit; params?: (p: Record<string, string>) => Record<string, string>; rawPath?: string; query?: string };

async function call(key: string, call: Call = {}): Promise<Response> {
  const c = ROUTES[key]!;
  const [method, urlPath] = key.split(" ") as [string, string];
  const role = allowedRole(c);
  const req = c.request ? await c.request(world, role) : {};
  const params = call.params ? call.params(req.params ?? {}) : (req.params ?? {});
  const path = call.rawPath ?? fill(urlPath, params);
  const url = `http://127.0.0.1:3100${path}${call.query ?? req.query ?? ""}`;
  const headers = new Headers({ cookie: world.users[role].cookie, ...call.headers });
  let body: BodyInit | undefined = call.body;
  if (body === undefined && req.body !== undefined) {
    body = JSON.stringify(req.body);
    if (!headers.has("content-type")) headers.set("content-type", "application/json");
  }
  const handler = routes.get(key)![method] as RouteHandler;
  return handler(new Request(url, { method, headers, body }), { params: Promise.resolve(params) });
}

const keys = () => Object.keys(ROUTES).filter((k) => !(k in OWN_RULES));
const writes = keys().filter((k) => WRITES.has(k.split(" ")[0]!));
// A route that takes a body says so with `input:` in its defineRoute options.
const takesBody = (key: string) => /\binput:/.test(readFileSync(path.join(process.cwd(), "app", key.split(" ")[1]!, "route.ts"), "utf8"));
const jsonBodies = writes.filter(takesBody);
const withParams = keys().filter((k) => k.includes("["));

describe("state-changing routes refuse a foreign Origin (OWASP CSRF Prevention Cheat Sheet)", () => {
  it("there are writes to check", () => expect(writes.length).toBeGreaterThan(3));

  it.each(writes)("%s: a foreign Origin is 403", async (key) => {
    const res = await call(key, { headers: { origin: "https://evil.example" } });
    expect(res.status, await res.clone().text()).toBe(403);
    expect(await res.json()).toMatchObject({ error: "foreign_origin" });
  });

  it.each(writes)("%s: Origin null (a sandboxed or file page) is 403", async (key) => {
    expect((await call(key, { headers: { origin: "null" } })).status).toBe(403);
  });

  it.each(writes)("%s: no Origin but Sec-Fetch-Site cross-site is 403 (Fetch Metadata)", async (key) => {
    expect((await call(key, { headers: { "sec-fetch-site": "cross-site" } })).status).toBe(403);
  });

  it.each(writes)("%s: the app's own Origin gets the access table's answer", async (key) => {
    const c = ROUTES[key]!;
    const res = await call(key, { headers: { origin: APP_ORIGIN, "sec-fetch-site": "same-origin" } });
    expect(res.status, await res.clone().text()).toBe(c.expect[allowedRole(c)]);
  });

  // better-auth checks Origin on its own endpoints, but skips the check under a test runner
  // (its isTest() default), so tests/e2e/security-headers.spec.ts checks it on the built server.

  it("the payments webhook is exempt: a foreign Origin still reaches the signature check (400, not 403)", async () => {
    const handler = routes.get("POST /api/payments/webhook")!.POST as RouteHandler;
    const res = await handler(
      new Request("http://127.0.0.1:3100/api/payments/webhook", { method: "POST", headers: { origin: "https://evil.example", "content-type": "application/json" }, body: "{}" }),
      { params: Promise.resolve({}) },
    );
    expect(res.status).toBe(400);
    expect(await res.json()).toMatchObject({ error: "invalid_signature" });
  });
});

describe("bodies are JSON only (OWASP ASVS 4.0 V13.1.5)", () => {
  it("there are JSON bodies to check", () => expect(jsonBodies.length).toBeGreaterThan(3));

  const multipart = () => {
    const form = new FormData();
    form.append("email", "someone@example.test");
    return form;
  };
  const variants: [string, Call][] = [
    ["a form (application/x-www-form-urlencoded)", { headers: { "content-type": "application/x-www-form-urlencoded" }, body: "email=someone%40example.test&role=judge" }],
    ["text/plain", { headers: { "content-type": "text/plain;charset=UTF-8" }, body: '{"email":"someone@example.test","role":"judge"}' }],
    ["multipart/form-data", { body: multipart() }],
    ["multipart/form-data without a boundary", { headers: { "content-type": "multipart/form-data" }, body: "--x\r\n" }],
    ["no Content-Type at all", { body: new Blob(['{"email":"someone@example.test"}']) }],
  ];
  for (const [what, variant] of variants) {
    it.each(jsonBodies)(`%s: ${what} is 415`, async (key) => {
      const res = await call(key, { ...variant, headers: { origin: APP_ORIGIN, ...variant.headers } });
      expect(res.status, await res.clone().text()).toBe(415);
      expect(await res.json()).toMatchObject({ error: "unsupported_media_type", message: expect.stringContaining("JSON") });
    });
  }

  it.each(writes.filter((k) => !jsonBodies.includes(k)))("%s (no body expected): a posted form is 415", async (key) => {
    const res = await call(key, { headers: { origin: APP_ORIGIN, "content-type": "application/x-www-form-urlencoded" }, body: "a=1" });
    expect(res.status).toBe(415);
  });
});

describe("a malformed address is 400, never 500 (RFC 3986 §2.1)", () => {
  const own = { origin: APP_ORIGIN };
  // A parameter Next.js cannot decode reaches the handler as its raw text.
  const broken = (p: Record<string, string>) => Object.fromEntries(Object.keys(p).map((k, i) => [k, i === 0 ? "%E0%A4%A" : p[k]!]));
  const withNul = (p: Record<string, string>) => Object.fromEntries(Object.keys(p).map((k, i) => [k, i === 0 ? `a\u0000b` : p[k]!]));

  it.each(withParams)("%s: a broken %-escape in a path parameter is 400", async (key) => {
    const [, urlPath] = key.split(" ") as [string, string];
    const res = await call(key, {
      headers: own,
      params: broken,
      rawPath: urlPath.replace(/\[[^\]]+\]/, "%E0%A4%A").replace(/\[([^\]]+)\]/g, "x"),
    });
    expect(res.status, await res.clone().text()).toBe(400);
    expect(await res.json()).toMatchObject({ error: "invalid_address" });
  });

  it.each(withParams)("%s: a NUL in a path parameter is 400", async (key) => {
    const res = await call(key, { headers: own, params: withNul });
    expect(res.status, await res.clone().text()).toBe(400);
  });

  it.each(keys())("%s: a NUL in the query string is 400", async (key) => {
    const res = await call(key, { headers: own, query: "?q=%00" });
    expect(res.status, await res.clone().text()).toBe(400);
  });

  it.each(keys())("%s: a broken %-escape in the query string is 400", async (key) => {
    const res = await call(key, { headers: own, query: "?q=%E0%A4%A" });
    expect(res.status, await res.clone().text()).toBe(400);
  });
});
