// The chair's changes to results before publishing: the result rules and ribbons, a placement
// changed by hand, the order of a tie, show-wide awards and their votes or choices. Every change
// carries a reason where it goes against the rules' proposal, and every one is audited.
import "server-only";
import { and, eq, sql } from "drizzle-orm";
import { db } from "@/db/client";
import { awardPicks, categories, entries, panelMembers, judgingPanels, placementOverrides, showAwards, showSettings, tieOrders } from "@/db/schema";
import { writeAudit } from "@/db/queries/audit";
import { lockShow } from "@/db/queries/settings";
import { assertResultsOpen, resultRulesFor } from "@/db/queries/results";
import { badInput, conflict, conflictOnUnique, notFound } from "@/lib/errors";
import type { AwardInput, PlacementInput, ResultRulesInput } from "@/lib/schemas/results";
import { requireShowRole, type Viewer } from "@/lib/session";

async function openForChanges(viewer: Viewer, slug: string) {
  const { showId } = await requireShowRole(viewer, slug, ["chair"]);
  return showId;
}

type Tx = Parameters<Parameters<typeof db.transaction>[0]>[0];

async function inTx<T>(showId: string, run: (tx: Tx) => Promise<T>): Promise<T> {
  return db.transaction(async (tx) => {
    const show = await lockShow(tx, showId);
    assertResultsOpen(show.status);
    return run(tx);
  });
}

/** Saves the result rules and ribbons; allowed until the results are published. */
export async function saveResultRules(viewer: Viewer, slug: string, rules: ResultRulesInput) {
  const showId = await openForChanges(viewer, slug);
  return db.transaction(async (tx) => {
    const show = await lockShow(tx, showId);
    if (show.status === "results_published") throw conflict("The results are published. Unpublish them (with a reason) before changing the rules.");
    const before = await resultRulesFor(tx, showId);
    const json = sql`${JSON.stringify(rules)}::jsonb`;
    await tx.insert(showSettings).values({ showId, resultRules: json as never }).onConflictDoUpdate({ target: showSettings.showId, set: { resultRules: json as never, updatedAt: new Date() } });
    await writeAudit(tx, { actorUserId: viewer.id, showId, action: "results.rules_saved", subjectType: "show", subjectId: showId, before, after: rules });
  });
}

async function entryOfShow(tx: Tx, showId: string, entryId: string) {
  const [e] = await tx.select({ id: entries.id, categoryId: entries.categoryId, entryNumber: entries.entryNumber }).from(entries).where(and(eq(entries.id, entryId), eq(entries.showId, showId)));
  if (!e || !e.categoryId) throw notFound("That entry is not a judged entry of this show.");
  return e as { id: string; categoryId: string; entryNumber: number | null };
}

/** The chair's placement for one entry, replacing the proposal (reason required). */
export async function overridePlacement(viewer: Viewer, slug: string, input: PlacementInput) {
  const showId = await openForChanges(viewer, slug);
  return inTx(showId, async (tx) => {
    const e = await entryOfShow(tx, showId, input.entryId);
    const [before] = await tx.select().from(placementOverrides).where(eq(placementOverrides.entryId, e.id));
    const values = { showId, categoryId: e.categoryId, place: input.place, honorableMention: input.honorableMention, reason: input.reason, decidedBy: viewer.id, decidedAt: new Date() };
    await tx.insert(placementOverrides).values({ entryId: e.id, ...values }).onConflictDoUpdate({ target: placementOverrides.entryId, set: values });
    await writeAudit(tx, { actorUserId: viewer.id, showId, action: "results.placement_changed", subjectType: "entry", subjectId: e.id, before: before ? { place: before.place, honorableMention: before.honorableMention, reason: before.reason } : null, after: { entryNumber: e.entryNumber, place: input.place, honorableMention: input.honorableMention, reason: input.reason } });
  });
}

