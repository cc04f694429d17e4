// Each entry's panel totals from the submitted sheets: mean, median, spread, sample standard
// deviation and the severity-adjusted z-score view, in one SQL statement, and the same figures by
// loading the totals into JavaScript (scoring/ranking.ts) to check it and to compare their speed.
// No "server-only": the benchmark runs it with a client of its own.
import { and, eq, sql } from "drizzle-orm";
import type { PgDatabase } from "drizzle-orm/pg-core";
import type { PostgresJsQueryResultHKT } from "drizzle-orm/postgres-js";
import type * as schema from "./schema";
import { entries, judgeSheets } from "./schema";
import { severityAdjusted, summariseEntries, type JudgeTotal } from "../scoring/ranking";

export type TotalsDb = PgDatabase<PostgresJsQueryResultHKT, typeof schema>;

export type EntryTotals = {
  entryId: string;
  categoryId: string;
  count: number;
  mean: number | null;
  median: number | null;
  spread: number | null;
  sampleSd: number | null;
  /** Mean of the entry's z-scores, each judge standardised within the category (population SD). */
  z: number | null;
};

/**
 * Every judged entry's totals in one SQL statement: submitted sheets only. z-scores use each
 * judge's mean and population SD within the category; a judge with SD 0 contributes 0.
 */
export async function totalsInSql(db: TotalsDb, showId: string): Promise<EntryTotals[]> {
  const rows = await db.execute<{ entry_id: string; category_id: string; n: number; mean: string | null; median: string | null; spread: string | null; sd: string | null; z: string | null }>(sql`
    with t as (
      select s.entry_id, e.category_id, s.judge_user_id, (s.total ->> 'total')::double precision as x
      from ${judgeSheets} s join ${entries} e on e.id = s.entry_id
      where s.show_id = ${showId} and s.status = 'submitted' and s.total ->> 'total' is not null
    ), z as (
      select t.*,
        case when stddev_pop(x) over w = 0 then 0 else (x - avg(x) over w) / stddev_pop(x) over w end as z
      from t window w as (partition by category_id, judge_user_id)
    )
    select entry_id, category_id, count(*)::int as n, avg(x) as mean,
      percentile_cont(0.5) within group (order by x) as median,
      max(x) - min(x) as spread, stddev_samp(x) as sd, avg(z) as z
    from z group by entry_id, category_id`);
  const num = (v: string | number | null) => (v === null ? null : Number(v));
  return [...rows].map((r) => ({ entryId: r.entry_id, categoryId: r.category_id, count: r.n, mean: num(r.mean), median: num(r.median), spread: num(r.spread), sampleSd: num(r.sd), z: num(r.z) }));
}

/** The same figures, loading every submitted total into JavaScript and using scoring/ranking.ts. */
export async function totalsInJs(db: TotalsDb, showId: string): Promise<EntryTotals[]> {
  const rows = await db
    .select({ entryId: judgeSheets.entryId, judgeId: judgeSheets.judgeUserId, total: sql<number | null>`(${judgeSheets.total} ->> 'total')::double precision`, categoryId: entries.categoryId })
    .from(judgeSheets)
    .innerJoin(entries, eq(entries.id, judgeSheets.entryId))
    .where(and(eq(judgeSheets.showId, showId), eq(judgeSheets.status, "submitted")));
  const byCategory = new Map<string, JudgeTotal[]>();
  for (const r of rows) {
    if (r.total === null || !r.categoryId) continue;
    byCategory.set(r.categoryId, [...(byCategory.get(r.categoryId) ?? []), { entryId: r.entryId, judgeId: r.judgeId, total: r.total }]);
  }
  return [...byCategory].flatMap(([categoryId, totals]) => categoryTotals(categoryId, totals));
}

/** One category's entry totals from its judges' sheet totals (the same figures as the SQL). */
export function categoryTotals(categoryId: string, totals: readonly JudgeTotal[]): EntryTotals[] {
  const z = new Map(severityAdjusted(totals).entries.map((e) => [e.entryId, e.z]));
  return summariseEntries(totals).map((s) => ({ entryId: s.entryId, categoryId, count: s.count, mean: s.mean, median: s.median, spread: s.spread, sampleSd: s.sampleSd, z: z.get(s.entryId) ?? null }));
}

