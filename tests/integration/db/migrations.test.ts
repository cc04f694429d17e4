// The committed migrations build the whole schema on an empty database, and the audit log
// refuses to be rewritten.
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
