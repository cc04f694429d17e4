// The chair sets up judging: score sheets, each category's method and sheet, panels of judges and
// scribes with their categories and session, the people judges declared, comment policy, quick
// phrases and the fields released to judges; reopening a submitted sheet; the progress board.
import "server-only";
import { judgedEntries } from "@/db/queries/judged-entries";
import { isDisplayOnlyCategory } from "@/scoring/judged-entries";
import { and, asc, eq, inArray, sql } from "drizzle-orm";
import { db, type Tx } from "@/db/client";
import { categories, entries, judgeDeclarations, judgeSheets, judgingPanels, panelCategories, panelMembers, scoreSheets, showRoles, showSettings, shows, user } from "@/db/schema";
import { writeAudit } from "@/db/queries/audit";
import { conflictsForChair, judgeConflicts, recordConflicts } from "@/db/queries/judge-conflicts";
import { settingsForShowId } from "@/db/queries/settings";
import { badInput, conflict, conflictOnUnique, forbiddenError, isUniqueViolation, notFound } from "@/lib/errors";
import type { z } from "zod";
import type { categoryJudgingSchema, declarationSchema, deleteDeclarationSchema, deletePanelSchema, judgingOptionsSchema, panelSchema, reopenSchema, saveSheetSchema } from "@/lib/schemas/judging";
import { hasShowRole, requireShowRole, type Viewer } from "@/lib/session";
import { checkSheet } from "@/scoring/score-sheets";
import { reopenSheet } from "@/scoring/sheet-sync";

// Conflicts live in ./judge-conflicts.ts; these names stay importable from here.
export { JUDGED_OUT, judgeConflicts } from "@/db/queries/judge-conflicts";

// ---- Reading -----------------------------------------------------------------------------------

export async function judgingSetup(viewer: Viewer, slug: string) {
  const { showId, name } = await requireShowRole(viewer, slug, ["chair"]);
  const [sheets, cats, panels, members, panelCats, declarations, staff, settings, conflicts] = await Promise.all([
    db.select().from(scoreSheets).where(eq(scoreSheets.showId, showId)).orderBy(asc(scoreSheets.name)),
    db
      .select({ id: categories.id, code: categories.code, name: categories.name, method: categories.judgingMethod, scoreSheetId: categories.scoreSheetId, mergedIntoId: categories.mergedIntoId, precedence: categories.precedence, conditions: categories.conditions })
      .from(categories)
      .where(eq(categories.showId, showId))
      .orderBy(asc(categories.precedence), asc(categories.code)),
    db.select().from(judgingPanels).where(eq(judgingPanels.showId, showId)).orderBy(asc(judgingPanels.name)),
    db.select({ panelId: panelMembers.panelId, userId: panelMembers.userId, role: panelMembers.role }).from(panelMembers).innerJoin(judgingPanels, eq(judgingPanels.id, panelMembers.panelId)).where(eq(judgingPanels.showId, showId)),
    db.select({ panelId: panelCategories.panelId, categoryId: panelCategories.categoryId }).from(panelCategories).innerJoin(judgingPanels, eq(judgingPanels.id, panelCategories.panelId)).where(eq(judgingPanels.showId, showId)),
    db.select().from(judgeDeclarations).where(eq(judgeDeclarations.showId, showId)).orderBy(asc(judgeDeclarations.createdAt)),
    db.select({ userId: showRoles.userId, role: showRoles.role, name: user.name, email: user.email }).from(showRoles).innerJoin(user, eq(user.id, showRoles.userId)).where(and(eq(showRoles.showId, showId), inArray(showRoles.role, ["judge", "scribe"]))).orderBy(asc(user.name)),
    settingsForShowId(showId),
    conflictsForChair(db, showId),
  ]);
  return {
    show: { slug, name },
    sheets: sheets.map((s) => ({ id: s.id, name: s.name, isDefault: s.isDefault, sheet: s.sheet, check: checkSheet(s.sheet) })),
    categories: cats.filter((c) => !c.mergedIntoId).map(({ conditions, ...c }) => ({ ...c, displayOnly: isDisplayOnlyCategory(conditions as { kind: string; value?: unknown }[]) })),
    panels: panels.map((p) => ({
      ...p,
      judgeIds: members.filter((m) => m.panelId === p.id && m.role === "judge").map((m) => m.userId),
      scribeIds: members.filter((m) => m.panelId === p.id && m.role === "scribe").map((m) => m.userId),
      categoryIds: panelCats.filter((c) => c.panelId === p.id).map((c) => c.categoryId),
    })),
    judges: staff.filter((s) => s.role === "judge"),
    scribes: staff.filter((s) => s.role === "scribe"),
    declarations,
    conflicts,
    options: { commentPolicy: settings.commentPolicy, quickPhrases: settings.quickPhrases, judgeFields: settings.judgeFields },
  };
}
export type JudgingSetup = Awaited<ReturnType<typeof judgingSetup>>;

