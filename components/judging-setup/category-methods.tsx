"use client";
// Each category's judging method and score sheet, one row per category, each saved on its own.
import { Save } from "lucide-react";
import { ActionForm, useActionForm } from "@/components/forms/action-form";
import { Button } from "@/components/ui/button";
import { SelectField } from "@/components/ui/field";
import { categoryJudgingSchema } from "@/lib/schemas/judging";
import { setCategoryJudgingAction } from "@/app/(chair)/shows/[slug]/manage/judging/actions";
import { METHOD_WORDS, type MethodKey } from "./form-bits";

export type CategoryItem = { id: string; code: string; name: string; method: MethodKey; scoreSheetId: string | null };
type SheetChoice = { id: string; name: string; isDefault: boolean };

export function CategoryMethods({ showSlug, categories, sheets }: { showSlug: string; categories: CategoryItem[]; sheets: SheetChoice[] }) {
  const fallback = sheets.find((s) => s.isDefault);
  return (
    <ul className="divide-y divide-line rounded-control border border-line">
      {categories.map((c) => (
        <li key={c.id} className="p-3 sm:p-4">
          <CategoryRow showSlug={showSlug} category={c} sheets={sheets} defaultName={fallback?.name} />
        </li>
      ))}
    </ul>
  );
}

function CategoryRow({ showSlug, category, sheets, defaultName }: { showSlug: string; category: CategoryItem; sheets: SheetChoice[]; defaultName?: string }) {
  const ctl = useActionForm({
    schema: categoryJudgingSchema,
    defaultValues: { categoryId: category.id, method: category.method, scoreSheetId: category.scoreSheetId },
    action: (v) => setCategoryJudgingAction(null, { ...v, showSlug }),
    successMessage: "Saved.",
  });
  const { register } = ctl.form;
  const label = `${category.code} ${category.name}`;
  return (
    <ActionForm controller={ctl} aria-label={`Judging for ${label}`} className="space-y-3">
      <div className="grid items-end gap-3 md:grid-cols-[minmax(10rem,1fr)_minmax(12rem,1fr)_minmax(12rem,1fr)_auto]">
        <p className="self-center text-lg font-semibold">{label}</p>
        <SelectField label="Method" aria-label={`Method for ${label}`} error={ctl.errorOf("method")} {...register("method")}>
          {(Object.keys(METHOD_WORDS) as MethodKey[]).map((m) => (
            <option key={m} value={m}>
              {METHOD_WORDS[m]}
            </option>
          ))}
        </SelectField>
        <SelectField
          label="Score sheet"
          aria-label={`Score sheet for ${label}`}
          error={ctl.errorOf("scoreSheetId")}
          {...register("scoreSheetId", { setValueAs: (v: string | null) => (v ? v : null) })}
        >
          <option value="">{defaultName ? `Default (${defaultName})` : "Default (none yet)"}</option>
          {sheets.map((s) => (
            <option key={s.id} value={s.id}>
              {s.name}
            </option>
          ))}
        </SelectField>
        <Button type="submit" variant="secondary" pending={ctl.pending} pendingLabel="Saving…" icon={<Save aria-hidden className="size-5" />} aria-label={`Save judging for ${label}`}>
          Save
        </Button>
      </div>
    </ActionForm>
  );
}
