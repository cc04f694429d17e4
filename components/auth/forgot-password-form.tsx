"use client";
// Ask for a password-reset link. The answer is the same whether or not the address has an
// account, so the form cannot be used to find out who is registered.
import { Send } from "lucide-react";
import { ActionForm, useActionForm } from "@/components/forms/action-form";
import { Button } from "@/components/ui/button";
import { TextField } from "@/components/ui/field";
import { authClient } from "@/lib/auth-client";
import { authFailure } from "./auth-result";
import { emailOnlySchema } from "./schemas";

export function ForgotPasswordForm({ email }: { email?: string }) {
  const ctl = useActionForm({
    schema: emailOnlySchema,
    defaultValues: { email: email ?? "" },
    action: async ({ email }) => {
      const { error } = await authClient.requestPasswordReset({ email, redirectTo: "/reset-password" });
      if (error) return authFailure(error);
      return { ok: true, message: `If ${email} has a Ribbonry account, a reset link is on its way. It works once, for an hour.` };
    },
  });
  return (
    <ActionForm controller={ctl} aria-label="Reset your password">
      <TextField
        label="E-mail"
        type="email"
        autoComplete="email"
        inputMode="email"
        required
        error={ctl.errorOf("email")}
        {...ctl.form.register("email")}
      />
      <Button type="submit" size="lg" pending={ctl.pending} pendingLabel="Sending…" icon={<Send aria-hidden className="size-5" />}>
        Send me a reset link
      </Button>
    </ActionForm>
  );
}
