// The entries spreadsheet, read back with an independent reader (SheetJS), not the library that
// wrote it: values, cell types, one row per entry, the frozen header and the autofilter.
import { randomUUID } from "node:crypto";
import { and, eq, ne, sql } from "drizzle-orm";
import { beforeAll, describe, expect, it } from "vitest";
import * as XLSX from "xlsx";
import { db } from "@/db/client";
import { entrantProfiles, entries, paymentItems, payments, showSettings, user } from "@/db/schema";
import { GET } from "@/app/api/shows/[slug]/entries/export/route";
import { cmToUm, inchesToUm } from "@/scoring/units";
import { grantRole, makeCategory, makeEntry, makeShow, makeUser, unique, type TestUser } from "../../helpers/factories";

let show: { id: string; slug: string; name: string };
let chair: TestUser;
let judge: TestUser;
let entrantEmail: string;
const submittedAt = new Date("2027-03-14T15:30:00Z"); // 10:30 in Chicago (CDT, UTC−5, since Mar 14 2027 2:00)

async function download(who: TestUser | null) {
  const headers = who ? { cookie: who.cookie } : undefined;
  return GET(new Request(`http://127.0.0.1:3100/api/shows/${show.slug}/entries/export`, { headers }), { params: Promise.resolve({ slug: show.slug }) });
}

beforeAll(async () => {
  show = await makeShow();
  [chair, judge] = await Promise.all([makeUser({ name: "Chair" }), makeUser({ name: "Judge" })]);
  await grantRole(chair.id, show.id, "chair");
  await grantRole(judge.id, show.id, "judge");
  await db.insert(showSettings).values({ showId: show.id, currency: "usd" });
  const id = randomUUID();
  entrantEmail = `${unique("ent")}@example.test`;
  await db.insert(user).values({ id, name: "Account Name", email: entrantEmail, emailVerified: true });
  await db.insert(entrantProfiles).values({ userId: id, displayName: "Rowan Invented", phone: "555-0142" });

  const category = await makeCategory(show.id, { code: "11", name: "Pieced, Medium" });
  const first = await makeEntry(show.id, id, {
    entryNumber: 101,
    categoryId: category.id,
    categoryState: "decided",
    title: "Prairie Crossing",
    widthUm: inchesToUm(60.5),
    lengthUm: inchesToUm(72.25),
    techniques: ["pieced", "appliqué"],
    quiltingMethod: "frame_machine",
    quiltedBy: "Hired Longarmer",
    quiltedForHire: true,
    declaredValueCents: 125_050,
    forSale: true,
    priceCents: 90_000,
    division: "open",
    judged: true,
    status: "paid",
    paidAt: submittedAt,
    paymentReference: "stripe",
    submittedAt,
  });
  const [paid] = await db.insert(payments).values({ showId: show.id, entrantUserId: id, amountCents: 3500, currency: "usd", status: "paid", paidAt: submittedAt }).returning();
  await db.insert(paymentItems).values([
    { paymentId: paid!.id, entryId: first.id, amountCents: 2500, kind: "entry", description: "Entry fee" },
    { paymentId: paid!.id, entryId: first.id, amountCents: 1000, kind: "critique", description: "Critique" },
  ]);
  await makeEntry(show.id, id, { entryNumber: 102, title: "Tide Chart", widthUm: cmToUm(150), lengthUm: cmToUm(200), division: "youth", judged: false, status: "submitted", submittedAt: new Date("2027-03-01T18:00:00Z") });
  for (let i = 0; i < 40; i++) await makeEntry(show.id, id, { entryNumber: 103 + i, title: `Filler ${i}`, status: "accepted", submittedAt });
  await makeEntry(show.id, id, { entryNumber: null, title: "Still a draft", status: "draft" });
}, 120_000);

