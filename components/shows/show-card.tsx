// A public show in a list: name, guild, venue, show days and whether it takes entries.
import Link from "next/link";
import { ArrowRight, MapPin } from "lucide-react";
import { formatDate, formatDateRange, type DateInput } from "@/components/format/dates";
import { entryWindow } from "./entry-window";
import { ShowStatusBadge } from "./show-status";

type Props = {
  show: {
    slug: string;
    name: string;
    guildName: string;
    venueName: string;
    timeZone: string;
    status: string;
    entryOpensAt: DateInput;
    entryClosesAt: DateInput;
    showOpensAt: DateInput;
    showClosesAt: DateInput;
  };
};

export function ShowCard({ show }: Props) {
  const days = formatDateRange(show.showOpensAt, show.showClosesAt, show.timeZone);
  const state = entryWindow(show);
  const closes = formatDate(show.entryClosesAt, show.timeZone);
  return (
    <article className="relative flex h-full flex-col gap-3 rounded-card border border-line bg-surface p-5 shadow-card transition-shadow focus-within:shadow-pop hover:shadow-pop">
      <div className="flex flex-wrap items-center gap-2">
        <ShowStatusBadge status={show.status} />
        {state === "open" && closes ? <span className="text-sm text-ink-muted">Entries close {closes}</span> : null}
      </div>
      <h3 className="text-2xl">
        {/* The stretched link makes the whole card one large target. */}
        <Link href={`/shows/${show.slug}`} className="text-ink no-underline after:absolute after:inset-0 after:content-[''] hover:underline">
          {show.name}
        </Link>
      </h3>
      <p className="text-ink-muted">{show.guildName}</p>
      <p className="flex items-start gap-2">
        <MapPin aria-hidden className="mt-0.5 size-5 shrink-0 text-plum-500" />
        <span>
          {show.venueName}
          {days ? <span className="block font-semibold">{days}</span> : null}
        </span>
      </p>
      <span aria-hidden className="mt-auto inline-flex items-center gap-1 pt-2 font-semibold text-brand">
        See the show <ArrowRight className="size-4" />
      </span>
    </article>
  );
}
