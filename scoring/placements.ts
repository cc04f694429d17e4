// Placing a ranked category: 1st, 2nd, 3rd and honorable mentions under minimum scores,
// category-size rules and the show's tie rule; what was not given and why. Pure: also runs in the
// browser. Ribbon colours are per-show settings, not here.
import { capitalise, checkDecimals, DEFAULT_DECIMALS, groupBy, keyOf, list, ordinal, type RankedEntry } from "./ranking";
import { formatScore } from "./score-sheets";

/** shareAndSkip: tied entries share the place and the next places are skipped ("1, 2, 2" → no 3rd);
 * shareNoSkip: the next entry takes the next place ("1, 2, 2, 3"); shareWithinCount: places are
 * not skipped but no more entries are placed than there are places, except all of a tie at the last
 * place ("1, 1, 2", "1, 2, 2", "1, 2, 3, 3"). */
export type TieRule = "shareAndSkip" | "shareNoSkip" | "shareWithinCount";
/** Categories with at most maxEntries entries get only this many places. */
export type SizeRule = { maxEntries: number; places: number };
/** How a category's places and honorable mentions are given. */
export type PlaceRules = {
  /** Places offered at most (default 3). */
  places?: number;
  /** Minimum score for each place ("at least"; assumes higher scores are better), 1st first; null or missing for none. */
  minimumScores?: readonly (number | null)[];
  sizeRules?: readonly SizeRule[];
  ties: TieRule;
  /** The judges' honorable mentions: their list, or how many go to the best unplaced kept entries. */
  honorableMentions?: { entryIds: readonly string[] } | { count: number };
  /** Minimum score for a counted honorable mention (not for the judges' own list). */
  honorableMentionMinimum?: number;
  /** Sorting-pass categories: only these entries are placed; the rest were set aside. */
  keptEntryIds?: readonly string[];
  /** Entries in the category for the size rules (default: every ranked entry given). */
  categorySize?: number;
  decimals?: number;
};
/** Why a place was not given. */
export type NotAwarded = { place: number; placeLabel: string; why: "minimum" | "tie" | "tooFewEntries"; text: string };
/** One entry's outcome. */
export type PlacedEntry = {
  entryId: string;
  label: string;
  rank: number | null;
  place: number | null;
  placeLabel: string | null;
  shared: boolean;
  honorableMention: boolean;
  text: string;
};
export type Placements = { placesOffered: number; entries: PlacedEntry[]; notAwarded: NotAwarded[]; notes: string[]; problems: string[] };

type Ranked = Pick<RankedEntry, "entryId" | "label" | "score" | "rank">;

/** Places offered in a category of `size` entries: the smallest size rule that covers it, capped by `places`. */
export function placesFor(size: number, places: number, sizeRules: readonly SizeRule[] = []): { places: number; rule: SizeRule | null } {
  const rule = [...sizeRules].sort((a, b) => a.maxEntries - b.maxEntries).find((r) => size <= r.maxEntries) ?? null;
  return { places: rule ? Math.min(places, rule.places) : places, rule };
}

function placeList(n: number): string {
  return n === 0 ? "no places" : `${list(Array.from({ length: n }, (_, i) => ordinal(i + 1)))} only`;
}

type PlaceState = { place: number; slots: number; awarded: Map<string, { place: number; shared: boolean }>; notAwarded: NotAwarded[]; ties: string[] };

const notAwarded = (place: number, why: NotAwarded["why"], text: string): NotAwarded => ({ place, placeLabel: ordinal(place), why, text });

function giveToGroup(state: PlaceState, group: Ranked[], rules: PlaceRules, offered: number) {
  const { place } = state;
  for (const e of group) state.awarded.set(e.entryId, { place, shared: group.length > 1 });
  state.slots += group.length;
  state.place += 1;
  if (group.length === 1) return;
  const tie = `${list(group.map((e) => e.label))} tied for ${ordinal(place)}`;
  state.ties.push(tie);
  if (rules.ties !== "shareAndSkip") return;
  for (let p = place + 1; p < place + group.length && p <= offered; p++) state.notAwarded.push(notAwarded(p, "tie", capitalise(`${tie}, so there is no ${ordinal(p)}.`)));
  state.place = place + group.length;
}

function morePlaces(state: PlaceState, rules: PlaceRules, offered: number): boolean {
  if (state.place > offered) return false;
  return rules.ties !== "shareWithinCount" || state.slots < offered;
}

function awardPlaces(groups: Ranked[][], rules: PlaceRules, offered: number, decimals: number, emptyWhy: string): PlaceState {
  const state: PlaceState = { place: 1, slots: 0, awarded: new Map(), notAwarded: [], ties: [] };
  let g = 0;
  while (morePlaces(state, rules, offered)) {
    const group = groups[g];
    const label = ordinal(state.place);
    const minimum = rules.minimumScores?.[state.place - 1];
    if (!group) {
      state.notAwarded.push(notAwarded(state.place, "tooFewEntries", `No ${label}: ${emptyWhy}.`));
    } else if (minimum !== null && minimum !== undefined && keyOf(group[0]!.score!, decimals) < keyOf(minimum, decimals)) {
      const best = `the best left, ${group[0]!.label}, has ${formatScore(group[0]!.score)}`;
      state.notAwarded.push(notAwarded(state.place, "minimum", `No entry reached the ${formatScore(minimum)}-point minimum for ${label} (${best}), so the ${label}-place ribbon is withheld.`));
    } else {
      giveToGroup(state, group, rules, offered);
      g += 1;
      continue;
    }
    // A place not given still uses up its ribbon under shareWithinCount.
    state.place += 1;
    state.slots += 1;
  }
  // Under shareWithinCount, ties can use up the last places' ribbons.
  for (let p = state.place; p <= offered; p++) state.notAwarded.push(notAwarded(p, "tie", capitalise(`${list(state.ties)}, so there is no ${ordinal(p)}.`)));
  return state;
}

