"use server";
// The platform administrator's actions: create a show and appoint its chair.
import { revalidatePath } from "next/cache";
import { createShow } from "@/db/queries/shows";
import { defineAction } from "@/lib/action";
import { sendInvitationMail } from "@/lib/invitation-mail";
import { createShowSchema } from "@/lib/schemas/show";
import { errorSummary } from "@/lib/error-log";

export const createShowAction = defineAction(createShowSchema, async (input, viewer) => {
  const { show, token } = await createShow(viewer, input);
  // Mail after commit: a failed send must not undo the show, and the admin can re-invite.
  try {
    await sendInvitationMail({ email: input.chairEmail, role: "chair", showName: show.name, inviterName: viewer.name, token });
  } catch (err) {
    console.error("[admin] chair invitation mail failed", errorSummary(err));
    revalidatePath("/admin");
    return { message: `${show.name} was created, but the e-mail to ${input.chairEmail} could not be sent. Invite the chair again.`, data: { slug: show.slug } };
  }
  revalidatePath("/admin");
  return { message: `${show.name} was created. We e-mailed ${input.chairEmail} an invitation to chair it.`, data: { slug: show.slug } };
});
