// Payment events received from the payments provider's webhook, kept once per event id so a
// replayed delivery is recognised and never counted twice.
import { index, integer, jsonb, pgEnum, pgTable, text, timestamp, uuid } from "drizzle-orm/pg-core";
import { user } from "./auth";
import { entries } from "./entries";
import { shows } from "./shows";

export const paymentEvents = pgTable("payment_events", {
  eventId: text().primaryKey(),
  type: text().notNull(),
  /** The checkout session (or other object) the event is about. */
  objectId: text().notNull(),
  payload: jsonb().notNull(),
  createdAt: timestamp({ withTimezone: true }).notNull(),
  receivedAt: timestamp({ withTimezone: true }).notNull().defaultNow(),
});

export const paymentStatus = pgEnum("payment_status", ["open", "paid", "expired", "refunded", "partially_refunded"]);

/** One checkout: the entries an entrant paid for together, and what was charged. */
export const payments = pgTable(
  "payments",
  {
    id: uuid().primaryKey().defaultRandom(),
    showId: uuid()
      .notNull()
      .references(() => shows.id, { onDelete: "cascade" }),
    entrantUserId: text()
      .notNull()
      .references(() => user.id, { onDelete: "restrict" }),
    checkoutSessionId: text().unique(),
    amountCents: integer().notNull(),
    refundedCents: integer().notNull().default(0),
    currency: text().notNull(),
    status: paymentStatus().notNull().default("open"),
    createdAt: timestamp({ withTimezone: true }).notNull().defaultNow(),
    paidAt: timestamp({ withTimezone: true }),
    /** Our own receipt number, shown on receipts instead of the provider's ids. */
    receiptNumber: integer().notNull().unique().generatedByDefaultAsIdentity({ startWith: 1001 }),
    /** The card's brand and last four digits as the provider reports them ("visa", "4242"); empty when unknown. */
    cardBrand: text().notNull().default(""),
    cardLast4: text().notNull().default(""),
  },
  (t) => [index("payments_entrant").on(t.entrantUserId)],
);

/** What a payment line is for; the per-entrant cap counts "entry" lines only. */
export const feeKind = pgEnum("fee_kind", ["entry", "late", "critique"]);

export const paymentItems = pgTable(
  "payment_items",
  {
    id: uuid().primaryKey().defaultRandom(),
    paymentId: uuid()
      .notNull()
      .references(() => payments.id, { onDelete: "cascade" }),
    entryId: uuid()
      .notNull()
      .references(() => entries.id, { onDelete: "cascade" }),
    /** What this entry costs in this checkout: entry fee (or its share under the cap), late and critique fees. */
    amountCents: integer().notNull(),
    kind: feeKind().notNull(),
    description: text().notNull(),
  },
  (t) => [index("payment_items_entry").on(t.entryId)],
);
