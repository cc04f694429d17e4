// Ranking a category: each entry's totals from several judges (mean, median, spread, SD), a
// severity-adjusted score, standard competition ranks ("1224"), a chain of tie-breaks, and placing
// 1st, 2nd, 3rd and honorable mentions under minimum scores, category-size rules and tie rules.
// Pure: also runs in the browser. Ribbon colours are per-show settings, not here.
//
// Equal scores: two values count as equal when they agree to `decimals` places (default 9), i.e.
// both round to the same integer number of 10^-9. That absorbs float drift (an average of thirds
// computed two ways) and, being a function of each value alone, keeps ties transitive. Pass
// decimals: 2 to tie entries whose scores read the same as shown.
import { formatScore } from "./score-sheets";

/** Which way is better: higher totals (the usual) or lower values (an elimination order). */
export type Direction = "higherIsBetter" | "lowerIsBetter";
/** One judge's sheet total for one entry. */
export type JudgeTotal = { entryId: string; judgeId: string; total: number };
/** Plain statistics of one entry's totals; sampleSd is null with fewer than two totals. */
export type ScoreSummary = { count: number; mean: number | null; median: number | null; spread: number | null; sampleSd: number | null };
/** An entry's totals and their statistics. */
export type EntrySummary = ScoreSummary & { entryId: string; totals: { judgeId: string; total: number }[] };
/** Which SD standardises a judge's totals (default population: the judge's entries in the category are all there is). */
export type SeverityOptions = { sd?: "population" | "sample" };
/** A judge's mean and SD within the category; flat when the SD is 0 (one entry, or the same total for all). */
export type JudgeSeverity = { judgeId: string; count: number; mean: number; sd: number; flat: boolean };
/** An entry's severity-adjusted score: the mean of its z-scores over the judges who scored it. */
export type AdjustedEntry = { entryId: string; z: number; byJudge: { judgeId: string; z: number }[] };
export type SeverityResult = { entries: AdjustedEntry[]; judges: JudgeSeverity[]; notes: string[] };

/** An entry to rank: its score (null when not scored) and the values its tie-breaks read. */
export type RankCandidate = {
  entryId: string;
  /** How messages name the entry, e.g. "entry 12" (default "entry <entryId>"). */
  label?: string;
  score: number | null;
  tieBreakValues?: Readonly<Record<string, number | null | undefined>>;
};
/** One link of the tie-break chain: a value per entry (missing counts as worst) or the chair's recorded order. */
export type TieBreak =
  | { kind: "value"; key: string; label: string; direction: Direction }
  | { kind: "order"; label: string; entryIds: readonly string[] };
export type RankOptions = { direction?: Direction; decimals?: number };
/** An entry's place in the ranking, with plain words saying how ties were settled. */
export type RankedEntry = {
  entryId: string;
  label: string;
  score: number | null;
  /** Rank after the tie-break chain, "1224" style; null when not scored. */
  rank: number | null;
  /** Rank on the score alone. */
  scoreRank: number | null;
  /** "1", "=2" when still shared after every tie-break, "—" when not ranked. */
  displayRank: string;
  tied: boolean;
  /** Label of the tie-break that finally separated this entry from those tied with it on score. */
  decidedBy: string | null;
  explanation: string;
};

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

// ---------------------------------------------------------------------------------------------
// Small helpers

const DEFAULT_DECIMALS = 9;

function keyOf(x: number, decimals: number): number {
  if (!Number.isFinite(x)) throw new RangeError(`A score must be a number (got ${x}).`);
  return Math.round(x * 10 ** decimals);
}

function checkDecimals(decimals: number): number {
  if (!Number.isInteger(decimals) || decimals < 0 || decimals > 12) throw new RangeError("decimals must be a whole number from 0 to 12.");
  return decimals;
}

