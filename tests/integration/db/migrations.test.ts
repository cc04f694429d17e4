// The committed migrations build the whole schema on an empty database, and the audit log
// refuses to be rewritten.
import { cp, mkdtemp, readFile, rm, writeFile } from "node:fs/promises";
import os from "node:os";
import path from "node:path";
import postgres from "postgres";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { migrateDatabase } from "@/db/migrate";
import { env } from "@/lib/env";

const name = `ribbonry_migrate_${process.pid}_${Date.now()}`;
const adminUrl = Object.assign(new URL(env.DATABASE_URL), { pathname: "/postgres" }).toString();
const freshUrl = Object.assign(new URL(env.DATABASE_URL), { pathname: `/${name}` }).toString();
let admin: postgres.Sql;
let fresh: postgres.Sql;

beforeAll(async () => {
  admin = postgres(adminUrl, { max: 1, onnotice: () => {} });
  await admin.unsafe(`create database "${name}"`);
  fresh = postgres(freshUrl, { max: 1, onnotice: () => {} });
});

afterAll(async () => {
  await fresh?.end();
  await admin.unsafe(`drop database if exists "${name}" with (force)`);
  await admin.end();
});

describe("migrations", () => {
  it("apply to an empty database, and again without change", async () => {
    await migrateDatabase(freshUrl);
    await migrateDatabase(freshUrl);
    const tables = await fresh<{ table_name: string }[]>`
      select table_name from information_schema.tables where table_schema = 'public' order by table_name`;
    expect(tables.map((t) => t.table_name)).toEqual(
      expect.arrayContaining([
        "user", "session", "account", "verification", "rate_limit",
        "shows", "show_roles", "show_invitations", "entrant_profiles", "entries", "entry_photos",
        "payment_events", "audit_log",
      ]),
    );
    const applied = await fresh`select count(*)::int as n from drizzle.__drizzle_migrations`;
    expect(applied[0]!.n).toBeGreaterThanOrEqual(2);
  });

  it("keep one role per user, show and role", async () => {
    await fresh`insert into "user" (id, name, email) values ('u1', 'A', 'a@example.test')`;
    const [show] = await fresh`insert into shows (slug, name, guild_name, venue_name, time_zone) values ('s-one', 'S', 'G', 'V', 'UTC') returning id`;
    await fresh`insert into show_roles (show_id, user_id, role) values (${show!.id}, 'u1', 'judge')`;
    await expect(fresh`insert into show_roles (show_id, user_id, role) values (${show!.id}, 'u1', 'judge')`).rejects.toThrow(/duplicate key/);
    await fresh`insert into show_roles (show_id, user_id, role) values (${show!.id}, 'u1', 'scribe')`;
  });

  it("make the audit log append-only", async () => {
    await fresh`insert into audit_log (action, subject_type, subject_id) values ('test.made', 'thing', '1')`;
    await expect(fresh`update audit_log set action = 'rewritten'`).rejects.toThrow(/append-only/);
    await expect(fresh`delete from audit_log`).rejects.toThrow(/append-only/);
    await expect(fresh`truncate audit_log`).rejects.toThrow(/append-only/);
    const rows = await fresh`select action from audit_log`;
    expect(rows.map((r) => r.action)).toEqual(["test.made"]);
  });
});

describe("payment line kinds (0006)", () => {
  const lateName = `${name}_kinds`;
  const lateUrl = Object.assign(new URL(env.DATABASE_URL), { pathname: `/${lateName}` }).toString();
  let dir = "";
  afterAll(async () => {
    await admin.unsafe(`drop database if exists "${lateName}" with (force)`);
    if (dir) await rm(dir, { recursive: true, force: true });
  });

  it("fills each existing line's kind from the start of its description", async () => {
    // The migrations as they were before 0006: the same folder with the journal cut short.
    dir = await mkdtemp(path.join(os.tmpdir(), "ribbonry-migrations-"));
    await cp(path.join(process.cwd(), "db/migrations"), dir, { recursive: true });
    const journalPath = path.join(dir, "meta/_journal.json");
    const journal = JSON.parse(await readFile(journalPath, "utf8")) as { entries: { tag: string }[] };
    const cut = journal.entries.findIndex((e) => e.tag.startsWith("0006_"));
    await writeFile(journalPath, JSON.stringify({ ...journal, entries: journal.entries.slice(0, cut) }));
    await admin.unsafe(`create database "${lateName}"`);
    await migrateDatabase(lateUrl, dir);

    const db0 = postgres(lateUrl, { max: 1, onnotice: () => {} });
    try {
      await db0`insert into "user" (id, name, email) values ('u1', 'A', 'a@example.test')`;
      const [show] = await db0`insert into shows (slug, name, guild_name, venue_name, time_zone) values ('s-kinds', 'S', 'G', 'V', 'UTC') returning id`;
      const [entry] = await db0`insert into entries (show_id, entrant_user_id, title, width_um, length_um, quilting_method) values (${show!.id}, 'u1', 'Q', 1, 1, 'hand') returning id`;
      const [pay] = await db0`insert into payments (show_id, entrant_user_id, amount_cents, currency, status) values (${show!.id}, 'u1', 4000, 'usd', 'paid') returning id`;
      for (const d of ["Entry fee — entry 101: Q", "Late fee — entry 101: Q", "Critique fee — entry 101: Q"]) {
        await db0`insert into payment_items (payment_id, entry_id, amount_cents, description) values (${pay!.id}, ${entry!.id}, 1000, ${d})`;
      }
      await migrateDatabase(lateUrl);
      const rows = await db0<{ description: string; kind: string }[]>`select description, kind from payment_items order by description`;
      expect(rows.map((r) => [r.description.split(" — ")[0], r.kind])).toEqual([["Critique fee", "critique"], ["Entry fee", "entry"], ["Late fee", "late"]]);
      await expect(db0`insert into payment_items (payment_id, entry_id, amount_cents, description) values (${pay!.id}, ${entry!.id}, 1, 'x')`).rejects.toThrow(/null value/);
    } finally {
      await db0.end();
    }
  });
});
