"use client";
// How many entries: per entrant, per entrant in one category, and in all.
import { Save } from "lucide-react";
import { ActionForm, useActionForm } from "@/components/forms/action-form";
import type { ActionResult } from "@/lib/action";
import { Button } from "@/components/ui/button";
import { TextField } from "@/components/ui/field";
import { limitsSchema, type LimitsFormValues } from "@/lib/schemas/settings";
import { updateSettingsAction } from "@/app/(chair)/shows/[slug]/manage/settings/actions";

export function LimitsForm({ showSlug, values }: { showSlug: string; values: LimitsFormValues }) {
  const ctl = useActionForm({
    schema: limitsSchema,
    defaultValues: values,
    action: (): Promise<ActionResult> => updateSettingsAction(null, { ...ctl.form.getValues(), showSlug }),
  });
  const { register } = ctl.form;
  const count = (name: Exclude<keyof LimitsFormValues, "section" | "minQuiltSideUm">) => ({ inputMode: "numeric" as const, optional: true, error: ctl.errorOf(name), ...register(name) });
  return (
    <ActionForm controller={ctl} aria-labelledby="limits">
      <p className="text-ink-muted">Leave a box blank for no limit.</p>
      <div className="grid gap-4 sm:grid-cols-3">
        <TextField label="Entries per entrant" {...count("maxEntriesPerEntrant")} />
        <TextField label="Per entrant in one category" {...count("maxEntriesPerCategory")} />
        <TextField label="Total capacity" hint="Entries beyond it go to the waiting list." {...count("capacity")} />
      </div>
      <TextField
        label="Smallest quilt side (inches)"
        hint="A quilt with a side shorter than this is refused when entered, e.g. 12. Blank: no minimum."
        inputMode="decimal"
        autoComplete="off"
        optional
        className="sm:max-w-xs"
        error={ctl.errorOf("minQuiltSideUm")}
        {...register("minQuiltSideUm")}
      />
      <Button type="submit" pending={ctl.pending} pendingLabel="Saving…" icon={<Save aria-hidden className="size-5" />}>
        Save limits
      </Button>
    </ActionForm>
  );
}
