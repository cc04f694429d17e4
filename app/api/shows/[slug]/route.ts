// One show's public facts.
import { publicShowBySlug } from "@/db/queries/shows";
import { defineRoute } from "@/lib/api";
import { notFound } from "@/lib/errors";

export const GET = defineRoute<{ slug: string }>({ access: "public" }, async ({ params }) => {
  const show = await publicShowBySlug(params.slug);
  if (!show) throw notFound("There is no show at this address.");
  return { show };
});
