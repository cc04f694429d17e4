// The chair's live progress board: per panel, category and judge, with the expected finish.
import { progressBoard } from "@/db/queries/judging-setup";
import { defineRoute } from "@/lib/api";

export const dynamic = "force-dynamic";

export const GET = defineRoute<{ slug: string }>({ access: "user" }, async ({ viewer, params }) => progressBoard(viewer!, params.slug));
