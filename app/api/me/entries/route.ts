// The signed-in entrant's own entries.
import { entriesForEntrant } from "@/db/queries/my-entries";
import { defineRoute } from "@/lib/api";

export const GET = defineRoute({ access: "user" }, async ({ viewer }) => ({ entries: await entriesForEntrant(viewer!) }));
