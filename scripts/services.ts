// Starts and stops Ribbonry's local fakes (S3, mail catcher, payments) in one Node process on
// loopback; `tsx scripts/services.ts [start|test]` runs them until SIGINT/SIGTERM.
//
// maildev's REST API (from node_modules/@maildev/api/dist/server.js, maildev 3.0.0), base MAIL_WEB_URL:
//   GET    /api/healthz                  → true
//   GET    /api/email                    → full Email[] in arrival order (?skip, ?limit, ?sort=asc|desc,
//                                           plus dotted-field filters such as ?to.address=a@b.test)
//   GET    /api/email/summary            → { items: EmailSummary[], total, unread, ... } (paged, bodies left out)
//   GET    /api/email/:id                → one Email — and marks it read as a side effect
//   GET    /api/email/:id/html           → the HTML body
//   GET    /api/email/:id/source         → the raw .eml
//   GET    /api/email/:id/download       → the raw .eml as an attachment
//   GET    /api/email/:id/attachment/:f  → one attachment
//   DELETE /api/email/:id                → true (404 when unknown)
//   POST   /api/email/delete {ids:[...]} → { deleted, notFound }
//   DELETE /api/email/all                → true
//   PATCH  /api/email/read-all           → number marked read
import fs from "node:fs/promises";
import { createRequire } from "node:module";
import net from "node:net";
import path from "node:path";
import { pathToFileURL } from "node:url";
import type { MailDev } from "maildev";
import { startPaymentsFake } from "./fakes/payments-fake";
import { envFor, portsFor, type Profile } from "./ports";

export type ServicesOptions = {
  profile: Profile;
  dataDir: string;
  webhookUrl: string;
  quiet?: boolean;
  /** Empty the S3 and mail folders first; defaults to true for the test profile. */
  fresh?: boolean;
};

export type Services = { stop(): Promise<void>; urls: Record<string, string> };

// s3rver ships no type declarations; this is the part of its API used here.
type S3rverInstance = { run(): Promise<unknown>; close(): Promise<void> };
type S3rverCtor = new (opts: {
  address: string;
  port: number;
  directory: string;
  silent: boolean;
  configureBuckets: { name: string; configs?: string[] }[];
}) => S3rverInstance;

const HOST = "127.0.0.1";

export async function startServices(opts: ServicesOptions): Promise<Services> {
  const ports = portsFor(opts.profile);
  const env = { ...envFor(opts.profile), ...fromProcessEnv() };
  const quiet = opts.quiet ?? false;
  const s3Dir = path.join(opts.dataDir, "s3");
  const mailDir = path.join(opts.dataDir, "mail");
  // Check every port before touching the data folders: emptying them under a running
  // instance of the same profile would pull its bucket out from under it.
  await ensurePortFree(ports.s3, "S3 fake (s3rver)");
  await ensurePortFree(ports.smtp, "mail catcher (SMTP)");
  await ensurePortFree(ports.mailWeb, "mail catcher (web)");
  await ensurePortFree(ports.payments, "payments fake");
  if (opts.fresh ?? opts.profile !== "start") {
    await fs.rm(s3Dir, { recursive: true, force: true });
    await fs.rm(mailDir, { recursive: true, force: true });
  }
  await fs.mkdir(s3Dir, { recursive: true });
  await fs.mkdir(mailDir, { recursive: true });

  const stops: (() => Promise<void>)[] = [];
  const stopAll = async () => {
    // Reverse order, and keep going when one fails so nothing is left listening.
    for (const stop of stops.splice(0).reverse()) await stop().catch((err) => console.error("[services] stop failed:", err));
  };

  try {
    await ensurePortFree(ports.s3, "S3 fake (s3rver)");
    const S3rver = createRequire(import.meta.url)("s3rver") as S3rverCtor;
    const s3 = new S3rver({
      address: HOST,
      port: ports.s3,
      directory: s3Dir,
      silent: true,
      configureBuckets: [{ name: env.S3_BUCKET ?? "ribbonry-photos", configs: [corsXml()] }],
    });
    await wrapListen(s3.run(), ports.s3, "S3 fake (s3rver)");
    stops.push(() => s3.close());

    await ensurePortFree(ports.smtp, "mail catcher SMTP (maildev)");
    await ensurePortFree(ports.mailWeb, "mail catcher web (maildev)");
    // maildev is ESM-only; a dynamic import also works when tsx runs this file as CommonJS.
    const { MailDev: MailDevCtor } = await import("maildev");
    const maildev: MailDev = new MailDevCtor({
      smtp: ports.smtp,
      ip: HOST,
      web: ports.mailWeb,
      webIp: HOST,
      mailDirectory: mailDir,
      silent: true,
      verbose: false,
      // No outgoingHost and no autoRelay: caught mail never leaves this machine.
    });
    await wrapListen(quiet ? withoutConsoleInfo(() => maildev.start()) : maildev.start(), ports.smtp, "mail catcher (maildev)");
    stops.push(() => maildev.stop());

    await ensurePortFree(ports.payments, "payments fake");
    const payments = await wrapListen(
      startPaymentsFake({
        port: ports.payments,
        host: HOST,
        secretKey: env.STRIPE_SECRET_KEY ?? "",
        webhookSecret: env.STRIPE_WEBHOOK_SECRET ?? "",
        webhookUrl: opts.webhookUrl,
        quiet,
      }),
      ports.payments,
      "payments fake",
    );
    stops.push(() => payments.stop());

    const urls = {
      s3: `http://${HOST}:${ports.s3}`,
      smtp: `smtp://${HOST}:${ports.smtp}`,
      mailWeb: `http://${HOST}:${ports.mailWeb}`,
      payments: payments.url,
    };
    if (!quiet) console.log(`[services] ${opts.profile}: ${Object.entries(urls).map(([k, v]) => `${k} ${v}`).join(", ")}`);
    return { urls, stop: stopAll };
  } catch (err) {
    await stopAll();
    throw err;
  }
}

