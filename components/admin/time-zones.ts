// Time zone choices for a new show: the usual ones for our guilds first, then every IANA zone
// the server knows (the same list lib/schemas/show.ts validates against). Computed on the
// server and passed down, so browser and server never disagree about the list.
import "server-only";

const COMMON = [
  "America/New_York",
  "America/Chicago",
  "America/Denver",
  "America/Phoenix",
  "America/Los_Angeles",
  "America/Anchorage",
  "Pacific/Honolulu",
  "America/Halifax",
  "America/Toronto",
  "America/Winnipeg",
  "America/Edmonton",
  "America/Vancouver",
  "Europe/London",
  "Europe/Dublin",
  "Australia/Sydney",
  "Pacific/Auckland",
];

export type TimeZoneOptions = { common: string[]; all: string[] };

export function timeZoneOptions(): TimeZoneOptions {
  const all = Intl.supportedValuesOf("timeZone");
  const known = new Set(all);
  return { common: COMMON.filter((z) => known.has(z)), all };
}
