"use client";
// Step 1: the quilt's title, size and techniques, with the category they put it in, live.
import { ActionForm } from "@/components/forms/action-form";
import { CheckboxField, FieldError, TextField } from "@/components/ui/field";
import { SizeField } from "@/components/entries/size-field";
import { CategoryPreview, type CategoryContext } from "@/components/entries/category-preview";
import { saveQuiltAction } from "@/app/(entrant)/entries/[id]/actions";
import { quiltStepSchema, type QuiltStepInput } from "@/lib/schemas/entry";
import { SizeWarnings } from "@/components/entries/size-warnings";
import { StepButtons } from "./step-buttons";
import { useStepForm } from "./use-step-form";

type Props = { entryId: string; defaults: QuiltStepInput; techniques: string[]; nextHref: string; category: CategoryContext; minSideUm: number | null };

export function QuiltStep({ entryId, defaults, techniques, nextHref, category, minSideUm }: Props) {
  const { ctl, setIntent } = useStepForm({
    schema: quiltStepSchema,
    defaultValues: defaults,
    action: (values) => saveQuiltAction(null, { ...values, entryId }),
    nextHref,
  });
  const { register, watch } = ctl.form;
  const techError = ctl.errorOf("techniques");
  return (
    <ActionForm controller={ctl} aria-label="The quilt">
      <TextField label="Title" autoComplete="off" maxLength={120} hint="As it should appear on the label." error={ctl.errorOf("title")} {...register("title")} />
      <SizeField form={ctl.form} errorOf={ctl.errorOf} />
      <SizeWarnings widthText={watch("width") ?? ""} lengthText={watch("length") ?? ""} unit={watch("sizeUnit") === "cm" ? "cm" : "in"} minSideUm={minSideUm} categories={category.categories} />
      <CategoryPreview
        context={category}
        widthText={watch("width") ?? ""}
        lengthText={watch("length") ?? ""}
        unit={watch("sizeUnit") === "cm" ? "cm" : "in"}
        techniques={tickedOf(watch("techniques"), techniques)}
      />
      <fieldset aria-describedby={techError ? "techniques-error" : undefined}>
        <legend className="mb-2 font-display text-xl font-semibold">Techniques</legend>
        <p className="mb-2 text-sm text-ink-muted">Tick every one that applies.</p>
        <div className="grid gap-x-4 sm:grid-cols-2">
          {techniques.map((t) => (
            <CheckboxField key={t} label={t[0]!.toUpperCase() + t.slice(1)} value={t} {...register("techniques")} />
          ))}
        </div>
        <FieldError id="techniques-error" message={techError} />
      </fieldset>
      <StepButtons pending={ctl.pending} onIntent={setIntent} />
    </ActionForm>
  );
}

/** react-hook-form gives a checkbox group an array, but a lone checkbox true/false. */
function tickedOf(value: unknown, all: string[]): string[] {
  if (Array.isArray(value)) return value.filter((v): v is string => typeof v === "string");
  if (typeof value === "string") return [value];
  return value === true && all.length === 1 ? [all[0]!] : [];
}
