// Shown when a page calls unauthorized(): the page needs a signed-in person and there is none.
import { House, LockKeyhole } from "lucide-react";
import { BareShell } from "@/components/shell/bare-shell";
import { SignInLink } from "@/components/shell/sign-in-link";
import { ButtonLink } from "@/components/ui/button";

export default function Unauthorized() {
  return (
    <BareShell>
      <div className="max-w-prose space-y-4">
        <LockKeyhole aria-hidden className="size-12 text-plum-400" />
        <h1 className="text-4xl">Please sign in to see this page</h1>
        <p className="text-lg text-ink-muted">
          This page belongs to someone’s account or to a show team, so we need to know who you are first. After
          signing in you’ll come straight back here.
        </p>
        <div className="flex flex-wrap gap-3 pt-2">
          <SignInLink />
          <ButtonLink href="/sign-up" variant="secondary">
            Create an account
          </ButtonLink>
          <ButtonLink href="/" variant="ghost" icon={<House aria-hidden className="size-5" />}>
            Home
          </ButtonLink>
        </div>
      </div>
    </BareShell>
  );
}
