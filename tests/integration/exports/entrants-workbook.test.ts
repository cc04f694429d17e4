// The entrants spreadsheet, read back with SheetJS (not the library that wrote it): one row per
// entrant with a sent entry at this show, contact details, money as typed currency cells, the
// last payment as a date cell on the show's calendar day, and the chair alone may download it.
import { randomUUID } from "node:crypto";
import { and, eq, ne, sql } from "drizzle-orm";
import { beforeAll, describe, expect, it } from "vitest";
import * as XLSX from "xlsx";
import { db } from "@/db/client";
import { entrantProfiles, entries, paymentItems, payments, showSettings, user } from "@/db/schema";
import { GET } from "@/app/api/shows/[slug]/exports/entrants/route";
import { grantRole, makeEntry, makeShow, makeUser, unique, type TestUser } from "../../helpers/factories";

let show: { id: string; slug: string; name: string };
let chair: TestUser;
let judge: TestUser;
const emails: Record<string, string> = {};
// 03:30 UTC on Mar 15 is 22:30 CDT on Mar 14 in Chicago (US DST from Mar 14, 2027): the show's day is the 14th.
const cardPaidAt = new Date("2027-03-15T03:30:00Z");
const cashPaidAt = new Date("2027-03-02T17:00:00Z");

async function person(name: string, profile?: Partial<typeof entrantProfiles.$inferInsert>): Promise<string> {
  const id = randomUUID();
  emails[name] = `${unique("ent")}@example.test`;
  await db.insert(user).values({ id, name, email: emails[name]!, emailVerified: true });
  if (profile) await db.insert(entrantProfiles).values({ userId: id, displayName: name, ...profile });
  return id;
}

async function cardPayment(entrantUserId: string, lines: [string, number, string][], fields: Partial<typeof payments.$inferInsert> = {}) {
  const amountCents = lines.reduce((s, [, c]) => s + c, 0);
  const [p] = await db.insert(payments).values({ showId: show.id, entrantUserId, amountCents, currency: "usd", status: "paid", paidAt: cardPaidAt, ...fields }).returning();
  await db.insert(paymentItems).values(lines.map(([entryId, amount, description]) => ({ paymentId: p!.id, entryId, amountCents: amount, kind: kindOf(description), description })));
}

/** A line's kind from the start of its description, as checkout words it. */
function kindOf(description: string): "entry" | "late" | "critique" {
  return description.startsWith("Late fee") ? "late" : description.startsWith("Critique fee") ? "critique" : "entry";
}

async function download(who: TestUser | null) {
  const headers = who ? { cookie: who.cookie } : undefined;
  return GET(new Request(`http://127.0.0.1:3100/api/shows/${show.slug}/exports/entrants`, { headers }), { params: Promise.resolve({ slug: show.slug }) });
}

beforeAll(async () => {
  show = await makeShow(); // guild "Test Guild", America/Chicago
  [chair, judge] = await Promise.all([makeUser({ name: "Chair" }), makeUser({ name: "Judge" })]);
  await grantRole(chair.id, show.id, "chair");
  await grantRole(judge.id, show.id, "judge");
  // Invented fees; member rate, critique add-on shapes are common practice at guild shows.
  await db.insert(showSettings).values({ showId: show.id, currency: "usd", entryFeeCents: 2500, memberEntryFeeCents: 1500, critiqueFeeCents: 1000 });

  const rowan = await person("Rowan Invented", { phone: "555-0142", addressLine1: "14 Loom Street", city: "Millbrook", region: "WI", postalCode: "53001", country: "US", publishNameConsent: true });
  const a1 = await makeEntry(show.id, rowan, { title: "Harbor Lights", status: "paid", paidAt: cardPaidAt, paymentReference: "card pi_1" });
  const a2 = await makeEntry(show.id, rowan, { title: "Tide Chart", status: "paid", paidAt: cardPaidAt, paymentReference: "card pi_1", critiqueRequested: true });
  await makeEntry(show.id, rowan, { title: "Salt Marsh at Dusk", status: "submitted" });
  await cardPayment(rowan, [[a1.id, 2500, "Entry fee — entry 1: Harbor Lights"], [a2.id, 2500, "Entry fee — entry 2: Tide Chart"], [a2.id, 1000, "Critique fee — entry 2: Tide Chart"]]);

  const marisol = await person("Marisol Tern", { guild: "test guild", publishNameConsent: false });
  await makeEntry(show.id, marisol, { title: "Fern Hollow", status: "accepted", paidAt: cashPaidAt, paymentReference: "cash" });

  const ansel = await person("Ansel Pike"); // no profile: the account name, empty contact fields
  await makeEntry(show.id, ansel, { title: "Granary Door", status: "submitted" });

  const delphine = await person("Delphine Roux", { city: "Lakeview" });
  const d1 = await makeEntry(show.id, delphine, { title: "Comet Tail", status: "withdrawn", paidAt: cardPaidAt, paymentReference: "card pi_2", withdrawnAt: new Date() });
  await cardPayment(delphine, [[d1.id, 2500, "Entry fee — entry 9: Comet Tail"]], { status: "partially_refunded", refundedCents: 1250 });

  const drafter = await person("Drafts Only", {});
  await makeEntry(show.id, drafter, { entryNumber: null, title: "Still a draft", status: "draft" });
  const other = await makeShow();
  await makeEntry(other.id, await person("Elsewhere Entrant", {}), { title: "Another Show's Quilt" });
}, 120_000);

