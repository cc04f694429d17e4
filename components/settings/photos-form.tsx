"use client";
// What the entry form asks for: photo views, their size, the statement length and techniques.
import { Save } from "lucide-react";
import { ActionForm, useActionForm } from "@/components/forms/action-form";
import type { ActionResult } from "@/lib/action";
import { Button } from "@/components/ui/button";
import { CheckboxField, TextareaField, TextField } from "@/components/ui/field";
import { photosSchema, type PhotosFormValues } from "@/lib/schemas/settings";
import { updateSettingsAction } from "@/app/(chair)/shows/[slug]/manage/settings/actions";

export function PhotosForm({ showSlug, values }: { showSlug: string; values: PhotosFormValues }) {
  const ctl = useActionForm({
    schema: photosSchema,
    defaultValues: values,
    action: (): Promise<ActionResult> => updateSettingsAction(null, { ...ctl.form.getValues(), showSlug }),
  });
  const { register } = ctl.form;
  return (
    <ActionForm controller={ctl} aria-labelledby="photos">
      <fieldset>
        <legend className="mb-1 font-display text-lg font-semibold">Photos each entry needs</legend>
        <CheckboxField label="Full view" hint="The whole quilt, all four edges showing." error={ctl.errorOf("requireFullView")} {...register("requireFullView")} />
        <CheckboxField label="Detail view" hint="A close-up that shows the quilting." error={ctl.errorOf("requireDetailView")} {...register("requireDetailView")} />
      </fieldset>
      <div className="grid gap-4 sm:grid-cols-3">
        <TextField label="Smallest width (pixels)" inputMode="numeric" required error={ctl.errorOf("photoMinWidthPx")} {...register("photoMinWidthPx")} />
        <TextField label="Smallest height (pixels)" inputMode="numeric" required error={ctl.errorOf("photoMinHeightPx")} {...register("photoMinHeightPx")} />
        <TextField label="Largest file (MB)" hint="e.g. 5" inputMode="decimal" required error={ctl.errorOf("photoMaxBytes")} {...register("photoMaxBytes")} />
      </div>
      <TextField
        label="Statement word limit"
        hint="Most words in the maker’s statement; 0 asks for no statement."
        inputMode="numeric"
        required
        className="sm:max-w-xs"
        error={ctl.errorOf("statementWordLimit")}
        {...register("statementWordLimit")}
      />
      <TextareaField
        label="Techniques"
        hint="The choices the entry form offers, one per line. Repeats are dropped."
        rows={8}
        required
        error={ctl.errorOf("techniques")}
        {...register("techniques")}
      />
      <Button type="submit" pending={ctl.pending} pendingLabel="Saving…" icon={<Save aria-hidden className="size-5" />}>
        Save photos and statement
      </Button>
    </ActionForm>
  );
}
