// An invitation to a show role, opened from the e-mail link. Who may accept is decided by the
// action (acceptInvitation checks the signed-in e-mail); this page explains each case.
import type { Metadata } from "next";
import { ArrowRight, MailX } from "lucide-react";
import { AuthCard } from "@/components/auth/auth-card";
import { withQuery } from "@/components/auth/safe-next";
import { formatDate } from "@/components/format/dates";
import { AcceptInvitationForm } from "@/components/invitations/accept-form";
import { currentViewer } from "@/components/shell/viewer";
import { SignOutButton } from "@/components/shell/sign-out-button";
import { areaHref, areasFor } from "@/components/shell/nav";
import { Alert } from "@/components/ui/alert";
import { ButtonLink } from "@/components/ui/button";
import { invitationByToken } from "@/db/queries/invitations";
import { ROLE_LABELS } from "@/lib/schemas/show";

type Props = { params: Promise<{ token: string }> };

// The token is in the address: never pass it on to other sites in the Referer header.
export const metadata: Metadata = { title: "Invitation", referrer: "no-referrer", robots: { index: false } };

const withArticle = (label: string) => (/^[aeiou]/i.test(label) ? `an ${label}` : `a ${label}`);

export default async function InvitationPage({ params }: Props) {
  const { token } = await params;
  const [invitation, viewer] = await Promise.all([invitationByToken(token), currentViewer()]);

  if (!invitation) {
    return (
      <AuthCard title="This invitation link doesn’t work">
        <Alert tone="warning" title="We can’t find an invitation for this link.">
          Check that the whole link was copied from the e-mail, or ask the show chair to invite you again.
        </Alert>
      </AuthCard>
    );
  }

  const role = ROLE_LABELS[invitation.role];
  const path = `/invitations/${token}`;
  const inviter = invitation.invitedByName ?? "The show committee";
  const area = areasFor([invitation.role])[0];
  const areaLink = area ? areaHref(invitation.showSlug, area) : "/my";
  const headline = (
    <p>
      {inviter} invited <strong className="break-all text-ink">{invitation.email}</strong> to be {withArticle(role)} at{" "}
      <strong className="text-ink">{invitation.showName}</strong>.
    </p>
  );

  if (invitation.state !== "open") {
    const held = viewer?.roles.some((r) => r.showSlug === invitation.showSlug && r.role === invitation.role);
    const message = {
      accepted: "This invitation has been accepted already.",
      revoked: "This invitation was withdrawn or replaced by a newer one.",
      expired: `This invitation expired on ${formatDate(invitation.expiresAt, invitation.showTimeZone)}.`,
    }[invitation.state];
    return (
      <AuthCard title="Invitation" description={headline}>
        <div className="space-y-4">
          <Alert tone={invitation.state === "accepted" ? "info" : "warning"} title={message}>
            {held ? null : "If you still want to help at this show, ask the chair to send a new invitation."}
          </Alert>
          {held ? (
            <ButtonLink href={areaLink} icon={<ArrowRight aria-hidden className="size-5" />}>
              Go to {invitation.showName}
            </ButtonLink>
          ) : (
            <MailX aria-hidden className="mx-auto size-10 text-plum-400" />
          )}
        </div>
      </AuthCard>
    );
  }

  if (!viewer) {
    return (
      <AuthCard title="You’re invited" description={headline}>
        <div className="space-y-4">
          <p>Sign in with {invitation.email}, or create an account with that address, to accept.</p>
          <div className="flex flex-wrap gap-3">
            <ButtonLink href={withQuery("/sign-in", { next: path, email: invitation.email })}>Sign in</ButtonLink>
            <ButtonLink href={withQuery("/sign-up", { next: path, email: invitation.email })} variant="secondary">
              Create an account
            </ButtonLink>
          </div>
        </div>
      </AuthCard>
    );
  }

  if (viewer.email.toLowerCase() !== invitation.email.toLowerCase()) {
    return (
      <AuthCard title="You’re invited" description={headline}>
        <div className="space-y-4">
          <Alert tone="warning" title={`You’re signed in as ${viewer.email}.`}>
            This invitation can only be accepted by {invitation.email}, so a forwarded link can’t hand the role to
            someone else. Sign out, then sign in or create an account with {invitation.email}.
          </Alert>
          <SignOutButton label="Sign out and switch account" redirectTo={withQuery("/sign-in", { next: path, email: invitation.email })} />
        </div>
      </AuthCard>
    );
  }

  return (
    <AuthCard title="You’re invited" description={headline}>
      <div className="space-y-4">
        <p>
          As {withArticle(role.toLowerCase())} you’ll see the {area === "manage" ? "show’s management pages" : area === "judging" ? "judging area" : "intake desk"}{" "}
          for {invitation.showName}. The link expires on {formatDate(invitation.expiresAt, invitation.showTimeZone)}.
        </p>
        <AcceptInvitationForm token={token} label={`Accept and join as ${role.toLowerCase()}`} />
      </div>
    </AuthCard>
  );
}
