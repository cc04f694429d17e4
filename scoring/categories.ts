// The category engine: which of a show's categories an entry fits and why, and what an edited rule
// would change. Pure: also runs in the browser. Gaps and overlaps of a whole rule set are checked
// in ./category-checks.ts.
//
// Exact boundaries: every bound is converted once to integer micrometres (µm², for area) from the
// decimal digits of its value, never by multiplying a float, and compared as integers with the
// entry's own integer µm. So 280 in, 711.2 cm and 7,112,000 µm are one and the same limit, and a
// quilt exactly on a limit is decided by the limit's own "<" or "<=", never by rounding.
//
// Precedence and overlaps: `precedence` (lower first) orders categories for display. It resolves
// an entry fitting several categories ONLY when the chair opts in with overlap "firstByPrecedence";
// by default ("flag") any entry fitting more than one category is reported as "several", so the
// chair sees every overlap the rules leave. Even when opted in, categories tied on the best
// precedence value stay "several": the engine never picks between equals.
import { perimeterUm } from "./measure";
import { UM_PER_CM, UM_PER_INCH } from "./units";

export type Measure = "width" | "length" | "perimeter" | "area" | "longestSide" | "shortestSide";
export type BoundUnit = "in" | "cm" | "sq in" | "sq cm";
/** Area bounds use "sq in" or "sq cm"; every other measure "in" or "cm". */
export type Bound = { op: "<" | "<=" | ">" | ">="; value: number; unit: BoundUnit };
export type QuiltingMethod = "hand" | "home_machine" | "frame_machine";
export type Division = "open" | "youth" | "first_time";
/** "twoOrMore" is "two" and "threeOrMore" together (one maker against a team). */
export type MakerCount = "one" | "two" | "twoOrMore" | "threeOrMore";

export type Condition =
  | { kind: "size"; measure: Measure; bounds: Bound[] } // all bounds must hold
  | { kind: "techniques"; mode: "anyOf" | "allOf" | "noneOf"; techniques: string[] }
  | { kind: "quiltingMethod"; methods: QuiltingMethod[] }
  | { kind: "makers"; count: MakerCount }
  | { kind: "quiltedForHire"; value: boolean }
  // Youth ages are inclusive ("18 and under" is youthMaxAge 18) and only checked for youth entries.
  | { kind: "division"; divisions: Division[]; youthMaxAge?: number; youthMinAge?: number }
  | { kind: "judged"; value: boolean };

/** A show category: an entry fits it when all its conditions hold. */
export type CategoryRule = {
  id: string;
  code: string;
  name: string;
  description?: string;
  precedence: number;
  conditions: Condition[];
};

export type EntryFacts = {
  widthUm: number;
  lengthUm: number;
  techniques: string[];
  quiltingMethod: QuiltingMethod;
  makerCount: number;
  quiltedForHire: boolean;
  division: Division;
  youthAge?: number | null;
  judged: boolean;
};

export type CategoryRef = { id: string; code: string; name: string };
export type Decision =
  | { kind: "one"; category: CategoryRef; reasons: string[] }
  | { kind: "none"; reasons: string[] }
  | { kind: "several"; categories: CategoryRef[]; reasons: string[] };
export type OverlapMode = "flag" | "firstByPrecedence";
export type DecideOptions = { overlap?: OverlapMode };

// ---------------------------------------------------------------------------------------------
// Exact units

export const MEASURES: Measure[] = ["width", "length", "perimeter", "area", "longestSide", "shortestSide"];
const MEASURE_INDEX: Record<Measure, number> = { width: 0, length: 1, perimeter: 2, area: 3, longestSide: 4, shortestSide: 5 };
export const MEASURE_LABEL: Record<Measure, string> = {
  width: "width", length: "length", perimeter: "perimeter", area: "area", longestSide: "longest side", shortestSide: "shortest side",
};
// 1 in = 25,400 µm exactly (NIST SP 811, App. B), so 1 sq in = 645,160,000 µm²; 1 sq cm = 10^8 µm².
const SCALE: Record<BoundUnit, bigint> = { in: 25_400n, cm: 10_000n, "sq in": 645_160_000n, "sq cm": 100_000_000n };
const SCALE_NUMBER: Record<BoundUnit, number> = { in: UM_PER_INCH, cm: UM_PER_CM, "sq in": 645_160_000, "sq cm": 100_000_000 };

