// What judges and scribes see and send. Blind by construction: every select here lists the quilt's
// own facts only (the fields the show releases), never the entrant, maker or quilter, their
// contact or guild. Sheet changes from tablets are merged by scoring/sheet-sync.ts.
import "server-only";
import { judgedEntries } from "@/db/queries/judged-entries";
import { and, asc, eq, inArray, sql } from "drizzle-orm";
import { db, type Tx } from "@/db/client";
import { categories, entries, entryPhotos, judgeSheets, panelCategories, scoreChanges, scoreSheets, user } from "@/db/schema";
import { writeAudit } from "@/db/queries/audit";
import { settingsForShowId } from "@/db/queries/settings";
import { openConflicts } from "@/db/queries/judge-conflicts";
import { inSessions, judgingScope, QUILT_FACTS, releasedFacts } from "@/db/queries/judging-scope";
import { AppError, conflict, forbiddenError } from "@/lib/errors";
import type { SyncBatch } from "@/lib/schemas/judging";
import { AREA_ROLES, requireShowRole, type Viewer } from "@/lib/session";
import { sheetTotal, validateMark, type Criterion, type Mark, type ScoreSheet } from "@/scoring/score-sheets";
import { sheetFieldName } from "@/scoring/sheet-field-names";
import { applyBatch, emptySheet, marksOfState, type ChangeOutcome, type Json, type SheetChange, type SheetState } from "@/scoring/sheet-sync";

/**
 * The list page's view: the entries of the viewer's own sessions (their panels' categories), by
 * number, with the released facts only.
 */
export async function judgingQueue(viewer: Viewer, showSlug: string) {
  const show = await requireShowRole(viewer, showSlug, AREA_ROLES.judging);
  const [scope, settings] = await Promise.all([judgingScope(db, show.showId, viewer.id), settingsForShowId(show.showId)]);
  const rows = scope.categoryIds.length
    ? await db.select({ entryNumber: entries.entryNumber, ...QUILT_FACTS }).from(entries).where(inSessions(show.showId, scope.categoryIds)).orderBy(asc(entries.entryNumber))
    : [];
  return {
    show: { name: show.name, slug: show.slug },
    entries: rows.map((r) => ({ entryNumber: r.entryNumber!, ...releasedFacts(settings.judgeFields, r) })),
  };
}

async function sheetsOfShow(reader: Pick<Tx, "select">, showId: string) {
  const rows = await reader.select({ id: scoreSheets.id, name: scoreSheets.name, sheet: scoreSheets.sheet, isDefault: scoreSheets.isDefault }).from(scoreSheets).where(eq(scoreSheets.showId, showId));
  return { byId: new Map(rows.map((r) => [r.id, r])), defaultId: rows.find((r) => r.isDefault)?.id ?? rows[0]?.id ?? null };
}

const sheetView = (row: { id: string; entryId: string; judgeUserId: string; status: string; version: number; state: SheetState } | undefined, entryId: string, judgeUserId: string) => {
  const state = row?.state ?? emptySheet();
  return {
    sheetRowId: row?.id ?? null,
    entryId,
    judgeUserId,
    status: state.status,
    version: state.version,
    fields: Object.fromEntries(Object.entries(state.fields).map(([k, f]) => [k, { value: f.value, version: f.version }])),
    conflicts: state.conflicts.map((c) => ({ field: c.field, serverValue: c.serverValue, clientValue: c.clientValue })),
  };
};

/**
 * Everything a tablet caches when a session starts: the viewer's panels, the judges they score
 * for, the queue (released facts, category, photos, which sheet), the sheets, and each sheet's
 * state so far. No names of entrants, makers or quilters: the select lists never name them.
 */
