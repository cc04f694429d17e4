"use client";
// Creating or changing a score sheet: sections of criteria (useFieldArray), with the sheet's
// nominal total and its problems worked out live as the chair types, and a "try it" total.
import { useFieldArray, useWatch, type UseFormReturn } from "react-hook-form";
import { ArrowDown, ArrowUp, Plus, Save, Trash2, X } from "lucide-react";
import { ActionForm, useActionForm } from "@/components/forms/action-form";
import { Button } from "@/components/ui/button";
import { CheckboxField, FieldError, TextField } from "@/components/ui/field";
import { saveScoreSheetAction } from "@/app/(chair)/shows/[slug]/manage/judging/actions";
import { CriterionFields } from "./criterion-fields";
import { errorAt } from "./form-bits";
import { blankCriterion, blankSection, sheetFormSchema, type SheetForm, type SheetOutput } from "./sheet-model";
import { SheetSummary, SheetTotalBar } from "./sheet-summary";

type Props = { showSlug: string; values: SheetForm; onDone: (message?: string) => void };

export function SheetEditor({ showSlug, values, onDone }: Props) {
  const ctl = useActionForm({
    schema: sheetFormSchema,
    defaultValues: values,
    action: (v) => saveScoreSheetAction(null, { ...v, showSlug }),
    onSuccess: (r) => onDone(r.message),
  });
  const { form } = ctl;
  const sections = useFieldArray({ control: form.control, name: "sheet.sections" });
  const heading = values.id ? `Edit “${values.name}”` : "New score sheet";

  return (
    <ActionForm controller={ctl} aria-label={heading} className="rounded-card border-2 border-plum-300 bg-surface p-4 sm:p-6">
      <div className="flex flex-wrap items-start justify-between gap-3">
        <h3 className="text-xl">{heading}</h3>
        <Button variant="ghost" icon={<X aria-hidden className="size-5" />} onClick={() => onDone()}>
          Close without saving
        </Button>
      </div>
      <div className="grid gap-6 xl:grid-cols-[minmax(0,1fr)_20rem]">
        <div className="min-w-0 space-y-5">
          <p className="text-sm text-ink-muted">Weight and step are 1 when left blank; a step of 0.5 allows half points. “N/A allowed” lets a judge mark a criterion not applicable: the total is rescaled over the others, never counted as 0.</p>
          <div className="grid gap-3 sm:grid-cols-[minmax(0,1fr)_auto] sm:items-end">
            <TextField label="Sheet name" placeholder="e.g. Guild sheet" error={ctl.errorOf("name")} {...form.register("name")} />
            <CheckboxField label="Default sheet" hint="Categories without a sheet of their own use it." {...form.register("isDefault")} />
          </div>
          {sections.fields.map((section, s) => (
            <SectionFields
              key={section.id}
              form={form}
              s={s}
              count={sections.fields.length}
              onMove={(to) => sections.move(s, to)}
              onRemove={() => sections.remove(s)}
            />
          ))}
          <FieldError message={errorAt(form.formState.errors, "sheet.sections")} />
          <Button variant="secondary" icon={<Plus aria-hidden className="size-5" />} onClick={() => sections.append(blankSection())} disabled={sections.fields.length >= 12}>
            Add a section
          </Button>
        </div>
        <aside aria-label="Sheet total" className="space-y-4 xl:sticky xl:top-4 xl:self-start">
          <SheetSummary control={form.control} serverError={ctl.errorOf("sheet")} />
          <Button type="submit" pending={ctl.pending} pendingLabel="Saving…" icon={<Save aria-hidden className="size-5" />} className="hidden w-full xl:inline-flex">
            Save sheet
          </Button>
        </aside>
      </div>
      {/* Below desktop width the side panel comes after the sections, so the total and Save stay in view here. */}
      <div className="sticky bottom-0 z-10 -mx-4 flex flex-wrap items-center justify-between gap-3 border-t border-line bg-surface/95 px-4 py-3 sm:-mx-6 sm:px-6 xl:hidden">
        <SheetTotalBar control={form.control} />
        <Button type="submit" pending={ctl.pending} pendingLabel="Saving…" icon={<Save aria-hidden className="size-5" />}>
          Save sheet
        </Button>
      </div>
    </ActionForm>
  );
}

type SectionProps = {
  form: UseFormReturn<SheetForm, unknown, SheetOutput>;
  s: number;
  count: number;
  onMove: (to: number) => void;
  onRemove: () => void;
};

function SectionFields({ form, s, count, onMove, onRemove }: SectionProps) {
  const base = `sheet.sections.${s}` as const;
  const criteria = useFieldArray({ control: form.control, name: `${base}.criteria` });
  const title = useWatch({ control: form.control, name: `${base}.title` });
  const name = title?.trim() || `section ${s + 1}`;
  return (
    <fieldset className="space-y-3 rounded-card border border-line p-3 sm:p-4">
      <legend className="px-1 text-lg font-semibold">{title?.trim() || `Section ${s + 1}`}</legend>
      <div className="flex flex-wrap items-end gap-2">
        <TextField label="Section title" placeholder="e.g. Workmanship" className="min-w-0 flex-1 basis-64" error={errorAt(form.formState.errors, `${base}.title`)} {...form.register(`${base}.title`)} />
        <Button variant="ghost" aria-label={`Move ${name} up`} icon={<ArrowUp aria-hidden className="size-5" />} disabled={s === 0} onClick={() => onMove(s - 1)} />
        <Button variant="ghost" aria-label={`Move ${name} down`} icon={<ArrowDown aria-hidden className="size-5" />} disabled={s === count - 1} onClick={() => onMove(s + 1)} />
        <Button variant="ghost" icon={<Trash2 aria-hidden className="size-5" />} disabled={count === 1} onClick={onRemove}>
          Remove section
        </Button>
      </div>
      {criteria.fields.map((c, i) => (
        <CriterionFields key={c.id} form={form} s={s} c={i} onRemove={criteria.fields.length > 1 ? () => criteria.remove(i) : undefined} />
      ))}
      <FieldError message={errorAt(form.formState.errors, `${base}.criteria`)} />
      <Button variant="ghost" icon={<Plus aria-hidden className="size-5" />} onClick={() => criteria.append(blankCriterion())} disabled={criteria.fields.length >= 30}>
        Add a criterion to {name}
      </Button>
    </fieldset>
  );
}
