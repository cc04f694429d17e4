"use client";
// Re-measuring one quilt at the intake desk: width, length and unit with big targets for a tablet
// or phone held at the table; the server compares with the registered size and the show's
// tolerance, flags the entry for the chair and places it again when it is off by more.
import { useEffect, useId, useState } from "react";
import { Ruler } from "lucide-react";
import { useQueryClient } from "@tanstack/react-query";
import { measureEntryAction } from "@/app/(desk)/shows/[slug]/desk/actions";
import { FormStatusAlert, useActionForm } from "@/components/forms/action-form";
import { Alert } from "@/components/ui/alert";
import { Button } from "@/components/ui/button";
import { controlClasses, Field, FieldError } from "@/components/ui/field";
import { measureSchema } from "@/lib/schemas/categories";
import { formatSize } from "@/scoring/units";
import { deskKeys } from "./queries";

type Measured = { entryNumber: number | null; flagged: boolean; text: string; category: string | null; summary: string };

type Props = {
  showSlug: string;
  entry: { id: string; entryNumber: number | null; widthUm: number; lengthUm: number };
  onClose: () => void;
};

export function MeasureForm({ showSlug, entry, onClose }: Props) {
  const id = useId();
  const queryClient = useQueryClient();
  const [result, setResult] = useState<{ message: string; data: Measured } | null>(null);
  const ctl = useActionForm({
    schema: measureSchema,
    defaultValues: { entryId: entry.id, width: "", length: "", unit: "in" as const },
    action: (values) => measureEntryAction(null, { ...values, slug: showSlug }),
    onSuccess: (r) => {
      setResult(r.data ? { message: r.message ?? "Measured.", data: r.data as Measured } : null);
      void queryClient.invalidateQueries({ queryKey: deskKeys.entries(showSlug) });
    },
  });
  const { register, watch, setFocus } = ctl.form;
  // Opening the form puts the cursor in Width, so the volunteer can type straight from the tape.
  useEffect(() => setFocus("width"), [setFocus]);
  const unit = watch("unit") === "cm" ? "cm" : "in";
  const error = ctl.status?.tone === "error" ? ctl.status : null;
  const name = entry.entryNumber === null ? "this entry" : `entry ${entry.entryNumber}`;

  return (
    <form noValidate onSubmit={(e) => { setResult(null); return ctl.onSubmit(e); }} aria-labelledby={`${id}-title`} className="space-y-4 rounded-card border-2 border-plum-300 bg-plum-50 p-4">
      <div className="flex flex-wrap items-baseline justify-between gap-2">
        <h3 id={`${id}-title`} className="flex items-center gap-2 text-xl">
          <Ruler aria-hidden className="size-5 shrink-0 text-plum-700" />
          Measure {name}
        </h3>
        <p className="text-sm text-ink-muted">Registered {formatSize(entry.widthUm, entry.lengthUm)}</p>
      </div>
      <FormStatusAlert status={error} />
      {result ? (
        <Alert live tone={result.data.flagged ? "warning" : "success"} title={result.message}>
          <p>{result.data.text}</p>
          {result.data.category ? <p className="mt-1 font-semibold">Category now: {result.data.category}</p> : null}
        </Alert>
      ) : null}
      <fieldset className="space-y-2">
        <legend className="font-semibold">Unit of the tape</legend>
        <div className="flex gap-2">
          {(["in", "cm"] as const).map((u) => (
            <label key={u} className="flex min-h-tap-lg min-w-tap-lg cursor-pointer items-center gap-3 rounded-control border border-line-strong bg-surface px-4 text-lg has-checked:border-brand has-checked:bg-plum-100">
              <input type="radio" value={u} className="size-6 accent-plum-600" {...register("unit")} />
              {u === "in" ? "Inches" : "Centimetres"}
            </label>
          ))}
        </div>
        <FieldError message={ctl.errorOf("unit")} />
      </fieldset>
      <div className="grid grid-cols-2 gap-3">
        <Field label={`Width (${unit})`} hint={unit === "in" ? "e.g. 60½ or 60 1/2" : "e.g. 152.4"} error={ctl.errorOf("width")}>
          {(a11y) => <input className={controlClasses("lg")} inputMode="decimal" autoComplete="off" enterKeyHint="next" {...register("width")} {...a11y} />}
        </Field>
        <Field label={`Length (${unit})`} hint="Top to bottom" error={ctl.errorOf("length")}>
          {(a11y) => <input className={controlClasses("lg")} inputMode="decimal" autoComplete="off" enterKeyHint="done" {...register("length")} {...a11y} />}
        </Field>
      </div>
      <div className="flex flex-col gap-3 sm:flex-row">
        <Button type="submit" size="lg" pending={ctl.pending} pendingLabel="Saving…">
          Save measurement
        </Button>
        <Button size="lg" variant="ghost" onClick={onClose}>
          Close
        </Button>
      </div>
    </form>
  );
}
