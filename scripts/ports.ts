// Loopback ports and environments for the two ways Ribbonry runs here: `npm start` (dev) and
// `npm test` (test), and `npm run bench` (bench). All may run at once; they share the PostgreSQL
// server, not the database.
import { localSecrets } from "./local-secrets";

export type Profile = "start" | "test" | "bench";

export const PG_PORT = Number(process.env.RIBBONRY_PG_PORT ?? 54329);

const ports = {
  start: { app: 3000, s3: 4569, smtp: 1025, mailWeb: 1080, payments: 12111 },
  test: { app: 3100, s3: 4579, smtp: 1035, mailWeb: 1090, payments: 12121 },
  bench: { app: 3200, s3: 4589, smtp: 1045, mailWeb: 1100, payments: 12131 },
} as const;

export function portsFor(profile: Profile) {
  return ports[profile];
}

/**
 * The environment the app, the fakes and the tests share for a profile: loopback addresses, the
 * secrets generated into .data/secrets.json, and RIBBONRY_LOCAL=1, which lets lib/env.ts treat a
 * production build on these addresses as the local set-up.
 */
export function envFor(profile: Profile): Record<string, string> {
  const p = ports[profile];
  const database = profile === "start" ? "ribbonry" : `ribbonry_${profile}`;
  const appUrl = profile === "start" ? `http://localhost:${p.app}` : `http://127.0.0.1:${p.app}`;
  return {
    APP_URL: appUrl,
    PORT: String(p.app),
    DATABASE_URL: `postgres://postgres@127.0.0.1:${PG_PORT}/${database}`,
    S3_ENDPOINT: `http://127.0.0.1:${p.s3}`,
    S3_BUCKET: "ribbonry-photos",
    SMTP_HOST: "127.0.0.1",
    SMTP_PORT: String(p.smtp),
    MAIL_WEB_URL: `http://127.0.0.1:${p.mailWeb}`,
    STRIPE_API_HOST: "127.0.0.1",
    STRIPE_API_PORT: String(p.payments),
    STRIPE_API_PROTOCOL: "http",
    // s3rver knows only its own fixed key pair (node_modules/s3rver/lib/models/account.js);
    // lib/env.ts refuses it for any S3 that is not on this machine.
    S3_ACCESS_KEY_ID: "S3RVER",
    S3_SECRET_ACCESS_KEY: "S3RVER",
    RIBBONRY_LOCAL: "1",
    ...localSecrets(),
  };
}
