// The stages of a show and their dates, in the show's time zone.
import { CalendarDays, ClipboardCheck, ClipboardPen, PackageOpen, PenLine, Store } from "lucide-react";
import { formatDateRange, type DateInput } from "@/components/format/dates";

export type ShowDates = {
  timeZone: string;
  entryOpensAt: DateInput;
  entryClosesAt: DateInput;
  dropOffStartsAt: DateInput;
  dropOffEndsAt: DateInput;
  judgingStartsAt: DateInput;
  judgingEndsAt: DateInput;
  showOpensAt: DateInput;
  showClosesAt: DateInput;
  pickUpStartsAt: DateInput;
  pickUpEndsAt: DateInput;
};

export function stagesOf(show: ShowDates) {
  const tz = show.timeZone;
  return [
    { key: "entries", label: "Entries", icon: PenLine, when: formatDateRange(show.entryOpensAt, show.entryClosesAt, tz, { withTime: true }) },
    { key: "dropoff", label: "Drop-off", icon: ClipboardCheck, when: formatDateRange(show.dropOffStartsAt, show.dropOffEndsAt, tz, { withTime: true }) },
    { key: "judging", label: "Judging", icon: ClipboardPen, when: formatDateRange(show.judgingStartsAt, show.judgingEndsAt, tz) },
    { key: "show", label: "Show days", icon: Store, when: formatDateRange(show.showOpensAt, show.showClosesAt, tz) },
    { key: "pickup", label: "Pick-up", icon: PackageOpen, when: formatDateRange(show.pickUpStartsAt, show.pickUpEndsAt, tz, { withTime: true }) },
  ];
}

export function ShowDateList({ show, compact }: { show: ShowDates; compact?: boolean }) {
  return (
    <div>
    <dl className={compact ? "space-y-2" : "divide-y divide-line"}>
      {stagesOf(show).map((s) => (
        <div key={s.key} className={compact ? "flex gap-3" : "flex flex-col gap-1 py-3 sm:flex-row sm:gap-6"}>
          <dt className="flex w-36 shrink-0 items-center gap-2 font-semibold">
            <s.icon aria-hidden className="size-5 text-plum-500" />
            {s.label}
          </dt>
          <dd className={s.when ? "text-ink" : "text-ink-muted italic"}>{s.when ?? "Date to be announced"}</dd>
        </div>
      ))}
    </dl>
      {compact ? null : (
        <p className="pt-3 text-sm text-ink-muted">
          <CalendarDays aria-hidden className="mr-1 inline size-4 align-[-2px]" />
          Times are local to the show ({show.timeZone.replace(/_/g, " ")}).
        </p>
      )}
    </div>
  );
}
