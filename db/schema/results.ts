// Results: the show-wide awards a show offers and who picked their winners, the chair's changes to
// the proposed placements and tie orders (each with its reason), and every publication of the
// results with the snapshot the public page and the entrants' mails read.
import { sql } from "drizzle-orm";
import { boolean, index, integer, jsonb, pgEnum, pgTable, primaryKey, text, timestamp, uniqueIndex, uuid } from "drizzle-orm/pg-core";
import type { AwardEligibility, RibbonStyle } from "../../scoring/awards";
import type { PublishedResults } from "../../scoring/results";
import { user } from "./auth";
import { categories } from "./categories";
import { entries } from "./entries";
import { shows } from "./shows";

export const awardKind = pgEnum("award_kind", ["best_of_show", "best_hand_quilting", "best_home_machine", "best_frame_machine", "judges_choice", "sponsor", "other"]);
/** Who picks the winner: the chair, or the judges' votes (a tied vote goes to the chair). */
export const awardChooser = pgEnum("award_chooser", ["chair", "judges_vote"]);

export const showAwards = pgTable(
  "show_awards",
  {
    id: uuid().primaryKey().defaultRandom(),
    showId: uuid()
      .notNull()
      .references(() => shows.id, { onDelete: "cascade" }),
    name: text().notNull(),
    kind: awardKind().notNull(),
    sponsor: text().notNull().default(""),
    eligibility: jsonb().$type<AwardEligibility>().notNull().default({}),
    chooseBy: awardChooser().notNull().default("chair"),
    ribbon: jsonb().$type<RibbonStyle>().notNull(),
    /** Other awards of the show one entry may hold together with this one (kept symmetric). */
    combinesWith: uuid().array().notNull().default(sql`'{}'::uuid[]`),
    /** False: the winner leaves its category's placings and the next entries move up. */
    keepsCategoryPlace: boolean().notNull().default(true),
    sortOrder: integer().notNull().default(0),
    createdAt: timestamp({ withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [uniqueIndex("show_awards_show_name").on(t.showId, t.name)],
);

export const awardPickKind = pgEnum("award_pick_kind", ["vote", "choice"]);

/**
 * A judge's vote or choice (judgeUserId set; one per judge and award), or the chair's choice
 * (judgeUserId null; one per award), which needs a reason when it goes against the votes.
 */
export const awardPicks = pgTable(
  "award_picks",
  {
    id: uuid().primaryKey().defaultRandom(),
    showId: uuid()
      .notNull()
      .references(() => shows.id, { onDelete: "cascade" }),
    awardId: uuid()
      .notNull()
      .references(() => showAwards.id, { onDelete: "cascade" }),
    entryId: uuid()
      .notNull()
      .references(() => entries.id, { onDelete: "cascade" }),
    judgeUserId: text().references(() => user.id, { onDelete: "cascade" }),
    kind: awardPickKind().notNull(),
    reason: text().notNull().default(""),
    recordedBy: text().references(() => user.id, { onDelete: "set null" }),
    recordedAt: timestamp({ withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [uniqueIndex("award_picks_one_per_judge").on(t.awardId, sql`coalesce(${t.judgeUserId}, '')`), index("award_picks_show").on(t.showId)],
);

/** The chair's placement for one entry in its category, replacing the proposed one. */
export const placementOverrides = pgTable(
  "placement_overrides",
  {
    entryId: uuid()
      .primaryKey()
      .references(() => entries.id, { onDelete: "cascade" }),
    showId: uuid()
      .notNull()
      .references(() => shows.id, { onDelete: "cascade" }),
    categoryId: uuid()
      .notNull()
      .references(() => categories.id, { onDelete: "cascade" }),
    /** 1 = 1st…; null = no place. */
    place: integer(),
    honorableMention: boolean().notNull().default(false),
    reason: text().notNull(),
    decidedBy: text().references(() => user.id, { onDelete: "set null" }),
    decidedAt: timestamp({ withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [index("placement_overrides_show").on(t.showId)],
);

/** The chair's order for entries still tied after the other tie-breaks (the "chair" link of the chain). */
export const tieOrders = pgTable("tie_orders", {
  categoryId: uuid()
    .primaryKey()
    .references(() => categories.id, { onDelete: "cascade" }),
  showId: uuid()
    .notNull()
    .references(() => shows.id, { onDelete: "cascade" }),
  entryIds: uuid().array().notNull(),
  reason: text().notNull(),
  decidedBy: text().references(() => user.id, { onDelete: "set null" }),
  decidedAt: timestamp({ withTimezone: true }).notNull().defaultNow(),
});

/** Each time the results went out; the current one is the latest not unpublished. */
export const resultPublications = pgTable(
  "result_publications",
  {
    id: uuid().primaryKey().defaultRandom(),
    showId: uuid()
      .notNull()
      .references(() => shows.id, { onDelete: "cascade" }),
    version: integer().notNull(),
    snapshot: jsonb().$type<PublishedResults>().notNull(),
    /** Why it was published again (empty for the first publication). */
    reason: text().notNull().default(""),
    publishedBy: text().references(() => user.id, { onDelete: "set null" }),
    publishedAt: timestamp({ withTimezone: true }).notNull().defaultNow(),
    unpublishedAt: timestamp({ withTimezone: true }),
    unpublishedBy: text().references(() => user.id, { onDelete: "set null" }),
    unpublishReason: text().notNull().default(""),
  },
  (t) => [
    uniqueIndex("result_publications_show_version").on(t.showId, t.version),
    uniqueIndex("result_publications_one_current").on(t.showId).where(sql`${t.unpublishedAt} is null`),
  ],
);

/** The results mail to each entrant for a publication: sent once, its failure kept for a retry. */
export const resultMails = pgTable(
  "result_mails",
  {
    publicationId: uuid()
      .notNull()
      .references(() => resultPublications.id, { onDelete: "cascade" }),
    entrantUserId: text()
      .notNull()
      .references(() => user.id, { onDelete: "cascade" }),
    sentAt: timestamp({ withTimezone: true }),
    error: text().notNull().default(""),
    createdAt: timestamp({ withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [primaryKey({ columns: [t.publicationId, t.entrantUserId] })],
);

export type ShowAward = typeof showAwards.$inferSelect;
export type AwardPick = typeof awardPicks.$inferSelect;
export type ResultPublication = typeof resultPublications.$inferSelect;
