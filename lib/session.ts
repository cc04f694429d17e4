// Who is asking: the signed-in user, whether they administer the platform, and their roles per
// show. Every page, route handler and server action gets the viewer from here.
import "server-only";
import { eq } from "drizzle-orm";
import { headers as nextHeaders } from "next/headers";
import { db } from "@/db/client";
import { showRoles, shows, type ShowRole } from "@/db/schema";
type ShowStatus = (typeof shows.$inferSelect)["status"];
import { auth } from "@/lib/auth";
import { forbiddenError, notFound, unauthorized } from "@/lib/errors";

export type ViewerRole = { showId: string; showSlug: string; showName: string; role: ShowRole };

export type Viewer = {
  id: string;
  name: string;
  email: string;
  isAdmin: boolean;
  roles: ViewerRole[];
};

/** The signed-in viewer, or null. Pass request headers in route handlers; pages use next/headers. */
export async function getViewer(requestHeaders?: Headers): Promise<Viewer | null> {
  const h = requestHeaders ?? (await nextHeaders());
  const session = await auth.api.getSession({ headers: h });
  if (!session) return null;
  const roles = await db
    .select({ showId: shows.id, showSlug: shows.slug, showName: shows.name, role: showRoles.role })
    .from(showRoles)
    .innerJoin(shows, eq(shows.id, showRoles.showId))
    .where(eq(showRoles.userId, session.user.id));
  return {
    id: session.user.id,
    name: session.user.name,
    email: session.user.email,
    isAdmin: session.user.role === "admin",
    roles,
  };
}

export async function requireViewer(requestHeaders?: Headers): Promise<Viewer> {
  const viewer = await getViewer(requestHeaders);
  if (!viewer) throw unauthorized();
  return viewer;
}

export function requireAdmin(viewer: Viewer): Viewer {
  if (!viewer.isAdmin) throw forbiddenError("Only a platform administrator can do this.");
  return viewer;
}

export function rolesAt(viewer: Viewer | null, showSlugOrId: string): ShowRole[] {
  if (!viewer) return [];
  return viewer.roles
    .filter((r) => r.showSlug === showSlugOrId || r.showId === showSlugOrId)
    .map((r) => r.role);
}

export function hasShowRole(viewer: Viewer | null, showSlugOrId: string, allowed: readonly ShowRole[]): boolean {
  return rolesAt(viewer, showSlugOrId).some((r) => allowed.includes(r));
}

/**
 * The one role check: the show must exist and the viewer must hold one of `allowed` there.
 * Unknown shows answer 404 before the role is looked at, so a 403 never confirms a hidden show.
 */
export async function requireShowRole(
  viewer: Viewer,
  showSlug: string,
  allowed: readonly ShowRole[],
): Promise<{ showId: string; slug: string; name: string; status: ShowStatus; roles: ShowRole[] }> {
  const [show] = await db
    .select({ id: shows.id, slug: shows.slug, name: shows.name, status: shows.status })
    .from(shows)
    .where(eq(shows.slug, showSlug))
    .limit(1);
  if (!show) throw notFound("There is no show at this address.");
  const roles = rolesAt(viewer, show.id);
  if (!roles.some((r) => allowed.includes(r))) {
    throw forbiddenError(`This needs the ${allowed.join(" or ")} role at ${show.name}.`);
  }
  return { showId: show.id, slug: show.slug, name: show.name, status: show.status, roles };
}

/** Areas of a show and the roles that may enter them; pages, routes and navigation use these. */
export const AREA_ROLES = {
  manage: ["chair"],
  judging: ["judge", "scribe"],
  desk: ["intake", "chair"],
} as const satisfies Record<string, readonly ShowRole[]>;
