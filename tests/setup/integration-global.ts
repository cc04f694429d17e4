// Before the integration tests: a migrated test database and the local fakes. When `npm test`
// has started them already (RIBBONRY_SERVICES_RUNNING=1) this only checks the database.
import path from "node:path";
import postgres from "postgres";
import { migrateDatabase } from "../../db/migrate";
import { envFor } from "../../scripts/ports";

export default async function setup() {
  const env = envFor("test");
  await ensureDatabase(env.DATABASE_URL!);
  await migrateDatabase(env.DATABASE_URL!);
  if (process.env.RIBBONRY_SERVICES_RUNNING === "1") return;
  const { startServices } = await import("../../scripts/services");
  const services = await startServices({
    profile: "test",
    dataDir: path.join(process.cwd(), ".data/test-vitest"),
    webhookUrl: `${env.APP_URL}/api/payments/webhook`,
    quiet: true,
  });
  return async () => services.stop();
}

async function ensureDatabase(url: string) {
  const u = new URL(url);
  const name = u.pathname.slice(1);
  u.pathname = "/postgres";
  const admin = postgres(u.toString(), { max: 1, onnotice: () => {} });
  try {
    const rows = await admin`select 1 from pg_database where datname = ${name}`;
    if (rows.length === 0) await admin.unsafe(`create database "${name}"`);
  } finally {
    await admin.end();
  }
}
