"use client";
// One quilt on "My entries": number, status in plain words, its category and why, what is still
// missing, and a Withdraw button with a confirm step that says what refund it would give.
import Link from "next/link";
import { useState, useTransition } from "react";
import { Award, CircleSlash, FileText } from "lucide-react";
import { withdrawEntryAction } from "@/app/(entrant)/my/actions";
import { EntryStatusBadge, entryStatusInfo } from "@/components/entries/entry-status";
import { plainReasons, sizeFirst, storedHeadline } from "@/components/entries/category-words";
import { CritiqueToggle, type CritiqueState } from "@/components/entries/critique-toggle";
import { RibbonSwatch } from "@/components/results/ribbon-swatch";
import { Alert } from "@/components/ui/alert";
import { Button } from "@/components/ui/button";
import { formatMoney } from "@/scoring/fees";
import { UNSET_LENGTH_UM } from "@/scoring/entry-completeness";
import { formatSize } from "@/scoring/units";

export type EntryCardProps = {
  entry: {
    id: string;
    entryNumber: number | null;
    title: string;
    widthUm: number;
    lengthUm: number;
    status: string;
    decisionReason: string;
    paid: boolean;
    paidByCard: boolean;
    canWithdraw: boolean;
    refundIfWithdrawnCents: number;
    category: { state: string; code: string | null; name: string | null; reasons: string[] } | null;
    waitlistReason: string;
    critique?: CritiqueState;
    /** Once the show's results are published: the result in words and the critique (or why none). */
    result?: {
      words: string;
      ribbon: { name: string; colour: string } | null;
      awarded: boolean;
      critique: { available: true; url: string } | { available: false; why: string };
    } | null;
  };
  currency: string;
  refundPercent: number;
  /** The show's critique fee; 0 = critiques are not asked for separately. */
  critiqueFeeCents?: number;
};

export function EntryCard({ entry: e, currency, refundPercent, critiqueFeeCents = 0 }: EntryCardProps) {
  const info = entryStatusInfo(e.status);
  return (
    <li className="flex flex-col gap-2 rounded-card border border-line bg-surface p-5 shadow-card">
      <div className="flex flex-wrap items-center justify-between gap-2">
        <p className="text-sm font-semibold text-ink-muted">
          {e.entryNumber === null ? (
            "Number given when sent"
          ) : (
            <>
              Entry <span className="font-display text-xl text-plum-700 tabular-nums">{e.entryNumber}</span>
            </>
          )}
        </p>
        <EntryStatusBadge status={e.status} />
      </div>
      <h3 className="text-xl">
        <Link href={`/entries/${e.id}`} className="inline-flex min-h-tap items-center text-ink underline-offset-4 hover:underline">
          {e.title || "Untitled quilt"}
        </Link>
      </h3>
      {/* A new draft holds a 1 µm placeholder size until the quilt step is saved. */}
      <p className="text-ink-muted">{e.widthUm > UNSET_LENGTH_UM && e.lengthUm > UNSET_LENGTH_UM ? formatSize(e.widthUm, e.lengthUm) : "Size not given yet"}</p>
      <CategoryLine category={e.category} />
      {e.result ? <ResultLine result={e.result} entryNumber={e.entryNumber} /> : null}
      {e.waitlistReason ? (
        <p className="text-sm">
          <span className="font-semibold">Why it waits:</span> {e.waitlistReason}
        </p>
      ) : null}
      <p className="border-t border-line pt-2 text-sm">{info.explain}</p>
      {e.status === "declined" && e.decisionReason ? (
        <p className="text-sm">
          <span className="font-semibold">The committee’s reason:</span> {e.decisionReason}
        </p>
      ) : null}
      {info.missing ? (
        <p className="text-sm font-semibold text-warning-700">
          Still to do: {info.missing}
        </p>
      ) : null}
      {e.critique && critiqueFeeCents > 0 && e.status !== "draft" && !e.result ? <CritiqueToggle entryId={e.id} state={e.critique} feeCents={critiqueFeeCents} currency={currency} /> : null}
      {e.canWithdraw ? <WithdrawEntry entry={e} currency={currency} refundPercent={refundPercent} /> : null}
    </li>
  );
}

