// Every route handler and server action × every kind of caller → the status it must answer.
// The first test fails when a route or action exists without a row here, so a new endpoint
// cannot ship without someone deciding who may call it.
import { readdirSync, statSync } from "node:fs";
import path from "node:path";
import { beforeAll, describe, expect, it } from "vitest";
import { actAs } from "../../helpers/request-context";
import { grantRole, makeEntry, makeShow, makeUser } from "../../helpers/factories";
import { ROLES, type Case, type World } from "./table";

const APP = path.join(process.cwd(), "app");

function walk(dir: string, file: string, out: string[] = []): string[] {
  for (const name of readdirSync(dir)) {
    const p = path.join(dir, name);
    if (statSync(p).isDirectory()) walk(p, file, out);
    else if (name === file) out.push(p);
  }
  return out;
}

const METHODS = ["GET", "POST", "PUT", "PATCH", "DELETE"] as const;

async function discoverRoutes(): Promise<Map<string, Record<string, unknown>>> {
  const found = new Map<string, Record<string, unknown>>();
  for (const file of walk(path.join(APP, "api"), "route.ts")) {
    const mod = (await import(file)) as Record<string, unknown>;
    const urlPath = "/" + path.relative(APP, path.dirname(file)).split(path.sep).join("/");
    for (const m of METHODS) if (typeof mod[m] === "function") found.set(`${m} ${urlPath}`, mod);
  }
  return found;
}

async function discoverActions(): Promise<Map<string, (...a: unknown[]) => Promise<unknown>>> {
  const found = new Map<string, (...a: unknown[]) => Promise<unknown>>();
  for (const file of walk(APP, "actions.ts")) {
    const mod = (await import(file)) as Record<string, unknown>;
    const where = path.relative(APP, path.dirname(file)).split(path.sep).join("/");
    for (const [name, fn] of Object.entries(mod)) if (typeof fn === "function") found.set(`${where}#${name}`, fn as never);
  }
  return found;
}

/** Every rows/*.ts file's routes, actions and delegated endpoints; a key in two files is an error. */
async function loadRows() {
  const routes: Record<string, Case> = {};
  const actions: Record<string, Case> = {};
  const delegated = new Set<string>();
  const dir = path.join(__dirname, "rows");
  for (const name of readdirSync(dir).filter((n) => n.endsWith(".ts")).sort()) {
    const mod = (await import(path.join(dir, name))) as { routes?: Record<string, Case>; actions?: Record<string, Case>; delegated?: Set<string> };
    for (const [k, v] of Object.entries(mod.routes ?? {})) {
      if (k in routes) throw new Error(`${k} has rows in two files`);
      routes[k] = v;
    }
    for (const [k, v] of Object.entries(mod.actions ?? {})) {
      if (k in actions) throw new Error(`${k} has rows in two files`);
      actions[k] = v;
    }
    for (const k of mod.delegated ?? []) delegated.add(k);
  }
  return { routes, actions, delegated };
}

const { routes: ROUTES, actions: ACTIONS, delegated: DELEGATED } = await loadRows();

let world: World;
let routes: Map<string, Record<string, unknown>>;
let actions: Map<string, (...a: unknown[]) => Promise<unknown>>;

beforeAll(async () => {
  const show = await makeShow();
  const other = await makeShow();
  const [entrant, judge, scribe, intake, chair, admin, otherChair] = await Promise.all([
    makeUser({ name: "Entrant" }),
    makeUser({ name: "Judge" }),
    makeUser({ name: "Scribe" }),
    makeUser({ name: "Intake" }),
    makeUser({ name: "Chair" }),
    makeUser({ name: "Admin", admin: true }),
    makeUser({ name: "Chair of another show" }),
  ]);
  await grantRole(judge!.id, show.id, "judge");
  await grantRole(scribe!.id, show.id, "scribe");
  await grantRole(intake!.id, show.id, "intake");
  await grantRole(chair!.id, show.id, "chair");
  await grantRole(otherChair!.id, other.id, "chair");
  await makeEntry(show.id, entrant!.id);
  world = { show, users: { entrant: entrant!, judge: judge!, scribe: scribe!, intake: intake!, chair: chair!, admin: admin!, otherChair: otherChair! } };
  routes = await discoverRoutes();
  actions = await discoverActions();
}, 120_000);

describe("access table", () => {
  it("has a row for every route handler and server action", () => {
    const missingRoutes = [...routes.keys()].filter((k) => !(k in ROUTES) && !DELEGATED.has(k));
    const missingActions = [...actions.keys()].filter((k) => !(k in ACTIONS));
    expect(missingRoutes, "route handlers without a row in ROUTES").toEqual([]);
    expect(missingActions, "server actions without a row in ACTIONS").toEqual([]);
    const staleRoutes = Object.keys(ROUTES).filter((k) => !routes.has(k));
    const staleActions = Object.keys(ACTIONS).filter((k) => !actions.has(k));
    expect([...staleRoutes, ...staleActions], "rows for endpoints that no longer exist").toEqual([]);
  });

  for (const [key, c] of Object.entries(ROUTES)) {
    it.each(ROLES)(`${key} as %s`, async (role) => {
      const mod = routes.get(key)!;
      const [method, urlPath] = key.split(" ") as [string, string];
      const req = c.request ? await c.request(world, role) : {};
      const url = new URL(`http://127.0.0.1:3100${fill(urlPath, req.params ?? {})}${req.query ?? ""}`);
      const headers = new Headers();
      if (role !== "anonymous") headers.set("cookie", world.users[role].cookie);
      if (req.body !== undefined) headers.set("content-type", "application/json");
      const res = await (mod[method] as (r: Request, ctx: unknown) => Promise<Response>)(
        new Request(url, { method, headers, body: req.body === undefined ? undefined : JSON.stringify(req.body) }),
        { params: Promise.resolve(req.params ?? {}) },
      );
      expect(res.status, await res.clone().text()).toBe(c.expect[role]);
    });
  }

  for (const [key, c] of Object.entries(ACTIONS)) {
    it.each(ROLES)(`action ${key} as %s`, async (role) => {
      const action = actions.get(key)!;
      const input = c.input ? await c.input(world, role) : {};
      actAs(role === "anonymous" ? null : world.users[role].cookie);
      expect(await statusOf(() => action(null, input))).toBe(c.expect[role]);
    });
  }
});

function fill(urlPath: string, params: Record<string, string>): string {
  return urlPath.replace(/\[([^\]]+)\]/g, (_, k: string) => encodeURIComponent(params[k] ?? k));
}

async function statusOf(run: () => Promise<unknown>): Promise<number> {
  try {
    const r = (await run()) as { ok: boolean; status?: number };
    return r.ok ? 200 : (r.status ?? 500);
  } catch (err) {
    const digest = (err as { digest?: string }).digest ?? "";
    if (digest.startsWith("NEXT_REDIRECT")) return 303;
    throw err;
  }
}