// ---- Writing -----------------------------------------------------------------------------------

export async function saveScoreSheet(viewer: Viewer, slug: string, input: z.output<typeof saveSheetSchema>) {
  const { showId } = await requireShowRole(viewer, slug, ["chair"]);
  const check = checkSheet(input.sheet);
  if (!check.ok) throw badInput("The sheet needs attention.", { sheet: check.problems.map((p) => p.text) });
  return db.transaction(async (tx) => {
    const [taken] = await tx.select({ id: scoreSheets.id }).from(scoreSheets).where(and(eq(scoreSheets.showId, showId), eq(scoreSheets.name, input.name)));
    if (taken && taken.id !== input.id) throw badInput("Some fields need attention.", { name: [`There is already a sheet called “${input.name}”.`] });
    const [existing] = input.id ? await tx.select().from(scoreSheets).where(and(eq(scoreSheets.id, input.id), eq(scoreSheets.showId, showId))) : [];
    if (input.id && !existing) throw notFound("There is no such score sheet.");
    const [{ n } = { n: 0 }] = await tx.select({ n: sql<number>`count(*)::int` }).from(scoreSheets).where(eq(scoreSheets.showId, showId));
    const isDefault = input.isDefault || n === 0 || (existing?.isDefault ?? false);
    if (isDefault) await tx.update(scoreSheets).set({ isDefault: false }).where(eq(scoreSheets.showId, showId));
    const values = { showId, name: input.name, sheet: input.sheet, isDefault, updatedAt: new Date() };
    const [row] = existing
      ? await tx.update(scoreSheets).set(values).where(eq(scoreSheets.id, existing.id)).returning()
      : await tx.insert(scoreSheets).values(values).returning();
    await writeAudit(tx, { actorUserId: viewer.id, showId, action: existing ? "score_sheet.updated" : "score_sheet.created", subjectType: "score_sheet", subjectId: row!.id, before: existing ? { name: existing.name, sheet: existing.sheet } : null, after: { name: input.name, sheet: input.sheet, isDefault } });
    return { id: row!.id, nominalMax: check.nominalMax, notes: check.notes };
  }).catch((err: unknown) => {
    // Two saves at the same moment both pass the name check above; the unique indexes decide.
    if (isUniqueViolation(err, "score_sheets_show_name")) throw conflict(`There is already a sheet called “${input.name}”.`, { name: ["Choose another name."] });
    throw conflictOnUnique(err, "The score sheets changed at the same moment; try again.");
  });
}

