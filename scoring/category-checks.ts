// Where a show's category rules leave gaps (sizes fitting no category) or overlaps (sizes fitting
// two), rules that can never fit or use a limit that can't be read, and sample entries that fit
// none or several. Pure, like ./categories.ts whose exact integer bounds it uses.
import {
  boundToInteger, compileRules, decidePrepared, foldTechnique, formatInUnit, MEASURE_LABEL, MEASURES, prepare,
  type BoundUnit, type CategoryRef, type CategoryRule, type Condition, type DecideOptions, type EntryFacts, type Measure,
} from "./categories";

/** Uncovered sizes: every integer µm (µm² for area) from fromUm to toUm inclusive (null: no end). */
export type RuleSetGap = { measure: Measure; fromUm: number; toUm: number | null; where: "below" | "between" | "above"; categories: CategoryRef[]; text: string };
/** Sizes fitting two categories: every integer µm (µm²) from atOrFromUm to toUm inclusive. */
export type RuleSetOverlap = { measure: Measure; atOrFromUm: number; toUm: number | null; categories: CategoryRef[]; text: string };
export type RuleSetProblem = { categories: CategoryRef[]; text: string };
export type SampleProblem = { index: number; kind: "none" | "several"; categories: CategoryRef[]; text: string };
export type RuleSetCheck = { gaps: RuleSetGap[]; overlaps: RuleSetOverlap[]; problems: RuleSetProblem[]; samples: SampleProblem[] };

const refOf = (r: CategoryRule): CategoryRef => ({ id: r.id, code: r.code, name: r.name });
const isSizeOn = (c: Condition, m: Measure): c is Extract<Condition, { kind: "size" }> => c.kind === "size" && c.measure === m && c.bounds.length > 0;

function canonical(c: Condition): string {
  const sorted = (xs: readonly string[]) => [...new Set(xs)].sort().join("|");
  switch (c.kind) {
    case "size": return `size:${c.measure}:${sorted(c.bounds.map((b) => `${b.op}${boundToInteger(c.measure, b) ?? `bad${b.value}${b.unit}`}`))}`;
    case "techniques": return `techniques:${c.mode}:${sorted(c.techniques.map(foldTechnique))}`;
    case "quiltingMethod": return `method:${sorted(c.methods)}`;
    case "makers": return `makers:${c.count}`;
    case "quiltedForHire": return `hire:${c.value}`;
    case "division": return `division:${sorted(c.divisions)}:${c.youthMinAge ?? ""}-${c.youthMaxAge ?? ""}`;
    case "judged": return `judged:${c.value}`;
  }
}

const signature = (r: CategoryRule, without?: Measure) =>
  r.conditions.filter((c) => !(c.kind === "size" && (c.bounds.length === 0 || c.measure === without))).map(canonical).sort().join(";");

type Span = { rule: CategoryRule; lo: number; hi: number }; // closed integer interval, hi may be Infinity

function spanOf(rule: CategoryRule, m: Measure): Span | "bad" | "empty" {
  let lo = 1; // lengths and areas are positive
  let hi = Infinity;
  for (const c of rule.conditions) {
    if (!isSizeOn(c, m)) continue;
    for (const b of c.bounds) {
      const v = boundToInteger(m, b);
      if (v === null) return "bad";
      if (b.op === ">=") lo = Math.max(lo, v);
      else if (b.op === ">") lo = Math.max(lo, v + 1);
      else if (b.op === "<=") hi = Math.min(hi, v);
      else hi = Math.min(hi, v - 1);
    }
  }
  return lo > hi ? "empty" : { rule, lo, hi };
}

function rangeText(m: Measure, unit: BoundUnit, limits: Set<number>, a: number, b: number): string {
  const f = (x: number) => formatInUnit(x, unit);
  const label = MEASURE_LABEL[m];
  if (a === b) return `${label} exactly ${f(a)}`;
  const lo = a <= 1 ? null : limits.has(a) || !limits.has(a - 1) ? `at least ${f(a)}` : `over ${f(a - 1)}`;
  const hi = b === Infinity ? null : limits.has(b) || !limits.has(b + 1) ? `at most ${f(b)}` : `under ${f(b + 1)}`;
  return `${label} ${[lo, hi].filter(Boolean).join(" and ") || "of any size"}`;
}

