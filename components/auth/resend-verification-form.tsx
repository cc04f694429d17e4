"use client";
// Send the e-mail confirmation link again (after sign-up, or when an old link has expired).
import { authClient } from "@/lib/auth-client";
import { authFailure } from "./auth-result";
import { EmailLinkForm } from "./email-link-form";
import { withQuery } from "./safe-next";

export function ResendVerificationForm({ email, next, label = "Send the link again" }: { email?: string; next?: string; label?: string }) {
  const send = async (email: string) => {
    const { error } = await authClient.sendVerificationEmail({ email, callbackURL: withQuery("/verified", { next }) });
    if (error) return authFailure(error);
    return { ok: true as const, message: `If ${email} is waiting for confirmation, a new link is on its way.` };
  };
  return (
    <EmailLinkForm email={email} ariaLabel="Send the confirmation link again" send={send} variant="secondary">
      {label}
    </EmailLinkForm>
  );
}