describe("the entries workbook", () => {
  it("is an .xlsx named after the show and the day", async () => {
    const res = await download(chair);
    expect(res.status).toBe(200);
    expect(res.headers.get("content-type")).toBe("application/vnd.openxmlformats-officedocument.spreadsheetml.sheet");
    expect(res.headers.get("content-disposition")).toMatch(new RegExp(`^attachment; filename="${show.slug}-entries-\\d{4}-\\d{2}-\\d{2}\\.xlsx"$`));
  });

  it("reads back with one row per entry, typed cells, a frozen header and an autofilter", async () => {
    const buf = Buffer.from(await (await download(chair)).arrayBuffer());
    const wb = XLSX.read(buf, { type: "buffer", cellDates: true, cellNF: true, bookFiles: true });
    expect(wb.SheetNames).toEqual(["Entries"]);
    const ws = wb.Sheets.Entries!;

    const [{ n }] = (await db
      .select({ n: sql<number>`count(*)::int` })
      .from(entries)
      .where(and(eq(entries.showId, show.id), ne(entries.status, "draft")))) as [{ n: number }];
    expect(n).toBe(42);
    const range = XLSX.utils.decode_range(ws["!ref"]!);
    expect(range.e.r).toBe(n); // header row 0 + one row per entry
    expect(range.e.c + 1).toBe(26);

    const rows = XLSX.utils.sheet_to_json<Record<string, unknown>>(ws, { raw: true });
    expect(rows).toHaveLength(n);
    const first = rows[0]!;
    expect(first).toMatchObject({
      "Entry number": 101,
      Title: "Prairie Crossing",
      Entrant: "Rowan Invented",
      "E-mail": entrantEmail,
      Phone: "555-0142",
      "Category code": "11",
      Category: "Pieced, Medium",
      Division: "Open",
      Judged: "yes",
      // 60½ × 72¼ in; 1 in = 2.54 cm exactly (NIST SP 811).
      "Width in": 60.5,
      "Length in": 72.25,
      "Width cm": 153.67,
      "Length cm": 183.52,
      "Perimeter in": 265.5,
      Techniques: "pieced, appliqué",
      "Quilting method": "Quilted on a frame machine",
      "Quilted by": "Hired Longarmer",
      "For hire": "yes",
      "Declared value $": 1250.5,
      "For sale": "yes",
      "Price $": 900,
      Status: "paid",
      Paid: "paid",
      "Amount paid $": 35,
      "Payment reference": "stripe",
    });
    // Wall-clock time in the show's zone: 15:30 UTC is 10:30 CDT in Chicago (US DST from Mar 14, 2027).
    const when = first["Submitted at (America/Chicago)"];
    expect(when).toBeInstanceOf(Date);
    expect((when as Date).toISOString().slice(0, 16)).toBe("2027-03-14T10:30");

    const second = rows[1]!;
    expect(second).toMatchObject({ "Entry number": 102, Category: "Not decided yet", Division: "Youth", Judged: "no", "Width cm": 150, "Length cm": 200, Paid: "unpaid", "Amount paid $": 0 });
    expect(second["Price $"]).toBeUndefined();

    // Cell types: n = number, d = date, s = string (SheetJS cell object docs).
    expect(ws.A2!.t).toBe("n");
    expect(ws.J2!.t).toBe("n");
    expect(ws.S2!.t).toBe("n");
    expect(ws.S2!.z).toContain("$");
    expect(ws.S2!.z).toContain("0.00");
    expect(ws.Z2!.t).toBe("d");
    expect(ws.B2!.t).toBe("s");

    expect(ws["!autofilter"]).toEqual({ ref: "A1:Z1" });
    const files = (wb as unknown as { files: Record<string, { content: Uint8Array }> }).files;
    const sheetXml = Buffer.from(files["xl/worksheets/sheet1.xml"]!.content).toString("utf8");
    expect(sheetXml).toMatch(/<pane[^>]*ySplit="1"[^>]*state="frozen"|<pane[^>]*state="frozen"[^>]*ySplit="1"/);
    expect(sheetXml).toMatch(/<col [^>]*width=/);
  });

  it("is refused to anyone but the chair", async () => {
    expect((await download(null)).status).toBe(401);
    expect((await download(judge)).status).toBe(403);
  });
});
