// Choose a new password. better-auth sends people here as /reset-password?token=… from the
// e-mail link, or with ?error=INVALID_TOKEN when the link is expired or used.
import type { Metadata } from "next";
import Link from "next/link";
import { AuthCard } from "@/components/auth/auth-card";
import { ResetPasswordForm } from "@/components/auth/reset-password-form";
import { param } from "@/components/auth/safe-next";
import { Alert } from "@/components/ui/alert";
import { ButtonLink } from "@/components/ui/button";

export const metadata: Metadata = { title: "Choose a new password" };

type Props = { searchParams: Promise<Record<string, string | string[] | undefined>> };

export default async function ResetPasswordPage({ searchParams }: Props) {
  const sp = await searchParams;
  const token = param(sp.token);
  const error = param(sp.error);
  const footer = (
    <Link href="/sign-in" className="inline-flex min-h-tap items-center font-semibold">
      Back to sign in
    </Link>
  );

  if (error || !token) {
    return (
      <AuthCard title="This reset link doesn’t work" footer={footer}>
        <div className="space-y-4">
          <Alert tone="warning" title={error ? "The link has expired or was used already." : "This page opens from the link in a reset e-mail."}>
            Reset links work once, for an hour. Ask for a fresh one and use the newest e-mail.
          </Alert>
          <ButtonLink href="/forgot-password">Send me a new link</ButtonLink>
        </div>
      </AuthCard>
    );
  }

  return (
    <AuthCard title="Choose a new password" description="After saving, you’ll sign in again on every device." footer={footer}>
      <ResetPasswordForm token={token} />
    </AuthCard>
  );
}
