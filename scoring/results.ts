// A show's results from its judges' sheets: each category ranked by the show's rules (the mean or
// the severity-adjusted score; ranks for ranking categories; the sorting pass's kept entries),
// the tie-break chain, places and ribbons, the chair's changes, the show-wide awards, and what
// still blocks publishing. Pure: the server, the review screen and the tests run the same code.
import { combinationProblems, decideAwards, type AwardCandidate, type AwardDefinition, type AwardOutcome, type AwardPickInput, type RibbonStyle } from "./awards";
import { placeAwards, type NotAwarded, type SizeRule, type TieRule } from "./placements";
import { ordinal, rankCategory, type Direction, type RankCandidate, type RankedEntry, type TieBreak } from "./ranking";
import { formatScore } from "./score-sheets";

/** A link of the show's tie-break chain. */
export type TieBreakRule = { kind: "section"; sectionId: string; label: string } | { kind: "firstPlaceVotes" } | { kind: "median" } | { kind: "chair" };

export type ResultRules = {
  /** What ranks points categories: the panel's mean, or the severity-adjusted score (mean z). */
  rankBy: "mean" | "adjusted";
  tieBreaks: TieBreakRule[];
  places: number;
  /** Minimum mean for 1st, 2nd, 3rd… (null: none). Apply when ranking by the mean. */
  minimumScores: (number | null)[];
  sizeRules: SizeRule[];
  ties: TieRule;
  /** Honorable mentions given to the best unplaced entries (0: only the ones the chair records). */
  honorableMentions: number;
  honorableMentionMinimum: number | null;
  /** A spread between judges of at least this many points flags the entry for a second look. */
  spreadFlag: number;
  ribbons: { places: RibbonStyle[]; honorableMention: RibbonStyle };
};

/** The defaults; US colours as commonly seen (blue, red; yellow and green from memory). */
export const DEFAULT_RESULT_RULES: ResultRules = {
  rankBy: "mean",
  tieBreaks: [{ kind: "firstPlaceVotes" }, { kind: "chair" }],
  places: 3,
  minimumScores: [],
  sizeRules: [],
  ties: "shareWithinCount",
  honorableMentions: 0,
  honorableMentionMinimum: null,
  spreadFlag: 10,
  ribbons: {
    places: [
      { name: "Blue", colour: "#1d4ed8" },
      { name: "Red", colour: "#b91c1c" },
      { name: "Yellow", colour: "#eab308" },
    ],
    honorableMention: { name: "Green", colour: "#15803d" },
  },
};

export function resultRulesOf(stored: Partial<ResultRules> | null | undefined): ResultRules {
  return { ...DEFAULT_RESULT_RULES, ...(stored ?? {}), ribbons: { ...DEFAULT_RESULT_RULES.ribbons, ...(stored?.ribbons ?? {}) } };
}

export type JudgingMethodCode = "points" | "sort_then_points" | "sort_then_rank" | "rank";

/** One judge's sheet for an entry, as results read it. */
export type ResultSheet = {
  judgeId: string;
  submitted: boolean;
  total: number | null;
  sectionTotals: Record<string, number | null>;
  sort: "kept" | "set_aside" | null;
  rank: number | null;
  discuss: boolean;
};

export type EntryStats = { count: number; mean: number | null; median: number | null; spread: number | null; sampleSd: number | null; z: number | null };

export type ResultEntry = {
  entryId: string;
  entryNumber: number;
  title: string;
  entrantUserId: string;
  quiltingMethod: string;
  division: string;
  widthUm: number;
  lengthUm: number;
  sizeFlag: string;
  sheets: ResultSheet[];
  /** From the submitted totals (db/totals.ts); null when none. */
  stats: EntryStats | null;
};

export type ResultCategory = { id: string; code: string; name: string; method: JudgingMethodCode; judges: { id: string; name: string }[]; entries: ResultEntry[] };
export type PlacementOverride = { entryId: string; place: number | null; honorableMention: boolean; reason: string };
export type TieOrderInput = { categoryId: string; entryIds: string[]; reason: string };

export type ResultsInput = {
  rules: ResultRules;
  categories: ResultCategory[];
  overrides: PlacementOverride[];
  tieOrders: TieOrderInput[];
  awards: AwardDefinition[];
  picks: AwardPickInput[];
};