/** 1 → "1st", 2 → "2nd", 11 → "11th", 23 → "23rd". */
export function ordinal(n: number): string {
  const tens = n % 100;
  const suffix = tens >= 11 && tens <= 13 ? "th" : ({ 1: "st", 2: "nd", 3: "rd" } as Record<number, string>)[n % 10] ?? "th";
  return `${n}${suffix}`;
}

const capitalise = (text: string) => text.charAt(0).toUpperCase() + text.slice(1);

function list(items: string[]): string {
  if (items.length <= 1) return items[0] ?? "";
  return `${items.slice(0, -1).join(", ")} and ${items[items.length - 1]}`;
}

const ascending = (xs: readonly number[]) => [...xs].sort((a, b) => a - b);
// Summing in sorted order makes the mean depend only on the set of totals, not their order.
const meanOf = (sorted: readonly number[]) => sorted.reduce((s, x) => s + x, 0) / sorted.length;

function groupBy<T>(items: readonly T[], key: (t: T) => string): Map<string, T[]> {
  const out = new Map<string, T[]>();
  for (const item of items) out.set(key(item), [...(out.get(key(item)) ?? []), item]);
  return out;
}

function checkSheets(sheets: readonly JudgeTotal[]) {
  const seen = new Set<string>();
  for (const s of sheets) {
    if (!Number.isFinite(s.total)) throw new RangeError(`Judge ${s.judgeId}'s total for entry ${s.entryId} is not a number.`);
    const pair = `${s.judgeId}\u0000${s.entryId}`;
    if (seen.has(pair)) throw new RangeError(`Judge ${s.judgeId} has two totals for entry ${s.entryId}; keep one.`);
    seen.add(pair);
  }
}

// ---------------------------------------------------------------------------------------------
// Statistics of judges' totals

/** Mean, median (mean of the middle two for an even count), spread (max − min) and sample SD. */
export function summariseScores(totals: readonly number[]): ScoreSummary {
  const xs = ascending(totals);
  const n = xs.length;
  if (n === 0) return { count: 0, mean: null, median: null, spread: null, sampleSd: null };
  const mean = meanOf(xs);
  const mid = Math.floor(n / 2);
  const median = n % 2 ? xs[mid]! : (xs[mid - 1]! + xs[mid]!) / 2;
  const sampleSd = n < 2 ? null : Math.sqrt(xs.reduce((s, x) => s + (x - mean) ** 2, 0) / (n - 1));
  return { count: n, mean, median, spread: xs[n - 1]! - xs[0]!, sampleSd };
}

/** Each entry's judges' totals and their statistics, entries in first-seen order. Throws on a judge's second total for an entry. */
export function summariseEntries(sheets: readonly JudgeTotal[]): EntrySummary[] {
  checkSheets(sheets);
  return [...groupBy(sheets, (s) => s.entryId)].map(([entryId, rows]) => ({
    entryId,
    totals: rows.map((r) => ({ judgeId: r.judgeId, total: r.total })),
    ...summariseScores(rows.map((r) => r.total)),
  }));
}

function judgeSeverity(judgeId: string, totals: number[], sd: "population" | "sample"): JudgeSeverity {
  const xs = ascending(totals);
  const mean = meanOf(xs);
  const squares = xs.reduce((s, x) => s + (x - mean) ** 2, 0);
  const divisor = sd === "sample" ? xs.length - 1 : xs.length;
  const value = divisor > 0 ? Math.sqrt(squares / divisor) : 0;
  return { judgeId, count: xs.length, mean, sd: value, flat: value === 0 };
}

/**
 * Severity-adjusted scores for ONE category: each judge's totals are standardised within the
 * category (z = (total − judge's mean) / judge's SD), then each entry's z-scores are averaged.
 * A harsh or generous judge then weighs the same as the others. A judge whose SD is 0 (one entry,
 * or the same total for all) gives z = 0 to each of their entries: they add no order.
 */
