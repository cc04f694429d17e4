// A show's category set as stored, on top of the engine in ./categories: merged categories handing
// their entries to the one they were merged into, the facts of an entry as the engine wants them,
// the moves a changed set would make, and the intake re-measure against the show's tolerance.
// Pure: the chair's editor runs the same code in the browser to preview what the server will do.
import { checkRuleSet, type RuleSetCheck } from "./category-checks";
import { compileRules, decideCompiled, type CategoryRef, type CategoryRule, type Decision, type DecideOptions, type EntryFacts } from "./categories";
import { formatInches, UM_PER_INCH } from "./units";

/** A stored category: the rule plus, after a merge, the id of the category that took it over. */
export type ShowCategory = CategoryRule & { cap?: number | null; mergedIntoId?: string | null };

/** How an entry stands: what was decided, and whether the chair chose it by hand. */
export type CategoryOutcome =
  | { state: "undecided" }
  | { state: "decided"; categoryId: string }
  | { state: "fits_none" }
  | { state: "fits_several"; candidateIds: string[] }
  | { state: "overridden"; categoryId: string };

export type Placement = { outcome: CategoryOutcome; reasons: string[] };

// ---------------------------------------------------------------------------------------------
// Facts of an entry

/**
 * Number of makers: the distinct people named as makers plus the quilter when someone else
 * quilted it (a top pieced by one and quilted by another is a two-person quilt, common practice).
 * Names compare without case, accents or extra spaces; an entry naming nobody counts as one.
 */
export function makerCount(madeBy: readonly string[], quiltedBy: string): number {
  const fold = (s: string) => s.normalize("NFD").replace(/[\u0300-\u036f]/g, "").toLowerCase().replace(/\s+/g, " ").trim();
  const people = new Set(madeBy.map(fold).filter(Boolean));
  if (fold(quiltedBy)) people.add(fold(quiltedBy));
  return Math.max(1, people.size);
}

/** The entry columns the category rules read. */
export type EntryForCategory = {
  widthUm: number;
  lengthUm: number;
  measuredWidthUm?: number | null;
  measuredLengthUm?: number | null;
  techniques: readonly string[];
  madeBy: readonly string[];
  quiltedBy: string;
  quiltedForHire: boolean;
  quiltingMethod: EntryFacts["quiltingMethod"];
  division: EntryFacts["division"];
  youthAge?: number | null;
  judged: boolean;
};

/**
 * The facts the engine decides on. The registered size counts unless the quilt was re-measured at
 * intake and found off by more than the tolerance: then the measured size decides.
 */
export function factsOf(e: EntryForCategory, toleranceUm: number): EntryFacts {
  const size = sizeCheck(e, toleranceUm);
  const useMeasured = size !== null && size.outside;
  return {
    widthUm: useMeasured ? e.measuredWidthUm! : e.widthUm,
    lengthUm: useMeasured ? e.measuredLengthUm! : e.lengthUm,
    techniques: [...e.techniques],
    quiltingMethod: e.quiltingMethod,
    makerCount: makerCount(e.madeBy, e.quiltedBy),
    quiltedForHire: e.quiltedForHire,
    division: e.division,
    youthAge: e.youthAge ?? null,
    judged: e.judged,
  };
}

// ---------------------------------------------------------------------------------------------
// Re-measuring at intake

export type SizeCheck = {
  /** The larger of the two differences, width and length, in µm. */
  offByUm: number;
  outside: boolean;
  text: string;
};

/**
 * Registered against measured size: off by more than the tolerance on either side means outside.
 * A quilt turned a quarter (width and length swapped) is compared the way it fits best, since
 * which side is "width" is the entrant's choice as often as the rules'.
 */
export function sizeCheck(e: Pick<EntryForCategory, "widthUm" | "lengthUm" | "measuredWidthUm" | "measuredLengthUm">, toleranceUm: number): SizeCheck | null {
  if (e.measuredWidthUm == null || e.measuredLengthUm == null) return null;
  const straight = Math.max(Math.abs(e.measuredWidthUm - e.widthUm), Math.abs(e.measuredLengthUm - e.lengthUm));
  const turned = Math.max(Math.abs(e.measuredWidthUm - e.lengthUm), Math.abs(e.measuredLengthUm - e.widthUm));
  const offByUm = Math.min(straight, turned);
  const outside = offByUm > toleranceUm;
  const measured = `${formatInches(e.measuredWidthUm, false)} × ${formatInches(e.measuredLengthUm)}`;
  const registered = `${formatInches(e.widthUm, false)} × ${formatInches(e.lengthUm)}`;
  const text = offByUm === 0
    ? `Measured ${measured}, as registered.`
    : `Measured ${measured}, registered ${registered}: off by ${formatInches(offByUm)}, ` +
      (outside ? `more than the ${formatInches(toleranceUm)} allowed, so the measured size decides the category.` : `within the ${formatInches(toleranceUm)} allowed.`);
  return { offByUm, outside, text };
}

