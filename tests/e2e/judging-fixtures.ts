// A scratch show in "judging" for the judging-tablet journeys, made with plain SQL on the test
// profile's database: one points category on the demo sheet, a panel with the seeded judge1@ and
// judge2@ and scribe1@, their show roles, and numbered entries whose category is decided. A fresh
// slug per run keeps it re-runnable (the audit log is append-only, so old shows stay).
import { randomUUID } from "node:crypto";
import postgres from "postgres";
import { DEMO_SHEET } from "../../db/seed/demo-judging";
import { envFor } from "../../scripts/ports";

const UM_PER_INCH = 25_400; // 1 in = 25.4 mm exactly (NIST SP 811, App. B)

export const JUDGE_EMAIL = "judge1@ribbonry.test";
export const JUDGE2_EMAIL = "judge2@ribbonry.test";
export const SCRIBE_EMAIL = "scribe1@ribbonry.test";

export type JudgingShow = { id: string; slug: string; name: string; entries: { id: string; entryNumber: number }[]; users: Record<string, { id: string; name: string }> };

export function judgingSql() {
  return postgres(process.env.DATABASE_URL ?? envFor("test").DATABASE_URL!, { max: 1, onnotice: () => {} });
}

export async function makeJudgingShow(prefix: string, count = 6): Promise<JudgingShow> {
  const sql = judgingSql();
  try {
    const emails = [JUDGE_EMAIL, JUDGE2_EMAIL, SCRIBE_EMAIL, "chair@ribbonry.test"];
    const people = await sql<{ id: string; name: string; email: string }[]>`select id, name, email from "user" where email in ${sql(emails)}`;
    const users = Object.fromEntries(people.map((p) => [p.email, { id: p.id, name: p.name }]));
    for (const e of emails) if (!users[e]) throw new Error(`${e} is not seeded; start the app once so it seeds the demo`);
    const slug = `${prefix}-${randomUUID().slice(0, 8)}`;
    const name = `Judging scratch ${slug}`;
    return await sql.begin(async (tx) => {
      const [show] = await tx<{ id: string }[]>`
        insert into shows (slug, name, guild_name, venue_name, time_zone, status)
        values (${slug}, ${name}, 'Scratch Guild', 'Scratch Hall', 'America/Chicago', 'judging') returning id`;
      const showId = show!.id;
      await tx`insert into show_settings (show_id, quick_phrases) values (${showId}, ${sql.array(["Points meet crisply.", "Binding is full and even."])})`;
      const [sheet] = await tx<{ id: string }[]>`insert into score_sheets (show_id, name, sheet, is_default) values (${showId}, ${DEMO_SHEET.name}, ${tx.json(DEMO_SHEET.sheet)}, true) returning id`;
      const [cat] = await tx<{ id: string }[]>`
        insert into categories (show_id, code, name, precedence, conditions, judging_method, score_sheet_id)
        values (${showId}, '10', 'Pieced, large', 1, ${tx.json([])}, 'points', ${sheet!.id}) returning id`;
      const [panel] = await tx<{ id: string }[]>`insert into judging_panels (show_id, name) values (${showId}, 'Panel T') returning id`;
      await tx`insert into panel_members ${tx([
        { panel_id: panel!.id, user_id: users[JUDGE_EMAIL]!.id, role: "judge" },
        { panel_id: panel!.id, user_id: users[JUDGE2_EMAIL]!.id, role: "judge" },
        { panel_id: panel!.id, user_id: users[SCRIBE_EMAIL]!.id, role: "scribe" },
      ])}`;
      await tx`insert into panel_categories (panel_id, category_id) values (${panel!.id}, ${cat!.id})`;
      await tx`insert into show_roles ${tx([
        { show_id: showId, user_id: users[JUDGE_EMAIL]!.id, role: "judge" },
        { show_id: showId, user_id: users[JUDGE2_EMAIL]!.id, role: "judge" },
        { show_id: showId, user_id: users[SCRIBE_EMAIL]!.id, role: "scribe" },
        { show_id: showId, user_id: users["chair@ribbonry.test"]!.id, role: "chair" },
      ])}`;
      const entries: { id: string; entryNumber: number }[] = [];
      for (let i = 1; i <= count; i++) {
        const [e] = await tx<{ id: string }[]>`
          insert into entries (show_id, entrant_user_id, entry_number, title, width_um, length_um, techniques, quilting_method, status, paid_at, category_id, category_state, judged)
          values (${showId}, ${users["chair@ribbonry.test"]!.id}, ${100 + i}, ${`Scratch quilt ${100 + i}`}, ${60 * UM_PER_INCH}, ${72 * UM_PER_INCH}, ${sql.array(["pieced"])}, 'home_machine', 'received', now(), ${cat!.id}, 'decided', true)
          returning id`;
        entries.push({ id: e!.id, entryNumber: 100 + i });
      }
      // Photos: rows pointing at images the demo seed stored (its rows keep only storage_key, so
      // that key serves every size; storage_key is unique, so the copy gets its own).
      const stored = await tx<{ view: string; webKey: string; thumbKey: string; widthPx: number; heightPx: number; bytes: number; contentType: string }[]>`
        select view, coalesce(web_key, storage_key) as "webKey", coalesce(thumb_key, storage_key) as "thumbKey", width_px as "widthPx", height_px as "heightPx", bytes, content_type as "contentType"
        from entry_photos where storage_key like 'shows/%' order by created_at, id limit ${count * 2}`;
      for (const [i, p] of stored.entries()) {
        const entry = entries[Math.floor(i / 2)];
        if (!entry) break;
        await tx`insert into entry_photos (entry_id, view, storage_key, web_key, thumb_key, width_px, height_px, bytes, content_type)
          values (${entry.id}, ${i % 2 ? "detail" : "full"}, ${`judging-e2e-copy/${randomUUID()}`}, ${p.webKey}, ${p.thumbKey}, ${p.widthPx}, ${p.heightPx}, ${p.bytes}, ${p.contentType})`;
      }
      return { id: showId, slug, name, entries, users };
    });
  } finally {
    await sql.end();
  }
}

/** The marks stored on the server for one judge's sheets of a show, by entry number. */
export async function storedSheets(showId: string, judgeId: string) {
  const sql = judgingSql();
  try {
    const rows = await sql<{ entryNumber: number; status: string; state: { fields: Record<string, { value: unknown }> } }[]>`
      select e.entry_number as "entryNumber", s.status, s.state from judge_sheets s join entries e on e.id = s.entry_id
      where s.show_id = ${showId} and s.judge_user_id = ${judgeId} order by e.entry_number`;
    return new Map(rows.map((r) => [r.entryNumber, { status: r.status, values: Object.fromEntries(Object.entries(r.state.fields).map(([k, f]) => [k, f.value])) }]));
  } finally {
    await sql.end();
  }
}

/** Who entered each change on a show's sheets and for whom, with both names (as sheetHistory shows it). */
export async function changeAuthors(showId: string) {
  const sql = judgingSql();
  try {
    return await sql<{ enteredBy: string; forJudge: string; field: string | null }[]>`
      select eb.name as "enteredBy", fj.name as "forJudge", c.field from score_changes c
      join "user" eb on eb.id = c.entered_by join "user" fj on fj.id = c.for_judge
      where c.show_id = ${showId} order by c.id`;
  } finally {
    await sql.end();
  }
}