export async function judgingSession(viewer: Viewer, slug: string) {
  const show = await requireShowRole(viewer, slug, AREA_ROLES.judging);
  const [{ seats, judges, categoryIds }, settings, sheets] = await Promise.all([judgingScope(db, show.showId, viewer.id), settingsForShowId(show.showId), sheetsOfShow(db, show.showId)]);
  const cats = categoryIds.length
    ? await db.select({ id: categories.id, code: categories.code, name: categories.name, method: categories.judgingMethod, scoreSheetId: categories.scoreSheetId, precedence: categories.precedence }).from(categories).where(inArray(categories.id, categoryIds))
    : [];
  // Which of the viewer's sessions (panels) judges each category, for the list in judging order.
  const sessionOf = new Map<string, string>();
  if (seats.length) {
    const order = [...seats].sort((a, b) => a.day.localeCompare(b.day) || a.panelName.localeCompare(b.panelName)).map((s) => s.panelId);
    const links = await db.select({ panelId: panelCategories.panelId, categoryId: panelCategories.categoryId }).from(panelCategories).where(inArray(panelCategories.panelId, order));
    for (const panelId of order) for (const l of links) if (l.panelId === panelId && !sessionOf.has(l.categoryId)) sessionOf.set(l.categoryId, panelId);
  }
  const rows = categoryIds.length
    ? await db.select({ id: entries.id, entryNumber: entries.entryNumber, categoryId: entries.categoryId, ...QUILT_FACTS }).from(entries).where(inSessions(show.showId, categoryIds)).orderBy(asc(entries.entryNumber))
    : [];
  const entryIds = rows.map((r) => r.id);
  const [photos, sheetRows] = entryIds.length
    ? await Promise.all([
        db.select({ id: entryPhotos.id, entryId: entryPhotos.entryId, view: entryPhotos.view, widthPx: entryPhotos.widthPx, heightPx: entryPhotos.heightPx }).from(entryPhotos).where(inArray(entryPhotos.entryId, entryIds)),
        db.select({ id: judgeSheets.id, entryId: judgeSheets.entryId, judgeUserId: judgeSheets.judgeUserId, status: judgeSheets.status, version: judgeSheets.version, state: judgeSheets.state }).from(judgeSheets).where(and(inArray(judgeSheets.entryId, entryIds), inArray(judgeSheets.judgeUserId, [...judges.keys()]))),
      ])
    : [[], []];
  const usedSheetIds = new Set(cats.map((c) => c.scoreSheetId ?? sheets.defaultId).filter((x): x is string => !!x));
  return {
    show: { slug: show.slug, name: show.name, status: show.status, judgingOpen: show.status === "judging" },
    me: { id: viewer.id, seats },
    judges: [...judges].map(([id, j]) => ({ id, name: j.name, categoryIds: [...j.categoryIds] })),
    commentPolicy: settings.commentPolicy,
    quickPhrases: settings.quickPhrases,
    sheets: [...usedSheetIds].map((id) => ({ id, name: sheets.byId.get(id)!.name, sheet: sheets.byId.get(id)!.sheet })),
    categories: cats.map((c) => ({ id: c.id, code: c.code, name: c.name, method: c.method, sheetId: c.scoreSheetId ?? sheets.defaultId, precedence: c.precedence, sessionId: sessionOf.get(c.id) ?? null })),
    entries: rows.map((r) => ({
      id: r.id,
      entryNumber: r.entryNumber!,
      categoryId: r.categoryId!,
      ...releasedFacts(settings.judgeFields, r),
      photos: photos.filter((p) => p.entryId === r.id).map((p) => ({ id: p.id, view: p.view, widthPx: p.widthPx, heightPx: p.heightPx, webUrl: `/api/photos/${p.id}/web`, thumbUrl: `/api/photos/${p.id}/thumb` })),
    })),
    states: rows.flatMap((r) =>
      [...judges].filter(([, j]) => j.categoryIds.has(r.categoryId!)).map(([judgeId]) => sheetView(sheetRows.find((s) => s.entryId === r.id && s.judgeUserId === judgeId), r.id, judgeId)),
    ),
  };
}
export type JudgingSession = Awaited<ReturnType<typeof judgingSession>>;