export type EntryOutcome = {
  entry: ResultEntry;
  score: number | null;
  ranked: RankedEntry;
  kept: boolean;
  /** The proposal from the rules, before the chair's change. */
  proposed: { place: number | null; honorableMention: boolean; text: string };
  place: number | null;
  placeLabel: string | null;
  honorableMention: boolean;
  ribbon: RibbonStyle | null;
  awards: { awardId: string; name: string; ribbon: RibbonStyle; how: string }[];
  override: PlacementOverride | null;
  text: string;
  flags: string[];
};

export type CategoryOutcome = {
  category: Omit<ResultCategory, "entries">;
  direction: Direction;
  scoreLabel: string;
  entries: EntryOutcome[];
  missing: { entryNumber: number; judge: string }[];
  notAwarded: NotAwarded[];
  notes: string[];
  problems: string[];
  /** Entries still tied after the chain on a rank that decides a place: the chair may order them. */
  tiedForPlace: string[][];
};

export type ShowResults = { categories: CategoryOutcome[]; awards: AwardOutcome[]; blockers: string[]; warnings: string[] };

const label = (e: ResultEntry) => `entry ${e.entryNumber}`;
const meanOf = (xs: number[]) => (xs.length ? xs.reduce((s, x) => s + x, 0) / xs.length : null);
const isRanks = (m: JudgingMethodCode) => m === "rank" || m === "sort_then_rank";
const isSorted = (m: JudgingMethodCode) => m === "sort_then_points" || m === "sort_then_rank";

/** Kept in the sorting pass when at least as many judges kept it as set it aside (our rule). */
function keptBySort(e: ResultEntry): boolean {
  const sheets = e.sheets.filter((s) => s.submitted);
  return sheets.filter((s) => s.sort === "set_aside").length <= sheets.filter((s) => s.sort !== "set_aside").length;
}

function scoreOf(e: ResultEntry, method: JudgingMethodCode, rankBy: ResultRules["rankBy"]): number | null {
  if (isRanks(method)) return meanOf(e.sheets.filter((s) => s.submitted && s.rank !== null).map((s) => s.rank!));
  return rankBy === "adjusted" ? (e.stats?.z ?? null) : (e.stats?.mean ?? null);
}

function firstVotes(entries: ResultEntry[], method: JudgingMethodCode): Map<string, number> {
  const votes = new Map(entries.map((e) => [e.entryId, 0]));
  const byJudge = new Map<string, { entryId: string; value: number }[]>();
  for (const e of entries) for (const s of e.sheets) {
    const value = isRanks(method) ? (s.rank === null ? null : -s.rank) : s.total;
    if (s.submitted && value !== null) byJudge.set(s.judgeId, [...(byJudge.get(s.judgeId) ?? []), { entryId: e.entryId, value }]);
  }
  for (const rows of byJudge.values()) {
    const best = Math.max(...rows.map((r) => r.value));
    for (const r of rows) if (Math.abs(r.value - best) < 1e-9) votes.set(r.entryId, votes.get(r.entryId)! + 1);
  }
  return votes;
}

function chainFor(rules: ResultRules, cat: ResultCategory, tieOrder: TieOrderInput | undefined, direction: Direction): TieBreak[] {
  return rules.tieBreaks.flatMap((t): TieBreak[] => {
    if (t.kind === "chair") return tieOrder ? [{ kind: "order", label: "The chair's decision", entryIds: tieOrder.entryIds }] : [];
    if (t.kind === "firstPlaceVotes") return [{ kind: "value", key: "firstVotes", label: "More judges placing it first", direction: "higherIsBetter" }];
    if (t.kind === "median") return [{ kind: "value", key: "median", label: "The higher median", direction }];
    return isRanks(cat.method) ? [] : [{ kind: "value", key: `section:${t.sectionId}`, label: `The higher ${t.label} score`, direction: "higherIsBetter" }];
  });
}

function candidatesOf(cat: ResultCategory, rules: ResultRules): RankCandidate[] {
  const votes = firstVotes(cat.entries, cat.method);
  return cat.entries.map((e) => {
    const values: Record<string, number | null> = { firstVotes: votes.get(e.entryId) ?? 0, median: isRanks(cat.method) ? null : (e.stats?.median ?? null) };
    for (const t of rules.tieBreaks) {
      if (t.kind !== "section") continue;
      values[`section:${t.sectionId}`] = meanOf(e.sheets.filter((s) => s.submitted && s.sectionTotals[t.sectionId] != null).map((s) => s.sectionTotals[t.sectionId]!));
    }
    return { entryId: e.entryId, label: label(e), score: scoreOf(e, cat.method, rules.rankBy), tieBreakValues: values };
  });
}

