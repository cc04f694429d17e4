"use client";
// The show's dates and deadlines, typed as local times in the show's own zone.
import { Save } from "lucide-react";
import { ActionForm, useActionForm } from "@/components/forms/action-form";
import type { ActionResult } from "@/lib/action";
import { Button } from "@/components/ui/button";
import { TextField } from "@/components/ui/field";
import { datesSchema, DATE_FIELDS, type DateField, type DatesFormValues } from "@/lib/schemas/settings";
import { updateDatesAction } from "@/app/(chair)/shows/[slug]/manage/settings/actions";

const GROUPS: { title: string; fields: DateField[]; hint?: string }[] = [
  { title: "Entries", fields: ["entryOpensAt", "entryClosesAt", "lateFeeFromAt"], hint: "The late fee applies to entries sent in from its date until entries close." },
  { title: "Drop-off", fields: ["dropOffStartsAt", "dropOffEndsAt"] },
  { title: "Judging", fields: ["judgingStartsAt", "judgingEndsAt"] },
  { title: "Show days", fields: ["showOpensAt", "showClosesAt"] },
  { title: "Pick-up", fields: ["pickUpStartsAt", "pickUpEndsAt"] },
];

export function DatesForm({ showSlug, timeZone, values }: { showSlug: string; timeZone: string; values: Record<DateField, string> }) {
  const ctl = useActionForm({
    schema: datesSchema,
    defaultValues: values as DatesFormValues,
    // The server parses what was typed with the same schema.
    action: (): Promise<ActionResult> => updateDatesAction(null, { ...ctl.form.getValues(), showSlug }),
  });
  const { register } = ctl.form;
  return (
    <ActionForm controller={ctl} aria-labelledby="dates">
      <p className="text-ink-muted">
        Times are in the show’s zone, {timeZone.replace(/_/g, " ")}, whatever this device is set to. Leave a date blank until it’s
        decided. On the night clocks go forward a skipped time counts as the hour after; on the night they go back a
        repeated time counts as its first occurrence.
      </p>
      {GROUPS.map((g) => (
        <fieldset key={g.title} className="space-y-3">
          <legend className="mb-2 font-display text-lg font-semibold">{g.title}</legend>
          {g.hint ? <p className="text-sm text-ink-muted">{g.hint}</p> : null}
          <div className="grid gap-4 sm:grid-cols-2 lg:grid-cols-3">
            {g.fields.map((f) => (
              <TextField key={f} label={DATE_FIELDS[f]} type="datetime-local" optional error={ctl.errorOf(f)} {...register(f)} />
            ))}
          </div>
        </fieldset>
      ))}
      <Button type="submit" pending={ctl.pending} pendingLabel="Saving…" icon={<Save aria-hidden className="size-5" />}>
        Save dates
      </Button>
    </ActionForm>
  );
}