// ---- Sync ----------------------------------------------------------------------------------------

const SORT_VALUES = new Set(["kept", "set_aside"]);

/** Why a change's value can't be used on this sheet, or null. Recorded as a refused outcome. */
function invalidValue(change: SyncBatch["changes"][number], sheet: ScoreSheet | null, method: string, commentPolicy: string): string | null {
  if (change.kind === "submit") return null;
  const { field, value } = change;
  if (field.startsWith("mark:")) {
    if (method === "rank") return "This category is ranked, not scored.";
    const criterion = sheet?.sections.flatMap((s) => s.criteria).find((c: Criterion) => c.id === field.slice(5));
    if (!criterion) return "That criterion isn't on this category's sheet.";
    if (value === null) return null;
    return validateMark(criterion, value as Mark);
  }
  if (field.startsWith("comment:")) {
    if (commentPolicy === "none") return "This show takes no written comments.";
    if (typeof value !== "string" || value.length > 2000) return "A comment is text of up to 2,000 characters.";
    if (field !== "comment:overall" && !sheet?.sections.some((s) => s.id === field.slice(8))) return "That section isn't on this category's sheet.";
    return null;
  }
  if (field === "discuss") return typeof value === "boolean" ? null : "Discuss for award is yes or no.";
  if (field === "sort") {
    if (!method.startsWith("sort_")) return "This category has no sorting pass.";
    return value === null || (typeof value === "string" && SORT_VALUES.has(value)) ? null : "Keep or set aside.";
  }
  if (field === "rank") {
    if (method !== "rank" && method !== "sort_then_rank") return "This category is scored, not ranked.";
    return value === null || (typeof value === "number" && Number.isInteger(value) && value >= 1 && value <= 1000) ? null : "A rank is a whole number from 1.";
  }
  return "Unknown field.";
}

const marksOf = marksOfState;

/**
 * A judge with an open conflict on an entry (their own quilt, or a declared person's, not yet
 * allowed by the chair) can't have marks taken for it: the whole batch is refused (403) and
 * nothing is applied; `fieldErrors` names the entries, so the tablet sets only their changes
 * aside and sends the rest again.
 */
async function refuseConflicted(showId: string, judgeUserId: string, judgeName: string, entryIds: string[]) {
  if (!entryIds.length) return;
  const found = await openConflicts(db, showId, { judgeIds: [judgeUserId], entryIds });
  if (!found.length) return;
  const text = (n: number | null) => `The chair has a possible conflict of interest on record for ${judgeName} and entry ${n ?? "?"}, so no marks can be taken for it until the chair decides.`;
  throw new AppError(403, found.map((c) => text(c.entryNumber)).join(" "), Object.fromEntries(found.map((c) => [c.entryId, [text(c.entryNumber)]])));
}

export type SyncResult = {
  results: { key: string; entryId: string; outcome: ChangeOutcome; duplicate: boolean }[];
  sheets: ReturnType<typeof sheetView>[];
};

/**
 * Applies a tablet's batch: for each entry's sheet (locked while it merges), duplicates return
 * their stored outcome, the rest are merged and stored with who entered them and for whom.
 */
