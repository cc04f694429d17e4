// Create an account. ?next= and ?email= as for sign-in (invitation links use both).
import type { Metadata } from "next";
import Link from "next/link";
import { AlreadySignedIn } from "@/components/auth/already-signed-in";
import { AuthCard } from "@/components/auth/auth-card";
import { param, safeNext, withQuery } from "@/components/auth/safe-next";
import { SignUpForm } from "@/components/auth/sign-up-form";
import { currentViewer } from "@/components/shell/viewer";

export const metadata: Metadata = { title: "Create an account" };

type Props = { searchParams: Promise<Record<string, string | string[] | undefined>> };

export default async function SignUpPage({ searchParams }: Props) {
  const sp = await searchParams;
  const next = safeNext(sp.next);
  const email = param(sp.email);
  const viewer = await currentViewer();
  return (
    <AuthCard
      title="Create your account"
      description="One account for every show on Ribbonry — as a quilter, a judge, a scribe or on the committee."
      footer={
        <p>
          Already have an account?{" "}
          <Link href={withQuery("/sign-in", { next: sp.next ? next : undefined, email })} className="inline-flex min-h-tap items-center font-semibold">
            Sign in
          </Link>
        </p>
      }
    >
      {viewer ? (
        <AlreadySignedIn name={viewer.name} email={viewer.email} next={next} expectedEmail={email} />
      ) : (
        <SignUpForm next={next} email={email} />
      )}
    </AuthCard>
  );
}
