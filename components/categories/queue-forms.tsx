"use client";
// The queue's small forms: place an entry by hand (or back to the rules) with a reason, mark a
// size flag reviewed, give a waiting entry its place with a reason.
import { useState } from "react";
import { Check, MapPin, Ticket } from "lucide-react";
import {
  admitFromWaitlistAction,
  overrideCategoryAction,
  reviewSizeFlagAction,
} from "@/app/(chair)/shows/[slug]/manage/categories/actions";
import { ActionForm, FormStatusAlert, useActionForm, type FormStatus } from "@/components/forms/action-form";
import { Button } from "@/components/ui/button";
import { SelectField, TextField } from "@/components/ui/field";
import type { ActionResult } from "@/lib/action";
import { admitSchema, overrideSchema } from "@/lib/schemas/categories";

type Ref = { id: string; code: string; name: string };

export function OverrideForm({ showSlug, entryId, entryLabel, categories, candidates }: { showSlug: string; entryId: string; entryLabel: string; categories: Ref[]; candidates: Ref[] }) {
  const ctl = useActionForm({
    schema: overrideSchema,
    defaultValues: { entryId, categoryId: candidates[0]?.id ?? categories[0]?.id ?? "rules", reason: "" },
    action: (): Promise<ActionResult> => overrideCategoryAction(null, { ...ctl.form.getValues(), showSlug }),
  });
  const { register } = ctl.form;
  const others = categories.filter((c) => !candidates.some((k) => k.id === c.id));
  return (
    <ActionForm controller={ctl} aria-label={`Place ${entryLabel}`} className="space-y-3">
      <input type="hidden" {...register("entryId")} />
      <div className="grid gap-3 md:grid-cols-[minmax(0,18rem)_minmax(0,1fr)_auto] md:items-start">
        <SelectField label="Place in" error={ctl.errorOf("categoryId")} {...register("categoryId")}>
          {candidates.length ? (
            <optgroup label="Categories it fits">
              {candidates.map((c) => <option key={c.id} value={c.id}>{c.code} {c.name}</option>)}
            </optgroup>
          ) : null}
          <optgroup label={candidates.length ? "Other categories" : "Categories"}>
            {others.map((c) => <option key={c.id} value={c.id}>{c.code} {c.name}</option>)}
          </optgroup>
          <option value="rules">Back to the rules</option>
        </SelectField>
        <TextField label="Reason" hint="Goes in the show’s history." autoComplete="off" error={ctl.errorOf("reason")} {...register("reason")} />
        <Button type="submit" className="md:mt-[3.25rem]" pending={ctl.pending} pendingLabel="Placing…" icon={<MapPin aria-hidden className="size-5" />}>
          Place
        </Button>
      </div>
    </ActionForm>
  );
}

export function AdmitForm({ showSlug, entryId, entryLabel }: { showSlug: string; entryId: string; entryLabel: string }) {
  const ctl = useActionForm({
    schema: admitSchema,
    defaultValues: { entryId, reason: "" },
    action: (): Promise<ActionResult> => admitFromWaitlistAction(null, { ...ctl.form.getValues(), showSlug }),
  });
  const { register } = ctl.form;
  return (
    <ActionForm controller={ctl} aria-label={`Give ${entryLabel} a place`} className="space-y-3">
      <input type="hidden" {...register("entryId")} />
      <div className="grid gap-3 md:grid-cols-[minmax(0,1fr)_auto] md:items-start">
        <TextField label="Reason" hint="e.g. a withdrawal freed a place. Goes in the show’s history." autoComplete="off" error={ctl.errorOf("reason")} {...register("reason")} />
        <Button type="submit" className="md:mt-[3.25rem]" pending={ctl.pending} pendingLabel="Saving…" icon={<Ticket aria-hidden className="size-5" />}>
          Give a place
        </Button>
      </div>
    </ActionForm>
  );
}

export function ReviewedButton({ showSlug, entryId, entryLabel }: { showSlug: string; entryId: string; entryLabel: string }) {
  const [busy, setBusy] = useState(false);
  const [status, setStatus] = useState<FormStatus>(null);
  async function review() {
    setBusy(true);
    try {
      const r = await reviewSizeFlagAction(null, { showSlug, entryId });
      setStatus(r.ok ? { tone: "success", message: r.message ?? "Reviewed." } : { tone: "error", message: r.message });
    } catch {
      setStatus({ tone: "error", message: "We could not reach Ribbonry. Check your connection and try again." });
    } finally {
      setBusy(false);
    }
  }
  return (
    <div className="space-y-2">
      <FormStatusAlert status={status} />
      <Button variant="secondary" onClick={review} pending={busy} pendingLabel="Saving…" aria-label={`Reviewed: ${entryLabel}`} icon={<Check aria-hidden className="size-5" />}>
        Reviewed
      </Button>
    </div>
  );
}
