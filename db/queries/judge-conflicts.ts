// Judges' conflicts with entries: a judge's own quilt, or one by a person they declared, in a
// category they judge. Found again whenever something changes (a declaration, a submission, a
// category move), kept for the chair with the chair's decision, checked before judging starts and
// on every sheet change. Only the chair ever learns that a declaration matched someone.
import "server-only";
import { and, asc, eq, inArray, notInArray, sql } from "drizzle-orm";
import { db, type Tx } from "@/db/client";
import { categories, entries, judgeConflictRecords, judgeDeclarations, judgingPanels, panelCategories, panelMembers, user } from "@/db/schema";
import { writeAudit } from "@/db/queries/audit";
import { conflict, notFound } from "@/lib/errors";
import { requireShowRole, type Viewer } from "@/lib/session";
import { errorSummary } from "@/lib/error-log";

/** Entries that take part in judging: sent, judged, not withdrawn or declined. */
export const JUDGED_OUT = ["draft", "withdrawn", "declined"] as const;

type Reader = Pick<Tx, "select">;
export type Seat = { judgeUserId: string; categoryId: string };
export type ConflictPair = { judgeUserId: string; judgeName: string; entryId: string; entryNumber: number | null; categoryId: string; category: string; reason: string };
export type FoundWhen = "declaration" | "submission" | "category_move";

const fold = (s: string) => s.normalize("NFD").replace(/[\u0300-\u036f]/g, "").toLowerCase().replace(/\s+/g, " ").trim();

/**
 * For each seat (a judge judging a category), the entries there the judge may not judge, with
 * the reason in the chair's words. Matched by the entrant's account, a maker's or quilter's name
 * equal to the judge's, or a declared person (the entrant's account e-mail, a maker's or
 * quilter's name). Pairs the chair allowed are left out unless `withAllowed`.
 */
export async function conflictsForSeats(reader: Reader, showId: string, seats: readonly Seat[], opts: { entryIds?: readonly string[]; withAllowed?: boolean } = {}): Promise<ConflictPair[]> {
  if (!seats.length || opts.entryIds?.length === 0) return [];
  const judgeIds = [...new Set(seats.map((s) => s.judgeUserId))];
  const categoryIds = [...new Set(seats.map((s) => s.categoryId))];
  const [judges, declared, rows, allowed] = await Promise.all([
    reader.select({ id: user.id, name: user.name }).from(user).where(inArray(user.id, judgeIds)),
    reader.select().from(judgeDeclarations).where(and(eq(judgeDeclarations.showId, showId), inArray(judgeDeclarations.judgeUserId, judgeIds))),
    reader
      .select({ id: entries.id, entryNumber: entries.entryNumber, categoryId: entries.categoryId, entrantUserId: entries.entrantUserId, entrantEmail: user.email, madeBy: entries.madeBy, quiltedBy: entries.quiltedBy, code: categories.code, name: categories.name })
      .from(entries)
      .innerJoin(categories, eq(categories.id, entries.categoryId))
      .innerJoin(user, eq(user.id, entries.entrantUserId))
      .where(and(eq(entries.showId, showId), inArray(entries.categoryId, categoryIds), notInArray(entries.status, [...JUDGED_OUT]), ...(opts.entryIds ? [inArray(entries.id, [...opts.entryIds])] : [])))
      .orderBy(asc(entries.entryNumber)),
    opts.withAllowed
      ? Promise.resolve([])
      : reader.select({ judgeUserId: judgeConflictRecords.judgeUserId, entryId: judgeConflictRecords.entryId }).from(judgeConflictRecords).where(and(eq(judgeConflictRecords.showId, showId), eq(judgeConflictRecords.decision, "allowed"), inArray(judgeConflictRecords.judgeUserId, judgeIds))),
  ]);
  const isAllowed = new Set(allowed.map((a) => `${a.judgeUserId}|${a.entryId}`));
  const seated = new Set(seats.map((s) => `${s.judgeUserId}|${s.categoryId}`));
  const out: ConflictPair[] = [];
  for (const j of judges) {
    const mine = declared.filter((d) => d.judgeUserId === j.id);
    for (const r of rows) {
      if (!seated.has(`${j.id}|${r.categoryId}`) || isAllowed.has(`${j.id}|${r.id}`)) continue;
      const where = `${r.code} ${r.name}`;
      const people = [...r.madeBy, r.quiltedBy].map(fold).filter(Boolean);
      let reason: string | null = null;
      if (r.entrantUserId === j.id || people.includes(fold(j.name))) reason = `${j.name} has an entry in ${where}, so can't judge it.`;
      for (const d of mine) {
        if (reason) break;
        const byEmail = d.personEmail && fold(d.personEmail) === fold(r.entrantEmail);
        const byName = d.personName && people.includes(fold(d.personName));
        if (byEmail || byName) reason = `${j.name} declared ${d.personName || d.personEmail} (${d.relation}), who has an entry in ${where}.`;
      }
      if (reason) out.push({ judgeUserId: j.id, judgeName: j.name, entryId: r.id, entryNumber: r.entryNumber, categoryId: r.categoryId!, category: where, reason });
    }
  }
  return out;
}

