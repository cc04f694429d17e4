"use client";
// The Pay box on "My entries": choose which unpaid entries of a show to pay, see every line and
// the total, then go to the payment page. The server prices the checkout again on its own.
import { useMemo, useState, useTransition } from "react";
import { CreditCard } from "lucide-react";
import { startCheckoutAction } from "@/app/(entrant)/my/actions";
import { Alert } from "@/components/ui/alert";
import { Button } from "@/components/ui/button";
import { CheckboxField } from "@/components/ui/field";
import { formatMoney, memberRateWords, quoteFees } from "@/scoring/fees";

export type PayEntriesProps = {
  showSlug: string;
  showName: string;
  guildName: string;
  currency: string;
  member: boolean;
  /** The chair keeps a list of members' e-mails (else the guild in the profile decides). */
  memberList: boolean;
  entryFeesAlreadyPaidCents: number;
  schedule: {
    entryFeeCents: number;
    memberEntryFeeCents: number;
    lateFeeCents: number;
    /** ISO 8601, UTC. */
    lateFeeFromAt: string | null;
    critiqueFeeCents: number;
    feeCapCents: number | null;
  };
  /** `critiqueOnly`: already paid, owing only the critique fee asked for afterwards. */
  entries: { id: string; entryNumber: number | null; title: string; critiqueRequested: boolean; critiqueOnly?: boolean }[];
};

export function PayEntries(props: PayEntriesProps) {
  const [selected, setSelected] = useState<Set<string>>(() => new Set(props.entries.map((e) => e.id)));
  const [error, setError] = useState<string | null>(null);
  const [pending, startTransition] = useTransition();
  const money = (c: number) => formatMoney(c, props.currency);
  const headingId = `pay-${props.showSlug}`;

  const quote = useMemo(
    () =>
      quoteFees({
        schedule: { ...props.schedule, lateFeeFromAt: props.schedule.lateFeeFromAt ? new Date(props.schedule.lateFeeFromAt) : null },
        member: props.member,
        at: new Date(),
        entries: props.entries.filter((e) => selected.has(e.id)).map((e) => ({ entryId: e.id, entryNumber: e.entryNumber, title: e.title, critiqueRequested: e.critiqueRequested, critiqueOnly: e.critiqueOnly })),
        entryFeesAlreadyPaidCents: props.entryFeesAlreadyPaidCents,
      }),
    [props, selected],
  );

  const toggle = (id: string, on: boolean) =>
    setSelected((prev) => {
      const next = new Set(prev);
      if (on) next.add(id);
      else next.delete(id);
      return next;
    });

  const pay = () =>
    startTransition(async () => {
      setError(null);
      const result = await startCheckoutAction({ showSlug: props.showSlug, entryIds: [...selected] });
      if (!result.ok) {
        setError([result.message, ...Object.values(result.fieldErrors ?? {}).flat()].join(" "));
        return;
      }
      if (result.data?.url) window.location.assign(result.data.url);
    });

  const { schedule } = props;
  return (
    <section aria-labelledby={headingId} className="space-y-4 rounded-card border-2 border-plum-200 bg-plum-50/40 p-4 sm:p-5">
      <h3 id={headingId} className="text-xl">{props.entries.every((e) => e.critiqueOnly) ? "Pay critique fees" : "Pay entry fees"}</h3>
      {error ? <Alert live tone="error" title={error} /> : null}
      <fieldset className="space-y-1">
        <legend className="font-semibold">Entries to pay for</legend>
        {props.entries.map((e) => (
          <CheckboxField
            key={e.id}
            name="entryIds"
            value={e.id}
            checked={selected.has(e.id)}
            onChange={(ev) => toggle(e.id, ev.currentTarget.checked)}
            label={`${e.entryNumber === null ? "" : `Entry ${e.entryNumber}: `}${e.title}`}
            hint={e.critiqueOnly ? "Entry fee paid; critique fee due" : e.critiqueRequested ? "Critique requested" : undefined}
          />
        ))}
      </fieldset>

      {quote.lines.length > 0 ? (
        <table className="w-full text-sm">
          <caption className="sr-only">What you will pay</caption>
          <tbody>
            {quote.lines.map((l) => (
              <tr key={`${l.entryId}-${l.kind}`} className="border-b border-line">
                <th scope="row" className="py-2 pr-2 text-left font-normal">{l.description}</th>
                <td className="py-2 text-right tabular-nums">{money(l.amountCents)}</td>
              </tr>
            ))}
            <tr>
              <th scope="row" className="py-2 pr-2 text-left">Total</th>
              <td className="py-2 text-right font-semibold tabular-nums">{money(quote.totalCents)}</td>
            </tr>
          </tbody>
        </table>
      ) : selected.size > 0 ? (
        <p>Nothing to pay for these entries; they will be marked paid.</p>
      ) : null}

      <ul className="list-disc space-y-1 pl-5 text-sm text-ink-muted">
        {schedule.memberEntryFeeCents !== schedule.entryFeeCents ? (
          <li>{memberRateWords({ member: props.member, guildName: props.guildName, memberList: props.memberList, memberFee: money(schedule.memberEntryFeeCents) })}</li>
        ) : null}
        {schedule.feeCapCents !== null ? (
          <li>
            Entry fees stop at {money(schedule.feeCapCents)} per entrant at this show; late and critique fees come on top.
            {quote.capSavingCents > 0 ? ` The cap saves you ${money(quote.capSavingCents)} here.` : ""}
          </li>
        ) : null}
        {quote.late ? <li>The late fee applies because entries are being paid after the late-fee date.</li> : null}
      </ul>

      <Button size="lg" icon={<CreditCard aria-hidden className="size-5" />} onClick={pay} pending={pending} pendingLabel="Opening the payment page…" disabled={selected.size === 0} className="w-full sm:w-auto">
        {quote.totalCents > 0 ? `Pay ${money(quote.totalCents)}` : "Confirm entries"}
      </Button>
    </section>
  );
}
