// A scratch show for the chair's judging set-up journey, written straight to the test profile's
// database (so the demo show stays as seeded): the demo chair as its chair, two judges and a
// scribe of its own, two categories, the demo's score sheet, and a quilt entered by one judge in
// one category, so putting that judge on it is refused.
import { randomUUID } from "node:crypto";
import postgres from "postgres";
import { envFor } from "../../scripts/ports";
import { DEMO_SHEET } from "../../db/seed/demo-judging";

const UM_PER_INCH = 25_400; // 1 in = 25.4 mm exactly (NIST SP 811, App. B)

export type ConflictShow = {
  slug: string;
  sheetName: string;
  judges: { clear: string; entered: string };
  scribe: string;
  categories: { pieced: string; art: string };
  remove: () => Promise<void>;
};

const connect = () => postgres(process.env.DATABASE_URL ?? envFor("test").DATABASE_URL!, { max: 1, onnotice: () => {} });

export async function makeConflictShow(chairEmail: string): Promise<ConflictShow> {
  const sql = connect();
  const tag = randomUUID().slice(0, 8);
  const slug = `judging-setup-${tag}`;
  const people = [
    { id: randomUUID(), name: `Judge Linnea Harrow ${tag}`, email: `judge-a-${tag}@example.test`, role: "judge" },
    { id: randomUUID(), name: `Judge Tobias Greave ${tag}`, email: `judge-b-${tag}@example.test`, role: "judge" },
    { id: randomUUID(), name: `Scribe Mabel Orrin ${tag}`, email: `scribe-${tag}@example.test`, role: "scribe" },
  ] as const;
  try {
    const [chair] = await sql<{ id: string }[]>`select id from "user" where email = ${chairEmail}`;
    if (!chair) throw new Error(`${chairEmail} is not seeded; start the app once so it seeds the demo`);
    const [show] = await sql<{ id: string }[]>`
      insert into shows (slug, name, guild_name, venue_name, time_zone, status)
      values (${slug}, ${`Judging set-up show ${tag}`}, 'Scratch Guild', 'Scratch Hall', 'America/Chicago', 'entries_closed')
      returning id`;
    const showId = show!.id;
    await sql`insert into show_roles (show_id, user_id, role) values (${showId}, ${chair.id}, 'chair')`;
    for (const p of people) {
      await sql`insert into "user" (id, name, email, email_verified) values (${p.id}, ${p.name}, ${p.email}, true)`;
      await sql`insert into show_roles (show_id, user_id, role) values (${showId}, ${p.id}, ${p.role})`;
    }
    const judged = sql.json([{ kind: "judged", value: true }]);
    const [pieced] = await sql<{ id: string }[]>`insert into categories (show_id, code, name, precedence, conditions) values (${showId}, '10', 'Pieced', 10, ${judged}) returning id`;
    const [art] = await sql<{ id: string }[]>`insert into categories (show_id, code, name, precedence, conditions) values (${showId}, '20', 'Art quilts', 20, ${judged}) returning id`;
    await sql`insert into score_sheets (show_id, name, sheet, is_default) values (${showId}, ${DEMO_SHEET.name}, ${sql.json(DEMO_SHEET.sheet as never)}, true)`;
    // Judge Tobias Greave entered a quilt in Art quilts; the chair entered one in Pieced.
    const entry = (entrant: string, number: number, title: string, categoryId: string) => sql`
      insert into entries (show_id, entrant_user_id, entry_number, title, width_um, length_um, techniques, made_by, quilting_method, status, submitted_at, paid_at, category_id, category_state)
      values (${showId}, ${entrant}, ${number}, ${title}, ${40 * UM_PER_INCH}, ${50 * UM_PER_INCH}, ${sql.array(["pieced"])}, ${sql.array(["Scratch Maker"])}, 'home_machine', 'received', now(), now(), ${categoryId}, 'decided')`;
    await entry(people[1].id, 1, "Heron at Dusk", art!.id);
    await entry(chair.id, 2, "Nine-Patch Morning", pieced!.id);
    return {
      slug,
      sheetName: DEMO_SHEET.name,
      judges: { clear: people[0].name, entered: people[1].name },
      scribe: people[2].name,
      categories: { pieced: "10 Pieced", art: "20 Art quilts" },
      remove: async () => {
        const s = connect();
        try {
          await s`delete from shows where id = ${showId}`;
          await s`delete from "user" where id in ${s(people.map((p) => p.id))}`;
        } finally {
          await s.end();
        }
      },
    };
  } finally {
    await sql.end();
  }
}
