// Access rows for the intake desk: recording the size a quilt measures at drop-off is for the
// show's intake volunteers and its chair (AREA_ROLES.desk); judges, scribes, entrants, the platform
// admin and another show's chair are refused, and an anonymous caller is asked to sign in.
import { makeEntry } from "../../../helpers/factories";
import { only, type Case, type World } from "../table";

/** A fresh sent entry of the world's show for each call, so every caller measures its own quilt. */
async function measureInput(w: World) {
  const entry = await makeEntry(w.show.id, w.users.entrant.id, { status: "paid", techniques: ["pieced"] });
  return { slug: w.show.slug, entryId: entry.id, width: "62", length: "80", unit: "in" };
}

export const actions: Record<string, Case> = {
  "(desk)/shows/[slug]/desk#measureEntryAction": { expect: only({ intake: 200, chair: 200 }), input: measureInput },
};
