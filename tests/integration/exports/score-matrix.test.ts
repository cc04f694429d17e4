// The score matrix re-read with an independent reader (SheetJS): one row per entry and judge,
// points as numbers, N/A as text, totals as numbers, row counts equal to the sheets stored.
import { PassThrough } from "node:stream";
import { eq } from "drizzle-orm";
import { describe, expect, it } from "vitest";
import * as XLSX from "xlsx";
import { db } from "@/db/client";
import { judgeSheets } from "@/db/schema";
import { saveScoreSheet } from "@/db/queries/judging-setup";
import { matrixRows, sheetsOf, writeScoreMatrix } from "@/exports/score-matrix";
import { emptySheet, type SheetState } from "@/scoring/sheet-sync";
import { grantRole, makeCategory, makeEntry, makeShow, makeUser } from "../../helpers/factories";
import { viewerOf } from "../entries/helpers";

const crit = (id: string, label: string, maxPoints: number) => ({ id, label, maxPoints, scale: { kind: "points" as const }, allowNotApplicable: true });

function stateWith(marks: Record<string, number | "na">): SheetState {
  const s = emptySheet();
  for (const [id, v] of Object.entries(marks)) s.fields[`mark:${id}`] = { value: v === "na" ? { kind: "na" } : { kind: "points", points: v }, version: 1, deviceId: "d", seq: 1, changeKey: id };
  return { ...s, status: "submitted" };
}

async function toBuffer(write: (out: PassThrough) => Promise<number>): Promise<{ buffer: Buffer; rows: number }> {
  const out = new PassThrough();
  const chunks: Buffer[] = [];
  out.on("data", (c: Buffer) => chunks.push(c));
  const rows = await write(out);
  return { buffer: Buffer.concat(chunks), rows };
}

describe("score matrix", () => {
  it("has a row per entry and judge with typed values, and nothing of another show", async () => {
    const show = await makeShow({ status: "judging" });
    const [chair, j1, j2, entrant] = await Promise.all([makeUser(), makeUser({ name: "Judge One" }), makeUser({ name: "Judge Two" }), makeUser()]);
    await grantRole(chair.id, show.id, "chair");
    const { id: sheetId } = await saveScoreSheet(await viewerOf(chair), show.slug, {
      name: "Matrix sheet",
      isDefault: true,
      sheet: { sections: [{ id: "a", title: "All", criteria: [crit("impact", "Visual impact", 40), crit("design", "Design", 30), crit("piecing", "Piecing", 30)] }] },
    });
    const cat = await makeCategory(show.id, { code: "10" });
    const e1 = await makeEntry(show.id, entrant.id, { categoryId: cat.id, categoryState: "decided", paidAt: new Date() });
    const e2 = await makeEntry(show.id, entrant.id, { categoryId: cat.id, categoryState: "decided", paidAt: new Date() });
    await db.insert(judgeSheets).values([
      { showId: show.id, entryId: e1.id, judgeUserId: j1.id, scoreSheetId: sheetId, status: "submitted", state: stateWith({ impact: 36, design: 27, piecing: 25 }), total: { total: 88 } },
      { showId: show.id, entryId: e1.id, judgeUserId: j2.id, scoreSheetId: sheetId, status: "submitted", state: stateWith({ impact: 38, design: 28, piecing: "na" }), total: { total: 66 / 0.7 } },
      { showId: show.id, entryId: e2.id, judgeUserId: j1.id, scoreSheetId: sheetId, status: "open", state: { ...stateWith({ impact: 30 }), status: "open" }, total: { total: null } },
    ]);
    const other = await makeShow();
    const otherEntry = await makeEntry(other.id, entrant.id);
    await db.insert(judgeSheets).values({ showId: other.id, entryId: otherEntry.id, judgeUserId: j1.id, status: "submitted", state: stateWith({ impact: 1 }) });

    const { buffer, rows } = await toBuffer(async (out) => writeScoreMatrix(matrixRows(db, show.id), await sheetsOf(db, show.id), out));
    const stored = await db.select({ id: judgeSheets.id }).from(judgeSheets).where(eq(judgeSheets.showId, show.id));
    expect(rows).toBe(stored.length);

    const wb = XLSX.read(buffer, { type: "buffer" });
    expect(wb.SheetNames).toEqual(["Matrix sheet"]);
    const ws = wb.Sheets["Matrix sheet"]!;
    const data = XLSX.utils.sheet_to_json<Record<string, unknown>>(ws);
    expect(data).toHaveLength(3);
    expect(data[0]).toMatchObject({ Entry: e1.entryNumber, Category: "10", "Visual impact (of 40)": 36, "Design (of 30)": 27, "Piecing (of 30)": 25, Total: 88, Sheet: "submitted" });
    // Stored unrounded (66 of 70 rescaled to 100 = 94.2857…); written as the screen shows it.
    expect(data.find((r) => r.Judge === "Judge Two")).toMatchObject({ "Piecing (of 30)": "N/A", Total: 94.29 });
    expect(data[2]).toMatchObject({ Entry: e2.entryNumber, "Visual impact (of 40)": 30, Sheet: "open" });
    expect(data[2]!["Design (of 30)"]).toBeUndefined();
    // Types as the committee's spreadsheet sees them: numbers are numbers.
    expect(ws["D2"]!.t).toBe("n");
    expect(ws["A2"]!.t).toBe("n");
    expect(ws["!autofilter"]).toBeTruthy();
    expect(JSON.stringify(data)).not.toContain(otherEntry.id);
  });
});
