// The local set-up's secrets: made once, private to the owner, reused after.
import fs from "node:fs";
import os from "node:os";
import path from "node:path";
import { afterEach, describe, expect, it } from "vitest";
import { KNOWN_DEFAULT_SECRETS } from "../../../lib/local-setup";
import { localSecrets } from "../../../scripts/local-secrets";

const dirs: string[] = [];
const tempFile = () => {
  const dir = fs.mkdtempSync(path.join(os.tmpdir(), "ribbonry-secrets-"));
  dirs.push(dir);
  return path.join(dir, ".data", "secrets.json");
};

afterEach(() => {
  for (const d of dirs.splice(0)) fs.rmSync(d, { recursive: true, force: true });
});

describe("localSecrets", () => {
  it("makes random secrets on the first call, in a file only its owner can read (mode 600)", () => {
    const file = tempFile();
    const secrets = localSecrets(file);
    expect(fs.statSync(file).mode & 0o777).toBe(0o600);
    for (const value of Object.values(secrets)) {
      expect(value.length).toBeGreaterThanOrEqual(32);
      expect(KNOWN_DEFAULT_SECRETS).not.toContain(value);
    }
    expect(secrets.STRIPE_WEBHOOK_SECRET).toMatch(/^whsec_/);
    expect(JSON.parse(fs.readFileSync(file, "utf8"))).toEqual(secrets);
    // Nothing left beside it.
    expect(fs.readdirSync(path.dirname(file))).toEqual(["secrets.json"]);
  });

  it("reuses the stored secrets on later calls, and another checkout gets its own", () => {
    const file = tempFile();
    const first = localSecrets(file);
    expect(localSecrets(file)).toEqual(first);
    expect(localSecrets(tempFile()).BETTER_AUTH_SECRET).not.toBe(first.BETTER_AUTH_SECRET);
  });

  it("keeps the usable values of an incomplete file, fills in the rest, and tightens a loose mode", () => {
    const file = tempFile();
    fs.mkdirSync(path.dirname(file), { recursive: true });
    const kept = "k".repeat(40);
    fs.writeFileSync(file, JSON.stringify({ BETTER_AUTH_SECRET: kept, STRIPE_WEBHOOK_SECRET: "short" }), { mode: 0o644 });
    const secrets = localSecrets(file);
    expect(secrets.BETTER_AUTH_SECRET).toBe(kept);
    expect(secrets.STRIPE_WEBHOOK_SECRET.length).toBeGreaterThanOrEqual(32);
    expect(fs.statSync(file).mode & 0o777).toBe(0o600);
  });
});
