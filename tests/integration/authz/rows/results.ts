// Access rows for the chair's results: the results files and every results action. Writes run
// against a show of their own at judging (the world's chair its chair, the world's judge on its
// panel), so publishing never touches the shared show other rows rely on. All are the chair's alone.
import { db } from "@/db/client";
import { judgingPanels, panelMembers, resultPublications, showAwards, awardPicks, placementOverrides } from "@/db/schema";
import { DEFAULT_RESULT_RULES } from "@/scoring/results";
import { grantRole, makeCategory, makeEntry, makeShow } from "../../../helpers/factories";
import { only, type Case, type World } from "../table";

async function judgingShow(w: World, status: "judging" | "results_published" = "judging") {
  const show = await makeShow({ status });
  await grantRole(w.users.chair.id, show.id, "chair");
  await grantRole(w.users.judge.id, show.id, "judge");
  const [panel] = await db.insert(judgingPanels).values({ showId: show.id, name: "Access panel" }).returning({ id: judgingPanels.id });
  await db.insert(panelMembers).values({ panelId: panel!.id, userId: w.users.judge.id, role: "judge" });
  return show;
}

async function withEntry(w: World) {
  const show = await judgingShow(w);
  const category = await makeCategory(show.id);
  const entry = await makeEntry(show.id, w.users.entrant.id, { status: "received", categoryId: category.id, categoryState: "decided" });
  return { show, category, entry };
}

const RIBBON = { name: "Purple", colour: "#6b21a8" };
async function withAward(w: World) {
  const { show, entry } = await withEntry(w);
  const [award] = await db.insert(showAwards).values({ showId: show.id, name: "Best of Show", kind: "best_of_show", ribbon: RIBBON }).returning({ id: showAwards.id });
  return { show, entry, awardId: award!.id };
}

const base = "(chair)/shows/[slug]/manage/results";

export const routes: Record<string, Case> = {
  "GET /api/shows/[slug]/exports/[kind]": { expect: only({ chair: 200 }), request: async (w) => ({ params: { slug: w.show.slug, kind: "awards" } }) },
};

export const actions: Record<string, Case> = {
  [`${base}#saveResultRulesAction`]: { expect: only({ chair: 200 }), input: async (w) => ({ showSlug: (await judgingShow(w)).slug, ...DEFAULT_RESULT_RULES }) },
  [`${base}#overridePlacementAction`]: {
    expect: only({ chair: 200 }),
    input: async (w) => {
      const { show, entry } = await withEntry(w);
      return { showSlug: show.slug, entryId: entry.id, outcome: "hm", reason: "Judges' discretion." };
    },
  },
  [`${base}#clearPlacementAction`]: {
    expect: only({ chair: 200 }),
    input: async (w) => {
      const { show, category, entry } = await withEntry(w);
      await db.insert(placementOverrides).values({ entryId: entry.id, showId: show.id, categoryId: category.id, place: 1, reason: "Earlier change." });
      return { showSlug: show.slug, entryId: entry.id, reason: "Back to the rules." };
    },
  },
  [`${base}#saveTieOrderAction`]: {
    expect: only({ chair: 200 }),
    input: async (w) => {
      const { show, category, entry } = await withEntry(w);
      const other = await makeEntry(show.id, w.users.entrant.id, { status: "received", categoryId: category.id, categoryState: "decided" });
      return { showSlug: show.slug, categoryId: category.id, entryIds: [other.id, entry.id], reason: "The chair's call." };
    },
  },
  [`${base}#saveAwardAction`]: {
    expect: only({ chair: 200 }),
    input: async (w) => ({ showSlug: (await judgingShow(w)).slug, name: "Best hand quilting", kind: "best_hand_quilting", sponsor: "", chooseBy: "chair", ribbon: RIBBON, eligibility: { quiltingMethods: ["hand"] }, combinesWith: [], keepsCategoryPlace: true }),
  },
  [`${base}#deleteAwardAction`]: {
    expect: only({ chair: 200 }),
    input: async (w) => {
      const { show, awardId } = await withAward(w);
      return { showSlug: show.slug, awardId };
    },
  },
  [`${base}#recordPickAction`]: {
    expect: only({ chair: 200 }),
    input: async (w) => {
      const { show, entry, awardId } = await withAward(w);
      return { showSlug: show.slug, awardId, entryId: entry.id, judgeUserId: "", reason: "" };
    },
  },
  [`${base}#removePickAction`]: {
    expect: only({ chair: 200 }),
    input: async (w) => {
      const { show, entry, awardId } = await withAward(w);
      const [pick] = await db.insert(awardPicks).values({ showId: show.id, awardId, entryId: entry.id, kind: "choice" }).returning({ id: awardPicks.id });
      return { showSlug: show.slug, pickId: pick!.id, reason: "Recorded in error." };
    },
  },
  [`${base}#publishResultsAction`]: { expect: only({ chair: 200 }), input: async (w) => ({ showSlug: (await judgingShow(w)).slug, reason: "" }) },
  [`${base}#unpublishResultsAction`]: {
    expect: only({ chair: 200 }),
    input: async (w) => {
      const show = await judgingShow(w, "results_published");
      await db.insert(resultPublications).values({ showId: show.id, version: 1, snapshot: { version: 1, publishedAt: new Date().toISOString(), categories: [], awards: [] } });
      return { showSlug: show.slug, reason: "Taken down to fix a ribbon." };
    },
  },
};
