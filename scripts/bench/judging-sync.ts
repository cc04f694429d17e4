// 40 simulated tablets, each a judge on a panel of their own, each sending 200 score changes to
// the sync route one change per request (the worst case: a tablet that syncs every tap), all at
// once. Prints throughput, p50/p95, errors (must be 0) and lost writes (changes stored in the
// database against changes sent), beside the bare-stack floor measured by api-vs-bare.
import { randomUUID } from "node:crypto";
import { hashPassword } from "better-auth/crypto";
import postgres from "postgres";
import { quantileSorted } from "simple-statistics";
import { DEMO_SHEET } from "../../db/seed/demo-judging";
import type { StackFloor } from "./api-vs-bare";

const TABLETS = 40;
const CHANGES_PER_TABLET = 200;
const ENTRIES_PER_PANEL = 5;
const PASSWORD = "bench-judge-password";

type Tablet = { judgeId: string; email: string; cookie: string; entryIds: string[] };

async function setUp(sql: postgres.Sql): Promise<{ slug: string; showId: string; tablets: Omit<Tablet, "cookie">[] }> {
  const slug = `bench-judging-${randomUUID().slice(0, 8)}`;
  const [show] = await sql`insert into shows (slug, name, guild_name, venue_name, time_zone, status) values (${slug}, 'Bench judging show', 'Bench guild', 'Bench hall', 'America/Chicago', 'judging') returning id`;
  const showId = show!.id as string;
  await sql`insert into score_sheets (show_id, name, sheet, is_default) values (${showId}, ${DEMO_SHEET.name}, ${sql.json(DEMO_SHEET.sheet as never)}, true)`;
  const entrantId = randomUUID();
  await sql`insert into "user" (id, name, email, email_verified) values (${entrantId}, 'Bench Entrant', ${`${entrantId}@bench.test`}, true)`;
  const hash = await hashPassword(PASSWORD);
  const tablets: Omit<Tablet, "cookie">[] = [];
  let number = 1000;
  for (let t = 0; t < TABLETS; t++) {
    const judgeId = randomUUID();
    const email = `judge-${t}-${judgeId.slice(0, 6)}@bench.test`;
    await sql`insert into "user" (id, name, email, email_verified) values (${judgeId}, ${`Bench Judge ${t}`}, ${email}, true)`;
    await sql`insert into account (id, account_id, provider_id, user_id, password, updated_at) values (${randomUUID()}, ${judgeId}, 'credential', ${judgeId}, ${hash}, now())`;
    await sql`insert into show_roles (show_id, user_id, role) values (${showId}, ${judgeId}, 'judge')`;
    const [cat] = await sql`insert into categories (show_id, code, name, precedence, conditions) values (${showId}, ${`B${t}`}, ${`Bench ${t}`}, ${t}, ${sql.json([{ kind: "judged", value: true }] as never)}) returning id`;
    const [panel] = await sql`insert into judging_panels (show_id, name) values (${showId}, ${`Bench panel ${t}`}) returning id`;
    await sql`insert into panel_members (panel_id, user_id, role) values (${panel!.id}, ${judgeId}, 'judge')`;
    await sql`insert into panel_categories (panel_id, category_id) values (${panel!.id}, ${cat!.id})`;
    const entryIds: string[] = [];
    for (let e = 0; e < ENTRIES_PER_PANEL; e++) {
      const [row] = await sql`insert into entries (show_id, entrant_user_id, entry_number, title, width_um, length_um, quilting_method, status, category_id, category_state)
        values (${showId}, ${entrantId}, ${number++}, 'Bench quilt', 1524000, 2032000, 'home_machine', 'received', ${cat!.id}, 'decided') returning id`;
      entryIds.push(row!.id as string);
    }
    tablets.push({ judgeId, email, entryIds });
  }
  return { slug, showId, tablets };
}

async function signIn(appUrl: string, email: string): Promise<string> {
  const res = await fetch(`${appUrl}/api/auth/sign-in/email`, { method: "POST", headers: { "content-type": "application/json", origin: appUrl }, body: JSON.stringify({ email, password: PASSWORD }) });
  if (!res.ok) throw new Error(`bench sign-in failed for ${email}: ${res.status}`);
  return res.headers.getSetCookie().map((c) => c.split(";")[0]).join("; ");
}

