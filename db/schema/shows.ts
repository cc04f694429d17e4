// Shows, the people who run them (per-show roles) and invitations to those roles.
import { relations, sql } from "drizzle-orm";
import { check, index, pgEnum, pgTable, text, timestamp, uniqueIndex, uuid } from "drizzle-orm/pg-core";
import { user } from "./auth";

export const showStatus = pgEnum("show_status", [
  "draft", // being set up by the chair; not public
  "entries_open",
  "entries_closed",
  "judging",
  "results_published",
  "archived",
]);

export const showRole = pgEnum("show_role", ["chair", "judge", "scribe", "intake"]);

export const shows = pgTable(
  "shows",
  {
    id: uuid().primaryKey().defaultRandom(),
    slug: text().notNull().unique(),
    name: text().notNull(),
    guildName: text().notNull(),
    venueName: text().notNull(),
    venueAddress: text().notNull().default(""),
    /** IANA zone; every timestamp below is stored in UTC and shown in this zone. */
    timeZone: text().notNull(),
    entryOpensAt: timestamp({ withTimezone: true }),
    entryClosesAt: timestamp({ withTimezone: true }),
    dropOffStartsAt: timestamp({ withTimezone: true }),
    dropOffEndsAt: timestamp({ withTimezone: true }),
    judgingStartsAt: timestamp({ withTimezone: true }),
    judgingEndsAt: timestamp({ withTimezone: true }),
    showOpensAt: timestamp({ withTimezone: true }),
    showClosesAt: timestamp({ withTimezone: true }),
    pickUpStartsAt: timestamp({ withTimezone: true }),
    pickUpEndsAt: timestamp({ withTimezone: true }),
    status: showStatus().notNull().default("draft"),
    createdAt: timestamp({ withTimezone: true }).notNull().defaultNow(),
    updatedAt: timestamp({ withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [check("shows_slug_format", sql`${t.slug} ~ '^[a-z0-9]+(-[a-z0-9]+)*$'`)],
);

export const showRoles = pgTable(
  "show_roles",
  {
    id: uuid().primaryKey().defaultRandom(),
    showId: uuid()
      .notNull()
      .references(() => shows.id, { onDelete: "cascade" }),
    userId: text()
      .notNull()
      .references(() => user.id, { onDelete: "cascade" }),
    role: showRole().notNull(),
    grantedBy: text().references(() => user.id, { onDelete: "set null" }),
    createdAt: timestamp({ withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [
    uniqueIndex("show_roles_user_show_role").on(t.userId, t.showId, t.role),
    index("show_roles_show").on(t.showId),
  ],
);

export const showInvitations = pgTable(
  "show_invitations",
  {
    id: uuid().primaryKey().defaultRandom(),
    showId: uuid()
      .notNull()
      .references(() => shows.id, { onDelete: "cascade" }),
    email: text().notNull(),
    role: showRole().notNull(),
    /** SHA-256 of the token in the link; the token itself is only ever in the e-mail. */
    tokenHash: text().notNull().unique(),
    invitedBy: text().references(() => user.id, { onDelete: "set null" }),
    expiresAt: timestamp({ withTimezone: true }).notNull(),
    acceptedAt: timestamp({ withTimezone: true }),
    acceptedBy: text().references(() => user.id, { onDelete: "set null" }),
    revokedAt: timestamp({ withTimezone: true }),
    createdAt: timestamp({ withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [index("show_invitations_show").on(t.showId)],
);

export const showsRelations = relations(shows, ({ many }) => ({
  roles: many(showRoles),
  invitations: many(showInvitations),
}));

export const showRolesRelations = relations(showRoles, ({ one }) => ({
  show: one(shows, { fields: [showRoles.showId], references: [shows.id] }),
  user: one(user, { fields: [showRoles.userId], references: [user.id] }),
}));

export type Show = typeof shows.$inferSelect;
export type NewShow = typeof shows.$inferInsert;
export type ShowRole = (typeof showRole.enumValues)[number];
export type ShowStatus = (typeof showStatus.enumValues)[number];
export const SHOW_ROLES = showRole.enumValues;
