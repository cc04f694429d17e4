// What judges and scribes may see of a show's entries. Blind by construction: the select lists
// only the quilt's own facts, never the entrant, maker or quilter (madeBy/quiltedBy are names).
import "server-only";
import { and, asc, eq, isNotNull, notInArray } from "drizzle-orm";
import { db } from "@/db/client";
import { entries } from "@/db/schema";
import { AREA_ROLES, requireShowRole, type Viewer } from "@/lib/session";

export async function judgingQueue(viewer: Viewer, showSlug: string) {
  const show = await requireShowRole(viewer, showSlug, AREA_ROLES.judging);
  const rows = await db
    .select({
      entryNumber: entries.entryNumber,
      title: entries.title,
      widthUm: entries.widthUm,
      lengthUm: entries.lengthUm,
      techniques: entries.techniques,
      quiltingMethod: entries.quiltingMethod,
      division: entries.division,
      judged: entries.judged,
    })
    .from(entries)
    .where(
      and(
        eq(entries.showId, show.showId),
        isNotNull(entries.entryNumber),
        eq(entries.judged, true),
        notInArray(entries.status, ["draft", "declined", "withdrawn"]),
      ),
    )
    .orderBy(asc(entries.entryNumber));
  return {
    show: { name: show.name, slug: show.slug },
    entries: rows.map((r) => ({ ...r, entryNumber: r.entryNumber! })),
  };
}
