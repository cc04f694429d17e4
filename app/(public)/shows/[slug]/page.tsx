// A show's public page: who runs it, where, the dates of each stage, what entering costs and asks
// for, the current rules and release, and how to enter a quilt.
import type { Metadata } from "next";
import { notFound } from "next/navigation";
import Link from "next/link";
import { Award, ClipboardCheck, MapPin, PackageOpen, Users } from "lucide-react";
import { formatDateRange, formatDateTime } from "@/components/format/dates";
import { EnterCallout } from "@/components/shows/enter-callout";
import { ShowDateList } from "@/components/shows/show-dates";
import { formatCents } from "@/components/shows/money";
import { publicShowDetailsFor, publicShowFor } from "@/components/shows/public-show";
import { ShowCategories } from "@/components/shows/show-categories";
import { ShowRules } from "@/components/shows/show-rules";
import { FeeList, LimitList, PhotoRules } from "@/components/shows/show-terms";
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
  const [details, viewer] = await Promise.all([publicShowDetailsFor(slug), currentViewer()]);
  if (!details) notFound();
  const { show, fees } = details;
  const lateFrom = formatDateTime(fees.lateFeeFromAt, show.timeZone);
  const lateFeeNote =
    fees.lateFeeCents > 0 && lateFrom ? `A late fee of ${formatCents(fees.lateFeeCents, fees.currency)} per quilt applies from ${lateFrom}.` : null;
  const dropOff = formatDateRange(show.dropOffStartsAt, show.dropOffEndsAt, show.timeZone, { withTime: true });
  const pickUp = formatDateRange(show.pickUpStartsAt, show.pickUpEndsAt, show.timeZone, { withTime: true });

  return (
    <div className="space-y-8">
      <PageHeader
        eyebrow={show.guildName}
        title={show.name}
        meta={<ShowStatusBadge status={show.status} />}
        description={formatDateRange(show.showOpensAt, show.showClosesAt, show.timeZone) ?? undefined}
      />
      {show.status === "results_published" ? (
        <p className="flex items-center gap-2 rounded-card border border-gold-300 bg-gold-50 p-4 text-lg">
          <Award aria-hidden className="size-6 shrink-0 text-gold-700" />
          <span>
            The results are out. <Link href={`/shows/${show.slug}/results`} className="font-semibold">See the ribbons and awards</Link>
          </span>
        </p>
      ) : null}
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
            <dl className="mt-4 space-y-3 border-t border-line pt-4">
              <div>
                <dt className="flex items-center gap-2 font-semibold">
                  <ClipboardCheck aria-hidden className="size-5 text-plum-500" /> Bring your quilt
                </dt>
                <dd className={dropOff ? "pl-7" : "pl-7 text-ink-muted italic"}>{dropOff ?? "Drop-off times to be announced"}</dd>
              </div>
              <div>
                <dt className="flex items-center gap-2 font-semibold">
                  <PackageOpen aria-hidden className="size-5 text-plum-500" /> Collect your quilt
                </dt>
                <dd className={pickUp ? "pl-7" : "pl-7 text-ink-muted italic"}>{pickUp ?? "Pick-up times to be announced"}</dd>
              </div>
            </dl>
          </Card>
          <Card aria-labelledby="entering">
            <CardHeader id="entering" title="Entering" />
            <div className="space-y-6">
              <FeeList fees={fees} timeZone={show.timeZone} />
              <LimitList limits={details.limits} />
              <PhotoRules photos={details.photos} juried={details.juried} />
            </div>
          </Card>
          <Card aria-labelledby="categories">
            <CardHeader id="categories" title="Categories" />
            <ShowCategories categories={details.categories} />
          </Card>
          <Card aria-labelledby="rules">
            <CardHeader id="rules" title="Rules and release" />
            <ShowRules rules={details.currentRules} timeZone={show.timeZone} />
          </Card>
        </div>
        {/* First on phones, so the way in is never below the rules; beside the content on wide screens. */}
        <div className="order-first lg:order-none">
          <EnterCallout show={show} signedIn={Boolean(viewer)} lateFeeNote={lateFeeNote} />
        </div>
      </div>
    </div>
  );
}
