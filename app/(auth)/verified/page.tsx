// Where the e-mail confirmation link lands (callbackURL "/verified"). better-auth signs the
// person in on success, or adds ?error=TOKEN_EXPIRED / INVALID_TOKEN / … when the link fails.
import type { Metadata } from "next";
import { ArrowRight, BadgeCheck } from "lucide-react";
import { AuthCard } from "@/components/auth/auth-card";
import { ResendVerificationForm } from "@/components/auth/resend-verification-form";
import { param, safeNext, withQuery } from "@/components/auth/safe-next";
import { currentViewer } from "@/components/shell/viewer";
import { Alert } from "@/components/ui/alert";
import { ButtonLink } from "@/components/ui/button";

export const metadata: Metadata = { title: "E-mail confirmed" };

type Props = { searchParams: Promise<Record<string, string | string[] | undefined>> };

export default async function VerifiedPage({ searchParams }: Props) {
  const sp = await searchParams;
  const error = param(sp.error);
  const next = safeNext(sp.next);
  const viewer = await currentViewer();

  if (error) {
    return (
      <AuthCard title="This confirmation link doesn’t work">
        <div className="space-y-5">
          <Alert tone="warning" title={error === "TOKEN_EXPIRED" ? "The link has expired." : "The link is not valid any more."}>
            Links work for a limited time and only for the newest e-mail. Ask for a new one below.
          </Alert>
          <ResendVerificationForm next={sp.next ? next : undefined} label="Send me a new link" />
        </div>
      </AuthCard>
    );
  }

  return (
    <AuthCard title="Your e-mail is confirmed" description={viewer ? `Welcome to Ribbonry, ${viewer.name}.` : "Thank you."}>
      <div className="space-y-5 text-center">
        <BadgeCheck aria-hidden className="mx-auto size-12 text-success-700" />
        {viewer ? (
          <>
            <p>You’re signed in and ready to go.</p>
            <ButtonLink href={next} size="lg" icon={<ArrowRight aria-hidden className="size-5" />}>
              {next === "/my" ? "Go to my entries" : "Continue"}
            </ButtonLink>
          </>
        ) : (
          <>
            <p>Sign in with your e-mail and password to continue.</p>
            <ButtonLink href={withQuery("/sign-in", { next })} size="lg">
              Sign in
            </ButtonLink>
          </>
        )}
      </div>
    </AuthCard>
  );
}
