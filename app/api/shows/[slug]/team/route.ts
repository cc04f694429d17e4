// The chair's view of the show team, and inviting a judge, scribe or intake volunteer.
import { inviteToTeam, teamForChair } from "@/db/queries/team";
import { defineRoute } from "@/lib/api";
import { errorSummary } from "@/lib/error-log";
import { sendInvitationMail } from "@/lib/invitation-mail";
import { inviteSchema } from "@/lib/schemas/show";

export const GET = defineRoute<{ slug: string }>({ access: "user" }, async ({ viewer, params }) => {
  const { members, invitations } = await teamForChair(viewer!, params.slug);
  return { members, invitations };
});

export const POST = defineRoute<{ slug: string }, typeof inviteSchema>(
  { access: "user", input: inviteSchema },
  async ({ viewer, params, input }) => {
    const { token, show } = await inviteToTeam(viewer!, params.slug, input);
    let mailed = true;
    try {
      await sendInvitationMail({ email: input.email, role: input.role, showName: show.name, inviterName: viewer!.name, token });
    } catch (err) {
      console.error("[api] invitation mail failed", errorSummary(err));
      mailed = false;
    }
    return { invited: input.email, role: input.role, mailed };
  },
);
