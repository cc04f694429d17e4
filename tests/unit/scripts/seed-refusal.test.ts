// The demo accounts share a password printed in the README, so the seed refuses any database
// that is not on this machine, before connecting (".invalid" names never resolve, RFC 2606 §2).
import { spawnSync } from "node:child_process";
import path from "node:path";
import { describe, expect, it } from "vitest";

const ROOT = path.resolve(__dirname, "../../..");

function seed(vars: Record<string, string>) {
  const env: Record<string, string> = { PATH: process.env.PATH ?? "/usr/bin:/bin", ...vars };
  const r = spawnSync(process.execPath, [path.join(ROOT, "node_modules/tsx/dist/cli.mjs"), path.join(ROOT, "scripts/seed.ts")], {
    cwd: ROOT,
    env: env as NodeJS.ProcessEnv,
    encoding: "utf8",
    timeout: 60_000,
  });
  return { code: r.status, text: `${r.stdout}${r.stderr}` };
}

// Each case starts tsx and loads the seed's imports (sharp, the schema): seconds on a busy machine.
describe("scripts/seed.ts outside the local set-up", { timeout: 60_000 }, () => {
  it("refuses a database on another machine, naming it and the shared password", () => {
    const r = seed({ DATABASE_URL: "postgres://ribbonry:pw@db.example.invalid:5432/ribbonry" });
    expect(r.code).toBe(1);
    expect(r.text).toContain('the demo accounts all use the published password "quilt-show-demo"');
    expect(r.text).toContain("DATABASE_URL points at db.example.invalid, not this machine");
    expect(r.text).not.toContain("could not reach PostgreSQL");
    expect(r.text).not.toContain(":pw@");
  });

  it("refuses a production run the project's scripts did not mark local", () => {
    const r = seed({ NODE_ENV: "production", DATABASE_URL: "postgres://postgres@127.0.0.1:1/none" });
    expect(r.code).toBe(1);
    expect(r.text).toContain("NODE_ENV is production without RIBBONRY_LOCAL=1");
  });
});