/**
 * Why these judges may not judge these categories (every judge × every category): used when the
 * chair saves a panel, so a conflict is refused before anyone is seated.
 */
export async function judgeConflicts(reader: Reader, showId: string, judgeIds: readonly string[], categoryIds: readonly string[]): Promise<string[]> {
  const seats = judgeIds.flatMap((judgeUserId) => categoryIds.map((categoryId) => ({ judgeUserId, categoryId })));
  return [...new Set((await conflictsForSeats(reader, showId, seats)).map((c) => c.reason))];
}

/** The seats judges hold now through the show's panels, narrowed to some judges or categories. */
export async function seatsOfShow(reader: Reader, showId: string, filter: { judgeIds?: readonly string[]; categoryIds?: readonly string[] } = {}): Promise<Seat[]> {
  if (filter.judgeIds?.length === 0 || filter.categoryIds?.length === 0) return [];
  const rows = await reader
    .select({ judgeUserId: panelMembers.userId, categoryId: panelCategories.categoryId })
    .from(panelMembers)
    .innerJoin(judgingPanels, eq(judgingPanels.id, panelMembers.panelId))
    .innerJoin(panelCategories, eq(panelCategories.panelId, panelMembers.panelId))
    .where(
      and(
        eq(judgingPanels.showId, showId),
        eq(panelMembers.role, "judge"),
        ...(filter.judgeIds ? [inArray(panelMembers.userId, [...filter.judgeIds])] : []),
        ...(filter.categoryIds ? [inArray(panelCategories.categoryId, [...filter.categoryIds])] : []),
      ),
    );
  return [...new Map(rows.map((r) => [`${r.judgeUserId}|${r.categoryId}`, r])).values()];
}

/** Conflicts that stand now (seated judges, not allowed by the chair), narrowed as asked. */
export async function openConflicts(reader: Reader, showId: string, filter: { judgeIds?: readonly string[]; categoryIds?: readonly string[]; entryIds?: readonly string[] } = {}): Promise<ConflictPair[]> {
  const seats = await seatsOfShow(reader, showId, filter);
  return conflictsForSeats(reader, showId, seats, { entryIds: filter.entryIds });
}

/**
 * Looks again after a change and keeps what it finds for the chair (once per judge and entry;
 * a pair the chair had moved the judge away from, now seated again, is opened again). Never refuses the change
 * itself: an entrant's submission goes through, and the chair decides.
 */
export async function recordConflicts(tx: Tx, showId: string, filter: { judgeIds?: readonly string[]; categoryIds?: readonly string[]; entryIds?: readonly string[] }, foundWhen: FoundWhen, actorUserId: string | null): Promise<number> {
  const found = await openConflicts(tx, showId, filter);
  let added = 0;
  for (const c of found) {
    const [row] = await tx
      .insert(judgeConflictRecords)
      .values({ showId, judgeUserId: c.judgeUserId, entryId: c.entryId, reason: c.reason, foundWhen })
      .onConflictDoUpdate({
        target: [judgeConflictRecords.judgeUserId, judgeConflictRecords.entryId],
        set: { reason: c.reason, foundWhen, foundAt: new Date(), decision: null, decisionReason: "", decidedBy: null, decidedAt: null },
        setWhere: eq(judgeConflictRecords.decision, "moved"),
      })
      .returning({ id: judgeConflictRecords.id });
    // Nothing comes back when the pair was already on record and open.
    if (!row) continue;
    added++;
    await writeAudit(tx, { actorUserId, showId, action: "judge.conflict_found", subjectType: "judge_conflict", subjectId: row.id, after: { judgeUserId: c.judgeUserId, entryId: c.entryId, reason: c.reason, foundWhen } });
  }
  return added;
}

/**
 * recordConflicts for a change that must go through whatever happens (an entrant's submission, a
 * category move): run in a savepoint, so a failed look only loses the note, never the change.
 * Nothing is lost for judging: the blockers and every sheet change look again themselves.
 */
export async function noteConflicts(tx: Tx, showId: string, filter: { judgeIds?: readonly string[]; categoryIds?: readonly string[]; entryIds?: readonly string[] }, foundWhen: FoundWhen, actorUserId: string | null): Promise<void> {
  try {
    await tx.transaction((sp) => recordConflicts(sp, showId, filter, foundWhen, actorUserId));
  } catch (err) {
    console.error("[judging] could not record judge conflicts", { showId, filter, foundWhen, err: errorSummary(err) });
  }
}

