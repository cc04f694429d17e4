// Tells the local set-up (`npm start`, `npm test`: everything on this machine, secrets generated
// into .data/secrets.json) from a deployment, and says which secrets a deployment left unsafe.
// Pure: callers pass the variables (lib/env.ts for the app, the scripts for themselves), so
// lib/env.ts stays the app's one reader of process.env and tsx scripts can load this file too.

/** Shortest secret accepted: 32 characters, better-auth's own minimum for BETTER_AUTH_SECRET. */
export const SECRET_MIN_LENGTH = 32;

/**
 * Values published in this project's history or in a library's source: anyone can sign with them.
 * Refused wherever a real secret is required.
 */
export const KNOWN_DEFAULT_SECRETS: readonly string[] = [
  "dev-only-secret-change-me-0123456789abcdef", // Ribbonry's old BETTER_AUTH_SECRET default
  "better-auth-secret-12345678901234567890", // better-auth's built-in fallback secret
  "whsec_ribbonry_local", // Ribbonry's old STRIPE_WEBHOOK_SECRET default
  "sk_test_ribbonry_local", // Ribbonry's old STRIPE_SECRET_KEY default
  "S3RVER", // s3rver's fixed key pair (node_modules/s3rver/lib/models/account.js)
];

/** The variables that decide whether this is the local set-up. */
export type SetupVars = {
  NODE_ENV?: string;
  RIBBONRY_LOCAL?: string;
  DATABASE_URL?: string;
  S3_ENDPOINT?: string;
  STRIPE_API_HOST?: string;
};

export type SecretVars = {
  BETTER_AUTH_SECRET?: string;
  STRIPE_WEBHOOK_SECRET?: string;
  STRIPE_SECRET_KEY?: string;
  S3_ACCESS_KEY_ID?: string;
  S3_SECRET_ACCESS_KEY?: string;
};

/** localhost, 127.0.0.0/8 and ::1 (RFC 6761 §6.3, RFC 1122 §3.2.1.3, RFC 4291 §2.5.3). */
export function isLoopbackHost(host: string): boolean {
  const h = host.trim().toLowerCase().replace(/^\[(.*)\]$/, "$1");
  if (h === "localhost" || h.endsWith(".localhost")) return true;
  if (h === "::1" || h === "0:0:0:0:0:0:0:1") return true;
  return /^127(\.\d{1,3}){3}$/.test(h);
}

function urlHost(url: string): string | null {
  try {
    return new URL(url).hostname;
  } catch {
    return null;
  }
}

/** The database's host: a Unix socket (no host, or ?host=/path) counts as this machine. */
function databaseIsLocal(url: string): { local: boolean; host: string } {
  let u: URL;
  try {
    u = new URL(url);
  } catch {
    return { local: false, host: "(an unreadable address)" };
  }
  const param = u.searchParams.get("host");
  if (param?.startsWith("/")) return { local: true, host: param };
  const host = u.hostname || param || "localhost";
  return { local: isLoopbackHost(host), host };
}

/**
 * Why this is not the local set-up, in plain words; empty when it is: the database, photo store
 * and payments API all on this machine, and not production unless the project's scripts marked
 * it local (RIBBONRY_LOCAL=1).
 */
export function notLocalReasons(vars: SetupVars): string[] {
  const reasons: string[] = [];
  if (vars.DATABASE_URL) {
    const db = databaseIsLocal(vars.DATABASE_URL);
    if (!db.local) reasons.push(`DATABASE_URL points at ${db.host}, not this machine`);
  }
  if (vars.S3_ENDPOINT) {
    const host = urlHost(vars.S3_ENDPOINT);
    if (host === null || !isLoopbackHost(host)) reasons.push(`S3_ENDPOINT points at ${host ?? "an unreadable address"}, not this machine`);
  }
  const payments = vars.STRIPE_API_HOST ?? "";
  if (!payments) reasons.push("STRIPE_API_HOST is empty, so payments go to the real API");
  else if (!isLoopbackHost(payments)) reasons.push(`STRIPE_API_HOST is ${payments}, not this machine`);
  if (vars.NODE_ENV === "production" && vars.RIBBONRY_LOCAL !== "1") {
    reasons.push("NODE_ENV is production without RIBBONRY_LOCAL=1 (which only the project's own scripts set)");
  }
  return reasons;
}

function strength(name: string, value: string | undefined): string | null {
  if (!value) return `${name} is missing`;
  if (KNOWN_DEFAULT_SECRETS.includes(value)) return `${name} is a published default value`;
  if (value.length < SECRET_MIN_LENGTH) return `${name} is shorter than ${SECRET_MIN_LENGTH} characters`;
  return null;
}

/**
 * What is wrong with the secrets. Everywhere: the session and webhook signing secrets must be
 * strong (anyone holding them can sign a session or a "paid" event), and the payments key must be
 * set. Outside the local set-up also the payments key and the S3 keys: no defaults, no short ones.
 * The S3 access key id is an identifier (20 characters at AWS), so only its presence is checked.
 */
export function secretProblems(vars: SecretVars, local: boolean): string[] {
  const problems = [strength("BETTER_AUTH_SECRET", vars.BETTER_AUTH_SECRET), strength("STRIPE_WEBHOOK_SECRET", vars.STRIPE_WEBHOOK_SECRET)];
  if (local) {
    if (!vars.STRIPE_SECRET_KEY) problems.push("STRIPE_SECRET_KEY is missing");
  } else {
    problems.push(strength("STRIPE_SECRET_KEY", vars.STRIPE_SECRET_KEY));
    const id = vars.S3_ACCESS_KEY_ID;
    problems.push(!id ? "S3_ACCESS_KEY_ID is missing" : KNOWN_DEFAULT_SECRETS.includes(id) ? "S3_ACCESS_KEY_ID is a published default value" : null);
    problems.push(strength("S3_SECRET_ACCESS_KEY", vars.S3_SECRET_ACCESS_KEY));
  }
  return problems.filter((p): p is string => p !== null);
}

/** The refusal lib/env.ts throws: every problem, why the set-up is not local, and what to do. */
export function secretsMessage(problems: string[], reasons: string[]): string {
  const lines = ["Ribbonry will not start: some secrets are not safe to use.", ...problems.map((p) => `  - ${p}`)];
  if (reasons.length) {
    lines.push(
      `This is not the local set-up (${reasons.join("; ")}).`,
      `Set each secret to a random value of at least ${SECRET_MIN_LENGTH} characters (for example \`openssl rand -base64 32\`),`,
      "and STRIPE_SECRET_KEY and the S3 keys to the keys those services issued you.",
    );
  } else {
    lines.push(
      "In the local set-up `npm start`, `npm run dev` and `npm test` set them from .data/secrets.json",
      "(made on the first start); start the app through them, or set the variables yourself.",
    );
  }
  return lines.join("\n");
}