const unitFits = (measure: Measure, unit: BoundUnit) => (measure === "area") === (unit === "sq in" || unit === "sq cm");

/**
 * A bound's value in integer µm (µm² for area), from the decimal digits of the number (String()
 * gives the shortest digits that read back as the same double: 152.4 → "152.4"), rounded half-up
 * only where the exact value has a fraction of a µm (odd sixteenths of an inch). null if unusable.
 */
export function boundToInteger(measure: Measure, bound: Bound): number | null {
  if (!unitFits(measure, bound.unit) || !Number.isFinite(bound.value) || bound.value < 0) return null;
  const m = /^(\d+)(?:\.(\d+))?(?:e([+-]?\d+))?$/i.exec(String(bound.value));
  if (!m) return null;
  const [, whole = "0", decimals = "", exp = "0"] = m;
  let num = BigInt(whole + decimals) * (SCALE[bound.unit] ?? 0n);
  let den = 1n;
  const shift = Number(exp) - decimals.length;
  if (shift >= 0) num *= 10n ** BigInt(shift);
  else den = 10n ** BigInt(-shift);
  const rounded = (2n * num + den) / (2n * den);
  return rounded > BigInt(Number.MAX_SAFE_INTEGER) ? null : Number(rounded);
}

// ---------------------------------------------------------------------------------------------
// Plain-words numbers

const FRACTION = ["", "⅛", "¼", "⅜", "½", "⅝", "¾", "⅞"];

function group(digits: string): string {
  return digits.replace(/\B(?=(\d{3})+(?!\d))/g, ",");
}

function decimal(value: number, places: number): string {
  const [whole = "0", decimals = ""] = value.toFixed(places).split(".");
  const trimmed = decimals.replace(/0+$/, "");
  return trimmed ? `${group(whole)}.${trimmed}` : group(whole);
}

function numberIn(x: number, unit: BoundUnit, places: number): string {
  if (unit === "in" && Number.isInteger(x) && (x * 8) % UM_PER_INCH === 0) {
    const eighths = (x * 8) / UM_PER_INCH;
    const whole = Math.floor(eighths / 8);
    const frac = FRACTION[eighths % 8] ?? "";
    return `${whole === 0 && frac ? "" : group(String(whole))}${frac}`;
  }
  return decimal(x / SCALE_NUMBER[unit], places);
}

/**
 * x (µm or µm²) in the bound's unit: eighths of an inch as fractions, else decimals. Given `against`
 * (the limit it is compared with), adds decimals until two different values read differently.
 */
export function formatInUnit(x: number, unit: BoundUnit, against?: number): string {
  const max = unit === "in" ? 6 : unit === "cm" ? 4 : 12;
  let places = 2;
  let text = numberIn(x, unit, places);
  while (against !== undefined && x !== against && places < max && text === numberIn(against, unit, places)) {
    places++;
    text = numberIn(x, unit, places);
  }
  return `${text} ${unit}`;
}

function list(items: string[], word: "or" | "and"): string {
  if (items.length <= 1) return items[0] ?? "nothing";
  return `${items.slice(0, -1).join(", ")} ${word} ${items[items.length - 1]}`;
}

// ---------------------------------------------------------------------------------------------
// Compiling rules into integer comparisons

// Techniques as a small array: entries list one to three, where includes() beats a Set.
/** An entry with its measures worked out once. */
export type Prepared = { facts: EntryFacts; m: number[]; techniques: string[] };
type Compiled = { test: (e: Prepared) => boolean; explain: (e: Prepared, name: string) => string };
type CompiledRule = { ref: CategoryRef; precedence: number; order: number; conditions: Compiled[] };
/** Rules compiled once for many decisions (decideCompiled, decideAll, previewRule). */
export type CompiledRules = { readonly rules: readonly CompiledRule[] };

