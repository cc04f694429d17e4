// The chair's results: publish (with what blocks it), each category's ranked entries with photos,
// scores, spreads, flags and placements to change with a reason, the show-wide awards, the result
// rules and ribbons, and the spreadsheets and printouts.
import type { Metadata } from "next";
import Link from "next/link";
import { ArrowLeft, FileSpreadsheet, FileText } from "lucide-react";
import { AwardsSection } from "@/components/results/awards-section";
import { CategoryReview } from "@/components/results/category-review";
import { PublishPanel } from "@/components/results/publish-panel";
import { ResultRulesForm } from "@/components/results/rules-form";
import { guardQuery, pageViewer } from "@/components/shell/guard";
import { Alert } from "@/components/ui/alert";
import { Card, CardHeader } from "@/components/ui/card";
import { PageHeader } from "@/components/ui/page-header";
import { SectionLinks } from "@/components/ui/section-links";
import { resultsReview } from "@/db/queries/results";

type Props = { params: Promise<{ slug: string }> };

export const metadata: Metadata = { title: "Results" };

const SECTIONS = [
  ["publish", "Publish"],
  ["review", "Categories"],
  ["awards", "Show awards"],
  ["rules", "Result rules"],
  ["exports", "Spreadsheets and printouts"],
] as const;

const EXPORTS = [
  ["results", "Results by category", "spreadsheet"],
  ["score-matrix", "Score matrix (entry × judge × criterion)", "spreadsheet"],
  ["awards", "Awards list for the ribbon table", "spreadsheet"],
  ["entrants", "Entrants with contact and payment status", "spreadsheet"],
  ["award-cards", "Award cards to pin on quilts", "pdf"],
  ["judges-summary", "Judges' summary per category", "pdf"],
] as const;

export default async function ResultsPage({ params }: Props) {
  const { slug } = await params;
  const viewer = await pageViewer();
  const review = await guardQuery(resultsReview(viewer, slug));
  const timeZone = review.show.timeZone;
  const locked = review.show.status !== "judging";
  const chairDecides = review.rules.tieBreaks.some((t) => t.kind === "chair");
  const entries = review.results.categories.flatMap((c) => c.entries.map((e) => ({ entryId: e.entry.entryId, entryNumber: e.entry.entryNumber })));

  return (
    <div className="space-y-8">
      <PageHeader
        eyebrow={<Link href={`/shows/${slug}/manage`} className="inline-flex min-h-tap items-center gap-1 no-underline"><ArrowLeft aria-hidden className="size-4" />{review.show.name}</Link>}
        title="Results"
        description="Totals and ranks from the judges' sheets, the ribbons the rules give, your changes (each with a reason), and publishing."
      />
      <SectionLinks label="Results sections" sections={SECTIONS} />

      <Card aria-labelledby="publish">
        <CardHeader id="publish" title="Publish" />
        <PublishPanel showSlug={slug} timeZone={timeZone} status={review.show.status} blockers={review.results.blockers} warnings={review.results.warnings} publications={review.publications} current={review.current} mailStatus={review.mailStatus} />
      </Card>

      <section aria-labelledby="review" className="space-y-4">
        <h2 id="review" className="text-2xl">Categories</h2>
        {review.results.categories.length === 0 ? <p className="text-ink-muted">No categories yet.</p> : null}
        {review.results.categories.map((c) => (
          <CategoryReview key={c.category.id} showSlug={slug} outcome={c} photoOf={review.photoOf} places={review.rules.places} locked={locked} chairDecides={chairDecides} />
        ))}
      </section>

      <Card aria-labelledby="awards">
        <CardHeader id="awards" title="Show awards" description="Best of Show, best quilting by method, judge's choice and sponsors' awards, with who may win each and which may go together." />
        <AwardsSection showSlug={slug} awards={review.awards} outcomes={review.results.awards} picks={review.picks} judges={review.judges} entries={entries} locked={locked} />
      </Card>

      <Card aria-labelledby="rules">
        <CardHeader id="rules" title="Result rules" description="What ranks entries, how ties are broken, how many ribbons, and their colours. Nothing is fixed: set your show's own rules." />
        <ResultRulesForm showSlug={slug} rules={review.rules} sections={review.sections} locked={review.show.status === "results_published"} />
      </Card>

      <Card aria-labelledby="exports">
        <CardHeader id="exports" title="Spreadsheets and printouts" description="Made from the current results (published or not); entrants' names appear only on the committee's spreadsheets." />
        <Alert tone="warning" title="Personal data">
          The entrants spreadsheet holds names, addresses, phone numbers and payments, and the awards list names the makers. Share them only with the committee and delete copies after the show.
        </Alert>
        <ul className="mt-4 grid gap-2 sm:grid-cols-2">
          {EXPORTS.map(([path, label, kind]) => (
            <li key={path}>
              <a href={`/api/shows/${slug}/exports/${path}`} className="inline-flex min-h-tap items-center gap-2" download>
                {kind === "pdf" ? <FileText aria-hidden className="size-5" /> : <FileSpreadsheet aria-hidden className="size-5" />}
                {label}
              </a>
            </li>
          ))}
        </ul>
      </Card>
    </div>
  );
}
