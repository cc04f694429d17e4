// The intake desk's list of a show's entries, with the entrant's name for the claim ticket, the
// category code the quilt hangs under, and the size measured at the desk with its flag.
import "server-only";
import { and, asc, eq, ne } from "drizzle-orm";
import { db } from "@/db/client";
import { categories, entrantProfiles, entries, user } from "@/db/schema";
import { AREA_ROLES, requireShowRole, type Viewer } from "@/lib/session";

export async function intakeList(viewer: Viewer, showSlug: string) {
  const show = await requireShowRole(viewer, showSlug, AREA_ROLES.desk);
  const rows = await db
    .select({
      id: entries.id,
      entryNumber: entries.entryNumber,
      title: entries.title,
      accountName: user.name,
      displayName: entrantProfiles.displayName,
      status: entries.status,
      widthUm: entries.widthUm,
      lengthUm: entries.lengthUm,
      categoryState: entries.categoryState,
      categoryCode: categories.code,
      categoryName: categories.name,
      measuredWidthUm: entries.measuredWidthUm,
      measuredLengthUm: entries.measuredLengthUm,
      sizeFlag: entries.sizeFlag,
    })
    .from(entries)
    .innerJoin(user, eq(user.id, entries.entrantUserId))
    .leftJoin(entrantProfiles, eq(entrantProfiles.userId, entries.entrantUserId))
    .leftJoin(categories, eq(categories.id, entries.categoryId))
    .where(and(eq(entries.showId, show.showId), ne(entries.status, "draft")))
    .orderBy(asc(entries.entryNumber));
  return {
    show: { name: show.name, slug: show.slug },
    entries: rows.map(({ accountName, displayName, ...r }) => ({ ...r, entrantName: displayName ?? accountName })),
  };
}
