// The results files made from a judged show in the database, re-read with independent readers
// (SheetJS for the spreadsheets, pdfjs-dist for the PDFs): row counts equal the judged entries,
// means equal the SQL totals, places and awards match the review, and the award cards and the
// judges' summary never carry an entrant's name.
import { describe, expect, it } from "vitest";
import * as XLSX from "xlsx";
import { db } from "@/db/client";
import { judgeSheets, judgingPanels, panelCategories, panelMembers, showAwards, awardPicks } from "@/db/schema";
import { resultExports } from "@/db/queries/result-exports";
import { totalsInSql } from "@/db/queries/results";
import { writeAwardCards } from "@/exports/award-cards";
import { writeAwardsList } from "@/exports/awards-list";
import { writeJudgesSummary } from "@/exports/judges-summary-pdf";
import { writeResultsWorkbook } from "@/exports/results-workbook";
import { emptySheet } from "@/scoring/sheet-sync";
import { grantRole, makeCategory, makeEntry, makeShow, makeUser } from "../../helpers/factories";
import { readPdf, readXlsx } from "../../unit/exports/read-back";
import { viewerOf } from "../entries/helpers";

async function judgedShow() {
  const show = await makeShow({ status: "judging" });
  const [chair, a, b, maker, other] = await Promise.all([makeUser(), makeUser({ name: "Judge Ash" }), makeUser({ name: "Judge Birch" }), makeUser({ name: "Maren Quillfeather" }), makeUser({ name: "Tova Lindqvist" })]);
  await grantRole(chair.id, show.id, "chair");
  const cat = await makeCategory(show.id, { code: "10", name: "Pieced" });
  const [panel] = await db.insert(judgingPanels).values({ showId: show.id, name: "P" }).returning();
  await db.insert(panelMembers).values([{ panelId: panel!.id, userId: a.id, role: "judge" }, { panelId: panel!.id, userId: b.id, role: "judge" }]);
  await db.insert(panelCategories).values({ panelId: panel!.id, categoryId: cat.id });
  const scores: [string, number, number, string][] = [["Harbor Lights", 94, 96, maker.id], ["Marsh Wren", 88, 93, other.id], ["Tidewater", 79, 85, other.id]];
  const entries = [];
  for (const [title, x, y, owner] of scores) {
    const e = await makeEntry(show.id, owner, { categoryId: cat.id, categoryState: "decided", paidAt: new Date(), title });
    entries.push(e);
    for (const [judge, total] of [[a.id, x], [b.id, y]] as const) {
      await db.insert(judgeSheets).values({ showId: show.id, entryId: e.id, judgeUserId: judge, status: "submitted", state: { ...emptySheet(), status: "submitted" }, total: { total, complete: true, percent: total } });
    }
  }
  const [award] = await db.insert(showAwards).values({ showId: show.id, name: "Best of Show", kind: "best_of_show", ribbon: { name: "Purple rosette", colour: "#6b21a8" }, eligibility: { categoryWinnersOnly: true } }).returning();
  await db.insert(awardPicks).values({ showId: show.id, awardId: award!.id, entryId: entries[0]!.id, kind: "choice" });
  return { show, chair: await viewerOf(chair), entries };
}

describe("results files from the database", () => {
  it("results by category: one row per judged entry, means as numbers equal to the SQL totals", async () => {
    const { show, chair, entries } = await judgedShow();
    const data = await resultExports(chair, show.slug);
    const book = await readXlsx((out) => writeResultsWorkbook(data.resultRows, { showName: show.name }, out));
    const rows = XLSX.utils.sheet_to_json<Record<string, unknown>>(book.wb.Sheets[book.wb.SheetNames[0]!]!);
    expect(rows).toHaveLength(entries.length);
    const totals = await totalsInSql(show.id);
    // The two-judge averages of a published show's results: 94/96 → 95, 88/93 → 90.5, 79/85 → 82 (quiltingtales.blogspot.com 2016).
    const means = rows.map((r) => Object.entries(r).find(([k]) => /mean/i.test(k))![1]);
    expect(means).toEqual([95, 90.5, 82]);
    expect(means).toEqual(entries.map((e) => totals.find((t) => t.entryId === e.id)!.mean));
    expect(JSON.stringify(rows[0])).toContain("Maren Quillfeather");
    expect(JSON.stringify(rows[0])).toMatch(/1st.*Best of Show/);
  });

  it("awards list: Best of Show and each ribbon, with entrant names for the ribbon table", async () => {
    const { show, chair } = await judgedShow();
    const data = await resultExports(chair, show.slug);
    const book = await readXlsx((out) => writeAwardsList(data.awardsList, { showName: show.name }, out));
    const rows = XLSX.utils.sheet_to_json<Record<string, unknown>>(book.wb.Sheets[book.wb.SheetNames[0]!]!);
    // Best of Show, then 1st, 2nd, 3rd (default rules: three places, blue, red, yellow).
    expect(rows.map((r) => Object.values(r).join(" | "))).toEqual([
      expect.stringMatching(/Best of Show.*Purple rosette.*Harbor Lights.*Maren Quillfeather/),
      expect.stringMatching(/1st.*Blue.*Harbor Lights/),
      expect.stringMatching(/2nd.*Red.*Marsh Wren.*Tova Lindqvist/),
      expect.stringMatching(/3rd.*Yellow.*Tidewater/),
    ]);
  });

  it("award cards and the judges' summary carry entry numbers and titles but no entrant's name", async () => {
    const { show, chair, entries } = await judgedShow();
    const data = await resultExports(chair, show.slug);
    const cards = (await readPdf((out) => writeAwardCards({ showName: show.name, cards: data.cards }, out))).map((p) => p.text).join("\n");
    const summary = (await readPdf((out) => writeJudgesSummary({ showName: show.name, categories: data.summary }, out))).map((p) => p.text).join("\n");
    for (const text of [cards, summary]) {
      expect(text).toContain("Harbor Lights");
      expect(text).toContain(String(entries[0]!.entryNumber));
      expect(text).not.toContain("Maren Quillfeather");
      expect(text).not.toContain("Tova Lindqvist");
    }
    expect(summary).toContain("Judge Ash");
    expect(summary).toContain("90.5");
  });
});
