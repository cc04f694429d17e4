// The same two lines at the top of every protected page: who is asking, and the query that
// checks their role. Query errors become Next's 401/403/404 pages. The query does the real
// check (db/queries); layouts and hidden links are only convenience.
//
// Why layouts call these too: a loading.tsx starts streaming, and once streaming has started
// the HTTP status is fixed at 200 (Next docs, loading.js "Status codes"). A layout sits outside
// its own segment's loading boundary, so checking there first keeps real 401/403/404 statuses;
// the page still checks again through its query.
import "server-only";
import { forbidden, notFound, unauthorized } from "next/navigation";
import { AppError } from "@/lib/errors";
import { AREA_ROLES, requireShowRole, type Viewer } from "@/lib/session";
import { currentViewer } from "./viewer";

/** The signed-in viewer, or the "please sign in" page (401). */
export async function pageViewer(): Promise<Viewer> {
  const viewer = await currentViewer();
  if (!viewer) unauthorized();
  return viewer;
}

/** Awaits a query, turning AppError 401/403/404 into the matching page; anything else is rethrown. */
export async function guardQuery<T>(promise: Promise<T>): Promise<T> {
  try {
    return await promise;
  } catch (err) {
    if (err instanceof AppError) {
      if (err.status === 401) unauthorized();
      if (err.status === 403) forbidden();
      if (err.status === 404) notFound();
    }
    throw err;
  }
}

/** Layout-level check for a show area (manage, judging, desk): 401, 404 or 403 before streaming. */
export async function guardArea(showSlug: string, area: keyof typeof AREA_ROLES): Promise<Viewer> {
  const viewer = await pageViewer();
  await guardQuery(requireShowRole(viewer, showSlug, AREA_ROLES[area]));
  return viewer;
}

/** Layout-level check for the administrator's area. */
export async function guardAdmin(): Promise<Viewer> {
  const viewer = await pageViewer();
  if (!viewer.isAdmin) forbidden();
  return viewer;
}
