// Access rows for the chair's show settings: the settings route and every settings action.
// Writes run against a show of their own (the world's chair made its chair too), so moving
// dates or the stage never changes the shared show other rows rely on.
import { grantRole, makeCategory, makeEntry, makeShow } from "../../../helpers/factories";
import { only, type Case, type World } from "../table";

async function ownShow(w: World, status: "entries_open" | "entries_closed" = "entries_open") {
  const show = await makeShow({ status });
  await grantRole(w.users.chair.id, show.id, "chair");
  return show;
}

const BLANK_DATES = {
  entryOpensAt: "",
  lateFeeFromAt: "",
  dropOffStartsAt: "",
  dropOffEndsAt: "",
  judgingStartsAt: "",
  judgingEndsAt: "",
  showOpensAt: "",
  showClosesAt: "",
  pickUpStartsAt: "",
  pickUpEndsAt: "",
};

const base = "(chair)/shows/[slug]/manage/settings";

export const routes: Record<string, Case> = {
  "GET /api/shows/[slug]/settings": { expect: only({ chair: 200 }), request: async (w) => ({ params: { slug: w.show.slug } }) },
};

export const actions: Record<string, Case> = {
  [`${base}#updateDatesAction`]: {
    expect: only({ chair: 200 }),
    input: async (w) => ({ showSlug: (await ownShow(w)).slug, ...BLANK_DATES, entryClosesAt: "2099-02-15T23:59" }),
  },
  [`${base}#updateSettingsAction`]: {
    expect: only({ chair: 200 }),
    input: async (w) => ({ showSlug: (await ownShow(w)).slug, section: "limits", maxEntriesPerEntrant: "5", maxEntriesPerCategory: "2", capacity: "" }),
  },
  [`${base}#publishRulesAction`]: {
    expect: only({ chair: 200 }),
    input: async (w) => ({ showSlug: (await ownShow(w)).slug, rulesText: "Quilts must be finished and labelled.", releaseText: "I release the guild from liability." }),
  },
  // entries closed → judging needs categories (and no entry without one), so the chair's move succeeds.
  [`${base}#changeStatusAction`]: {
    expect: only({ chair: 200 }),
    input: async (w) => {
      const show = await ownShow(w, "entries_closed");
      const category = await makeCategory(show.id);
      // A paid entry with a category: someone to judge, so nothing refuses the move.
      await makeEntry(show.id, w.users.entrant.id, { status: "paid", paidAt: new Date(), categoryId: category.id, categoryState: "decided" });
      // No panel judges the new category yet: a warning, so the move carries the chair's reason.
      return { showSlug: show.slug, status: "judging", reason: "Panels are set on the morning of judging." };
    },
  },
};
