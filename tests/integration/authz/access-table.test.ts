// Every route handler and server action × every kind of caller → the status it must answer.
// The first test fails when a route or action exists without a row here, so a new endpoint
// cannot ship without someone deciding who may call it.
import { beforeAll, describe, expect, it } from "vitest";
import { actAs } from "../../helpers/request-context";
import { discoverActions, discoverRoutes, fill, loadRows, makeWorld } from "./discover";
import { ROLES, type World } from "./table";

const { routes: ROUTES, actions: ACTIONS, delegated: DELEGATED } = await loadRows();

let world: World;
let routes: Map<string, Record<string, unknown>>;
let actions: Map<string, (...a: unknown[]) => Promise<unknown>>;

beforeAll(async () => {
  world = await makeWorld();
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
