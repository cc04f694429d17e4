"use client";
// What the chair can do to the chosen rows at once: accept, decline with a reason (required),
// or record a cash/cheque payment with its reference (required).
import { useState, useTransition } from "react";
import { Ban, Banknote, CircleCheck } from "lucide-react";
import { ActionForm, FormStatusAlert, useActionForm, type FormStatus } from "@/components/forms/action-form";
import { Button } from "@/components/ui/button";
import { TextareaField, TextField } from "@/components/ui/field";
import { declineEntriesSchema, markPaidOfflineSchema } from "@/lib/schemas/chair-entries";
import { acceptEntriesAction, declineEntriesAction, markPaidOfflineAction } from "@/app/(chair)/shows/[slug]/manage/entries/actions";
import { SubmitOrCancel } from "@/components/forms/submit-or-cancel";

type Props = { showSlug: string; juried: boolean; entryIds: string[]; onDone: () => void };
type Panel = "none" | "decline" | "paid";

const reasonSchema = declineEntriesSchema.pick({ reason: true });
const referenceSchema = markPaidOfflineSchema.pick({ reference: true });

export function BulkActions({ showSlug, juried, entryIds, onDone }: Props) {
  const [panel, setPanel] = useState<Panel>("none");
  const [status, setStatus] = useState<FormStatus>(null);
  const [accepting, startAccept] = useTransition();
  const count = entryIds.length;
  const finished = (message?: string) => {
    setPanel("none");
    setStatus({ tone: "success", message: message ?? "Done." });
    onDone();
  };

  const accept = () =>
    startAccept(async () => {
      const r = await acceptEntriesAction(null, { showSlug, entryIds });
      if (r.ok) finished(r.message);
      else setStatus({ tone: "error", message: r.message });
    });

  return (
    <section aria-labelledby="bulk-title" className="space-y-3 rounded-card border border-line bg-paper-200 p-4">
      <h2 id="bulk-title" className="text-lg font-semibold">
        {count === 0 ? "Choose entries with the boxes to act on several at once" : `${count} ${count === 1 ? "entry" : "entries"} chosen`}
      </h2>
      {juried ? <p className="text-sm text-ink-muted">This show is juried: decisions are kept until you release them from the jurying page.</p> : null}
      <FormStatusAlert status={status} />
      <div className="flex flex-wrap gap-3">
        <Button disabled={count === 0} pending={accepting} pendingLabel="Accepting…" onClick={accept} icon={<CircleCheck aria-hidden className="size-5" />}>
          Accept
        </Button>
        <Button variant="secondary" disabled={count === 0} aria-expanded={panel === "decline"} onClick={() => setPanel(panel === "decline" ? "none" : "decline")} icon={<Ban aria-hidden className="size-5" />}>
          Decline…
        </Button>
        <Button variant="secondary" disabled={count === 0} aria-expanded={panel === "paid"} onClick={() => setPanel(panel === "paid" ? "none" : "paid")} icon={<Banknote aria-hidden className="size-5" />}>
          Mark paid offline…
        </Button>
      </div>
      {panel === "decline" && count > 0 ? <DeclineForm showSlug={showSlug} entryIds={entryIds} onDone={finished} onCancel={() => setPanel("none")} /> : null}
      {panel === "paid" && count > 0 ? <PaidForm showSlug={showSlug} entryIds={entryIds} onDone={finished} onCancel={() => setPanel("none")} /> : null}
    </section>
  );
}

type FormProps = { showSlug: string; entryIds: string[]; onDone: (message?: string) => void; onCancel: () => void };

function DeclineForm({ showSlug, entryIds, onDone, onCancel }: FormProps) {
  const ctl = useActionForm({
    schema: reasonSchema,
    defaultValues: { reason: "" },
    action: (values) => declineEntriesAction(null, { ...values, showSlug, entryIds }),
    onSuccess: (r) => onDone(r.message),
  });
  return (
    <ActionForm controller={ctl} aria-label="Decline the chosen entries" className="max-w-xl">
      <TextareaField label="Reason for declining" hint="The entrant reads this in the decision e-mail." required error={ctl.errorOf("reason")} {...ctl.form.register("reason")} />
      <SubmitOrCancel variant="danger" pending={ctl.pending} pendingLabel="Declining…" onCancel={onCancel}>
        Decline {entryIds.length} {entryIds.length === 1 ? "entry" : "entries"}
      </SubmitOrCancel>
    </ActionForm>
  );
}

function PaidForm({ showSlug, entryIds, onDone, onCancel }: FormProps) {
  const ctl = useActionForm({
    schema: referenceSchema,
    defaultValues: { reference: "" },
    action: (values) => markPaidOfflineAction(null, { ...values, showSlug, entryIds }),
    onSuccess: (r) => onDone(r.message),
  });
  return (
    <ActionForm controller={ctl} aria-label="Mark the chosen entries paid offline" className="max-w-xl">
      <TextField label="Cash or cheque reference" hint="For example “cash, receipt 17” or “cheque 1042”." autoComplete="off" required error={ctl.errorOf("reference")} {...ctl.form.register("reference")} />
      <SubmitOrCancel pending={ctl.pending} pendingLabel="Saving…" onCancel={onCancel}>
        Mark {entryIds.length} paid
      </SubmitOrCancel>
    </ActionForm>
  );
}