function missingSheets(cat: ResultCategory) {
  return cat.entries.flatMap((e) => cat.judges.filter((j) => !e.sheets.some((s) => s.judgeId === j.id && s.submitted)).map((j) => ({ entryNumber: e.entryNumber, judge: j.name })));
}

function flagsOf(e: ResultEntry, rules: ResultRules, orderMoved: boolean, cat: ResultCategory): string[] {
  const flags: string[] = [];
  if (!isRanks(cat.method) && e.stats?.spread != null && e.stats.spread >= rules.spreadFlag) flags.push(`Judges ${formatScore(e.stats.spread)} points apart`);
  if (orderMoved) flags.push(rules.rankBy === "mean" ? "Severity-adjusted order differs" : "Order by the mean differs");
  if (e.sheets.some((s) => s.discuss)) flags.push("A judge asked to discuss it");
  if (e.sizeFlag) flags.push(`Size: ${e.sizeFlag}`);
  return flags;
}

/** Entries whose rank on the other view (mean vs adjusted) differs. */
function movedByOtherView(cat: ResultCategory, rules: ResultRules, ranked: RankedEntry[]): Set<string> {
  if (isRanks(cat.method)) return new Set();
  const other = rankCategory(cat.entries.map((e) => ({ entryId: e.entryId, score: rules.rankBy === "mean" ? (e.stats?.z ?? null) : (e.stats?.mean ?? null) })), []);
  const rankOf = new Map(other.map((r) => [r.entryId, r.scoreRank]));
  return new Set(ranked.filter((r) => r.scoreRank !== null && rankOf.get(r.entryId) !== r.scoreRank).map((r) => r.entryId));
}

type Placed = { place: number | null; honorableMention: boolean; text: string };

function placeCategory(cat: ResultCategory, rules: ResultRules, ranked: RankedEntry[], kept: Set<string> | null, excluded: Set<string>, direction: Direction) {
  const usesMinimum = rules.rankBy === "mean" && !isRanks(cat.method);
  const minimumScores = usesMinimum ? rules.minimumScores : [];
  const pool = ranked.filter((r) => !excluded.has(r.entryId));
  const placements = placeAwards(
    pool.map((r) => ({ ...r, score: r.score === null ? null : direction === "lowerIsBetter" ? -r.score : r.score })),
    {
      places: rules.places,
      minimumScores,
      sizeRules: rules.sizeRules,
      ties: rules.ties,
      honorableMentions: rules.honorableMentions > 0 ? { count: rules.honorableMentions } : undefined,
      honorableMentionMinimum: usesMinimum && rules.honorableMentionMinimum !== null ? rules.honorableMentionMinimum : undefined,
      keptEntryIds: kept ? [...kept] : undefined,
      categorySize: cat.entries.length,
    },
  );
  const byId = new Map<string, Placed>(placements.entries.map((p) => [p.entryId, { place: p.place, honorableMention: p.honorableMention, text: p.text }]));
  const notes = [...placements.notes];
  if (!usesMinimum && rules.minimumScores.some((m) => m !== null)) notes.push("Minimum scores apply only to points ranked by the mean; none applied here.");
  return { byId, placements, notes };
}

/**
 * Ties the chair may order: entries level after the whole chain on a rank that decides a place,
 * either within the places offered or holding a place given at a lower rank (a shared place under
 * "shareNoSkip", or places passed down when an award takes an entry out of its category's places).
 */
function tiesAtPlaces(ranked: RankedEntry[], offered: number, placed: Map<string, Placed>): string[][] {
  const groups = new Map<number, string[]>();
  for (const r of ranked) {
    const decides = r.rank !== null && (r.rank <= offered || placed.get(r.entryId)?.place != null);
    if (r.tied && decides) groups.set(r.rank!, [...(groups.get(r.rank!) ?? []), r.entryId]);
  }
  return [...groups.values()].filter((g) => g.length > 1);
}

function rankedCategory(cat: ResultCategory, input: ResultsInput) {
  const direction: Direction = isRanks(cat.method) ? "lowerIsBetter" : "higherIsBetter";
  const tieOrder = input.tieOrders.find((t) => t.categoryId === cat.id);
  const ranked = rankCategory(candidatesOf(cat, input.rules), chainFor(input.rules, cat, tieOrder, direction), { direction });
  const kept = isSorted(cat.method) ? new Set(cat.entries.filter(keptBySort).map((e) => e.entryId)) : null;
  return { direction, ranked, kept };
}

