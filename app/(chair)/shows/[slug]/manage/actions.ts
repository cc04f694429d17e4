"use server";
// The chair's team actions: invite a judge, scribe or intake volunteer; remove a member.
import { revalidatePath } from "next/cache";
import { z } from "zod";
import { storableString } from "@/lib/validation";
import { sendDropOffReminders } from "@/db/queries/reminders";
import { inviteToTeam, removeFromTeam } from "@/db/queries/team";
import { defineAction } from "@/lib/action";
import { sendInvitationMail } from "@/lib/invitation-mail";
import { inviteSchema, removeRoleSchema, ROLE_LABELS } from "@/lib/schemas/show";
import { errorSummary } from "@/lib/error-log";

const showSlug = storableString().min(1, "The show is missing.").max(120);

export const inviteAction = defineAction(inviteSchema.extend({ showSlug }), async (input, viewer) => {
  const { token, show } = await inviteToTeam(viewer, input.showSlug, input);
  revalidatePath(`/shows/${show.slug}/manage`);
  try {
    await sendInvitationMail({ email: input.email, role: input.role, showName: show.name, inviterName: viewer.name, token });
  } catch (err) {
    console.error("[team] invitation mail failed", errorSummary(err));
    return { message: `The invitation is saved, but the e-mail to ${input.email} could not be sent. Try inviting again.` };
  }
  return { message: `Invitation sent to ${input.email} as ${ROLE_LABELS[input.role].toLowerCase()}.` };
});

export const removeMemberAction = defineAction(removeRoleSchema.extend({ showSlug }), async (input, viewer) => {
  await removeFromTeam(viewer, input.showSlug, input.roleId);
  revalidatePath(`/shows/${input.showSlug}/manage`);
  return { message: "Removed from the team." };
});

export const sendDropOffRemindersAction = defineAction(z.object({ showSlug }), async (input, viewer) => {
  const { sent, failed } = await sendDropOffReminders(viewer, input.showSlug);
  if (sent === 0 && failed === 0) return { message: "No entrant has a quilt expected at drop-off yet, so no reminder was sent." };
  return {
    message: failed
      ? `Reminders sent to ${sent} entrants; ${failed} could not be sent (see the server log) — try again later.`
      : `Drop-off reminders sent to ${sent} ${sent === 1 ? "entrant" : "entrants"}.`,
  };
});
