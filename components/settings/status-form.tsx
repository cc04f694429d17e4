"use client";
// Moving the show to its next stage; the server refuses moves that don't make sense, with reasons.
import { ArrowRight } from "lucide-react";
import { ActionForm, useActionForm } from "@/components/forms/action-form";
import type { ActionResult } from "@/lib/action";
import { Button } from "@/components/ui/button";
import { showStatusLabel } from "@/components/shows/show-status";
import { statusChangeSchema, type ShowStatusValue } from "@/lib/schemas/settings";
import { changeStatusAction } from "@/app/(chair)/shows/[slug]/manage/settings/actions";

type Props = { showSlug: string; status: ShowStatusValue; moves: readonly ShowStatusValue[] };

export function StatusForm({ showSlug, status, moves }: Props) {
  const ctl = useActionForm({
    schema: statusChangeSchema,
    defaultValues: { status: moves[0] ?? status },
    action: (values): Promise<ActionResult> => changeStatusAction(null, { ...values, showSlug }),
  });
  if (status === "judging") return <p className="text-ink-muted">Judging is under way. The results go out from <a href={`/shows/${showSlug}/manage/results`}>Results</a>, which checks every sheet first.</p>;
  if (moves.length === 0) return <p className="text-ink-muted">This show is finished; its stage no longer changes.</p>;
  return (
    <ActionForm controller={ctl} aria-labelledby="status">
      <div className="flex flex-wrap gap-3">
        {moves.map((m) => (
          <Button
            key={m}
            type="submit"
            variant={m === moves[0] ? "primary" : "secondary"}
            pending={ctl.pending && ctl.form.getValues("status") === m}
            disabled={ctl.pending}
            onClick={() => ctl.form.setValue("status", m)}
            icon={<ArrowRight aria-hidden className="size-5" />}
          >
            Move to “{showStatusLabel(m)}”
          </Button>
        ))}
      </div>
    </ActionForm>
  );
}
