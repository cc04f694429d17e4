// A show's published results, for anyone (no sign-in): the show-wide awards, then each category's
// places and mentions with photos. Before publishing (or after the chair takes them down) it says
// so and shows nothing else.
import type { Metadata } from "next";
import Link from "next/link";
import { notFound } from "next/navigation";
import { Award } from "lucide-react";
import { formatDateTime } from "@/components/format/dates";
import { PublicResultCard } from "@/components/results/public-result-card";
import { RibbonSwatch } from "@/components/results/ribbon-swatch";
import { EmptyState } from "@/components/ui/empty-state";
import { PageHeader } from "@/components/ui/page-header";
import { publicResults } from "@/db/queries/published-results";

type Props = { params: Promise<{ slug: string }> };

// Results can be published and taken down at any moment: never serve a stale copy.
export const dynamic = "force-dynamic";

export async function generateMetadata({ params }: Props): Promise<Metadata> {
  const data = await publicResults((await params).slug);
  return { title: data ? `Results: ${data.show.name}` : "Show not found" };
}

export default async function PublicResultsPage({ params }: Props) {
  const { slug } = await params;
  const data = await publicResults(slug);
  if (!data) notFound();
  const { show, published } = data;
  const back = (
    <Link href={`/shows/${show.slug}`} className="font-semibold">
      Back to the show
    </Link>
  );
  if (!published) {
    return (
      <div className="space-y-6">
        <PageHeader eyebrow={show.name} title="Results" />
        <EmptyState icon={Award} title="The results have not been published yet" action={back}>
          Ribbons and awards appear here once the show&apos;s chair publishes them.
        </EmptyState>
      </div>
    );
  }
  const when = formatDateTime(published.publishedAt, show.timeZone);
  return (
    <div className="space-y-10">
      <PageHeader
        eyebrow={show.name}
        title="Results"
        description={`${published.version > 1 ? "Corrected results, published" : "Published"} ${when ?? ""}. Makers are named where they agreed to it.`}
        actions={back}
      />
      {published.awards.length ? (
        <section aria-labelledby="awards" className="space-y-4">
          <h2 id="awards" className="pb-2 text-2xl stitch">
            Show awards
          </h2>
          {published.awards.map((a) => (
            <div key={a.name} className="space-y-3">
              <h3 className="text-xl">
                <RibbonSwatch ribbon={a.ribbon} label={a.name} />
              </h3>
              <ul className="grid gap-4 sm:grid-cols-2 lg:grid-cols-3">
                {a.cards.map((c) => (
                  <PublicResultCard key={c.entryNumber} card={c} showSlug={show.slug} headingLevel={4} />
                ))}
              </ul>
            </div>
          ))}
        </section>
      ) : null}
      {published.categories.map((c) => (
        <section key={c.code} aria-labelledby={`cat-${c.code}`} className="space-y-4">
          <h2 id={`cat-${c.code}`} className="pb-2 text-2xl stitch">
            {c.code} · {c.name}
          </h2>
          <ul className="grid gap-4 sm:grid-cols-2 lg:grid-cols-3">
            {c.cards.map((card) => (
              <PublicResultCard key={card.entryNumber} card={card} showSlug={show.slug} />
            ))}
          </ul>
        </section>
      ))}
      {published.categories.length === 0 ? <EmptyState icon={Award} title="No ribbons were given">The judges gave no places, mentions or awards.</EmptyState> : null}
    </div>
  );
}