function ribbonFor(rules: ResultRules, place: number | null, hm: boolean): RibbonStyle | null {
  if (place !== null) return rules.ribbons.places[place - 1] ?? null;
  return hm ? rules.ribbons.honorableMention : null;
}

function outcomeText(placed: Placed, override: PlacementOverride | null): string {
  if (!override) return placed.text;
  const now = override.place !== null ? `${ordinal(override.place)} place` : override.honorableMention ? "Honorable mention" : "No placement";
  return `${now}, changed by the chair: ${override.reason}`;
}

function categoryOutcome(cat: ResultCategory, input: ResultsInput, awardsOf: Map<string, EntryOutcome["awards"]>, excluded: Set<string>): CategoryOutcome {
  const { rules } = input;
  const { direction, ranked, kept } = rankedCategory(cat, input);
  const proposedAll = placeCategory(cat, rules, ranked, kept, new Set(), direction);
  const { byId, placements, notes } = excluded.size ? placeCategory(cat, rules, ranked, kept, excluded, direction) : proposedAll;
  const moved = movedByOtherView(cat, rules, ranked);
  const problems = [...placements.problems];
  const entries = ranked.map((r): EntryOutcome => {
    const entry = cat.entries.find((e) => e.entryId === r.entryId)!;
    const mine = awardsOf.get(entry.entryId) ?? [];
    const placed: Placed = excluded.has(entry.entryId) ? { place: null, honorableMention: false, text: `Holds ${mine.map((a) => a.name).join(" and ")}; its category place passes to the next entry.` } : byId.get(entry.entryId)!;
    const override = input.overrides.find((o) => o.entryId === entry.entryId) ?? null;
    const place = override ? override.place : placed.place;
    const honorableMention = override ? override.place === null && override.honorableMention : placed.honorableMention;
    if (place !== null && !rules.ribbons.places[place - 1]) problems.push(`No ribbon is set for ${ordinal(place)} place (Result rules).`);
    return {
      entry, score: r.score, ranked: r, kept: !kept || kept.has(entry.entryId), proposed: placed, place, placeLabel: place === null ? null : ordinal(place),
      honorableMention, ribbon: ribbonFor(rules, place, honorableMention), awards: mine, override, text: outcomeText(placed, override), flags: flagsOf(entry, rules, moved.has(entry.entryId), cat),
    };
  });
  const overridden = entries.filter((e) => e.override && e.place !== null);
  for (const o of overridden) {
    const others = entries.filter((e) => e !== o && e.place === o.place);
    if (others.length) notes.push(`${[o, ...others].map((e) => label(e.entry)).join(" and ")} hold ${ordinal(o.place!)}; the chair changed ${label(o.entry)}.`);
  }
  const { judges, entries: _e, ...rest } = cat;
  return {
    category: { ...rest, judges }, direction, scoreLabel: isRanks(cat.method) ? "Mean rank" : rules.rankBy === "adjusted" ? "Adjusted (z)" : "Mean", entries, missing: missingSheets(cat),
    notAwarded: placements.notAwarded, notes, problems: [...new Set(problems)], tiedForPlace: tiesAtPlaces(ranked, placements.placesOffered, byId),
  };
}

function awardCandidates(input: ResultsInput): AwardCandidate[] {
  const empty = new Map<string, EntryOutcome["awards"]>();
  return input.categories.flatMap((cat) =>
    categoryOutcome(cat, input, empty, new Set()).entries.map((o) => ({
      entryId: o.entry.entryId, label: label(o.entry), categoryId: cat.id, quiltingMethod: o.entry.quiltingMethod, division: o.entry.division,
      widthUm: o.entry.widthUm, lengthUm: o.entry.lengthUm, categoryPlace: o.place,
    })),
  );
}

