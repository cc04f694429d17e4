"use client";
// Accepting the show's rules and release, and sending the entry.
import { useState } from "react";
import { useRouter } from "next/navigation";
import { Send } from "lucide-react";
import { ActionForm, useActionForm } from "@/components/forms/action-form";
import { Alert } from "@/components/ui/alert";
import { Button } from "@/components/ui/button";
import { CheckboxField } from "@/components/ui/field";
import { submitEntryAction } from "@/app/(entrant)/entries/[id]/actions";
import { submitSchema } from "@/lib/schemas/entry";

export function SubmitForm({ entryId, rulesVersionId, ready }: { entryId: string; rulesVersionId: string; ready: boolean }) {
  const router = useRouter();
  const [sent, setSent] = useState<{ entryNumber: number; waitlisted: boolean } | null>(null);
  const ctl = useActionForm({
    schema: submitSchema,
    defaultValues: { acceptRules: false as unknown as true, rulesVersionId },
    action: (values) => submitEntryAction(null, { ...values, entryId }),
    onSuccess: (r) => {
      setSent((r.data as { entryNumber: number; waitlisted: boolean }) ?? null);
      router.refresh();
    },
  });
  if (sent?.waitlisted) {
    return (
      <Alert live tone="warning" title={`Entry ${sent.entryNumber} is on the waiting list`}>
        The show already has as many quilts as it can hang. Your entry is saved and numbered; it gets a place only if another entry is withdrawn, and the show will write to you.
      </Alert>
    );
  }
  return (
    <ActionForm controller={ctl} aria-label="Send the entry">
      <input type="hidden" {...ctl.form.register("rulesVersionId")} />
      <CheckboxField label="I have read and accept the show's rules and release" error={ctl.errorOf("acceptRules")} {...ctl.form.register("acceptRules")} />
      <Button type="submit" size="lg" pending={ctl.pending} pendingLabel="Sending…" disabled={!ready} icon={<Send aria-hidden className="size-5" />}>
        Send my entry
      </Button>
      {!ready ? <p className="text-sm text-ink-muted">Finish the missing items above first.</p> : null}
    </ActionForm>
  );
}
