// The same two lines at the top of every protected page: who is asking, and the query that
// checks their role. Query errors become Next's 401/403/404 pages. The query does the real
// check (db/queries); layouts and hidden links are only convenience.
import "server-only";
import { forbidden, notFound, unauthorized } from "next/navigation";
import { AppError } from "@/lib/errors";
import type { Viewer } from "@/lib/session";
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
