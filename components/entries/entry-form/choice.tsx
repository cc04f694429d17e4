// A group of radio buttons whose whole row is the touch target, with one error for the group.
import { useId } from "react";
import type { UseFormRegisterReturn } from "react-hook-form";
import { FieldError } from "@/components/ui/field";

export function Choice({ legend, hint, error, options, register }: { legend: string; hint?: string; error?: string; options: [string, string][]; register: UseFormRegisterReturn }) {
  const id = useId();
  return (
    <fieldset aria-describedby={error ? `${id}-error` : undefined} className="space-y-2">
      <legend className="mb-1 font-display text-xl font-semibold">{legend}</legend>
      {hint ? <p className="text-sm text-ink-muted">{hint}</p> : null}
      <div className="grid gap-2 sm:grid-cols-2">
        {options.map(([value, label]) => (
          <label key={value} className="flex min-h-tap cursor-pointer items-center gap-3 rounded-control border border-line-strong px-3 py-2 has-checked:border-brand has-checked:bg-plum-50">
            <input type="radio" value={value} className="size-5 shrink-0 accent-plum-600" {...register} />
            <span>{label}</span>
          </label>
        ))}
      </div>
      <FieldError id={`${id}-error`} message={error} />
    </fieldset>
  );
}
