// Access rows for the chair's judging set-up and progress board actions. Every write runs against
// a show of its own (the world's chair its chair, the world's judge its judge), so sheets, panels
// and declarations never change the shared show other rows rely on. A judge may record and remove
// their own declarations; everything else is the chair's alone.
import { db } from "@/db/client";
import { judgeDeclarations, judgeSheets, judgingPanels, panelCategories, panelMembers } from "@/db/schema";
import { grantRole, makeCategory, makeEntry, makeShow } from "../../../helpers/factories";
import { only, type Case, type World } from "../table";

async function ownShow(w: World, status: "entries_closed" | "judging" = "entries_closed") {
  const show = await makeShow({ status });
  await grantRole(w.users.chair.id, show.id, "chair");
  await grantRole(w.users.judge.id, show.id, "judge");
  return show;
}

/** A submitted sheet of the world's judge for a fresh entry in a judging show of its own. */
async function submittedSheet(w: World) {
  const show = await ownShow(w, "judging");
  const entry = await makeEntry(show.id, w.users.entrant.id, { status: "received" });
  const [sheet] = await db
    .insert(judgeSheets)
    .values({ showId: show.id, entryId: entry.id, judgeUserId: w.users.judge.id, status: "submitted", version: 1, state: { status: "submitted", version: 1, fields: {}, conflicts: [] }, submittedAt: new Date() })
    .returning({ id: judgeSheets.id });
  return { showSlug: show.slug, sheetId: sheet!.id };
}

const SHEET = { sections: [{ id: "whole", title: "Whole quilt", criteria: [{ id: "impact", label: "Visual impact", maxPoints: 100, scale: { kind: "points" }, allowNotApplicable: false }] }] };

const base = "(chair)/shows/[slug]/manage/judging";

export const actions: Record<string, Case> = {
  [`${base}#saveScoreSheetAction`]: {
    expect: only({ chair: 200 }),
    input: async (w) => ({ showSlug: (await ownShow(w)).slug, name: "Access sheet", isDefault: true, sheet: SHEET }),
  },
  [`${base}#setCategoryJudgingAction`]: {
    expect: only({ chair: 200 }),
    input: async (w) => {
      const show = await ownShow(w);
      const category = await makeCategory(show.id);
      return { showSlug: show.slug, categoryId: category.id, method: "sort_then_points", scoreSheetId: null };
    },
  },
  [`${base}#savePanelAction`]: {
    expect: only({ chair: 200 }),
    input: async (w) => ({ showSlug: (await ownShow(w)).slug, name: "Access panel", day: "", room: "", judgeIds: [w.users.judge.id], scribeIds: [], categoryIds: [] }),
  },
  [`${base}#deletePanelAction`]: {
    expect: only({ chair: 200 }),
    input: async (w) => {
      const show = await ownShow(w);
      const [panel] = await db.insert(judgingPanels).values({ showId: show.id, name: "Panel to delete" }).returning({ id: judgingPanels.id });
      return { showSlug: show.slug, panelId: panel!.id };
    },
  },
  // The chair names the judge; a judge declares for themselves.
  [`${base}#addDeclarationAction`]: {
    expect: only({ chair: 200, judge: 200 }),
    input: async (w, role) => ({ showSlug: (await ownShow(w)).slug, ...(role === "judge" ? {} : { judgeUserId: w.users.judge.id }), personName: "Hollis Fernbrook", personEmail: "", relation: "student" }),
  },
  [`${base}#removeDeclarationAction`]: {
    expect: only({ chair: 200, judge: 200 }),
    input: async (w) => {
      const show = await ownShow(w);
      const [row] = await db.insert(judgeDeclarations).values({ showId: show.id, judgeUserId: w.users.judge.id, personName: "Hollis Fernbrook", relation: "client" }).returning({ id: judgeDeclarations.id });
      return { showSlug: show.slug, declarationId: row!.id };
    },
  },
  // The judge's own entry in a category of their panel: an open conflict only the chair decides.
  [`${base}#resolveConflictAction`]: {
    expect: only({ chair: 200 }),
    input: async (w) => {
      const show = await ownShow(w);
      const category = await makeCategory(show.id);
      const entry = await makeEntry(show.id, w.users.judge.id, { categoryId: category.id, categoryState: "decided" });
      const [panel] = await db.insert(judgingPanels).values({ showId: show.id, name: "Conflict panel" }).returning({ id: judgingPanels.id });
      await db.insert(panelMembers).values({ panelId: panel!.id, userId: w.users.judge.id, role: "judge" });
      await db.insert(panelCategories).values({ panelId: panel!.id, categoryId: category.id });
      return { showSlug: show.slug, judgeUserId: w.users.judge.id, entryId: entry.id, action: "allow", reason: "The chair has checked it." };
    },
  },
  [`${base}#judgeAnywayAction`]: {
    expect: only({ chair: 200 }),
    input: async (w) => {
      const show = await ownShow(w, "entries_closed");
      const entry = await makeEntry(show.id, w.users.entrant.id, { status: "submitted" });
      return { showSlug: show.slug, entryId: entry.id, judge: true, reason: "Paid in cash at the guild meeting." };
    },
  },
  [`${base}#saveJudgingOptionsAction`]: {
    expect: only({ chair: 200 }),
    input: async (w) => ({ showSlug: (await ownShow(w)).slug, commentPolicy: "placed", quickPhrases: ["Even binding."], judgeFields: ["title", "size"] }),
  },
  [`${base}#reopenSheetAction`]: {
    expect: only({ chair: 200 }),
    input: async (w) => ({ ...(await submittedSheet(w)), reason: "The judge asked to look again." }),
  },
  [`${base}#sheetHistoryAction`]: {
    expect: only({ chair: 200 }),
    input: async (w) => submittedSheet(w),
  },
};
