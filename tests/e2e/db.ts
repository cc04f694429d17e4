// Direct database set-up for browser journeys that need a show of their own (so the demo show
// stays as seeded for the other journeys): the test profile's database, plain SQL, no app code.
import { randomUUID } from "node:crypto";
import postgres from "postgres";
import { envFor } from "../../scripts/ports";

const UM_PER_INCH = 25_400; // 1 in = 25.4 mm exactly (NIST SP 811, App. B)

export type ScratchEntry = { entryNumber: number; title: string; widthIn: number; lengthIn: number; techniques?: string[] };
export type ScratchShow = { id: string; slug: string; name: string; remove: () => Promise<void> };

function connect() {
  return postgres(process.env.DATABASE_URL ?? envFor("test").DATABASE_URL!, { max: 1, onnotice: () => {} });
}

/**
 * A show with entries closed, `chairEmail` (already seeded) as its chair and also as the entrant
 * of every entry, and the given entries submitted with no category decided yet.
 */
export async function makeScratchShow(prefix: string, chairEmail: string, quilts: ScratchEntry[]): Promise<ScratchShow> {
  const sql = connect();
  try {
    const slug = `${prefix}-${randomUUID().slice(0, 8)}`;
    const name = `Scratch show ${slug}`;
    const [chair] = await sql<{ id: string }[]>`select id from "user" where email = ${chairEmail}`;
    if (!chair) throw new Error(`${chairEmail} is not seeded; start the app once so it seeds the demo`);
    const [show] = await sql<{ id: string }[]>`
      insert into shows (slug, name, guild_name, venue_name, time_zone, status)
      values (${slug}, ${name}, 'Scratch Guild', 'Scratch Hall', 'America/Chicago', 'entries_closed')
      returning id`;
    await sql`insert into show_roles (show_id, user_id, role) values (${show!.id}, ${chair.id}, 'chair')`;
    for (const q of quilts) {
      await sql`
        insert into entries (show_id, entrant_user_id, entry_number, title, width_um, length_um, techniques, made_by, quilting_method, status, submitted_at)
        values (${show!.id}, ${chair.id}, ${q.entryNumber}, ${q.title}, ${Math.round(q.widthIn * UM_PER_INCH)}, ${Math.round(q.lengthIn * UM_PER_INCH)},
                ${sql.array(q.techniques ?? ["pieced"])}, ${sql.array(["Scratch Maker"])}, 'home_machine', 'submitted', now())`;
    }
    return { id: show!.id, slug, name, remove: () => removeShow(show!.id) };
  } finally {
    await sql.end();
  }
}

/** Deletes a scratch show; its roles, entries and categories go with it (ON DELETE CASCADE). */
export async function removeShow(showId: string) {
  const sql = connect();
  try {
    await sql`delete from shows where id = ${showId}`;
  } finally {
    await sql.end();
  }
}

/** The id of a sent entry that belongs to someone other than `email` (a demo entrant's). */
export async function someoneElsesEntryId(email: string): Promise<string> {
  const sql = connect();
  try {
    const [row] = await sql<{ id: string }[]>`
      select e.id from entries e join "user" u on u.id = e.entrant_user_id
      where u.email <> ${email} and e.status <> 'draft' order by e.created_at limit 1`;
    if (!row) throw new Error("no other entrant's entry is seeded; start the app once so it seeds the demo");
    return row.id;
  } finally {
    await sql.end();
  }
}
