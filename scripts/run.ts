// The process supervisor behind `npm start` and `npm test` (PostgreSQL is already up, started by
// scripts/setup.sh). start: migrate, fakes, seed, build, serve until Ctrl-C. test: a fresh test
// database, fakes, vitest, build, seed, serve, Playwright, one summary line, stop everything.
import { spawn, type ChildProcess } from "node:child_process";
import { existsSync, readFileSync } from "node:fs";
import fs from "node:fs/promises";
import path from "node:path";
import { migrateDatabase } from "../db/migrate";
import { DEMO_ACCOUNTS, DEMO_PASSWORD } from "../db/seed/demo-data";
import { isLoopbackHost, notLocalReasons } from "../lib/local-setup";
import type { Services } from "./services";
import { ensureDatabase, listenHost, must, NEXT, nextServerArgs, profileEnv, recreateDatabase, ROOT, run, say, serve, startAll, waitForHealth, type Env } from "./lib/app";

// The offline worker (app/sw.ts) is built from the finished Next build (serwist.config.mjs).
const SERWIST = path.join(ROOT, "node_modules/@serwist/cli/cli.js");

function banner(env: Env, services: Services, host: string, seeded: boolean) {
  const reach = isLoopbackHost(host) ? "from this machine only" : `on ${host} (RIBBONRY_HOST): other machines can reach it`;
  const lines = [
    "",
    `Ribbonry is running at ${env.APP_URL}, ${reach}`,
    `  caught mail:     ${env.MAIL_WEB_URL}`,
    `  photo store:     ${env.S3_ENDPOINT} (s3rver)`,
    `  payments fake:   ${services.urls.payments ?? `http://127.0.0.1:${env.STRIPE_API_PORT}`}`,
    "",
    ...(seeded
      ? [
          `Demo accounts (password for all: ${DEMO_PASSWORD})`,
          ...DEMO_ACCOUNTS.filter((a) => a.role !== "entrant" || a.email === "entrant1@ribbonry.test").map(
            (a) => `  ${a.role.padEnd(8)} ${a.email.padEnd(26)} ${a.name}`,
          ),
          "  entrant  entrant2@ribbonry.test … entrant40@ribbonry.test",
          "",
        ]
      : []),
    "Press Ctrl-C to stop.",
  ];
  console.log(lines.join("\n"));
}

/** An address that reaches a server listening on `host` (a wildcard is reached on loopback). */
function probeHost(host: string): string {
  if (host === "0.0.0.0" || host === "::") return "127.0.0.1";
  return host.includes(":") ? `[${host}]` : host;
}

async function start(dev: boolean) {
  const env = profileEnv("start");
  if (dev) env.NODE_ENV = "development";
  const host = listenHost(process.env);
  await ensureDatabase(env.DATABASE_URL!);
  await migrateDatabase(env.DATABASE_URL!);
  say("migrations applied");
  const services = await startAll("start", env);
  let app: ChildProcess | undefined;
  const stop = async () => {
    app?.kill("SIGTERM");
    await services.stop();
    process.exit(0);
  };
  process.on("SIGINT", stop);
  process.on("SIGTERM", stop);
  // The demo accounts share a published password: only ever into the local set-up.
  const notLocal = notLocalReasons(env);
  if (notLocal.length) say(`not seeding the demo accounts: this is not the local set-up (${notLocal.join("; ")})`);
  else await must("seeding the demo show", "npx", ["tsx", "scripts/seed.ts"], env);
  if (dev) {
    app = spawn(process.execPath, nextServerArgs("dev", env.PORT!, host), { cwd: ROOT, env: { ...process.env, ...env }, stdio: "inherit" });
  } else {
    await must("next build", process.execPath, [NEXT, "build"], env);
    await must("serwist build", process.execPath, [SERWIST, "build", "serwist.config.mjs"], env);
    app = serve(env, env.PORT!, host);
  }
  await waitForHealth(`http://${probeHost(host)}:${env.PORT}`, 180_000);
  banner(env, services, host, notLocal.length === 0);
  app.on("exit", async (code) => {
    say(`the app stopped (exit ${code})`);
    await services.stop();
    process.exit(code ?? 1);
  });
}

