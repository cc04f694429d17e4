"use client";
// Edits to the whole draft set: load a starter set, the overlap option, split a category at a
// size, merge one into another, delete one. None of them saves; the save bar does.
import { useState } from "react";
import { useForm, useWatch } from "react-hook-form";
import { zodResolver } from "@hookform/resolvers/zod";
import { z } from "zod";
import { GitMerge, PackageOpen, Scissors, Trash2, X } from "lucide-react";
import { Alert } from "@/components/ui/alert";
import { Button } from "@/components/ui/button";
import { SelectField, TextField } from "@/components/ui/field";
import type { BoundUnit, Measure, OverlapMode } from "@/scoring/categories";
import type { ShowCategory } from "@/scoring/category-sets";
import { lengthUnits, MEASURE_WORDS, typedNumber } from "./form-model";

type Starter = { key: string; name: string; description: string };

export function StarterPicker({ starters, count, disabled, onLoad }: { starters: readonly Starter[]; count: number; disabled: boolean; onLoad: (key: string) => void }) {
  const [key, setKey] = useState(starters[0]?.key ?? "");
  const [confirming, setConfirming] = useState(false);
  const chosen = starters.find((s) => s.key === key);
  const load = () => {
    if (count > 0 && !confirming) return setConfirming(true);
    setConfirming(false);
    onLoad(key);
  };
  return (
    <div className="space-y-3">
      <div className="flex flex-wrap items-end gap-3">
        <SelectField label="Starter set" className="min-w-0 basis-full sm:basis-auto sm:flex-1 sm:max-w-sm" value={key} onChange={(e) => { setKey(e.target.value); setConfirming(false); }} disabled={disabled}>
          {starters.map((s) => (
            <option key={s.key} value={s.key}>
              {s.name}
            </option>
          ))}
        </SelectField>
        <Button variant="secondary" onClick={load} disabled={disabled} icon={<PackageOpen aria-hidden className="size-5" />}>
          Load starter set
        </Button>
      </div>
      {chosen ? <p className="text-sm text-ink-muted">{chosen.description}</p> : null}
      {confirming ? (
        <Alert live tone="warning" title={`This replaces the ${count} ${count === 1 ? "category" : "categories"} in the draft.`}>
          <p>Nothing is saved until you save the categories; you can still discard the draft.</p>
          <div className="mt-2 flex flex-wrap gap-2">
            <Button onClick={load}>Replace with {chosen?.name}</Button>
            <Button variant="ghost" onClick={() => setConfirming(false)}>Keep my categories</Button>
          </div>
        </Alert>
      ) : null}
    </div>
  );
}

export function OverlapChoice({ value, disabled, onChange }: { value: OverlapMode; disabled: boolean; onChange: (v: OverlapMode) => void }) {
  const options: [OverlapMode, string, string][] = [
    ["flag", "Send it to me to place", "Every overlap shows up in the queue below (recommended)."],
    ["firstByPrecedence", "Put it in the first by precedence", "Ties on precedence still come to you."],
  ];
  return (
    <fieldset className="space-y-1">
      <legend className="font-medium text-ink">When an entry fits more than one category</legend>
      {options.map(([v, label, hint]) => (
        <label key={v} className="flex min-h-tap cursor-pointer items-start gap-3 py-1">
          <input type="radio" name="overlap" value={v} checked={value === v} disabled={disabled} onChange={() => onChange(v)} className="mt-1 size-5 shrink-0 accent-plum-600" />
          <span>
            <span className="font-medium">{label}</span>
            <span className="block text-sm text-ink-muted">{hint}</span>
          </span>
        </label>
      ))}
    </fieldset>
  );
}

const MEASURES = ["width", "length", "perimeter", "area", "longestSide", "shortestSide"] as const;

function splitSchema(takenCodes: readonly string[]) {
  const taken = new Set(takenCodes.map((c) => c.toLowerCase()));
  return z
    .object({
      measure: z.enum(MEASURES),
      value: z.string(),
      unit: z.enum(["in", "cm", "sq in", "sq cm"]),
      code: z.string().trim().min(1, "Give the new category a code.").max(12, "Keep the code to 12 characters.").refine((c) => !taken.has(c.toLowerCase()), "Another category has this code."),
      name: z.string().trim().min(1, "Give the new category a name.").max(80, "Keep the name to 80 characters."),
    })
    .superRefine((v, ctx) => {
      const n = typedNumber(v.value);
      if (n === null || n <= 0) ctx.addIssue({ code: "custom", path: ["value"], message: "Enter the size to split at, e.g. 240." });
      if (!lengthUnits(v.measure).includes(v.unit)) ctx.addIssue({ code: "custom", path: ["unit"], message: v.measure === "area" ? "Area is in sq in or sq cm." : "Lengths are in in or cm." });
    });
}
type SplitValues = z.input<ReturnType<typeof splitSchema>>;
export type SplitAt = { measure: Measure; value: number; unit: BoundUnit };

