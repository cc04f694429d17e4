// Dates and times shown in the show's own time zone, whatever the viewer's device is set to.
// Stored times are UTC (db/schema/shows.ts); only display converts them.
export type DateInput = Date | string | number | null | undefined;

const LOCALE = "en-US";

const DATE: Intl.DateTimeFormatOptions = { weekday: "short", month: "short", day: "numeric", year: "numeric" };
const DATE_TIME: Intl.DateTimeFormatOptions = { ...DATE, hour: "numeric", minute: "2-digit", timeZoneName: "short" };
const TIME: Intl.DateTimeFormatOptions = { hour: "numeric", minute: "2-digit", timeZoneName: "short" };

const cache = new Map<string, Intl.DateTimeFormat>();

function formatter(timeZone: string, options: Intl.DateTimeFormatOptions): Intl.DateTimeFormat {
  const key = `${timeZone}|${JSON.stringify(options)}`;
  let f = cache.get(key);
  if (!f) {
    try {
      f = new Intl.DateTimeFormat(LOCALE, { ...options, timeZone });
    } catch {
      // An unknown zone should not take the page down; UTC is at least unambiguous.
      f = new Intl.DateTimeFormat(LOCALE, { ...options, timeZone: "UTC" });
    }
    cache.set(key, f);
  }
  return f;
}

export function toDate(d: DateInput): Date | null {
  if (d === null || d === undefined || d === "") return null;
  const date = d instanceof Date ? d : new Date(d);
  return Number.isNaN(date.getTime()) ? null : date;
}

/** "Sat, Mar 13, 2027" in the show's zone; null when there is no date. */
export function formatDate(d: DateInput, timeZone: string): string | null {
  const date = toDate(d);
  return date ? formatter(timeZone, DATE).format(date) : null;
}

/** "Sat, Mar 13, 2027, 9:00 AM CST" in the show's zone. */
export function formatDateTime(d: DateInput, timeZone: string): string | null {
  const date = toDate(d);
  return date ? formatter(timeZone, DATE_TIME).format(date) : null;
}

export function formatTime(d: DateInput, timeZone: string): string | null {
  const date = toDate(d);
  return date ? formatter(timeZone, TIME).format(date) : null;
}

/**
 * A span such as "Thu, Mar 11 – Sat, Mar 13, 2027" (or with times), collapsing what the two ends
 * share. Either end may be missing.
 */
export function formatDateRange(
  start: DateInput,
  end: DateInput,
  timeZone: string,
  opts: { withTime?: boolean } = {},
): string | null {
  const s = toDate(start);
  const e = toDate(end);
  const options = opts.withTime ? DATE_TIME : DATE;
  if (s && e) return formatter(timeZone, options).formatRange(s, e);
  if (s) return `From ${formatter(timeZone, options).format(s)}`;
  if (e) return `Until ${formatter(timeZone, options).format(e)}`;
  return null;
}

/** For <time dateTime>: the instant in ISO 8601 (UTC). */
export function isoDateTime(d: DateInput): string | undefined {
  return toDate(d)?.toISOString();
}