const folded = new Map<string, string>();
/** Technique names compare without case or accents: "Applique" is "appliqué". */
export function foldTechnique(name: string): string {
  let f = folded.get(name);
  if (f === undefined) {
    f = name.normalize("NFD").replace(/[\u0300-\u036f]/g, "").toLowerCase().replace(/\s+/g, " ").trim();
    if (folded.size > 2_000) folded.clear();
    folded.set(name, f);
  }
  return f;
}

export function prepare(facts: EntryFacts): Prepared {
  const w = facts.widthUm;
  const l = facts.lengthUm;
  return {
    facts,
    m: [w, l, perimeterUm(w, l), w * l, Math.max(w, l), Math.min(w, l)],
    techniques: facts.techniques.map(foldTechnique),
  };
}

const OP_WORDS = { "<": "under", "<=": "at most", ">": "over", ">=": "at least" } as const;

function compileSize(c: Extract<Condition, { kind: "size" }>): Compiled {
  const index = MEASURE_INDEX[c.measure];
  const label = MEASURE_LABEL[c.measure];
  const bounds = c.bounds.map((b) => ({ ...b, limit: boundToInteger(c.measure, b) }));
  const holds = (x: number, b: (typeof bounds)[number]) => {
    if (b.limit === null) return false;
    switch (b.op) {
      case "<": return x < b.limit;
      case "<=": return x <= b.limit;
      case ">": return x > b.limit;
      case ">=": return x >= b.limit;
    }
  };
  // The hot path: each bound as [lowest allowed, highest allowed] integers, so a test is two compares.
  let lo = -Infinity;
  let hi = Infinity;
  for (const b of bounds) {
    if (b.limit === null) [lo, hi] = [Infinity, -Infinity];
    else if (b.op === ">=") lo = Math.max(lo, b.limit);
    else if (b.op === ">") lo = Math.max(lo, b.limit + 1);
    else if (b.op === "<=") hi = Math.min(hi, b.limit);
    else hi = Math.min(hi, b.limit - 1);
  }
  return {
    // Entry sizes are integer µm, so "> v" is ">= v + 1"; a fractional size (not from parseLength) is
    // still compared exactly against the bounds themselves.
    test: (e) => {
      const x = e.m[index] ?? NaN;
      if (Number.isInteger(x)) return x >= lo && x <= hi;
      for (const b of bounds) if (!holds(x, b)) return false;
      return true;
    },
    explain: (e, name) => {
      const x = e.m[index] ?? NaN;
      const failed = bounds.find((b) => !holds(x, b));
      if (!failed) {
        if (bounds.length === 0) return `any ${label} (${name})`;
        const unit = bounds[0]!.unit;
        const parts = bounds.map((b) => `${OP_WORDS[b.op]} ${formatInUnit(b.limit!, b.unit)}`);
        return `${label} ${formatInUnit(x, unit)} is ${parts.join(" and ")} (${name})`;
      }
      if (failed.limit === null) {
        return `${name} has a ${label} limit of ${failed.value} ${failed.unit} that can't be used (${c.measure === "area" ? "use sq in or sq cm" : "use in or cm"}): the chair needs to fix it`;
      }
      const value = `${label} ${formatInUnit(x, failed.unit, failed.limit)}`;
      const limit = formatInUnit(failed.limit, failed.unit);
      const upper = failed.op === "<" || failed.op === "<=";
      if (x === failed.limit) {
        return upper
          ? `${value} is at the ${limit} limit of ${name}, which takes only under ${limit}`
          : `${value} is at the ${limit} minimum of ${name}, which takes only over ${limit}`;
      }
      return upper ? `${value} is over the ${limit} limit of ${name}` : `${value} is under the ${limit} minimum of ${name}`;
    },
  };
}

