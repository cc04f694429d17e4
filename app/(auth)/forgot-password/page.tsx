// Ask for a password-reset e-mail.
import type { Metadata } from "next";
import Link from "next/link";
import { AuthCard } from "@/components/auth/auth-card";
import { ForgotPasswordForm } from "@/components/auth/forgot-password-form";
import { param } from "@/components/auth/safe-next";

export const metadata: Metadata = { title: "Forgot your password?" };

type Props = { searchParams: Promise<Record<string, string | string[] | undefined>> };

export default async function ForgotPasswordPage({ searchParams }: Props) {
  const email = param((await searchParams).email);
  return (
    <AuthCard
      title="Forgot your password?"
      description="Tell us your e-mail address and we’ll send a link to choose a new one."
      footer={
        <Link href="/sign-in" className="inline-flex min-h-tap items-center font-semibold">
          Back to sign in
        </Link>
      }
    >
      <ForgotPasswordForm email={email} />
    </AuthCard>
  );
}
