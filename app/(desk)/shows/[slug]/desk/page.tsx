// The intake desk: every entry sent to the show, searchable by number or name, each with a
// Measure form for the size the quilt really has.
import type { Metadata } from "next";
import { Inbox } from "lucide-react";
import { IntakeTable } from "@/components/desk/intake-table";
import { guardQuery, pageViewer } from "@/components/shell/guard";
import { Alert } from "@/components/ui/alert";
import { EmptyState } from "@/components/ui/empty-state";
import { PageHeader } from "@/components/ui/page-header";
import { intakeList } from "@/db/queries/desk";

type Props = { params: Promise<{ slug: string }> };

export const metadata: Metadata = { title: "Intake desk" };

export default async function DeskPage({ params }: Props) {
  const { slug } = await params;
  const viewer = await pageViewer();
  const list = await guardQuery(intakeList(viewer, slug));
  return (
    <div className="space-y-6">
      <PageHeader eyebrow={list.show.name} title="Intake desk" description="Find a quilt by its entry number or the entrant’s name." />
      <Alert tone="info" title="Measuring is here; check-in and claim tickets come later.">
        Use Measure on an entry to record the size you find. A size off by more than the show allows is flagged for the chair and decides the category.
      </Alert>
      <Alert tone="warning" title="Personal data">
        Entrants’ names are here so you can match quilts to people at the desk. Don’t share or photograph this screen.
      </Alert>
      {list.entries.length ? (
        <IntakeTable showSlug={list.show.slug} initialEntries={list.entries} />
      ) : (
        <EmptyState icon={Inbox} title="No entries yet">
          Entries appear here once quilters send them to the show.
        </EmptyState>
      )}
    </div>
  );
}
