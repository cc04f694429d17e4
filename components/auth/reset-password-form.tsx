"use client";
// Choose a new password with the token from the reset e-mail. Other sessions are signed out by
// the server (revokeSessionsOnPasswordReset), so the person signs in again afterwards.
import Link from "next/link";
import { useRouter } from "next/navigation";
import { KeyRound } from "lucide-react";
import { ActionForm, useActionForm } from "@/components/forms/action-form";
import { Button } from "@/components/ui/button";
import { authClient } from "@/lib/auth-client";
import { authFailure } from "./auth-result";
import { PasswordField } from "./password-field";
import { PASSWORD_MIN, resetPasswordSchema } from "./schemas";

export function ResetPasswordForm({ token }: { token: string }) {
  const router = useRouter();
  const ctl = useActionForm({
    schema: resetPasswordSchema,
    defaultValues: { password: "", confirm: "" },
    action: async ({ password }) => {
      const { error } = await authClient.resetPassword({ newPassword: password, token });
      if (!error) return { ok: true, message: "Your password is changed. Sign in with the new one." };
      return authFailure(error, {
        INVALID_TOKEN: {
          message: "This reset link has expired or was used already.",
          fieldErrors: { _form: ["Ask for a new link on the “Forgot your password?” page."] },
        },
      });
    },
    onSuccess: () => router.push("/sign-in?reset=1"),
  });
  return (
    <ActionForm controller={ctl} aria-label="Choose a new password">
      <PasswordField
        label="New password"
        autoComplete="new-password"
        required
        hint={`At least ${PASSWORD_MIN} characters.`}
        error={ctl.errorOf("password")}
        {...ctl.form.register("password")}
      />
      <PasswordField label="New password again" autoComplete="new-password" required error={ctl.errorOf("confirm")} {...ctl.form.register("confirm")} />
      <div className="flex flex-wrap items-center gap-4">
        <Button type="submit" size="lg" pending={ctl.pending} pendingLabel="Saving…" icon={<KeyRound aria-hidden className="size-5" />}>
          Save the new password
        </Button>
        {ctl.status?.tone === "error" ? (
          <Link href="/forgot-password" className="inline-flex min-h-tap items-center font-semibold">
            Get a new link
          </Link>
        ) : null}
      </div>
    </ActionForm>
  );
}
