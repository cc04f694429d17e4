// The chair's live judging progress board (polls the progress route every 10 seconds).
import type { Metadata } from "next";
import Link from "next/link";
import { ArrowLeft } from "lucide-react";
import { ProgressBoard } from "@/components/judging-setup/progress-board";
import type { Board } from "@/components/judging-setup/progress-queries";
import { guardQuery, pageViewer } from "@/components/shell/guard";
import { PageHeader } from "@/components/ui/page-header";
import { progressBoard } from "@/db/queries/judging-setup";

type Props = { params: Promise<{ slug: string }> };

export const metadata: Metadata = { title: "Judging progress" };

export default async function JudgingProgressPage({ params }: Props) {
  const { slug } = await params;
  const viewer = await pageViewer();
  const board = await guardQuery(progressBoard(viewer, slug));
  // What the route would send, so the first render and the polled ones have one shape.
  const initial = JSON.parse(JSON.stringify(board)) as Board;
  return (
    <div className="space-y-6">
      <PageHeader
        eyebrow={<Link href={`/shows/${slug}/manage/judging`} className="inline-flex min-h-tap items-center gap-1 no-underline"><ArrowLeft aria-hidden className="size-4" />Judging set-up</Link>}
        title="Judging progress"
        description="Sheets scored and still to do, per panel, category and judge."
      />
      <ProgressBoard showSlug={slug} initial={initial} renderedAt={new Date().toISOString()} />
    </div>
  );
}
