// Access rows for entry fees and withdrawals on "My entries". Each call gets a fresh entry of the
// entrant's; anyone else asking about it is told it is not theirs (404), never that it exists.
// (The payments webhook row lives in foundation.ts.)
import { makeEntry } from "../../../helpers/factories";
import { only, type Case, type World } from "../table";

const entrantsEntry = async (w: World) => (await makeEntry(w.show.id, w.users.entrant.id, { title: "Access Table Quilt" })).id;

export const actions: Record<string, Case> = {
  "(entrant)/my#startCheckoutAction": {
    expect: only({ entrant: 200 }, 404),
    input: async (w) => ({ showSlug: w.show.slug, entryIds: [await entrantsEntry(w)] }),
  },
  "(entrant)/my#setCritiqueRequestAction": {
    expect: only({ entrant: 200 }, 404),
    input: async (w) => ({ entryId: await entrantsEntry(w), requested: true }),
  },
  "(entrant)/my#withdrawEntryAction": {
    expect: only({ entrant: 200 }, 404),
    input: async (w) => ({ entryId: await entrantsEntry(w) }),
  },
};
