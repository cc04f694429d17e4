"use client";
// "Accept": grants the invited role; on success the action redirects to the role's area.
import { Check } from "lucide-react";
import { ActionForm, useActionForm } from "@/components/forms/action-form";
import { Button } from "@/components/ui/button";
import { tokenSchema } from "@/lib/schemas/show";
import { acceptInvitationAction } from "@/app/invitations/[token]/actions";

export function AcceptInvitationForm({ token, label }: { token: string; label: string }) {
  const ctl = useActionForm({
    schema: tokenSchema,
    defaultValues: { token },
    action: (values) => acceptInvitationAction(null, values),
  });
  return (
    <ActionForm controller={ctl} aria-label="Accept the invitation">
      <input type="hidden" {...ctl.form.register("token")} />
      <Button type="submit" size="lg" pending={ctl.pending} pendingLabel="Joining…" icon={<Check aria-hidden className="size-6" />}>
        {label}
      </Button>
    </ActionForm>
  );
}
