// An entrant's own entries across every show.
import "server-only";
import { asc, desc, eq } from "drizzle-orm";
import { db } from "@/db/client";
import { entries, shows } from "@/db/schema";
import type { Viewer } from "@/lib/session";

export async function entriesForEntrant(viewer: Viewer) {
  return db
    .select({
      id: entries.id,
      showName: shows.name,
      showSlug: shows.slug,
      entryNumber: entries.entryNumber,
      title: entries.title,
      widthUm: entries.widthUm,
      lengthUm: entries.lengthUm,
      status: entries.status,
    })
    .from(entries)
    .innerJoin(shows, eq(shows.id, entries.showId))
    .where(eq(entries.entrantUserId, viewer.id))
    .orderBy(desc(shows.showOpensAt), asc(entries.entryNumber));
}