function compileTechniques(c: Extract<Condition, { kind: "techniques" }>): Compiled {
  const wanted = c.techniques.map((t) => ({ shown: t, key: foldTechnique(t) }));
  const keys = wanted.map((t) => t.key);
  const has = (e: Prepared, key: string) => e.techniques.includes(key);
  const present = (e: Prepared) => wanted.filter((t) => has(e, t.key)).map((t) => t.shown);
  const shown = wanted.map((t) => t.shown);
  const entryList = (e: Prepared) => (e.facts.techniques.length ? list(e.facts.techniques, "and") : "no technique");
  const anyPresent = (e: Prepared) => {
    for (const key of keys) if (e.techniques.includes(key)) return true;
    return false;
  };
  const test = (e: Prepared) => {
    if (c.mode === "anyOf") return anyPresent(e);
    if (c.mode === "noneOf") return !anyPresent(e);
    for (const key of keys) if (!e.techniques.includes(key)) return false;
    return true;
  };
  return {
    test,
    explain: (e, name) => {
      const ok = test(e);
      if (c.mode === "anyOf") {
        return ok ? `techniques include ${list(present(e), "and")} (${name})` : `${name} takes quilts with ${list(shown, "or")}; this one lists ${entryList(e)}`;
      }
      if (c.mode === "allOf") {
        const missing = wanted.filter((t) => !has(e, t.key)).map((t) => t.shown);
        return ok ? `techniques include ${list(shown, "and")} (${name})` : `${name} takes quilts with ${list(shown, "and")}; this one lacks ${list(missing, "and")}`;
      }
      return ok ? `no ${list(shown, "or")} among the techniques (${name})` : `techniques include ${list(present(e), "and")}, and ${name} takes no quilt with ${list(shown, "or")}`;
    },
  };
}

const METHOD_LABEL: Record<QuiltingMethod, string> = { hand: "hand", home_machine: "home (stationary) machine", frame_machine: "frame-mounted machine" };
const DIVISION_LABEL: Record<Division, string> = { open: "open", youth: "youth", first_time: "first-time entrant" };
const MAKERS_LABEL: Record<MakerCount, string> = { one: "one maker", two: "two makers", twoOrMore: "two or more makers", threeOrMore: "three or more makers" };

function makersHold(count: MakerCount, n: number): boolean {
  switch (count) {
    case "one": return n === 1;
    case "two": return n === 2;
    case "twoOrMore": return n >= 2;
    case "threeOrMore": return n >= 3;
  }
}

function ages(min?: number, max?: number): string {
  if (min !== undefined && max !== undefined) return `youth aged ${min} to ${max}`;
  if (max !== undefined) return `youth aged ${max} and under`;
  return `youth aged ${min} and over`;
}

