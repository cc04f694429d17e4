"use client";
// One condition of a category, in plain words: the kind first, then the fields that kind needs.
// Lives inside the category form's FormProvider; size limits are a nested field array.
import { Controller, get, useFormContext, useWatch } from "react-hook-form";
import { Plus, Trash2 } from "lucide-react";
import { Button } from "@/components/ui/button";
import { FieldError, SelectField, TextField } from "@/components/ui/field";
import { foldTechnique, type Measure } from "@/scoring/categories";
import {
  DIVISION_WORDS,
  KIND_WORDS,
  lengthUnits,
  MAKERS_WORDS,
  MEASURE_WORDS,
  METHOD_WORDS,
  MODE_WORDS,
  OP_WORDS,
  type CategoryForm,
  type ConditionKind,
} from "./form-model";

type Props = { index: number; techniques: readonly string[]; onKind: (kind: ConditionKind) => void; onRemove: () => void };

export function ConditionFields({ index, techniques, onKind, onRemove }: Props) {
  const { control, register, formState } = useFormContext<CategoryForm>();
  const at = `conditions.${index}` as const;
  const kind = useWatch({ control, name: `${at}.kind` });
  const err = (path: string) => (get(formState.errors, `${at}.${path}`) as { message?: string } | undefined)?.message;
  return (
    <fieldset className="space-y-4 rounded-control border border-line bg-paper-50 p-3 sm:p-4">
      <legend className="sr-only">Condition {index + 1}</legend>
      <div className="flex flex-wrap items-end gap-3">
        <SelectField label={`Condition ${index + 1}`} className="min-w-[12rem] flex-1 sm:max-w-xs" value={kind} onChange={(e) => onKind(e.target.value as ConditionKind)}>
          {Object.entries(KIND_WORDS).map(([k, w]) => (
            <option key={k} value={k}>
              {w}
            </option>
          ))}
        </SelectField>
        <Button variant="ghost" onClick={onRemove} icon={<Trash2 aria-hidden className="size-5" />} aria-label={`Remove condition ${index + 1}`}>
          Remove
        </Button>
      </div>
      {kind === "size" ? <SizeFields index={index} /> : null}
      {kind === "techniques" ? (
        <div className="space-y-3">
          <SelectField label="The quilt" className="sm:max-w-xs" {...register(`${at}.mode`)}>
            {Object.entries(MODE_WORDS).map(([k, w]) => (
              <option key={k} value={k}>
                {w}
              </option>
            ))}
          </SelectField>
          <CheckboxGroup name={`${at}.techniques`} legend="Techniques" options={techniques.map((t): [string, string] => [t, t])} error={err("techniques")} />
        </div>
      ) : null}
      {kind === "quiltingMethod" ? <CheckboxGroup name={`${at}.methods`} legend="Quilted by" options={Object.entries(METHOD_WORDS)} error={err("methods")} /> : null}
      {kind === "makers" ? (
        <SelectField label="Made by" className="sm:max-w-xs" {...register(`${at}.count`)}>
          {Object.entries(MAKERS_WORDS).map(([k, w]) => (
            <option key={k} value={k}>
              {w}
            </option>
          ))}
        </SelectField>
      ) : null}
      {kind === "quiltedForHire" ? <YesNo name={`${at}.yesNo`} legend="Quilted for hire (by someone paid to quilt it)" yes="Yes, quilted for hire" no="No, quilted by the makers" /> : null}
      {kind === "judged" ? <YesNo name={`${at}.yesNo`} legend="Entered for" yes="Judging" no="Display only (not judged)" /> : null}
      {kind === "division" ? <DivisionFields index={index} err={err} /> : null}
    </fieldset>
  );
}

