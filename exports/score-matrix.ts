// The full score matrix for the committee: one row per entry and judge, one column per criterion
// of the sheet, then the sheet's total; one worksheet per score sheet. Written with exceljs's
// streaming writer, row by row, so a large show never sits in memory as one workbook.
// No "server-only": the benchmark writes it with a database client of its own.
import type { Writable } from "node:stream";
import ExcelJS from "exceljs";
import { and, asc, eq, sql, type SQL } from "drizzle-orm";
import type { PgDatabase } from "drizzle-orm/pg-core";
import type { PostgresJsQueryResultHKT } from "drizzle-orm/postgres-js";
import type * as schema from "../db/schema";
import { categories, entries, judgeSheets, scoreSheets, user } from "../db/schema";
import { formatScore, markPoints, type Mark, type ScoreSheet } from "../scoring/score-sheets";
import type { SheetState } from "../scoring/sheet-sync";

export type MatrixDb = PgDatabase<PostgresJsQueryResultHKT, typeof schema>;

export type MatrixRow = {
  entryNumber: number;
  categoryCode: string;
  judgeName: string;
  sheetId: string | null;
  status: string;
  state: SheetState;
  total: number | null;
};

const BATCH = 1_000;

type BatchRow = { id: string; entryNumber: number | null; categoryCode: string | null; judgeName: string; sheetId: string | null; status: string; state: SheetState; total: unknown };

/** The show's judge sheets by entry number then judge, a batch at a time (keyset paging). */
export async function* matrixRows(db: MatrixDb, showId: string): AsyncGenerator<MatrixRow> {
  let after: { n: number; name: string; id: string } | null = null;
  for (;;) {
    const where: SQL | undefined = after
      ? and(eq(judgeSheets.showId, showId), sql`(coalesce(${entries.entryNumber}, 0), ${user.name}, ${judgeSheets.id}) > (${after.n}, ${after.name}, ${after.id}::uuid)`)
      : eq(judgeSheets.showId, showId);
    const batch: BatchRow[] = await db
      .select({ id: judgeSheets.id, entryNumber: entries.entryNumber, categoryCode: categories.code, judgeName: user.name, sheetId: judgeSheets.scoreSheetId, status: judgeSheets.status, state: judgeSheets.state, total: judgeSheets.total })
      .from(judgeSheets)
      .innerJoin(entries, eq(entries.id, judgeSheets.entryId))
      .innerJoin(user, eq(user.id, judgeSheets.judgeUserId))
      .leftJoin(categories, eq(categories.id, entries.categoryId))
      .where(where)
      .orderBy(sql`coalesce(${entries.entryNumber}, 0)`, asc(user.name), asc(judgeSheets.id))
      .limit(BATCH);
    for (const r of batch) {
      const total = r.total && typeof r.total === "object" && !Array.isArray(r.total) ? (r.total as { total?: unknown }).total : null;
      yield { entryNumber: r.entryNumber ?? 0, categoryCode: r.categoryCode ?? "", judgeName: r.judgeName, sheetId: r.sheetId, status: r.status, state: r.state, total: typeof total === "number" ? total : null };
    }
    if (batch.length < BATCH) return;
    const last: BatchRow = batch[batch.length - 1]!;
    after = { n: last.entryNumber ?? 0, name: last.judgeName, id: last.id };
  }
}

export async function sheetsOf(db: MatrixDb, showId: string): Promise<{ id: string; name: string; sheet: ScoreSheet }[]> {
  return db.select({ id: scoreSheets.id, name: scoreSheets.name, sheet: scoreSheets.sheet }).from(scoreSheets).where(eq(scoreSheets.showId, showId)).orderBy(asc(scoreSheets.name));
}

/** Worksheet names: at most 31 characters, none of : \ / ? * [ ], unique. */
function worksheetName(name: string, taken: Set<string>): string {
  const base = name.replace(/[:\\/?*[\]]/g, " ").slice(0, 28).trim() || "Sheet";
  let n = base;
  for (let i = 2; taken.has(n.toLowerCase()); i++) n = `${base} ${i}`;
  taken.add(n.toLowerCase());
  return n;
}

/**
 * Writes the matrix to `out` (a file, or an HTTP response body). Points are numbers; a criterion
 * marked not applicable is the text "N/A"; an unmarked one is empty. Returns the rows written.
 */
export async function writeScoreMatrix(rows: AsyncIterable<MatrixRow>, sheets: { id: string; name: string; sheet: ScoreSheet }[], out: Writable): Promise<number> {
  const wb = new ExcelJS.stream.xlsx.WorkbookWriter({ stream: out, useStyles: true, useSharedStrings: false });
  const taken = new Set<string>();
  const byId = new Map<string, { ws: ExcelJS.Worksheet; criteria: ScoreSheet["sections"][number]["criteria"] }>();
  for (const s of sheets) {
    const ws = wb.addWorksheet(worksheetName(s.name, taken), { views: [{ state: "frozen", ySplit: 1, xSplit: 3 }] });
    const criteria = s.sheet.sections.flatMap((sec) => sec.criteria);
    ws.columns = [
      { header: "Entry", key: "entry", width: 8 },
      { header: "Category", key: "category", width: 10 },
      { header: "Judge", key: "judge", width: 22 },
      ...criteria.map((c) => ({ header: `${c.label} (of ${c.maxPoints})`, key: `c_${c.id}`, width: Math.max(10, Math.min(24, c.label.length + 8)), style: { numFmt: "0.##" } })),
      { header: "Total", key: "total", width: 9, style: { numFmt: "0.00" } },
      { header: "Sheet", key: "status", width: 11 },
    ];
    ws.autoFilter = { from: { row: 1, column: 1 }, to: { row: 1, column: criteria.length + 5 } };
    ws.getRow(1).font = { bold: true };
    ws.getRow(1).commit();
    byId.set(s.id, { ws, criteria });
  }
  let written = 0;
  for await (const r of rows) {
    const target = r.sheetId ? byId.get(r.sheetId) : undefined;
    if (!target) continue;
    const cells: Record<string, ExcelJS.CellValue> = { entry: r.entryNumber, category: r.categoryCode, judge: r.judgeName, total: r.total === null ? null : Number(formatScore(r.total)), status: r.status === "submitted" ? "submitted" : "open" };
    for (const c of target.criteria) {
      const mark = r.state.fields[`mark:${c.id}`]?.value as Mark | null | undefined;
      cells[`c_${c.id}`] = mark?.kind === "na" ? "N/A" : mark ? markPoints(c, mark) : null;
    }
    target.ws.addRow(cells).commit();
    written++;
  }
  for (const { ws } of byId.values()) ws.commit();
  await wb.commit();
  return written;
}
