// Accepting an invitation as the signed-in, invited person.
import { acceptInvitation } from "@/db/queries/invitations";
import { defineRoute } from "@/lib/api";

export const POST = defineRoute<{ token: string }>({ access: "user" }, async ({ viewer, params }) =>
  acceptInvitation(viewer!, params.token),
);