export function severityAdjusted(sheets: readonly JudgeTotal[], opts: SeverityOptions = {}): SeverityResult {
  checkSheets(sheets);
  const sdKind = opts.sd ?? "population";
  const judges = [...groupBy(sheets, (s) => s.judgeId)].map(([id, rows]) => judgeSeverity(id, rows.map((r) => r.total), sdKind));
  const byId = new Map(judges.map((j) => [j.judgeId, j]));
  const zOf = (s: JudgeTotal) => {
    const j = byId.get(s.judgeId)!;
    return j.flat ? 0 : (s.total - j.mean) / j.sd;
  };
  const entries = [...groupBy(sheets, (s) => s.entryId)].map(([entryId, rows]) => {
    const byJudge = rows.map((r) => ({ judgeId: r.judgeId, z: zOf(r) }));
    return { entryId, z: meanOf(ascending(byJudge.map((b) => b.z))), byJudge };
  });
  const notes = judges.filter((j) => j.flat).map((j) => j.count === 1
    ? `Judge ${j.judgeId} scored only one entry in this category, so their total doesn't change the order after adjustment.`
    : `Judge ${j.judgeId} gave every entry in this category the same total (${formatScore(j.mean)}), so their totals don't change the order after adjustment.`);
  return { entries, judges, notes };
}

/** For a "more judges ranked it first" tie-break: per entry, how many judges gave it their top total in the category (ties count for each). */
export function firstPlaceVotes(sheets: readonly JudgeTotal[], decimals = DEFAULT_DECIMALS): Record<string, number> {
  checkSheets(sheets);
  const votes: Record<string, number> = {};
  for (const s of sheets) votes[s.entryId] = 0;
  for (const rows of groupBy(sheets, (s) => s.judgeId).values()) {
    const best = Math.max(...rows.map((r) => keyOf(r.total, decimals)));
    for (const r of rows) if (keyOf(r.total, decimals) === best) votes[r.entryId]! += 1;
  }
  return votes;
}

// ---------------------------------------------------------------------------------------------
// Ranks

/**
 * Standard competition ranking ("1224"): equal values share the best rank and the next rank
 * skips, so each rank is 1 + the number of strictly better values. Ranks come back in input order.
 */
export function competitionRanks(values: readonly number[], direction: Direction = "higherIsBetter", opts: { decimals?: number } = {}): number[] {
  const decimals = checkDecimals(opts.decimals ?? DEFAULT_DECIMALS);
  const sign = direction === "higherIsBetter" ? -1 : 1;
  const keys = values.map((v) => sign * keyOf(v, decimals));
  const order = keys.map((_, i) => i).sort((a, b) => keys[a]! - keys[b]!);
  const ranks = new Array<number>(values.length);
  order.forEach((index, position) => {
    const previous = order[position - 1];
    ranks[index] = previous !== undefined && keys[previous] === keys[index] ? ranks[previous]! : position + 1;
  });
  return ranks;
}

type Candidate = { entry: RankCandidate; label: string; index: number; scoreKey: number; goodness: number[] };

/** How good an entry is on one tie-break: bigger is better; missing is worst. */
function stepGoodness(step: TieBreak, e: RankCandidate, decimals: number): number {
  if (step.kind === "order") {
    const at = step.entryIds.indexOf(e.entryId);
    return at < 0 ? -Infinity : -at;
  }
  const v = e.tieBreakValues?.[step.key];
  if (v === null || v === undefined || !Number.isFinite(v)) return -Infinity;
  return (step.direction === "higherIsBetter" ? 1 : -1) * keyOf(v, decimals);
}

function stepValueText(step: TieBreak, e: RankCandidate): string {
  if (step.kind === "order") {
    const at = step.entryIds.indexOf(e.entryId);
    return at < 0 ? "not listed" : `listed ${ordinal(at + 1)}`;
  }
  const v = e.tieBreakValues?.[step.key];
  return v === null || v === undefined || !Number.isFinite(v) ? "none recorded" : formatScore(v);
}

