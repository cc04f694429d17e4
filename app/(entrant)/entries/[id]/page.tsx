// The entry form, one step at a time (?step=quilt|makers|about|photos|review). Each step saves the
// draft; once entries close (or the show has the quilt) the entrant reads the review only. The
// quilt step gets the show's categories to preview the entry's category in the browser.
import type { Metadata } from "next";
import Link from "next/link";
import { ArrowLeft, ArrowRight } from "lucide-react";
import { photoFormatWords } from "@/lib/photo-formats";
import { AboutStep } from "@/components/entries/entry-form/about-step";
import { MakersStep } from "@/components/entries/entry-form/makers-step";
import { QuiltStep } from "@/components/entries/entry-form/quilt-step";
import { ReviewStep } from "@/components/entries/entry-form/review-step";
import { StepNav, STEP_LABELS } from "@/components/entries/entry-form/step-nav";
import { EntryStatusBadge } from "@/components/entries/entry-status";
import { PhotoUploader } from "@/components/entries/photo-uploader";
import { pendingSteps, savedFactsOf } from "@/components/entries/category-facts";
import type { CategoryContext } from "@/components/entries/category-preview";
import { categorySummaryOf, type CategorySummaryView } from "@/components/entries/category-summary";
import { categoryLabel } from "@/components/entries/category-words";
import { guardQuery, pageViewer } from "@/components/shell/guard";
import { Alert } from "@/components/ui/alert";
import { ButtonLink } from "@/components/ui/button";
import { PageHeader } from "@/components/ui/page-header";
import { categoriesForEntryForm, categoryOfEntry } from "@/db/queries/categories";
import { entryForEntrant, type EntryForForm } from "@/db/queries/entries";
import { photoUrls } from "@/db/queries/entry-photos";
import { centsForInput } from "@/lib/schemas/entry";
import { ENTRY_STEPS, PHOTO_VIEW_LABELS, type EntryStep } from "@/scoring/entry-completeness";
import { formatForInput } from "@/scoring/measure";

export const metadata: Metadata = { title: "Your entry" };

const PHOTO_HINTS: Record<string, string> = {
  full: "The whole quilt, straight on, with all four edges in the picture and nothing cropped.",
  detail: "A close-up that shows the quilting stitches, about a 12-inch section.",
  other: "Any other view you'd like the show to see.",
};

type Props = { params: Promise<{ id: string }>; searchParams: Promise<{ step?: string }> };

export default async function EntryPage({ params, searchParams }: Props) {
  const [{ id }, { step: asked }] = await Promise.all([params, searchParams]);
  const viewer = await pageViewer();
  const data = await guardQuery(entryForEntrant(viewer, id));
  const locked = data.editBlock !== null;
  const step: EntryStep = locked ? "review" : ENTRY_STEPS.includes(asked as EntryStep) ? (asked as EntryStep) : "quilt";
  const at = ENTRY_STEPS.indexOf(step);
  const href = (s: EntryStep | undefined) => (s ? `/entries/${id}?step=${s}` : `/entries/${id}?step=review`);
  const back = href(ENTRY_STEPS[at - 1]);
  const next = href(ENTRY_STEPS[at + 1]);
  const { entry } = data;
  const category = step === "quilt" || step === "review" ? await categoryData(data) : null;

  return (
    <div className="mx-auto max-w-3xl space-y-6">
      <PageHeader
        eyebrow={<Link href={`/shows/${data.show.slug}`}>{data.show.name}</Link>}
        title={entry.title || "New entry"}
        meta={
          <>
            <EntryStatusBadge status={entry.status} />
            {entry.entryNumber !== null ? <span className="font-semibold tabular-nums">Entry {entry.entryNumber}</span> : null}
            {data.viewerIsChair && !data.viewerIsOwner ? <span className="text-sm text-ink-muted">You are editing as the show&apos;s chair.</span> : null}
          </>
        }
      />
      {locked ? (
        <Alert tone="info" title="This entry can't be changed now">
          {data.editBlock}
        </Alert>
      ) : (
        <StepNav entryId={id} current={step} gaps={data.gaps} steps={ENTRY_STEPS} />
      )}
      <h2 className="sr-only">{STEP_LABELS[step]}</h2>
      <StepBody data={data} step={step} back={back} next={next} category={category} />
    </div>
  );
}

type CategoryData = { context: CategoryContext; summary: CategorySummaryView | null };

