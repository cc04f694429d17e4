// What a tablet caches when a judging session starts: queue, released facts, photos, sheets and
// each sheet's state. Blind: no entrant, maker or quilter names, contacts or guilds.
import { judgingSession } from "@/db/queries/judging";
import { defineRoute } from "@/lib/api";

export const dynamic = "force-dynamic";

export const GET = defineRoute<{ slug: string }>({ access: "user" }, async ({ viewer, params }) => judgingSession(viewer!, params.slug));
