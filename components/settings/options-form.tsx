"use client";
// Juried or not, whether entrants' names are published, and the reply-to address of the show's mail.
import { Save } from "lucide-react";
import { ActionForm, useActionForm } from "@/components/forms/action-form";
import type { ActionResult } from "@/lib/action";
import { Button } from "@/components/ui/button";
import { CheckboxField, TextField } from "@/components/ui/field";
import { optionsSchema, type OptionsFormValues } from "@/lib/schemas/settings";
import { updateSettingsAction } from "@/app/(chair)/shows/[slug]/manage/settings/actions";

export function OptionsForm({ showSlug, values }: { showSlug: string; values: OptionsFormValues }) {
  const ctl = useActionForm({
    schema: optionsSchema,
    defaultValues: values,
    action: (): Promise<ActionResult> => updateSettingsAction(null, { ...ctl.form.getValues(), showSlug }),
  });
  const { register } = ctl.form;
  return (
    <ActionForm controller={ctl} aria-labelledby="options">
      <CheckboxField
        label="Juried show"
        hint="The committee accepts or declines each entry from its photos before drop-off."
        error={ctl.errorOf("juried")}
        {...register("juried")}
      />
      <CheckboxField
        label="Publish entrants’ names"
        hint="Beside quilts and in results, for entrants who agree in their own account. Untick to show entry numbers only."
        error={ctl.errorOf("publishNames")}
        {...register("publishNames")}
      />
      <TextField
        label="Reply-to address for the show’s e-mails"
        hint="Where entrants’ replies go. Blank: replies go to Ribbonry’s sending address."
        type="email"
        inputMode="email"
        autoComplete="off"
        optional
        className="sm:max-w-md"
        error={ctl.errorOf("replyToEmail")}
        {...register("replyToEmail")}
      />
      <Button type="submit" pending={ctl.pending} pendingLabel="Saving…" icon={<Save aria-hidden className="size-5" />}>
        Save
      </Button>
    </ActionForm>
  );
}
