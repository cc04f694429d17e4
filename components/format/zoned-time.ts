// A wall-clock time in a show's IANA zone ("YYYY-MM-DDTHH:mm", what <input type="datetime-local">
// gives) ⇄ the UTC instant we store. Intl only, no React, no libraries: runs on server and browser.
//
// Daylight-saving edges follow one rule (the "compatible" rule of JavaScript's Temporal proposal):
//   - a time that never happens (the hour skipped when clocks go forward) is read with the offset
//     in force just before the change, so it lands that many minutes later: 02:30 on the spring
//     change in America/Chicago is 03:30 CDT (08:30 UTC);
//   - a time that happens twice (the hour repeated when clocks go back) is the earlier of the two:
//     01:30 on the autumn change in America/Chicago is 01:30 CDT (06:30 UTC), not CST.

const LOCAL_INPUT = /^(\d{4})-(\d{2})-(\d{2})T(\d{2}):(\d{2})$/;
const HOUR_MS = 3_600_000;

const formatters = new Map<string, Intl.DateTimeFormat>();

function formatterFor(timeZone: string): Intl.DateTimeFormat {
  let f = formatters.get(timeZone);
  if (!f) {
    f = new Intl.DateTimeFormat("en-US", {
      timeZone,
      hourCycle: "h23",
      year: "numeric",
      month: "2-digit",
      day: "2-digit",
      hour: "2-digit",
      minute: "2-digit",
      second: "2-digit",
    });
    formatters.set(timeZone, f);
  }
  return f;
}

/** True when Intl knows the zone. */
export function isKnownTimeZone(timeZone: string): boolean {
  try {
    formatterFor(timeZone);
    return true;
  } catch {
    return false;
  }
}

type Wall = { year: number; month: number; day: number; hour: number; minute: number; second: number };

function wallClock(instantMs: number, timeZone: string): Wall {
  const parts = formatterFor(timeZone).formatToParts(new Date(instantMs));
  const get = (type: Intl.DateTimeFormatPartTypes) => Number(parts.find((p) => p.type === type)?.value ?? NaN);
  return { year: get("year"), month: get("month"), day: get("day"), hour: get("hour") % 24, minute: get("minute"), second: get("second") };
}

/** The zone's offset from UTC at an instant, in milliseconds (Chicago in January: −6 h). */
export function zoneOffsetMs(instant: Date | number, timeZone: string): number {
  const ms = typeof instant === "number" ? instant : instant.getTime();
  const whole = Math.floor(ms / 1000) * 1000; // the wall clock is read to the second
  const w = wallClock(whole, timeZone);
  return Date.UTC(w.year, w.month - 1, w.day, w.hour, w.minute, w.second) - whole;
}

/** Parses "YYYY-MM-DDTHH:mm" into its fields, or null when it isn't a real calendar time. */
export function parseLocalInput(value: string): Omit<Wall, "second"> | null {
  const m = LOCAL_INPUT.exec(value.trim());
  if (!m) return null;
  const [year, month, day, hour, minute] = m.slice(1).map(Number) as [number, number, number, number, number];
  if (month < 1 || month > 12 || hour > 23 || minute > 59 || day < 1) return null;
  const daysInMonth = new Date(Date.UTC(year, month, 0)).getUTCDate();
  if (day > daysInMonth) return null;
  return { year, month, day, hour, minute };
}

/**
 * "2027-03-13T09:00" in `timeZone` → the UTC instant; null for a malformed value. Skipped and
 * repeated daylight-saving hours follow the rule at the top of this file.
 */
export function zonedInputToUtc(value: string, timeZone: string): Date | null {
  const wall = parseLocalInput(value);
  if (!wall) return null;
  const asUtc = Date.UTC(wall.year, wall.month - 1, wall.day, wall.hour, wall.minute);
  // Offsets a day either side cover the one change that can be near this time.
  const before = zoneOffsetMs(asUtc - 24 * HOUR_MS, timeZone);
  const after = zoneOffsetMs(asUtc + 24 * HOUR_MS, timeZone);
  const matches = [...new Set([before, after, zoneOffsetMs(asUtc, timeZone)])]
    .map((offset) => asUtc - offset)
    .filter((t) => utcToZonedInput(new Date(t), timeZone) === value.trim())
    .sort((a, b) => a - b);
  // Repeated hour: the earlier instant. Skipped hour: no match; use the offset before the change.
  return new Date(matches[0] ?? asUtc - before);
}

/** A UTC instant → "YYYY-MM-DDTHH:mm" on the wall clock of `timeZone`; "" for no date. */
export function utcToZonedInput(instant: Date | string | null | undefined, timeZone: string): string {
  if (instant === null || instant === undefined || instant === "") return "";
  const ms = new Date(instant).getTime();
  if (Number.isNaN(ms)) return "";
  const w = wallClock(ms, timeZone);
  const pad = (n: number, width = 2) => String(n).padStart(width, "0");
  return `${pad(w.year, 4)}-${pad(w.month)}-${pad(w.day)}T${pad(w.hour)}:${pad(w.minute)}`;
}
