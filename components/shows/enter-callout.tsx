// "Enter a quilt": the call to action on a show page, or why entries aren't open.
import Link from "next/link";
import { ArrowRight, CalendarClock, DoorClosed, Scissors } from "lucide-react";
import { formatDateTime, type DateInput } from "@/components/format/dates";
import { ButtonLink } from "@/components/ui/button";
import { entryWindow } from "./entry-window";

type Props = {
  show: { status: string; timeZone: string; entryOpensAt: DateInput; entryClosesAt: DateInput };
  signedIn: boolean;
};

export function EnterCallout({ show, signedIn }: Props) {
  const state = entryWindow(show);
  const opens = formatDateTime(show.entryOpensAt, show.timeZone);
  const closes = formatDateTime(show.entryClosesAt, show.timeZone);
  const href = signedIn ? "/my" : "/sign-up?next=/my";

  return (
    <aside aria-labelledby="enter" className="h-fit rounded-card border-2 border-gold-400 bg-gold-50 p-5 shadow-card sm:p-6">
      {state === "open" ? (
        <div className="space-y-3">
          <Scissors aria-hidden className="size-8 text-plum-600" />
          <h2 id="enter" className="text-2xl">
            Enter a quilt
          </h2>
          <p>Entries are open{closes ? ` until ${closes}` : ""}.</p>
          <ButtonLink href={href} size="lg" className="w-full" icon={<ArrowRight aria-hidden className="size-5" />}>
            Enter a quilt
          </ButtonLink>
          {signedIn ? null : (
            <p className="text-sm text-ink-muted">
              You’ll make a free account first, so you can follow your quilt from drop-off to pick-up. Already have
              one? <Link href="/sign-in?next=/my">Sign in</Link>.
            </p>
          )}
        </div>
      ) : state === "not_yet" ? (
        <div className="space-y-3">
          <CalendarClock aria-hidden className="size-8 text-plum-600" />
          <h2 id="enter" className="text-2xl">
            Entries open soon
          </h2>
          <p>{opens ? `Entries open on ${opens}.` : "The committee hasn’t opened entries yet."}</p>
          {signedIn ? null : (
            <ButtonLink href="/sign-up?next=/my" variant="secondary" className="w-full">
              Create your account now
            </ButtonLink>
          )}
        </div>
      ) : (
        <div className="space-y-3">
          <DoorClosed aria-hidden className="size-8 text-plum-600" />
          <h2 id="enter" className="text-2xl">
            Entries are closed
          </h2>
          <p>{closes ? `Entries closed on ${closes}.` : "This show is no longer taking entries."}</p>
          {signedIn ? (
            <ButtonLink href="/my" variant="secondary" className="w-full">
              See my entries
            </ButtonLink>
          ) : null}
        </div>
      )}
    </aside>
  );
}
