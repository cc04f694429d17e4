// Access rows for judging: the tablet's session and sync routes (judges and scribes on a panel)
// and the chair's progress board.
import { db } from "@/db/client";
import { judgingPanels, panelMembers } from "@/db/schema";
import { grantRole, makeShow } from "../../../helpers/factories";
import { everyone, only, type Case, type World } from "../table";

const seated = new WeakMap<World, Promise<string>>();

/**
 * A show of its own that is judging (so the shared show keeps its stage), with the world's judge
 * and scribe on one panel there; made once per world. Returns its slug.
 */
function judgingShow(w: World): Promise<string> {
  let p = seated.get(w);
  if (!p) {
    p = (async () => {
      const show = await makeShow({ status: "judging" });
      await grantRole(w.users.judge.id, show.id, "judge");
      await grantRole(w.users.scribe.id, show.id, "scribe");
      const [panel] = await db.insert(judgingPanels).values({ showId: show.id, name: "Access panel" }).returning();
      await db.insert(panelMembers).values([
        { panelId: panel!.id, userId: w.users.judge.id, role: "judge" },
        { panelId: panel!.id, userId: w.users.scribe.id, role: "scribe" },
      ]);
      return show.slug;
    })();
    seated.set(w, p);
  }
  return p;
}

export const routes: Record<string, Case> = {
  "GET /api/shows/[slug]/judging/session": { expect: only({ judge: 200, scribe: 200 }), request: async (w) => ({ params: { slug: w.show.slug } }) },
  // A scribe enters for the judge on their panel; anyone else names themselves and is refused.
  "POST /api/shows/[slug]/judging/sync": {
    expect: only({ judge: 200, scribe: 200 }),
    request: async (w, role) => {
      const slug = await judgingShow(w);
      const forJudge = role === "judge" || role === "scribe" ? w.users.judge.id : role === "anonymous" ? "nobody" : w.users[role].id;
      return { params: { slug }, body: { deviceId: `device-${role}-0001`, forJudge, changes: [] } };
    },
  },
  // The installable judging screen's manifest names only the page's address: public.
  "GET /api/shows/[slug]/judging/manifest": { expect: everyone(200), request: async (w) => ({ params: { slug: w.show.slug } }) },
  "GET /api/shows/[slug]/judging/progress": { expect: only({ chair: 200 }), request: async (w) => ({ params: { slug: w.show.slug } }) },
};
