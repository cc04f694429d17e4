// Access rows for the chair's results: the results files and every results action. Writes run
// against a show of their own at judging (the world's chair its chair, the world's judge on its
// panel), so publishing never touches the shared show other rows rely on. All are the chair's alone.
import { randomUUID } from "node:crypto";
import { db } from "@/db/client";
import { entryPhotos, judgeSheets, judgingPanels, panelMembers, resultPublications, showAwards, awardPicks, placementOverrides } from "@/db/schema";
import { DEFAULT_RESULT_RULES, type PublishedResults } from "@/scoring/results";
import { ensureBucket, putObject } from "@/storage/s3";
import { grantRole, makeCategory, makeEntry, makeShow } from "../../../helpers/factories";
import { pngOf } from "../../../helpers/photo-fixtures";
import { everyone, only, signedIn, type Case, type World } from "../table";

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

/** A show whose results are out: the world's entrant's entry placed 1st, a submitted sheet, a photo. */
async function publishedShow(w: World) {
  const show = await judgingShow(w, "results_published");
  const category = await makeCategory(show.id);
  const entry = await makeEntry(show.id, w.users.entrant.id, { status: "received", categoryId: category.id, categoryState: "decided" });
  await db.insert(judgeSheets).values({ showId: show.id, entryId: entry.id, judgeUserId: w.users.judge.id, status: "submitted", state: { status: "submitted", version: 1, fields: {}, conflicts: [] } as never });
  const snapshot: PublishedResults = {
    version: 1, publishedAt: new Date().toISOString(), awards: [],
    categories: [{ id: category.id, code: category.code, name: category.name, entries: [{ entryId: entry.id, entryNumber: entry.entryNumber!, title: entry.title, entrantUserId: w.users.entrant.id, categoryId: category.id, place: 1, placeLabel: "1st", honorableMention: false, ribbon: RIBBON, awards: [] }] }],
  };
  const [pub] = await db.insert(resultPublications).values({ showId: show.id, version: 1, snapshot }).returning({ id: resultPublications.id });
  return { show, entry, publicationId: pub!.id };
}

async function publishedPhoto(w: World) {
  const { show, entry } = await publishedShow(w);
  await ensureBucket();
  const key = `tests/authz/${randomUUID()}/web.png`;
  await putObject(key, await pngOf(40, 30), "image/png");
  const [row] = await db.insert(entryPhotos).values({ entryId: entry.id, view: "full", storageKey: key, webKey: key, thumbKey: key, widthPx: 40, heightPx: 30, bytes: 100, contentType: "image/png" }).returning({ id: entryPhotos.id });
  return { slug: show.slug, photoId: row!.id };
}

const base = "(chair)/shows/[slug]/manage/results";

export const routes: Record<string, Case> = {
  // Only the entrant's own entry; anyone else is told there is no critique, so an id confirms nothing.
  "GET /api/entries/[id]/critique": { expect: { ...signedIn(404), entrant: 200 }, request: async (w) => ({ params: { id: (await publishedShow(w)).entry.id } }) },
  // Published, awarded entries' full photos are public (the results page has no sign-in).
  "GET /api/shows/[slug]/results/photos/[photoId]": { expect: everyone(200), request: async (w) => ({ params: await publishedPhoto(w) }) },
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
  [`${base}#resendResultMailsAction`]: { expect: only({ chair: 200 }), input: async (w) => ({ showSlug: (await publishedShow(w)).show.slug }) },
  [`${base}#unpublishResultsAction`]: {
    expect: only({ chair: 200 }),
    input: async (w) => {
      const show = await judgingShow(w, "results_published");
      await db.insert(resultPublications).values({ showId: show.id, version: 1, snapshot: { version: 1, publishedAt: new Date().toISOString(), categories: [], awards: [] } });
      return { showSlug: show.slug, reason: "Taken down to fix a ribbon." };
    },
  },
};