/** The usual tolerance when a show sets none: within 1 in of the registered size (common practice). */
export const DEFAULT_TOLERANCE_UM = UM_PER_INCH;

// ---------------------------------------------------------------------------------------------
// Deciding against a stored set

/** Follows merges to the category that holds the entries now (cycles end at the first repeat). */
export function finalCategoryId(id: string, byId: ReadonlyMap<string, ShowCategory>): string {
  const seen = new Set<string>();
  let at = id;
  for (;;) {
    const next = byId.get(at)?.mergedIntoId;
    if (!next || seen.has(at) || !byId.has(next)) return at;
    seen.add(at);
    at = next;
  }
}

export type PreparedSet = {
  byId: ReadonlyMap<string, ShowCategory>;
  compiled: ReturnType<typeof compileRules>;
  opts: DecideOptions;
};

/** Compile a set once for many decisions. Merged categories keep deciding, for their new home. */
export function prepareSet(set: readonly ShowCategory[], opts: DecideOptions = {}): PreparedSet {
  return { byId: new Map(set.map((c) => [c.id, c])), compiled: compileRules(set), opts };
}

const refOf = (c: ShowCategory): CategoryRef => ({ id: c.id, code: c.code, name: c.name });

/** The engine's decision with merges followed: "several" that all lead to one category is one. */
export function decideInSet(facts: EntryFacts, prepared: PreparedSet): Decision {
  const d = decideCompiled(facts, prepared.compiled, prepared.opts);
  const home = (ref: CategoryRef) => prepared.byId.get(finalCategoryId(ref.id, prepared.byId))!;
  const mergedNote = (from: CategoryRef, to: ShowCategory) => `${from.code} ${from.name} was merged into ${to.code} ${to.name}`;
  if (d.kind === "one") {
    const to = home(d.category);
    return to.id === d.category.id ? d : { kind: "one", category: refOf(to), reasons: [...d.reasons, mergedNote(d.category, to)] };
  }
  if (d.kind === "several") {
    const homes = [...new Map(d.categories.map((c) => [home(c).id, home(c)])).values()];
    if (homes.length === 1) {
      const to = homes[0]!;
      return { kind: "one", category: refOf(to), reasons: [...d.reasons.slice(1), ...d.categories.filter((c) => c.id !== to.id).map((c) => mergedNote(c, to))] };
    }
    return { ...d, categories: homes.map(refOf) };
  }
  return d;
}

/** A decision as the stored outcome. */
export function outcomeOf(d: Decision): CategoryOutcome {
  if (d.kind === "one") return { state: "decided", categoryId: d.category.id };
  if (d.kind === "several") return { state: "fits_several", candidateIds: d.categories.map((c) => c.id) };
  return { state: "fits_none" };
}

/** Where an entry goes: an override stands while its category still exists; otherwise the rules decide. */
export function placeEntry(facts: EntryFacts, current: CategoryOutcome, prepared: PreparedSet): Placement {
  if (current.state === "overridden" && prepared.byId.has(current.categoryId)) {
    const to = prepared.byId.get(finalCategoryId(current.categoryId, prepared.byId))!;
    return { outcome: { state: "overridden", categoryId: to.id }, reasons: [`placed by the chair in ${to.code} ${to.name}`] };
  }
  if (prepared.byId.size === 0) return { outcome: { state: "undecided" }, reasons: ["the show has no categories yet"] };
  const d = decideInSet(facts, prepared);
  return { outcome: outcomeOf(d), reasons: d.reasons };
}

const outcomeKey = (o: CategoryOutcome): string =>
  o.state === "decided" || o.state === "overridden" ? `${o.state}:${o.categoryId}` : o.state === "fits_several" ? `several:${[...o.candidateIds].sort().join(",")}` : o.state;

export const sameOutcome = (a: CategoryOutcome, b: CategoryOutcome) => outcomeKey(a) === outcomeKey(b);

// ---------------------------------------------------------------------------------------------
// What a changed set would do

export type EntryInSet = { id: string; entryNumber: number | null; title: string; facts: EntryFacts; current: CategoryOutcome };
export type Move = { entryId: string; entryNumber: number | null; title: string; from: CategoryOutcome; to: CategoryOutcome; reasons: string[] };