describe("the entrants workbook", () => {
  it("is an .xlsx named after the show and the day", async () => {
    const res = await download(chair);
    expect(res.status).toBe(200);
    expect(res.headers.get("content-type")).toBe("application/vnd.openxmlformats-officedocument.spreadsheetml.sheet");
    expect(res.headers.get("content-disposition")).toMatch(new RegExp(`^attachment; filename="${show.slug}-entrants-\\d{4}-\\d{2}-\\d{2}\\.xlsx"$`));
  });

  it("has one row per entrant with a sent entry, with their accounts", async () => {
    const wb = XLSX.read(Buffer.from(await (await download(chair)).arrayBuffer()), { type: "buffer", cellDates: true, cellNF: true });
    expect(wb.SheetNames).toEqual(["Entrants"]);
    const rows = XLSX.utils.sheet_to_json<Record<string, unknown>>(wb.Sheets.Entrants!, { raw: true });
    const [{ n }] = (await db
      .select({ n: sql<number>`count(distinct ${entries.entrantUserId})::int` })
      .from(entries)
      .where(and(eq(entries.showId, show.id), ne(entries.status, "draft")))) as [{ n: number }];
    expect(n).toBe(4);
    expect(rows).toHaveLength(n);
    expect(rows.map((r) => r.Name)).toEqual(["Ansel Pike", "Delphine Roux", "Marisol Tern", "Rowan Invented"]);
    const [ansel, delphine, marisol, rowan] = rows as [Record<string, unknown>, Record<string, unknown>, Record<string, unknown>, Record<string, unknown>];

    // 2500 + 2500 + 1000 critique by card; the third entry still owes the non-member 2500.
    expect(rowan).toMatchObject({
      "E-mail": emails["Rowan Invented"], Phone: "555-0142", "Address line 1": "14 Loom Street", City: "Millbrook", Region: "WI", "Postal code": "53001", Country: "US",
      "Member rate": "no", Entries: 3, "Withdrawn or declined": 0, "Fees due": 85, Paid: 60, Outstanding: 25, "Payment status": "part paid", "Name may be published": "yes",
    });
    expect((rowan["Last payment (America/Chicago)"] as Date).toISOString().slice(0, 10)).toBe("2027-03-14");
    // Paid in cash: the member rate (guild matches the show's, ignoring case), quoted from the schedule.
    expect(marisol).toMatchObject({ Guild: "test guild", "Member rate": "yes", Entries: 1, "Fees due": 15, Paid: 15, Outstanding: 0, "Payment status": "paid", "Name may be published": "no" });
    expect((marisol["Last payment (America/Chicago)"] as Date).toISOString().slice(0, 10)).toBe("2027-03-02");
    expect(ansel).toMatchObject({ "E-mail": emails["Ansel Pike"], Entries: 1, "Fees due": 25, Paid: 0, Outstanding: 25, "Payment status": "unpaid", "Name may be published": "no" });
    expect(ansel.Phone).toBeUndefined();
    expect(ansel["Last payment (America/Chicago)"]).toBeUndefined();
    // Withdrawn with half the entry fee refunded: the show kept 12.50.
    expect(delphine).toMatchObject({ Entries: 0, "Withdrawn or declined": 1, "Fees due": 12.5, Paid: 12.5, Outstanding: 0, "Payment status": "part refunded" });

    const all = JSON.stringify(rows);
    expect(all).not.toContain("Drafts Only");
    expect(all).not.toContain("Elsewhere Entrant");
  });

  it("types money and counts as numbers and the last payment as a date, with a frozen, filtered header", async () => {
    const buf = Buffer.from(await (await download(chair)).arrayBuffer());
    const wb = XLSX.read(buf, { type: "buffer", cellDates: true, cellNF: true, bookFiles: true });
    const ws = wb.Sheets.Entrants!;
    const header = XLSX.utils.sheet_to_json<string[]>(ws, { header: 1 })[0]!;
    const col = (name: string) => XLSX.utils.encode_col(header.indexOf(name));
    const rowan = 5; // header, then Ansel, Delphine, Marisol, Rowan
    for (const name of ["Entries", "Fees due", "Paid", "Outstanding"]) expect(ws[`${col(name)}${rowan}`]!.t, name).toBe("n");
    expect(ws[`${col("Fees due")}${rowan}`]!.z).toContain("$");
    expect(ws[`${col("Fees due")}${rowan}`]!.z).toContain("0.00");
    expect(ws[`${col("Last payment (America/Chicago)")}${rowan}`]!.t).toBe("d");
    expect(ws[`${col("Name")}${rowan}`]!.t).toBe("s");
    expect(header).toHaveLength(20);
    expect(ws["!autofilter"]).toEqual({ ref: "A1:T1" });
    const files = (wb as unknown as { files: Record<string, { content: Uint8Array }> }).files;
    const sheetXml = Buffer.from(files["xl/worksheets/sheet1.xml"]!.content).toString("utf8");
    expect(sheetXml).toMatch(/<pane[^>]*ySplit="1"[^>]*state="frozen"|<pane[^>]*state="frozen"[^>]*ySplit="1"/);
  });

  it("is refused to anyone but the chair", async () => {
    expect((await download(null)).status).toBe(401);
    expect((await download(judge)).status).toBe(403);
  });
});
