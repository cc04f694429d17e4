// "Enter a quilt": the call to action on a show page, or why entries aren't open.
import Link from "next/link";
import { ArrowRight, CalendarClock, DoorClosed, Scissors } from "lucide-react";
import { formatDateTime, type DateInput } from "@/components/format/dates";
import { ButtonLink, buttonClasses } from "@/components/ui/button";
import { entryWindow } from "./entry-window";

type Props = {
  show: { slug: string; status: string; timeZone: string; entryOpensAt: DateInput; entryClosesAt: DateInput };
  signedIn: boolean;
  /** "Late fee of $10 per quilt from …", when one applies. */
  lateFeeNote?: string | null;
};

/** The button's place when entering isn't possible: it reads the same but does nothing. */
function DisabledEnter({ describedBy }: { describedBy: string }) {
  return (
    <span role="link" aria-disabled="true" aria-describedby={describedBy} className={buttonClasses({ size: "lg", className: "w-full" })}>
      <ArrowRight aria-hidden className="size-5" />
      <span>Enter a quilt</span>
    </span>
  );
}

export function EnterCallout({ show, signedIn, lateFeeNote }: Props) {
  const state = entryWindow(show);
  const opens = formatDateTime(show.entryOpensAt, show.timeZone);
  const closes = formatDateTime(show.entryClosesAt, show.timeZone);
  const enter = `/shows/${show.slug}/enter`;
  const href = signedIn ? enter : `/sign-up?next=${encodeURIComponent(enter)}`;

  return (
    <aside aria-labelledby="enter" className="h-fit rounded-card border-2 border-gold-400 bg-gold-50 p-5 shadow-card sm:p-6">
      {state === "open" ? (
        <div className="space-y-3">
          <Scissors aria-hidden className="size-8 text-plum-600" />
          <h2 id="enter" className="text-2xl">
            Enter a quilt
          </h2>
          <p>Entries are open{closes ? ` until ${closes}` : ""}.</p>
          {lateFeeNote ? <p className="text-sm">{lateFeeNote}</p> : null}
          <ButtonLink href={href} size="lg" className="w-full" icon={<ArrowRight aria-hidden className="size-5" />}>
            Enter a quilt
          </ButtonLink>
          {signedIn ? null : (
            <p className="text-sm text-ink-muted">
              You’ll make a free account first, so you can follow your quilt from drop-off to pick-up. Already have
              one? <Link href={`/sign-in?next=${encodeURIComponent(enter)}`}>Sign in</Link>.
            </p>
          )}
        </div>
      ) : state === "not_yet" ? (
        <div className="space-y-3">
          <CalendarClock aria-hidden className="size-8 text-plum-600" />
          <h2 id="enter" className="text-2xl">
            Entries open soon
          </h2>
          <p id="enter-why">{opens ? `Entries open on ${opens}.` : "The committee hasn’t opened entries yet."}</p>
          <DisabledEnter describedBy="enter-why" />
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
          <p id="enter-why">{closes ? `Entries closed on ${closes}; no more quilts can be entered.` : "This show is no longer taking entries."}</p>
          <DisabledEnter describedBy="enter-why" />
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
