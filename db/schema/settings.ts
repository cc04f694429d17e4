// What a chair sets for a show: fees, limits, photo requirements, and the versioned rules and
// release text entrants accept. One settings row per show; every rules version is kept.
import { boolean, integer, jsonb, pgTable, text, timestamp, uniqueIndex, uuid } from "drizzle-orm/pg-core";
import type { ResultRules } from "../../scoring/results";
import { sql } from "drizzle-orm";
import { user } from "./auth";
import { shows } from "./shows";

export const showSettings = pgTable("show_settings", {
  showId: uuid()
    .primaryKey()
    .references(() => shows.id, { onDelete: "cascade" }),
  /** After this moment the late fee applies (UTC; shown in the show's zone). */
  lateFeeFromAt: timestamp({ withTimezone: true }),
  entryFeeCents: integer().notNull().default(0),
  memberEntryFeeCents: integer().notNull().default(0),
  lateFeeCents: integer().notNull().default(0),
  critiqueFeeCents: integer().notNull().default(0),
  /** Members' e-mail addresses, kept by the chair (lower case); when any are listed, only they pay the member rate. */
  memberEmails: text().array().notNull().default(sql`'{}'::text[]`),
  /** Most one entrant pays in entry fees (late and critique fees come on top); null = no cap. */
  feeCapCents: integer(),
  /** Share of the entry fee refunded on withdrawal before entries close, in percent. */
  withdrawalRefundPercent: integer().notNull().default(100),
  currency: text().notNull().default("usd"),
  maxEntriesPerEntrant: integer(),
  /** Smallest side a quilt may have at this show (µm; 25,400 = 1 in); null = no minimum. */
  minQuiltSideUm: integer(),
  maxEntriesPerCategory: integer(),
  /** Total entries the show accepts; later ones go to the waiting list. */
  capacity: integer(),
  requiredPhotoViews: text().array().notNull().default(sql`'{full,detail}'::text[]`),
  photoMinWidthPx: integer().notNull().default(1000),
  photoMinHeightPx: integer().notNull().default(500),
  photoMaxBytes: integer().notNull().default(5_000_000),
  statementWordLimit: integer().notNull().default(150),
  /** Techniques the entry form offers. */
  techniques: text()
    .array()
    .notNull()
    .default(sql`'{pieced,appliqué,mixed,art,modern,wholecloth,paper piecing,embroidery}'::text[]`),
  juried: boolean().notNull().default(false),
  publishNames: boolean().notNull().default(true),
  replyToEmail: text().notNull().default(""),
  /** "flag": an entry fitting several categories goes to the chair; "firstByPrecedence": the first wins. */
  categoryOverlap: text().notNull().default("flag"),
  /** How far the size measured at intake may be off the registered size (µm; 25,400 = 1 in). */
  sizeToleranceUm: integer().notNull().default(25_400),
  /** Which entries get written comments: "all", "placed" (ribbon winners only) or "none". */
  commentPolicy: text().notNull().default("all"),
  /** Phrases a judge can tap into a comment. */
  quickPhrases: text().array().notNull().default(sql`'{}'::text[]`),
  /** What judges see of an entry besides its number, photos and category (never who made it). */
  judgeFields: text().array().notNull().default(sql`'{title,size,techniques,quiltingMethod,pattern}'::text[]`),
  /** How results are ranked and placed, and the ribbons; null = the defaults of scoring/results.ts. */
  resultRules: jsonb().$type<ResultRules>(),
  updatedAt: timestamp({ withTimezone: true }).notNull().defaultNow(),
});

export const showRulesVersions = pgTable(
  "show_rules_versions",
  {
    id: uuid().primaryKey().defaultRandom(),
    showId: uuid()
      .notNull()
      .references(() => shows.id, { onDelete: "cascade" }),
    version: integer().notNull(),
    rulesText: text().notNull(),
    releaseText: text().notNull(),
    publishedBy: text().references(() => user.id, { onDelete: "set null" }),
    publishedAt: timestamp({ withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [uniqueIndex("show_rules_versions_show_version").on(t.showId, t.version)],
);

/** The last entry number handed out per show, so numbers are never reused. */
export const showEntryCounters = pgTable("show_entry_counters", {
  showId: uuid()
    .primaryKey()
    .references(() => shows.id, { onDelete: "cascade" }),
  lastNumber: integer().notNull().default(100),
});

export type ShowSettings = typeof showSettings.$inferSelect;
export type RulesVersion = typeof showRulesVersions.$inferSelect;
