// `npm run bench`: builds and serves the app on the test ports with the demo show, then runs
// each benchmark and prints its figures. Nothing here passes or fails: it measures.
import path from "node:path";
import type { ChildProcess } from "node:child_process";
import { migrateDatabase } from "../../db/migrate";
import { DEMO_PASSWORD } from "../../db/seed/demo-data";
import { must, NEXT, profileEnv, recreateDatabase, ROOT, say, serve, startAll, waitForHealth } from "../lib/app";
import { apiVsBare } from "./api-vs-bare";
import { benchCategories } from "./categories";
import { benchJudgingSync } from "./judging-sync";
import { benchResults } from "./results";
import { benchPhotos } from "./photos";

async function main() {
  // Pure computations first, while the machine is quiet.
  await benchCategories();
  await benchPhotos();
  const env = profileEnv("bench");
  const durationSec = Number(process.env.BENCH_SECONDS ?? 10);
  say("bench: fresh database, fakes, build, demo show");
  await recreateDatabase(env.DATABASE_URL!);
  await migrateDatabase(env.DATABASE_URL!);
  const services = await startAll("bench", env);
  let app: ChildProcess | undefined;
  try {
    if (process.env.BENCH_SKIP_BUILD !== "1") {
      await must("next build", process.execPath, [NEXT, "build"], env);
      await must("serwist build", process.execPath, [path.join(ROOT, "node_modules/@serwist/cli/cli.js"), "build", "serwist.config.mjs"], env);
    }
    await must("seeding", "npx", ["tsx", path.join(ROOT, "scripts/seed.ts")], env);
    app = serve({ ...env, AUTH_SIGN_IN_LIMIT_PER_MINUTE: "1000" }, env.PORT!, "127.0.0.1");
    await waitForHealth(env.APP_URL!, 90_000);
    const floor = await apiVsBare({ appUrl: env.APP_URL!, databaseUrl: env.DATABASE_URL!, email: "entrant1@ribbonry.test", password: DEMO_PASSWORD, durationSec });
    await benchJudgingSync({ appUrl: env.APP_URL!, databaseUrl: env.DATABASE_URL!, floor });
    await benchResults(env.DATABASE_URL!);
  } finally {
    app?.kill("SIGTERM");
    await services.stop();
  }
}

main().then(
  () => process.exit(0),
  (err) => {
    console.error("[ribbonry bench]", err);
    process.exit(1);
  },
);