export async function setCategoryJudging(viewer: Viewer, slug: string, input: z.output<typeof categoryJudgingSchema>) {
  const { showId } = await requireShowRole(viewer, slug, ["chair"]);
  return db.transaction(async (tx) => {
    const [cat] = await tx.select().from(categories).where(and(eq(categories.id, input.categoryId), eq(categories.showId, showId)));
    if (!cat) throw notFound("There is no such category.");
    if (input.scoreSheetId) {
      const [sheet] = await tx.select({ id: scoreSheets.id }).from(scoreSheets).where(and(eq(scoreSheets.id, input.scoreSheetId), eq(scoreSheets.showId, showId)));
      if (!sheet) throw badInput("Some fields need attention.", { scoreSheetId: ["That score sheet isn't in this show."] });
    }
    const started = await tx.select({ id: judgeSheets.id }).from(judgeSheets).innerJoin(entries, eq(entries.id, judgeSheets.entryId)).where(eq(entries.categoryId, cat.id)).limit(1);
    if (started.length && (cat.scoreSheetId !== input.scoreSheetId || cat.judgingMethod !== input.method)) throw conflict(`Judges have started on ${cat.code} ${cat.name}; its method and sheet can't change now.`);
    await tx.update(categories).set({ judgingMethod: input.method, scoreSheetId: input.scoreSheetId, updatedAt: new Date() }).where(eq(categories.id, cat.id));
    await writeAudit(tx, { actorUserId: viewer.id, showId, action: "category.judging_set", subjectType: "category", subjectId: cat.id, before: { method: cat.judgingMethod, scoreSheetId: cat.scoreSheetId }, after: { method: input.method, scoreSheetId: input.scoreSheetId } });
  });
}

async function assertStaff(tx: Tx, showId: string, ids: readonly string[], role: "judge" | "scribe") {
  if (!ids.length) return;
  const rows = await tx.select({ userId: showRoles.userId }).from(showRoles).where(and(eq(showRoles.showId, showId), eq(showRoles.role, role), inArray(showRoles.userId, [...ids])));
  if (rows.length !== new Set(ids).size) throw badInput("Some fields need attention.", { [`${role}Ids`]: [`Everyone here must be one of the show's ${role}s; invite them from Overview first.`] });
}

/** Creates or changes a panel; refused with the reasons when a judge may not judge one of its categories. */
export async function savePanel(viewer: Viewer, slug: string, input: z.output<typeof panelSchema>) {
  const { showId } = await requireShowRole(viewer, slug, ["chair"]);
  return db.transaction(async (tx) => {
    await assertStaff(tx, showId, input.judgeIds, "judge");
    await assertStaff(tx, showId, input.scribeIds, "scribe");
    const both = input.judgeIds.filter((j) => input.scribeIds.includes(j));
    if (both.length) throw badInput("Some fields need attention.", { scribeIds: ["Someone can't be judge and scribe on one panel."] });
    if (input.categoryIds.length) {
      const found = await tx.select({ id: categories.id }).from(categories).where(and(eq(categories.showId, showId), inArray(categories.id, input.categoryIds)));
      if (found.length !== new Set(input.categoryIds).size) throw badInput("Some fields need attention.", { categoryIds: ["Some categories aren't in this show."] });
    }
    const reasons = await judgeConflicts(tx, showId, input.judgeIds, input.categoryIds);
    if (reasons.length) throw conflict(`This panel can't be saved: ${reasons.join(" ")}`, { judgeIds: reasons });
    const [existing] = input.id ? await tx.select().from(judgingPanels).where(and(eq(judgingPanels.id, input.id), eq(judgingPanels.showId, showId))) : [];
    if (input.id && !existing) throw notFound("There is no such panel.");
    const [taken] = await tx.select({ id: judgingPanels.id }).from(judgingPanels).where(and(eq(judgingPanels.showId, showId), eq(judgingPanels.name, input.name)));
    if (taken && taken.id !== input.id) throw badInput("Some fields need attention.", { name: [`There is already a panel called “${input.name}”.`] });
    const values = { showId, name: input.name, day: input.day, room: input.room };
    const [panel] = existing ? await tx.update(judgingPanels).set(values).where(eq(judgingPanels.id, existing.id)).returning() : await tx.insert(judgingPanels).values(values).returning();
    await tx.delete(panelMembers).where(eq(panelMembers.panelId, panel!.id));
    await tx.delete(panelCategories).where(eq(panelCategories.panelId, panel!.id));
    const members: (typeof panelMembers.$inferInsert)[] = [
      ...[...new Set(input.judgeIds)].map((userId) => ({ panelId: panel!.id, userId, role: "judge" as const })),
      ...[...new Set(input.scribeIds)].map((userId) => ({ panelId: panel!.id, userId, role: "scribe" as const })),
    ];
    await tx.insert(panelMembers).values(members);
    if (input.categoryIds.length) await tx.insert(panelCategories).values([...new Set(input.categoryIds)].map((categoryId) => ({ panelId: panel!.id, categoryId })));
    await writeAudit(tx, { actorUserId: viewer.id, showId, action: existing ? "panel.updated" : "panel.created", subjectType: "judging_panel", subjectId: panel!.id, after: input });
    return { id: panel!.id };
  });
}

