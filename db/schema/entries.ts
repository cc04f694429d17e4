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
import { categories } from "./categories";
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

/**
 * How the entry's category was settled: not yet (a draft, or a show with no categories), by the
 * rules (one category), the rules found none or several (the chair's queue), or the chair chose.
 */
export const categoryState = pgEnum("category_state", ["undecided", "decided", "fits_none", "fits_several", "overridden"]);

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
    /** The unit the entrant typed the size in, so the form shows it back the same way. */
    sizeUnit: text().notNull().default("in"),
    patternName: text().notNull().default(""),
    patternDesigner: text().notNull().default(""),
    forSale: boolean().notNull().default(false),
    priceCents: integer(),
    youthAge: integer(),
    critiqueRequested: boolean().notNull().default(false),
    /** Which rules/release text the entrant accepted, and when. */
    rulesVersionId: uuid(),
    rulesAcceptedAt: timestamp({ withTimezone: true }),
    submittedAt: timestamp({ withTimezone: true }),
    /** Over the show's capacity when submitted: waits for a place. */
    waitlisted: boolean().notNull().default(false),
    decisionReason: text().notNull().default(""),
    /** Jurying: the chair's decision is recorded here and mailed only when released. */
    decisionReleasedAt: timestamp({ withTimezone: true }),
    paidAt: timestamp({ withTimezone: true }),
    /** "stripe" or an offline reference such as "cash" / "cheque 1042". */
    paymentReference: text().notNull().default(""),
    withdrawnAt: timestamp({ withTimezone: true }),
    judged: boolean().notNull().default(true),
    /**
     * The chair's recorded exception: judge this entry although it is not paid (or not accepted at
     * a juried show). Null = no exception; the reason is kept here and in the audit row.
     */
    judgeAnywayAt: timestamp({ withTimezone: true }),
    judgeAnywayReason: text().notNull().default(""),
    judgeAnywayBy: text().references(() => user.id, { onDelete: "set null" }),
    division: division().notNull().default("open"),
    categoryId: uuid().references(() => categories.id, { onDelete: "set null" }),
    categoryState: categoryState().notNull().default("undecided"),
    /** The decision's reasons in plain words, as shown to the entrant and the chair. */
    categoryReasons: text().array().notNull().default(sql`'{}'::text[]`),
    /** For "fits several": the categories it fits. */
    categoryCandidateIds: uuid().array().notNull().default(sql`'{}'::uuid[]`),
    categoryOverrideReason: text().notNull().default(""),
    categoryDecidedAt: timestamp({ withTimezone: true }),
    /** Why the entry waits, e.g. "Category 10 is full (cap 20)". */
    waitlistReason: text().notNull().default(""),
    /** Re-measured at intake (µm), by whom and when. */
    measuredWidthUm: integer(),
    measuredLengthUm: integer(),
    measuredAt: timestamp({ withTimezone: true }),
    measuredBy: text().references(() => user.id, { onDelete: "set null" }),
    /** Set when the measured size is off the registered one by more than the show's tolerance. */
    sizeFlag: text().notNull().default(""),
    sizeFlagReviewedAt: timestamp({ withTimezone: true }),
    status: entryStatus().notNull().default("draft"),
    createdAt: timestamp({ withTimezone: true }).notNull().defaultNow(),
    updatedAt: timestamp({ withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [
    uniqueIndex("entries_show_number").on(t.showId, t.entryNumber),
    index("entries_entrant").on(t.entrantUserId),
    index("entries_show_category").on(t.showId, t.categoryId),
    check("entries_measured_positive", sql`(${t.measuredWidthUm} is null) = (${t.measuredLengthUm} is null) and coalesce(${t.measuredWidthUm}, 1) > 0 and coalesce(${t.measuredLengthUm}, 1) > 0`),
    check("entries_size_positive", sql`${t.widthUm} > 0 and ${t.lengthUm} > 0`),
    check("entries_value_nonnegative", sql`${t.declaredValueCents} >= 0`),
    check("entries_size_unit", sql`${t.sizeUnit} in ('in', 'cm')`),
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
    /** Object keys in the private photo bucket: the stripped original, the web size, the thumbnail. */
    storageKey: text().notNull().unique(),
    webKey: text(),
    thumbKey: text(),
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
  category: one(categories, { fields: [entries.categoryId], references: [categories.id] }),
  photos: many(entryPhotos),
}));

export const entryPhotosRelations = relations(entryPhotos, ({ one }) => ({
  entry: one(entries, { fields: [entryPhotos.entryId], references: [entries.id] }),
}));

export type Entry = typeof entries.$inferSelect;
export type NewEntry = typeof entries.$inferInsert;
export type CategoryState = (typeof categoryState.enumValues)[number];
export type EntryStatus = (typeof entryStatus.enumValues)[number];