function honorableMentions(rules: PlaceRules, eligibleGroups: Ranked[][], all: Ranked[], state: PlaceState, decimals: number): { ids: Set<string>; notes: string[]; problems: string[] } {
  const ids = new Set<string>();
  const notes: string[] = [];
  const problems: string[] = [];
  const hm = rules.honorableMentions;
  if (!hm) return { ids, notes, problems };
  if ("entryIds" in hm) {
    const byId = new Map(all.map((e) => [e.entryId, e]));
    for (const id of hm.entryIds) {
      const e = byId.get(id);
      const placed = state.awarded.get(id);
      if (!e) problems.push(`Entry ${id} is listed for an honorable mention but is not in this category.`);
      else if (placed) problems.push(`${capitalise(e.label)} already has ${ordinal(placed.place)} place, so it gets no honorable mention as well.`);
      else ids.add(id);
    }
    return { ids, notes, problems };
  }
  const minimum = rules.honorableMentionMinimum;
  for (const group of eligibleGroups) {
    if (ids.size >= hm.count) break;
    if (group.some((e) => state.awarded.has(e.entryId))) continue;
    if (minimum !== undefined && keyOf(group[0]!.score!, decimals) < keyOf(minimum, decimals)) break;
    if (ids.size + group.length > hm.count) notes.push(`${capitalise(list(group.map((e) => e.label)))} tied for the last honorable mention, so each gets one.`);
    for (const e of group) ids.add(e.entryId);
  }
  if (ids.size < hm.count) notes.push(`Only ${ids.size} of ${hm.count} honorable mentions were given: ${minimum !== undefined ? `no other kept entry reached ${formatScore(minimum)}` : "no other kept entry was left"}.`);
  return { ids, notes, problems };
}

function groupsByRank(entries: Ranked[]): Ranked[][] {
  const sorted = entries.filter((e) => e.rank !== null).sort((a, b) => a.rank! - b.rank!);
  return [...groupBy(sorted, (e) => String(e.rank)).values()];
}

function entryText(e: Ranked, kept: boolean, award: { place: number; shared: boolean } | undefined, hm: boolean): string {
  if (award) return `${ordinal(award.place)} place${award.shared ? " (shared)" : ""}.`;
  if (hm) return "Honorable mention.";
  if (!kept) return "Set aside in the sorting pass: no placement.";
  if (e.rank === null) return "Not ranked: no score yet.";
  return "No placement.";
}

/**
 * Places 1st, 2nd, 3rd… and honorable mentions in one ranked category (from rankCategory): places
 * go to ranks in order among the kept entries; a place whose minimum the next entry does not reach
 * is withheld and that entry is considered for the next place; ties share a place by `rules.ties`.
 * Entries come back in the order given.
 */
export function placeAwards(ranked: readonly Ranked[], rules: PlaceRules): Placements {
  const decimals = checkDecimals(rules.decimals ?? DEFAULT_DECIMALS);
  const all = [...ranked];
  const kept = rules.keptEntryIds ? new Set(rules.keptEntryIds) : null;
  const problems = [...(kept ?? [])].filter((id) => !all.some((e) => e.entryId === id)).map((id) => `Entry ${id} is on the kept list but not in this category.`);
  const eligible = all.filter((e) => e.score !== null && e.rank !== null && (!kept || kept.has(e.entryId)));
  const size = rules.categorySize ?? all.length;
  const base = rules.places ?? 3;
  const { places: offered, rule } = placesFor(size, base, rules.sizeRules);
  const notes: string[] = [];
  if (rule && offered < base) notes.push(`${size} ${size === 1 ? "entry" : "entries"} in the category: ${placeList(offered)} (the rule for ${rule.maxEntries} or fewer entries).`);
  const emptyWhy = kept ? `only ${eligible.length} kept ${eligible.length === 1 ? "entry" : "entries"} to place` : `only ${eligible.length} ranked ${eligible.length === 1 ? "entry" : "entries"} to place`;
  const groups = groupsByRank(eligible);
  const state = awardPlaces(groups, rules, offered, decimals, emptyWhy);
  const hm = honorableMentions(rules, groups, all, state, decimals);
  const entries = all.map((e): PlacedEntry => {
    const award = state.awarded.get(e.entryId);
    const isKept = !kept || kept.has(e.entryId);
    return {
      entryId: e.entryId, label: e.label, rank: e.rank, place: award?.place ?? null, placeLabel: award ? ordinal(award.place) : null,
      shared: award?.shared ?? false, honorableMention: hm.ids.has(e.entryId), text: entryText(e, isKept, award, hm.ids.has(e.entryId)),
    };
  });
  return { placesOffered: offered, entries, notAwarded: state.notAwarded, notes: [...notes, ...hm.notes], problems: [...problems, ...hm.problems] };
}