export async function deletePanel(viewer: Viewer, slug: string, input: z.output<typeof deletePanelSchema>) {
  const { showId } = await requireShowRole(viewer, slug, ["chair"]);
  return db.transaction(async (tx) => {
    const [gone] = await tx.delete(judgingPanels).where(and(eq(judgingPanels.id, input.panelId), eq(judgingPanels.showId, showId))).returning();
    if (!gone) throw notFound("There is no such panel.");
    await writeAudit(tx, { actorUserId: viewer.id, showId, action: "panel.deleted", subjectType: "judging_panel", subjectId: gone.id, before: { name: gone.name } });
  });
}

/**
 * A judge declares someone they must not judge (the chair may record it for them). The answer is
 * the same whether or not the person has an entry: a match is kept as a conflict for the chair
 * (./judge-conflicts.ts), never told to the judge, so a declaration can't be used to ask who
 * entered. Once judging has started only the chair records declarations, because a refused mark
 * would then tell the judge which entry matched.
 */
export async function addDeclaration(viewer: Viewer, slug: string, input: z.output<typeof declarationSchema>) {
  const show = await requireShowRole(viewer, slug, ["chair", "judge"]);
  const judgeUserId = input.judgeUserId ?? viewer.id;
  const isChair = hasShowRole(viewer, show.showId, ["chair"]);
  if (judgeUserId !== viewer.id && !isChair) throw forbiddenError("Only the chair can record a declaration for another judge.");
  if (!isChair && show.status !== "draft" && show.status !== "entries_open" && show.status !== "entries_closed") {
    throw conflict("Judging has started at this show; tell the chair, who records declarations from now on.");
  }
  return db.transaction(async (tx) => {
    await assertStaff(tx, show.showId, [judgeUserId], "judge");
    const [row] = await tx.insert(judgeDeclarations).values({ showId: show.showId, judgeUserId, personName: input.personName, personEmail: input.personEmail.toLowerCase(), relation: input.relation }).returning();
    await writeAudit(tx, { actorUserId: viewer.id, showId: show.showId, action: "judge.declared", subjectType: "judge_declaration", subjectId: row!.id, after: { judgeUserId, personName: input.personName, personEmail: input.personEmail, relation: input.relation } });
    await recordConflicts(tx, show.showId, { judgeIds: [judgeUserId] }, "declaration", viewer.id);
    return { id: row!.id };
  });
}

export async function removeDeclaration(viewer: Viewer, slug: string, input: z.output<typeof deleteDeclarationSchema>) {
  const show = await requireShowRole(viewer, slug, ["chair", "judge"]);
  return db.transaction(async (tx) => {
    const [row] = await tx.select().from(judgeDeclarations).where(and(eq(judgeDeclarations.id, input.declarationId), eq(judgeDeclarations.showId, show.showId)));
    if (!row) throw notFound("There is no such declaration.");
    if (row.judgeUserId !== viewer.id && !hasShowRole(viewer, show.showId, ["chair"])) throw forbiddenError("Only the chair can remove another judge's declaration.");
    await tx.delete(judgeDeclarations).where(eq(judgeDeclarations.id, row.id));
    await writeAudit(tx, { actorUserId: viewer.id, showId: show.showId, action: "judge.declaration_removed", subjectType: "judge_declaration", subjectId: row.id, before: row });
  });
}

