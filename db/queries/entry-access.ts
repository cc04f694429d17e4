// Who may read and change an entry: the entrant who owns it while the show takes entries, the
// show's chair at any time. Everyone else gets a 404, so an id confirms nothing.
import "server-only";
import { eq } from "drizzle-orm";
import { db, type Tx } from "@/db/client";
import { entries, shows, type Entry } from "@/db/schema";
import { entryWindow } from "@/components/shows/entry-window";
import { formatDateTime } from "@/components/format/dates";
import { conflict, notFound } from "@/lib/errors";
import { isUuid } from "@/lib/ids";
import { hasShowRole, type Viewer } from "@/lib/session";

export type ShowFacts = { id: string; slug: string; name: string; timeZone: string; status: string; entryOpensAt: Date | null; entryClosesAt: Date | null };

export const showFacts = {
  id: shows.id,
  slug: shows.slug,
  name: shows.name,
  timeZone: shows.timeZone,
  status: shows.status,
  entryOpensAt: shows.entryOpensAt,
  entryClosesAt: shows.entryClosesAt,
};

/** Statuses in which the entrant still owns the paperwork; later the show has the quilt. */
const ENTRANT_EDITABLE = new Set(["draft", "submitted", "paid"]);


export type Access = { entry: Entry; show: ShowFacts; isChair: boolean };

/** The entry if the viewer owns it or chairs its show; a 404 for anyone else, so ids confirm nothing. */
export async function entryAccess(viewer: Viewer, entryId: string, reader: Pick<Tx, "select"> = db, lock = false): Promise<Access> {
  if (!isUuid(entryId)) throw notFound("There is no such entry.");
  const query = reader.select({ entry: entries, show: showFacts }).from(entries).innerJoin(shows, eq(shows.id, entries.showId)).where(eq(entries.id, entryId));
  const [row] = lock ? await query.for("update", { of: entries }) : await query;
  if (!row) throw notFound("There is no such entry.");
  const isChair = hasShowRole(viewer, row.show.id, ["chair"]);
  if (row.entry.entrantUserId !== viewer.id && !isChair) throw notFound("There is no such entry.");
  return { ...row, isChair };
}

/** Why this viewer may not change the entry now, in words for them; null when they may. */
export function editBlock(a: { entry: Pick<Entry, "status">; show: ShowFacts; isChair: boolean }, now = new Date()): string | null {
  if (a.entry.status === "withdrawn") return "This entry was withdrawn, so it can't be changed.";
  if (a.isChair) return null;
  if (!ENTRANT_EDITABLE.has(a.entry.status)) {
    return "The show is already handling this entry; ask the show's chair if something needs changing.";
  }
  const window = entryWindow(a.show, now);
  if (window === "closed") {
    const when = formatDateTime(a.show.entryClosesAt, a.show.timeZone);
    return `Entries for ${a.show.name} closed${when ? ` on ${when}` : ""}. You can still read your entry, but not change it.`;
  }
  if (window === "not_yet") return `${a.show.name} is not taking entries yet.`;
  return null;
}

export function assertEditable(a: Access): void {
  const block = editBlock(a);
  if (block) throw conflict(block);
}
