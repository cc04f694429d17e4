// The judge's list in judging order: by session (the panel's day, then its name), then by
// category (the show's precedence, then code), then by entry number, with each category's
// progress. Pure, so it is unit-tested; the tablet and "next entry" both use this order.
import type { SessionEntry, SessionPayload } from "./local-db";

export type QueueCategory = { id: string; code: string; name: string; entries: SessionEntry[]; done: number };
export type QueueSession = { id: string; label: string; categories: QueueCategory[] };

const NO_SESSION = "";

/** "Thursday, March 11" for a panel's day (a plain date, so read in UTC). */
export function dayLabel(day: string): string {
  const d = new Date(`${day}T00:00:00Z`);
  if (Number.isNaN(d.getTime())) return day;
  return new Intl.DateTimeFormat("en-US", { weekday: "long", month: "long", day: "numeric", timeZone: "UTC" }).format(d);
}

export function groupQueue(session: Pick<SessionPayload, "me" | "categories">, entries: readonly SessionEntry[], isDone: (entryId: string) => boolean): QueueSession[] {
  const seats = [...session.me.seats].sort((a, b) => a.day.localeCompare(b.day) || a.panelName.localeCompare(b.panelName));
  const seatOrder = new Map(seats.map((s, i) => [s.panelId, i]));
  const cats = [...session.categories].sort((a, b) => {
    const sa = seatOrder.get(a.sessionId ?? NO_SESSION) ?? seats.length;
    const sb = seatOrder.get(b.sessionId ?? NO_SESSION) ?? seats.length;
    return sa - sb || (a.precedence ?? 0) - (b.precedence ?? 0) || a.code.localeCompare(b.code, "en", { numeric: true });
  });
  const groups: QueueSession[] = [];
  for (const cat of cats) {
    const list = entries.filter((e) => e.categoryId === cat.id).sort((a, b) => a.entryNumber - b.entryNumber);
    if (!list.length) continue;
    const sessionId = cat.sessionId && seatOrder.has(cat.sessionId) ? cat.sessionId : NO_SESSION;
    let group = groups.find((g) => g.id === sessionId);
    if (!group) {
      const seat = seats.find((s) => s.panelId === sessionId);
      group = { id: sessionId, label: seat ? [seat.panelName, dayLabel(seat.day), seat.room].filter(Boolean).join(" · ") : "Your session", categories: [] };
      groups.push(group);
    }
    group.categories.push({ id: cat.id, code: cat.code, name: cat.name, entries: list, done: list.filter((e) => isDone(e.id)).length });
  }
  return groups;
}

/** The entries in judging order, for "next entry". */
export function judgingOrder(session: Pick<SessionPayload, "me" | "categories">, entries: readonly SessionEntry[]): SessionEntry[] {
  return groupQueue(session, entries, () => false).flatMap((g) => g.categories.flatMap((c) => c.entries));
}