/** Lets an operator override the secrets and bucket the fakes use, like the app reads them. */
function fromProcessEnv(): Record<string, string> {
  const keys = ["S3_BUCKET", "STRIPE_SECRET_KEY", "STRIPE_WEBHOOK_SECRET"];
  return Object.fromEntries(keys.flatMap((k) => (process.env[k] ? [[k, process.env[k]!]] : [])));
}

// Browsers upload photos straight to S3 with presigned form POSTs, which needs CORS on the bucket.
// Any loopback port, so a `scripts/dev-app.ts <port>` server on the test fakes can upload too.
function corsXml(): string {
  const origins = ["http://localhost:*", "http://127.0.0.1:*"].map((o) => `<AllowedOrigin>${o}</AllowedOrigin>`).join("");
  return `<CORSConfiguration><CORSRule>${origins}<AllowedMethod>GET</AllowedMethod><AllowedMethod>PUT</AllowedMethod><AllowedMethod>POST</AllowedMethod><AllowedMethod>HEAD</AllowedMethod><AllowedHeader>*</AllowedHeader><ExposeHeader>ETag</ExposeHeader><MaxAgeSeconds>600</MaxAgeSeconds></CORSRule></CORSConfiguration>`;
}

// maildev's API server announces itself with console.info even when `silent` is set.
async function withoutConsoleInfo<T>(fn: () => Promise<T>): Promise<T> {
  const original = console.info;
  console.info = () => {};
  try {
    return await fn();
  } finally {
    console.info = original;
  }
}

function portTakenError(port: number, what: string): Error {
  return new Error(
    `[services] cannot start the ${what}: ${HOST}:${port} is already in use by another process. ` +
      `Stop it (see \`ss -ltnp | grep :${port}\`) or stop the other Ribbonry instance using this profile.`,
  );
}

/** Fails early with a clear message instead of a bare EADDRINUSE from deep inside a library. */
function ensurePortFree(port: number, what: string): Promise<void> {
  return new Promise((resolve, reject) => {
    const probe = net.createServer();
    probe.once("error", (err: NodeJS.ErrnoException) => reject(err.code === "EADDRINUSE" ? portTakenError(port, what) : err));
    probe.listen(port, HOST, () => probe.close(() => resolve()));
  });
}

/** The port can still be taken between the probe and the real listen; translate that too. */
async function wrapListen<T>(p: Promise<T>, port: number, what: string): Promise<T> {
  try {
    return await p;
  } catch (err) {
    const e = err as NodeJS.ErrnoException & { port?: number };
    if (e?.code === "EADDRINUSE") throw portTakenError(e.port ?? port, what);
    throw err;
  }
}

async function main(): Promise<void> {
  const arg = process.argv[2] ?? "start";
  if (arg !== "start" && arg !== "test" && arg !== "bench") {
    console.error("usage: tsx scripts/services.ts [start|test|bench]");
    process.exit(2);
  }
  const profile: Profile = arg;
  const dataDir = process.env.RIBBONRY_DATA_DIR ?? path.join(process.cwd(), ".data", profile);
  const webhookUrl = process.env.RIBBONRY_WEBHOOK_URL ?? `${envFor(profile).APP_URL}/api/payments/webhook`;
  const services = await startServices({ profile, dataDir, webhookUrl, quiet: process.env.RIBBONRY_QUIET === "1" });
  let stopping = false;
  const shutdown = (signal: string) => {
    if (stopping) return;
    stopping = true;
    console.log(`[services] ${signal}: stopping`);
    services.stop().then(
      () => process.exit(0),
      (err) => {
        console.error("[services] stop failed:", err);
        process.exit(1);
      },
    );
  };
  process.on("SIGINT", () => shutdown("SIGINT"));
  process.on("SIGTERM", () => shutdown("SIGTERM"));
  console.log("[services] ready");
}

if (process.argv[1] && pathToFileURL(path.resolve(process.argv[1])).href === import.meta.url) {
  main().catch((err: unknown) => {
    console.error(err instanceof Error ? err.message : err);
    process.exit(1);
  });
}
