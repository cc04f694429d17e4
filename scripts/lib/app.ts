// Pieces the supervisor (scripts/run.ts) and the benchmarks share: environments, child
// processes, databases, the fakes and the app server.
import { spawn, type ChildProcess } from "node:child_process";
import path from "node:path";
import postgres from "postgres";
import { notLocalReasons } from "../../lib/local-setup";
import { envFor, type Profile } from "../ports";
import { startServices, type Services } from "../services";

export const ROOT = path.resolve(__dirname, "../..");
export const NEXT = path.join(ROOT, "node_modules/next/dist/bin/next");
export const say = (msg: string) => console.log(`\x1b[1;35m[ribbonry]\x1b[0m ${msg}`);

export type Env = Record<string, string>;

// The generated secrets (.data/secrets.json) and s3rver's fixed keys belong to the local set-up.
const LOCAL_ONLY = ["BETTER_AUTH_SECRET", "STRIPE_WEBHOOK_SECRET", "STRIPE_SECRET_KEY", "S3_ACCESS_KEY_ID", "S3_SECRET_ACCESS_KEY"];

export function profileEnv(profile: Profile): Env {
  const base = envFor(profile);
  if (profile !== "start") {
    // Tests own their settings; only a test database may be pointed elsewhere.
    if (process.env.TEST_DATABASE_URL) base.DATABASE_URL = process.env.TEST_DATABASE_URL;
    return { ...base, NODE_ENV: "production", NEXT_TELEMETRY_DISABLED: "1" };
  }
  const fromProcess = Object.fromEntries(Object.keys(base).filter((k) => process.env[k]).map((k) => [k, process.env[k]!]));
  const env: Env = { ...base, ...fromProcess, NODE_ENV: "production", NEXT_TELEMETRY_DISABLED: "1" };
  // Pointed at a real database or service, `npm start` uses the operator's own secrets only:
  // lib/env.ts then names each one that is missing.
  if (notLocalReasons(env).length) for (const k of LOCAL_ONLY) if (!fromProcess[k]) delete env[k];
  return env;
}

/** Where `next start` / `next dev` listen: loopback unless RIBBONRY_HOST names another address. */
export const LOOPBACK = "127.0.0.1";

export function listenHost(vars: Record<string, string | undefined>): string {
  return vars.RIBBONRY_HOST?.trim() || LOOPBACK;
}

/** The arguments after `node` for Next's server; always an explicit -H (Next's default is every interface). */
export function nextServerArgs(command: "start" | "dev", port: string, host: string = LOOPBACK): string[] {
  return [NEXT, command, "-p", port, "-H", host];
}

export function run(cmd: string, args: string[], env: Env, opts: { quiet?: boolean } = {}): Promise<number> {
  return new Promise((resolve) => {
    const child = spawn(cmd, args, { cwd: ROOT, env: { ...process.env, ...env }, stdio: opts.quiet ? "ignore" : "inherit" });
    child.on("exit", (code, signal) => resolve(code ?? (signal ? 1 : 0)));
  });
}

export async function must(what: string, cmd: string, args: string[], env: Env) {
  const code = await run(cmd, args, env);
  if (code !== 0) throw new Error(`${what} failed (exit ${code})`);
}

export function serve(env: Env, port: string, host: string = LOOPBACK): ChildProcess {
  return spawn(process.execPath, nextServerArgs("start", port, host), { cwd: ROOT, env: { ...process.env, ...env }, stdio: "inherit" });
}

export async function waitForHealth(url: string, timeoutMs = 60_000) {
  const until = Date.now() + timeoutMs;
  while (Date.now() < until) {
    try {
      const res = await fetch(`${url}/api/health`);
      if (res.ok) return;
    } catch {
      // not listening yet
    }
    await new Promise((r) => setTimeout(r, 300));
  }
  throw new Error(`the app did not answer at ${url}/api/health within ${timeoutMs / 1000} s`);
}

export async function recreateDatabase(url: string) {
  const u = new URL(url);
  const name = u.pathname.slice(1);
  u.pathname = "/postgres";
  const admin = postgres(u.toString(), { max: 1, onnotice: () => {} });
  try {
    await admin.unsafe(`drop database if exists "${name}" with (force)`);
    await admin.unsafe(`create database "${name}"`);
  } finally {
    await admin.end();
  }
}

export async function ensureDatabase(url: string) {
  const u = new URL(url);
  const name = u.pathname.slice(1);
  u.pathname = "/postgres";
  const admin = postgres(u.toString(), { max: 1, onnotice: () => {} });
  try {
    const rows = await admin`select 1 from pg_database where datname = ${name}`;
    if (rows.length === 0) await admin.unsafe(`create database "${name}"`);
  } catch (err) {
    // A server we do not own may not let us list or create databases; migrate will tell.
    say(`could not check database "${name}": ${(err as Error).message}`);
  } finally {
    await admin.end();
  }
}

export async function startAll(profile: Profile, env: Env): Promise<Services> {
  return startServices({
    profile,
    dataDir: path.join(ROOT, ".data", profile),
    webhookUrl: `${env.APP_URL}/api/payments/webhook`,
    quiet: true,
  });
}

