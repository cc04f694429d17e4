// A scratch show whose judging is done, for the results journey: the judging scratch show (two
// demo judges, one category, four entries with photos) handed to an entrant of its own who
// consents to their name being published (signing in with the demo password), and every judge's sheet submitted with marks and
// comments, so the chair can review and publish at once.
import { randomUUID } from "node:crypto";
import { DEMO_SHEET } from "../../db/seed/demo-judging";
import { sheetTotal, type Mark } from "../../scoring/score-sheets";
import { JUDGE2_EMAIL, JUDGE_EMAIL, judgingSql, makeJudgingShow, type JudgingShow } from "./judging-fixtures";

export type ResultsShow = JudgingShow & { entrant: { name: string; email: string } };

// Each judge's points per criterion for entries 101–104 (scaled from a base), so totals differ.
const BASE: Record<string, number> = { impact: 18, colour: 9, composition: 13, fabric: 9, piecing: 13, applique: 9, quilting: 13 };
const SCALE = { [JUDGE_EMAIL]: [1, 0.95, 0.85, 0.75], [JUDGE2_EMAIL]: [0.97, 0.96, 0.8, 0.7] } as const;

function marksFor(scale: number): Record<string, Mark> {
  const marks: Record<string, Mark> = Object.fromEntries(Object.entries(BASE).map(([id, p]) => [id, { kind: "points", points: Math.round(p * scale) } as Mark]));
  marks.edges = { kind: "word", level: "Good" };
  return marks;
}

function stateOf(marks: Record<string, Mark>, comment: string) {
  const field = (value: unknown) => ({ value, version: 1, deviceId: "fixture", seq: 1, changeKey: randomUUID() });
  const fields: Record<string, unknown> = Object.fromEntries(Object.entries(marks).map(([id, m]) => [`mark:${id}`, field(m)]));
  fields["comment:overall"] = field(comment);
  return { status: "submitted", version: Object.keys(fields).length + 1, fields, conflicts: [] };
}

export async function makeResultsShow(prefix: string): Promise<ResultsShow> {
  const show = await makeJudgingShow(prefix, 4);
  const sql = judgingSql();
  const tag = show.slug.slice(-8);
  const entrant = { id: randomUUID(), name: `Odile Marsh ${tag}`, email: `results-entrant-${tag}@example.test` };
  try {
    await sql.begin(async (tx) => {
      await tx`insert into "user" (id, name, email, email_verified) values (${entrant.id}, ${entrant.name}, ${entrant.email}, true)`;
      // The demo password, by copying the chair's stored hash, so the journey can sign in as this entrant.
      await tx`insert into account (id, account_id, provider_id, user_id, password, created_at, updated_at)
        select ${randomUUID()}, ${entrant.id}, 'credential', ${entrant.id}, a.password, now(), now()
        from account a join "user" u on u.id = a.user_id where u.email = 'chair@ribbonry.test' and a.provider_id = 'credential'`;
      await tx`insert into entrant_profiles (user_id, display_name, publish_name_consent) values (${entrant.id}, ${entrant.name}, true)`;
      await tx`update entries set entrant_user_id = ${entrant.id} where show_id = ${show.id}`;
      await tx`insert into show_settings (show_id) values (${show.id}) on conflict do nothing`;
      for (const email of [JUDGE_EMAIL, JUDGE2_EMAIL] as const) {
        for (const [i, e] of show.entries.entries()) {
          const marks = marksFor(SCALE[email][i]!);
          const total = sheetTotal(DEMO_SHEET.sheet, marks);
          const comment = `Comment from ${email.split("@")[0]} for entry ${e.entryNumber}: lovely movement in the quilting.`;
          await tx`insert into judge_sheets (show_id, entry_id, judge_user_id, score_sheet_id, status, version, state, total)
            values (${show.id}, ${e.id}, ${show.users[email]!.id}, (select id from score_sheets where show_id = ${show.id} and is_default), 'submitted', 1,
              ${tx.json(stateOf(marks, comment) as never)}, ${tx.json({ total: total.total, complete: true, percent: total.percent } as never)})`;
        }
      }
    });
  } finally {
    await sql.end();
  }
  return { ...show, entrant: { name: entrant.name, email: entrant.email } };
}
