"use client";
// Changing one entry's placement by hand, or going back to the proposal: a reason is required and
// goes to the audit log. The entry's proposal and current outcome are shown beside the form.
import { useState } from "react";
import { PencilLine, Undo2 } from "lucide-react";
import { ActionForm, useActionForm } from "@/components/forms/action-form";
import { Button } from "@/components/ui/button";
import { SelectField, TextareaField } from "@/components/ui/field";
import { clearPlacementSchema, placementSchema } from "@/lib/schemas/results";
import { ordinal } from "@/scoring/ranking";
import { clearPlacementAction, overridePlacementAction } from "@/app/(chair)/shows/[slug]/manage/results/actions";
import { SubmitOrCancel } from "@/components/forms/submit-or-cancel";

type Props = { showSlug: string; entryId: string; entryNumber: number; places: number; current: string; overridden: boolean; disabled: boolean };

export function PlacementChange({ showSlug, entryId, entryNumber, places, current, overridden, disabled }: Props) {
  const [open, setOpen] = useState<"change" | "undo" | null>(null);
  if (disabled) return null;
  return (
    <div className="space-y-2">
      <div className="flex flex-wrap gap-2">
        <Button variant="secondary" icon={<PencilLine aria-hidden className="size-5" />} aria-expanded={open === "change"} aria-label={`Change the placement of entry ${entryNumber}`} onClick={() => setOpen(open === "change" ? null : "change")}>
          Change
        </Button>
        {overridden ? (
          <Button variant="ghost" icon={<Undo2 aria-hidden className="size-5" />} aria-expanded={open === "undo"} aria-label={`Back to the proposal for entry ${entryNumber}`} onClick={() => setOpen(open === "undo" ? null : "undo")}>
            Back to proposal
          </Button>
        ) : null}
      </div>
      {open === "change" ? <ChangeForm {...{ showSlug, entryId, entryNumber, places, current }} onDone={() => setOpen(null)} /> : null}
      {open === "undo" ? <UndoForm showSlug={showSlug} entryId={entryId} entryNumber={entryNumber} onDone={() => setOpen(null)} /> : null}
    </div>
  );
}

function ChangeForm({ showSlug, entryId, entryNumber, places, current, onDone }: Omit<Props, "overridden" | "disabled"> & { onDone: () => void }) {
  const ctl = useActionForm({
    schema: placementSchema,
    defaultValues: { entryId, outcome: "none", reason: "" },
    action: (v) => overridePlacementAction(null, { entryId: v.entryId, outcome: v.place ?? (v.honorableMention ? "hm" : "none"), reason: v.reason, showSlug }),
    onSuccess: onDone,
  });
  return (
    <ActionForm controller={ctl} aria-label={`Change the placement of entry ${entryNumber}`} className="space-y-3 rounded-control border border-line bg-paper-50 p-3">
      <p className="text-sm text-ink-muted">Now: {current}</p>
      <SelectField label="New placement" error={ctl.errorOf("outcome")} {...ctl.form.register("outcome")}>
        {Array.from({ length: places }, (_, i) => (
          <option key={i + 1} value={String(i + 1)}>
            {ordinal(i + 1)} place
          </option>
        ))}
        <option value="hm">Honorable mention</option>
        <option value="none">No placement</option>
      </SelectField>
      <TextareaField label="Reason" hint="Required; it goes in the audit log, e.g. “Judges' discussion: binding flaw found on re-inspection”." rows={2} error={ctl.errorOf("reason")} {...ctl.form.register("reason")} />
      <SubmitOrCancel pending={ctl.pending} pendingLabel="Saving…" onCancel={onDone}>
        Save the change
      </SubmitOrCancel>
    </ActionForm>
  );
}

function UndoForm({ showSlug, entryId, entryNumber, onDone }: { showSlug: string; entryId: string; entryNumber: number; onDone: () => void }) {
  const ctl = useActionForm({
    schema: clearPlacementSchema,
    defaultValues: { entryId, reason: "" },
    action: (v) => clearPlacementAction(null, { ...v, showSlug }),
    onSuccess: onDone,
  });
  return (
    <ActionForm controller={ctl} aria-label={`Back to the proposal for entry ${entryNumber}`} className="space-y-3 rounded-control border border-line bg-paper-50 p-3">
      <TextareaField label="Reason" rows={2} error={ctl.errorOf("reason")} {...ctl.form.register("reason")} />
      <Button type="submit" pending={ctl.pending} pendingLabel="Saving…">
        Use the proposal again
      </Button>
    </ActionForm>
  );
}