export async function syncSheetChanges(viewer: Viewer, slug: string, batch: SyncBatch): Promise<SyncResult> {
  const show = await requireShowRole(viewer, slug, AREA_ROLES.judging);
  // Sheets take changes only while the show is judging; the tablet keeps them until then.
  if (show.status !== "judging") throw conflict(show.status === "results_published" || show.status === "archived" ? "Judging is over at this show; sheets are closed." : "Judging hasn't started at this show yet; changes stay on this device until it does.");
  // Independent reads in parallel: a tablet on poor Wi-Fi waits for the slowest one, not the sum.
  const [{ judges }, settings, sheets] = await Promise.all([judgingScope(db, show.showId, viewer.id), settingsForShowId(show.showId), sheetsOfShow(db, show.showId)]);
  const rights = judges.get(batch.forJudge);
  if (!rights) throw forbiddenError(batch.forJudge === viewer.id ? "You are not on a judging panel of this show." : "You can enter scores only for a judge on your panel.");
  const byEntry = new Map<string, SyncBatch["changes"]>();
  for (const c of batch.changes) byEntry.set(c.entryId, [...(byEntry.get(c.entryId) ?? []), c]);
  await refuseConflicted(show.showId, batch.forJudge, rights.name, [...byEntry.keys()]);

  return db.transaction(async (tx) => {
    const out: SyncResult = { results: [], sheets: [] };
    const targets = byEntry.size
      ? await tx
          .select({ id: entries.id, categoryId: entries.categoryId, method: categories.judgingMethod, scoreSheetId: categories.scoreSheetId, judged: sql<boolean>`${judgedEntries(show.showId)}` })
          .from(entries)
          .innerJoin(categories, eq(categories.id, entries.categoryId))
          .where(and(eq(entries.showId, show.showId), inArray(entries.id, [...byEntry.keys()])))
      : [];
    for (const [entryId, changes] of byEntry) {
      const target = targets.find((t) => t.id === entryId);
      if (!target || !target.categoryId || !rights.categoryIds.has(target.categoryId) || !target.judged) {
        for (const c of changes) out.results.push({ key: c.key, entryId, outcome: { kind: "refused", text: "This entry isn't in your queue." }, duplicate: false });
        continue;
      }
      const sheetId = target.scoreSheetId ?? sheets.defaultId;
      const sheet = sheetId ? (sheets.byId.get(sheetId)?.sheet ?? null) : null;
      await tx.insert(judgeSheets).values({ showId: show.showId, entryId, judgeUserId: batch.forJudge, scoreSheetId: sheetId, state: emptySheet() }).onConflictDoNothing();
      const [row] = await tx.select().from(judgeSheets).where(and(eq(judgeSheets.entryId, entryId), eq(judgeSheets.judgeUserId, batch.forJudge))).for("update");
      const known = await tx.select({ changeKey: scoreChanges.changeKey, outcome: scoreChanges.outcome, sheetId: scoreChanges.sheetId }).from(scoreChanges).where(inArray(scoreChanges.changeKey, changes.map((c) => c.key)));
      const seen = new Map(known.filter((k) => k.sheetId === row!.id).map((k) => [k.changeKey, k.outcome]));
      const foreign = new Set(known.filter((k) => k.sheetId !== row!.id).map((k) => k.changeKey));

      // Values the sheet can't take are refused one by one; the rest merge.
      let state = row!.state;
      const stored: (typeof scoreChanges.$inferInsert)[] = [];
      for (const c of changes) {
        if (foreign.has(c.key)) {
          out.results.push({ key: c.key, entryId, outcome: { kind: "refused", text: "That change key was already used for another sheet." }, duplicate: false });
          continue;
        }
        const bad = seen.has(c.key) ? null : invalidValue(c, sheet, target.method, settings.commentPolicy);
        const change: SheetChange = c.kind === "submit" ? { kind: "submit", key: c.key, deviceId: batch.deviceId, seq: c.seq, seen: c.seen } : { kind: c.kind, key: c.key, deviceId: batch.deviceId, seq: c.seq, field: c.field, value: c.value as Json, baseVersion: c.baseVersion };
        let outcome: ChangeOutcome;
        let duplicate = false;
        if (bad) outcome = { kind: "refused", text: bad };
        else {
          const r = applyBatch(state, [change], seen);
          state = r.state;
          outcome = r.outcomes[0]!.outcome;
          duplicate = r.outcomes[0]!.duplicate;
        }
        out.results.push({ key: c.key, entryId, outcome, duplicate });
        if (!duplicate) {
          seen.set(c.key, outcome);
          stored.push({
            showId: show.showId,
            sheetId: row!.id,
            changeKey: c.key,
            deviceId: batch.deviceId,
            seq: c.seq,
            kind: c.kind,
            field: c.kind === "submit" ? null : c.field,
            value: c.kind === "submit" ? (c.seen as Json) : (c.value as Json),
            baseVersion: c.kind === "submit" ? null : c.baseVersion,
            enteredBy: viewer.id,
            forJudge: batch.forJudge,
            clientAt: c.clientAt ? new Date(c.clientAt) : null,
            outcome,
          });
        }
      }
      if (stored.length) {
        await tx.insert(scoreChanges).values(stored);
        const submittedNow = row!.status === "open" && state.status === "submitted";
        const total = sheet ? sheetTotal(sheet, marksOf(state), { partial: true }) : null;
        await tx
          .update(judgeSheets)
          .set({ state, status: state.status, version: state.version, total: total ? ({ total: total.total, complete: total.complete, percent: total.percent } as Json) : null, submittedAt: submittedNow ? new Date() : row!.submittedAt, updatedAt: new Date() })
          .where(eq(judgeSheets.id, row!.id));
        if (submittedNow) {
          await writeAudit(tx, { actorUserId: viewer.id, showId: show.showId, action: "judge_sheet.submitted", subjectType: "judge_sheet", subjectId: row!.id, after: { entryId, judgeUserId: batch.forJudge, enteredBy: viewer.id, total: total?.total ?? null } });
        }
      }
      out.sheets.push(sheetView({ ...row!, state }, entryId, batch.forJudge));
    }
    return out;
  });
}

