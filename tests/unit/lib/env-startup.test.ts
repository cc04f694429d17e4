// lib/env.ts at start-up, in a child process as the server would load it: a production start
// with a default, short or missing secret stops with a message naming each one; the local
// set-up with the generated secrets starts.
import { spawnSync } from "node:child_process";
import path from "node:path";
import { describe, expect, it } from "vitest";
import { envFor } from "../../../scripts/ports";

const ROOT = path.resolve(__dirname, "../../..");
const strong = (c: string) => c.repeat(40);

// A deployment that set everything well: real hosts, strong secrets of its own.
const DEPLOYMENT = {
  NODE_ENV: "production",
  APP_URL: "https://quilts.example.org",
  DATABASE_URL: "postgres://ribbonry:pw@db.example.org:5432/ribbonry",
  S3_ENDPOINT: "https://s3.example.org",
  S3_ACCESS_KEY_ID: "AKIAEXAMPLEKEY123456",
  S3_SECRET_ACCESS_KEY: strong("s"),
  STRIPE_API_HOST: "",
  STRIPE_SECRET_KEY: `sk_live_${strong("k")}`,
  STRIPE_WEBHOOK_SECRET: `whsec_${strong("w")}`,
  BETTER_AUTH_SECRET: strong("b"),
};

function start(vars: Record<string, string | undefined>) {
  const env: Record<string, string> = { PATH: process.env.PATH ?? "/usr/bin:/bin" };
  for (const [k, v] of Object.entries(vars)) if (v !== undefined) env[k] = v;
  const r = spawnSync(process.execPath, [path.join(ROOT, "node_modules/tsx/dist/cli.mjs"), path.join(ROOT, "tests/helpers/load-env.ts")], {
    cwd: ROOT,
    env: env as NodeJS.ProcessEnv,
    encoding: "utf8",
    timeout: 60_000,
  });
  return { code: r.status, out: r.stdout, err: r.stderr };
}

// Each case starts tsx in a child process: seconds on a busy machine.
describe("lib/env.ts refuses unsafe secrets at start-up", { timeout: 60_000 }, () => {
  it("production with the old default BETTER_AUTH_SECRET stops and names it", () => {
    const r = start({ ...envFor("start"), RIBBONRY_LOCAL: undefined, NODE_ENV: "production", BETTER_AUTH_SECRET: "dev-only-secret-change-me-0123456789abcdef" });
    expect(r.code).not.toBe(0);
    expect(r.err).toContain("Ribbonry will not start");
    expect(r.err).toContain("BETTER_AUTH_SECRET is a published default value");
    expect(r.err).toContain("NODE_ENV is production without RIBBONRY_LOCAL=1");
    expect(r.out).not.toContain("started");
  });

  it("production with a short secret stops and names it", () => {
    const r = start({ ...DEPLOYMENT, BETTER_AUTH_SECRET: "too-short-a-secret" });
    expect(r.code).not.toBe(0);
    expect(r.err).toContain("BETTER_AUTH_SECRET is shorter than 32 characters");
  });

  it("a deployment names every secret that is missing or a default (the old webhook and S3 defaults included)", () => {
    const r = start({
      ...DEPLOYMENT,
      BETTER_AUTH_SECRET: undefined,
      STRIPE_WEBHOOK_SECRET: "whsec_ribbonry_local",
      STRIPE_SECRET_KEY: undefined,
      S3_ACCESS_KEY_ID: "S3RVER",
      S3_SECRET_ACCESS_KEY: "S3RVER",
    });
    expect(r.code).not.toBe(0);
    for (const line of [
      "BETTER_AUTH_SECRET is missing",
      "STRIPE_WEBHOOK_SECRET is a published default value",
      "STRIPE_SECRET_KEY is missing",
      "S3_ACCESS_KEY_ID is a published default value",
      "S3_SECRET_ACCESS_KEY is a published default value",
      "DATABASE_URL points at db.example.org",
    ]) {
      expect(r.err).toContain(line);
    }
  });

  it("a real database is not the local set-up even with RIBBONRY_LOCAL=1 and in development", () => {
    const r = start({ ...envFor("start"), NODE_ENV: "development", DATABASE_URL: DEPLOYMENT.DATABASE_URL, S3_ACCESS_KEY_ID: undefined, S3_SECRET_ACCESS_KEY: undefined });
    expect(r.code).not.toBe(0);
    expect(r.err).toContain("S3_ACCESS_KEY_ID is missing");
  });

  it("the local profile (production build, RIBBONRY_LOCAL=1, generated secrets) starts, with s3rver's keys", () => {
    const r = start({ ...envFor("start"), NODE_ENV: "production" });
    expect(r.err).toBe("");
    expect(r.code).toBe(0);
    expect(JSON.parse(r.out)).toEqual({ started: true, s3KeyId: "S3RVER" });
  });

  it("a deployment with its own strong secrets starts", () => {
    const r = start(DEPLOYMENT);
    expect(r.err).toBe("");
    expect(r.code).toBe(0);
  });
});
