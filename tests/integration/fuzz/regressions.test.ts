// Inputs the fuzz suites (and a probe before them) found answering 500, each pinned to the 4xx it
// answers now: text PostgreSQL can't store, integers past int4, unique-index races, and signed
// webhook events of the wrong shape.
import { randomUUID } from "node:crypto";
import { and, eq } from "drizzle-orm";
import { beforeAll, describe, expect, it } from "vitest";
import { saveScoreSheetAction } from "@/app/(chair)/shows/[slug]/manage/judging/actions";
import { saveAwardAction } from "@/app/(chair)/shows/[slug]/manage/results/actions";
import { saveProfileAction } from "@/app/(entrant)/account/actions";
import { GET as entriesRoute } from "@/app/api/shows/[slug]/entries/route";
import { POST as syncRoute } from "@/app/api/shows/[slug]/judging/sync/route";
import { POST as webhookRoute } from "@/app/api/payments/webhook/route";
import { db } from "@/db/client";
import { judgingPanels, panelCategories, panelMembers, paymentEvents, scoreSheets } from "@/db/schema";
import { env } from "@/lib/env";
import { stripe } from "@/lib/payments";
import { actAs } from "../../helpers/request-context";
import { grantRole, makeCategory, makeEntry, makeShow, makeUser, type TestUser } from "../../helpers/factories";

const ORIGIN = new URL(env.APP_URL).origin;
const SHEET = { sections: [{ id: "s1", title: "Workmanship", criteria: [{ id: "c1", label: "Piecing", maxPoints: 100, scale: { kind: "points" }, allowNotApplicable: false }] }] };
const RIBBON = { name: "Purple", colour: "#6b21a8" };

let chair: TestUser, judge: TestUser, entrant: TestUser;
let show: { id: string; slug: string };
let entryId: string;

beforeAll(async () => {
  [chair, judge, entrant] = await Promise.all([makeUser({ name: "Chair" }), makeUser({ name: "Judge" }), makeUser({ name: "Entrant" })]);
  show = await makeShow({ status: "judging" });
  await grantRole(chair.id, show.id, "chair");
  await grantRole(judge.id, show.id, "judge");
  const category = await makeCategory(show.id);
  entryId = (await makeEntry(show.id, entrant.id, { status: "received", categoryId: category.id, categoryState: "decided" })).id;
  const [panel] = await db.insert(judgingPanels).values({ showId: show.id, name: "Panel A" }).returning({ id: judgingPanels.id });
  await db.insert(panelMembers).values({ panelId: panel!.id, userId: judge.id, role: "judge" });
  await db.insert(panelCategories).values({ panelId: panel!.id, categoryId: category.id });
  await db.insert(scoreSheets).values({ showId: show.id, name: "Standard", isDefault: true, sheet: SHEET as never });
});

const statusOf = (r: unknown) => ((r as { ok: boolean; status?: number }).ok ? 200 : (r as { status: number }).status);

describe("text PostgreSQL can't store is a 400, not a 500", () => {
  it.each([
    ["a NUL", "Pat\u0000 Example"],
    ["a lone surrogate", "Pat \ud83d Example"],
  ])("in a profile name (%s)", async (_, displayName) => {
    actAs(entrant.cookie);
    const r = await saveProfileAction(null, { displayName, phone: "", publishNameConsent: false });
    expect(r).toMatchObject({ ok: false, status: 400, fieldErrors: { displayName: ["This contains a character we can't store."] } });
  });

  it("in a field no schema names (the action wrapper's own check)", async () => {
    actAs(entrant.cookie);
    const r = await saveProfileAction(null, { displayName: "Pat Example", extra: { deep: ["ok", "\u0000"] } });
    expect(r).toMatchObject({ ok: false, status: 400, fieldErrors: { "extra.deep.1": ["This contains a character we can't store."] } });
  });

  it("in an award name, which reaches the jsonb audit row", async () => {
    actAs(chair.cookie);
    const r = await saveAwardAction(null, { showSlug: show.slug, name: "Best \udc00", kind: "other", sponsor: "", chooseBy: "chair", ribbon: RIBBON, eligibility: {}, combinesWith: [] });
    expect(statusOf(r)).toBe(400);
  });

  it("in the entries table's search", async () => {
    const url = new URL(`${env.APP_URL}/api/shows/${show.slug}/entries`);
    url.searchParams.set("q", "log\u0000cabin");
    const res = await entriesRoute(new Request(url, { headers: { cookie: chair.cookie, origin: ORIGIN } }), { params: Promise.resolve({ slug: show.slug }) });
    expect(res.status, await res.clone().text()).toBe(400);
  });
});

