// The judging area for judges and scribes: the entries to judge, by number, with no names.
import type { Metadata } from "next";
import { Gavel } from "lucide-react";
import { JudgingQueue } from "@/components/judging/judging-queue";
import { guardQuery, pageViewer } from "@/components/shell/guard";
import { Alert } from "@/components/ui/alert";
import { EmptyState } from "@/components/ui/empty-state";
import { PageHeader } from "@/components/ui/page-header";
import { judgingQueue } from "@/db/queries/judging";

type Props = { params: Promise<{ slug: string }> };

export const metadata: Metadata = { title: "Judging" };

export default async function JudgingPage({ params }: Props) {
  const { slug } = await params;
  const viewer = await pageViewer();
  const queue = await guardQuery(judgingQueue(viewer, slug));
  const count = queue.entries.length;

  return (
    <div className="space-y-6">
      <PageHeader
        eyebrow={queue.show.name}
        title="Judging"
        description={count ? `${count} ${count === 1 ? "quilt" : "quilts"} to judge, in entry-number order. Judging is blind: no maker names appear here.` : undefined}
      />
      <Alert tone="info" title="Score sheets will appear here once the chair opens judging.">
        Until then, this list lets you see what is coming.
      </Alert>
      {count ? (
        <JudgingQueue entries={queue.entries} />
      ) : (
        <EmptyState icon={Gavel} title="No quilts to judge yet">
          Quilts join this list once they are numbered and entered for judging.
        </EmptyState>
      )}
    </div>
  );
}
