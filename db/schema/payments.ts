// Payment events received from the payments provider's webhook, kept once per event id so a
// replayed delivery is recognised and never counted twice.
import { jsonb, pgTable, text, timestamp } from "drizzle-orm/pg-core";

export const paymentEvents = pgTable("payment_events", {
  eventId: text().primaryKey(),
  type: text().notNull(),
  /** The checkout session (or other object) the event is about. */
  objectId: text().notNull(),
  payload: jsonb().notNull(),
  createdAt: timestamp({ withTimezone: true }).notNull(),
  receivedAt: timestamp({ withTimezone: true }).notNull().defaultNow(),
});
