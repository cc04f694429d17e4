// The server's configuration, read once from the environment and checked with zod.
// Addresses default to the local fakes that `npm start` runs on loopback (see .env.example).
// Secrets have no defaults: the project's scripts pass the ones generated into
// .data/secrets.json, and outside the local set-up (lib/local-setup.ts) weak ones are refused.
import { z } from "zod";
import { notLocalReasons, secretProblems, secretsMessage } from "./local-setup";

const port = z.coerce.number().int().min(1).max(65535);

const schema = z.object({
  NODE_ENV: z.enum(["development", "production", "test"]).default("development"),
  APP_URL: z.url().default("http://localhost:3000"),
  DATABASE_URL: z.string().min(1).default("postgres://postgres@127.0.0.1:54329/ribbonry"),
  // Set by the project's scripts only: production here is still the local set-up.
  RIBBONRY_LOCAL: z.string().optional(),
  BETTER_AUTH_SECRET: z.string().optional(),
  AUTH_SIGN_IN_LIMIT_PER_MINUTE: z.coerce.number().int().min(1).default(5),
  // Consecutive failed sign-ins for one e-mail address before it is locked for AUTH_ACCOUNT_LOCK_MINUTES.
  AUTH_ACCOUNT_FAILURE_LIMIT: z.coerce.number().int().min(1).default(10),
  AUTH_ACCOUNT_LOCK_MINUTES: z.coerce.number().int().min(1).default(15),
  // How many reverse proxies in front of the app append to X-Forwarded-For; 0 = none, trust no
  // forwarded header (see lib/client-address.ts).
  TRUSTED_PROXY_HOPS: z.coerce.number().int().min(0).max(10).default(0),
  S3_ENDPOINT: z.url().default("http://127.0.0.1:4569"),
  S3_REGION: z.string().default("us-east-1"),
  S3_BUCKET: z.string().min(3).max(63).default("ribbonry-photos"),
  S3_ACCESS_KEY_ID: z.string().optional(),
  S3_SECRET_ACCESS_KEY: z.string().optional(),
  SMTP_HOST: z.string().default("127.0.0.1"),
  SMTP_PORT: port.default(1025),
  MAIL_FROM: z.string().default("Ribbonry <no-reply@ribbonry.test>"),
  MAIL_WEB_URL: z.url().default("http://127.0.0.1:1080"),
  STRIPE_SECRET_KEY: z.string().optional(),
  STRIPE_WEBHOOK_SECRET: z.string().optional(),
  STRIPE_API_HOST: z.string().default("127.0.0.1"),
  STRIPE_API_PORT: port.default(12111),
  STRIPE_API_PROTOCOL: z.enum(["http", "https"]).default("http"),
});

type Secret = "BETTER_AUTH_SECRET" | "STRIPE_WEBHOOK_SECRET" | "STRIPE_SECRET_KEY" | "S3_ACCESS_KEY_ID" | "S3_SECRET_ACCESS_KEY";
export type Env = Omit<z.infer<typeof schema>, Secret> & Record<Secret, string>;

// s3rver accepts only its own fixed key id (node_modules/s3rver/lib/models/account.js), so the
// local photo store keeps it; anywhere else the S3 keys must be set (see secretProblems).
const S3RVER_KEY = "S3RVER";

function load(): Env {
  const parsed = schema.safeParse(process.env);
  if (!parsed.success) {
    const lines = parsed.error.issues.map((i) => `  ${i.path.join(".")}: ${i.message}`);
    throw new Error(`Ribbonry configuration is invalid:\n${lines.join("\n")}`);
  }
  const vars = parsed.data;
  const reasons = notLocalReasons(vars);
  const problems = secretProblems(vars, reasons.length === 0);
  if (problems.length) throw new Error(secretsMessage(problems, reasons));
  return {
    ...vars,
    BETTER_AUTH_SECRET: vars.BETTER_AUTH_SECRET!,
    STRIPE_WEBHOOK_SECRET: vars.STRIPE_WEBHOOK_SECRET!,
    STRIPE_SECRET_KEY: vars.STRIPE_SECRET_KEY!,
    S3_ACCESS_KEY_ID: vars.S3_ACCESS_KEY_ID || S3RVER_KEY,
    S3_SECRET_ACCESS_KEY: vars.S3_SECRET_ACCESS_KEY || S3RVER_KEY,
  };
}

export const env: Env = load();
