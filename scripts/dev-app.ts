// A development server of its own, for working on a screen while the test fakes run
// (`tsx scripts/services.ts test`): the test profile's database and fakes, this port, and a
// build directory of its own so several can run side by side. Migrates, and seeds the demo
// show when the database has none. Usage: tsx scripts/dev-app.ts 3301 [--fresh]
import { spawn } from "node:child_process";
import { migrateDatabase } from "../db/migrate";
import { LOOPBACK, must, nextServerArgs, profileEnv, recreateDatabase, ROOT, say, waitForHealth, type Env } from "./lib/app";

async function main() {
  const port = process.argv[2] ?? "3301";
  if (!/^\d{4,5}$/.test(port)) throw new Error("usage: tsx scripts/dev-app.ts <port> [--fresh]");
  const env: Env = { ...profileEnv("test"), NODE_ENV: "development", PORT: port, APP_URL: `http://127.0.0.1:${port}`, RIBBONRY_DIST_DIR: `.next-dev-${port}`, AUTH_SIGN_IN_LIMIT_PER_MINUTE: "1000" };
  if (process.argv.includes("--fresh")) await recreateDatabase(env.DATABASE_URL!);
  await migrateDatabase(env.DATABASE_URL!);
  await must("seeding the demo show", "npx", ["tsx", "scripts/seed.ts"], env);
  const app = spawn(process.execPath, nextServerArgs("dev", port, LOOPBACK), { cwd: ROOT, env: { ...process.env, ...env }, stdio: "inherit" });
  await waitForHealth(env.APP_URL!, 180_000);
  say(`dev app at ${env.APP_URL} (Ctrl-C stops it)`);
  const stop = () => app.kill("SIGTERM");
  process.on("SIGINT", stop);
  process.on("SIGTERM", stop);
  app.on("exit", (code) => process.exit(code ?? 0));
}

main().catch((err) => {
  console.error(err);
  process.exit(1);
});
