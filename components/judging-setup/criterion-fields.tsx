"use client";
// One criterion of a score sheet: its label, most points, weight, scale (points in steps, or a
// word scale whose levels each give a share of the points) and whether N/A is allowed.
import { useFieldArray, useWatch, type UseFormReturn } from "react-hook-form";
import { Plus, Trash2 } from "lucide-react";
import { Button } from "@/components/ui/button";
import { CheckboxField, FieldError, SelectField, TextField } from "@/components/ui/field";
import { errorAt } from "./form-bits";
import { numberOrUndefined, STARTER_LEVELS, type SheetForm, type SheetOutput } from "./sheet-model";

type Props = {
  form: UseFormReturn<SheetForm, unknown, SheetOutput>;
  s: number;
  c: number;
  onRemove?: () => void;
};

export function CriterionFields({ form, s, c, onRemove }: Props) {
  const base = `sheet.sections.${s}.criteria.${c}` as const;
  const { register, control, formState } = form;
  const errors = formState.errors;
  const kind = useWatch({ control, name: `${base}.kind` });
  const label = useWatch({ control, name: `${base}.label` });
  const levels = useFieldArray({ control, name: `${base}.levels` });
  const asNumber = { setValueAs: numberOrUndefined };
  const name = label?.trim() || `criterion ${c + 1}`;

  return (
    <fieldset className="space-y-3 rounded-control border border-line bg-paper-50 p-3">
      <legend className="sr-only">{`Criterion ${c + 1} of section ${s + 1}`}</legend>
      <div className="grid grid-cols-2 items-start gap-3 md:grid-cols-4 lg:grid-cols-[minmax(9rem,2fr)_minmax(5rem,1fr)_minmax(5rem,1fr)_minmax(7.5rem,1.3fr)_minmax(5rem,1fr)]">
        <TextField label="Criterion" placeholder="e.g. Visual impact" className="col-span-2 md:col-span-4 lg:col-span-1" error={errorAt(errors, `${base}.label`)} {...register(`${base}.label`)} />
        <TextField label="Most points" inputMode="decimal" error={errorAt(errors, `${base}.maxPoints`)} {...register(`${base}.maxPoints`, asNumber)} />
        <TextField label="Weight" placeholder="1" inputMode="decimal" error={errorAt(errors, `${base}.weight`)} {...register(`${base}.weight`, asNumber)} />
        <SelectField
          label="Scale"
          error={errorAt(errors, `${base}.kind`)}
          {...register(`${base}.kind`, {
            onChange: (e: { target: { value: string } }) => {
              if (e.target.value === "words" && levels.fields.length === 0) levels.replace(STARTER_LEVELS);
            },
          })}
        >
          <option value="points">Points</option>
          <option value="words">Words</option>
        </SelectField>
        {kind === "words" ? null : <TextField label="Step" placeholder="1" inputMode="decimal" error={errorAt(errors, `${base}.step`)} {...register(`${base}.step`, asNumber)} />}
      </div>
      {kind === "words" ? (
        <div className="space-y-2">
          <p className="text-sm text-ink-muted">Each level gives a share of the most points (100 % is full marks).</p>
          <ul className="grid gap-2 md:grid-cols-2">
            {levels.fields.map((l, i) => (
              <li key={l.id} className="grid grid-cols-[minmax(0,1fr)_6rem_auto] items-end gap-2">
                <TextField label={`Level ${i + 1}`} error={errorAt(errors, `${base}.levels.${i}.label`)} {...register(`${base}.levels.${i}.label`)} />
                <TextField label="Share (%)" inputMode="decimal" error={errorAt(errors, `${base}.levels.${i}.percent`)} {...register(`${base}.levels.${i}.percent`, asNumber)} />
                <Button variant="ghost" aria-label={`Remove level ${i + 1} of ${name}`} icon={<Trash2 aria-hidden className="size-5" />} onClick={() => levels.remove(i)} />
              </li>
            ))}
          </ul>
          <FieldError message={errorAt(errors, `${base}.levels`)} />
          <Button variant="ghost" icon={<Plus aria-hidden className="size-5" />} onClick={() => levels.append({ label: "", percent: undefined })} disabled={levels.fields.length >= 10}>
            Add a level
          </Button>
        </div>
      ) : null}
      <div className="flex flex-wrap items-center justify-between gap-2">
        <CheckboxField label="N/A allowed" {...register(`${base}.allowNotApplicable`)} />
        {onRemove ? (
          <Button variant="ghost" icon={<Trash2 aria-hidden className="size-5" />} onClick={onRemove}>
            Remove {name}
          </Button>
        ) : null}
      </div>
    </fieldset>
  );
}
