"use server";
// The chair's results actions: rules and ribbons, a placement changed by hand, a tie order,
// show-wide awards and their picks, publish and unpublish. Each query checks the chair role.
import { revalidatePath } from "next/cache";
import { z } from "zod";
import { clearPlacement, deleteAward, overridePlacement, recordPick, removePick, saveAward, saveResultRules, saveTieOrder } from "@/db/queries/result-changes";
import { publishResults, unpublishResults } from "@/db/queries/results";
import { defineAction } from "@/lib/action";
import {
  awardSchema, clearPlacementSchema, deleteAwardSchema, pickSchema, placementSchema, publishSchema, removePickSchema, resultRulesSchema, tieOrderSchema, unpublishSchema,
} from "@/lib/schemas/results";

const showSlug = z.string().min(1, "The show is missing.");
const withSlug = <S extends z.ZodType>(schema: S) => z.intersection(schema, z.object({ showSlug }));

function refresh(slug: string) {
  revalidatePath(`/shows/${slug}/manage/results`);
  revalidatePath(`/shows/${slug}/results`);
  revalidatePath(`/shows/${slug}`);
}

export const saveResultRulesAction = defineAction(withSlug(resultRulesSchema), async ({ showSlug: slug, ...rules }, viewer) => {
  await saveResultRules(viewer, slug, rules);
  refresh(slug);
  return { message: "Result rules saved." };
});

export const overridePlacementAction = defineAction(withSlug(placementSchema), async ({ showSlug: slug, ...input }, viewer) => {
  await overridePlacement(viewer, slug, input);
  refresh(slug);
  return { message: "Placement changed; the reason is in the audit log." };
});

export const clearPlacementAction = defineAction(withSlug(clearPlacementSchema), async ({ showSlug: slug, ...input }, viewer) => {
  await clearPlacement(viewer, slug, input);
  refresh(slug);
  return { message: "Back to the proposed placement." };
});

export const saveTieOrderAction = defineAction(withSlug(tieOrderSchema), async ({ showSlug: slug, ...input }, viewer) => {
  await saveTieOrder(viewer, slug, input);
  refresh(slug);
  return { message: "Tie order saved." };
});

export const saveAwardAction = defineAction(withSlug(awardSchema), async ({ showSlug: slug, ...input }, viewer) => {
  const { id } = await saveAward(viewer, slug, input);
  refresh(slug);
  return { message: `${input.name} saved.`, data: { id } };
});

export const deleteAwardAction = defineAction(withSlug(deleteAwardSchema), async ({ showSlug: slug, ...input }, viewer) => {
  await deleteAward(viewer, slug, input);
  refresh(slug);
  return { message: "Award removed." };
});

export const recordPickAction = defineAction(withSlug(pickSchema), async ({ showSlug: slug, ...input }, viewer) => {
  await recordPick(viewer, slug, input);
  refresh(slug);
  return { message: input.judgeUserId ? "Recorded." : "The chair's choice is recorded." };
});

export const removePickAction = defineAction(withSlug(removePickSchema), async ({ showSlug: slug, ...input }, viewer) => {
  await removePick(viewer, slug, input);
  refresh(slug);
  return { message: "Removed." };
});

export const publishResultsAction = defineAction(withSlug(publishSchema), async ({ showSlug: slug, ...input }, viewer) => {
  const { version } = await publishResults(viewer, slug, input);
  refresh(slug);
  return { message: `Results published (version ${version}).` };
});

export const unpublishResultsAction = defineAction(withSlug(unpublishSchema), async ({ showSlug: slug, ...input }, viewer) => {
  const { version } = await unpublishResults(viewer, slug, input);
  refresh(slug);
  return { message: `Version ${version} taken down. The public page and the entrants' pages show no results until you publish again.` };
});
