// The administrator's page: every show with its chairs and entries, and a form for a new show.
import type { Metadata } from "next";
import { CalendarX2 } from "lucide-react";
import { NewShowForm } from "@/components/admin/new-show-form";
import { ShowsTable } from "@/components/admin/shows-table";
import { timeZoneOptions } from "@/components/admin/time-zones";
import { guardQuery, pageViewer } from "@/components/shell/guard";
import { Card, CardHeader } from "@/components/ui/card";
import { EmptyState } from "@/components/ui/empty-state";
import { PageHeader } from "@/components/ui/page-header";
import { showsForAdmin } from "@/db/queries/shows";

export const metadata: Metadata = { title: "Admin" };

export default async function AdminPage() {
  const viewer = await pageViewer();
  const shows = await guardQuery(showsForAdmin(viewer));
  return (
    <div className="space-y-10">
      <PageHeader eyebrow="Platform administration" title="Shows" description="Every show on Ribbonry. New shows start in draft until their chair opens them." />
      <section aria-labelledby="all-shows" className="space-y-4">
        <h2 id="all-shows" className="text-2xl">
          All shows <span className="font-sans text-lg font-normal text-ink-muted">({shows.length})</span>
        </h2>
        {shows.length ? (
          <ShowsTable shows={shows} />
        ) : (
          <EmptyState icon={CalendarX2} title="No shows yet">
            Create the first one below.
          </EmptyState>
        )}
      </section>
      <Card aria-labelledby="new-show">
        <CardHeader id="new-show" title="New show" description="The chair gets an e-mail invitation and sets up the rest: dates, categories and the team." />
        <NewShowForm timeZones={timeZoneOptions()} />
      </Card>
    </div>
  );
}