export async function saveJudgingOptions(viewer: Viewer, slug: string, input: z.output<typeof judgingOptionsSchema>) {
  const { showId } = await requireShowRole(viewer, slug, ["chair"]);
  return db.transaction(async (tx) => {
    const before = await settingsForShowId(showId, tx);
    const values = { commentPolicy: input.commentPolicy, quickPhrases: [...new Set(input.quickPhrases)], judgeFields: [...new Set(input.judgeFields)] };
    await tx.insert(showSettings).values({ showId, ...values }).onConflictDoUpdate({ target: showSettings.showId, set: { ...values, updatedAt: new Date() } });
    await writeAudit(tx, { actorUserId: viewer.id, showId, action: "settings.judging_updated", subjectType: "show_settings", subjectId: showId, before: { commentPolicy: before.commentPolicy, quickPhrases: before.quickPhrases, judgeFields: before.judgeFields }, after: values });
  });
}

/** The chair reopens a submitted sheet so its judge can change it; the reason is audited. */
export async function reopenJudgeSheet(viewer: Viewer, slug: string, input: z.output<typeof reopenSchema>) {
  const { showId } = await requireShowRole(viewer, slug, ["chair"]);
  return db.transaction(async (tx) => {
    const [row] = await tx.select().from(judgeSheets).where(and(eq(judgeSheets.id, input.sheetId), eq(judgeSheets.showId, showId))).for("update");
    if (!row) throw notFound("There is no such sheet.");
    if (row.status !== "submitted") throw conflict("That sheet is still open; there is nothing to reopen.");
    const state = reopenSheet(row.state);
    const now = new Date();
    await tx.update(judgeSheets).set({ state, status: "open", version: state.version, reopenedAt: now, reopenReason: input.reason, updatedAt: now }).where(eq(judgeSheets.id, row.id));
    await writeAudit(tx, { actorUserId: viewer.id, showId, action: "judge_sheet.reopened", subjectType: "judge_sheet", subjectId: row.id, before: { status: "submitted" }, after: { status: "open", reason: input.reason, judgeUserId: row.judgeUserId, entryId: row.entryId } });
  });
}

// ---- Progress ------------------------------------------------------------------------------------

/**
 * Per category and per judge: sheets submitted, remaining, open conflicts, reopened; the slowest
 * panel and its expected finish at the pace so far (submitted sheets per hour since its first).
 */
