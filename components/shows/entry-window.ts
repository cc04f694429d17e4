// Whether a show is taking entries right now, from its dates and its stage.
import { toDate, type DateInput } from "@/components/format/dates";

export type EntryWindow = "open" | "not_yet" | "closed";

const PAST_ENTRIES = new Set(["entries_closed", "judging", "results_published", "archived"]);

export function entryWindow(
  show: { status: string; entryOpensAt: DateInput; entryClosesAt: DateInput },
  now: Date = new Date(),
): EntryWindow {
  const closes = toDate(show.entryClosesAt);
  // The chair may close entries early by moving the stage on; a passed closing date also closes.
  if (PAST_ENTRIES.has(show.status) || (closes && now >= closes)) return "closed";
  const opens = toDate(show.entryOpensAt);
  if (show.status !== "entries_open" || (opens && now < opens)) return "not_yet";
  return "open";
}
