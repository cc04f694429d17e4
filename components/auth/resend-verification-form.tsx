"use client";
// Send the e-mail confirmation link again (after sign-up, or when an old link has expired).
import { Send } from "lucide-react";
import { ActionForm, useActionForm } from "@/components/forms/action-form";
import { Button } from "@/components/ui/button";
import { TextField } from "@/components/ui/field";
import { authClient } from "@/lib/auth-client";
import { authFailure } from "./auth-result";
import { emailOnlySchema } from "./schemas";
import { withQuery } from "./safe-next";

export function ResendVerificationForm({ email, next, label = "Send the link again" }: { email?: string; next?: string; label?: string }) {
  const ctl = useActionForm({
    schema: emailOnlySchema,
    defaultValues: { email: email ?? "" },
    action: async ({ email }) => {
      const { error } = await authClient.sendVerificationEmail({ email, callbackURL: withQuery("/verified", { next }) });
      if (error) return authFailure(error);
      return { ok: true, message: `If ${email} is waiting for confirmation, a new link is on its way.` };
    },
  });
  return (
    <ActionForm controller={ctl} aria-label="Send the confirmation link again">
      <TextField
        label="E-mail"
        type="email"
        autoComplete="email"
        inputMode="email"
        required
        error={ctl.errorOf("email")}
        {...ctl.form.register("email")}
      />
      <Button type="submit" variant="secondary" pending={ctl.pending} pendingLabel="Sending…" icon={<Send aria-hidden className="size-5" />}>
        {label}
      </Button>
    </ActionForm>
  );
}
