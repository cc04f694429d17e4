// Shows: the public listing and page, and the administrator's creation of a show.
import "server-only";
import { and, asc, count, eq, isNull, ne } from "drizzle-orm";
import { db } from "@/db/client";
import { entries, showInvitations, showRoles, shows, user } from "@/db/schema";
import { writeAudit } from "@/db/queries/audit";
import { createInvitation } from "@/db/queries/invitations";
import { conflict, isUniqueViolation, notFound } from "@/lib/errors";
import type { CreateShowInput } from "@/lib/schemas/show";
import { requireAdmin, type Viewer } from "@/lib/session";

/** The dates of each stage of a show, for every screen that lists them. */
export const showDateColumns = {
  entryOpensAt: shows.entryOpensAt,
  entryClosesAt: shows.entryClosesAt,
  dropOffStartsAt: shows.dropOffStartsAt,
  dropOffEndsAt: shows.dropOffEndsAt,
  judgingStartsAt: shows.judgingStartsAt,
  judgingEndsAt: shows.judgingEndsAt,
  showOpensAt: shows.showOpensAt,
  showClosesAt: shows.showClosesAt,
  pickUpStartsAt: shows.pickUpStartsAt,
  pickUpEndsAt: shows.pickUpEndsAt,
};

/** The columns of a show anyone may see. */
export const publicShowColumns = {
  id: shows.id,
  slug: shows.slug,
  name: shows.name,
  guildName: shows.guildName,
  venueName: shows.venueName,
  venueAddress: shows.venueAddress,
  timeZone: shows.timeZone,
  status: shows.status,
  ...showDateColumns,
};

export type PublicShow = Awaited<ReturnType<typeof publicShowBySlug>> & {};

/** Shows anyone may see: everything past its draft. */
export async function listPublicShows() {
  return db
    .select(publicShowColumns)
    .from(shows)
    .where(ne(shows.status, "draft"))
    .orderBy(asc(shows.showOpensAt), asc(shows.name));
}

export async function publicShowBySlug(slug: string) {
  const [show] = await db
    .select(publicShowColumns)
    .from(shows)
    .where(and(eq(shows.slug, slug), ne(shows.status, "draft")))
    .limit(1);
  return show ?? null;
}

/** Every show with its chairs and entry count, for the platform administrator. */
export async function showsForAdmin(viewer: Viewer) {
  requireAdmin(viewer);
  const rows = await db.select(publicShowColumns).from(shows).orderBy(asc(shows.name));
  const chairs = await db
    .select({ showId: showRoles.showId, name: user.name, email: user.email })
    .from(showRoles)
    .innerJoin(user, eq(user.id, showRoles.userId))
    .where(eq(showRoles.role, "chair"));
  const counts = await db
    .select({ showId: entries.showId, n: count() })
    .from(entries)
    .groupBy(entries.showId);
  const pending = await db
    .select({ showId: showInvitations.showId, email: showInvitations.email })
    .from(showInvitations)
    .where(and(eq(showInvitations.role, "chair"), isNull(showInvitations.acceptedAt), isNull(showInvitations.revokedAt)));
  return rows.map((s) => ({
    ...s,
    chairs: chairs.filter((c) => c.showId === s.id).map(({ name, email }) => ({ name, email })),
    invitedChairs: pending.filter((p) => p.showId === s.id).map((p) => p.email),
    entryCount: counts.find((c) => c.showId === s.id)?.n ?? 0,
  }));
}

/**
 * Creates a show in draft and invites its chair. Returns the invitation token so the caller
 * can send the e-mail after the transaction has committed.
 */
export async function createShow(viewer: Viewer, input: CreateShowInput) {
  requireAdmin(viewer);
  try {
    return await db.transaction(async (tx) => {
      const { chairEmail, ...fields } = input;
      const [show] = await tx.insert(shows).values({ ...fields, status: "draft" }).returning({
        id: shows.id,
        slug: shows.slug,
        name: shows.name,
      });
      if (!show) throw new Error("insert returned no row");
      await writeAudit(tx, {
        actorUserId: viewer.id,
        showId: show.id,
        action: "show.created",
        subjectType: "show",
        subjectId: show.id,
        after: fields,
      });
      const token = await createInvitation(tx, viewer, show.id, { email: chairEmail, role: "chair" });
      return { show, token };
    });
  } catch (err) {
    if (isUniqueViolation(err)) {
      throw conflict("Another show already uses this web address.", { slug: ["Another show already uses this web address."] });
    }
    throw err;
  }
}

export async function showIdBySlug(slug: string): Promise<string> {
  const [row] = await db.select({ id: shows.id }).from(shows).where(eq(shows.slug, slug)).limit(1);
  if (!row) throw notFound("There is no show at this address.");
  return row.id;
}
