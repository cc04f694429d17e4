// Failed sign-ins per e-mail address, whatever address they come from (OWASP ASVS 4.0 §2.2.1:
// anti-automation against brute force on one account). After AUTH_ACCOUNT_FAILURE_LIMIT
// consecutive failures the address is refused for AUTH_ACCOUNT_LOCK_MINUTES; a successful
// sign-in starts the count again. Unknown addresses are counted and answered exactly like known
// ones, so the lock reveals nothing about which accounts exist.
//
// Counted in PostgreSQL (`sign_in_failures`) by rate-limiter-flexible's RateLimiterPostgres, so
// every server process shares the count. Each attempt takes a point before the password is
// checked and gives it back unless the password was wrong: taking first keeps a burst of
// parallel guesses from all passing one stale read.
import "server-only";
import { createHash } from "node:crypto";
import type { BetterAuthPlugin } from "better-auth";
import { APIError, createAuthMiddleware, isAPIError } from "better-auth/api";
import { RateLimiterPostgres, RateLimiterRes } from "rate-limiter-flexible";
import { sql } from "@/db/client";
import { env } from "@/lib/env";

export const ACCOUNT_LOCKED_CODE = "TOO_MANY_FAILED_SIGN_INS";

// RateLimiterPostgres speaks node-postgres (`query({ text, values })` → `{ rows }`); this hands its
// statements to the app's own postgres.js pool instead of opening a second one.
const postgresStore = {
  query: async ({ text, values }: { text: string; values?: unknown[] }) => ({
    rows: await sql.unsafe(text, (values ?? []) as never[]),
  }),
};

const lockSeconds = env.AUTH_ACCOUNT_LOCK_MINUTES * 60;

const failures = new RateLimiterPostgres({
  storeClient: postgresStore,
  storeType: "pool",
  tableName: "sign_in_failures",
  tableCreated: true, // made by a migration (db/schema/sign-in-failures.ts)
  keyPrefix: "sign-in",
  points: env.AUTH_ACCOUNT_FAILURE_LIMIT,
  duration: lockSeconds,
  blockDuration: lockSeconds,
});

const keyFor = (email: string) => createHash("sha256").update(email.trim().toLowerCase()).digest("hex");

function lockedError(msBeforeNext: number): APIError {
  const seconds = Math.max(1, Math.ceil(msBeforeNext / 1000));
  const minutes = Math.ceil(seconds / 60);
  const when = minutes === 1 ? "a minute" : `${minutes} minutes`;
  return new APIError(
    "TOO_MANY_REQUESTS",
    {
      code: ACCOUNT_LOCKED_CODE,
      message: `Too many failed sign-ins for this e-mail address. Try again in ${when}, or reset your password.`,
    },
    { "Retry-After": String(seconds) }, // RFC 9110 §10.2.3
  );
}

const emailOf = (body: unknown): string | null => {
  const email = (body as { email?: unknown } | undefined)?.email;
  return typeof email === "string" && email.length > 0 ? email : null;
};

/** The better-auth plugin: a before hook takes a point, an after hook keeps or returns it. */
export function signInThrottle(): BetterAuthPlugin {
  const isSignIn = (ctx: { path?: string }) => ctx.path === "/sign-in/email";
  return {
    id: "ribbonry-sign-in-throttle",
    hooks: {
      before: [
        {
          matcher: isSignIn,
          handler: createAuthMiddleware(async (ctx) => {
            const email = emailOf(ctx.body);
            if (!email) return;
            try {
              await failures.consume(keyFor(email));
            } catch (e) {
              if (e instanceof RateLimiterRes) throw lockedError(e.msBeforeNext);
              throw e;
            }
          }),
        },
      ],
      after: [
        {
          matcher: isSignIn,
          handler: createAuthMiddleware(async (ctx) => {
            const email = emailOf(ctx.body);
            if (!email) return;
            const returned = ctx.context.returned;
            const key = keyFor(email);
            if (!isAPIError(returned)) {
              await failures.delete(key);
            } else if (returned.body?.code !== "INVALID_EMAIL_OR_PASSWORD") {
              // Refused for another reason (address not confirmed yet, bad input): not a guess.
              await failures.reward(key, 1);
            }
          }),
        },
      ],
    },
  };
}
