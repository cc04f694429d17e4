// `npm run db:seed`: puts the demo show, its people and 120 quilts (with generated photos) into
// DATABASE_URL and the photo bucket, unless the demo show is already there, and last year's show
// with its results published. Safe to run again. Every demo account shares the published password
// DEMO_PASSWORD, so it refuses any database that is not the local set-up's (lib/local-setup.ts).
// Reads process.env itself: db/client.ts and lib/env.ts import "server-only", which tsx cannot load.
import { CreateBucketCommand, HeadBucketCommand, PutObjectCommand, S3Client } from "@aws-sdk/client-s3";
import { drizzle } from "drizzle-orm/postgres-js";
import postgres from "postgres";
import * as schema from "../db/schema";
import { DEMO_ACCOUNTS, DEMO_PASSWORD, DEMO_SHOW } from "../db/seed/demo-data";
import { LAST_YEAR_SHOW, seedLastYear } from "../db/seed/demo-last-year";
import { seedDemo } from "../db/seed/seed-demo";
import { notLocalReasons } from "../lib/local-setup";

// The same names and defaults as lib/env.ts.
const config = {
  databaseUrl: process.env.DATABASE_URL || "postgres://postgres@127.0.0.1:54329/ribbonry",
  s3: {
    endpoint: process.env.S3_ENDPOINT || "http://127.0.0.1:4569",
    region: process.env.S3_REGION || "us-east-1",
    bucket: process.env.S3_BUCKET || "ribbonry-photos",
    accessKeyId: process.env.S3_ACCESS_KEY_ID || "S3RVER",
    secretAccessKey: process.env.S3_SECRET_ACCESS_KEY || "S3RVER",
  },
};

const say = (msg: string) => console.log(`[ribbonry seed] ${msg}`);

/** The URL without its password, for messages. */
function redacted(url: string): string {
  try {
    const u = new URL(url);
    if (u.password) u.password = "***";
    return u.toString();
  } catch {
    return "(unparseable DATABASE_URL)";
  }
}

function makeS3(): S3Client {
  return new S3Client({
    endpoint: config.s3.endpoint,
    region: config.s3.region,
    credentials: { accessKeyId: config.s3.accessKeyId, secretAccessKey: config.s3.secretAccessKey },
    forcePathStyle: true,
    // Local S3 fakes do not understand the newer default checksums.
    requestChecksumCalculation: "WHEN_REQUIRED",
    responseChecksumValidation: "WHEN_REQUIRED",
  });
}

async function ensureBucket(s3: S3Client, bucket: string): Promise<void> {
  try {
    await s3.send(new HeadBucketCommand({ Bucket: bucket }));
  } catch (err) {
    const status = (err as { $metadata?: { httpStatusCode?: number } }).$metadata?.httpStatusCode;
    if (status !== 404) throw new Error(`could not reach the photo store at ${config.s3.endpoint} (bucket "${bucket}"): ${describe(err)}`);
    await s3.send(new CreateBucketCommand({ Bucket: bucket }));
    say(`created bucket "${bucket}"`);
  }
}

function describe(err: unknown): string {
  if (err instanceof AggregateError && err.errors.length) return describe(err.errors[0]);
  // Drizzle wraps the driver's error ("Failed query: …"); the cause says what went wrong.
  if (err instanceof Error && err.cause instanceof Error) return describe(err.cause);
  if (err instanceof Error) {
    const code = (err as { code?: string }).code;
    return code ? `${err.message} (${code})` : err.message || err.name;
  }
  return String(err);
}

/** The first error code down the cause chain (PostgreSQL's or Node's). */
function codeOf(err: unknown): string | undefined {
  for (let e: unknown = err; e instanceof Error; e = e.cause) {
    const code = (e as { code?: string }).code;
    if (code) return code;
  }
  return undefined;
}

function printAccounts(): void {
  const rows = DEMO_ACCOUNTS.map((a) => [a.role, a.name, a.email] as const);
  const widths = [4, 4, 5].map((min, i) => Math.max(min, ...rows.map((r) => r[i]!.length)));
  const line = (cells: readonly string[]) => cells.map((c, i) => c.padEnd(widths[i]!)).join("  ").trimEnd();
  console.log(`\nDemo accounts (password for all: ${DEMO_PASSWORD})`);
  console.log(line(["role", "name", "email"]));
  console.log(line(widths.map((w) => "-".repeat(w))));
  for (const r of rows) console.log(line(r));
}

/** The demo accounts' password is in the README: never into a database someone else can reach. */
function refuseOutsideLocalSetup(): void {
  const reasons = notLocalReasons({
    NODE_ENV: process.env.NODE_ENV,
    RIBBONRY_LOCAL: process.env.RIBBONRY_LOCAL,
    DATABASE_URL: config.databaseUrl,
    S3_ENDPOINT: config.s3.endpoint,
    STRIPE_API_HOST: process.env.STRIPE_API_HOST ?? "127.0.0.1",
  });
  if (reasons.length === 0) return;
  throw new Error(
    `refused: the demo accounts all use the published password "${DEMO_PASSWORD}", so they are seeded only ` +
      `into the local set-up (everything on this machine), and this is not it: ${reasons.join("; ")}.`,
  );
}

async function main(): Promise<void> {
  refuseOutsideLocalSetup();
  const sql = postgres(config.databaseUrl, { max: 4, onnotice: () => {} });
  const s3 = makeS3();
  try {
    try {
      await sql`select 1`;
    } catch (err) {
      throw new Error(`could not reach PostgreSQL at ${redacted(config.databaseUrl)}: ${describe(err)}`);
    }
    await ensureBucket(s3, config.s3.bucket);
    const db = drizzle(sql, { schema, casing: "snake_case" });
    const started = performance.now();
    const putPhoto = async (key: string, body: Buffer, contentType: string) => {
      await s3.send(new PutObjectCommand({ Bucket: config.s3.bucket, Key: key, Body: body, ContentType: contentType }));
    };
    const { created } = await seedDemo({ db, log: say, putPhoto });
    const seconds = ((performance.now() - started) / 1000).toFixed(1);
    say(created ? `seeded "${DEMO_SHOW.name}" (/${DEMO_SHOW.slug}) in ${seconds} s` : `"${DEMO_SHOW.name}" was already seeded; nothing changed`);
    // Last year's show, judged and published, so the results side can be tried at once.
    const lastYear = await seedLastYear({ db, log: say, putPhoto });
    if (lastYear.created) say(`seeded "${LAST_YEAR_SHOW.name}" (/${LAST_YEAR_SHOW.slug}/results) with its results published`);
    printAccounts();
  } finally {
    s3.destroy();
    await sql.end({ timeout: 5 });
  }
}

main().catch((err) => {
  console.error(`[ribbonry seed] failed: ${describe(err)}`);
  // 42P01 = undefined_table: the database exists but has not been migrated.
  if (codeOf(err) === "42P01") console.error("[ribbonry seed] run `npm run db:migrate` first.");
  if (process.env.DEBUG) console.error(err);
  process.exit(1);
});
