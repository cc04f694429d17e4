// The append-only record of who changed what. A trigger in the migrations refuses UPDATE and DELETE.
import { bigserial, index, jsonb, pgTable, text, timestamp, uuid } from "drizzle-orm/pg-core";

export const auditLog = pgTable(
  "audit_log",
  {
    id: bigserial({ mode: "number" }).primaryKey(),
    // No foreign keys: the log outlives the rows it speaks of, and a cascading
    // "set null" would be an UPDATE, which the append-only trigger refuses.
    actorUserId: text(),
    showId: uuid(),
    action: text().notNull(),
    subjectType: text().notNull(),
    subjectId: text().notNull(),
    before: jsonb(),
    after: jsonb(),
    at: timestamp({ withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [index("audit_log_show_at").on(t.showId, t.at), index("audit_log_subject").on(t.subjectType, t.subjectId)],
);

export type AuditEntry = typeof auditLog.$inferSelect;
