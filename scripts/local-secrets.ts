// The local set-up's secrets: random values made on the first start into .data/secrets.json
// (git-ignored, mode 600) and reused after, so `npm start`, `npm test`, `npm run bench`, the dev
// app, vitest and the payments fake all sign and check with the same values, and no secret is
// ever written in the code. A deployment sets its own (README.md, "Configuration").
import { randomBytes } from "node:crypto";
import fs from "node:fs";
import path from "node:path";

export const SECRETS_FILE = path.resolve(__dirname, "../.data/secrets.json");

export type LocalSecrets = {
  BETTER_AUTH_SECRET: string;
  STRIPE_WEBHOOK_SECRET: string;
  STRIPE_SECRET_KEY: string;
};

const NAMES = ["BETTER_AUTH_SECRET", "STRIPE_WEBHOOK_SECRET", "STRIPE_SECRET_KEY"] as const;

// 32 random bytes = 256 bits, 43 base64url characters (OWASP ASVS 4.0 V6.2.5/V6.3: keys from a
// CSPRNG, at least 128 bits). The prefixes follow the provider's key formats, for readability.
function generate(): LocalSecrets {
  const random = () => randomBytes(32).toString("base64url");
  return {
    BETTER_AUTH_SECRET: random(),
    STRIPE_WEBHOOK_SECRET: `whsec_${random()}`,
    STRIPE_SECRET_KEY: `sk_test_${random()}`,
  };
}

function read(file: string): Partial<LocalSecrets> | null {
  let text: string;
  try {
    text = fs.readFileSync(file, "utf8");
  } catch (err) {
    if ((err as NodeJS.ErrnoException).code === "ENOENT") return null;
    throw err;
  }
  try {
    return JSON.parse(text) as Partial<LocalSecrets>;
  } catch {
    throw new Error(`${file} is not valid JSON; delete it and a new one is made on the next start (signed-in sessions end).`);
  }
}

const complete = (s: Partial<LocalSecrets> | null): s is LocalSecrets => !!s && NAMES.every((n) => typeof s[n] === "string" && s[n]!.length >= 32);

/** Writes to a private temporary file, then puts it in place in one step. */
function writePrivate(file: string, secrets: LocalSecrets, replace: boolean): boolean {
  const tmp = `${file}.${process.pid}.${randomBytes(4).toString("hex")}.tmp`;
  fs.writeFileSync(tmp, `${JSON.stringify(secrets, null, 2)}\n`, { mode: 0o600, flag: "wx" });
  try {
    if (replace) {
      fs.renameSync(tmp, file);
      return true;
    }
    // link() refuses an existing target: when several processes start at once, one file wins.
    fs.linkSync(tmp, file);
    return true;
  } catch (err) {
    if ((err as NodeJS.ErrnoException).code === "EEXIST") return false;
    throw err;
  } finally {
    fs.rmSync(tmp, { force: true });
  }
}

/** The local secrets, made on the first call (file mode 600) and read back on every later one. */
export function localSecrets(file: string = SECRETS_FILE): LocalSecrets {
  let stored = read(file);
  if (!stored) {
    fs.mkdirSync(path.dirname(file), { recursive: true });
    writePrivate(file, generate(), false);
    stored = read(file);
  } else if (!complete(stored)) {
    // A file from an older version, or edited by hand: keep what is usable, add the rest.
    const kept = Object.fromEntries(NAMES.filter((n) => typeof stored![n] === "string" && stored![n]!.length >= 32).map((n) => [n, stored![n]]));
    writePrivate(file, { ...generate(), ...kept }, true);
    stored = read(file);
  }
  if (!complete(stored)) throw new Error(`could not make the local secrets in ${file}`);
  // Someone may have loosened it (a copy, an editor): only the owner may read it.
  if ((fs.statSync(file).mode & 0o077) !== 0) fs.chmodSync(file, 0o600);
  return { BETTER_AUTH_SECRET: stored.BETTER_AUTH_SECRET, STRIPE_WEBHOOK_SECRET: stored.STRIPE_WEBHOOK_SECRET, STRIPE_SECRET_KEY: stored.STRIPE_SECRET_KEY };
}
