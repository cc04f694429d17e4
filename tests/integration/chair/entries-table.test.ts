// The chair's entries table endpoint: server-side search, filters, sorting and paging on a show
// of 300 generated entries, checked against the same rules applied to the generated data here.
import { randomUUID } from "node:crypto";
import { beforeAll, describe, expect, it } from "vitest";
import { db } from "@/db/client";
import { entrantProfiles, entries, paymentItems, payments, user } from "@/db/schema";
import { GET } from "@/app/api/shows/[slug]/entries/route";
import { entriesForExport, entryDetailForChair } from "@/db/queries/chair-entries";
import { intakeList } from "@/db/queries/desk";
import { getViewer } from "@/lib/session";
import { inchesToUm } from "@/scoring/units";
import { grantRole, makeCategory, makeShow, makeUser, type TestUser } from "../../helpers/factories";

type Row = { id: string; entryNumber: number; categoryId?: string | null; categoryCode: string | null; categoryName: string | null; title: string; entrantName: string; entrantEmail: string; widthUm: number; lengthUm: number; status: string; division: string; judged: boolean; paymentState: string; submittedAt: string | null };
type Page = { total: number; limit: number; offset: number; entries: Row[]; categories: { id: string; code: string; name: string }[] };

const STATUSES = ["submitted", "paid", "accepted", "declined", "received", "withdrawn"] as const;
const DIVISIONS = ["open", "youth", "first_time"] as const;
const WORDS = ["Harbor", "Lantern", "Meadow", "Orchard", "Prairie", "Quarry", "Spindle", "Thistle", "Willow", "Zephyr"];

let show: { id: string; slug: string; name: string };
let chair: TestUser;
let judge: TestUser;
let otherChair: TestUser;
let expected: Row[] = [];
// Listed in the show's order (precedence), which is not the order of their codes.
let cats: { id: string; code: string; name: string }[] = [];

async function list(who: TestUser, query: Record<string, string | number> = {}): Promise<{ status: number; body: Page & { fieldErrors?: Record<string, string[]> } }> {
  const qs = new URLSearchParams(Object.entries(query).map(([k, v]) => [k, String(v)]));
  const res = await GET(new Request(`http://127.0.0.1:3100/api/shows/${show.slug}/entries?${qs}`, { headers: { cookie: who.cookie } }), {
    params: Promise.resolve({ slug: show.slug }),
  });
  return { status: res.status, body: (await res.json()) as never };
}

async function all(who: TestUser, query: Record<string, string | number>): Promise<Row[]> {
  const out: Row[] = [];
  for (let offset = 0; ; offset += 200) {
    const { body } = await list(who, { ...query, limit: 200, offset });
    out.push(...body.entries);
    if (body.entries.length < 200) return out;
  }
}

const numbers = (rows: Row[]) => rows.map((r) => r.entryNumber);
const byNumber = (a: Row, b: Row) => a.entryNumber - b.entryNumber;

