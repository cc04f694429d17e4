// Shown on sign-in and sign-up when someone is already signed in: carry on, or switch account.
import { ArrowRight } from "lucide-react";
import { SignOutButton } from "@/components/shell/sign-out-button";
import { Alert } from "@/components/ui/alert";
import { ButtonLink } from "@/components/ui/button";

export function AlreadySignedIn({ name, email, next, expectedEmail }: { name: string; email: string; next: string; expectedEmail?: string }) {
  const other = expectedEmail && expectedEmail.toLowerCase() !== email.toLowerCase();
  return (
    <div className="space-y-4">
      <Alert tone={other ? "warning" : "info"} title={`You're signed in as ${name} (${email}).`}>
        {other ? `This link is meant for ${expectedEmail}. Sign out first to use that account.` : null}
      </Alert>
      <div className="flex flex-wrap gap-3">
        {other ? null : (
          <ButtonLink href={next} icon={<ArrowRight aria-hidden className="size-5" />}>
            Continue
          </ButtonLink>
        )}
        <SignOutButton label="Sign out to use another account" redirectTo={`/sign-in?next=${encodeURIComponent(next)}${expectedEmail ? `&email=${encodeURIComponent(expectedEmail)}` : ""}`} />
      </div>
    </div>
  );
}
