// The chair's overview of a show: entries by status, the dates, and the team with invitations.
import type { Metadata } from "next";
import { ExternalLink } from "lucide-react";
import { guardQuery, pageViewer } from "@/components/shell/guard";
import { EntryCounts } from "@/components/shows/entry-counts";
import { ShowDateList } from "@/components/shows/show-dates";
import { ShowStatusBadge } from "@/components/shows/show-status";
import { InviteForm } from "@/components/team/invite-form";
import { RemindersForm } from "@/components/chair/reminders-form";
import { PendingInvitations, TeamMembers } from "@/components/team/team-list";
import { Alert } from "@/components/ui/alert";
import { ButtonLink } from "@/components/ui/button";
import { Card, CardHeader } from "@/components/ui/card";
import { PageHeader } from "@/components/ui/page-header";
import { chairOverview } from "@/db/queries/overview";
import { teamForChair } from "@/db/queries/team";

type Props = { params: Promise<{ slug: string }> };

export const metadata: Metadata = { title: "Manage show" };

export default async function ManageShowPage({ params }: Props) {
  const { slug } = await params;
  const viewer = await pageViewer();
  const [overview, team] = await Promise.all([guardQuery(chairOverview(viewer, slug)), guardQuery(teamForChair(viewer, slug))]);
  const { show } = overview;

  return (
    <div className="space-y-8">
      <PageHeader
        eyebrow="Manage show"
        title={show.name}
        meta={<ShowStatusBadge status={show.status} />}
        actions={
          show.status === "draft" ? null : (
            <ButtonLink href={`/shows/${show.slug}`} variant="secondary" icon={<ExternalLink aria-hidden className="size-5" />}>
              Public page
            </ButtonLink>
          )
        }
      />
      {show.status === "draft" ? (
        <Alert tone="info" title="This show is still a draft.">
          Only the team can see it. It appears on the public list once entries open.
        </Alert>
      ) : null}

      <div className="grid gap-6 lg:grid-cols-[1fr_22rem]">
        <Card aria-labelledby="entries">
          <CardHeader id="entries" title="Entries" />
          <EntryCounts counts={overview.entryCounts} total={overview.totalEntries} />
        </Card>
        <Card aria-labelledby="dates">
          <CardHeader id="dates" title="Dates" />
          <ShowDateList show={show} compact />
        </Card>
      </div>

      <Card aria-labelledby="reminders">
        <CardHeader id="reminders" title="Drop-off reminders" />
        <RemindersForm showSlug={show.slug} />
      </Card>

      <Card aria-labelledby="team">
        <CardHeader id="team" title="Show team" description="Judges, scribes and intake volunteers see only their own areas of this show." />
        <div className="space-y-6">
          <Alert tone="warning" title="Personal data">
            The team list holds people’s contact details. Share it only with the committee.
          </Alert>
          <TeamMembers showSlug={show.slug} timeZone={show.timeZone} members={team.members} viewerId={viewer.id} />
          <section aria-labelledby="pending" className="space-y-3">
            <h3 id="pending" className="text-xl">
              Waiting for an answer
            </h3>
            <PendingInvitations timeZone={show.timeZone} invitations={team.invitations} />
          </section>
          <section aria-labelledby="invite" className="space-y-3 border-t border-line pt-6">
            <h3 id="invite" className="text-xl">
              Invite to the team
            </h3>
            <p className="text-ink-muted">They’ll get an e-mail with a link to accept; the list above shows when each link expires.</p>
            <InviteForm showSlug={show.slug} />
          </section>
        </div>
      </Card>
    </div>
  );
}
