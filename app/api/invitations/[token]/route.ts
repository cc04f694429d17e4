// What an invitation link is for (show, role, invited address), for the invitation page.
import { invitationByToken } from "@/db/queries/invitations";
import { defineRoute } from "@/lib/api";
import { notFound } from "@/lib/errors";

export const GET = defineRoute<{ token: string }>({ access: "public" }, async ({ params }) => {
  const inv = await invitationByToken(params.token);
  if (!inv) throw notFound("This invitation link is not known.");
  return { email: inv.email, role: inv.role, state: inv.state, showName: inv.showName, showSlug: inv.showSlug };
});
