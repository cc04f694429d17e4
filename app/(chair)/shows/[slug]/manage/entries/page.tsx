// The chair's entries: every entry sent to the show, searched, filtered and acted on in bulk.
import type { Metadata } from "next";
import { ScanSearch } from "lucide-react";
import { EntriesTable } from "@/components/chair-entries/entries-table";
import { guardQuery, pageViewer } from "@/components/shell/guard";
import { Alert } from "@/components/ui/alert";
import { ButtonLink } from "@/components/ui/button";
import { PageHeader } from "@/components/ui/page-header";
import { entriesForChair } from "@/db/queries/chair-entries";
import { DEFAULT_ENTRIES_QUERY } from "@/lib/schemas/chair-entries";

type Props = { params: Promise<{ slug: string }> };

export const metadata: Metadata = { title: "Entries" };

export default async function ChairEntriesPage({ params }: Props) {
  const { slug } = await params;
  const viewer = await pageViewer();
  const page = await guardQuery(entriesForChair(viewer, slug, DEFAULT_ENTRIES_QUERY));
  return (
    <div className="space-y-6">
      <PageHeader
        eyebrow={page.show.name}
        title="Entries"
        description={`${page.total} ${page.total === 1 ? "entry has" : "entries have"} been sent to the show.`}
        actions={
          page.show.juried ? (
            <ButtonLink href={`/shows/${page.show.slug}/manage/jurying`} variant="secondary" icon={<ScanSearch aria-hidden className="size-5" />}>
              Jurying
            </ButtonLink>
          ) : null
        }
      />
      <Alert tone="warning" title="Personal data">
        This list holds entrants’ names and e-mail addresses, and the spreadsheet their phone numbers. Share them only with the committee.
      </Alert>
      <EntriesTable showSlug={page.show.slug} initial={{ query: DEFAULT_ENTRIES_QUERY, page }} />
    </div>
  );
}
