// "My entries": the signed-in person's quilts in every show, grouped by show.
import type { Metadata } from "next";
import Link from "next/link";
import { Scissors } from "lucide-react";
import { EntryStatusBadge, entryStatusInfo } from "@/components/entries/entry-status";
import { pageViewer, guardQuery } from "@/components/shell/guard";
import { ButtonLink } from "@/components/ui/button";
import { EmptyState } from "@/components/ui/empty-state";
import { PageHeader } from "@/components/ui/page-header";
import { entriesForEntrant } from "@/db/queries/my-entries";
import { formatSize } from "@/scoring/units";

export const metadata: Metadata = { title: "My entries" };

type Entry = Awaited<ReturnType<typeof entriesForEntrant>>[number];

function byShow(entries: Entry[]) {
  const groups = new Map<string, { name: string; slug: string; entries: Entry[] }>();
  for (const e of entries) {
    const g = groups.get(e.showSlug) ?? { name: e.showName, slug: e.showSlug, entries: [] };
    g.entries.push(e);
    groups.set(e.showSlug, g);
  }
  return [...groups.values()];
}

export default async function MyEntriesPage() {
  const viewer = await pageViewer();
  const entries = await guardQuery(entriesForEntrant(viewer));
  const shows = byShow(entries);

  return (
    <div className="space-y-8">
      <PageHeader title="My entries" description="Every quilt you’ve entered, and where it stands." />
      {shows.length === 0 ? (
        <EmptyState icon={Scissors} title="You haven’t entered a quilt yet" action={<ButtonLink href="/#shows">Find a show to enter</ButtonLink>}>
          Choose a show that is taking entries and follow its “Enter a quilt” button.
        </EmptyState>
      ) : (
        shows.map((show) => (
          <section key={show.slug} aria-labelledby={`show-${show.slug}`} className="space-y-4">
            <h2 id={`show-${show.slug}`} className="pb-2 text-2xl stitch">
              <Link href={`/shows/${show.slug}`} className="text-ink">
                {show.name}
              </Link>
            </h2>
            <ul className="grid gap-4 md:grid-cols-2">
              {show.entries.map((e) => (
                <li key={e.id} className="flex flex-col gap-2 rounded-card border border-line bg-surface p-5 shadow-card">
                  <div className="flex flex-wrap items-center justify-between gap-2">
                    <p className="text-sm font-semibold text-ink-muted">
                      {e.entryNumber === null ? "Number given when sent" : <>Entry <span className="font-display text-xl text-plum-700 tabular-nums">{e.entryNumber}</span></>}
                    </p>
                    <EntryStatusBadge status={e.status} />
                  </div>
                  <h3 className="text-xl">{e.title}</h3>
                  <p className="text-ink-muted">{formatSize(e.widthUm, e.lengthUm)}</p>
                  <p className="border-t border-line pt-2 text-sm">{entryStatusInfo(e.status).explain}</p>
                </li>
              ))}
            </ul>
          </section>
        ))
      )}
    </div>
  );
}
