// Invitations to a show role: a chair (or, for chairs, the administrator) invites by e-mail; the
// person follows the link, signs up or in, and accepts. Only a hash of the token is stored.
import "server-only";
import { createHash, randomBytes } from "node:crypto";
import { and, eq, gt, isNull, sql } from "drizzle-orm";
import { db, type Tx } from "@/db/client";
import { showInvitations, showRoles, shows, user, type ShowRole } from "@/db/schema";
import { writeAudit } from "@/db/queries/audit";
import { conflict, forbiddenError, notFound } from "@/lib/errors";
import { ROLE_LABELS } from "@/lib/schemas/show";
import type { Viewer } from "@/lib/session";

const INVITATION_DAYS = 14;

export const hashToken = (token: string) => createHash("sha256").update(token).digest("hex");

/** Inserts an invitation inside `tx` and returns the token for the link (only ever mailed). */
export async function createInvitation(
  tx: Tx,
  viewer: Viewer,
  showId: string,
  input: { email: string; role: ShowRole },
): Promise<string> {
  const email = input.email.toLowerCase();
  const [already] = await tx
    .select({ id: showRoles.id })
    .from(showRoles)
    .innerJoin(user, eq(user.id, showRoles.userId))
    .where(and(eq(showRoles.showId, showId), eq(showRoles.role, input.role), sql`lower(${user.email}) = ${email}`))
    .limit(1);
  if (already) {
    throw conflict(`${email} is already ${article(input.role)} at this show.`, { email: ["Already on the team in this role."] });
  }
  // A new invitation replaces an unanswered one for the same person and role.
  await tx
    .update(showInvitations)
    .set({ revokedAt: new Date() })
    .where(
      and(
        eq(showInvitations.showId, showId),
        eq(showInvitations.email, email),
        eq(showInvitations.role, input.role),
        isNull(showInvitations.acceptedAt),
        isNull(showInvitations.revokedAt),
      ),
    );
  const token = randomBytes(32).toString("base64url");
  const [row] = await tx
    .insert(showInvitations)
    .values({
      showId,
      email,
      role: input.role,
      tokenHash: hashToken(token),
      invitedBy: viewer.id,
      expiresAt: new Date(Date.now() + INVITATION_DAYS * 86_400_000),
    })
    .returning({ id: showInvitations.id });
  await writeAudit(tx, {
    actorUserId: viewer.id,
    showId,
    action: "invitation.created",
    subjectType: "invitation",
    subjectId: row!.id,
    after: { email, role: input.role },
  });
  return token;
}

/** What the invitation page shows; null when the link is unknown, used, revoked or expired. */
export async function invitationByToken(token: string) {
  const [row] = await db
    .select({
      id: showInvitations.id,
      email: showInvitations.email,
      role: showInvitations.role,
      expiresAt: showInvitations.expiresAt,
      acceptedAt: showInvitations.acceptedAt,
      revokedAt: showInvitations.revokedAt,
      showId: shows.id,
      showSlug: shows.slug,
      showName: shows.name,
      showTimeZone: shows.timeZone,
      invitedByName: user.name,
    })
    .from(showInvitations)
    .innerJoin(shows, eq(shows.id, showInvitations.showId))
    .leftJoin(user, eq(user.id, showInvitations.invitedBy))
    .where(eq(showInvitations.tokenHash, hashToken(token)))
    .limit(1);
  if (!row) return null;
  const state = row.acceptedAt
    ? ("accepted" as const)
    : row.revokedAt
      ? ("revoked" as const)
      : row.expiresAt < new Date()
        ? ("expired" as const)
        : ("open" as const);
  return { ...row, state };
}

/** Grants the invited role to the signed-in viewer, whose e-mail must be the invited one. */
export async function acceptInvitation(viewer: Viewer, token: string) {
  return db.transaction(async (tx) => {
    const [inv] = await tx
      .select()
      .from(showInvitations)
      .where(
        and(
          eq(showInvitations.tokenHash, hashToken(token)),
          isNull(showInvitations.acceptedAt),
          isNull(showInvitations.revokedAt),
          gt(showInvitations.expiresAt, new Date()),
        ),
      )
      .for("update")
      .limit(1);
    if (!inv) throw notFound("This invitation has expired, was withdrawn or has been used already.");
    // Why: a forwarded link must not hand a judging seat to whoever clicks it first.
    if (inv.email !== viewer.email.toLowerCase()) {
      throw forbiddenError(`This invitation was sent to ${inv.email}; you are signed in as ${viewer.email}.`);
    }
    await tx
      .insert(showRoles)
      .values({ showId: inv.showId, userId: viewer.id, role: inv.role, grantedBy: inv.invitedBy })
      .onConflictDoNothing();
    await tx
      .update(showInvitations)
      .set({ acceptedAt: new Date(), acceptedBy: viewer.id })
      .where(eq(showInvitations.id, inv.id));
    await writeAudit(tx, {
      actorUserId: viewer.id,
      showId: inv.showId,
      action: "role.granted",
      subjectType: "user",
      subjectId: viewer.id,
      after: { role: inv.role, via: "invitation", invitationId: inv.id },
    });
    const [show] = await tx.select({ slug: shows.slug }).from(shows).where(eq(shows.id, inv.showId));
    return { role: inv.role, showSlug: show!.slug };
  });
}

function article(role: ShowRole): string {
  const label = ROLE_LABELS[role].toLowerCase();
  return /^[aeiou]/.test(label) ? `an ${label}` : `a ${label}`;
}
