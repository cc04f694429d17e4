// The viewer's seats at shows with each show's status, for choosing where they land after
// signing in (lib/landing.ts decides; this only reads).
import "server-only";
import { eq } from "drizzle-orm";
import { db } from "@/db/client";
import { showRoles, shows } from "@/db/schema";
import { landingFor, type LandingSeat } from "@/lib/landing";
import type { Viewer } from "@/lib/session";

export async function seatsForViewer(viewer: Viewer): Promise<LandingSeat[]> {
  return db
    .select({ showSlug: shows.slug, showName: shows.name, role: showRoles.role, status: shows.status })
    .from(showRoles)
    .innerJoin(shows, eq(shows.id, showRoles.showId))
    .where(eq(showRoles.userId, viewer.id));
}

/** Where this viewer should land now. */
export async function landingForViewer(viewer: Viewer): Promise<string> {
  return landingFor(await seatsForViewer(viewer));
}
