import { describe, expect, it } from "vitest";
import { dayLabel, groupQueue, judgingOrder } from "@/components/judging/queue-groups";
import type { SessionEntry, SessionPayload } from "@/components/judging/local-db";

const seat = (panelId: string, panelName: string, day: string, room = "Hall") => ({ panelId, panelName, day, room, role: "judge" as const });
const cat = (id: string, code: string, precedence: number, sessionId: string | null) => ({ id, code, name: `Category ${code}`, method: "points" as const, sheetId: null, precedence, sessionId });
const entry = (id: string, entryNumber: number, categoryId: string): SessionEntry => ({ id, entryNumber, categoryId, photos: [] }) as unknown as SessionEntry;

const session: Pick<SessionPayload, "me" | "categories"> = {
  me: { id: "me", seats: [seat("p2", "Panel B", "2027-03-12"), seat("p1", "Panel A", "2027-03-11", "Fellowship Hall")] },
  categories: [cat("c20", "20", 2, "p2"), cat("c11", "11", 2, "p1"), cat("c10", "10", 1, "p1"), cat("c12", "12", 3, "p1")],
};
const entries = [entry("e101", 101, "c20"), entry("e105", 105, "c10"), entry("e102", 102, "c11"), entry("e103", 103, "c10"), entry("e104", 104, "c11")];

describe("the judge's list in judging order", () => {
  it("groups by session (day first), then category (precedence), then entry number", () => {
    const groups = groupQueue(session, entries, () => false);
    expect(groups.map((g) => g.label)).toEqual(["Panel A · Thursday, March 11 · Fellowship Hall", "Panel B · Friday, March 12 · Hall"]);
    expect(groups[0]!.categories.map((c) => [c.code, c.entries.map((e) => e.entryNumber)])).toEqual([
      ["10", [103, 105]],
      ["11", [102, 104]],
    ]);
    expect(groups[1]!.categories.map((c) => c.code)).toEqual(["20"]);
  });

  it("counts each category's submitted sheets", () => {
    const done = new Set(["e103", "e102", "e104"]);
    const groups = groupQueue(session, entries, (id) => done.has(id));
    expect(groups[0]!.categories.map((c) => `${c.done} of ${c.entries.length}`)).toEqual(["1 of 2", "2 of 2"]);
  });

  it("leaves out categories with no entry, and keeps a copy saved without sessions in one group", () => {
    const old = { me: session.me, categories: session.categories.map(({ precedence: _p, sessionId: _s, ...c }) => c) };
    const groups = groupQueue(old, entries, () => false);
    expect(groups).toHaveLength(1);
    expect(groups[0]!.label).toBe("Your session");
    expect(groups[0]!.categories.map((c) => c.code)).toEqual(["10", "11", "20"]);
  });

  it("gives the next entry in that order", () => {
    expect(judgingOrder(session, entries).map((e) => e.entryNumber)).toEqual([103, 105, 102, 104, 101]);
  });

  it("names a panel's day in words", () => {
    expect(dayLabel("2027-03-11")).toBe("Thursday, March 11");
  });
});