/** The chair's view of one sheet's history: every change, who entered it and for whom. */
export async function sheetHistory(viewer: Viewer, slug: string, sheetRowId: string) {
  const { showId } = await requireShowRole(viewer, slug, ["chair"]);
  const entered = user;
  const rows = await db
    .select({ at: scoreChanges.receivedAt, clientAt: scoreChanges.clientAt, kind: scoreChanges.kind, field: scoreChanges.field, value: scoreChanges.value, outcome: scoreChanges.outcome, deviceId: scoreChanges.deviceId, enteredBy: scoreChanges.enteredBy, forJudge: scoreChanges.forJudge, enteredByName: entered.name })
    .from(scoreChanges)
    .innerJoin(entered, eq(entered.id, scoreChanges.enteredBy))
    .where(and(eq(scoreChanges.sheetId, sheetRowId), eq(scoreChanges.showId, showId)))
    .orderBy(asc(scoreChanges.id));
  const judgeIds = [...new Set(rows.map((r) => r.forJudge))];
  const [names, sheets, [own]] = await Promise.all([
    judgeIds.length ? db.select({ id: user.id, name: user.name }).from(user).where(inArray(user.id, judgeIds)) : [],
    sheetsOfShow(db, showId),
    db.select({ scoreSheetId: judgeSheets.scoreSheetId }).from(judgeSheets).where(and(eq(judgeSheets.id, sheetRowId), eq(judgeSheets.showId, showId))),
  ]);
  const nameOf = new Map(names.map((n) => [n.id, n.name]));
  // Criteria and sections by their names on the sheet the judge used (the show's default if none is recorded).
  const sheet = sheets.byId.get(own?.scoreSheetId ?? sheets.defaultId ?? "")?.sheet ?? null;
  return rows.map((r) => ({
    ...r,
    fieldName: r.kind === "submit" ? "Submitted" : sheetFieldName(r.field, sheet as ScoreSheet | null),
    forJudgeName: nameOf.get(r.forJudge) ?? "?",
    text: r.enteredBy === r.forJudge ? `${r.enteredByName}` : `${r.enteredByName} for ${nameOf.get(r.forJudge) ?? "?"}`,
  }));
}
