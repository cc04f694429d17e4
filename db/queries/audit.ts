// Writing the audit log, always inside the transaction of the change it records.
import "server-only";
import type { Tx } from "@/db/client";
import { auditLog } from "@/db/schema";

export type AuditInput = {
  actorUserId: string | null;
  showId: string | null;
  action: string;
  subjectType: string;
  subjectId: string;
  before?: unknown;
  after?: unknown;
};

export async function writeAudit(tx: Tx, entry: AuditInput): Promise<void> {
  await tx.insert(auditLog).values({
    ...entry,
    before: entry.before ?? null,
    after: entry.after ?? null,
  });
}
