// The server's configuration, read once from the environment and checked with zod.
// Defaults point at the local fakes that `npm start` runs on loopback (see .env.example).
import { z } from "zod";

const port = z.coerce.number().int().min(1).max(65535);

const schema = z.object({
  NODE_ENV: z.enum(["development", "production", "test"]).default("development"),
  APP_URL: z.url().default("http://localhost:3000"),
  DATABASE_URL: z.string().min(1).default("postgres://postgres@127.0.0.1:54329/ribbonry"),
  BETTER_AUTH_SECRET: z.string().min(32).default("dev-only-secret-change-me-0123456789abcdef"),
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
  S3_ACCESS_KEY_ID: z.string().default("S3RVER"),
  S3_SECRET_ACCESS_KEY: z.string().default("S3RVER"),
  SMTP_HOST: z.string().default("127.0.0.1"),
  SMTP_PORT: port.default(1025),
  MAIL_FROM: z.string().default("Ribbonry <no-reply@ribbonry.test>"),
  MAIL_WEB_URL: z.url().default("http://127.0.0.1:1080"),
  STRIPE_SECRET_KEY: z.string().default("sk_test_ribbonry_local"),
  STRIPE_WEBHOOK_SECRET: z.string().default("whsec_ribbonry_local"),
  STRIPE_API_HOST: z.string().default("127.0.0.1"),
  STRIPE_API_PORT: port.default(12111),
  STRIPE_API_PROTOCOL: z.enum(["http", "https"]).default("http"),
});

export type Env = z.infer<typeof schema>;

function load(): Env {
  const parsed = schema.safeParse(process.env);
  if (!parsed.success) {
    const lines = parsed.error.issues.map((i) => `  ${i.path.join(".")}: ${i.message}`);
    throw new Error(`Ribbonry configuration is invalid:\n${lines.join("\n")}`);
  }
  return parsed.data;
}

export const env: Env = load();