/** Entries whose outcome changes under `next`, in entry-number order. */
export function planMoves(entries: readonly EntryInSet[], next: readonly ShowCategory[], opts: DecideOptions = {}): Move[] {
  const prepared = prepareSet(next, opts);
  const moves: Move[] = [];
  for (const e of entries) {
    const placed = placeEntry(e.facts, e.current, prepared);
    if (!sameOutcome(placed.outcome, e.current)) moves.push({ entryId: e.id, entryNumber: e.entryNumber, title: e.title, from: e.current, to: placed.outcome, reasons: placed.reasons });
  }
  return moves.sort((a, b) => (a.entryNumber ?? Infinity) - (b.entryNumber ?? Infinity));
}

/**
 * A short fingerprint of a list of moves (FNV-1a, 32 bit): the editor sends back the one it
 * showed, and the server applies the moves only if it computes the same list.
 */
export function movesDigest(moves: readonly Move[]): string {
  const text = moves.map((m) => `${m.entryId}>${outcomeKey(m.from)}>${outcomeKey(m.to)}`).join("|");
  let h = 0x811c9dc5;
  for (let i = 0; i < text.length; i++) {
    h ^= text.charCodeAt(i);
    h = Math.imul(h, 0x01000193) >>> 0;
  }
  return `${moves.length}-${h.toString(16).padStart(8, "0")}`;
}

/** "10 Pieced, Small", "fits none", "fits 10 and 20" — for lists of moves. */
export function describeOutcome(o: CategoryOutcome, byId: ReadonlyMap<string, Pick<ShowCategory, "code" | "name">>): string {
  const name = (id: string) => {
    const c = byId.get(id);
    return c ? `${c.code} ${c.name}` : "a removed category";
  };
  switch (o.state) {
    case "undecided":
      return "not decided";
    case "decided":
      return name(o.categoryId);
    case "overridden":
      return `${name(o.categoryId)} (chair's choice)`;
    case "fits_none":
      return "fits no category";
    case "fits_several":
      return `fits several: ${o.candidateIds.map((id) => byId.get(id)?.code ?? "?").join(", ")}`;
  }
}

// ---------------------------------------------------------------------------------------------
// Editing helpers the chair's editor offers

/**
 * Splits a category in two at a size: the original keeps sizes below `at` ("<"), a copy with the
 * new code and name takes `at` and above (">="), so no size falls between the two or on both.
 */
export function splitBySize(
  set: readonly ShowCategory[],
  id: string,
  at: { measure: "width" | "length" | "perimeter" | "area" | "longestSide" | "shortestSide"; value: number; unit: "in" | "cm" | "sq in" | "sq cm" },
  added: { id: string; code: string; name: string },
): ShowCategory[] {
  const original = set.find((c) => c.id === id);
  if (!original) return [...set];
  const withBound = (op: "<" | ">="): ShowCategory["conditions"] => [
    ...original.conditions,
    { kind: "size", measure: at.measure, bounds: [{ op, value: at.value, unit: at.unit }] },
  ];
  const lower: ShowCategory = { ...original, conditions: withBound("<") };
  const upper: ShowCategory = { ...original, ...added, precedence: original.precedence, cap: original.cap ?? null, mergedIntoId: null, conditions: withBound(">=") };
  return set.flatMap((c) => (c.id === id ? [lower, upper] : [c]));
}

/** Merges `fromId` into `intoId`: the rule of `fromId` keeps deciding, for `intoId`'s entries. */
export function mergeInto(set: readonly ShowCategory[], fromId: string, intoId: string): ShowCategory[] {
  if (fromId === intoId) return [...set];
  return set.map((c) => (c.id === fromId ? { ...c, mergedIntoId: intoId } : c.mergedIntoId === fromId ? { ...c, mergedIntoId: intoId } : c));
}

/** Categories that hold entries (not merged away), in precedence then code order. */
export function activeCategories<T extends ShowCategory>(set: readonly T[]): T[] {
  return set.filter((c) => !c.mergedIntoId).sort((a, b) => a.precedence - b.precedence || a.code.localeCompare(b.code, "en", { numeric: true }));
}

/** checkRuleSet over a stored set, leaving out overlaps between categories merged into one. */
export function checkSet(set: readonly ShowCategory[], sample?: readonly EntryFacts[], opts?: DecideOptions): RuleSetCheck {
  const byId = new Map(set.map((c) => [c.id, c]));
  const homes = (refs: readonly CategoryRef[]) => new Set(refs.map((r) => finalCategoryId(r.id, byId)));
  const check = checkRuleSet(set, sample, opts);
  return {
    ...check,
    overlaps: check.overlaps.filter((o) => homes(o.categories).size > 1),
    samples: check.samples.filter((s) => s.kind !== "several" || homes(s.categories).size > 1),
  };
}
