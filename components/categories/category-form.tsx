"use client";
// One category's form: code, name, description, precedence, cap and its conditions. Every change
// is passed up (lightly debounced) so the editor can preview it; "Done" keeps it in the draft set.
import { useEffect, useMemo, useState, type ReactNode } from "react";
import { FormProvider, get, useFieldArray, useForm, useWatch } from "react-hook-form";
import { zodResolver } from "@hookform/resolvers/zod";
import { Check, Plus, X } from "lucide-react";
import { Button } from "@/components/ui/button";
import { TextareaField, TextField } from "@/components/ui/field";
import type { ShowCategory } from "@/scoring/category-sets";
import { ConditionFields } from "./condition-fields";
import { blankCondition, categoryFormSchema, categoryFromForm, type CategoryForm as Values } from "./form-model";

type Props = {
  initial: Values;
  isNew: boolean;
  otherCodes: readonly string[];
  techniques: readonly string[];
  /** Messages from the server for this category, by path inside it ("code", "conditions.0.bounds.0.value"). */
  serverErrors?: Record<string, string>;
  preview: ReactNode;
  onLive: (rule: ShowCategory) => void;
  onDone: (rule: ShowCategory) => void;
  onCancel: () => void;
};

export function CategoryForm({ initial, isNew, otherCodes, techniques, serverErrors, preview, onLive, onDone, onCancel }: Props) {
  const schema = useMemo(() => categoryFormSchema(otherCodes), [otherCodes]);
  // Checked on "Done", then again on every change. Not on blur: a blur re-validating the whole rule
  // re-renders the form between mousedown and mouseup on "Done", and the click was lost.
  const form = useForm<Values, unknown, ShowCategory>({ resolver: zodResolver(schema), defaultValues: initial, mode: "onSubmit", reValidateMode: "onChange" });
  const { control, register, formState, setError } = form;
  const conditions = useFieldArray({ control, name: "conditions" });
  const [invalid, setInvalid] = useState(false);
  const values = useWatch({ control });

  useEffect(() => {
    for (const [path, message] of Object.entries(serverErrors ?? {})) setError(path as never, { type: "server", message });
  }, [serverErrors, setError]);

  // Preview on every change, a moment after typing stops.
  useEffect(() => {
    const t = setTimeout(() => onLive(categoryFromForm(form.getValues(), true)), 120);
    return () => clearTimeout(t);
  }, [values, onLive, form]);

  const err = (path: string) => (get(formState.errors, path) as { message?: string } | undefined)?.message;
  const title = isNew ? "New category" : `Editing ${initial.code} ${initial.name}`;

  return (
    <FormProvider {...form}>
      <form noValidate onSubmit={form.handleSubmit(onDone, () => setInvalid(true))} aria-labelledby="category-form-title" className="space-y-5">
        <h3 id="category-form-title" className="text-xl">
          {title}
        </h3>
        <div className="grid gap-4 sm:grid-cols-[8rem_minmax(0,1fr)]">
          <TextField label="Code" hint="e.g. 10 or A1" autoComplete="off" error={err("code")} {...register("code")} />
          <TextField label="Name" hint="e.g. Pieced, Large" autoComplete="off" error={err("name")} {...register("name")} />
        </div>
        <TextareaField label="Description" optional rows={2} hint="Shown to entrants beside the category." error={err("description")} {...register("description")} />
        <div className="grid gap-4 sm:grid-cols-2">
          <TextField label="Precedence" inputMode="numeric" hint="Lower comes first in lists (and wins overlaps if the show chooses so)." error={err("precedence")} {...register("precedence")} />
          <TextField label="Cap" optional inputMode="numeric" hint="Most entries it takes; later ones wait. Empty: no cap." error={err("cap")} {...register("cap")} />
        </div>

        <section aria-labelledby="conditions-title" className="space-y-3">
          <h4 id="conditions-title" className="text-lg">
            An entry fits this category when all of these hold
          </h4>
          {conditions.fields.length === 0 ? <p className="text-ink-muted">No conditions: every entry fits it.</p> : null}
          {conditions.fields.map((f, i) => (
            <ConditionFields key={f.id} index={i} techniques={techniques} onKind={(kind) => conditions.update(i, blankCondition(kind))} onRemove={() => conditions.remove(i)} />
          ))}
          <p className="text-sm text-danger-700">{err("conditions.root") ?? err("conditions")}</p>
          <Button variant="secondary" onClick={() => conditions.append(blankCondition("size"))} icon={<Plus aria-hidden className="size-5" />}>
            Add a condition
          </Button>
        </section>

        {preview}

        <div className="flex flex-wrap gap-3">
          <Button type="submit" icon={<Check aria-hidden className="size-5" />}>
            Done
          </Button>
          <Button variant="ghost" onClick={onCancel} icon={<X aria-hidden className="size-5" />}>
            Cancel
          </Button>
          {invalid && Object.keys(formState.errors).length ? (
            <p role="alert" className="self-center text-sm font-semibold text-danger-700">Some fields need attention; see the messages above.</p>
          ) : (
            <p className="self-center text-sm text-ink-muted">Changes stay in the draft until you save the categories.</p>
          )}
        </div>
      </form>
    </FormProvider>
  );
}