/** Goes back to the rules' proposal for one entry (reason required). */
export async function clearPlacement(viewer: Viewer, slug: string, input: { entryId: string; reason: string }) {
  const showId = await openForChanges(viewer, slug);
  return inTx(showId, async (tx) => {
    const [before] = await tx.delete(placementOverrides).where(and(eq(placementOverrides.entryId, input.entryId), eq(placementOverrides.showId, showId))).returning();
    if (!before) throw notFound("That entry has no change to undo.");
    await writeAudit(tx, { actorUserId: viewer.id, showId, action: "results.placement_restored", subjectType: "entry", subjectId: input.entryId, before: { place: before.place, honorableMention: before.honorableMention, reason: before.reason }, after: { reason: input.reason } });
  });
}

/** The chair's order for entries tied after the other tie-breaks. */
export async function saveTieOrder(viewer: Viewer, slug: string, input: { categoryId: string; entryIds: string[]; reason: string }) {
  const showId = await openForChanges(viewer, slug);
  return inTx(showId, async (tx) => {
    const [cat] = await tx.select({ id: categories.id }).from(categories).where(and(eq(categories.id, input.categoryId), eq(categories.showId, showId)));
    if (!cat) throw notFound("That category is not at this show.");
    const inCat = await tx.select({ id: entries.id }).from(entries).where(and(eq(entries.categoryId, cat.id), eq(entries.showId, showId)));
    const ids = new Set(inCat.map((r) => r.id));
    if (input.entryIds.some((id) => !ids.has(id))) throw badInput("Only entries of this category can be ordered.");
    if (new Set(input.entryIds).size !== input.entryIds.length) throw badInput("Each entry once in the order.");
    const [before] = await tx.select().from(tieOrders).where(eq(tieOrders.categoryId, cat.id));
    const values = { showId, entryIds: input.entryIds, reason: input.reason, decidedBy: viewer.id, decidedAt: new Date() };
    await tx.insert(tieOrders).values({ categoryId: cat.id, ...values }).onConflictDoUpdate({ target: tieOrders.categoryId, set: values });
    await writeAudit(tx, { actorUserId: viewer.id, showId, action: "results.tie_ordered", subjectType: "category", subjectId: cat.id, before: before ? { entryIds: before.entryIds, reason: before.reason } : null, after: { entryIds: input.entryIds, reason: input.reason } });
  });
}

/** Adds or edits a show-wide award; combinations are kept symmetric. */
export async function saveAward(viewer: Viewer, slug: string, input: AwardInput) {
  const showId = await openForChanges(viewer, slug);
  return inTx(showId, async (tx) => {
    const others = await tx.select({ id: showAwards.id, combinesWith: showAwards.combinesWith }).from(showAwards).where(eq(showAwards.showId, showId));
    if (input.combinesWith.some((id) => id === input.id || !others.some((o) => o.id === id))) throw badInput("Combinations: choose other awards of this show.");
    const values = { name: input.name, kind: input.kind, sponsor: input.sponsor, chooseBy: input.chooseBy, ribbon: input.ribbon, eligibility: input.eligibility, combinesWith: input.combinesWith, keepsCategoryPlace: input.keepsCategoryPlace };
    let id = input.id;
    try {
      if (id) {
        const [row] = await tx.update(showAwards).set(values).where(and(eq(showAwards.id, id), eq(showAwards.showId, showId))).returning({ id: showAwards.id });
        if (!row) throw notFound("That award is not at this show.");
      } else {
        const [row] = await tx.insert(showAwards).values({ showId, ...values, sortOrder: others.length }).returning({ id: showAwards.id });
        id = row!.id;
      }
    } catch (err) {
      throw conflictOnUnique(err, `There is already an award called “${input.name}”.`, { name: ["Choose another name."] });
    }
    for (const o of others.filter((o) => o.id !== id)) {
      const wants = input.combinesWith.includes(o.id);
      const has = o.combinesWith.includes(id!);
      if (wants !== has) await tx.update(showAwards).set({ combinesWith: wants ? [...o.combinesWith, id!] : o.combinesWith.filter((x) => x !== id) }).where(eq(showAwards.id, o.id));
    }
    await writeAudit(tx, { actorUserId: viewer.id, showId, action: input.id ? "results.award_changed" : "results.award_added", subjectType: "show_award", subjectId: id!, after: values });
    return { id: id! };
  });
}

