// Input schema for the chair's withdrawal of an entry, shared by the form on the chair's entry page
// and its server action. (The entrant's own withdrawal takes only the entry id.)
import { z } from "zod";
import { storableString } from "@/lib/validation";

export const chairWithdrawSchema = z.object({
  showSlug: storableString().min(1, "The show is missing.").max(120),
  entryId: z.uuid("Choose an entry to withdraw."),
  reason: storableString("Give the reason for withdrawing this entry.")
    .trim()
    .min(1, "Give the reason for withdrawing this entry; it is kept in the entry's history.")
    .max(1000, "Keep the reason under 1,000 characters."),
});
export type ChairWithdrawInput = z.input<typeof chairWithdrawSchema>;
