"use client";
// The chair sends every entrant with quilts expected at drop-off a reminder: their entry
// numbers, the drop-off times and what to bring.
import { Send } from "lucide-react";
import { z } from "zod";
import { ActionForm, useActionForm } from "@/components/forms/action-form";
import { Button } from "@/components/ui/button";
import { sendDropOffRemindersAction } from "@/app/(chair)/shows/[slug]/manage/actions";

const schema = z.object({});

export function RemindersForm({ showSlug }: { showSlug: string }) {
  const ctl = useActionForm({
    schema,
    defaultValues: {},
    action: () => sendDropOffRemindersAction(null, { showSlug }),
  });
  return (
    <ActionForm controller={ctl} aria-label="Drop-off reminders">
      <p className="text-ink-muted">
        Each entrant with a paid (or, at a juried show, accepted) quilt gets one e-mail listing their entry numbers, the drop-off times and what to bring.
      </p>
      <Button type="submit" variant="secondary" pending={ctl.pending} pendingLabel="Sending reminders…" icon={<Send aria-hidden className="size-5" />}>
        Send drop-off reminders
      </Button>
    </ActionForm>
  );
}
