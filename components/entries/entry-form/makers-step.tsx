"use client";
// Step 2: who made the quilt, who quilted it and how, and where the design came from.
import { useFieldArray } from "react-hook-form";
import { Plus, Trash2 } from "lucide-react";
import { ActionForm } from "@/components/forms/action-form";
import { Button } from "@/components/ui/button";
import { FieldError, TextField } from "@/components/ui/field";
import { QUILTING_METHOD_LABELS } from "@/components/entries/labels";
import { saveMakersAction } from "@/app/(entrant)/entries/[id]/actions";
import type { DefaultValues } from "react-hook-form";
import { makersStepSchema, QUILTING_METHODS, type MakersStepInput } from "@/lib/schemas/entry";
import { StepButtons } from "./step-buttons";
import { useStepForm } from "./use-step-form";
import { Choice } from "./choice";

const QUILTED_BY_LABELS = { self: "I quilted it myself", other: "Another person quilted it", hire: "A quilter I hired (for hire)" } as const;

export function MakersStep({ entryId, defaults, backHref, nextHref }: { entryId: string; defaults: DefaultValues<MakersStepInput>; backHref: string; nextHref: string }) {
  const { ctl, setIntent } = useStepForm({
    schema: makersStepSchema,
    defaultValues: defaults,
    action: (values) => saveMakersAction(null, { ...values, entryId }),
    nextHref,
  });
  const { register, control, watch } = ctl.form;
  const rows = useFieldArray({ control, name: "madeBy" });
  const kind = watch("quiltedByKind");
  const source = watch("patternSource");
  const madeByError = ctl.errorOf("madeBy") ?? (ctl.form.formState.errors.madeBy?.root?.message as string | undefined);

  return (
    <ActionForm controller={ctl} aria-label="The makers">
      <fieldset className="space-y-3">
        <legend className="mb-1 font-display text-xl font-semibold">Made by</legend>
        <p className="text-sm text-ink-muted">Everyone who pieced or appliquéd the top. Judges never see these names.</p>
        {rows.fields.map((f, i) => (
          <div key={f.id} className="flex items-end gap-2">
            <TextField className="flex-1" label={`Maker ${i + 1}`} autoComplete={i === 0 ? "name" : "off"} error={ctl.form.formState.errors.madeBy?.[i]?.name?.message} {...register(`madeBy.${i}.name`)} />
            {rows.fields.length > 1 ? (
              <Button variant="ghost" aria-label={`Remove maker ${i + 1}`} onClick={() => rows.remove(i)} icon={<Trash2 aria-hidden className="size-5" />}>
                <span className="sr-only sm:not-sr-only">Remove</span>
              </Button>
            ) : null}
          </div>
        ))}
        <FieldError message={madeByError} />
        <Button variant="secondary" onClick={() => rows.append({ name: "" })} icon={<Plus aria-hidden className="size-5" />}>
          Add another maker
        </Button>
      </fieldset>

      <Choice legend="Quilted by" error={ctl.errorOf("quiltedByKind")} options={Object.entries(QUILTED_BY_LABELS)} register={register("quiltedByKind")} />
      {kind !== "self" ? <TextField label="Quilter's name" autoComplete="off" error={ctl.errorOf("quiltedByName")} {...register("quiltedByName")} /> : null}

      <Choice legend="How it was quilted" error={ctl.errorOf("quiltingMethod")} options={QUILTING_METHODS.map((m) => [m, QUILTING_METHOD_LABELS[m] ?? m])} register={register("quiltingMethod")} />

      <Choice
        legend="Pattern or design"
        error={ctl.errorOf("patternSource")}
        options={[["original", "My own original design"], ["pattern", "From a pattern or another designer's design"]]}
        register={register("patternSource")}
      />
      {source === "pattern" ? (
        <div className="grid gap-4 sm:grid-cols-2">
          <TextField label="Pattern or design name" autoComplete="off" error={ctl.errorOf("patternName")} {...register("patternName")} />
          <TextField label="Designer" autoComplete="off" hint="Shows ask for credit to the designer." error={ctl.errorOf("patternDesigner")} {...register("patternDesigner")} />
        </div>
      ) : null}
      <StepButtons backHref={backHref} pending={ctl.pending} onIntent={setIntent} />
    </ActionForm>
  );
}