export async function deleteAward(viewer: Viewer, slug: string, input: { awardId: string }) {
  const showId = await openForChanges(viewer, slug);
  return inTx(showId, async (tx) => {
    const [row] = await tx.delete(showAwards).where(and(eq(showAwards.id, input.awardId), eq(showAwards.showId, showId))).returning();
    if (!row) throw notFound("That award is not at this show.");
    for (const o of await tx.select({ id: showAwards.id, combinesWith: showAwards.combinesWith }).from(showAwards).where(eq(showAwards.showId, showId))) {
      if (o.combinesWith.includes(row.id)) await tx.update(showAwards).set({ combinesWith: o.combinesWith.filter((x) => x !== row.id) }).where(eq(showAwards.id, o.id));
    }
    await writeAudit(tx, { actorUserId: viewer.id, showId, action: "results.award_removed", subjectType: "show_award", subjectId: row.id, before: { name: row.name, kind: row.kind } });
  });
}

/** Records a judge's vote or choice (judgeUserId given) or the chair's own choice; replaces an earlier one. */
export async function recordPick(viewer: Viewer, slug: string, input: { awardId: string; entryId: string; judgeUserId: string; reason: string }) {
  const showId = await openForChanges(viewer, slug);
  return inTx(showId, async (tx) => {
    const [award] = await tx.select().from(showAwards).where(and(eq(showAwards.id, input.awardId), eq(showAwards.showId, showId)));
    if (!award) throw notFound("That award is not at this show.");
    const e = await entryOfShow(tx, showId, input.entryId);
    const judgeId = input.judgeUserId || null;
    if (judgeId) {
      const [seat] = await tx.select({ userId: panelMembers.userId }).from(panelMembers).innerJoin(judgingPanels, eq(judgingPanels.id, panelMembers.panelId)).where(and(eq(judgingPanels.showId, showId), eq(panelMembers.userId, judgeId), eq(panelMembers.role, "judge"))).limit(1);
      if (!seat) throw badInput("That person is not a judge at this show.");
      if (award.chooseBy === "chair" && award.kind !== "judges_choice") throw badInput(`${award.name} is the chair's choice; there are no judges' votes for it.`);
    } else if (award.kind === "judges_choice") throw badInput("A judge's choice is made by a judge: choose which judge.");
    const kind = award.chooseBy === "judges_vote" && judgeId ? "vote" : "choice";
    const existing = await tx.select().from(awardPicks).where(and(eq(awardPicks.awardId, award.id), judgeId ? eq(awardPicks.judgeUserId, judgeId) : sql`${awardPicks.judgeUserId} is null`));
    if (existing[0]) await tx.delete(awardPicks).where(eq(awardPicks.id, existing[0].id));
    const [row] = await tx.insert(awardPicks).values({ showId, awardId: award.id, entryId: e.id, judgeUserId: judgeId, kind, reason: input.reason, recordedBy: viewer.id }).returning({ id: awardPicks.id });
    await writeAudit(tx, { actorUserId: viewer.id, showId, action: "results.award_pick", subjectType: "show_award", subjectId: award.id, before: existing[0] ? { entryId: existing[0].entryId, reason: existing[0].reason } : null, after: { entryNumber: e.entryNumber, judgeUserId: judgeId, kind, reason: input.reason } });
    return { id: row!.id };
  });
}

export async function removePick(viewer: Viewer, slug: string, input: { pickId: string; reason: string }) {
  const showId = await openForChanges(viewer, slug);
  return inTx(showId, async (tx) => {
    const [row] = await tx.delete(awardPicks).where(and(eq(awardPicks.id, input.pickId), eq(awardPicks.showId, showId))).returning();
    if (!row) throw notFound("That vote or choice is not at this show.");
    await writeAudit(tx, { actorUserId: viewer.id, showId, action: "results.award_pick_removed", subjectType: "show_award", subjectId: row.awardId, before: { entryId: row.entryId, judgeUserId: row.judgeUserId }, after: { reason: input.reason } });
  });
}
