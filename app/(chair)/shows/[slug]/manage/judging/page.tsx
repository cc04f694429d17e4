// The chair's judging set-up: score sheets, each category's method and sheet, panels, the people
// judges must not judge, judges' conflicts with entries, and the judging options. Each part saves on its own.
import { SectionLinks } from "@/components/ui/section-links";
import type { Metadata } from "next";
import Link from "next/link";
import { Activity, ArrowLeft } from "lucide-react";
import { CategoryMethods } from "@/components/judging-setup/category-methods";
import { ConflictsSection } from "@/components/judging-setup/conflicts-section";
import { UnclearedSection } from "@/components/judging-setup/uncleared-section";
import { DeclarationsSection } from "@/components/judging-setup/declarations-section";
import { JudgingOptionsForm } from "@/components/judging-setup/options-form";
import { PanelsSection } from "@/components/judging-setup/panels-section";
import { SheetsSection } from "@/components/judging-setup/sheets-section";
import { guardQuery, pageViewer } from "@/components/shell/guard";
import { Alert } from "@/components/ui/alert";
import { ButtonLink } from "@/components/ui/button";
import { Card, CardHeader } from "@/components/ui/card";
import { PageHeader } from "@/components/ui/page-header";
import { unclearedForChair } from "@/db/queries/judged-entries";
import { judgingSetup } from "@/db/queries/judging-setup";

type Props = { params: Promise<{ slug: string }> };

export const metadata: Metadata = { title: "Judging set-up" };

const SECTIONS = [
  ["sheets", "Score sheets"],
  ["methods", "Categories"],
  ["panels", "Panels"],
  ["declarations", "Declarations"],
  ["conflicts", "Conflicts"],
  ["uncleared", "Not paid"],
  ["judging-options", "Options"],
] as const;

export default async function JudgingSetupPage({ params }: Props) {
  const { slug } = await params;
  const viewer = await pageViewer();
  const [setup, uncleared] = await guardQuery(Promise.all([judgingSetup(viewer, slug), unclearedForChair(viewer, slug)]));
  const assigned = new Set(setup.panels.flatMap((p) => p.categoryIds));
  // Display-only categories are never judged, so they need no panel.
  const unassigned = setup.categories.filter((c) => !c.displayOnly && !assigned.has(c.id));

  return (
    <div className="space-y-8">
      <PageHeader
        eyebrow={<Link href={`/shows/${slug}/manage`} className="inline-flex min-h-tap items-center gap-1 no-underline"><ArrowLeft aria-hidden className="size-4" />{setup.show.name}</Link>}
        title="Judging set-up"
        description="Score sheets, how each category is judged, who judges it, and what judges see."
        actions={
          <ButtonLink href={`/shows/${slug}/manage/judging/progress`} variant="secondary" icon={<Activity aria-hidden className="size-5" />}>
            Progress board
          </ButtonLink>
        }
      />
      <SectionLinks label="Judging sections" sections={SECTIONS} />

      <Card aria-labelledby="sheets">
        <CardHeader id="sheets" title="Score sheets" description="Sections of criteria, each with its most points; the usual sheet adds up to 100." />
        <SheetsSection showSlug={slug} sheets={setup.sheets} />
      </Card>

      <Card aria-labelledby="methods">
        <CardHeader id="methods" title="Categories" description="How each category is judged, and on which sheet. Fixed once judges start on it." />
        {setup.categories.length === 0 ? (
          <p className="text-ink-muted">
            No categories yet. <Link href={`/shows/${slug}/manage/categories`}>Set them up first</Link>.
          </p>
        ) : (
          <CategoryMethods showSlug={slug} categories={setup.categories} sheets={setup.sheets.map((s) => ({ id: s.id, name: s.name, isDefault: s.isDefault }))} />
        )}
      </Card>

      <Card aria-labelledby="panels">
        <CardHeader id="panels" title="Panels" description="Judges and scribes from the show’s team, a session, and the categories they judge. A judge is never put on a category holding their own entry or a declared person’s." />
        {unassigned.length ? (
          <Alert tone="warning" title={`${unassigned.length === 1 ? "One category has" : `${unassigned.length} categories have`} no panel yet.`} className="mb-4">
            {unassigned.map((c) => `${c.code} ${c.name}`).join(", ")}
          </Alert>
        ) : null}
        <PanelsSection showSlug={slug} panels={setup.panels} judges={setup.judges} scribes={setup.scribes} categories={setup.categories} />
      </Card>

      <Card aria-labelledby="declarations">
        <CardHeader id="declarations" title="Declarations" description="People a judge must not judge. Matched against entrants’ e-mail addresses and makers’ and quilters’ names." />
        <DeclarationsSection showSlug={slug} judges={setup.judges} declarations={setup.declarations} />
      </Card>

      <Card aria-labelledby="conflicts">
        <CardHeader id="conflicts" title="Conflicts" description="A judge’s own entry, or a declared person’s, in a category they judge. Found whenever a declaration, an entry or a category changes; judges are never told. Judging can’t start while one is open." />
        <ConflictsSection showSlug={slug} open={setup.conflicts.open} decided={setup.conflicts.decided} />
      </Card>

      <Card aria-labelledby="uncleared">
        <CardHeader id="uncleared" title="Not paid" description="Entries sent for judging that are not paid yet (at a juried show, not accepted). They stay off the judges’ lists unless you record why one is judged anyway." />
        <UnclearedSection showSlug={slug} entries={uncleared} />
      </Card>

      <Card aria-labelledby="judging-options">
        <CardHeader id="judging-options" title="Options" />
        <JudgingOptionsForm showSlug={slug} values={{ commentPolicy: setup.options.commentPolicy as "all" | "placed" | "none", quickPhrases: setup.options.quickPhrases, judgeFields: setup.options.judgeFields }} />
      </Card>
    </div>
  );
}
