"use server";
// Saving each step of the entry form, and sending the entry to the show.
import { revalidatePath } from "next/cache";
import { saveEntryStep, submitEntry } from "@/db/queries/entries";
import { defineAction } from "@/lib/action";
import { aboutActionSchema, makersActionSchema, quiltActionSchema, submitActionSchema } from "@/lib/schemas/entry";

function revalidate(entryId: string) {
  revalidatePath(`/entries/${entryId}`);
  revalidatePath("/my");
}

export const saveQuiltAction = defineAction(quiltActionSchema, async ({ entryId, ...input }, viewer) => {
  await saveEntryStep(viewer, entryId, { step: "quilt", input });
  revalidate(entryId);
  return { message: "The quilt's details are saved." };
});

export const saveMakersAction = defineAction(makersActionSchema, async ({ entryId, ...input }, viewer) => {
  await saveEntryStep(viewer, entryId, { step: "makers", input });
  revalidate(entryId);
  return { message: "The makers are saved." };
});

export const saveAboutAction = defineAction(aboutActionSchema, async ({ entryId, ...input }, viewer) => {
  await saveEntryStep(viewer, entryId, { step: "about", input });
  revalidate(entryId);
  return { message: "About the quilt is saved." };
});

export const submitEntryAction = defineAction(submitActionSchema, async ({ entryId, ...input }, viewer) => {
  const result = await submitEntry(viewer, entryId, input);
  revalidate(entryId);
  return {
    message: result.waitlisted
      ? `Entry ${result.entryNumber} is sent, but the show is full: it is on the waiting list and gets a place only if one comes free.`
      : `Entry ${result.entryNumber} is sent to the show.`,
    data: result,
  };
});