function compareCandidates(a: Candidate, b: Candidate): number {
  if (a.scoreKey !== b.scoreKey) return b.scoreKey - a.scoreKey;
  for (let i = 0; i < a.goodness.length; i++) {
    const [x, y] = [a.goodness[i]!, b.goodness[i]!];
    if (x !== y) return x > y ? -1 : 1;
  }
  return 0;
}

function explainTie(c: Candidate, scoreGroup: Candidate[], chain: readonly TieBreak[], rank: number): { decidedBy: string | null; explanation: string } {
  const parts = [`Tied on ${formatScore(c.entry.score)} with ${list(scoreGroup.filter((o) => o !== c).map((o) => o.label))}.`];
  let group = scoreGroup;
  let decidedBy: string | null = null;
  chain.forEach((step, i) => {
    if (group.length === 1) return;
    const values = group.map((o) => `${o.label} ${stepValueText(step, o.entry)}`);
    if (group.every((o) => o.goodness[i] === group[0]!.goodness[i])) {
      parts.push(`${step.label}: no difference (${values.join(", ")}).`);
      return;
    }
    parts.push(`${step.label}: ${values.join(", ")}.`);
    group = group.filter((o) => o.goodness[i] === c.goodness[i]);
    if (group.length === 1) decidedBy = step.label;
  });
  if (decidedBy) parts.push(`${decidedBy} decided its place: ${ordinal(rank)}.`);
  else parts.push(`Still tied with ${list(group.filter((o) => o !== c).map((o) => o.label))} after every tie-break, so they share ${ordinal(rank)}.`);
  return { decidedBy, explanation: parts.join(" ") };
}

/**
 * Ranks a category: by score, then the tie-break chain in order for entries tied on score; entries
 * still tied after the chain share the rank ("1224"). An entry without a value for a tie-break (or
 * not on the chair's order list) counts as worst on it. Unscored entries come last with rank null.
 * Returns entries best first (ties in input order).
 */
export function rankCategory(entries: readonly RankCandidate[], tieBreaks: readonly TieBreak[], opts: RankOptions = {}): RankedEntry[] {
  const decimals = checkDecimals(opts.decimals ?? DEFAULT_DECIMALS);
  const sign = (opts.direction ?? "higherIsBetter") === "higherIsBetter" ? 1 : -1;
  const scored: Candidate[] = [];
  const unscored: RankedEntry[] = [];
  entries.forEach((entry, index) => {
    const label = entry.label ?? `entry ${entry.entryId}`;
    if (entry.score === null || !Number.isFinite(entry.score)) {
      unscored.push({ entryId: entry.entryId, label, score: null, rank: null, scoreRank: null, displayRank: "—", tied: false, decidedBy: null, explanation: "Not ranked: no score yet." });
      return;
    }
    scored.push({ entry, label, index, scoreKey: sign * keyOf(entry.score, decimals), goodness: tieBreaks.map((t) => stepGoodness(t, entry, decimals)) });
  });
  scored.sort((a, b) => compareCandidates(a, b) || a.index - b.index);
  const ranks = scored.map((c) => 1 + scored.filter((o) => compareCandidates(o, c) < 0).length);
  const ranked = scored.map((c, i): RankedEntry => {
    const rank = ranks[i]!;
    const scoreGroup = scored.filter((o) => o.scoreKey === c.scoreKey);
    const scoreRank = 1 + scored.filter((o) => o.scoreKey > c.scoreKey).length;
    const tied = ranks.filter((r) => r === rank).length > 1;
    const base = { entryId: c.entry.entryId, label: c.label, score: c.entry.score, rank, scoreRank, displayRank: tied ? `=${rank}` : `${rank}`, tied };
    if (scoreGroup.length === 1) return { ...base, decidedBy: null, explanation: `Score ${formatScore(c.entry.score)}: ${ordinal(rank)}.` };
    return { ...base, ...explainTie(c, scoreGroup, tieBreaks, rank) };
  });
  return [...ranked, ...unscored];
}

// ---------------------------------------------------------------------------------------------
// Placements

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
