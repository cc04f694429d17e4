// Totals for 5,000 entries × 3 judges × 8 criteria: one SQL statement against loading every
// submitted sheet total into JavaScript (db/totals.ts), with the ratio. Prints figures only.
import { randomUUID } from "node:crypto";
import { drizzle } from "drizzle-orm/postgres-js";
import postgres from "postgres";
import * as schema from "../../db/schema";
import { createWriteStream } from "node:fs";
import { rm } from "node:fs/promises";
import os from "node:os";
import path from "node:path";
import { totalsInJs, totalsInSql } from "../../db/totals";
import { matrixRows, sheetsOf, writeScoreMatrix } from "../../exports/score-matrix";

const ENTRIES = 5_000;
const JUDGES = 3;
const CRITERIA = 8;
const CATEGORIES = 25;
const RUNS = 5;

export async function benchResults(databaseUrl: string): Promise<void> {
  const client = postgres(databaseUrl, { max: 4, onnotice: () => {} });
  const db = drizzle(client, { schema, casing: "snake_case" });
  try {
    const [show] = await client`insert into shows (slug, name, guild_name, venue_name, time_zone, status) values (${`bench-results-${randomUUID().slice(0, 8)}`}, 'Bench results show', 'Bench guild', 'Bench hall', 'America/Chicago', 'judging') returning id`;
    const showId = show!.id as string;
    const entrant = randomUUID();
    await client`insert into "user" (id, name, email, email_verified) values (${entrant}, 'Bench Entrant', ${`${entrant}@bench.test`}, true)`;
    const judges = Array.from({ length: JUDGES }, () => randomUUID());
    for (const j of judges) await client`insert into "user" (id, name, email, email_verified) values (${j}, 'Bench Judge', ${`${j}@bench.test`}, true)`;
    const sheet = { sections: [{ id: "all", title: "All", criteria: Array.from({ length: CRITERIA }, (_, i) => ({ id: `c${i + 1}`, label: `Criterion ${i + 1}`, maxPoints: 12.5, scale: { kind: "points", step: 0.5 }, allowNotApplicable: false })) }] };
    const [sheetRow] = await client`insert into score_sheets (show_id, name, sheet, is_default) values (${showId}, 'Bench sheet', ${JSON.stringify(sheet)}::jsonb, true) returning id`; // drizzle() takes over the client's json serializer
    await client`insert into categories (show_id, code, name, precedence, conditions)
      select ${showId}, 'R' || g, 'Bench ' || g, g, '[]'::jsonb from generate_series(1, ${CATEGORIES}::int) g`;
    await client`insert into entries (show_id, entrant_user_id, entry_number, title, width_um, length_um, quilting_method, status, category_id, category_state)
      select ${showId}, ${entrant}, 100 + g, 'Bench quilt', 1524000, 2032000, 'home_machine', 'received',
        (select id from categories where show_id = ${showId} and code = 'R' || (1 + g % ${CATEGORIES}::int)), 'decided'
      from generate_series(1, ${ENTRIES}::int) g`;
    // Each sheet holds eight marks (0–12.5 points each) in its merged state and their total.
    await client`
      insert into judge_sheets (show_id, entry_id, judge_user_id, score_sheet_id, status, version, state, total)
      select ${showId}::uuid, e.id, j.id, ${sheetRow!.id}::uuid, 'submitted', ${CRITERIA + 1}::int,
        jsonb_build_object('status', 'submitted', 'version', ${CRITERIA + 1}::int, 'conflicts', '[]'::jsonb,
          'fields', (select jsonb_object_agg('mark:c' || c, jsonb_build_object('value', jsonb_build_object('kind', 'points', 'points', m.p), 'version', 1, 'deviceId', 'bench', 'seq', c, 'changeKey', 'k'))
                     from (select c, ((hashtext(e.id::text || j.id || c) & 1023) % 26) / 2.0 as p from generate_series(1, ${CRITERIA}::int) c) m)),
        jsonb_build_object('total', ((hashtext(e.id::text || j.id) & 1023) % 5001) / 100.0 + 50, 'complete', true)
      from entries e cross join (select unnest(${judges}::text[]) as id) j
      where e.show_id = ${showId}::uuid`;
    await client`analyze judge_sheets`;

    const time = async (f: () => Promise<unknown>) => {
      await f(); // warm-up
      const ms: number[] = [];
      for (let i = 0; i < RUNS; i++) {
        const t0 = performance.now();
        await f();
        ms.push(performance.now() - t0);
      }
      return ms.sort((a, b) => a - b)[Math.floor(RUNS / 2)]!;
    };
    const inSql = await time(() => totalsInSql(db, showId));
    const inJs = await time(() => totalsInJs(db, showId));
    const rows = (await totalsInSql(db, showId)).length;
    console.log(`\nResults: totals for ${ENTRIES.toLocaleString("en-US")} entries × ${JUDGES} judges × ${CRITERIA} criteria (${rows.toLocaleString("en-US")} entries totalled), median of ${RUNS}`);
    console.log(`  in SQL (one statement, z-scores by window functions): ${inSql.toFixed(1)} ms`);
    console.log(`  in JavaScript (load ${(ENTRIES * JUDGES).toLocaleString("en-US")} totals, scoring/ranking.ts): ${inJs.toFixed(1)} ms`);
    console.log(`  ratio (JavaScript / SQL): ${(inJs / inSql).toFixed(2)}×`);

    // The score-matrix export, streamed to a file, with the process's peak memory sampled.
    const file = path.join(os.tmpdir(), `ribbonry-bench-matrix-${process.pid}.xlsx`);
    const before = process.memoryUsage();
    let peakRss = before.rss;
    let peakHeap = before.heapUsed;
    const sampler = setInterval(() => {
      const m = process.memoryUsage();
      peakRss = Math.max(peakRss, m.rss);
      peakHeap = Math.max(peakHeap, m.heapUsed);
    }, 20);
    const t0 = performance.now();
    const out = createWriteStream(file);
    const written = await writeScoreMatrix(matrixRows(db, showId), await sheetsOf(db, showId), out);
    await new Promise<void>((r) => out.on("close", () => r()));
    const exportMs = performance.now() - t0;
    clearInterval(sampler);
    const mb = (n: number) => (n / 1024 / 1024).toFixed(0);
    console.log(`  score-matrix export (${written.toLocaleString("en-US")} rows × ${CRITERIA} criteria, streamed): ${(exportMs / 1000).toFixed(1)} s, peak RSS ${mb(peakRss)} MB (+${mb(peakRss - before.rss)} MB), peak heap ${mb(peakHeap)} MB (+${mb(peakHeap - before.heapUsed)} MB)`);
    await rm(file, { force: true });
  } finally {
    await client.end();
  }
}
