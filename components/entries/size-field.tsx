"use client";
// Width × length in inches or centimetres, with both units and the perimeter shown live as the
// entrant types (parsing is the same pure code the server runs: scoring/measure.ts).
import type { UseFormReturn } from "react-hook-form";
import { TextField } from "@/components/ui/field";
import type { QuiltStepInput } from "@/lib/schemas/entry";
import { parseLength, perimeterUm } from "@/scoring/measure";
import { formatCm, formatInches } from "@/scoring/units";
import { sizeSummary } from "./size-summary";

export function SizeField({ form, errorOf }: { form: UseFormReturn<QuiltStepInput>; errorOf: (n: "width" | "length" | "sizeUnit") => string | undefined }) {
  const { register, watch } = form;
  const unit = watch("sizeUnit") === "cm" ? "cm" : "in";
  const w = parseLength(watch("width") ?? "", unit);
  const l = parseLength(watch("length") ?? "", unit);
  const example = unit === "in" ? "e.g. 60½, 60 1/2 or 60.5" : "e.g. 153.7";

  return (
    <fieldset className="space-y-4">
      <legend className="mb-2 font-display text-xl font-semibold">Size</legend>
      <div role="radiogroup" aria-label="Unit" className="flex gap-2">
        {(["in", "cm"] as const).map((u) => (
          <label key={u} className="flex min-h-tap min-w-tap cursor-pointer items-center gap-2 rounded-control border border-line-strong px-4 has-checked:border-brand has-checked:bg-plum-50">
            <input type="radio" value={u} className="size-5 accent-plum-600" {...register("sizeUnit")} />
            {u === "in" ? "Inches" : "Centimetres"}
          </label>
        ))}
      </div>
      <div className="grid grid-cols-2 gap-4">
        <TextField label={`Width (${unit})`} inputMode="decimal" autoComplete="off" hint={example} error={errorOf("width")} {...register("width")} />
        <TextField label={`Length (${unit})`} inputMode="decimal" autoComplete="off" hint="Top to bottom as it hangs" error={errorOf("length")} {...register("length")} />
      </div>
      <p aria-live="polite" className="rounded-control bg-paper-100 p-3 tabular-nums">
        {w.ok && l.ok ? (
          <>
            <span className="font-semibold">{sizeSummary(w.um, l.um, unit)}</span>
            <span className="block text-sm text-ink-muted">
              Perimeter {formatInches(perimeterUm(w.um, l.um))} ({formatCm(perimeterUm(w.um, l.um))})
            </span>
          </>
        ) : (
          <span className="text-ink-muted">Both units and the perimeter show here as you type.</span>
        )}
      </p>
    </fieldset>
  );
}
