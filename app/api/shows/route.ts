// Public list of shows; the platform administrator creates new ones here.
import { createShow, listPublicShows } from "@/db/queries/shows";
import { defineRoute } from "@/lib/api";
import { errorSummary } from "@/lib/error-log";
import { sendInvitationMail } from "@/lib/invitation-mail";
import { createShowSchema } from "@/lib/schemas/show";

export const GET = defineRoute({ access: "public" }, async () => ({ shows: await listPublicShows() }));

export const POST = defineRoute({ access: "user", input: createShowSchema }, async ({ viewer, input }) => {
  const { show, token } = await createShow(viewer!, input);
  let chairInvited = true;
  try {
    await sendInvitationMail({ email: input.chairEmail, role: "chair", showName: show.name, inviterName: viewer!.name, token });
  } catch (err) {
    console.error("[api] chair invitation mail failed", errorSummary(err));
    chairInvited = false;
  }
  return { show, chairInvited };
});
