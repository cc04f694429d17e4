"use server";
// Accepting an invitation to a show role, then going to the area that role opens.
import { redirect } from "next/navigation";
import { acceptInvitation } from "@/db/queries/invitations";
import { defineAction } from "@/lib/action";
import { tokenSchema } from "@/lib/schemas/show";

const areaFor = { chair: "manage", judge: "judging", scribe: "judging", intake: "desk" } as const;

export const acceptInvitationAction = defineAction(tokenSchema, async ({ token }, viewer) => {
  const { role, showSlug } = await acceptInvitation(viewer, token);
  redirect(`/shows/${showSlug}/${areaFor[role]}`);
});
