// Every route handler and server action × every kind of caller → the status it must answer.
// The first test fails when a route or action exists without a row here, so a new endpoint
// cannot ship without someone deciding who may call it.
import { readdirSync, statSync } from "node:fs";
import path from "node:path";
import { beforeAll, describe, expect, it } from "vitest";
import { db } from "@/db/client";
import { createInvitation } from "@/db/queries/invitations";
import { showRoles } from "@/db/schema";
import { actAs } from "../../helpers/request-context";
import { grantRole, makeEntry, makeShow, makeUser, unique, type TestUser } from "../../helpers/factories";

const ROLES = ["anonymous", "entrant", "judge", "scribe", "intake", "chair", "admin", "otherChair"] as const;
type Role = (typeof ROLES)[number];
type Expect = Record<Role, number>;

/** Same answer for everyone but the anonymous caller and the allowed roles. */
function only(allowed: Partial<Record<Role, number>>, others = 403): Expect {
  const out = Object.fromEntries(ROLES.map((r) => [r, r === "anonymous" ? 401 : others])) as Expect;
  return { ...out, ...allowed };
}
const everyone = (status: number) => Object.fromEntries(ROLES.map((r) => [r, status])) as Expect;
const signedIn = (status: number) => ({ ...everyone(status), anonymous: 401 });

type World = {
  show: { id: string; slug: string; name: string };
  users: Record<Exclude<Role, "anonymous">, TestUser>;
};

type Case = {
  expect: Expect;
  /** Builds the call for one caller; may create the rows that call needs. */
  request?: (w: World, role: Role) => Promise<{ params?: Record<string, string>; body?: unknown; query?: string }>;
  input?: (w: World, role: Role) => Promise<Record<string, unknown>>;
};

const ROUTES: Record<string, Case> = {
  "GET /api/health": { expect: everyone(200) },
  "GET /api/me": { expect: signedIn(200) },
  "GET /api/me/entries": { expect: signedIn(200) },
  "GET /api/shows": { expect: everyone(200) },
  "POST /api/shows": {
    expect: only({ admin: 201 }),
    request: async () => ({ body: { name: "Autumn Test Show", slug: unique("autumn"), guildName: "Guild", venueName: "Hall", timeZone: "America/Chicago", chairEmail: `${unique("c")}@example.test` } }),
  },
  "GET /api/shows/[slug]": { expect: everyone(200), request: async (w) => ({ params: { slug: w.show.slug } }) },
  "GET /api/shows/[slug]/team": { expect: only({ chair: 200 }), request: async (w) => ({ params: { slug: w.show.slug } }) },
  "POST /api/shows/[slug]/team": {
    expect: only({ chair: 201 }),
    request: async (w) => ({ params: { slug: w.show.slug }, body: { email: `${unique("j")}@example.test`, role: "judge" } }),
  },
  "GET /api/shows/[slug]/judging/queue": { expect: only({ judge: 200, scribe: 200 }), request: async (w) => ({ params: { slug: w.show.slug } }) },
  "GET /api/shows/[slug]/desk/entries": { expect: only({ intake: 200, chair: 200 }), request: async (w) => ({ params: { slug: w.show.slug } }) },
  "GET /api/invitations/[token]": {
    expect: everyone(200),
    request: async (w) => ({ params: { token: await invite(w, w.users.entrant.email, "judge") } }),
  },
  // The invitation is the entrant's: anyone else signed in is the wrong person (403).
  "POST /api/invitations/[token]/accept": {
    expect: only({ entrant: 201 }),
    request: async (w) => ({ params: { token: await invite(w, w.users.entrant.email, "scribe") } }),
  },
  // Webhooks carry no session; an unsigned delivery is refused whoever sends it.
  "POST /api/payments/webhook": { expect: everyone(400), request: async () => ({ body: { id: "evt_unsigned" } }) },
};

// better-auth's own endpoints are tested in tests/integration/auth; they are listed so that the
// discovery check below still accounts for the file.
const DELEGATED = new Set(["GET /api/auth/[...all]", "POST /api/auth/[...all]"]);

const ACTIONS: Record<string, Case> = {
  "(admin)/admin#createShowAction": {
    expect: only({ admin: 200 }),
    input: async () => ({ name: "Action Test Show", slug: unique("action"), guildName: "Guild", venueName: "Hall", timeZone: "Europe/London", chairEmail: `${unique("c")}@example.test` }),
  },
  "(chair)/shows/[slug]/manage#inviteAction": {
    expect: only({ chair: 200 }),
    input: async (w) => ({ showSlug: w.show.slug, email: `${unique("s")}@example.test`, role: "scribe" }),
  },
  "(chair)/shows/[slug]/manage#removeMemberAction": {
    expect: only({ chair: 200 }),
    input: async (w) => {
      const helper = await makeUser();
      const [row] = await db.insert(showRoles).values({ showId: w.show.id, userId: helper.id, role: "scribe" }).returning();
      return { showSlug: w.show.slug, roleId: row!.id };
    },
  },
  // Success redirects to the role's area (303 here); the wrong person gets 403.
  "invitations/[token]#acceptInvitationAction": {
    expect: only({ entrant: 303 }),
    input: async (w) => ({ token: await invite(w, w.users.entrant.email, "intake") }),
  },
  "(entrant)/account#saveProfileAction": {
    expect: signedIn(200),
    input: async () => ({ displayName: "Pat Example", phone: "555-0100", publishNameConsent: "on" }),
  },
};

async function invite(w: World, email: string, role: "judge" | "scribe" | "intake"): Promise<string> {
  const inviter = { ...w.users.chair, isAdmin: false, roles: [] };
  // A show of its own per call: once accepted, a second invitation to the same role would be a 409.
  const show = await makeShow();
  return db.transaction((tx) => createInvitation(tx, inviter, show.id, { email, role }));
}

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
