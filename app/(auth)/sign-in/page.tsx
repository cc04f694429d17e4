// Sign in. ?next=/path returns there afterwards (same-site paths only); ?email= prefills.
import type { Metadata } from "next";
import Link from "next/link";
import { AlreadySignedIn } from "@/components/auth/already-signed-in";
import { AuthCard } from "@/components/auth/auth-card";
import { param, safeNext, withQuery } from "@/components/auth/safe-next";
import { SignInForm } from "@/components/auth/sign-in-form";
import { currentViewer } from "@/components/shell/viewer";
import { Alert } from "@/components/ui/alert";

export const metadata: Metadata = { title: "Sign in" };

type Props = { searchParams: Promise<Record<string, string | string[] | undefined>> };

export default async function SignInPage({ searchParams }: Props) {
  const sp = await searchParams;
  const next = safeNext(sp.next);
  const email = param(sp.email);
  const viewer = await currentViewer();
  return (
    <AuthCard
      title="Sign in"
      description="Enter your quilts, follow them through the show, and reach your show team’s pages."
      footer={
        <p>
          New to Ribbonry?{" "}
          <Link href={withQuery("/sign-up", { next: sp.next ? next : undefined, email })} className="inline-flex min-h-tap items-center font-semibold">
            Create an account
          </Link>
        </p>
      }
    >
      {viewer ? (
        <AlreadySignedIn name={viewer.name} email={viewer.email} next={next} expectedEmail={email} />
      ) : (
        <div className="space-y-5">
          {param(sp.reset) ? <Alert tone="success" title="Your password is changed. Sign in with the new one." /> : null}
          <SignInForm next={next} email={email} />
        </div>
      )}
    </AuthCard>
  );
}
