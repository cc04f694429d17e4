// Shown when a page calls forbidden(): signed in, but without the role this area needs.
import { House, ShieldX } from "lucide-react";
import { BareShell } from "@/components/shell/bare-shell";
import { SignOutButton } from "@/components/shell/sign-out-button";
import { ButtonLink } from "@/components/ui/button";

export default function Forbidden() {
  return (
    <BareShell>
      <div className="max-w-prose space-y-4">
        <ShieldX aria-hidden className="size-12 text-plum-400" />
        <h1 className="text-4xl">This area is for another part of the show team</h1>
        <p className="text-lg text-ink-muted">
          You’re signed in, but your account doesn’t have the role this page needs — for example, only the show chair
          can manage a show, and only judges and scribes can open judging.
        </p>
        <p className="text-ink-muted">
          If you were invited, open the link in the invitation e-mail while signed in with the address it was sent to.
          Otherwise, ask the show chair to invite you.
        </p>
        <div className="flex flex-wrap items-start gap-3 pt-2">
          <ButtonLink href="/my">Go to my entries</ButtonLink>
          <ButtonLink href="/" variant="ghost" icon={<House aria-hidden className="size-5" />}>
            Home
          </ButtonLink>
          <SignOutButton label="Sign in as someone else" redirectTo="/sign-in" />
        </div>
      </div>
    </BareShell>
  );
}
