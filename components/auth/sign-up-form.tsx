"use client";
// Create an account (better-auth). The confirmation link in the e-mail lands on /verified.
import { useRouter } from "next/navigation";
import { UserPlus } from "lucide-react";
import { ActionForm, useActionForm } from "@/components/forms/action-form";
import { Button } from "@/components/ui/button";
import { TextField } from "@/components/ui/field";
import { authClient } from "@/lib/auth-client";
import { authFailure } from "./auth-result";
import { PasswordField } from "./password-field";
import { PASSWORD_MIN, signUpSchema } from "./schemas";
import { withQuery } from "./safe-next";

export function SignUpForm({ next, email }: { next: string; email?: string }) {
  const router = useRouter();
  const ctl = useActionForm({
    schema: signUpSchema,
    defaultValues: { name: "", email: email ?? "", password: "" },
    action: async ({ name, email, password }) => {
      const { error } = await authClient.signUp.email({
        name,
        email,
        password,
        callbackURL: withQuery("/verified", { next }),
      });
      return error ? authFailure(error) : { ok: true, data: { email } };
    },
    successMessage: "Account created. Check your e-mail.",
    onSuccess: (result) => router.push(withQuery("/check-email", { email: result.data?.email, next })),
  });
  const { register } = ctl.form;

  return (
    <ActionForm controller={ctl} aria-label="Create an account">
      <TextField label="Your name" autoComplete="name" required error={ctl.errorOf("name")} {...register("name")} />
      <TextField
        label="E-mail"
        type="email"
        autoComplete="email"
        inputMode="email"
        required
        hint="We'll send a link to confirm it's yours."
        error={ctl.errorOf("email")}
        {...register("email")}
      />
      <PasswordField
        label="Password"
        autoComplete="new-password"
        required
        hint={`At least ${PASSWORD_MIN} characters. A short sentence is easy to remember.`}
        error={ctl.errorOf("password")}
        {...register("password")}
      />
      <Button type="submit" size="lg" pending={ctl.pending} pendingLabel="Creating your account…" icon={<UserPlus aria-hidden className="size-5" />}>
        Create my account
      </Button>
    </ActionForm>
  );
}
