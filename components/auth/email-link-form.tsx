"use client";
// One e-mail address in, a link sent out (a password reset, a new confirmation link). Each caller
// says what to send and what to answer; the answer never says whether the address has an account.
import { Send } from "lucide-react";
import type { ReactNode } from "react";
import { ActionForm, useActionForm } from "@/components/forms/action-form";
import { Button, type ButtonVariant } from "@/components/ui/button";
import { TextField } from "@/components/ui/field";
import type { ActionResult } from "@/lib/action";
import { emailOnlySchema } from "./schemas";

type Props = {
  email?: string;
  ariaLabel: string;
  send: (email: string) => Promise<ActionResult<unknown>>;
  children: ReactNode;
  variant?: ButtonVariant;
  size?: "md" | "lg";
};

export function EmailLinkForm({ email, ariaLabel, send, children, variant, size }: Props) {
  const ctl = useActionForm({ schema: emailOnlySchema, defaultValues: { email: email ?? "" }, action: ({ email }) => send(email) });
  return (
    <ActionForm controller={ctl} aria-label={ariaLabel}>
      <TextField label="E-mail" type="email" autoComplete="email" inputMode="email" required error={ctl.errorOf("email")} {...ctl.form.register("email")} />
      <Button type="submit" variant={variant} size={size} pending={ctl.pending} pendingLabel="Sending…" icon={<Send aria-hidden className="size-5" />}>
        {children}
      </Button>
    </ActionForm>
  );
}
