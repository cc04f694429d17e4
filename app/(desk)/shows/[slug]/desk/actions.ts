"use server";
// The intake desk's actions: recording the size a quilt measures at drop-off.
import { revalidatePath } from "next/cache";
import { storableString } from "@/lib/validation";
import { recordMeasurement } from "@/db/queries/category-queue";
import { defineAction } from "@/lib/action";
import { checkMeasuredLengths, measureFields } from "@/lib/schemas/categories";

const measureActionSchema = measureFields.extend({ slug: storableString().trim().min(1).max(120) }).superRefine(checkMeasuredLengths);

export const measureEntryAction = defineAction(measureActionSchema, async ({ slug, ...input }, viewer) => {
  const result = await recordMeasurement(viewer, slug, input);
  revalidatePath(`/shows/${slug}/desk`);
  const category = result.category ? ` Category: ${result.category}.` : "";
  return {
    message: `Entry ${result.entryNumber} measured.${result.flagged ? " Flagged for the chair." : ""}`,
    data: { ...result, summary: `${result.text}${category}` },
  };
});