beforeAll(async () => {
  show = await makeShow();
  [chair, judge, otherChair] = await Promise.all([makeUser({ name: "Chair" }), makeUser({ name: "Judge" }), makeUser({ name: "Other chair" })]);
  await grantRole(chair.id, show.id, "chair");
  await grantRole(judge.id, show.id, "judge");
  const other = await makeShow();
  await grantRole(otherChair.id, other.id, "chair");

  // 20 invented entrants; half have a profile whose display name differs from the account name.
  const people = Array.from({ length: 20 }, (_, i) => ({
    id: randomUUID(),
    name: `Account ${String.fromCharCode(65 + i)}${i}`,
    email: `entrant${i}-${show.slug}@example.test`,
    displayName: i % 2 === 0 ? `Quilter ${WORDS[i % WORDS.length]} ${i}` : null,
  }));
  await db.insert(user).values(people.map((p) => ({ id: p.id, name: p.name, email: p.email, emailVerified: true })));
  await db.insert(entrantProfiles).values(people.filter((p) => p.displayName).map((p) => ({ userId: p.id, displayName: p.displayName! })));

  const late = await makeCategory(show.id, { code: "10", name: "Art, Small", precedence: 2 });
  const early = await makeCategory(show.id, { code: "20", name: "Bed, Large", precedence: 1 });
  cats = [early, late].map((c) => ({ id: c.id, code: c.code, name: c.name }));

  const base = Date.UTC(2027, 1, 1, 12);
  const values = Array.from({ length: 300 }, (_, i) => {
    const who = people[(i * 7) % people.length]!;
    const status = STATUSES[i % STATUSES.length]!;
    // One in four has no category yet; the rest alternate between the two.
    const cat = i % 4 === 3 ? null : cats[i % 2]!;
    return {
      categoryId: cat?.id ?? null,
      categoryState: cat ? ("decided" as const) : ("undecided" as const),
      _cat: cat,
      id: randomUUID(),
      showId: show.id,
      entrantUserId: who.id,
      entryNumber: 101 + i,
      title: `${WORDS[(i * 3) % WORDS.length]} ${WORDS[(i * 11) % WORDS.length]} ${i}`,
      widthUm: inchesToUm(30 + ((i * 13) % 70)),
      lengthUm: inchesToUm(40 + ((i * 17) % 60)),
      quiltingMethod: "home_machine" as const,
      status,
      division: DIVISIONS[i % 3]!,
      judged: i % 5 !== 0,
      paidAt: status === "submitted" ? null : new Date(base + i * 60_000),
      submittedAt: new Date(base + ((i * 7919) % 300) * 3_600_000),
      madeBy: ["Invented Maker"],
      _who: who,
    };
  });
  await db.insert(entries).values(values.map(({ _who, _cat, ...v }) => v));
  // A draft belongs to its entrant alone: never in the chair's table.
  await db.insert(entries).values({ showId: show.id, entrantUserId: people[0]!.id, title: "Harbor draft", widthUm: 1, lengthUm: 1, quiltingMethod: "hand", status: "draft" });
  // Entries 101–110 paid through checkout; 101–104 of them refunded since.
  const refundedIds = values.slice(0, 4).map((v) => v.id);
  const [paid] = await db.insert(payments).values({ showId: show.id, entrantUserId: people[0]!.id, amountCents: 4000, currency: "usd", status: "paid", paidAt: new Date(base) }).returning();
  const [back] = await db.insert(payments).values({ showId: show.id, entrantUserId: people[0]!.id, amountCents: 4000, refundedCents: 4000, currency: "usd", status: "refunded", paidAt: new Date(base) }).returning();
  await db.insert(paymentItems).values(values.slice(4, 10).map((v) => ({ paymentId: paid!.id, entryId: v.id, amountCents: 1000, kind: "entry" as const, description: "Entry fee" })));
  await db.insert(paymentItems).values(refundedIds.map((id) => ({ paymentId: back!.id, entryId: id, amountCents: 1000, kind: "entry" as const, description: "Entry fee" })));

  expected = values.map((v) => ({
    id: v.id,
    entryNumber: v.entryNumber,
    title: v.title,
    entrantName: v._who.displayName ?? v._who.name,
    entrantEmail: v._who.email,
    categoryId: v.categoryId,
    categoryCode: v._cat?.code ?? null,
    categoryName: v._cat?.name ?? null,
    widthUm: v.widthUm,
    lengthUm: v.lengthUm,
    status: v.status,
    division: v.division,
    judged: v.judged,
    paymentState: refundedIds.includes(v.id) ? "refunded" : v.paidAt ? "paid" : "unpaid",
    submittedAt: v.submittedAt.toISOString(),
  }));
}, 120_000);

