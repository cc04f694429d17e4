// Access rows for the chair's result and entrant exports.
import { only, type Case, type World } from "../table";

const slug = async (w: World) => ({ params: { slug: w.show.slug } });

export const routes: Record<string, Case> = {
  "GET /api/shows/[slug]/exports/entrants": { expect: only({ chair: 200 }), request: slug },
};
