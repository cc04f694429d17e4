// Who is judged, as SQL, for every judges' list (queue, session, sync, photos, progress board,
// results) and the stage checks; the same rule as scoring/judged-entries.ts. Also the chair's
// recorded exception: judge an entry although it is not paid (or not accepted at a juried show).
import "server-only";
import { and, eq, isNotNull, notInArray, or, sql, type SQL } from "drizzle-orm";
import { db } from "@/db/client";
import { entries, showSettings } from "@/db/schema";
import { writeAudit } from "@/db/queries/audit";
import { conflict, notFound } from "@/lib/errors";
import { requireShowRole, type Viewer } from "@/lib/session";
import { ACCEPTED_OR_LATER, NEVER_JUDGED, RECEIPT_REQUIRED } from "@/scoring/judged-entries";

const juriedShow = sql`exists (select 1 from ${showSettings} where ${showSettings.showId} = ${entries.showId} and ${showSettings.juried})`;
const acceptedList = sql.join(ACCEPTED_OR_LATER.map((s) => sql`${s}`), sql`, `);

/** Received at drop-off: always true until the check-in exists (see RECEIPT_REQUIRED). */
const receivedSql: SQL = RECEIPT_REQUIRED ? sql`false` : sql`true`;

/** Paid (accepted at a juried show) and, once check-in exists, received. */
export const clearedSql: SQL = sql`((case when ${juriedShow} then ${entries.status}::text in (${acceptedList}) else ${entries.paidAt} is not null end) and ${receivedSql})`;

/** Sent, still in the show and entered for judging, whether cleared or not. */
export function forJudging(showId: string): SQL {
  return and(eq(entries.showId, showId), eq(entries.judged, true), notInArray(entries.status, [...NEVER_JUDGED]), isNotNull(entries.entryNumber))!;
}

/** The judged entries of a show: for judging, and cleared or excepted by the chair. */
export function judgedEntries(showId: string): SQL {
  return and(forJudging(showId), or(clearedSql, isNotNull(entries.judgeAnywayAt)))!;
}

/** The chair records (or takes back, `judge: false`) an exception for one entry, with a reason. */
export async function setJudgeAnyway(viewer: Viewer, slug: string, input: { entryId: string; judge: boolean; reason: string }) {
  const { showId } = await requireShowRole(viewer, slug, ["chair"]);
  return db.transaction(async (tx) => {
    const [row] = await tx
      .select({ id: entries.id, entryNumber: entries.entryNumber, status: entries.status, judged: entries.judged, judgeAnywayAt: entries.judgeAnywayAt, judgeAnywayReason: entries.judgeAnywayReason })
      .from(entries)
      .where(and(eq(entries.id, input.entryId), eq(entries.showId, showId)))
      .for("update");
    if (!row) throw notFound("There is no such entry at this show.");
    if ((NEVER_JUDGED as readonly string[]).includes(row.status) || row.entryNumber === null) throw conflict(`This entry is ${row.status}, so it can't be judged.`);
    if (!row.judged) throw conflict("This quilt is entered for display only, so it isn't judged.");
    if (input.judge === (row.judgeAnywayAt !== null)) return { entryNumber: row.entryNumber, changed: false };
    const now = new Date();
    await tx
      .update(entries)
      .set(input.judge ? { judgeAnywayAt: now, judgeAnywayReason: input.reason, judgeAnywayBy: viewer.id, updatedAt: now } : { judgeAnywayAt: null, judgeAnywayReason: "", judgeAnywayBy: null, updatedAt: now })
      .where(eq(entries.id, row.id));
    await writeAudit(tx, {
      actorUserId: viewer.id,
      showId,
      action: input.judge ? "entry.judge_anyway" : "entry.judge_anyway_removed",
      subjectType: "entry",
      subjectId: row.id,
      before: { judgeAnyway: row.judgeAnywayAt !== null, reason: row.judgeAnywayReason },
      after: { judgeAnyway: input.judge, reason: input.reason },
    });
    return { entryNumber: row.entryNumber, changed: true };
  });
}

/** Entries for judging that are not cleared, with or without an exception: the chair's list. */
export async function unclearedForChair(viewer: Viewer, slug: string) {
  const { showId } = await requireShowRole(viewer, slug, ["chair"]);
  return db
    .select({ id: entries.id, entryNumber: entries.entryNumber, title: entries.title, status: entries.status, judgeAnywayAt: entries.judgeAnywayAt, judgeAnywayReason: entries.judgeAnywayReason })
    .from(entries)
    .where(and(forJudging(showId), sql`not ${clearedSql}`))
    .orderBy(entries.entryNumber);
}
