// A show's public page: who runs it, where, the dates of each stage, and how to enter a quilt.
import type { Metadata } from "next";
import { notFound } from "next/navigation";
import { MapPin, Users } from "lucide-react";
import { formatDateRange } from "@/components/format/dates";
import { EnterCallout } from "@/components/shows/enter-callout";
import { ShowDateList } from "@/components/shows/show-dates";
import { publicShowFor } from "@/components/shows/public-show";
import { ShowStatusBadge } from "@/components/shows/show-status";
import { currentViewer } from "@/components/shell/viewer";
import { Card, CardHeader } from "@/components/ui/card";
import { PageHeader } from "@/components/ui/page-header";

type Props = { params: Promise<{ slug: string }> };

export async function generateMetadata({ params }: Props): Promise<Metadata> {
  const show = await publicShowFor((await params).slug);
  if (!show) return { title: "Show not found" };
  const days = formatDateRange(show.showOpensAt, show.showClosesAt, show.timeZone);
  return {
    title: show.name,
    description: `${show.name}, run by ${show.guildName} at ${show.venueName}${days ? `, ${days}` : ""}.`,
  };
}

export default async function PublicShowPage({ params }: Props) {
  const { slug } = await params;
  const [show, viewer] = await Promise.all([publicShowFor(slug), currentViewer()]);
  if (!show) notFound();

  return (
    <div className="space-y-8">
      <PageHeader
        eyebrow={show.guildName}
        title={show.name}
        meta={<ShowStatusBadge status={show.status} />}
        description={formatDateRange(show.showOpensAt, show.showClosesAt, show.timeZone) ?? undefined}
      />
      <div className="grid gap-6 lg:grid-cols-[1fr_22rem]">
        <div className="space-y-6">
          <Card aria-labelledby="dates">
            <CardHeader id="dates" title="Dates" />
            <ShowDateList show={show} />
          </Card>
          <Card aria-labelledby="venue">
            <CardHeader id="venue" title="Where" />
            <p className="flex items-start gap-2 text-lg">
              <MapPin aria-hidden className="mt-1 size-5 shrink-0 text-plum-500" />
              <span>
                <span className="font-semibold">{show.venueName}</span>
                {show.venueAddress ? <span className="block whitespace-pre-line text-ink-muted">{show.venueAddress}</span> : null}
              </span>
            </p>
            <p className="mt-4 flex items-start gap-2 text-ink-muted">
              <Users aria-hidden className="mt-0.5 size-5 shrink-0 text-plum-500" />
              Run by {show.guildName}.
            </p>
          </Card>
        </div>
        <EnterCallout show={show} signedIn={Boolean(viewer)} />
      </div>
    </div>
  );
}
