// Access rows for the chair's categories screen: saving the set, placing an entry by hand,
// marking a size flag reviewed, giving a waiting entry its place and the intake tolerance are the
// show's chair's alone. Each call runs on a show of its own (the world's chair made its chair),
// so one caller's save or override never changes what the next one meets, or the world's show.
import { randomUUID } from "node:crypto";
import { grantRole, makeCategory, makeEntry, makeShow } from "../../../helpers/factories";
import { only, type Case, type World } from "../table";

const base = "(chair)/shows/[slug]/manage/categories";

async function ownShow(w: World) {
  const show = await makeShow({ status: "entries_closed" });
  await grantRole(w.users.chair.id, show.id, "chair");
  return show;
}

/** An own show with one sent entry; `fields` set the entry's columns (a size flag, the waiting list). */
async function showWithEntry(w: World, fields: Parameters<typeof makeEntry>[2] = {}) {
  const show = await ownShow(w);
  const entry = await makeEntry(show.id, w.users.entrant.id, { status: "submitted", ...fields });
  return { show, entry };
}

export const actions: Record<string, Case> = {
  // No entries, so the first save has no moves to confirm and writes the set.
  [`${base}#saveCategoriesAction`]: {
    expect: only({ chair: 200 }),
    input: async (w) => ({
      showSlug: (await ownShow(w)).slug,
      overlap: "flag",
      categories: [{ id: randomUUID(), code: "10", name: "All judged quilts", description: "", precedence: 10, conditions: [{ kind: "judged", value: true }], cap: null, mergedIntoId: null }],
    }),
  },
  [`${base}#overrideCategoryAction`]: {
    expect: only({ chair: 200 }),
    input: async (w) => {
      const { show, entry } = await showWithEntry(w);
      const category = await makeCategory(show.id);
      return { showSlug: show.slug, entryId: entry.id, categoryId: category.id, reason: "Judges asked for it here" };
    },
  },
  [`${base}#reviewSizeFlagAction`]: {
    expect: only({ chair: 200 }),
    input: async (w) => {
      const { show, entry } = await showWithEntry(w, { sizeFlag: "Measured 62 × 80 in, registered 60 × 80 in: off by 2 in." });
      return { showSlug: show.slug, entryId: entry.id };
    },
  },
  [`${base}#admitFromWaitlistAction`]: {
    expect: only({ chair: 200 }),
    input: async (w) => {
      const { show, entry } = await showWithEntry(w, { waitlisted: true, waitlistReason: "10 All judged quilts is full (1 entries)." });
      return { showSlug: show.slug, entryId: entry.id, reason: "A withdrawal freed a place" };
    },
  },
  [`${base}#updateToleranceAction`]: {
    expect: only({ chair: 200 }),
    input: async (w) => ({ showSlug: (await ownShow(w)).slug, tolerance: "0.5", unit: "in" }),
  },
};