export async function progressBoard(viewer: Viewer, slug: string, now: Date = new Date()) {
  const { showId } = await requireShowRole(viewer, slug, ["chair"]);
  const [show] = await db.select({ status: shows.status, timeZone: shows.timeZone }).from(shows).where(eq(shows.id, showId));
  const setup = await judgingSetup(viewer, slug);
  const placed = await db
    .select({ id: entries.id, categoryId: entries.categoryId })
    .from(entries)
    .where(and(judgedEntries(showId), inArray(entries.categoryState, ["decided", "overridden"])));
  const sheets = await db
    .select({ entryId: judgeSheets.entryId, judgeUserId: judgeSheets.judgeUserId, status: judgeSheets.status, submittedAt: judgeSheets.submittedAt, reopenedAt: judgeSheets.reopenedAt, conflicts: sql<number>`jsonb_array_length(${judgeSheets.state} -> 'conflicts')` })
    .from(judgeSheets)
    .where(eq(judgeSheets.showId, showId));
  const sheetOf = new Map(sheets.map((s) => [`${s.entryId}|${s.judgeUserId}`, s]));
  const judgeName = new Map(setup.judges.map((j) => [j.userId, j.name]));
  const catName = new Map(setup.categories.map((c) => [c.id, `${c.code} ${c.name}`]));

  type Tally = { scored: number; remaining: number; conflicts: number; reopened: number; total: number };
  const blank = (): Tally => ({ scored: 0, remaining: 0, conflicts: 0, reopened: 0, total: 0 });
  const byCategory = new Map<string, Tally>();
  const byJudge = new Map<string, Tally>();
  const panels = setup.panels.map((p) => {
    const t = blank();
    const times: number[] = [];
    for (const e of placed.filter((x) => x.categoryId && p.categoryIds.includes(x.categoryId))) {
      for (const j of p.judgeIds) {
        const s = sheetOf.get(`${e.id}|${j}`);
        const add = (m: Map<string, Tally>, k: string) => {
          const x = m.get(k) ?? blank();
          x.total++;
          if (s?.status === "submitted") x.scored++;
          else x.remaining++;
          if (s && s.conflicts > 0) x.conflicts++;
          if (s?.reopenedAt) x.reopened++;
          m.set(k, x);
        };
        add(byCategory, e.categoryId!);
        add(byJudge, j);
        t.total++;
        if (s?.status === "submitted") {
          t.scored++;
          if (s.submittedAt) times.push(s.submittedAt.getTime());
        } else t.remaining++;
        if (s && s.conflicts > 0) t.conflicts++;
        if (s?.reopenedAt) t.reopened++;
      }
    }
    const first = times.length ? Math.min(...times) : null;
    const hours = first ? (now.getTime() - first) / 3_600_000 : 0;
    const perHour = times.length >= 2 && hours > 0 ? times.length / hours : null;
    const expectedFinish = t.remaining === 0 ? now : perHour ? new Date(now.getTime() + (t.remaining / perHour) * 3_600_000) : null;
    return { id: p.id, name: p.name, day: p.day, room: p.room, ...t, perHour, expectedFinish };
  });
  const slowest = [...panels].filter((p) => p.remaining > 0).sort((a, b) => (b.expectedFinish?.getTime() ?? Infinity) - (a.expectedFinish?.getTime() ?? Infinity))[0] ?? null;
  return {
    status: show?.status ?? "draft",
    timeZone: show?.timeZone ?? "UTC",
    panels,
    slowest,
    categories: [...byCategory].map(([id, t]) => ({ id, name: catName.get(id) ?? "?", ...t })),
    judges: [...byJudge].map(([id, t]) => ({ id, name: judgeName.get(id) ?? "?", ...t })),
    unassigned: setup.categories.filter((c) => !c.displayOnly && !setup.panels.some((p) => p.categoryIds.includes(c.id))).map((c) => `${c.code} ${c.name}`),
    sheets: await sheetsForBoard(showId),
  };
}

/** Every judge's sheet by entry, for the chair's Reopen and History (chair only: the caller checked). */
async function sheetsForBoard(showId: string) {
  const rows = await db
    .select({ id: judgeSheets.id, entryId: judgeSheets.entryId, entryNumber: entries.entryNumber, title: entries.title, categoryId: entries.categoryId, judgeUserId: judgeSheets.judgeUserId, judgeName: user.name, status: judgeSheets.status, total: judgeSheets.total, submittedAt: judgeSheets.submittedAt, reopenedAt: judgeSheets.reopenedAt, reopenReason: judgeSheets.reopenReason })
    .from(judgeSheets)
    .innerJoin(entries, eq(entries.id, judgeSheets.entryId))
    .innerJoin(user, eq(user.id, judgeSheets.judgeUserId))
    .where(eq(judgeSheets.showId, showId))
    .orderBy(asc(entries.entryNumber), asc(user.name));
  return rows.map(({ total, ...r }) => ({ ...r, total: (total as { total?: number | null } | null)?.total ?? null }));
}
