// A show's categories: each is a rule (all of a list of conditions, see scoring/categories.ts)
// kept as JSON, with its place in the order, an optional cap and, after a merge, the category
// that took its entries over.
import { sql } from "drizzle-orm";
import { check, foreignKey, index, integer, jsonb, pgTable, text, timestamp, uniqueIndex, uuid } from "drizzle-orm/pg-core";
import { judgingMethod, scoreSheets } from "./judging";
import type { Condition } from "../../scoring/categories";
import { shows } from "./shows";

export const categories = pgTable(
  "categories",
  {
    id: uuid().primaryKey().defaultRandom(),
    showId: uuid()
      .notNull()
      .references(() => shows.id, { onDelete: "cascade" }),
    code: text().notNull(),
    name: text().notNull(),
    description: text().notNull().default(""),
    /** Lower comes first in lists (and wins overlaps when the show opts in). */
    precedence: integer().notNull(),
    conditions: jsonb().$type<Condition[]>().notNull(),
    /** Most entries the category takes; later ones wait. Null: no cap. */
    cap: integer(),
    /** Set when the chair merged this category into another: its entries belong there now. */
    mergedIntoId: uuid(),
    /** The score sheet judges use here; null: the show's default sheet. */
    scoreSheetId: uuid().references(() => scoreSheets.id, { onDelete: "set null" }),
    judgingMethod: judgingMethod().notNull().default("points"),
    createdAt: timestamp({ withTimezone: true }).notNull().defaultNow(),
    updatedAt: timestamp({ withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [
    uniqueIndex("categories_show_code").on(t.showId, t.code),
    index("categories_show").on(t.showId),
    foreignKey({ columns: [t.mergedIntoId], foreignColumns: [t.id], name: "categories_merged_into_fk" }).onDelete("set null"),
    check("categories_cap_positive", sql`${t.cap} is null or ${t.cap} > 0`),
    check("categories_not_merged_into_self", sql`${t.mergedIntoId} is null or ${t.mergedIntoId} <> ${t.id}`),
  ],
);

export type CategoryRow = typeof categories.$inferSelect;
