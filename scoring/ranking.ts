// Ranking a category: each entry's totals from several judges (mean, median, spread, SD), a
// severity-adjusted score, standard competition ranks ("1224") and a chain of tie-breaks. Placing
// 1st, 2nd, 3rd and honorable mentions is in ./placements.ts. Pure: also runs in the browser.
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


// ---------------------------------------------------------------------------------------------
// Small helpers

export const DEFAULT_DECIMALS = 9;

export function keyOf(x: number, decimals: number): number {
  if (!Number.isFinite(x)) throw new RangeError(`A score must be a number (got ${x}).`);
  return Math.round(x * 10 ** decimals);
}

export function checkDecimals(decimals: number): number {
  if (!Number.isInteger(decimals) || decimals < 0 || decimals > 12) throw new RangeError("decimals must be a whole number from 0 to 12.");
  return decimals;
}

/** 1 → "1st", 2 → "2nd", 11 → "11th", 23 → "23rd". */
export function ordinal(n: number): string {
  const tens = n % 100;
  const suffix = tens >= 11 && tens <= 13 ? "th" : ({ 1: "st", 2: "nd", 3: "rd" } as Record<number, string>)[n % 10] ?? "th";
  return `${n}${suffix}`;
}

export const capitalise = (text: string) => text.charAt(0).toUpperCase() + text.slice(1);

export function list(items: string[]): string {
  if (items.length <= 1) return items[0] ?? "";
  return `${items.slice(0, -1).join(", ")} and ${items[items.length - 1]}`;
}

const ascending = (xs: readonly number[]) => [...xs].sort((a, b) => a - b);
// Summing in sorted order makes the mean depend only on the set of totals, not their order.
const meanOf = (sorted: readonly number[]) => sorted.reduce((s, x) => s + x, 0) / sorted.length;

export function groupBy<T>(items: readonly T[], key: (t: T) => string): Map<string, T[]> {
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
