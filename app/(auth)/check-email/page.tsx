// After sign-up: "we sent you a link". In development the mail catcher's address is shown,
// since no real mail leaves the machine.
import type { Metadata } from "next";
import Link from "next/link";
import { MailCheck } from "lucide-react";
import { AuthCard } from "@/components/auth/auth-card";
import { ResendVerificationForm } from "@/components/auth/resend-verification-form";
import { param, safeNext, withQuery } from "@/components/auth/safe-next";
import { Alert } from "@/components/ui/alert";
import { env } from "@/lib/env";

export const metadata: Metadata = { title: "Check your e-mail" };

type Props = { searchParams: Promise<Record<string, string | string[] | undefined>> };

function localMailCatcher(): string | null {
  const host = new URL(env.MAIL_WEB_URL).hostname;
  return host === "127.0.0.1" || host === "localhost" || host === "[::1]" ? env.MAIL_WEB_URL : null;
}

export default async function CheckEmailPage({ searchParams }: Props) {
  const sp = await searchParams;
  const email = param(sp.email);
  const next = sp.next ? safeNext(sp.next) : undefined;
  const catcher = localMailCatcher();
  return (
    <AuthCard
      title="Check your e-mail"
      description={
        <p>
          We sent a link to {email ? <strong className="break-all text-ink">{email}</strong> : "your address"}. Open it to
          confirm the address is yours, and you’ll be signed in.
        </p>
      }
      footer={
        <Link href={withQuery("/sign-in", { next, email })} className="inline-flex min-h-tap items-center font-semibold">
          Already confirmed? Sign in
        </Link>
      }
    >
      <div className="space-y-5">
        <div className="flex gap-3">
          <MailCheck aria-hidden className="size-7 shrink-0 text-plum-500" />
          <ul className="list-disc space-y-1 pl-4 text-ink-muted">
            <li>It can take a minute or two. Look in spam or “promotions” too.</li>
            <li>If you already had an account with this address, we didn’t make a second one — sign in instead, or reset your password.</li>
          </ul>
        </div>
        {catcher ? (
          <Alert tone="info" title="Running Ribbonry on this computer?">
            No real mail is sent in development. Open the mail catcher at{" "}
            <a href={catcher} target="_blank" rel="noreferrer">
              {catcher}
            </a>{" "}
            to find the message.
          </Alert>
        ) : null}
        <ResendVerificationForm email={email} next={next} />
      </div>
    </AuthCard>
  );
}
