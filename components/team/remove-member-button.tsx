"use client";
// "Remove" with a confirm step in place: the first press asks, the second removes.
import { useState } from "react";
import { Trash2 } from "lucide-react";
import { ActionForm, useActionForm } from "@/components/forms/action-form";
import { Button } from "@/components/ui/button";
import { removeRoleSchema } from "@/lib/schemas/show";
import { removeMemberAction } from "@/app/(chair)/shows/[slug]/manage/actions";

export function RemoveMemberButton({ showSlug, roleId, who }: { showSlug: string; roleId: string; who: string }) {
  const [confirming, setConfirming] = useState(false);
  const ctl = useActionForm({
    schema: removeRoleSchema,
    defaultValues: { roleId },
    action: (values) => removeMemberAction(null, { ...values, showSlug }),
    onSuccess: () => setConfirming(false),
  });

  if (!confirming) {
    return (
      <Button variant="ghost" onClick={() => setConfirming(true)} icon={<Trash2 aria-hidden className="size-5" />}>
        Remove<span className="sr-only"> {who}</span>
      </Button>
    );
  }
  return (
    <ActionForm controller={ctl} aria-label={`Remove ${who}`} className="space-y-3">
      <input type="hidden" {...ctl.form.register("roleId")} />
      <p className="font-medium">Remove {who} from the team? They lose access to this show straight away.</p>
      <div className="flex flex-wrap gap-2">
        <Button type="submit" variant="danger" pending={ctl.pending} pendingLabel="Removing…" autoFocus>
          Yes, remove
        </Button>
        <Button variant="secondary" onClick={() => setConfirming(false)}>
          Keep
        </Button>
      </div>
    </ActionForm>
  );
}
