"use client";
// Entry, member, late and critique fees, the cap per entrant and the refund on withdrawal.
import { Save } from "lucide-react";
import { ActionForm, useActionForm } from "@/components/forms/action-form";
import type { ActionResult } from "@/lib/action";
import { Button } from "@/components/ui/button";
import { TextareaField, TextField } from "@/components/ui/field";
import { feesSchema, type FeesFormValues } from "@/lib/schemas/settings";
import { updateSettingsAction } from "@/app/(chair)/shows/[slug]/manage/settings/actions";

type Text = Exclude<keyof FeesFormValues, "section" | "memberEmails">;

export function FeesForm({ showSlug, values }: { showSlug: string; values: FeesFormValues }) {
  const ctl = useActionForm({
    schema: feesSchema,
    defaultValues: values,
    action: (): Promise<ActionResult> => updateSettingsAction(null, { ...ctl.form.getValues(), showSlug }),
  });
  const { register } = ctl.form;
  const money = (name: Text) => ({ inputMode: "decimal" as const, autoComplete: "off", error: ctl.errorOf(name), ...register(name) });
  return (
    <ActionForm controller={ctl} aria-labelledby="fees">
      <p className="text-ink-muted">In dollars and cents, e.g. 25 or 25.00. Enter 0 for no fee.</p>
      <div className="grid gap-4 sm:grid-cols-2">
        <TextField label="Entry fee" hint="Per quilt." required {...money("entryFeeCents")} />
        <TextField label="Member entry fee" hint="Per quilt, for guild members." required {...money("memberEntryFeeCents")} />
        <TextField label="Late fee" hint="Added per quilt from the late-fee date (Dates)." required {...money("lateFeeCents")} />
        <TextField label="Critique fee" hint="Per quilt, for a judge’s written critique." required {...money("critiqueFeeCents")} />
        <TextField label="Fee cap per entrant" hint="Most one entrant pays in entry fees; late and critique fees come on top. Blank: no cap." optional {...money("feeCapCents")} />
        <TextField
          label="Refund on withdrawal (%)"
          hint="Share of the entry fee returned when an entrant withdraws before entries close."
          inputMode="numeric"
          required
          error={ctl.errorOf("withdrawalRefundPercent")}
          {...register("withdrawalRefundPercent")}
        />
      </div>
      <TextareaField
        label="Members’ e-mail addresses"
        hint="One per line. When the list has any, only these entrants pay the member fee (by their account e-mail). Leave it empty to go by the guild entrants name in their profile."
        rows={5}
        optional
        error={ctl.errorOf("memberEmails")}
        {...register("memberEmails")}
      />
      <Button type="submit" pending={ctl.pending} pendingLabel="Saving…" icon={<Save aria-hidden className="size-5" />}>
        Save fees
      </Button>
    </ActionForm>
  );
}