function compileCondition(c: Condition): Compiled {
  switch (c.kind) {
    case "size": return compileSize(c);
    case "techniques": return compileTechniques(c);
    case "quiltingMethod": {
      const methods = new Set(c.methods);
      const wanted = list(c.methods.map((m) => METHOD_LABEL[m]), "or");
      return {
        test: (e) => methods.has(e.facts.quiltingMethod),
        explain: (e, name) => methods.has(e.facts.quiltingMethod)
          ? `quilted by ${METHOD_LABEL[e.facts.quiltingMethod]} (${name})`
          : `quilted by ${METHOD_LABEL[e.facts.quiltingMethod] ?? "an unknown method"}: ${name} takes quilting by ${wanted}`,
      };
    }
    case "makers": {
      return {
        test: (e) => makersHold(c.count, e.facts.makerCount),
        explain: (e, name) => {
          const n = e.facts.makerCount;
          const has = `${n} maker${n === 1 ? "" : "s"}`;
          return makersHold(c.count, n) ? `${has} (${name})` : `${has}: ${name} takes ${MAKERS_LABEL[c.count]}`;
        },
      };
    }
    case "quiltedForHire":
      return {
        test: (e) => e.facts.quiltedForHire === c.value,
        explain: (e, name) => {
          const hired = e.facts.quiltedForHire;
          if (hired === c.value) return hired ? `quilted for hire (${name})` : `quilted by the makers, not for hire (${name})`;
          return hired ? `quilted for hire: ${name} takes only quilts quilted by their makers` : `not quilted for hire: ${name} takes only quilts quilted for hire`;
        },
      };
    case "division": {
      const divisions = new Set(c.divisions);
      const ageLimited = c.youthMinAge !== undefined || c.youthMaxAge !== undefined;
      const ageOk = (age: number | null | undefined) =>
        age !== null && age !== undefined && (c.youthMinAge === undefined || age >= c.youthMinAge) && (c.youthMaxAge === undefined || age <= c.youthMaxAge);
      const test = (e: Prepared) => divisions.has(e.facts.division) && (e.facts.division !== "youth" || !ageLimited || ageOk(e.facts.youthAge));
      return {
        test,
        explain: (e, name) => {
          const d = e.facts.division;
          if (!divisions.has(d)) return `${DIVISION_LABEL[d] ?? d} division: ${name} takes the ${list(c.divisions.map((x) => DIVISION_LABEL[x]), "or")} division`;
          if (d === "youth" && ageLimited) {
            const want = ages(c.youthMinAge, c.youthMaxAge);
            const age = e.facts.youthAge;
            if (age === null || age === undefined) return `youth entrant's age not given: ${name} takes ${want}`;
            return ageOk(age) ? `youth entrant aged ${age} (${name})` : `youth entrant aged ${age}: ${name} takes ${want}`;
          }
          return `${DIVISION_LABEL[d]} division (${name})`;
        },
      };
    }
    case "judged":
      return {
        test: (e) => e.facts.judged === c.value,
        explain: (e, name) => {
          if (e.facts.judged === c.value) return c.value ? `entered for judging (${name})` : `display only, not judged (${name})`;
          return c.value ? `display only, not judged: ${name} is a judged category` : `entered for judging: ${name} is for display-only quilts`;
        },
      };
  }
}

function byPrecedence(a: CompiledRule, b: CompiledRule): number {
  return a.precedence - b.precedence || (a.ref.code < b.ref.code ? -1 : a.ref.code > b.ref.code ? 1 : 0) || a.order - b.order;
}

/** Compiles rules once: every bound becomes an integer, sorted by precedence then code. */
export function compileRules(rules: readonly CategoryRule[]): CompiledRules {
  const compiled = rules.map((r, order) => ({
    ref: { id: r.id, code: r.code, name: r.name },
    precedence: Number.isFinite(r.precedence) ? r.precedence : Number.MAX_SAFE_INTEGER,
    order,
    conditions: r.conditions.map(compileCondition),
  }));
  return { rules: compiled.sort(byPrecedence) };
}

function fits(rule: CompiledRule, e: Prepared): boolean {
  for (const c of rule.conditions) if (!c.test(e)) return false;
  return true;
}

function passReasons(rule: CompiledRule, e: Prepared): string[] {
  if (rule.conditions.length === 0) return [`${rule.ref.name} takes every entry`];
  return rule.conditions.map((c) => c.explain(e, rule.ref.name));
}

const names = (rules: CompiledRule[]) => list(rules.map((r) => r.ref.name), "and");

/** Matching rules, or for firstByPrecedence those tied on the best precedence. */
function winners(compiled: CompiledRules, e: Prepared, mode: OverlapMode): { matched: CompiledRule[]; chosen: CompiledRule[] } {
  const matched: CompiledRule[] = [];
  for (const r of compiled.rules) if (fits(r, e)) matched.push(r);
  if (mode === "flag" || matched.length < 2) return { matched, chosen: matched };
  const best = matched[0]!.precedence; // rules are sorted by precedence
  return { matched, chosen: matched.filter((r) => r.precedence === best) };
}

