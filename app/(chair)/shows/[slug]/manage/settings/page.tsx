// The chair's settings for one show: dates, fees, limits, photos, options, rules versions and
// the show's stage. Each section saves on its own, so a bad value in one never loses another.
import { SectionLinks } from "@/components/ui/section-links";
import type { Metadata } from "next";
import Link from "next/link";
import { ArrowLeft, CircleCheck, CircleDashed } from "lucide-react";
import { DatesForm } from "@/components/settings/dates-form";
import { FeesForm } from "@/components/settings/fees-form";
import { datesFormValues, feesFormValues, limitsFormValues, optionsFormValues, photosFormValues } from "@/components/settings/form-values";
import { LimitsForm } from "@/components/settings/limits-form";
import { OptionsForm } from "@/components/settings/options-form";
import { PhotosForm } from "@/components/settings/photos-form";
import { RulesForm } from "@/components/settings/rules-form";
import { RulesHistory } from "@/components/settings/rules-history";
import { StatusForm } from "@/components/settings/status-form";
import { guardQuery, pageViewer } from "@/components/shell/guard";
import { ShowStatusBadge } from "@/components/shows/show-status";
import { Alert } from "@/components/ui/alert";
import { Card, CardHeader } from "@/components/ui/card";
import { PageHeader } from "@/components/ui/page-header";
import { settingsForChair } from "@/db/queries/settings";
import { stageMovePreview } from "@/db/queries/stage-counts";

type Props = { params: Promise<{ slug: string }> };

export const metadata: Metadata = { title: "Show settings" };

const SECTIONS = [
  ["status", "Stage"],
  ["dates", "Dates"],
  ["fees", "Fees"],
  ["limits", "Limits"],
  ["photos", "Photos and statement"],
  ["rules", "Rules and release"],
  ["options", "Judging, names and mail"],
] as const;

export default async function ShowSettingsPage({ params }: Props) {
  const { slug } = await params;
  const viewer = await pageViewer();
  const { show, settings, rulesHistory, nextStage, stepBack } = await guardQuery(settingsForChair(viewer, slug));
  // What each move would do, for the confirm step; the server checks again when the chair confirms.
  const [next, back] = await Promise.all([nextStage ? stageMovePreview(viewer, slug, nextStage) : null, stepBack ? stageMovePreview(viewer, slug, stepBack) : null]);
  const current = settings.currentRules;
  const readyToOpen = [
    { done: Boolean(show.entryClosesAt && show.entryClosesAt > new Date()), label: "A date entries close, still ahead (Dates)" },
    { done: Boolean(current), label: "Rules and release published (Rules and release)" },
  ];

  return (
    <div className="space-y-8">
      <PageHeader
        eyebrow={<Link href={`/shows/${show.slug}/manage`} className="inline-flex min-h-tap items-center gap-1 no-underline"><ArrowLeft aria-hidden className="size-4" />{show.name}</Link>}
        title="Show settings"
        meta={<ShowStatusBadge status={show.status} />}
        description="Each section saves on its own. Every change is recorded with who made it and what it was before."
      />
      {settings.saved ? null : (
        <Alert tone="info" title="Nothing saved yet.">
          The values below are Ribbonry’s starting values; saving any section keeps them for this show.
        </Alert>
      )}
      <SectionLinks label="Settings sections" sections={SECTIONS} />

      <Card aria-labelledby="status">
        <CardHeader id="status" title="Stage" description="Where the show stands. Entrants see it on the public page." />
        <div className="space-y-4">
          {show.status === "draft" ? (
            <ul className="space-y-1">
              {readyToOpen.map((r) => (
                <li key={r.label} className="flex items-center gap-2">
                  {r.done ? <CircleCheck aria-hidden className="size-5 text-success-700" /> : <CircleDashed aria-hidden className="size-5 text-ink-muted" />}
                  <span>
                    <span className="sr-only">{r.done ? "Done: " : "Still to do: "}</span>
                    {r.label}
                  </span>
                </li>
              ))}
            </ul>
          ) : null}
          <StatusForm showSlug={show.slug} status={show.status} next={next} back={back} />
        </div>
      </Card>

      <Card aria-labelledby="dates">
        <CardHeader id="dates" title="Dates" />
        <DatesForm showSlug={show.slug} timeZone={show.timeZone} values={datesFormValues(show, settings)} />
      </Card>

      <div className="grid gap-6 xl:grid-cols-2">
        <Card aria-labelledby="fees">
          <CardHeader id="fees" title="Fees" />
          <FeesForm showSlug={show.slug} values={feesFormValues(settings)} />
        </Card>
        <Card aria-labelledby="limits" className="h-fit">
          <CardHeader id="limits" title="Limits" />
          <LimitsForm showSlug={show.slug} values={limitsFormValues(settings)} />
        </Card>
      </div>

      <Card aria-labelledby="photos">
        <CardHeader id="photos" title="Photos and statement" />
        <PhotosForm showSlug={show.slug} values={photosFormValues(settings)} />
      </Card>

      <Card aria-labelledby="rules">
        <CardHeader
          id="rules"
          title="Rules and release"
          description={current ? `Version ${current.version} is current.` : "Not published yet."}
        />
        <div className="grid gap-8 lg:grid-cols-[1fr_22rem]">
          <RulesForm
            showSlug={show.slug}
            nextVersion={(current?.version ?? 0) + 1}
            rulesText={current?.rulesText ?? ""}
            releaseText={current?.releaseText ?? ""}
          />
          <section aria-labelledby="rules-history" className="space-y-3">
            <h3 id="rules-history" className="text-xl">
              Versions
            </h3>
            <RulesHistory versions={rulesHistory} timeZone={show.timeZone} />
          </section>
        </div>
      </Card>

      <Card aria-labelledby="options">
        <CardHeader id="options" title="Judging, names and mail" />
        <OptionsForm showSlug={show.slug} values={optionsFormValues(settings)} />
      </Card>
    </div>
  );
}
