// A show's team (chair, judges, scribes, intake volunteers): listing, inviting and removing.
import "server-only";
import { and, asc, eq, isNull } from "drizzle-orm";
import { db } from "@/db/client";
import { showInvitations, showRoles, user, type ShowRole } from "@/db/schema";
import { writeAudit } from "@/db/queries/audit";
import { createInvitation } from "@/db/queries/invitations";
import { conflict, notFound } from "@/lib/errors";
import { requireShowRole, type Viewer } from "@/lib/session";

export async function teamForChair(viewer: Viewer, showSlug: string) {
  const show = await requireShowRole(viewer, showSlug, ["chair"]);
  const members = await db
    .select({ roleId: showRoles.id, role: showRoles.role, userId: user.id, name: user.name, email: user.email, since: showRoles.createdAt })
    .from(showRoles)
    .innerJoin(user, eq(user.id, showRoles.userId))
    .where(eq(showRoles.showId, show.showId))
    .orderBy(asc(showRoles.role), asc(user.name));
  const invitations = await db
    .select({ id: showInvitations.id, email: showInvitations.email, role: showInvitations.role, expiresAt: showInvitations.expiresAt, createdAt: showInvitations.createdAt })
    .from(showInvitations)
    .where(and(eq(showInvitations.showId, show.showId), isNull(showInvitations.acceptedAt), isNull(showInvitations.revokedAt)))
    .orderBy(asc(showInvitations.createdAt));
  return { show, members, invitations };
}

/** A chair invites a judge, scribe or intake volunteer; returns the token for the e-mail. */
export async function inviteToTeam(viewer: Viewer, showSlug: string, input: { email: string; role: ShowRole }) {
  const show = await requireShowRole(viewer, showSlug, ["chair"]);
  const token = await db.transaction((tx) => createInvitation(tx, viewer, show.showId, input));
  return { token, show };
}

/** The administrator appoints (invites) a chair for a show. */
export async function inviteChair(viewer: Viewer, showId: string, email: string) {
  return db.transaction((tx) => createInvitation(tx, viewer, showId, { email, role: "chair" }));
}

export async function removeFromTeam(viewer: Viewer, showSlug: string, roleId: string) {
  const show = await requireShowRole(viewer, showSlug, ["chair"]);
  await db.transaction(async (tx) => {
    const [row] = await tx
      .select()
      .from(showRoles)
      .where(and(eq(showRoles.id, roleId), eq(showRoles.showId, show.showId)))
      .for("update");
    if (!row) throw notFound("That team member was not found at this show.");
    if (row.role === "chair") {
      const chairs = await tx.select({ id: showRoles.id }).from(showRoles).where(and(eq(showRoles.showId, show.showId), eq(showRoles.role, "chair")));
      if (chairs.length <= 1) throw conflict("A show needs at least one chair; appoint another before removing this one.");
    }
    await tx.delete(showRoles).where(eq(showRoles.id, roleId));
    await writeAudit(tx, {
      actorUserId: viewer.id,
      showId: show.showId,
      action: "role.revoked",
      subjectType: "user",
      subjectId: row.userId,
      before: { role: row.role as ShowRole },
    });
  });
}
