"use server";
// The entrant's own payment and withdrawal actions on "My entries".
import { revalidatePath } from "next/cache";
import { z } from "zod";
import { storableString } from "@/lib/validation";
import { setCritiqueRequest } from "@/db/queries/critique-requests";
import { startCheckout } from "@/db/queries/payments";
import { withdrawEntry } from "@/db/queries/withdrawals";
import { defineAction } from "@/lib/action";

const checkoutSchema = z.object({
  showSlug: storableString().trim().min(1, "Which show is this for?"),
  entryIds: z.preprocess(
    (v) => (v === undefined || v === "" ? [] : Array.isArray(v) ? v : [v]),
    z.array(z.uuid("Choose entries from the list.")).min(1, "Choose at least one entry to pay for.").max(50, "Pay for at most 50 entries at once."),
  ),
});

/** Starts a checkout; the browser goes on to `data.url` (the provider's payment page). */
export const startCheckoutAction = defineAction(checkoutSchema, async (input, viewer) => {
  const started = await startCheckout(viewer, input);
  revalidatePath("/my");
  return { message: "Taking you to the payment page…", data: started };
});

const withdrawSchema = z.object({ entryId: z.uuid("Choose an entry to withdraw.") });

export const withdrawEntryAction = defineAction(withdrawSchema, async (input, viewer) => {
  const result = await withdrawEntry(viewer, input.entryId);
  revalidatePath("/my");
  return { message: result.message, data: result };
});

const critiqueSchema = z.object({ entryId: z.uuid("Choose an entry."), requested: z.boolean("Say whether you want a critique.") });

/** Asks for (or stops asking for) a judge's critique of a sent entry while the show takes entries. */
export const setCritiqueRequestAction = defineAction(critiqueSchema, async (input, viewer) => {
  const result = await setCritiqueRequest(viewer, input.entryId, input.requested);
  revalidatePath("/my");
  return { message: result.message };
});
