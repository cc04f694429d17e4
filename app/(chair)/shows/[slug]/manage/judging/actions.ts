"use server";
// The chair's judging set-up actions: score sheets, each category's method and sheet, panels,
// declarations, judges' conflicts, options, reopening a submitted sheet and reading a sheet's history. Each query
// checks the chair role itself (addDeclaration and removeDeclaration also let a judge act for themselves).
import { revalidatePath } from "next/cache";
import { z } from "zod";
import { storableString } from "@/lib/validation";
import { resolveConflict } from "@/db/queries/judge-conflicts";
import { sheetHistory } from "@/db/queries/judging";
import { addDeclaration, deletePanel, removeDeclaration, reopenJudgeSheet, saveJudgingOptions, savePanel, saveScoreSheet, setCategoryJudging } from "@/db/queries/judging-setup";
import { defineAction } from "@/lib/action";
import {
  categoryJudgingSchema,
  declarationSchema,
  deleteDeclarationSchema,
  deletePanelSchema,
  judgingOptionsSchema,
  panelSchema,
  reopenSchema,
  saveSheetSchema,
} from "@/lib/schemas/judging";
import { judgeAnywaySchema, resolveConflictSchema } from "@/lib/schemas/judge-conflicts";
import { setJudgeAnyway } from "@/db/queries/judged-entries";

const showSlug = storableString().min(1, "The show is missing.").max(120);
const withSlug = <S extends z.ZodType>(schema: S) => z.intersection(schema, z.object({ showSlug }));

function refresh(slug: string) {
  revalidatePath(`/shows/${slug}/manage/judging`);
  revalidatePath(`/shows/${slug}/manage/judging/progress`);
}

export const saveScoreSheetAction = defineAction(withSlug(saveSheetSchema), async (input, viewer) => {
  const { showSlug: slug, ...sheet } = input;
  const { id, nominalMax } = await saveScoreSheet(viewer, slug, sheet);
  refresh(slug);
  return { message: `“${sheet.name}” saved (total ${nominalMax}).`, data: { id } };
});

export const setCategoryJudgingAction = defineAction(withSlug(categoryJudgingSchema), async (input, viewer) => {
  const { showSlug: slug, ...choice } = input;
  await setCategoryJudging(viewer, slug, choice);
  refresh(slug);
  return { message: "Saved." };
});

export const savePanelAction = defineAction(withSlug(panelSchema), async (input, viewer) => {
  const { showSlug: slug, ...panel } = input;
  const { id } = await savePanel(viewer, slug, panel);
  refresh(slug);
  return { message: `${panel.name} saved.`, data: { id } };
});

export const deletePanelAction = defineAction(withSlug(deletePanelSchema), async (input, viewer) => {
  await deletePanel(viewer, input.showSlug, { panelId: input.panelId });
  refresh(input.showSlug);
  return { message: "Panel deleted." };
});

export const addDeclarationAction = defineAction(withSlug(declarationSchema), async (input, viewer) => {
  const { showSlug: slug, ...declaration } = input;
  await addDeclaration(viewer, slug, declaration);
  refresh(slug);
  return { message: "Declaration recorded." };
});

export const removeDeclarationAction = defineAction(withSlug(deleteDeclarationSchema), async (input, viewer) => {
  await removeDeclaration(viewer, input.showSlug, { declarationId: input.declarationId });
  refresh(input.showSlug);
  return { message: "Declaration removed." };
});

export const resolveConflictAction = defineAction(withSlug(resolveConflictSchema), async (input, viewer) => {
  const { showSlug: slug, ...decision } = input;
  const { panelsLeft } = await resolveConflict(viewer, slug, decision);
  refresh(slug);
  return { message: decision.action === "move" ? `The judge is off ${panelsLeft.join(", ") || "that panel"}.` : "Recorded: the judge may judge this entry." };
});

export const saveJudgingOptionsAction = defineAction(withSlug(judgingOptionsSchema), async (input, viewer) => {
  const { showSlug: slug, ...options } = input;
  await saveJudgingOptions(viewer, slug, options);
  refresh(slug);
  return { message: "Judging options saved." };
});

export const reopenSheetAction = defineAction(withSlug(reopenSchema), async (input, viewer) => {
  await reopenJudgeSheet(viewer, input.showSlug, { sheetId: input.sheetId, reason: input.reason });
  refresh(input.showSlug);
  return { message: "Sheet reopened; the judge can change it now." };
});

const historySchema = withSlug(z.object({ sheetId: z.uuid() }));
export type SheetHistoryRow = Awaited<ReturnType<typeof sheetHistory>>[number];

/** Reads one sheet's history for the progress board (an action, so it needs no route of its own). */
export const sheetHistoryAction = defineAction<typeof historySchema, SheetHistoryRow[]>(historySchema, async (input, viewer) => {
  return { data: await sheetHistory(viewer, input.showSlug, input.sheetId) };
});

export const judgeAnywayAction = defineAction(withSlug(judgeAnywaySchema), async (input, viewer) => {
  const { entryNumber, changed } = await setJudgeAnyway(viewer, input.showSlug, input);
  refresh(input.showSlug);
  revalidatePath(`/shows/${input.showSlug}/manage/settings`);
  if (!changed) return { message: `Nothing changed for entry ${entryNumber}.` };
  return { message: input.judge ? `Entry ${entryNumber} will be judged although it is not paid.` : `Entry ${entryNumber} is judged only once it is paid.` };
});
