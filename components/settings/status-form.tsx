"use client";
// Moving the show between stages in two steps: choose the move (the main button is the usual next
// stage; going back is a secondary action), then read what it will do, what refuses it and what
// is still open, give a reason when one is needed, and confirm. The server checks it all again.
import { useState } from "react";
import { ArrowLeft, ArrowRight, CircleAlert, CircleX, Info } from "lucide-react";
import { ActionForm, useActionForm } from "@/components/forms/action-form";
import type { ActionResult } from "@/lib/action";
import { Button } from "@/components/ui/button";
import { TextareaField } from "@/components/ui/field";
import { showStatusLabel } from "@/components/shows/show-status";
import { statusChangeSchema, type ShowStatusValue } from "@/lib/schemas/settings";
import { changeStatusAction } from "@/app/(chair)/shows/[slug]/manage/settings/actions";

export type MovePreview = { to: ShowStatusValue; effects: string[]; blockers: string[]; warnings: string[]; stepBack: boolean; needsReason: boolean };
type Props = { showSlug: string; status: ShowStatusValue; next: MovePreview | null; back: MovePreview | null };

export function StatusForm({ showSlug, status, next, back }: Props) {
  const [chosen, setChosen] = useState<MovePreview | null>(null);
  if (chosen) return <ConfirmMove showSlug={showSlug} move={chosen} onCancel={() => setChosen(null)} />;
  return (
    <div className="space-y-3">
      {status === "judging" ? (
        <p className="text-ink-muted">
          Judging is under way. The results go out from <a href={`/shows/${showSlug}/manage/results`}>Results</a>, which checks every sheet first.
        </p>
      ) : null}
      {!next && !back && status !== "judging" ? <p className="text-ink-muted">This show is finished; its stage no longer changes.</p> : null}
      <div className="flex flex-wrap gap-3">
        {next ? (
          <Button type="button" variant="primary" onClick={() => setChosen(next)} icon={<ArrowRight aria-hidden className="size-5" />}>
            Move to “{showStatusLabel(next.to)}”…
          </Button>
        ) : null}
        {back ? (
          <Button type="button" variant="secondary" onClick={() => setChosen(back)} icon={<ArrowLeft aria-hidden className="size-5" />}>
            Go back to “{showStatusLabel(back.to)}”…
          </Button>
        ) : null}
      </div>
    </div>
  );
}

function ConfirmMove({ showSlug, move, onCancel }: { showSlug: string; move: MovePreview; onCancel: () => void }) {
  const ctl = useActionForm({
    schema: statusChangeSchema,
    defaultValues: { status: move.to, reason: "" },
    action: (values): Promise<ActionResult> => changeStatusAction(null, { ...values, showSlug }),
    onSuccess: () => setTimeout(onCancel, 0),
  });
  const label = showStatusLabel(move.to);
  const blocked = move.blockers.length > 0;
  return (
    <ActionForm controller={ctl} aria-labelledby="confirm-move" className="space-y-4 rounded-lg border border-line p-4">
      <h3 id="confirm-move" className="text-xl">
        {move.stepBack ? `Go back to “${label}”?` : `Move to “${label}”?`}
      </h3>
      <List title="What this will do" items={move.effects} icon={<Info aria-hidden className="size-5 shrink-0 text-ink-muted" />} />
      {blocked ? <List title="This can't happen yet" items={move.blockers} icon={<CircleX aria-hidden className="size-5 shrink-0 text-danger-700" />} /> : null}
      {move.warnings.length ? <List title="Still open" items={move.warnings} icon={<CircleAlert aria-hidden className="size-5 shrink-0 text-warning-700" />} /> : null}
      {!blocked && move.needsReason ? (
        <TextareaField
          label="Reason"
          hint={move.stepBack ? "Going back is recorded with your reason." : "Going ahead with open items is recorded with your reason and the items."}
          rows={3}
          error={ctl.errorOf("reason")}
          {...ctl.form.register("reason")}
        />
      ) : null}
      <div className="flex flex-wrap gap-3">
        {blocked ? null : (
          <Button type="submit" variant={move.stepBack ? "secondary" : "primary"} pending={ctl.pending} disabled={ctl.pending}>
            {move.stepBack ? `Go back to “${label}”` : `Move to “${label}”`}
          </Button>
        )}
        <Button type="button" variant="ghost" onClick={onCancel} disabled={ctl.pending}>
          Cancel
        </Button>
      </div>
    </ActionForm>
  );
}

function List({ title, items, icon }: { title: string; items: string[]; icon: React.ReactNode }) {
  if (!items.length) return null;
  return (
    <section className="space-y-2">
      <h4 className="font-semibold">{title}</h4>
      <ul className="space-y-1">
        {items.map((item) => (
          <li key={item} className="flex gap-2">
            {icon}
            <span>{item}</span>
          </li>
        ))}
      </ul>
    </section>
  );
}