// entryForEntrant has checked the viewer; the category queries take the ids it returned.
async function categoryData(data: EntryForForm): Promise<CategoryData> {
  const [set, stored] = await Promise.all([categoriesForEntryForm(data.show.id), categoryOfEntry(data.entry.id)]);
  const e = data.entry;
  const saved = savedFactsOf(e);
  const pending = pendingSteps(data.gaps);
  const context: CategoryContext = {
    categories: set.categories.map(({ id, code, name, description, precedence, conditions, mergedIntoId }) => ({ id, code, name, description, precedence, conditions, mergedIntoId })),
    overlap: set.overlap,
    saved,
    pending,
    chairPlaced: stored.state === "overridden" && stored.category ? `The chair has placed this quilt in ${categoryLabel(stored.category)}; the rules below no longer move it.` : null,
  };
  const summary = categorySummaryOf({
    draft: e.status === "draft",
    size: e.widthUm && e.lengthUm ? { widthUm: e.widthUm, lengthUm: e.lengthUm } : null,
    techniques: e.techniques,
    saved,
    pending,
    set,
    stored,
  });
  return { context, summary };
}

function StepBody({ data, step, back, next, category }: { data: EntryForForm; step: EntryStep; back: string; next: string; category: CategoryData | null }) {
  const { entry: e, settings } = data;
  if (step === "quilt") {
    const defaults = {
      title: e.title,
      sizeUnit: e.sizeUnit,
      width: e.widthUm ? formatForInput(e.widthUm, e.sizeUnit) : "",
      length: e.lengthUm ? formatForInput(e.lengthUm, e.sizeUnit) : "",
      techniques: e.techniques,
    };
    // Techniques the chair has since removed stay visible while the entry still has them.
    const techniques = [...new Set([...settings.techniques, ...e.techniques])];
    return <QuiltStep entryId={e.id} defaults={defaults} techniques={techniques} nextHref={next} category={category!.context} minSideUm={settings.minQuiltSideUm} />;
  }
  if (step === "makers") {
    const defaults = {
      madeBy: (e.madeBy.length ? e.madeBy : [""]).map((name) => ({ name })),
      quiltedByKind: e.quiltedByKind,
      quiltedByName: e.quiltedBy,
      quiltingMethod: e.quiltingMethod ?? undefined,
      patternSource: e.patternSource,
      patternName: e.patternName,
      patternDesigner: e.patternDesigner,
    };
    return <MakersStep entryId={e.id} defaults={defaults} backHref={back} nextHref={next} />;
  }
  if (step === "about") {
    const defaults = {
      statement: e.statement,
      declaredValue: centsForInput(e.declaredValueCents),
      forSale: e.forSale,
      price: centsForInput(e.priceCents),
      judged: e.judged ? ("judged" as const) : ("display" as const),
      division: e.division,
      youthAge: e.youthAge === null ? "" : String(e.youthAge),
      critiqueRequested: e.critiqueRequested,
    };
    const critique = settings.critiqueFeeCents > 0 ? { feeCents: settings.critiqueFeeCents, currency: settings.currency, changeHere: e.status === "draft" } : null;
    return <AboutStep entryId={e.id} defaults={defaults} wordLimit={settings.statementWordLimit} critique={critique} backHref={back} nextHref={next} />;
  }
  if (step === "photos") {
    const views = settings.requiredPhotoViews;
    return (
      <div className="space-y-5">
        <p className="text-ink-muted">
          {photoFormatWords(settings.photoFormats)}, at least {settings.photoMinWidthPx} × {settings.photoMinHeightPx} pixels and up to {Number((settings.photoMaxBytes / 1e6).toFixed(1))} MB each. Each photo is saved as soon as it is checked; location and camera details are removed.
        </p>
        {views.map((v) => {
          const saved = data.photos.find((p) => p.view === v) ?? null;
          return (
            <PhotoUploader
              key={v}
              entryId={e.id}
              view={v}
              label={PHOTO_VIEW_LABELS[v] ?? v}
              hint={PHOTO_HINTS[v] ?? ""}
              saved={saved ? { ...saved, ...photoUrls(saved.id) } : null}
              maxBytes={settings.photoMaxBytes}
              formats={settings.photoFormats}
            />
          );
        })}
        <div className="flex flex-col-reverse gap-3 border-t border-line pt-5 sm:flex-row sm:justify-between">
          <ButtonLink href={back} variant="ghost" icon={<ArrowLeft aria-hidden className="size-5" />}>
            Back
          </ButtonLink>
          <div className="flex flex-col gap-3 sm:flex-row">
            <ButtonLink href="/my" variant="secondary">
              Finish later
            </ButtonLink>
            <ButtonLink href={next} icon={<ArrowRight aria-hidden className="size-5" />}>
              Continue to review
            </ButtonLink>
          </div>
        </div>
      </div>
    );
  }
  return <ReviewStep data={data} category={category?.summary ?? null} />;
}