/** The whole show's results: categories, awards, and what blocks publishing. */
export function assembleResults(input: ResultsInput): ShowResults {
  const candidates = awardCandidates(input);
  const awards = decideAwards(input.awards, input.picks, candidates);
  const awardsOf = new Map<string, EntryOutcome["awards"]>();
  const excluded = new Set<string>();
  for (const a of awards) {
    const def = input.awards.find((d) => d.id === a.awardId)!;
    for (const w of a.winners) {
      awardsOf.set(w.entryId, [...(awardsOf.get(w.entryId) ?? []), { awardId: a.awardId, name: a.name, ribbon: a.ribbon, how: w.how }]);
      if (!def.keepsCategoryPlace) excluded.add(w.entryId);
    }
  }
  const categories = input.categories.map((cat) => categoryOutcome(cat, input, awardsOf, excluded));
  const labelOf = (id: string) => candidates.find((c) => c.entryId === id)?.label ?? `entry ${id}`;
  const blockers = [
    ...categories.flatMap((c) => (c.missing.length ? [`Category ${c.category.code}: ${c.missing.length} sheet${c.missing.length === 1 ? "" : "s"} not submitted (${c.missing.slice(0, 3).map((m) => `entry ${m.entryNumber}, ${m.judge}`).join("; ")}${c.missing.length > 3 ? "; …" : ""}).`] : [])),
    ...categories.flatMap((c) => c.problems.map((p) => `Category ${c.category.code}: ${p}`)),
    ...awards.flatMap((a) => a.problems),
    ...combinationProblems(input.awards, awards, labelOf),
  ];
  const warnings = categories.flatMap((c) => c.notes.filter((n) => n.includes("the chair changed")).map((n) => `Category ${c.category.code}: ${n}`));
  return { categories, awards, blockers, warnings };
}

// ---------------------------------------------------------------------------------------------
// What a publication keeps: no scores, no names (the public page adds names where consented).

export type PublishedEntry = {
  entryId: string;
  entryNumber: number;
  title: string;
  entrantUserId: string;
  categoryId: string;
  place: number | null;
  placeLabel: string | null;
  honorableMention: boolean;
  ribbon: RibbonStyle | null;
  awards: { name: string; ribbon: RibbonStyle }[];
};

export type PublishedResults = {
  version: number;
  publishedAt: string;
  categories: { id: string; code: string; name: string; entries: PublishedEntry[] }[];
  awards: { awardId: string; name: string; ribbon: RibbonStyle; entryIds: string[] }[];
};

/** True when the entry has something to show: a place, an honorable mention or an award. */
export const isAwarded = (e: PublishedEntry) => e.place !== null || e.honorableMention || e.awards.length > 0;

/** The plain words for an entry's result, e.g. "1st place (Blue) · Best of Show". */
export function resultWords(e: Pick<PublishedEntry, "placeLabel" | "honorableMention" | "ribbon" | "awards">): string {
  const parts: string[] = [];
  if (e.placeLabel) parts.push(`${e.placeLabel} place${e.ribbon ? ` (${e.ribbon.name})` : ""}`);
  else if (e.honorableMention) parts.push(`Honorable mention${e.ribbon ? ` (${e.ribbon.name})` : ""}`);
  for (const a of e.awards) parts.push(a.name);
  return parts.length ? parts.join(" · ") : "No ribbon";
}

export function snapshotOf(results: ShowResults, version: number, publishedAt: Date): PublishedResults {
  return {
    version,
    publishedAt: publishedAt.toISOString(),
    categories: results.categories.map((c) => ({
      id: c.category.id, code: c.category.code, name: c.category.name,
      entries: c.entries.map((o) => ({
        entryId: o.entry.entryId, entryNumber: o.entry.entryNumber, title: o.entry.title, entrantUserId: o.entry.entrantUserId, categoryId: c.category.id,
        place: o.place, placeLabel: o.placeLabel, honorableMention: o.honorableMention, ribbon: o.ribbon, awards: o.awards.map((a) => ({ name: a.name, ribbon: a.ribbon })),
      })),
    })),
    awards: results.awards.map((a) => ({ awardId: a.awardId, name: a.name, ribbon: a.ribbon, entryIds: a.winners.map((w) => w.entryId) })),
  };
}

/** Entrants whose results differ between two publications (for the corrected-results mail). */
export function changedEntrants(before: PublishedResults | null, after: PublishedResults): Set<string> {
  const key = (e: PublishedEntry) => JSON.stringify([e.categoryId, e.place, e.honorableMention, e.awards.map((a) => a.name)]);
  const old = new Map((before?.categories ?? []).flatMap((c) => c.entries.map((e) => [e.entryId, key(e)] as const)));
  const out = new Set<string>();
  for (const c of after.categories) for (const e of c.entries) if (old.get(e.entryId) !== key(e)) out.add(e.entrantUserId);
  return out;
}
