"use client";
// The chair's order for entries still tied after every other tie-break: entry numbers best first,
// with a reason. Used only when the show's chain ends with the chair's decision.
import { z } from "zod";
import { ActionForm, useActionForm } from "@/components/forms/action-form";
import { Button } from "@/components/ui/button";
import { TextField, TextareaField } from "@/components/ui/field";
import { saveTieOrderAction } from "@/app/(chair)/shows/[slug]/manage/results/actions";

type Props = { showSlug: string; categoryId: string; tied: { entryId: string; entryNumber: number }[] };

export function TieOrderForm({ showSlug, categoryId, tied }: Props) {
  const numbers = tied.map((t) => t.entryNumber);
  const schema = z.object({
    order: z.string().transform((s, ctx) => {
      const got = s.split(/[\s,]+/).filter(Boolean).map(Number);
      if (got.length !== numbers.length || numbers.some((n) => !got.includes(n))) {
        ctx.addIssue({ code: "custom", message: `List each of entries ${numbers.join(", ")} once, best first.` });
        return z.NEVER;
      }
      return got.map((n) => tied.find((t) => t.entryNumber === n)!.entryId);
    }),
    reason: z.string().trim().min(3, "Give a reason (a few words) — it goes in the audit log."),
  });
  const ctl = useActionForm({
    schema,
    defaultValues: { order: numbers.join(", "), reason: "" },
    action: (v) => saveTieOrderAction(null, { categoryId, entryIds: v.order, reason: v.reason, showSlug }),
  });
  return (
    <ActionForm controller={ctl} aria-label={`Order the tie between entries ${numbers.join(", ")}`} className="space-y-3 rounded-control border border-warning-700 bg-warning-50 p-3">
      <p className="font-medium">Entries {numbers.join(", ")} are still tied after every tie-break.</p>
      <TextField label="Order, best first (entry numbers)" inputMode="numeric" error={ctl.errorOf("order")} {...ctl.form.register("order")} />
      <TextareaField label="Reason" rows={2} error={ctl.errorOf("reason")} {...ctl.form.register("reason")} />
      <Button type="submit" pending={ctl.pending} pendingLabel="Saving…">
        Save the order
      </Button>
    </ActionForm>
  );
}
