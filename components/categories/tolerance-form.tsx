"use client";
// How far a quilt measured at intake may be off its registered size before it is flagged and
// its category decided on the measured size.
import { Save } from "lucide-react";
import { updateToleranceAction } from "@/app/(chair)/shows/[slug]/manage/categories/actions";
import { ActionForm, useActionForm } from "@/components/forms/action-form";
import { Button } from "@/components/ui/button";
import { SelectField, TextField } from "@/components/ui/field";
import type { ActionResult } from "@/lib/action";
import { toleranceSchema } from "@/lib/schemas/categories";

const trim = (n: number) => String(Number(n.toFixed(4)));

export function ToleranceForm({ showSlug, toleranceUm }: { showSlug: string; toleranceUm: number }) {
  const inInches = toleranceUm % 25_400 === 0 || toleranceUm % 3_175 === 0 || toleranceUm % 10_000 !== 0;
  const ctl = useActionForm({
    schema: toleranceSchema,
    defaultValues: { tolerance: trim(inInches ? toleranceUm / 25_400 : toleranceUm / 10_000), unit: inInches ? "in" : "cm" },
    action: (): Promise<ActionResult> => updateToleranceAction(null, { ...ctl.form.getValues(), showSlug }),
  });
  const { register } = ctl.form;
  return (
    <ActionForm controller={ctl} aria-labelledby="tolerance-title">
      <p className="text-ink-muted">
        A quilt measured at intake more than this far off its registered size, either way, is flagged here and placed by its measured size. Many shows allow 1 in.
      </p>
      <div className="grid grid-cols-[minmax(0,1fr)_minmax(0,8rem)] gap-3 sm:max-w-sm">
        <TextField label="Tolerance" inputMode="decimal" autoComplete="off" error={ctl.errorOf("tolerance")} {...register("tolerance")} />
        <SelectField label="Unit" error={ctl.errorOf("unit")} {...register("unit")}>
          <option value="in">in</option>
          <option value="cm">cm</option>
        </SelectField>
      </div>
      <Button type="submit" pending={ctl.pending} pendingLabel="Saving…" icon={<Save aria-hidden className="size-5" />}>
        Save tolerance
      </Button>
    </ActionForm>
  );
}
