// The entrant asks for (or stops asking for) a judge's critique of a sent entry on "My entries",
// while the show takes entries. Asking after the entry fee was paid leaves a critique fee due,
// paid through its own checkout line (db/queries/payments.ts).
import "server-only";
import { and, eq } from "drizzle-orm";
import { db } from "@/db/client";
import { writeAudit } from "@/db/queries/audit";
import { critiqueLinesPaid, expireOpenPaymentsFor } from "@/db/queries/payments";
import { settingsForShowId } from "@/db/queries/settings";
import { entrantMayWithdraw } from "@/db/queries/withdrawals";
import { entries, shows } from "@/db/schema";
import { conflict, notFound } from "@/lib/errors";
import { isUuid } from "@/lib/ids";
import type { Viewer } from "@/lib/session";
import { paidOnline } from "@/scoring/fees";

/** Sent entries whose critique request the entrant may still change (until intake). */
const CHANGEABLE = new Set(["submitted", "paid", "accepted"]);

export const CRITIQUE_CLOSED_MESSAGE = "Entries are closed, so the critique request can't be changed now; ask the show chair.";

export async function setCritiqueRequest(viewer: Viewer, entryId: string, requested: boolean, now = new Date()): Promise<{ message: string }> {
  if (!isUuid(entryId)) throw notFound("That entry was not found among yours.");
  const [found] = await db.select({ showId: entries.showId }).from(entries).where(and(eq(entries.id, entryId), eq(entries.entrantUserId, viewer.id)));
  if (!found) throw notFound("That entry was not found among yours.");
  const settings = await settingsForShowId(found.showId);
  return db.transaction(async (tx) => {
    const [entry] = await tx
      .select({ id: entries.id, showId: entries.showId, status: entries.status, critiqueRequested: entries.critiqueRequested, paidAt: entries.paidAt, paymentReference: entries.paymentReference, showStatus: shows.status, closesAt: shows.entryClosesAt })
      .from(entries)
      .innerJoin(shows, eq(shows.id, entries.showId))
      .where(and(eq(entries.id, entryId), eq(entries.entrantUserId, viewer.id)))
      .for("update", { of: entries });
    if (!entry) throw notFound("That entry was not found among yours.");
    if (entry.status === "draft") throw conflict("This entry has not been sent yet; ask for a critique on its About step.");
    if (!CHANGEABLE.has(entry.status)) throw conflict(`This entry is ${entry.status}; the critique request can't be changed now.`);
    if (!entrantMayWithdraw({ status: entry.showStatus, entryClosesAt: entry.closesAt }, now)) throw conflict(CRITIQUE_CLOSED_MESSAGE);
    if (entry.critiqueRequested === requested) return { message: requested ? "A critique is already asked for." : "No critique is asked for." };
    const linePaid = (await critiqueLinesPaid(tx, [entry.id])).has(entry.id);
    if (!requested && linePaid) throw conflict("The critique fee for this entry is paid; to cancel the critique, ask the show chair.");
    if (requested && entry.paidAt !== null && settings.critiqueFeeCents > 0 && !paidOnline(entry.paymentReference)) {
      throw conflict("This entry was paid to the show directly; ask the show chair to add a critique.");
    }
    // A checkout still open for this entry was priced without (or with) the critique: it must not be paid as it stands.
    await expireOpenPaymentsFor(tx, viewer.id, [entry.id]);
    await tx.update(entries).set({ critiqueRequested: requested, updatedAt: now }).where(eq(entries.id, entry.id));
    await writeAudit(tx, {
      actorUserId: viewer.id,
      showId: entry.showId,
      action: requested ? "entry.critique_requested" : "entry.critique_cancelled",
      subjectType: "entry",
      subjectId: entry.id,
      before: { critiqueRequested: entry.critiqueRequested },
      after: { critiqueRequested: requested },
    });
    const due = requested && entry.paidAt !== null && settings.critiqueFeeCents > 0;
    return { message: requested ? (due ? "Critique asked for. Pay the critique fee below." : "Critique asked for.") : "Critique request removed." };
  });
}