function checkMeasure(m: Measure, rules: readonly CategoryRule[], out: RuleSetCheck, seenPairs: Set<string>) {
  const groups = new Map<string, CategoryRule[]>();
  for (const r of rules) {
    const key = signature(r, m);
    groups.set(key, [...(groups.get(key) ?? []), r]);
  }
  for (const members of groups.values()) {
    if (members.length < 2 || !members.some((r) => r.conditions.some((c) => isSizeOn(c, m)))) continue;
    const spans: Span[] = [];
    for (const r of members) {
      const s = spanOf(r, m);
      if (typeof s !== "string") spans.push(s);
    }
    const bounds = members.flatMap((r) => r.conditions.filter((c) => isSizeOn(c, m)).flatMap((c) => (c as Extract<Condition, { kind: "size" }>).bounds));
    const unit = bounds[0]?.unit ?? (m === "area" ? "sq in" : "in");
    const limits = new Set(bounds.map((b) => boundToInteger(m, b)).filter((v): v is number => v !== null));
    spans.sort((x, y) => x.lo - y.lo || x.hi - y.hi);

    for (let i = 0; i < spans.length; i++) {
      for (let j = i + 1; j < spans.length; j++) {
        const [p, q] = [spans[i]!, spans[j]!];
        const a = Math.max(p.lo, q.lo);
        const b = Math.min(p.hi, q.hi);
        const pair = [p.rule.id, q.rule.id].sort().join("\u0000");
        if (a > b || seenPairs.has(pair)) continue;
        seenPairs.add(pair);
        out.overlaps.push({
          measure: m, atOrFromUm: a, toUm: b === Infinity ? null : b, categories: [refOf(p.rule), refOf(q.rule)],
          text: `${rangeText(m, unit, limits, a, b)} fits both ${p.rule.name} and ${q.rule.name}`,
        });
      }
    }

    let reach = 0;
    let last: Span | undefined;
    const gap = (from: number, to: number, where: RuleSetGap["where"], around: CategoryRule[], tail: string) =>
      out.gaps.push({ measure: m, fromUm: from, toUm: to === Infinity ? null : to, where, categories: around.map(refOf), text: `${rangeText(m, unit, limits, from, to)} fits no category: ${tail}` });
    for (const s of spans) {
      if (s.lo > reach + 1) {
        if (last) gap(reach + 1, s.lo - 1, "between", [last.rule, s.rule], `between ${last.rule.name} and ${s.rule.name}`);
        else gap(1, s.lo - 1, "below", [s.rule], `below ${s.rule.name}`);
      }
      if (s.hi > reach) [reach, last] = [s.hi, s];
    }
    if (last && reach !== Infinity) gap(reach + 1, Infinity, "above", [last.rule], `above ${last.rule.name}`);
  }
}

function ruleProblems(rules: readonly CategoryRule[], out: RuleSetCheck) {
  const seen = new Map<string, CategoryRule>();
  for (const r of rules) {
    const ref = [refOf(r)];
    for (const c of r.conditions) {
      if (c.kind === "size") {
        for (const b of c.bounds) {
          if (boundToInteger(c.measure, b) === null) out.problems.push({ categories: ref, text: `${r.name}: the ${MEASURE_LABEL[c.measure]} limit ${b.value} ${b.unit} can't be used (${c.measure === "area" ? "area limits are in sq in or sq cm" : "length limits are in in or cm, and not negative"})` });
        }
      }
      if (c.kind === "techniques" && c.mode === "anyOf" && c.techniques.length === 0) out.problems.push({ categories: ref, text: `${r.name} asks for any of no techniques, so nothing fits it` });
      if (c.kind === "quiltingMethod" && c.methods.length === 0) out.problems.push({ categories: ref, text: `${r.name} takes no quilting method, so nothing fits it` });
      if (c.kind === "division" && c.divisions.length === 0) out.problems.push({ categories: ref, text: `${r.name} takes no division, so nothing fits it` });
      if (c.kind === "division" && c.youthMinAge !== undefined && c.youthMaxAge !== undefined && c.youthMinAge > c.youthMaxAge) out.problems.push({ categories: ref, text: `${r.name}: youth ages ${c.youthMinAge} to ${c.youthMaxAge} leave no one` });
    }
    for (const m of MEASURES) {
      if (spanOf(r, m) === "empty") out.problems.push({ categories: ref, text: `${r.name} can never fit: its ${MEASURE_LABEL[m]} limits contradict each other` });
    }
    const key = signature(r);
    const twin = seen.get(key);
    if (twin) out.problems.push({ categories: [refOf(twin), refOf(r)], text: `${twin.name} and ${r.name} have the same conditions, so every entry fitting one fits both` });
    else seen.set(key, r);
  }
}

/**
 * Gaps and overlaps along each measure, among rules that differ only in their size conditions on
 * that measure (e.g. size bands of one technique); a rule of the same kind with no limit on the
 * measure covers every size. Overlaps between different kinds (a quilt both pieced and appliquéd)
 * can't be seen this way: pass sampleEntries to have each decided and see which fit none or several.
 */
export function checkRuleSet(rules: readonly CategoryRule[], sampleEntries?: readonly EntryFacts[], opts?: DecideOptions): RuleSetCheck {
  const out: RuleSetCheck = { gaps: [], overlaps: [], problems: [], samples: [] };
  ruleProblems(rules, out);
  const seenPairs = new Set<string>();
  for (const m of MEASURES) checkMeasure(m, rules, out, seenPairs);
  if (sampleEntries?.length) {
    const compiled = compileRules(rules);
    const mode = opts?.overlap ?? "flag";
    sampleEntries.forEach((facts, index) => {
      const d = decidePrepared(compiled, prepare(facts), mode);
      if (d.kind === "none") out.samples.push({ index, kind: "none", categories: [], text: `entry ${index + 1} fits no category` });
      if (d.kind === "several") out.samples.push({ index, kind: "several", categories: d.categories, text: d.reasons[0] ?? "" });
    });
  }
  return out;
}