/** The chair's list: conflicts that stand now, and the ones already decided. */
export async function conflictsForChair(reader: Reader, showId: string) {
  const [open, records] = await Promise.all([
    openConflicts(reader, showId),
    reader
      .select({ judgeUserId: judgeConflictRecords.judgeUserId, judgeName: user.name, entryId: judgeConflictRecords.entryId, entryNumber: entries.entryNumber, reason: judgeConflictRecords.reason, foundWhen: judgeConflictRecords.foundWhen, foundAt: judgeConflictRecords.foundAt, decision: judgeConflictRecords.decision, decisionReason: judgeConflictRecords.decisionReason, decidedAt: judgeConflictRecords.decidedAt })
      .from(judgeConflictRecords)
      .innerJoin(user, eq(user.id, judgeConflictRecords.judgeUserId))
      .innerJoin(entries, eq(entries.id, judgeConflictRecords.entryId))
      .where(eq(judgeConflictRecords.showId, showId))
      .orderBy(asc(entries.entryNumber), asc(user.name)),
  ]);
  const recordOf = new Map(records.map((r) => [`${r.judgeUserId}|${r.entryId}`, r]));
  const openKeys = new Set(open.map((c) => `${c.judgeUserId}|${c.entryId}`));
  return {
    open: open.map((c) => ({ ...c, foundAt: recordOf.get(`${c.judgeUserId}|${c.entryId}`)?.foundAt ?? null })),
    decided: records.filter((r) => r.decision && !openKeys.has(`${r.judgeUserId}|${r.entryId}`)),
  };
}
export type ChairConflicts = Awaited<ReturnType<typeof conflictsForChair>>;

/** What blocks judging as far as conflicts go: one line naming each open one (chair-facing). */
export async function conflictBlockers(reader: Reader, showId: string): Promise<string[]> {
  const open = await openConflicts(reader, showId);
  if (!open.length) return [];
  const list = open.map((c) => `${c.judgeName} and entry ${c.entryNumber ?? "?"} (${c.category})`).join("; ");
  return [`${open.length} judge ${open.length === 1 ? "conflict is" : "conflicts are"} open: ${list}. Resolve ${open.length === 1 ? "it" : "them"} first (Judging set-up, Conflicts).`];
}

/**
 * The chair decides one conflict: "move" takes the judge off every panel of theirs that judges
 * the entry's category; "allow" lets the judge judge it, with the chair's reason. Both audited.
 */
export async function resolveConflict(viewer: Viewer, slug: string, input: { judgeUserId: string; entryId: string; action: "move" | "allow"; reason: string }) {
  const { showId } = await requireShowRole(viewer, slug, ["chair"]);
  return db.transaction(async (tx) => {
    const [standing] = await openConflicts(tx, showId, { judgeIds: [input.judgeUserId], entryIds: [input.entryId] });
    if (!standing) throw notFound("There is no open conflict for that judge and entry.");
    let panelsLeft: string[] = [];
    if (input.action === "move") {
      const panels = await tx
        .select({ id: judgingPanels.id, name: judgingPanels.name })
        .from(judgingPanels)
        .innerJoin(panelMembers, and(eq(panelMembers.panelId, judgingPanels.id), eq(panelMembers.userId, input.judgeUserId), eq(panelMembers.role, "judge")))
        .innerJoin(panelCategories, and(eq(panelCategories.panelId, judgingPanels.id), eq(panelCategories.categoryId, standing.categoryId)))
        .where(eq(judgingPanels.showId, showId));
      for (const p of panels) {
        const [{ n } = { n: 0 }] = await tx.select({ n: sql<number>`count(*)::int` }).from(panelMembers).where(and(eq(panelMembers.panelId, p.id), eq(panelMembers.role, "judge")));
        if (n <= 1) throw conflict(`${standing.judgeName} is the only judge on ${p.name}; add another judge to that panel first (Panels), or allow the conflict with a reason.`);
      }
      await tx.delete(panelMembers).where(and(eq(panelMembers.userId, input.judgeUserId), eq(panelMembers.role, "judge"), inArray(panelMembers.panelId, panels.map((p) => p.id))));
      panelsLeft = panels.map((p) => p.name);
    }
    const decision = input.action === "move" ? "moved" : "allowed";
    const now = new Date();
    const [row] = await tx
      .insert(judgeConflictRecords)
      .values({ showId, judgeUserId: input.judgeUserId, entryId: input.entryId, reason: standing.reason, foundWhen: "check", decision, decisionReason: input.reason, decidedBy: viewer.id, decidedAt: now })
      .onConflictDoUpdate({ target: [judgeConflictRecords.judgeUserId, judgeConflictRecords.entryId], set: { reason: standing.reason, decision, decisionReason: input.reason, decidedBy: viewer.id, decidedAt: now } })
      .returning({ id: judgeConflictRecords.id });
    await writeAudit(tx, {
      actorUserId: viewer.id,
      showId,
      action: input.action === "move" ? "judge.conflict_moved" : "judge.conflict_allowed",
      subjectType: "judge_conflict",
      subjectId: row!.id,
      before: { reason: standing.reason },
      after: { judgeUserId: input.judgeUserId, entryId: input.entryId, decision, reason: input.reason, panelsLeft },
    });
    return { decision, panelsLeft };
  });
}
