"use client";
// Sign in with e-mail and password (better-auth). On success better-auth sends the browser on to
// `next` itself (a full page load, so every server component sees the new session).
import Link from "next/link";
import { LogIn } from "lucide-react";
import { ActionForm, useActionForm } from "@/components/forms/action-form";
import { Button } from "@/components/ui/button";
import { TextField } from "@/components/ui/field";
import { authClient } from "@/lib/auth-client";
import { authFailure } from "./auth-result";
import { PasswordField } from "./password-field";
import { signInSchema } from "./schemas";
import { withQuery } from "./safe-next";

export function SignInForm({ next, email }: { next: string; email?: string }) {
  const ctl = useActionForm({
    schema: signInSchema,
    defaultValues: { email: email ?? "", password: "" },
    action: async ({ email, password }) => {
      const { error } = await authClient.signIn.email({ email, password, callbackURL: next });
      if (!error) return { ok: true, message: "Signed in. Taking you on…" };
      if (error.code === "EMAIL_NOT_VERIFIED") {
        const resent = await authClient.sendVerificationEmail({ email, callbackURL: withQuery("/verified", { next }) });
        return {
          ok: false,
          status: 403,
          message: "Your e-mail address isn't confirmed yet.",
          fieldErrors: {
            email: [
              resent.error
                ? "Please confirm your e-mail first — use the link we sent when you signed up."
                : "Please confirm your e-mail first — we just sent the link again.",
            ],
          },
        };
      }
      return authFailure(error);
    },
  });
  const { register } = ctl.form;

  return (
    <ActionForm controller={ctl} aria-label="Sign in">
      <TextField
        label="E-mail"
        type="email"
        autoComplete="email"
        inputMode="email"
        required
        error={ctl.errorOf("email")}
        {...register("email")}
      />
      <PasswordField label="Password" autoComplete="current-password" required error={ctl.errorOf("password")} {...register("password")} />
      <div className="flex flex-wrap items-center justify-between gap-3">
        <Button type="submit" size="lg" pending={ctl.pending} pendingLabel="Signing in…" icon={<LogIn aria-hidden className="size-5" />}>
          Sign in
        </Button>
        <Link href={withQuery("/forgot-password", { email: ctl.form.watch("email") || undefined })} className="inline-flex min-h-tap items-center font-semibold">
          Forgot your password?
        </Link>
      </div>
    </ActionForm>
  );
}
