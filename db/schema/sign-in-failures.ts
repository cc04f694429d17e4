// Failed sign-ins per account, counted by rate-limiter-flexible's PostgreSQL store
// (lib/sign-in-throttle.ts). The library reads and writes these three columns by name; the key
// is a SHA-256 of the normalised e-mail address, so no address is stored here.
import { bigint, integer, pgTable, varchar } from "drizzle-orm/pg-core";

export const signInFailures = pgTable("sign_in_failures", {
  key: varchar("key", { length: 255 }).primaryKey(),
  points: integer("points").notNull().default(0),
  expire: bigint("expire", { mode: "number" }),
});
