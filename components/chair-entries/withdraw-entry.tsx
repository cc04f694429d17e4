"use client";
// The chair's "Withdraw entry" on one entry's page: a required reason (kept in the entry's
// history) and what happens to the fee, then the server action. Open to the chair after entries
// close too, when the entrant can no longer withdraw themselves.
import { useState } from "react";
import { useRouter } from "next/navigation";
import { CircleMinus } from "lucide-react";
import { ActionForm, FormStatusAlert, useActionForm, type FormStatus } from "@/components/forms/action-form";
import { SubmitOrCancel } from "@/components/forms/submit-or-cancel";
import { Button } from "@/components/ui/button";
import { TextareaField } from "@/components/ui/field";
import { chairWithdrawSchema } from "@/lib/schemas/withdrawals";
import { formatMoney } from "@/scoring/fees";
import { withdrawEntryAsChairAction } from "@/app/(chair)/shows/[slug]/manage/entries/[entryId]/actions";

const reasonSchema = chairWithdrawSchema.pick({ reason: true });

type Props = { showSlug: string; entryId: string; currency: string; paidByCard: boolean; paid: boolean; refundCents: number };

function refundNote({ currency, paidByCard, paid, refundCents }: Props): string {
  if (paidByCard) return refundCents > 0 ? `${formatMoney(refundCents, currency)} goes back to the entrant's card, as the show's refund rule gives.` : "The show's refund rule gives nothing back on withdrawal.";
  if (paid) return "It was paid in person: any refund is for the treasurer to make.";
  return "Nothing was paid, so there is nothing to refund.";
}

export function WithdrawEntry(props: Props) {
  const router = useRouter();
  const [open, setOpen] = useState(false);
  const [done, setDone] = useState<FormStatus>(null);
  const ctl = useActionForm({
    schema: reasonSchema,
    defaultValues: { reason: "" },
    action: (values) => withdrawEntryAsChairAction(null, { ...values, showSlug: props.showSlug, entryId: props.entryId }),
    onSuccess: (r) => {
      setOpen(false);
      setDone({ tone: "success", message: r.message ?? "Withdrawn." });
      router.refresh();
    },
  });

  return (
    <div className="space-y-3">
      <FormStatusAlert status={done} />
      {open ? (
        <ActionForm controller={ctl} aria-label="Withdraw this entry" className="max-w-xl">
          <p className="text-sm">{refundNote(props)} The entry keeps its number.</p>
          <TextareaField label="Reason for withdrawing" hint="Kept in the entry's history, for the committee." required error={ctl.errorOf("reason")} {...ctl.form.register("reason")} />
          <SubmitOrCancel variant="danger" pending={ctl.pending} pendingLabel="Withdrawing…" onCancel={() => setOpen(false)}>
            Withdraw this entry
          </SubmitOrCancel>
        </ActionForm>
      ) : done ? null : (
        <Button variant="secondary" onClick={() => setOpen(true)} icon={<CircleMinus aria-hidden className="size-5" />}>
          Withdraw entry…
        </Button>
      )}
    </div>
  );
}
