// What a judge or scribe may read, in one place: their panel scoping (the entries of their own
// sessions: the categories of the panels they sit on) and the released-fields filter (only the
// quilt facts the show releases, `show_settings.judge_fields`). The queue, the session, the sync
// answers, the judging page and the photo route all go through these two.
import "server-only";
import { and, eq, inArray, type SQL } from "drizzle-orm";
import type { Tx } from "@/db/client";
import { entries, judgingPanels, panelCategories, panelMembers, user } from "@/db/schema";
import { judgedEntries } from "@/db/queries/judged-entries";
import { formatSize } from "@/scoring/units";

type Reader = Pick<Tx, "select">;
export type PanelSeat = { panelId: string; panelName: string; day: string; room: string; role: "judge" | "scribe" };
export type ScoringRight = { name: string; categoryIds: Set<string>; panelIds: Set<string> };
export type JudgingScope = {
  seats: PanelSeat[];
  /** The judges this viewer scores for (themselves as judge; every judge of a panel they scribe for). */
  judges: Map<string, ScoringRight>;
  /** Every category of the panels the viewer sits on: their sessions. */
  categoryIds: string[];
};

/** The viewer's seats, the judges they score for and the categories of their sessions. */
export async function judgingScope(reader: Reader, showId: string, viewerId: string): Promise<JudgingScope> {
  const seats: PanelSeat[] = await reader
    .select({ panelId: judgingPanels.id, panelName: judgingPanels.name, day: judgingPanels.day, room: judgingPanels.room, role: panelMembers.role })
    .from(panelMembers)
    .innerJoin(judgingPanels, eq(judgingPanels.id, panelMembers.panelId))
    .where(and(eq(judgingPanels.showId, showId), eq(panelMembers.userId, viewerId)));
  const panelIds = seats.map((s) => s.panelId);
  const judges = new Map<string, ScoringRight>();
  if (!panelIds.length) return { seats, judges, categoryIds: [] };
  const [judgeRows, catRows] = await Promise.all([
    reader.select({ panelId: panelMembers.panelId, userId: panelMembers.userId, name: user.name }).from(panelMembers).innerJoin(user, eq(user.id, panelMembers.userId)).where(and(inArray(panelMembers.panelId, panelIds), eq(panelMembers.role, "judge"))),
    reader.select({ panelId: panelCategories.panelId, categoryId: panelCategories.categoryId }).from(panelCategories).where(inArray(panelCategories.panelId, panelIds)),
  ]);
  for (const seat of seats) {
    // A judge scores for themselves; a scribe for every judge on their panel.
    const forWhom = seat.role === "judge" ? judgeRows.filter((j) => j.panelId === seat.panelId && j.userId === viewerId) : judgeRows.filter((j) => j.panelId === seat.panelId);
    for (const j of forWhom) {
      const entry = judges.get(j.userId) ?? { name: j.name, categoryIds: new Set<string>(), panelIds: new Set<string>() };
      entry.panelIds.add(seat.panelId);
      for (const c of catRows.filter((c) => c.panelId === seat.panelId)) entry.categoryIds.add(c.categoryId);
      judges.set(j.userId, entry);
    }
  }
  return { seats, judges, categoryIds: [...new Set(catRows.map((c) => c.categoryId))] };
}

/** Entries of the viewer's sessions: the judged entries (db/queries/judged-entries.ts) in their categories. */
export function inSessions(showId: string, categoryIds: readonly string[]): SQL {
  return and(judgedEntries(showId), inArray(entries.categoryId, categoryIds.length ? [...categoryIds] : ["00000000-0000-0000-0000-000000000000"]))!;
}

/** The quilt's own facts a release may draw on; never a name, contact or guild. */
export const QUILT_FACTS = {
  title: entries.title,
  widthUm: entries.widthUm,
  lengthUm: entries.lengthUm,
  techniques: entries.techniques,
  quiltingMethod: entries.quiltingMethod,
  patternSource: entries.patternSource,
  patternName: entries.patternName,
  patternDesigner: entries.patternDesigner,
  statement: entries.statement,
  division: entries.division,
};
type QuiltFacts = { title: string; widthUm: number; lengthUm: number; techniques: string[]; quiltingMethod: string; patternSource: string; patternName: string; patternDesigner: string; statement: string; division: string };

/** The released fields' values and nothing else; a field the show doesn't release is absent. */
export type ReleasedFacts = { title?: string; widthUm?: number; lengthUm?: number; size?: string; techniques?: string[]; quiltingMethod?: string; pattern?: string; statement?: string; division?: string };

export function releasedFacts(fields: readonly string[], e: QuiltFacts): ReleasedFacts {
  return {
    ...(fields.includes("title") ? { title: e.title } : {}),
    ...(fields.includes("size") ? { widthUm: e.widthUm, lengthUm: e.lengthUm, size: formatSize(e.widthUm, e.lengthUm) } : {}),
    ...(fields.includes("techniques") ? { techniques: e.techniques } : {}),
    ...(fields.includes("quiltingMethod") ? { quiltingMethod: e.quiltingMethod } : {}),
    ...(fields.includes("pattern") ? { pattern: e.patternSource === "original" ? "Original design" : [e.patternName, e.patternDesigner && `by ${e.patternDesigner}`].filter(Boolean).join(" ") || "From a pattern" } : {}),
    ...(fields.includes("statement") ? { statement: e.statement } : {}),
    ...(fields.includes("division") ? { division: e.division } : {}),
  };
}
