// Tablets post batches of score-sheet changes here; each has an idempotency key, so a batch sent
// twice (after a dropped reply) changes nothing the second time.
import { syncSheetChanges } from "@/db/queries/judging";
import { defineRoute } from "@/lib/api";
import { syncBatchSchema } from "@/lib/schemas/judging";

export const POST = defineRoute<{ slug: string }, typeof syncBatchSchema>({ access: "user", input: syncBatchSchema }, async ({ viewer, params, input }) =>
  Response.json(await syncSheetChanges(viewer!, params.slug, input), { status: 200 }),
);
