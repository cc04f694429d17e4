"use server";
// The chair's action on one entry's page: withdraw it, with a reason kept in its history.
import { revalidatePath } from "next/cache";
import { withdrawEntryAsChair } from "@/db/queries/withdrawals";
import { defineAction } from "@/lib/action";
import { chairWithdrawSchema } from "@/lib/schemas/withdrawals";

export const withdrawEntryAsChairAction = defineAction(chairWithdrawSchema, async (input, viewer) => {
  const result = await withdrawEntryAsChair(viewer, input.showSlug, input.entryId, input.reason);
  revalidatePath(`/shows/${input.showSlug}/manage/entries/${input.entryId}`);
  revalidatePath(`/shows/${input.showSlug}/manage/entries`);
  return { message: result.message, data: result };
});
