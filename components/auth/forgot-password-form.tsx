"use client";
// Ask for a password-reset link. The answer is the same whether or not the address has an
// account, so the form cannot be used to find out who is registered.
import { authClient } from "@/lib/auth-client";
import { authFailure } from "./auth-result";
import { EmailLinkForm } from "./email-link-form";

export function ForgotPasswordForm({ email }: { email?: string }) {
  const send = async (email: string) => {
    const { error } = await authClient.requestPasswordReset({ email, redirectTo: "/reset-password" });
    if (error) return authFailure(error);
    return { ok: true as const, message: `If ${email} has a Ribbonry account, a reset link is on its way. It works once, for an hour.` };
  };
  return (
    <EmailLinkForm email={email} ariaLabel="Reset your password" send={send} size="lg">
      Send me a reset link
    </EmailLinkForm>
  );
}
