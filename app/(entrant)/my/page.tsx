// "My entries": the signed-in person's quilts in every show, grouped by show, with what each
// still needs, the Pay box, withdrawals, and what to bring to drop-off.
import type { Metadata } from "next";
import Link from "next/link";
import { Scissors } from "lucide-react";
import { EntryCard } from "@/components/entries/entry-card";
import { formatDateRange, formatDateTime } from "@/components/format/dates";
import { PayEntries } from "@/components/payments/pay-entries";
import { pageViewer, guardQuery } from "@/components/shell/guard";
import { Alert } from "@/components/ui/alert";
import { ButtonLink } from "@/components/ui/button";
import { EmptyState } from "@/components/ui/empty-state";
import { PageHeader } from "@/components/ui/page-header";
import { myEntriesByShow, type MyShow } from "@/db/queries/entrant-shows";
import { paymentStatusForEntrant } from "@/db/queries/payments";
import type { Viewer } from "@/lib/session";
import { formatMoney } from "@/scoring/fees";

export const metadata: Metadata = { title: "My entries" };

const firstOf = (v: string | string[] | undefined) => (Array.isArray(v) ? v[0] : v);

async function ReturnBanner({ viewer, paid, cancelled }: { viewer: Viewer; paid?: string; cancelled?: string }) {
  if (cancelled) return <Alert live tone="info" title="Payment cancelled — nothing was charged.">You can pay whenever you are ready.</Alert>;
  if (!paid) return null;
  const payment = await paymentStatusForEntrant(viewer, paid);
  if (!payment) return null;
  if (payment.status === "open") {
    return <Alert live tone="info" title="Payment is being confirmed">This usually takes a few seconds. Reload the page to see your entries marked paid.</Alert>;
  }
  if (payment.status === "expired") return <Alert live tone="warning" title="This payment was not completed">Nothing was charged for it. You can pay again below.</Alert>;
  return <Alert live tone="success" title="Payment received — receipt e-mailed">{formatMoney(payment.amountCents, payment.currency)} paid, receipt number {payment.receiptNumber}. Thank you.</Alert>;
}

function DropOff({ group }: { group: MyShow }) {
  const coming = group.entries.filter((e) => e.status === "accepted" || (!group.juried && e.status === "paid"));
  if (coming.length === 0) return null;
  const { show } = group;
  const when = formatDateRange(show.dropOffStartsAt, show.dropOffEndsAt, show.timeZone, { withTime: true });
  return (
    <section aria-labelledby={`dropoff-${show.slug}`} className="space-y-2 rounded-card border border-line bg-paper-50 p-4 sm:p-5">
      <h3 id={`dropoff-${show.slug}`} className="text-xl">What to bring to drop-off</h3>
      <p>
        {when ? <>Drop-off: {when}</> : "The show will announce drop-off times."} at {[show.venueName, show.venueAddress].filter(Boolean).join(", ")}.
        Entries {coming.map((e) => e.entryNumber ?? e.title).join(", ")}.
      </p>
      <ul className="list-disc space-y-1 pl-5">
        {/* Sleeve, label and bag: common practice at guild shows (seen in several shows' entry instructions). */}
        <li>A hanging sleeve on the top of the back — 4 in deep is the usual size unless the show’s rules say otherwise.</li>
        <li>Your label sewn on the back, lower right corner as seen from the back.</li>
        <li>A cloth bag for each quilt, marked with your name and the entry number.</li>
      </ul>
    </section>
  );
}

function ShowGroup({ group }: { group: MyShow }) {
  const { show } = group;
  const payable = group.entries.filter((e) => e.canPay);
  const closes = formatDateTime(show.entryClosesAt, show.timeZone);
  return (
    <section aria-labelledby={`show-${show.slug}`} className="space-y-4">
      <h2 id={`show-${show.slug}`} className="pb-2 text-2xl stitch">
        <Link href={`/shows/${show.slug}`} className="text-ink">
          {show.name}
        </Link>
      </h2>
      {/* Once every quilt is home (or out of the show) there is nothing left to withdraw. */}
      {closes && group.entries.some((e) => ["draft", "submitted", "paid", "accepted", "waitlisted"].includes(e.status)) ? (
        <p className="text-sm text-ink-muted">
          {group.withdrawOpen
            ? `Entries close ${closes}. Until then you can withdraw an entry here${group.refundPercent > 0 ? ` and get back ${group.refundPercent}% of its entry fee` : ""}.`
            : "Entries are closed; to withdraw an entry now, ask the show chair."}
        </p>
      ) : null}
      <ul className="grid gap-4 md:grid-cols-2">
        {group.entries.map((e) => (
          <EntryCard
            key={e.id}
            entry={{ ...e, critique: { critiqueRequested: e.critiqueRequested, critiqueDue: e.critiqueDue, critiquePaid: e.critiquePaid, critiqueChangeable: e.critiqueChangeable } }}
            currency={group.currency}
            refundPercent={group.refundPercent}
            critiqueFeeCents={group.critiqueFeeCents}
          />
        ))}
      </ul>
      {payable.length > 0 ? (
        <PayEntries
          showSlug={show.slug}
          showName={show.name}
          guildName={show.guildName}
          currency={group.currency}
          member={group.member}
          memberList={group.memberList}
          entryFeesAlreadyPaidCents={group.entryFeesAlreadyPaidCents}
          schedule={{ ...group.schedule, lateFeeFromAt: group.schedule.lateFeeFromAt?.toISOString() ?? null }}
          entries={payable.map((e) => ({ id: e.id, entryNumber: e.entryNumber, title: e.title, critiqueRequested: e.critiqueRequested, critiqueOnly: e.critiqueDue }))}
        />
      ) : null}
      <DropOff group={group} />
    </section>
  );
}

export default async function MyEntriesPage({ searchParams }: { searchParams: Promise<Record<string, string | string[] | undefined>> }) {
  const viewer = await pageViewer();
  const params = await searchParams;
  const groups = await guardQuery(myEntriesByShow(viewer));

  return (
    <div className="space-y-8">
      <PageHeader title="My entries" description="Every quilt you’ve entered, and where it stands." />
      <ReturnBanner viewer={viewer} paid={firstOf(params.paid)} cancelled={firstOf(params.cancelled)} />
      {groups.length === 0 ? (
        <EmptyState icon={Scissors} title="You haven’t entered a quilt yet" action={<ButtonLink href="/#shows">Find a show to enter</ButtonLink>}>
          Choose a show that is taking entries and follow its “Enter a quilt” button.
        </EmptyState>
      ) : (
        groups.map((group) => <ShowGroup key={group.show.id} group={group} />)
      )}
    </div>
  );
}