describe("the chair's entries table", () => {
  it("answers one page with the total, leaving drafts out", async () => {
    const { status, body } = await list(chair, { limit: 25 });
    expect(status).toBe(200);
    expect(body.total).toBe(300);
    expect(body.entries).toHaveLength(25);
    expect(numbers(body.entries)).toEqual(Array.from({ length: 25 }, (_, i) => 101 + i));
    const first = body.entries[0]!;
    const want = expected[0]!;
    expect(first).toMatchObject({ id: want.id, title: want.title, entrantName: want.entrantName, entrantEmail: want.entrantEmail, status: want.status, paymentState: "refunded" });
  });

  it("gives each entry its category's code and name, and the show's categories in the show's order", async () => {
    const { body } = await list(chair, { limit: 4 });
    expect(body.entries.map((e) => [e.categoryCode, e.categoryName])).toEqual(expected.slice(0, 4).map((e) => [e.categoryCode, e.categoryName]));
    expect(body.entries[3]!.categoryCode).toBeNull();
    expect(body.categories).toEqual(cats);
  });

  it("pages through every entry exactly once", async () => {
    const seen: number[] = [];
    for (let offset = 0; offset < 300; offset += 50) {
      const { body } = await list(chair, { sort: "title", limit: 50, offset });
      expect(body.total).toBe(300);
      seen.push(...numbers(body.entries));
    }
    expect(seen).toHaveLength(300);
    expect(new Set(seen).size).toBe(300);
    const { body: past } = await list(chair, { limit: 50, offset: 300 });
    expect(past.entries).toEqual([]);
  });

  it("finds an entry number exactly, with or without #", async () => {
    expect(numbers((await list(chair, { q: "112" })).body.entries)).toEqual([112]);
    expect(numbers((await list(chair, { q: "#112" })).body.entries)).toEqual([112]);
    expect((await list(chair, { q: "99999" })).body.total).toBe(0);
  });

  it("searches title, entrant name and e-mail, ignoring case", async () => {
    const byTitle = await all(chair, { q: "thistle" });
    expect(numbers(byTitle)).toEqual(numbers(expected.filter((e) => e.title.toLowerCase().includes("thistle"))));
    expect(byTitle.length).toBeGreaterThan(0);

    const name = expected.find((e) => e.entrantName.startsWith("Quilter"))!.entrantName;
    const byName = await all(chair, { q: name.toUpperCase() });
    expect(numbers(byName)).toEqual(numbers(expected.filter((e) => e.entrantName === name)));

    const email = expected[5]!.entrantEmail;
    const byEmail = await all(chair, { q: email });
    expect(numbers(byEmail)).toEqual(numbers(expected.filter((e) => e.entrantEmail === email)));
  });

  it("treats % and _ in the search as letters, not wildcards", async () => {
    expect((await list(chair, { q: "%" })).body.total).toBe(0);
    expect((await list(chair, { q: "_" })).body.total).toBe(0);
  });

  it.each([
    ["status", { status: "accepted" }, (e: Row) => e.status === "accepted"],
    ["division", { division: "youth" }, (e: Row) => e.division === "youth"],
    ["judged", { judged: "judged" }, (e: Row) => e.judged],
    ["display only", { judged: "display" }, (e: Row) => !e.judged],
    ["paid", { payment: "paid" }, (e: Row) => e.paymentState === "paid"],
    ["unpaid", { payment: "unpaid" }, (e: Row) => e.paymentState === "unpaid"],
    ["refunded", { payment: "refunded" }, (e: Row) => e.paymentState === "refunded"],
    ["category", { category: "CAT0" }, (e: Row) => e.categoryId === cats[0]!.id],
    ["no category yet", { category: "none" }, (e: Row) => e.categoryId === null],
    ["combined", { status: "paid", division: "youth", judged: "judged", payment: "paid" }, (e: Row) => e.status === "paid" && e.division === "youth" && e.judged && e.paymentState === "paid"],
  ] as const)("filters by %s", async (_, q, keep) => {
    // The category's id is known only once the show is made.
    const query = Object.fromEntries(Object.entries(q).map(([k, v]) => [k, v === "CAT0" ? cats[0]!.id : v])) as Record<string, string>;
    const got = await all(chair, query);
    const want = expected.filter(keep);
    expect(want.length).toBeGreaterThan(0);
    expect(numbers(got)).toEqual(numbers(want));
    expect((await list(chair, { ...query, limit: 1 })).body.total).toBe(want.length);
  });

  it("counts refunded entries as refunded, not paid", async () => {
    expect(numbers(await all(chair, { payment: "refunded" }))).toEqual([101, 102, 103, 104]);
    const paid = numbers(await all(chair, { payment: "paid" }));
    expect(paid).not.toContain(101);
  });

  const cmp = (a: string, b: string) => (a < b ? -1 : a > b ? 1 : 0);
  const rankOf = (r: Row) => (r.categoryId ? cats.findIndex((c) => c.id === r.categoryId) : cats.length);
  it.each([
    ["number", (a: Row, b: Row) => a.entryNumber - b.entryNumber],
    ["title", (a: Row, b: Row) => cmp(a.title.toLowerCase(), b.title.toLowerCase())],
    ["entrant", (a: Row, b: Row) => cmp(a.entrantName.toLowerCase(), b.entrantName.toLowerCase())],
    // By the show's order of categories, entries with none last.
    ["category", (a: Row, b: Row) => rankOf(a) - rankOf(b)],
    ["size", (a: Row, b: Row) => a.widthUm * a.lengthUm - b.widthUm * b.lengthUm],
    ["submitted", (a: Row, b: Row) => cmp(a.submittedAt!, b.submittedAt!)],
    ["status", (a: Row, b: Row) => STATUSES.indexOf(a.status as never) - STATUSES.indexOf(b.status as never)],
  ] as const)("sorts by %s both ways", async (sort, order) => {
    const asc = await all(chair, { sort });
    expect(numbers(asc)).toEqual(numbers([...expected].sort((a, b) => order(a, b) || byNumber(a, b))));
    const desc = await all(chair, { sort, dir: "desc" });
    // Descending reverses the key; ties still run by entry number upwards.
    expect(numbers(desc)).toEqual(numbers([...expected].sort((a, b) => order(b, a) || byNumber(a, b))));
  });

  it("answers 400 naming the field for bad paging or filters", async () => {
    const bad = await list(chair, { limit: 0 });
    expect(bad.status).toBe(400);
    expect(Object.keys(bad.body.fieldErrors ?? {})).toEqual(["limit"]);
    const status = await list(chair, { status: "draft" });
    expect(status.status).toBe(400);
    expect(Object.keys(status.body.fieldErrors ?? {})).toEqual(["status"]);
    const category = await list(chair, { category: "11" });
    expect(category.status).toBe(400);
    expect(Object.keys(category.body.fieldErrors ?? {})).toEqual(["category"]);
  });

  it("names the category on the entry page, in the spreadsheet rows and at the desk", async () => {
    const viewer = (await getViewer(new Headers({ cookie: chair.cookie })))!;
    const detail = await entryDetailForChair(viewer, show.slug, expected[0]!.id);
    expect(detail.entry).toMatchObject({ categoryCode: expected[0]!.categoryCode, categoryName: expected[0]!.categoryName });
    const files = await entriesForExport(viewer, show.slug);
    expect(files.rows[1]).toMatchObject({ categoryCode: expected[1]!.categoryCode, categoryName: expected[1]!.categoryName });
    const desk = await intakeList(viewer, show.slug);
    const atDesk = desk.entries.find((e) => e.id === expected[2]!.id)!;
    expect(atDesk).toMatchObject({ categoryCode: expected[2]!.categoryCode, categoryName: expected[2]!.categoryName });
  });

  it("refuses anyone but this show's chair", async () => {
    expect((await list(judge)).status).toBe(403);
    expect((await list(otherChair)).status).toBe(403);
    const anon = await GET(new Request(`http://127.0.0.1:3100/api/shows/${show.slug}/entries`), { params: Promise.resolve({ slug: show.slug }) });
    expect(anon.status).toBe(401);
  });
});
