// Judging: the show's score sheets, panels of judges and scribes with their categories and
// sessions, the people a judge declared (so they never judge them), each judge's sheet per entry
// and every change a tablet sent for it.
import { sql } from "drizzle-orm";
import { bigserial, boolean, index, integer, jsonb, pgEnum, pgTable, primaryKey, text, timestamp, uniqueIndex, uuid } from "drizzle-orm/pg-core";
import type { ScoreSheet } from "../../scoring/score-sheets";
import type { ChangeOutcome, Json, SheetState } from "../../scoring/sheet-sync";
import { user } from "./auth";
import { entries } from "./entries";
import { shows } from "./shows";

export const scoreSheets = pgTable(
  "score_sheets",
  {
    id: uuid().primaryKey().defaultRandom(),
    showId: uuid()
      .notNull()
      .references(() => shows.id, { onDelete: "cascade" }),
    name: text().notNull(),
    sheet: jsonb().$type<ScoreSheet>().notNull(),
    /** The sheet categories use unless they name another. One per show. */
    isDefault: boolean().notNull().default(false),
    createdAt: timestamp({ withTimezone: true }).notNull().defaultNow(),
    updatedAt: timestamp({ withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [
    uniqueIndex("score_sheets_show_name").on(t.showId, t.name),
    uniqueIndex("score_sheets_one_default").on(t.showId).where(sql`${t.isDefault}`),
  ],
);

/** How a category is judged: points only; a sorting pass (kept / set aside) then points or ranks; ranks only. */
export const judgingMethod = pgEnum("judging_method", ["points", "sort_then_points", "sort_then_rank", "rank"]);

export const judgingPanels = pgTable(
  "judging_panels",
  {
    id: uuid().primaryKey().defaultRandom(),
    showId: uuid()
      .notNull()
      .references(() => shows.id, { onDelete: "cascade" }),
    name: text().notNull(),
    /** The session: a day (YYYY-MM-DD in the show's zone) and a room or table. */
    day: text().notNull().default(""),
    room: text().notNull().default(""),
    createdAt: timestamp({ withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [uniqueIndex("judging_panels_show_name").on(t.showId, t.name)],
);

export const panelRole = pgEnum("panel_role", ["judge", "scribe"]);

export const panelMembers = pgTable(
  "panel_members",
  {
    panelId: uuid()
      .notNull()
      .references(() => judgingPanels.id, { onDelete: "cascade" }),
    userId: text()
      .notNull()
      .references(() => user.id, { onDelete: "cascade" }),
    role: panelRole().notNull(),
  },
  (t) => [primaryKey({ columns: [t.panelId, t.userId] }), index("panel_members_user").on(t.userId)],
);

export const panelCategories = pgTable(
  "panel_categories",
  {
    panelId: uuid()
      .notNull()
      .references(() => judgingPanels.id, { onDelete: "cascade" }),
    categoryId: uuid().notNull(),
  },
  (t) => [primaryKey({ columns: [t.panelId, t.categoryId] }), index("panel_categories_category").on(t.categoryId)],
);

/** Someone a judge must not judge: a household member, a student, a client. */
export const judgeDeclarations = pgTable(
  "judge_declarations",
  {
    id: uuid().primaryKey().defaultRandom(),
    showId: uuid()
      .notNull()
      .references(() => shows.id, { onDelete: "cascade" }),
    judgeUserId: text()
      .notNull()
      .references(() => user.id, { onDelete: "cascade" }),
    personName: text().notNull().default(""),
    personEmail: text().notNull().default(""),
    relation: text().notNull(),
    createdAt: timestamp({ withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [index("judge_declarations_show_judge").on(t.showId, t.judgeUserId)],
);

/**
 * A judge who may not judge an entry (their own, or a declared person's), found when something
 * changed (a declaration, a submission, a category move), with the chair's decision once made:
 * "allowed" (with a reason) or "moved" (the judge was taken off the panel). Only the chair sees
 * these; the judge is never told whether a declaration matched.
 */
export const judgeConflictRecords = pgTable(
  "judge_conflicts",
  {
    id: uuid().primaryKey().defaultRandom(),
    showId: uuid()
      .notNull()
      .references(() => shows.id, { onDelete: "cascade" }),
    judgeUserId: text()
      .notNull()
      .references(() => user.id, { onDelete: "cascade" }),
    entryId: uuid()
      .notNull()
      .references(() => entries.id, { onDelete: "cascade" }),
    reason: text().notNull(),
    foundWhen: text().notNull(),
    foundAt: timestamp({ withTimezone: true }).notNull().defaultNow(),
    decision: text(),
    decisionReason: text().notNull().default(""),
    decidedBy: text().references(() => user.id, { onDelete: "set null" }),
    decidedAt: timestamp({ withTimezone: true }),
  },
  (t) => [uniqueIndex("judge_conflicts_judge_entry").on(t.judgeUserId, t.entryId), index("judge_conflicts_show").on(t.showId)],
);

export const sheetStatus = pgEnum("sheet_status", ["open", "submitted"]);

/** One judge's sheet for one entry: the merged state of every change (scoring/sheet-sync.ts). */
export const judgeSheets = pgTable(
  "judge_sheets",
  {
    id: uuid().primaryKey().defaultRandom(),
    showId: uuid()
      .notNull()
      .references(() => shows.id, { onDelete: "cascade" }),
    entryId: uuid()
      .notNull()
      .references(() => entries.id, { onDelete: "cascade" }),
    judgeUserId: text()
      .notNull()
      .references(() => user.id, { onDelete: "restrict" }),
    scoreSheetId: uuid().references(() => scoreSheets.id, { onDelete: "set null" }),
    status: sheetStatus().notNull().default("open"),
    version: integer().notNull().default(0),
    state: jsonb().$type<SheetState>().notNull(),
    /** The sheet total (normally out of 100) when submitted; recomputed on every change. */
    total: jsonb().$type<Json>(),
    submittedAt: timestamp({ withTimezone: true }),
    reopenedAt: timestamp({ withTimezone: true }),
    reopenReason: text().notNull().default(""),
    updatedAt: timestamp({ withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [uniqueIndex("judge_sheets_entry_judge").on(t.entryId, t.judgeUserId), index("judge_sheets_show_judge").on(t.showId, t.judgeUserId)],
);

/** Every change a device sent, once per idempotency key, with who entered it and for whom. */
export const scoreChanges = pgTable(
  "score_changes",
  {
    id: bigserial({ mode: "number" }).primaryKey(),
    showId: uuid().notNull(),
    sheetId: uuid()
      .notNull()
      .references(() => judgeSheets.id, { onDelete: "cascade" }),
    changeKey: text().notNull().unique(),
    deviceId: text().notNull(),
    seq: integer().notNull(),
    kind: text().notNull(),
    field: text(),
    value: jsonb().$type<Json>(),
    baseVersion: integer(),
    enteredBy: text().notNull(),
    forJudge: text().notNull(),
    clientAt: timestamp({ withTimezone: true }),
    receivedAt: timestamp({ withTimezone: true }).notNull().defaultNow(),
    outcome: jsonb().$type<ChangeOutcome>().notNull(),
  },
  (t) => [index("score_changes_sheet").on(t.sheetId, t.id)],
);

export type JudgeSheetRow = typeof judgeSheets.$inferSelect;
export type ScoreSheetRow = typeof scoreSheets.$inferSelect;