export function decidePrepared(compiled: CompiledRules, e: Prepared, mode: OverlapMode): Decision {
  const { matched, chosen } = winners(compiled, e, mode);
  if (chosen.length === 0) {
    const reasons = compiled.rules.map((r) => {
      const failed = r.conditions.find((c) => !c.test(e));
      return failed ? failed.explain(e, r.ref.name) : `${r.ref.name}: fits`;
    });
    return { kind: "none", reasons: reasons.length ? reasons : ["the show has no categories yet"] };
  }
  if (chosen.length === 1) {
    const rule = chosen[0]!;
    const reasons = passReasons(rule, e);
    const others = matched.filter((r) => r !== rule);
    if (others.length) reasons.push(`also fits ${names(others)}; ${rule.ref.name} comes first by precedence`);
    return { kind: "one", category: rule.ref, reasons };
  }
  const lead = mode === "flag"
    ? `fits ${chosen.length} categories, ${names(chosen)}: the category rules overlap here, so the chair places it`
    : `fits ${chosen.length} categories with the same precedence, ${names(chosen)}: the chair places it`;
  return { kind: "several", categories: chosen.map((r) => r.ref), reasons: [lead, ...chosen.flatMap((r) => passReasons(r, e))] };
}

/** The entry's category, or why it fits none or several. Default overlap mode: "flag". */
export function decideCategory(entry: EntryFacts, rules: readonly CategoryRule[], opts?: DecideOptions): Decision {
  return decidePrepared(compileRules(rules), prepare(entry), opts?.overlap ?? "flag");
}

/** decideCategory against rules compiled once (e.g. a live preview deciding on every keystroke). */
export function decideCompiled(entry: EntryFacts, compiled: CompiledRules, opts?: DecideOptions): Decision {
  return decidePrepared(compiled, prepare(entry), opts?.overlap ?? "flag");
}

/** Decisions for many entries, in their order, compiling the rules once. */
export function decideAll(entries: readonly EntryFacts[], rules: readonly CategoryRule[], opts?: DecideOptions): Decision[] {
  const compiled = compileRules(rules);
  const mode = opts?.overlap ?? "flag";
  return entries.map((e) => decidePrepared(compiled, prepare(e), mode));
}

/** For "why not the category I expected": if it fits, why; if not, every condition it fails. */
export function explainCategory(entry: EntryFacts, rule: CategoryRule): { fits: boolean; reasons: string[] } {
  const [compiled] = compileRules([rule]).rules;
  const e = prepare(entry);
  const failed = compiled!.conditions.filter((c) => !c.test(e));
  if (failed.length === 0) return { fits: true, reasons: passReasons(compiled!, e) };
  return { fits: false, reasons: failed.map((c) => c.explain(e, rule.name)) };
}

// ---------------------------------------------------------------------------------------------
// Previewing an edited rule

export type RulePreview = {
  /** Entries (by index) the rule as edited would fit. */
  takes: number[];
  /** Entries that, with the edited rule in place, fit no category. */
  none: number[];
  /** Entries that, with the edited rule in place, fit several (after the overlap option). */
  several: number[];
  /** Entries whose outcome (category, none, or which several) the edit changes. */
  changed: number[];
};

/** What `rule` (new, or replacing the rule with its id) would do to these entries. */
export function previewRule(rule: CategoryRule, allRules: readonly CategoryRule[], entries: readonly EntryFacts[], opts?: DecideOptions): RulePreview {
  const mode = opts?.overlap ?? "flag";
  const replaced = allRules.some((r) => r.id === rule.id);
  const after = replaced ? allRules.map((r) => (r.id === rule.id ? rule : r)) : [...allRules, rule];
  const before = compileRules(allRules);
  const now = compileRules(after);
  const edited = now.rules.find((r) => r.ref.id === rule.id)!;
  const outcome = (chosen: CompiledRule[]) => chosen.map((r) => r.ref.id).join("\u0000") || "\u0001none";
  const preview: RulePreview = { takes: [], none: [], several: [], changed: [] };
  entries.forEach((facts, i) => {
    const e = prepare(facts);
    if (fits(edited, e)) preview.takes.push(i);
    const chosen = winners(now, e, mode).chosen;
    if (chosen.length === 0) preview.none.push(i);
    if (chosen.length > 1) preview.several.push(i);
    if (outcome(chosen) !== outcome(winners(before, e, mode).chosen)) preview.changed.push(i);
  });
  return preview;
}

// ---------------------------------------------------------------------------------------------
// Checking a rule set: gaps and overlaps along one measure, by interval arithmetic on integers
