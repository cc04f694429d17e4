// Pieces the supervisor (scripts/run.ts) and the benchmarks share: environments, child
// processes, databases, the fakes and the app server.
import { spawn, type ChildProcess } from "node:child_process";
import path from "node:path";
import postgres from "postgres";
import { envFor, type Profile } from "../ports";
import { startServices, type Services } from "../services";

export const ROOT = path.resolve(__dirname, "../..");
export const NEXT = path.join(ROOT, "node_modules/next/dist/bin/next");
export const say = (msg: string) => console.log(`\x1b[1;35m[ribbonry]\x1b[0m ${msg}`);

export type Env = Record<string, string>;

export function profileEnv(profile: Profile): Env {
  const base = envFor(profile);
  if (profile !== "start") {
    // Tests own their settings; only a test database may be pointed elsewhere.
    if (process.env.TEST_DATABASE_URL) base.DATABASE_URL = process.env.TEST_DATABASE_URL;
    return { ...base, NODE_ENV: "production", NEXT_TELEMETRY_DISABLED: "1" };
  }
  const fromProcess = Object.fromEntries(Object.keys(base).filter((k) => process.env[k]).map((k) => [k, process.env[k]!]));
  return { ...base, ...fromProcess, NODE_ENV: "production", NEXT_TELEMETRY_DISABLED: "1" };
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

export function serve(env: Env, port: string, host?: string): ChildProcess {
  const args = [NEXT, "start", "-p", port, ...(host ? ["-H", host] : [])];
  return spawn(process.execPath, args, { cwd: ROOT, env: { ...process.env, ...env }, stdio: "inherit" });
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

