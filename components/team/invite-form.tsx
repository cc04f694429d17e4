"use client";
// The chair invites a judge, scribe or intake volunteer by e-mail.
import { UserPlus } from "lucide-react";
import { ActionForm, useActionForm } from "@/components/forms/action-form";
import { Button } from "@/components/ui/button";
import { SelectField, TextField } from "@/components/ui/field";
import { inviteSchema, ROLE_LABELS, STAFF_ROLES } from "@/lib/schemas/show";
import { inviteAction } from "@/app/(chair)/shows/[slug]/manage/actions";

const ROLE_HINTS: Record<(typeof STAFF_ROLES)[number], string> = {
  judge: "scores quilts blind",
  scribe: "writes for a judge",
  intake: "checks quilts in and out",
};

export function InviteForm({ showSlug }: { showSlug: string }) {
  const ctl = useActionForm({
    schema: inviteSchema,
    defaultValues: { email: "", role: "judge" },
    action: (values) => inviteAction(null, { ...values, showSlug }),
    resetOnSuccess: true,
  });
  const { register } = ctl.form;
  return (
    <ActionForm controller={ctl} aria-labelledby="invite">
      <div className="grid gap-5 sm:grid-cols-[1fr_16rem]">
        <TextField label="E-mail" type="email" inputMode="email" autoComplete="off" required error={ctl.errorOf("email")} {...register("email")} />
        <SelectField label="Role" required error={ctl.errorOf("role")} {...register("role")}>
          {STAFF_ROLES.map((r) => (
            <option key={r} value={r}>
              {ROLE_LABELS[r]} — {ROLE_HINTS[r]}
            </option>
          ))}
        </SelectField>
      </div>
      <Button type="submit" pending={ctl.pending} pendingLabel="Sending…" icon={<UserPlus aria-hidden className="size-5" />}>
        Send invitation
      </Button>
    </ActionForm>
  );
}
