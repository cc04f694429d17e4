// Access rows for the chair's entries table, its spreadsheet, its bulk actions and the withdrawal
// on one entry's page.
import { db } from "@/db/client";
import { showSettings } from "@/db/schema";
import { grantRole, makeEntry, makeShow } from "../../../helpers/factories";
import { only, type Case, type World } from "../table";

const slug = async (w: World) => ({ params: { slug: w.show.slug } });
/** A fresh entry per call, so one caller's success never changes what the next one meets. */
const fresh = async (w: World) => (await makeEntry(w.show.id, w.users.entrant.id, { status: "submitted" })).id;

export const routes: Record<string, Case> = {
  "GET /api/shows/[slug]/entries": { expect: only({ chair: 200 }), request: async (w) => ({ ...(await slug(w)), query: "?q=test&sort=title&limit=10" }) },
  "GET /api/shows/[slug]/entries/export": { expect: only({ chair: 200 }), request: slug },
};

export const actions: Record<string, Case> = {
  "(chair)/shows/[slug]/manage/entries#acceptEntriesAction": {
    expect: only({ chair: 200 }),
    input: async (w) => ({ showSlug: w.show.slug, entryIds: [await fresh(w)] }),
  },
  "(chair)/shows/[slug]/manage/entries#declineEntriesAction": {
    expect: only({ chair: 200 }),
    input: async (w) => ({ showSlug: w.show.slug, entryIds: [await fresh(w)], reason: "Outside the size limits" }),
  },
  "(chair)/shows/[slug]/manage/entries#markPaidOfflineAction": {
    expect: only({ chair: 200 }),
    input: async (w) => ({ showSlug: w.show.slug, entryIds: [await fresh(w)], reference: "cash" }),
  },
  // The chair withdraws with a reason; a fresh entry per call, so each caller meets one to withdraw.
  "(chair)/shows/[slug]/manage/entries/[entryId]#withdrawEntryAsChairAction": {
    expect: only({ chair: 200 }),
    input: async (w) => ({ showSlug: w.show.slug, entryId: await fresh(w), reason: "The entrant asked by phone" }),
  },
  // Releasing needs a juried show: one of its own per call, with the same team as the table's show.
  "(chair)/shows/[slug]/manage/entries#releaseDecisionsAction": {
    expect: only({ chair: 200 }),
    input: async (w) => {
      const show = await makeShow();
      await db.insert(showSettings).values({ showId: show.id, juried: true });
      await grantRole(w.users.chair.id, show.id, "chair");
      for (const r of ["judge", "scribe", "intake"] as const) await grantRole(w.users[r].id, show.id, r);
      await makeEntry(show.id, w.users.entrant.id, { status: "accepted" });
      return { showSlug: show.slug };
    },
  },
};
