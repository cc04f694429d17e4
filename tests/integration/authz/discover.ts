// Finding every route handler and server action under app/, the rows that say who may call them,
// and the world of users and shows the rows are written against. Shared by the access table and
// the request-acceptance tests.
import { readdirSync, statSync } from "node:fs";
import path from "node:path";
import { grantRole, makeEntry, makeShow, makeUser } from "../../helpers/factories";
import type { Case, World } from "./table";

const APP = path.join(process.cwd(), "app");

function walk(dir: string, file: string, out: string[] = []): string[] {
  for (const name of readdirSync(dir)) {
    const p = path.join(dir, name);
    if (statSync(p).isDirectory()) walk(p, file, out);
    else if (name === file) out.push(p);
  }
  return out;
}

export const METHODS = ["GET", "POST", "PUT", "PATCH", "DELETE"] as const;

export type RouteHandler = (r: Request, ctx: unknown) => Promise<Response>;

/** "METHOD /api/path/[param]" → the route module, for every route.ts under app/api. */
export async function discoverRoutes(): Promise<Map<string, Record<string, unknown>>> {
  const found = new Map<string, Record<string, unknown>>();
  for (const file of walk(path.join(APP, "api"), "route.ts")) {
    const mod = (await import(file)) as Record<string, unknown>;
    const urlPath = "/" + path.relative(APP, path.dirname(file)).split(path.sep).join("/");
    for (const m of METHODS) if (typeof mod[m] === "function") found.set(`${m} ${urlPath}`, mod);
  }
  return found;
}

export async function discoverActions(): Promise<Map<string, (...a: unknown[]) => Promise<unknown>>> {
  const found = new Map<string, (...a: unknown[]) => Promise<unknown>>();
  for (const file of walk(APP, "actions.ts")) {
    const mod = (await import(file)) as Record<string, unknown>;
    const where = path.relative(APP, path.dirname(file)).split(path.sep).join("/");
    for (const [name, fn] of Object.entries(mod)) if (typeof fn === "function") found.set(`${where}#${name}`, fn as never);
  }
  return found;
}

/** Every rows/*.ts file's routes, actions and delegated endpoints; a key in two files is an error. */
export async function loadRows() {
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

/** A show with one user in each role, a chair of another show, an administrator and an entry. */
export async function makeWorld(): Promise<World> {
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
  return { show, users: { entrant: entrant!, judge: judge!, scribe: scribe!, intake: intake!, chair: chair!, admin: admin!, otherChair: otherChair! } };
}

/** "/api/shows/[slug]/team" with { slug } → its address, each value %-encoded. */
export function fill(urlPath: string, params: Record<string, string>): string {
  return urlPath.replace(/\[([^\]]+)\]/g, (_, k: string) => encodeURIComponent(params[k] ?? k));
}
