"use client";
// One judging panel: its name, session (day, room or table), judges and scribes from the show's
// team and its categories. A refusal because a judge may not judge a category (their own entry,
// or a declared person's) is listed beside the judges, every reason in plain words.
import { useState } from "react";
import type { UseFormRegisterReturn } from "react-hook-form";
import { Save, TriangleAlert } from "lucide-react";
import { ActionForm, useActionForm } from "@/components/forms/action-form";
import { FieldError, TextField } from "@/components/ui/field";
import { panelSchema } from "@/lib/schemas/judging";
import { savePanelAction } from "@/app/(chair)/shows/[slug]/manage/judging/actions";
import type { ActionResult } from "@/lib/action";
import { SubmitOrCancel } from "@/components/forms/submit-or-cancel";

export type Person = { userId: string; name: string; email: string };
export type PanelValues = { id?: string; name: string; day: string; room: string; judgeIds: string[]; scribeIds: string[]; categoryIds: string[] };
type Cat = { id: string; code: string; name: string };

type Props = { showSlug: string; values: PanelValues; judges: Person[]; scribes: Person[]; categories: Cat[]; onSaved: (message?: string) => void; onCancel?: () => void };

export function PanelForm({ showSlug, values, judges, scribes, categories, onSaved, onCancel }: Props) {
  const [conflicts, setConflicts] = useState<string[]>([]);
  const ctl = useActionForm({
    schema: panelSchema,
    defaultValues: values,
    action: async (v): Promise<ActionResult<{ id: string }>> => {
      const r = await savePanelAction(null, { ...v, showSlug });
      setConflicts(!r.ok && r.status === 409 ? (r.fieldErrors?.judgeIds ?? [r.message]) : []);
      return r;
    },
    onSuccess: (r) => onSaved(r.message),
  });
  const { register } = ctl.form;
  const title = values.id ? `Edit ${values.name}` : "New panel";
  const judgeError = conflicts.length ? undefined : ctl.errorOf("judgeIds");
  return (
    <ActionForm controller={ctl} aria-label={title} className="space-y-4">
      <div className="grid gap-3 md:grid-cols-3">
        <TextField label="Panel name" placeholder="e.g. Panel C" error={ctl.errorOf("name")} {...register("name")} />
        <TextField label="Day" type="date" optional error={ctl.errorOf("day")} {...register("day")} />
        <TextField label="Room or table" optional placeholder="e.g. Hall B, table 1" error={ctl.errorOf("room")} {...register("room")} />
      </div>
      <div className="grid gap-4 lg:grid-cols-3">
        <fieldset className="min-w-0 space-y-1" aria-describedby={conflicts.length ? `${values.id ?? "new"}-conflicts` : undefined}>
          <legend className="font-medium">Judges</legend>
          <People people={judges} field={register("judgeIds")} empty="No judges on the team yet: invite them from Overview." />
          {conflicts.length ? (
            <div id={`${values.id ?? "new"}-conflicts`} role="alert" className="space-y-1 rounded-control border border-danger-700/30 bg-danger-50 p-3 text-sm text-danger-700">
              <p className="flex items-center gap-1.5 font-semibold">
                <TriangleAlert aria-hidden className="size-4" />
                Not saved: a judge can’t judge one of these categories.
              </p>
              <ul className="list-disc pl-5">
                {conflicts.map((c) => (
                  <li key={c}>{c}</li>
                ))}
              </ul>
            </div>
          ) : null}
          <FieldError message={judgeError} />
        </fieldset>
        <fieldset className="min-w-0 space-y-1">
          <legend className="font-medium">
            Scribes <span className="font-normal text-ink-muted">(optional)</span>
          </legend>
          <People people={scribes} field={register("scribeIds")} empty="No scribes on the team yet." />
          <FieldError message={ctl.errorOf("scribeIds")} />
        </fieldset>
        <fieldset className="min-w-0 space-y-1">
          <legend className="font-medium">Categories</legend>
          <div className="grid max-h-72 gap-x-3 overflow-y-auto rounded-control border border-line px-3 sm:grid-cols-2 lg:grid-cols-1">
            {categories.map((c) => (
              <label key={c.id} className="flex min-h-tap cursor-pointer items-center gap-3">
                <input type="checkbox" value={c.id} className="size-5 shrink-0 accent-plum-600" {...register("categoryIds")} />
                <span>
                  {c.code} {c.name}
                </span>
              </label>
            ))}
          </div>
          <FieldError message={ctl.errorOf("categoryIds")} />
        </fieldset>
      </div>
      <SubmitOrCancel pending={ctl.pending} pendingLabel="Saving…" icon={<Save aria-hidden className="size-5" />} onCancel={onCancel}>
        Save panel
      </SubmitOrCancel>
    </ActionForm>
  );
}

function People({ people, field, empty }: { people: Person[]; field: UseFormRegisterReturn; empty: string }) {
  if (!people.length) return <p className="text-ink-muted">{empty}</p>;
  return (
    <div className="rounded-control border border-line px-3">
      {people.map((p) => (
        <label key={p.userId} className="flex min-h-tap cursor-pointer items-center gap-3 py-1">
          <input type="checkbox" value={p.userId} className="size-5 shrink-0 accent-plum-600" {...field} />
          <span className="min-w-0">
            {p.name}
            <span className="block truncate text-sm text-ink-muted">{p.email}</span>
          </span>
        </label>
      ))}
    </div>
  );
}