export function SplitForm({ category, takenCodes, onSplit, onCancel }: { category: ShowCategory; takenCodes: readonly string[]; onSplit: (at: SplitAt, code: string, name: string) => void; onCancel: () => void }) {
  const form = useForm<SplitValues>({ resolver: zodResolver(splitSchema(takenCodes)), defaultValues: { measure: "perimeter", value: "", unit: "in", code: "", name: `${category.name}, larger` }, mode: "onTouched" });
  const { register, formState, control } = form;
  const units = lengthUnits(useWatch({ control, name: "measure" }));
  const e = formState.errors;
  const submit = form.handleSubmit((v) => onSplit({ measure: v.measure, value: typedNumber(v.value)!, unit: v.unit }, v.code.trim(), v.name.trim()));
  return (
    <form noValidate onSubmit={submit} aria-labelledby="split-title" className="space-y-4">
      <h3 id="split-title" className="text-xl">Split {category.code} {category.name} at a size</h3>
      <p className="text-ink-muted">{category.code} keeps the sizes under the value; the new category takes the value and over, with the same other conditions. No size falls between them.</p>
      <div className="grid gap-4 sm:grid-cols-3">
        <SelectField label="Measured on" error={e.measure?.message} {...register("measure", { onChange: (ev) => form.setValue("unit", lengthUnits(ev.target.value as Measure)[0]!) })}>
          {MEASURES.map((m) => <option key={m} value={m}>{MEASURE_WORDS[m]}</option>)}
        </SelectField>
        <TextField label="Split at" inputMode="decimal" autoComplete="off" error={e.value?.message} {...register("value")} />
        <SelectField label="Unit" error={e.unit?.message} {...register("unit")}>
          {units.map((u) => <option key={u} value={u}>{u}</option>)}
        </SelectField>
      </div>
      <div className="grid gap-4 sm:grid-cols-[8rem_minmax(0,1fr)]">
        <TextField label="New code" autoComplete="off" error={e.code?.message} {...register("code")} />
        <TextField label="New name" autoComplete="off" error={e.name?.message} {...register("name")} />
      </div>
      <div className="flex flex-wrap gap-3">
        <Button type="submit" icon={<Scissors aria-hidden className="size-5" />}>Split</Button>
        <Button variant="ghost" onClick={onCancel} icon={<X aria-hidden className="size-5" />}>Cancel</Button>
      </div>
    </form>
  );
}

export function MergeForm({ category, targets, onMerge, onCancel }: { category: ShowCategory; targets: readonly ShowCategory[]; onMerge: (intoId: string) => void; onCancel: () => void }) {
  const [into, setInto] = useState(targets[0]?.id ?? "");
  return (
    <div className="space-y-4" role="group" aria-labelledby="merge-title">
      <h3 id="merge-title" className="text-xl">Merge {category.code} {category.name} into another category</h3>
      <p className="text-ink-muted">Its rule keeps deciding, but the entries it takes go to the category you choose. You can undo the merge before or after saving.</p>
      {targets.length === 0 ? <p>There is no other category to merge into.</p> : (
        <SelectField label="Merge into" className="sm:max-w-md" value={into} onChange={(e) => setInto(e.target.value)}>
          {targets.map((t) => <option key={t.id} value={t.id}>{t.code} {t.name}</option>)}
        </SelectField>
      )}
      <div className="flex flex-wrap gap-3">
        <Button disabled={!into} onClick={() => onMerge(into)} icon={<GitMerge aria-hidden className="size-5" />}>Merge</Button>
        <Button variant="ghost" onClick={onCancel} icon={<X aria-hidden className="size-5" />}>Cancel</Button>
      </div>
    </div>
  );
}

export function DeleteConfirm({ category, entryCount, mergedHere, onDelete, onCancel }: { category: ShowCategory; entryCount: number; mergedHere: number; onDelete: () => void; onCancel: () => void }) {
  return (
    <Alert live tone="warning" title={`Delete ${category.code} ${category.name}?`}>
      <p>
        {entryCount ? `Its ${entryCount} ${entryCount === 1 ? "entry goes" : "entries go"} back to the rules when you save, and you’ll see where each one lands before anything changes. ` : "It holds no entries. "}
        {mergedHere ? `${mergedHere} merged ${mergedHere === 1 ? "category decides" : "categories decide"} for it; ${mergedHere === 1 ? "it becomes" : "they become"} a category of its own again.` : ""}
      </p>
      <div className="mt-2 flex flex-wrap gap-2">
        <Button variant="danger" onClick={onDelete} icon={<Trash2 aria-hidden className="size-5" />}>Delete from the draft</Button>
        <Button variant="ghost" onClick={onCancel}>Keep it</Button>
      </div>
    </Alert>
  );
}