const CRITERIA = DEMO_SHEET.sheet.sections.flatMap((s) => s.criteria).filter((c) => c.scale.kind === "points");

/** One tablet: 200 changes, one per request, each made on the version the last answer gave. */
async function runTablet(appUrl: string, slug: string, t: Tablet, times: number[]): Promise<{ sent: number; errors: number }> {
  const deviceId = `bench-${t.judgeId}`;
  const versions = new Map<string, number>();
  let errors = 0;
  for (let i = 0; i < CHANGES_PER_TABLET; i++) {
    const entryId = t.entryIds[i % t.entryIds.length]!;
    const criterion = CRITERIA[Math.floor(i / t.entryIds.length) % CRITERIA.length]!;
    const field = `mark:${criterion.id}`;
    const k = `${entryId}|${field}`;
    const body = {
      deviceId,
      forJudge: t.judgeId,
      changes: [{ kind: "set", key: `${deviceId}-${i}`, entryId, seq: i + 1, clientAt: new Date().toISOString(), field, value: { kind: "points", points: (i * 7) % (criterion.maxPoints + 1) }, baseVersion: versions.get(k) ?? 0 }],
    };
    const t0 = performance.now();
    try {
      const res = await fetch(`${appUrl}/api/shows/${slug}/judging/sync`, { method: "POST", headers: { cookie: t.cookie, "content-type": "application/json" }, body: JSON.stringify(body) });
      times.push(performance.now() - t0);
      if (res.status !== 200) {
        errors++;
        continue;
      }
      const answer = (await res.json()) as { results: { outcome: { kind: string; version?: number } }[] };
      const outcome = answer.results[0]?.outcome;
      if (outcome?.kind !== "applied") errors++;
      else versions.set(k, outcome.version ?? 0);
    } catch {
      times.push(performance.now() - t0);
      errors++;
    }
  }
  return { sent: CHANGES_PER_TABLET, errors };
}

export async function benchJudgingSync(opts: { appUrl: string; databaseUrl: string; floor?: StackFloor }): Promise<void> {
  const sql = postgres(opts.databaseUrl, { max: 4, onnotice: () => {} });
  try {
    const { slug, showId, tablets } = await setUp(sql);
    const signed: Tablet[] = [];
    for (const t of tablets) signed.push({ ...t, cookie: await signIn(opts.appUrl, t.email) });
    // Warm-up: one session fetch per tablet (what a tablet does at the start of a session).
    await Promise.all(signed.map((t) => fetch(`${opts.appUrl}/api/shows/${slug}/judging/session`, { headers: { cookie: t.cookie } }).then((r) => r.arrayBuffer())));

    const times: number[] = [];
    const t0 = performance.now();
    const results = await Promise.all(signed.map((t) => runTablet(opts.appUrl, slug, t, times)));
    const seconds = (performance.now() - t0) / 1000;
    const sent = results.reduce((a, r) => a + r.sent, 0);
    const errors = results.reduce((a, r) => a + r.errors, 0);
    const [{ stored }] = (await sql`select count(*)::int as stored from score_changes where show_id = ${showId}`) as unknown as [{ stored: number }];
    times.sort((a, b) => a - b);
    const perSec = sent / seconds;
    console.log(`\nJudging sync: ${TABLETS} tablets × ${CHANGES_PER_TABLET} changes, one change per request`);
    console.log(`  ${sent.toLocaleString("en-US")} changes in ${seconds.toFixed(1)} s: ${perSec.toFixed(0)} changes/s, p50 ${quantileSorted(times, 0.5).toFixed(1)} ms, p95 ${quantileSorted(times, 0.95).toFixed(1)} ms`);
    console.log(`  errors ${errors} (must be 0); stored ${stored.toLocaleString("en-US")} of ${sent.toLocaleString("en-US")} sent, lost writes ${sent - stored}`);
    if (opts.floor) {
      console.log(`  beside the bare-stack floor (bare node:http + postgres GET): ${opts.floor.bare.requestsPerSec.toFixed(0)} req/s, p95 ${opts.floor.bare.p95Ms.toFixed(1)} ms → sync at ${(perSec / opts.floor.bare.requestsPerSec).toFixed(2)}× the floor's throughput`);
    }
  } finally {
    await sql.end();
  }
}
