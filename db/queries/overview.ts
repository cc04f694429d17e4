// The chair's overview of a show: its dates and how many entries stand at each status.
import "server-only";
import { count, eq } from "drizzle-orm";
import { db } from "@/db/client";
import { entries, shows } from "@/db/schema";
import { showDateColumns } from "@/db/queries/shows";
import { requireShowRole, type Viewer } from "@/lib/session";

export async function chairOverview(viewer: Viewer, showSlug: string) {
  const { showId } = await requireShowRole(viewer, showSlug, ["chair"]);
  const [show] = await db
    .select({
      name: shows.name,
      slug: shows.slug,
      status: shows.status,
      timeZone: shows.timeZone,
      guildName: shows.guildName,
      venueName: shows.venueName,
      ...showDateColumns,
    })
    .from(shows)
    .where(eq(shows.id, showId));
  const entryCounts = await db
    .select({ status: entries.status, n: count() })
    .from(entries)
    .where(eq(entries.showId, showId))
    .groupBy(entries.status);
  return { show: show!, entryCounts, totalEntries: entryCounts.reduce((s, r) => s + r.n, 0) };
}
