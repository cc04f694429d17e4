// What an entrant tells the show about themselves, kept apart from the sign-in tables.
import { boolean, pgTable, text, timestamp } from "drizzle-orm/pg-core";
import { user } from "./auth";

export const entrantProfiles = pgTable("entrant_profiles", {
  userId: text()
    .primaryKey()
    .references(() => user.id, { onDelete: "cascade" }),
  displayName: text().notNull(),
  phone: text().notNull().default(""),
  addressLine1: text().notNull().default(""),
  addressLine2: text().notNull().default(""),
  city: text().notNull().default(""),
  region: text().notNull().default(""),
  postalCode: text().notNull().default(""),
  country: text().notNull().default(""),
  guild: text().notNull().default(""),
  /** May the show print this name beside the quilt and in published results? */
  publishNameConsent: boolean().notNull().default(false),
  updatedAt: timestamp({ withTimezone: true }).notNull().defaultNow(),
});

export type EntrantProfile = typeof entrantProfiles.$inferSelect;