type Counts = { passed: number; failed: number; skipped: number };

function vitestCounts(file: string): Counts {
  if (!existsSync(file)) return { passed: 0, failed: 1, skipped: 0 };
  const r = JSON.parse(readFileSync(file, "utf8")) as { numPassedTests: number; numFailedTests: number; numPendingTests: number; numTodoTests: number };
  return { passed: r.numPassedTests, failed: r.numFailedTests, skipped: r.numPendingTests + r.numTodoTests };
}

function playwrightCounts(file: string): Counts {
  if (!existsSync(file)) return { passed: 0, failed: 1, skipped: 0 };
  const r = JSON.parse(readFileSync(file, "utf8")) as { stats: { expected: number; unexpected: number; flaky: number; skipped: number } };
  return { passed: r.stats.expected + r.stats.flaky, failed: r.stats.unexpected, skipped: r.stats.skipped };
}

async function test(args: string[]) {
  const env = profileEnv("test");
  const out = path.join(ROOT, ".data/test-results");
  await fs.rm(out, { recursive: true, force: true });
  await fs.mkdir(out, { recursive: true });
  const only = args.find((a) => a.startsWith("--only="))?.slice(7); // unit | integration | e2e
  const totals: Counts = { passed: 0, failed: 0, skipped: 0 };
  const add = (c: Counts) => ((totals.passed += c.passed), (totals.failed += c.failed), (totals.skipped += c.skipped));

  say("fresh test database");
  await recreateDatabase(env.DATABASE_URL!);
  await migrateDatabase(env.DATABASE_URL!);
  const services = await startAll("test", env);
  let app: ChildProcess | undefined;
  try {
    if (!only || only === "unit" || only === "integration") {
      const projects = only ? ["--project", only] : ["--project", "unit", "--project", "integration"];
      const json = path.join(out, "vitest.json");
      await run(process.execPath, [path.join(ROOT, "node_modules/vitest/vitest.mjs"), "run", ...projects], {
        ...env,
        NODE_ENV: "test",
        RIBBONRY_SERVICES_RUNNING: "1",
        VITEST_JSON: json,
      });
      add(vitestCounts(json));
    }
    if (!only || only === "e2e") {
      say("building the app for the browser tests");
      await must("next build", process.execPath, [NEXT, "build"], env);
      await must("serwist build", process.execPath, [SERWIST, "build", "serwist.config.mjs"], env);
      await must("seeding the demo show", "npx", ["tsx", "scripts/seed.ts"], env);
      // Browser tests sign in many times from one address; the limit itself is tested in vitest.
      app = serve({ ...env, AUTH_SIGN_IN_LIMIT_PER_MINUTE: "1000" }, env.PORT!, "127.0.0.1");
      await waitForHealth(env.APP_URL!, 90_000);
      const json = path.join(out, "playwright.json");
      // `--only=e2e tests/e2e/some.spec.ts` runs just those specs (any other arguments go to Playwright).
      const specs = only === "e2e" ? args.filter((a) => !a.startsWith("--only=")) : [];
      await run(process.execPath, [path.join(ROOT, "node_modules/@playwright/test/cli.js"), "test", ...specs], {
        ...env,
        PLAYWRIGHT_JSON_OUTPUT_NAME: json,
      });
      add(playwrightCounts(json));
    }
  } finally {
    app?.kill("SIGTERM");
    await services.stop();
  }
  console.log(`\ntests: ${totals.passed} passed, ${totals.failed} failed, ${totals.skipped} skipped`);
  process.exit(totals.failed > 0 || totals.passed === 0 ? 1 : 0);
}

const [mode, ...rest] = process.argv.slice(2);
const main = mode === "test" ? test(rest) : start(mode === "dev");
main.catch((err) => {
  console.error(`\x1b[1;31m[ribbonry]\x1b[0m ${(err as Error).message}`);
  process.exit(1);
});
