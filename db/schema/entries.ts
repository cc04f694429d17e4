// Quilts entered in a show and their photos. Lengths are integer micrometres (1 in = 25,400 µm
// exactly, NIST SP 811), so both inch fractions and centimetres are stored without rounding.
import { relations } from "drizzle-orm";
import {
  boolean,
  check,
  index,
  integer,
  pgEnum,
  pgTable,
  text,
  timestamp,
  uniqueIndex,
  uuid,
} from "drizzle-orm/pg-core";
import { sql } from "drizzle-orm";
import { user } from "./auth";
import { shows } from "./shows";

export const entryStatus = pgEnum("entry_status", [
  "draft",
  "submitted",
  "paid",
  "accepted",
  "declined",
  "received",
  "judged",
  "hung",
  "returned",
  "withdrawn",
]);

export const quiltingMethod = pgEnum("quilting_method", ["hand", "home_machine", "frame_machine"]);
export const division = pgEnum("division", ["open", "youth", "first_time"]);

export const entries = pgTable(
  "entries",
  {
    id: uuid().primaryKey().defaultRandom(),
    showId: uuid()
      .notNull()
      .references(() => shows.id, { onDelete: "cascade" }),
    entrantUserId: text()
      .notNull()
      .references(() => user.id, { onDelete: "restrict" }),
    /** Assigned on submission; unique per show and never reused. */
    entryNumber: integer(),
    title: text().notNull(),
    widthUm: integer().notNull(),
    lengthUm: integer().notNull(),
    techniques: text().array().notNull().default(sql`'{}'::text[]`),
    madeBy: text().array().notNull().default(sql`'{}'::text[]`),
    quiltedBy: text().notNull().default(""),
    quiltedForHire: boolean().notNull().default(false),
    quiltingMethod: quiltingMethod().notNull(),
    patternSource: text().notNull().default("original"),
    statement: text().notNull().default(""),
    declaredValueCents: integer().notNull().default(0),
    judged: boolean().notNull().default(true),
    division: division().notNull().default("open"),
    status: entryStatus().notNull().default("draft"),
    createdAt: timestamp({ withTimezone: true }).notNull().defaultNow(),
    updatedAt: timestamp({ withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [
    uniqueIndex("entries_show_number").on(t.showId, t.entryNumber),
    index("entries_entrant").on(t.entrantUserId),
    check("entries_size_positive", sql`${t.widthUm} > 0 and ${t.lengthUm} > 0`),
    check("entries_value_nonnegative", sql`${t.declaredValueCents} >= 0`),
  ],
);

export const photoView = pgEnum("photo_view", ["full", "detail", "other"]);

export const entryPhotos = pgTable(
  "entry_photos",
  {
    id: uuid().primaryKey().defaultRandom(),
    entryId: uuid()
      .notNull()
      .references(() => entries.id, { onDelete: "cascade" }),
    view: photoView().notNull(),
    /** Object key in the private photo bucket. */
    storageKey: text().notNull().unique(),
    widthPx: integer().notNull(),
    heightPx: integer().notNull(),
    bytes: integer().notNull(),
    contentType: text().notNull(),
    createdAt: timestamp({ withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [uniqueIndex("entry_photos_entry_view").on(t.entryId, t.view)],
);

export const entriesRelations = relations(entries, ({ one, many }) => ({
  show: one(shows, { fields: [entries.showId], references: [shows.id] }),
  entrant: one(user, { fields: [entries.entrantUserId], references: [user.id] }),
  photos: many(entryPhotos),
}));

export const entryPhotosRelations = relations(entryPhotos, ({ one }) => ({
  entry: one(entries, { fields: [entryPhotos.entryId], references: [entries.id] }),
}));

export type Entry = typeof entries.$inferSelect;
export type NewEntry = typeof entries.$inferInsert;
export type EntryStatus = (typeof entryStatus.enumValues)[number];
