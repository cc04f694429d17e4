// The chair's entries table: one page of a show's entries, searched, filtered and sorted here.
import { entriesForChair } from "@/db/queries/chair-entries";
import { defineRoute } from "@/lib/api";
import { entriesListSchema } from "@/lib/schemas/chair-entries";

export const GET = defineRoute<{ slug: string }, typeof entriesListSchema>({ access: "user", input: entriesListSchema }, async ({ viewer, params, input }) =>
  entriesForChair(viewer!, params.slug, input),
);
