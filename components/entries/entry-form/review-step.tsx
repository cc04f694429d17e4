// Step 5: the whole entry on one page with a "change" link per step, what is still missing, the
// category it goes in, the show's rules and release, and the send button.
import Link from "next/link";
import type { ReactNode } from "react";
import { Alert } from "@/components/ui/alert";
import { Card, CardHeader } from "@/components/ui/card";
import { DIVISION_LABELS, QUILTING_METHOD_LABELS, labelOf } from "@/components/entries/labels";
import { formatDateTime } from "@/components/format/dates";
import type { EntryForForm } from "@/db/queries/entries";
import { PHOTO_VIEW_LABELS, type EntryStep } from "@/scoring/entry-completeness";
import { perimeterUm } from "@/scoring/measure";
import { formatCm, formatInches } from "@/scoring/units";
import { sizeSummary } from "@/components/entries/size-summary";
import { CategorySummary, type CategorySummaryView } from "@/components/entries/category-summary";
import { STEP_LABELS } from "./step-nav";
import { SubmitForm } from "./submit-form";

const dollars = (cents: number | null) => (cents === null ? "—" : `$${(cents / 100).toLocaleString("en-US", { minimumFractionDigits: cents % 100 ? 2 : 0 })}`);

function Section({ entryId, step, editable, children }: { entryId: string; step: EntryStep; editable: boolean; children: ReactNode }) {
  return (
    <Card aria-labelledby={`review-${step}`}>
      <CardHeader
        id={`review-${step}`}
        title={STEP_LABELS[step]}
        actions={editable ? <Link className="inline-flex min-h-tap items-center px-2 font-semibold" href={`/entries/${entryId}?step=${step}`}>Change<span className="sr-only"> {STEP_LABELS[step].toLowerCase()}</span></Link> : null}
      />
      <dl className="grid gap-x-6 gap-y-3 sm:grid-cols-[12rem_1fr]">{children}</dl>
    </Card>
  );
}

function Row({ label, children }: { label: string; children: ReactNode }) {
  return (
    <>
      <dt className="font-semibold text-ink-muted">{label}</dt>
      <dd className="min-w-0 break-words">{children || "—"}</dd>
    </>
  );
}

export function ReviewStep({ data, category }: { data: EntryForForm; category: CategorySummaryView | null }) {
  const { entry: e, show, settings, gaps, photos } = data;
  const editable = data.editBlock === null;
  const rules = settings.currentRules;
  const size = e.widthUm && e.lengthUm ? `${sizeSummary(e.widthUm, e.lengthUm, e.sizeUnit)}; perimeter ${formatInches(perimeterUm(e.widthUm, e.lengthUm))} (${formatCm(perimeterUm(e.widthUm, e.lengthUm))})` : null;
  const quilted = e.quiltedByKind === "self" ? "The entrant" : e.quiltedByKind === "hire" ? `${e.quiltedBy} (for hire)` : e.quiltedBy;

  return (
    <div className="space-y-6">
      {e.status !== "draft" ? (
        <Alert tone={e.waitlisted ? "warning" : "success"} title={e.waitlisted ? `Entry ${e.entryNumber} is on the waiting list` : `Entry ${e.entryNumber} was sent`}>
          {e.waitlisted ? "The show was full when you sent it; it gets a place only if one comes free. " : ""}
          Sent {formatDateTime(e.submittedAt, show.timeZone)}.
        </Alert>
      ) : gaps.length ? (
        <Alert tone="warning" title="What's still missing">
          <ul className="list-disc space-y-1 pl-5">
            {gaps.map((g) => (
              <li key={`${g.step}-${g.field}`}>
                <Link href={`/entries/${e.id}?step=${g.step}`}>{g.message}</Link>
              </li>
            ))}
          </ul>
        </Alert>
      ) : (
        <Alert tone="success" title="Everything is filled in">Read the rules below, tick the box and send your entry.</Alert>
      )}

      <Section entryId={e.id} step="quilt" editable={editable}>
        <Row label="Title">{e.title}</Row>
        <Row label="Size">{size}</Row>
        <Row label="Techniques">{e.techniques.join(", ")}</Row>
      </Section>
      {category ? <CategorySummary view={category} entryId={e.id} editable={editable} /> : null}
      <Section entryId={e.id} step="makers" editable={editable}>
        <Row label="Made by">{e.madeBy.join(", ")}</Row>
        <Row label="Quilted by">{e.madeBy.length ? quilted : null}</Row>
        <Row label="Quilting">{e.quiltingMethod ? labelOf(QUILTING_METHOD_LABELS, e.quiltingMethod) : null}</Row>
        <Row label="Design">{e.patternSource === "original" ? "Original" : `${e.patternName}, designed by ${e.patternDesigner}`}</Row>
      </Section>
      <Section entryId={e.id} step="about" editable={editable}>
        <Row label="Artist statement"><span className="whitespace-pre-line">{e.statement}</span></Row>
        <Row label="Declared value">{e.declaredValueCents > 0 ? dollars(e.declaredValueCents) : null}</Row>
        <Row label="For sale">{e.forSale ? `Yes${e.priceCents ? `, ${dollars(e.priceCents)}` : ""}` : "No"}</Row>
        <Row label="Judging">{e.judged ? "Judged" : "Display only"}</Row>
        {settings.critiqueFeeCents > 0 ? <Row label="Judge’s critique">{e.critiqueRequested ? "Asked for" : "Not asked for"}</Row> : null}
        <Row label="Division">{labelOf(DIVISION_LABELS, e.division)}{e.division === "youth" && e.youthAge ? `, age ${e.youthAge}` : ""}</Row>
      </Section>
      <Section entryId={e.id} step="photos" editable={editable}>
        {settings.requiredPhotoViews.map((v) => {
          const p = photos.find((x) => x.view === v);
          return (
            <Row key={v} label={PHOTO_VIEW_LABELS[v] ?? v}>
              {p ? (
                // eslint-disable-next-line @next/next/no-img-element -- served by our authorised route
                <img src={`/api/photos/${p.id}/thumb`} alt={PHOTO_VIEW_LABELS[v] ?? v} className="max-h-40 rounded-control" />
              ) : null}
            </Row>
          );
        })}
      </Section>

      {e.status === "draft" && editable ? (
        <Card aria-labelledby="rules">
          <CardHeader id="rules" title="Show rules and release" description={rules ? `Version ${rules.version}, published ${formatDateTime(rules.publishedAt, show.timeZone)}` : undefined} />
          {rules ? (
            <div className="mb-5 max-h-96 space-y-4 overflow-y-auto rounded-control border border-line bg-paper-50 p-4">
              <div className="whitespace-pre-line">{rules.rulesText}</div>
              <h3 className="text-lg">Release</h3>
              <div className="whitespace-pre-line">{rules.releaseText}</div>
            </div>
          ) : (
            <p className="mb-5 text-ink-muted">The show has not published separate rules text; its page lists what it asks of entrants.</p>
          )}
          <SubmitForm entryId={e.id} rulesVersionId={rules?.id ?? ""} ready={gaps.length === 0} />
        </Card>
      ) : null}
    </div>
  );
}
