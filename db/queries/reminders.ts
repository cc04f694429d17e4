// The chair sends the drop-off reminder to every entrant with quilts expected at drop-off.
import "server-only";
import { and, eq, inArray } from "drizzle-orm";
import { db } from "@/db/client";
import { writeAudit } from "@/db/queries/audit";
import { settingsForShowId } from "@/db/queries/settings";
import { entries } from "@/db/schema";
import { sendDropOffReminderMail } from "@/lib/entry-mails";
import { requireShowRole, type Viewer } from "@/lib/session";
import { errorSummary } from "@/lib/error-log";

export async function sendDropOffReminders(viewer: Viewer, showSlug: string): Promise<{ sent: number; failed: number }> {
  const show = await requireShowRole(viewer, showSlug, ["chair"]);
  const settings = await settingsForShowId(show.showId);
  // The same rule as the mail itself: at a juried show only accepted quilts come in.
  const expected = settings.juried ? (["accepted"] as const) : (["paid", "accepted"] as const);
  const people = await db
    .selectDistinct({ userId: entries.entrantUserId })
    .from(entries)
    .where(and(eq(entries.showId, show.showId), inArray(entries.status, [...expected])));
  let sent = 0;
  let failed = 0;
  for (const p of people) {
    try {
      await sendDropOffReminderMail(show.showId, p.userId);
      sent++;
    } catch (err) {
      failed++;
      console.error("[reminders] drop-off reminder failed", { showId: show.showId, userId: p.userId }, errorSummary(err));
    }
  }
  await db.transaction((tx) =>
    writeAudit(tx, { actorUserId: viewer.id, showId: show.showId, action: "reminders.drop_off_sent", subjectType: "show", subjectId: show.showId, after: { sent, failed } }),
  );
  return { sent, failed };
}
