// Jurying for a juried show: a round from photos only, with the maker hidden, then the release
// of the recorded decisions to the entrants.
import type { Metadata } from "next";
import { Inbox } from "lucide-react";
import { JuryBoard } from "@/components/chair-entries/jury-board";
import { guardQuery, pageViewer } from "@/components/shell/guard";
import { Alert } from "@/components/ui/alert";
import { EmptyState } from "@/components/ui/empty-state";
import { PageHeader } from "@/components/ui/page-header";
import { juryRound } from "@/db/queries/chair-entries";

type Props = { params: Promise<{ slug: string }> };

export const metadata: Metadata = { title: "Jurying" };

export default async function JuryingPage({ params }: Props) {
  const { slug } = await params;
  const viewer = await pageViewer();
  const round = await guardQuery(juryRound(viewer, slug));
  return (
    <div className="space-y-6">
      <PageHeader eyebrow={round.show.name} title="Jurying" description="Decide each entry from its photos and its own facts; who made it stays hidden here." />
      {!round.show.juried ? (
        <Alert tone="info" title="This show is not juried.">
          Entries are accepted or declined from the entries list, and entrants are told straight away.
        </Alert>
      ) : round.entries.length === 0 ? (
        <EmptyState icon={Inbox} title="Nothing to jury yet">
          Entries appear here once quilters send them to the show.
        </EmptyState>
      ) : (
        <JuryBoard showSlug={round.show.slug} entries={round.entries} progress={round.progress} />
      )}
    </div>
  );
}