function ResultLine({ result: r, entryNumber }: { result: NonNullable<EntryCardProps["entry"]["result"]>; entryNumber: number | null }) {
  return (
    <div className="space-y-1 rounded-control border border-gold-300 bg-gold-50 p-3">
      <p className="flex items-center gap-2 font-semibold">
        <Award aria-hidden className="size-5 shrink-0 text-gold-700" />
        <span>Result: {r.ribbon ? <RibbonSwatch ribbon={r.ribbon} label={r.words} /> : r.words}</span>
      </p>
      {r.critique.available ? (
        <a href={r.critique.url} className="inline-flex min-h-tap items-center gap-2 font-semibold" aria-label={`Judges' critique of entry ${entryNumber ?? ""} (PDF)`}>
          <FileText aria-hidden className="size-5" /> Judges&apos; critique (PDF)
        </a>
      ) : (
        <p className="text-sm text-ink-muted">{r.critique.why}</p>
      )}
    </div>
  );
}

function CategoryLine({ category: c }: { category: EntryCardProps["entry"]["category"] }) {
  if (!c) return null;
  const label = c.code !== null && c.name !== null ? { code: c.code, name: c.name } : null;
  const headline = storedHeadline({ state: c.state, category: label });
  if (!headline) return null;
  const reasons = sizeFirst(plainReasons(c.reasons, c.name ?? undefined));
  return (
    <div className="text-sm">
      <p>
        <span className="font-semibold">Category:</span> {headline.replace(/^In /, "")}
      </p>
      {reasons.length ? (
        <details>
          <summary className="inline-flex min-h-tap cursor-pointer items-center font-semibold text-brand-strong">Why this category</summary>
          <ul className="list-disc space-y-1 pl-5 break-words">
            {reasons.map((r, i) => (
              <li key={i}>{r}</li>
            ))}
          </ul>
        </details>
      ) : null}
    </div>
  );
}

function refundNote(e: EntryCardProps["entry"], currency: string, refundPercent: number): string {
  if (e.paidByCard) {
    return e.refundIfWithdrawnCents > 0
      ? `A refund of ${formatMoney(e.refundIfWithdrawnCents, currency)} (${refundPercent}% of the entry fee) goes back to your card.`
      : "This show gives no refund of the entry fee on withdrawal.";
  }
  if (e.paid) return "You paid in person: ask the show about any refund.";
  return "Nothing was paid, so there is nothing to refund.";
}

function WithdrawEntry({ entry: e, currency, refundPercent }: EntryCardProps) {
  const [confirming, setConfirming] = useState(false);
  const [result, setResult] = useState<{ tone: "success" | "error"; message: string } | null>(null);
  const [pending, startTransition] = useTransition();

  const withdraw = () =>
    startTransition(async () => {
      const r = await withdrawEntryAction({ entryId: e.id });
      setResult({ tone: r.ok ? "success" : "error", message: r.message ?? (r.ok ? "Withdrawn." : "The entry could not be withdrawn.") });
      if (r.ok) setConfirming(false);
    });

  return (
    <div className="space-y-2 border-t border-line pt-3">
      {result ? <Alert live tone={result.tone} title={result.message} /> : null}
      {confirming ? (
        <div role="group" aria-label={`Withdraw ${e.title}?`} className="space-y-2 rounded-control border border-danger-700/30 bg-danger-50 p-3">
          <p className="font-semibold">Withdraw this quilt from the show?</p>
          <p className="text-sm">{refundNote(e, currency, refundPercent)} The entry number stays with this entry and is not given to anyone else. This cannot be undone here.</p>
          <div className="flex flex-wrap gap-2">
            <Button variant="danger" onClick={withdraw} pending={pending} pendingLabel="Withdrawing…">
              Yes, withdraw
            </Button>
            <Button variant="ghost" onClick={() => setConfirming(false)} disabled={pending}>
              Keep the entry
            </Button>
          </div>
        </div>
      ) : (
        <Button variant="secondary" icon={<CircleSlash aria-hidden className="size-5" />} onClick={() => setConfirming(true)}>
          Withdraw…
        </Button>
      )}
    </div>
  );
}