// The limits are set as a whole array rather than a nested useFieldArray: inside the conditions'
// field array, a nested one sometimes put back the values it held when the row was added.
function SizeFields({ index }: { index: number }) {
  const { control, register, formState, setValue, getValues } = useFormContext<CategoryForm>();
  const at = `conditions.${index}` as const;
  const bounds = useWatch({ control, name: `${at}.bounds` }) ?? [];
  const measure = useWatch({ control, name: `${at}.measure` });
  const units = lengthUnits(measure);
  const err = (path: string) => (get(formState.errors, `${at}.${path}`) as { message?: string } | undefined)?.message;
  const setBounds = (next: CategoryForm["conditions"][number]["bounds"]) => setValue(`${at}.bounds`, next, { shouldDirty: true });
  const changeMeasure = (m: Measure) => {
    // Area and lengths take different units: switch the limits' units with the measure.
    const next = lengthUnits(m);
    setBounds(getValues(`${at}.bounds`).map((b) => (next.includes(b.unit) ? b : { ...b, unit: next[0]! })));
  };
  return (
    <div className="space-y-3">
      <SelectField label="Measured on" className="sm:max-w-xs" {...register(`${at}.measure`, { onChange: (e) => changeMeasure(e.target.value as Measure) })}>
        {Object.entries(MEASURE_WORDS).map(([k, w]) => (
          <option key={k} value={k}>
            {w}
          </option>
        ))}
      </SelectField>
      {bounds.map((_, j) => (
        <div key={j} className="grid grid-cols-[minmax(0,1fr)_minmax(0,1fr)] items-start gap-3 sm:grid-cols-[12rem_10rem_8rem_auto]">
          <SelectField label={j === 0 ? "Limit" : "And"} className="col-span-2 sm:col-span-1" {...register(`${at}.bounds.${j}.op`)}>
            {Object.entries(OP_WORDS).map(([k, w]) => (
              <option key={k} value={k}>
                {w}
              </option>
            ))}
          </SelectField>
          <TextField label="Value" inputMode="decimal" autoComplete="off" error={err(`bounds.${j}.value`)} {...register(`${at}.bounds.${j}.value`)} />
          <SelectField label="Unit" error={err(`bounds.${j}.unit`)} {...register(`${at}.bounds.${j}.unit`)}>
            {units.map((u) => (
              <option key={u} value={u}>
                {u}
              </option>
            ))}
          </SelectField>
          <div className="flex items-end self-end">
            <Button variant="ghost" disabled={bounds.length < 2} onClick={() => setBounds(getValues(`${at}.bounds`).filter((__, k) => k !== j))} aria-label={`Remove limit ${j + 1}`} icon={<Trash2 aria-hidden className="size-5" />}>
              <span className="sm:sr-only">Remove limit</span>
            </Button>
          </div>
        </div>
      ))}
      <FieldError message={err("bounds")} />
      {bounds.length < 4 ? (
        <Button variant="secondary" onClick={() => setBounds([...getValues(`${at}.bounds`), { op: ">=", value: "", unit: units[0]! }])} icon={<Plus aria-hidden className="size-5" />}>
          Add a limit
        </Button>
      ) : null}
    </div>
  );
}

function DivisionFields({ index, err }: { index: number; err: (p: string) => string | undefined }) {
  const { control, register } = useFormContext<CategoryForm>();
  const at = `conditions.${index}` as const;
  const divisions = useWatch({ control, name: `${at}.divisions` });
  return (
    <div className="space-y-3">
      <CheckboxGroup name={`${at}.divisions`} legend="Division" options={Object.entries(DIVISION_WORDS)} error={err("divisions")} />
      {divisions?.includes("youth") ? (
        <div className="grid grid-cols-2 gap-3 sm:max-w-md">
          <TextField label="Youngest age" optional inputMode="numeric" hint="Inclusive" error={err("youthMinAge")} {...register(`${at}.youthMinAge`)} />
          <TextField label="Oldest age" optional inputMode="numeric" hint="e.g. 18 for “18 and under”" error={err("youthMaxAge")} {...register(`${at}.youthMaxAge`)} />
        </div>
      ) : null}
    </div>
  );
}

type ArrayPath = `conditions.${number}.techniques` | `conditions.${number}.methods` | `conditions.${number}.divisions`;

function CheckboxGroup({ name, legend, options, error }: { name: ArrayPath; legend: string; options: [string, string][]; error?: string }) {
  const { control } = useFormContext<CategoryForm>();
  return (
    <Controller
      control={control}
      name={name}
      render={({ field }) => {
        const value = (field.value ?? []) as string[];
        const extra = value.filter((v) => !options.some(([k]) => foldTechnique(k) === foldTechnique(v))).map((v): [string, string] => [v, v]);
        const toggle = (k: string, on: boolean) => field.onChange(on ? [...value, k] : value.filter((v) => foldTechnique(v) !== foldTechnique(k)));
        return (
          <fieldset className="space-y-1">
            <legend className="font-medium text-ink">{legend}</legend>
            <div className="flex flex-wrap gap-x-5">
              {[...options, ...extra].map(([k, w]) => (
                <label key={k} className="flex min-h-tap cursor-pointer items-center gap-2">
                  <input type="checkbox" className="size-5 accent-plum-600" checked={value.some((v) => foldTechnique(v) === foldTechnique(k))} onChange={(e) => toggle(k, e.target.checked)} onBlur={field.onBlur} />
                  <span>{w}</span>
                </label>
              ))}
            </div>
            <FieldError message={error} />
          </fieldset>
        );
      }}
    />
  );
}

function YesNo({ name, legend, yes, no }: { name: `conditions.${number}.yesNo`; legend: string; yes: string; no: string }) {
  const { register } = useFormContext<CategoryForm>();
  return (
    <fieldset className="space-y-1">
      <legend className="font-medium text-ink">{legend}</legend>
      <div className="flex flex-wrap gap-x-5">
        {(["yes", "no"] as const).map((v) => (
          <label key={v} className="flex min-h-tap cursor-pointer items-center gap-2">
            <input type="radio" value={v} className="size-5 accent-plum-600" {...register(name)} />
            <span>{v === "yes" ? yes : no}</span>
          </label>
        ))}
      </div>
    </fieldset>
  );
}
