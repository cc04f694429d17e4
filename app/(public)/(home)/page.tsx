// Home: what Ribbonry does for each person at a show, and the shows open to the public.
import type { Metadata } from "next";
import { CalendarX2, ClipboardCheck, ClipboardPen, Settings2, Trophy, Scissors } from "lucide-react";
import { RibbonMark } from "@/components/brand/ribbon-mark";
import { ShowCard } from "@/components/shows/show-card";
import { EmptyState } from "@/components/ui/empty-state";
import { listPublicShows } from "@/db/queries/shows";

export async function generateMetadata(): Promise<Metadata> {
  return {
    title: { absolute: "Ribbonry — quilt shows, from entry to ribbon" },
    description: "Enter a quilt online, check quilts in at drop-off, judge blind on tablets and publish the ribbons.",
  };
}

const ROLES = [
  { icon: Settings2, who: "Show committees", what: "Open a show, set the dates and categories, and invite judges, scribes and intake volunteers." },
  { icon: Scissors, who: "Quilters", what: "Enter quilts online, pay the entry fee and follow each quilt from drop-off to pick-up." },
  { icon: ClipboardCheck, who: "Intake desk", what: "Find an entry by number or name and check quilts in and out with a clear record." },
  { icon: ClipboardPen, who: "Judges and scribes", what: "Score quilts blind on a tablet, by entry number — no maker names on any screen." },
  { icon: Trophy, who: "The chair", what: "Review the scores, settle the ribbons and Best of Show, and publish the results." },
];

export default async function HomePage() {
  const shows = (await listPublicShows()).filter((s) => s.status !== "archived");
  return (
    <div className="space-y-12 sm:space-y-16">
      <section className="grid items-center gap-8 pt-2 md:grid-cols-[1fr_auto]">
        <div className="space-y-4">
          <p className="text-sm font-semibold tracking-wide text-gold-700 uppercase">For guild quilt shows</p>
          <h1 className="text-4xl sm:text-5xl">Your quilt show, from the first entry to the last ribbon</h1>
          <p className="max-w-prose text-lg text-ink-muted">
            Ribbonry keeps entries, drop-off, judging and results in one place, so the committee spends show week
            with the quilts instead of the paperwork.
          </p>
        </div>
        <RibbonMark className="hidden size-40 md:block lg:size-48" />
      </section>

      <section aria-labelledby="who">
        <h2 id="who" className="mb-6 pb-3 text-2xl stitch sm:text-3xl">
          What it does for each of you
        </h2>
        <ul className="grid gap-4 sm:grid-cols-2 lg:grid-cols-3">
          {ROLES.map((r) => (
            <li key={r.who} className="flex gap-4 rounded-card border border-line bg-surface p-5 shadow-card">
              <r.icon aria-hidden className="mt-1 size-7 shrink-0 text-plum-500" />
              <div>
                <h3 className="text-lg">{r.who}</h3>
                <p className="text-ink-muted">{r.what}</p>
              </div>
            </li>
          ))}
        </ul>
      </section>

      <section aria-labelledby="shows-heading" id="shows" className="scroll-mt-24">
        <h2 id="shows-heading" className="mb-6 pb-3 text-2xl stitch sm:text-3xl">
          Shows on Ribbonry
        </h2>
        {shows.length === 0 ? (
          <EmptyState icon={CalendarX2} title="No public shows yet">
            Shows appear here when their committee opens them. Check back soon.
          </EmptyState>
        ) : (
          <ul className="grid gap-4 md:grid-cols-2">
            {shows.map((show) => (
              <li key={show.id}>
                <ShowCard show={show} />
              </li>
            ))}
          </ul>
        )}
      </section>
    </div>
  );
}
