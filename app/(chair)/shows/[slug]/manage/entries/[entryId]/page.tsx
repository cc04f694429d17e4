// One entry as the chair sees it: every field, the entrant, photos, payment lines, the rules
// version accepted, and the entry's full history from the audit log.
import type { Metadata } from "next";
import { ArrowLeft, ImageOff } from "lucide-react";
import { EntryFactList } from "@/components/chair-entries/entry-facts";
import { EntryHistory } from "@/components/chair-entries/entry-history";
import { WithdrawEntry } from "@/components/chair-entries/withdraw-entry";
import { EntryStatusBadge } from "@/components/entries/entry-status";
import { formatDateTime } from "@/components/format/dates";
import { guardQuery, pageViewer } from "@/components/shell/guard";
import { Alert } from "@/components/ui/alert";
import { Badge } from "@/components/ui/badge";
import { ButtonLink } from "@/components/ui/button";
import { Card, CardHeader } from "@/components/ui/card";
import { EmptyState } from "@/components/ui/empty-state";
import { PageHeader } from "@/components/ui/page-header";
import { entryDetailForChair } from "@/db/queries/chair-entries";

type Props = { params: Promise<{ slug: string; entryId: string }> };

export const metadata: Metadata = { title: "Entry" };

const PAYMENT_STATUS: Record<string, string> = { open: "Not completed", paid: "Paid", expired: "Expired", refunded: "Refunded", partially_refunded: "Partly refunded" };
const VIEW_LABELS: Record<string, string> = { full: "Whole quilt", detail: "Detail", other: "Other view" };

export default async function ChairEntryPage({ params }: Props) {
  const { slug, entryId } = await params;
  const viewer = await pageViewer();
  const d = await guardQuery(entryDetailForChair(viewer, slug, entryId));
  const { entry, show } = d;
  const fmt = new Intl.NumberFormat("en-US", { style: "currency", currency: show.currency.toUpperCase() });
  const money = (cents: number) => fmt.format(cents / 100);

  return (
    <div className="space-y-6">
      <PageHeader
        eyebrow={show.name}
        title={`${entry.entryNumber ? `No. ${entry.entryNumber} · ` : ""}${entry.title}`}
        meta={
          <>
            <EntryStatusBadge status={entry.status} />
            <Badge tone={entry.paymentState === "paid" ? "success" : entry.paymentState === "refunded" ? "warning" : "neutral"}>
              {entry.paymentState === "paid" ? "Paid" : entry.paymentState === "refunded" ? "Refunded" : "Not paid"}
            </Badge>
          </>
        }
        actions={
          <div className="flex flex-wrap gap-2">
            <ButtonLink href={`/entries/${entry.id}`} variant="primary">
              Edit entry
            </ButtonLink>
            <ButtonLink href={`/shows/${show.slug}/manage/entries`} variant="secondary" icon={<ArrowLeft aria-hidden className="size-5" />}>
              All entries
            </ButtonLink>
          </div>
        }
      />

      <div className="grid gap-6 lg:grid-cols-[1fr_22rem]">
        <Card aria-labelledby="quilt">
          <CardHeader id="quilt" title="The quilt" />
          <EntryFactList entry={entry} money={money} timeZone={show.timeZone} juried={show.juried} />
        </Card>
        <div className="space-y-6">
          <Card aria-labelledby="entrant">
            <CardHeader id="entrant" title="Entrant" />
            <Alert tone="warning" title="Personal data">
              Contact details are for the committee only.
            </Alert>
            <dl className="mt-4 space-y-2">
              <div>
                <dt className="text-sm text-ink-muted">Name</dt>
                <dd>{d.entrant.name}</dd>
              </div>
              <div>
                <dt className="text-sm text-ink-muted">E-mail</dt>
                <dd className="break-all">
                  <a href={`mailto:${d.entrant.email}`}>{d.entrant.email}</a>
                </dd>
              </div>
              <div>
                <dt className="text-sm text-ink-muted">Phone</dt>
                <dd>{d.entrant.phone || "—"}</dd>
              </div>
              <div>
                <dt className="text-sm text-ink-muted">Guild</dt>
                <dd>{d.entrant.guild || "—"}</dd>
              </div>
            </dl>
          </Card>
          <Card aria-labelledby="rules">
            <CardHeader id="rules" title="Rules accepted" />
            {d.rules ? (
              <p>
                Version {d.rules.version}, published {formatDateTime(d.rules.publishedAt, show.timeZone)}; accepted {formatDateTime(d.rules.acceptedAt, show.timeZone) ?? "—"}.
              </p>
            ) : (
              <p className="text-ink-muted">No rules version is recorded for this entry.</p>
            )}
          </Card>
          {d.withdrawal.allowed ? (
            <Card aria-labelledby="withdraw">
              <CardHeader id="withdraw" title="Withdraw" description="Takes the quilt out of the show, at the entrant's request or the committee's decision." />
              <WithdrawEntry showSlug={show.slug} entryId={entry.id} currency={show.currency} paidByCard={d.withdrawal.paidByCard} paid={entry.paidAt !== null} refundCents={d.withdrawal.refundCents} />
            </Card>
          ) : null}
        </div>
      </div>

      <Card aria-labelledby="photos">
        <CardHeader id="photos" title="Photos" />
        {d.photos.length ? (
          <ul className="grid grid-cols-2 gap-4 sm:grid-cols-4">
            {d.photos.map((p) => (
              <li key={p.id}>
                <figure className="space-y-1">
                  {/* eslint-disable-next-line @next/next/no-img-element -- served by the authorised photo route, not a static asset */}
                  <img src={`/api/photos/${p.id}/thumb`} alt={`${VIEW_LABELS[p.view] ?? p.view} of “${entry.title}”`} loading="lazy" className="aspect-square w-full rounded-control border border-line bg-paper-200 object-cover" />
                  <figcaption className="text-sm text-ink-muted">
                    {VIEW_LABELS[p.view] ?? p.view} · {p.widthPx} × {p.heightPx} px
                  </figcaption>
                </figure>
              </li>
            ))}
          </ul>
        ) : (
          <EmptyState icon={ImageOff} title="No photos">
            The entrant has not uploaded any photos for this entry.
          </EmptyState>
        )}
      </Card>

      <Card aria-labelledby="payments">
        <CardHeader id="payments" title="Payment" description={entry.paymentReference ? `Reference: ${entry.paymentReference}${entry.paidAt ? `, paid ${formatDateTime(entry.paidAt, show.timeZone)}` : ""}` : undefined} />
        {d.paymentLines.length ? (
          <ul className="divide-y divide-line">
            {d.paymentLines.map((l) => (
              <li key={l.id} className="flex flex-wrap justify-between gap-2 py-2">
                <span>
                  {l.description}
                  <span className="block text-sm text-ink-muted">
                    {PAYMENT_STATUS[l.status] ?? l.status}
                    {l.paidAt ? ` · ${formatDateTime(l.paidAt, show.timeZone)}` : ""}
                  </span>
                </span>
                <span className="tabular-nums">{money(l.amountCents)}</span>
              </li>
            ))}
          </ul>
        ) : (
          <p className="text-ink-muted">{entry.paidAt ? "Paid offline; there are no online payment lines." : "No payment has been started for this entry."}</p>
        )}
      </Card>

      <Card aria-labelledby="history">
        <CardHeader id="history" title="History" description={`Times in ${show.timeZone}.`} />
        <EntryHistory items={d.history} timeZone={show.timeZone} currency={show.currency} />
      </Card>
    </div>
  );
}