describe("integers past PostgreSQL's int4 are a 400 (PostgreSQL docs §8.1.1)", () => {
  const sync = (change: Record<string, unknown>, rawValue?: string) =>
    syncRoute(
      new Request(`${env.APP_URL}/api/shows/${show.slug}/judging/sync`, {
        method: "POST",
        headers: { cookie: judge.cookie, origin: ORIGIN, "content-type": "application/json" },
        body: JSON.stringify({ deviceId: "device-regression-1", forJudge: judge.id, changes: [{ key: `k-${randomUUID()}`, entryId, kind: "set", field: "mark:c1", value: rawValue ? "RAW" : { kind: "points", points: 50 }, seq: 1, baseVersion: 0, ...change }] }).replace('"RAW"', rawValue ?? ""),
      }),
      { params: Promise.resolve({ slug: show.slug }) },
    );

  it("a valid change is taken (the same call reaches the database)", async () => {
    const res = await sync({});
    expect(res.status, await res.clone().text()).toBe(200);
  });

  it.each([
    ["seq", 2 ** 31],
    ["seq", 2 ** 53],
    ["baseVersion", 2 ** 31],
    ["baseVersion", -1],
  ])("%s = %d", async (field, value) => {
    const res = await sync({ [field]: value });
    expect(res.status, await res.clone().text()).toBe(400);
  });

  it("a sheet value nested thousands deep is a 400, not a stack overflow", async () => {
    const res = await sync({}, `${"[".repeat(5000)}1${"]".repeat(5000)}`);
    expect(res.status, await res.clone().text()).toBe(400);
  });
});

describe("unique indexes: a duplicate or a race is a 409 with a message", () => {
  it("a second award with the same name", async () => {
    actAs(chair.cookie);
    const slug = (await makeShow({ status: "judging" })).slug;
    const s = await db.query.shows.findFirst({ where: (t, { eq }) => eq(t.slug, slug) });
    await grantRole(chair.id, s!.id, "chair");
    const award = { showSlug: slug, name: "Best of Show", kind: "best_of_show", sponsor: "", chooseBy: "chair", ribbon: RIBBON, eligibility: {}, combinesWith: [] };
    expect(statusOf(await saveAwardAction(null, award))).toBe(200);
    const again = await saveAwardAction(null, award);
    expect(again).toMatchObject({ ok: false, status: 409, message: "There is already an award called “Best of Show”." });
  });

  it("six score sheets with the same name at once: one is saved, five are told why", async () => {
    actAs(chair.cookie);
    const name = `Race ${randomUUID().slice(0, 6)}`;
    const results = await Promise.all(Array.from({ length: 6 }, () => saveScoreSheetAction(null, { showSlug: show.slug, name, isDefault: false, sheet: SHEET })));
    const statuses = results.map(statusOf).sort();
    expect(statuses.filter((s) => s === 200)).toHaveLength(1);
    // The ones that lost the race see a 409; one that ran after the winner committed sees the name check's 400.
    for (const s of statuses.filter((s) => s !== 200)) expect([400, 409]).toContain(s);
    expect(statuses).not.toContain(500);
    const rows = await db.select().from(scoreSheets).where(and(eq(scoreSheets.showId, show.id), eq(scoreSheets.name, name)));
    expect(rows).toHaveLength(1);
  });
});

describe("signed payment webhooks of the wrong shape are a 400", () => {
  /** Signed with the provider SDK's test helper and the app's webhook secret (Stripe webhook docs). */
  const deliver = (body: string) =>
    webhookRoute(
      new Request(`${env.APP_URL}/api/payments/webhook`, {
        method: "POST",
        headers: { "content-type": "application/json", "stripe-signature": stripe.webhooks.generateTestHeaderString({ payload: body, secret: env.STRIPE_WEBHOOK_SECRET }) },
        body,
      }),
    );
  const event = (over: Record<string, unknown> = {}) => ({ id: `evt_${randomUUID()}`, object: "event", type: "checkout.session.completed", created: 1_800_000_000, data: { object: { id: `cs_${randomUUID()}`, object: "checkout.session", payment_status: "paid" } }, ...over });

  it("a well-formed event about an unknown session is recorded (200)", async () => {
    const res = await deliver(JSON.stringify(event()));
    expect(res.status, await res.clone().text()).toBe(200);
  });

  it.each([
    ["no data", JSON.stringify({ ...event(), data: undefined })],
    ["data without an object", JSON.stringify(event({ data: {} }))],
    ["a non-numeric created", JSON.stringify(event({ created: "yesterday" }))],
    ["created past year 9999", JSON.stringify(event({ created: 1e15 }))],
    ["created as 1e309", JSON.stringify(event()).replace(/"created":\d+/, '"created":1e309')],
    ["an array body", JSON.stringify([event()])],
    ["a string body", JSON.stringify("checkout.session.completed")],
    ["a session without an id", JSON.stringify(event({ data: { object: { object: "checkout.session", payment_status: "paid" } } }))],
    ["a NUL in the payload", JSON.stringify(event({ data: { object: { id: "cs_1", metadata: { note: "a\u0000b" } } } }))],
    ["a lone surrogate in the payload", JSON.stringify(event({ data: { object: { id: "cs_1", metadata: { note: "\ud800" } } } }))],
  ])("%s", async (_, body) => {
    const res = await deliver(body);
    expect(res.status, await res.clone().text()).toBe(400);
  });

  it("stores nothing for a refused event", async () => {
    const id = `evt_${randomUUID()}`;
    await deliver(JSON.stringify(event({ id, created: "soon" })));
    expect(await db.select().from(paymentEvents).where(eq(paymentEvents.eventId, id))).toEqual([]);
  });
});

describe("path parameters", () => {
  it("a judging manifest for an address with half a surrogate pair is a 404, not a URIError", async () => {
    const { GET } = await import("@/app/api/shows/[slug]/judging/manifest/route");
    const res = await GET(new Request(`${env.APP_URL}/api/shows/x/judging/manifest`), { params: Promise.resolve({ slug: "spring\ud83d" }) });
    expect(res.status, await res.clone().text()).toBe(404);
  });
});
