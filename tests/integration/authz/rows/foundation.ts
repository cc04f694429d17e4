// Access rows for the foundation: health, the viewer, shows, teams, invitations, payments webhook,
// the admin's and chair's actions, the profile.
import { db } from "@/db/client";
import { createInvitation } from "@/db/queries/invitations";
import { showRoles } from "@/db/schema";
import { makeShow, makeUser, unique } from "../../../helpers/factories";
import { everyone, only, signedIn, type Case, type World } from "../table";

export const routes: Record<string, Case> = {
  "GET /api/health": { expect: everyone(200) },
  "GET /api/me": { expect: signedIn(200) },
  "GET /api/me/entries": { expect: signedIn(200) },
  "GET /api/shows": { expect: everyone(200) },
  "POST /api/shows": {
    expect: only({ admin: 201 }),
    request: async () => ({ body: { name: "Autumn Test Show", slug: unique("autumn"), guildName: "Guild", venueName: "Hall", timeZone: "America/Chicago", chairEmail: `${unique("c")}@example.test` } }),
  },
  "GET /api/shows/[slug]": { expect: everyone(200), request: async (w) => ({ params: { slug: w.show.slug } }) },
  "GET /api/shows/[slug]/team": { expect: only({ chair: 200 }), request: async (w) => ({ params: { slug: w.show.slug } }) },
  "POST /api/shows/[slug]/team": {
    expect: only({ chair: 201 }),
    request: async (w) => ({ params: { slug: w.show.slug }, body: { email: `${unique("j")}@example.test`, role: "judge" } }),
  },
  "GET /api/shows/[slug]/judging/queue": { expect: only({ judge: 200, scribe: 200 }), request: async (w) => ({ params: { slug: w.show.slug } }) },
  "GET /api/shows/[slug]/desk/entries": { expect: only({ intake: 200, chair: 200 }), request: async (w) => ({ params: { slug: w.show.slug } }) },
  "GET /api/invitations/[token]": {
    expect: everyone(200),
    request: async (w) => ({ params: { token: await invite(w, w.users.entrant.email, "judge") } }),
  },
  // The invitation is the entrant's: anyone else signed in is the wrong person (403).
  "POST /api/invitations/[token]/accept": {
    expect: only({ entrant: 201 }),
    request: async (w) => ({ params: { token: await invite(w, w.users.entrant.email, "scribe") } }),
  },
  // Webhooks carry no session; an unsigned delivery is refused whoever sends it.
  "POST /api/payments/webhook": { expect: everyone(400), request: async () => ({ body: { id: "evt_unsigned" } }) },
};

// better-auth's own endpoints are tested in tests/integration/auth; they are listed so that the
// discovery check below still accounts for the file.
export const delegated = new Set(["GET /api/auth/[...all]", "POST /api/auth/[...all]"]);

export const actions: Record<string, Case> = {
  "(admin)/admin#createShowAction": {
    expect: only({ admin: 200 }),
    input: async () => ({ name: "Action Test Show", slug: unique("action"), guildName: "Guild", venueName: "Hall", timeZone: "Europe/London", chairEmail: `${unique("c")}@example.test` }),
  },
  "(chair)/shows/[slug]/manage#inviteAction": {
    expect: only({ chair: 200 }),
    input: async (w) => ({ showSlug: w.show.slug, email: `${unique("s")}@example.test`, role: "scribe" }),
  },
  "(chair)/shows/[slug]/manage#sendDropOffRemindersAction": {
    expect: only({ chair: 200 }),
    input: async (w) => ({ showSlug: w.show.slug }),
  },
  "(chair)/shows/[slug]/manage#removeMemberAction": {
    expect: only({ chair: 200 }),
    input: async (w) => {
      const helper = await makeUser();
      const [row] = await db.insert(showRoles).values({ showId: w.show.id, userId: helper.id, role: "scribe" }).returning();
      return { showSlug: w.show.slug, roleId: row!.id };
    },
  },
  // Success redirects to the role's area (303 here); the wrong person gets 403.
  "invitations/[token]#acceptInvitationAction": {
    expect: only({ entrant: 303 }),
    input: async (w) => ({ token: await invite(w, w.users.entrant.email, "intake") }),
  },
  "(entrant)/account#saveProfileAction": {
    expect: signedIn(200),
    input: async () => ({ displayName: "Pat Example", phone: "555-0100", publishNameConsent: "on" }),
  },
};

async function invite(w: World, email: string, role: "judge" | "scribe" | "intake"): Promise<string> {
  const inviter = { ...w.users.chair, isAdmin: false, roles: [] };
  // A show of its own per call: once accepted, a second invitation to the same role would be a 409.
  const show = await makeShow();
  return db.transaction((tx) => createInvitation(tx, inviter, show.id, { email, role }));
}
