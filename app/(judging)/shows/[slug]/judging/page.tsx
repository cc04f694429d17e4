// The judging tablet for judges and scribes. The layout has checked the role; the query checks it
// again. Everything else is the client (components/judging/judging-app.tsx), which works from the
// tablet's own copy of the session so the page also opens and scores without a network.
import type { Metadata } from "next";
import { JudgingApp } from "@/components/judging/judging-app";
import { JudgingQueue } from "@/components/judging/judging-queue";
import { RegisterWorker } from "@/components/judging/register-worker";
import { guardQuery, pageViewer } from "@/components/shell/guard";
import { PageHeader } from "@/components/ui/page-header";
import { judgingQueue } from "@/db/queries/judging";

type Props = { params: Promise<{ slug: string }> };

// Installed from here, the app opens on this show's judging page (app/api/…/judging/manifest).
export async function generateMetadata({ params }: Props): Promise<Metadata> {
  const { slug } = await params;
  return { title: "Judging", manifest: `/api/shows/${encodeURIComponent(slug)}/judging/manifest` };
}

export default async function JudgingPage({ params }: Props) {
  const { slug } = await params;
  const viewer = await pageViewer();
  const queue = await guardQuery(judgingQueue(viewer, slug));

  return (
    <div className="space-y-6">
      <RegisterWorker />
      <PageHeader eyebrow={queue.show.name} title="Judging" description="Judging is blind: entry numbers and the quilt's own facts only, no maker names." />
      <JudgingApp slug={queue.show.slug} notOnPanel={queue.entries.length ? <JudgingQueue entries={queue.entries} /> : null} />
    </div>
  );
}
