// Score sheets: checking a sheet's criteria and scales, checking a judge's marks, and totalling a
// sheet with "not applicable" criteria rescaled, never counted as zero. Pure: also runs in the browser.
//
// Exact arithmetic: every number (points, most points, weight, level fraction) is read once from its
// decimal digits (String(x): 0.7 is seven tenths, not the nearest binary fraction) into an exact
// fraction of BigInts; sums, products and the rescaling are done on those fractions, and a result
// becomes a JavaScript number only at the end (correctly rounded while numerator and denominator fit
// in 2^53). So 0.7 × 10 is 7, full marks total exactly the sheet's nominal maximum however it is
// weighted or ordered, and the order of criteria never changes a total. Round only for display,
// with formatScore.
import { plural } from "./words";

/** Points from 0 to the criterion's most points, in steps (default 1). */
export type PointsScale = { kind: "points"; step?: number };
/** One word of a word scale; a mark at this level is worth fraction × the criterion's most points. */
export type WordLevel = { label: string; fraction: number };
/** A word scale such as Excellent / Good / Satisfactory / Needs improvement (labels are the show's). */
export type WordsScale = { kind: "words"; levels: WordLevel[] };
export type Scale = PointsScale | WordsScale;

/** One line of a score sheet. Its weighted maximum is maxPoints × weight. */
export type Criterion = {
  id: string;
  label: string;
  maxPoints: number;
  /** Multiplies the points (default 1). */
  weight?: number;
  scale: Scale;
  allowNotApplicable: boolean;
};
/** A group of criteria on the sheet (general appearance, design, workmanship…). */
export type SheetSection = { id: string; title: string; criteria: Criterion[] };
/** A score sheet; its nominal total is Σ maxPoints × weight, normally 100. */
export type ScoreSheet = { sections: SheetSection[] };

/** A judge's mark for one criterion; a criterion with no mark is not yet scored. */
export type Mark = { kind: "points"; points: number } | { kind: "word"; level: string } | { kind: "na" };
/** Marks by criterion id. */
export type Marks = Readonly<Record<string, Mark | undefined>>;

/** Something wrong with a sheet, in plain words, with where it is. */
export type SheetProblem = { sectionId?: string; criterionId?: string; text: string };
/** The result of checkSheet. */
export type SheetCheck = { ok: boolean; problems: SheetProblem[]; notes: string[]; nominalMax: number };
/** A mark that can't be used, in plain words. */
export type MarkProblem = { criterionId: string; text: string };

/** One section's subtotal: earned and applicableMax are weighted points, total is out of nominalMax. */
export type SectionTotal = {
  sectionId: string;
  title: string;
  earned: number;
  applicableMax: number;
  nominalMax: number;
  total: number | null;
  reason: string | null;
  naCriteria: string[];
  missing: string[];
};

/** A sheet's total: `total` is on the sheet's nominal scale (normally out of 100), N/A rescaled. */
export type SheetTotal = {
  complete: boolean;
  /** Criteria with no usable mark yet (absent or invalid), in sheet order. */
  missing: string[];
  invalid: MarkProblem[];
  /** Marks for criteria that are not on this sheet (ignored). */
  unknownMarks: string[];
  naCriteria: string[];
  nominalMax: number;
  /** Σ maxPoints × weight over the criteria scored so far that apply. */
  applicableMax: number;
  /** Σ points × weight over the same criteria. */
  earned: number;
  /** earned / applicableMax × nominalMax; null with a reason when there is nothing to total. */
  total: number | null;
  /** earned / applicableMax × 100. */
  percent: number | null;
  reason: string | null;
  bySection: SectionTotal[];
};

/** partial: total what is scored so far instead of refusing an unfinished sheet. */
export type TotalOptions = { partial?: boolean };

/** A partly scored sheet as the judge sees it while marking. */
export type RunningTotal = SheetTotal & {
  scoredCount: number;
  criteriaCount: number;
  /** Σ maxPoints × weight of the criteria not yet marked. */
  openMax: number;
  /** The final total if every open criterion got its lowest mark on its scale (none marked N/A). */
  lowestFinal: number | null;
  /** The final total if every open criterion got its highest mark on its scale (none marked N/A). */
  highestFinal: number | null;
};

// ---------------------------------------------------------------------------------------------
// Exact fractions

type Q = { n: bigint; d: bigint };
const ZERO: Q = { n: 0n, d: 1n };
const SAFE = BigInt(Number.MAX_SAFE_INTEGER);

function gcd(a: bigint, b: bigint): bigint {
  let x = a < 0n ? -a : a;
  let y = b < 0n ? -b : b;
  while (y) [x, y] = [y, x % y];
  return x;
}
function frac(n: bigint, d: bigint): Q {
  const sign = d < 0n ? -1n : 1n;
  const g = gcd(n, d) || 1n;
  return { n: (sign * n) / g, d: (sign * d) / g };
}
const add = (a: Q, b: Q) => frac(a.n * b.d + b.n * a.d, a.d * b.d);
const mul = (a: Q, b: Q) => frac(a.n * b.n, a.d * b.d);
const div = (a: Q, b: Q) => frac(a.n * b.d, a.d * b.n);
const cmp = (a: Q, b: Q) => Math.sign(Number(a.n * b.d - b.n * a.d));
const isWhole = (a: Q) => a.d === 1n;

/** The exact value of x's decimal digits; x must be finite. */
function exact(x: number): Q {
  const m = /^(-?)(\d+)(?:\.(\d+))?(?:e([+-]?\d+))?$/i.exec(String(x));
  if (!m) throw new RangeError(`${x} is not a finite number`);
  const [, sign = "", whole = "0", decimals = "", e = "0"] = m;
  const shift = Number(e) - decimals.length;
  const n = BigInt(sign + whole + decimals) * (shift > 0 ? 10n ** BigInt(shift) : 1n);
  return frac(n, shift < 0 ? 10n ** BigInt(-shift) : 1n);
}

function toNumber(q: Q): number {
  if ((q.n < 0n ? -q.n : q.n) <= SAFE && q.d <= SAFE) return Number(q.n) / Number(q.d);
  const whole = q.n / q.d;
  return Number(whole) + Number(((q.n - whole * q.d) * 10n ** 18n) / q.d) / 1e18;
}

// ---------------------------------------------------------------------------------------------
// Display

/**
 * x rounded half away from zero to `decimals` places on its decimal digits (so 1.005 → "1.01"),
 * trailing zeros dropped: 95 → "95", 90.5 → "90.5", 94.666… → "94.67". null or NaN → "—".
 */
export function formatScore(x: number | null | undefined, decimals = 2): string {
  if (x === null || x === undefined || !Number.isFinite(x)) return "—";
  const q = exact(x);
  const scale = 10n ** BigInt(Math.max(0, Math.floor(decimals)));
  const abs = q.n < 0n ? -q.n : q.n;
  const r = (2n * abs * scale + q.d) / (2n * q.d);
  const digits = r.toString().padStart(scale.toString().length, "0");
  const cut = digits.length - (scale.toString().length - 1);
  const whole = digits.slice(0, cut);
  const rest = digits.slice(cut).replace(/0+$/, "");
  const sign = q.n < 0n && r !== 0n ? "-" : "";
  return `${sign}${whole}${rest ? `.${rest}` : ""}`;
}

const num = (x: number) => formatScore(x, 6);
const fold = (label: string) => label.normalize("NFC").trim().toLowerCase();

// ---------------------------------------------------------------------------------------------
// Checking a sheet

const positive = (x: unknown): x is number => typeof x === "number" && Number.isFinite(x) && x > 0;
const weightOf = (c: Criterion) => c.weight ?? 1;
const allCriteria = (sheet: ScoreSheet) => sheet.sections.flatMap((s) => s.criteria);

function scaleProblems(c: Criterion): string[] {
  const out: string[] = [];
  const name = c.label || c.id;
  if (c.scale.kind === "points") {
    const step = c.scale.step ?? 1;
    if (!positive(step)) out.push(`${name}: the step between marks must be more than 0 (it is ${step}).`);
    else if (positive(c.maxPoints) && !isWhole(div(exact(c.maxPoints), exact(step)))) {
      out.push(`${name}: the top mark ${num(c.maxPoints)} can't be reached in steps of ${num(step)}.`);
    }
    return out;
  }
  if (c.scale.levels.length === 0) out.push(`${name} is marked in words but has no levels.`);
  const seen = new Set<string>();
  for (const level of c.scale.levels) {
    if (!level.label.trim()) out.push(`${name}: a level has no name.`);
    else if (seen.has(fold(level.label))) out.push(`${name} has the level "${level.label}" twice.`);
    seen.add(fold(level.label));
    if (typeof level.fraction !== "number" || !Number.isFinite(level.fraction) || level.fraction < 0 || level.fraction > 1) {
      out.push(`${name}: the level "${level.label}" is worth ${level.fraction} of the points; it must be between 0 and 1.`);
    }
  }
  return out;
}

function criterionProblems(c: Criterion): string[] {
  const name = c.label || c.id;
  const out: string[] = [];
  if (!c.label.trim()) out.push(`Criterion "${c.id}" has no label.`);
  if (!positive(c.maxPoints)) out.push(`${name}: the most points must be more than 0 (it is ${c.maxPoints}).`);
  if (!positive(weightOf(c))) out.push(`${name}: the weight must be more than 0 (it is ${weightOf(c)}).`);
  return [...out, ...scaleProblems(c)];
}

/** Problems with a sheet in plain words, its nominal total (Σ maxPoints × weight) and notes. */
export function checkSheet(sheet: ScoreSheet): SheetCheck {
  const problems: SheetProblem[] = [];
  const notes: string[] = [];
  const sectionIds = new Set<string>();
  const criterionLabels = new Map<string, string>();
  let nominal = ZERO;
  if (allCriteria(sheet).length === 0) problems.push({ text: "The score sheet has no criteria." });
  for (const s of sheet.sections) {
    if (sectionIds.has(s.id)) problems.push({ sectionId: s.id, text: `Two sections share the id "${s.id}".` });
    sectionIds.add(s.id);
    if (s.criteria.length === 0) problems.push({ sectionId: s.id, text: `The section "${s.title}" has no criteria.` });
    for (const c of s.criteria) {
      const twin = criterionLabels.get(c.id);
      if (twin !== undefined) problems.push({ sectionId: s.id, criterionId: c.id, text: `Two criteria share the id "${c.id}" (${twin} and ${c.label}).` });
      criterionLabels.set(c.id, c.label);
      const found = criterionProblems(c);
      for (const text of found) problems.push({ sectionId: s.id, criterionId: c.id, text });
      if (positive(c.maxPoints) && positive(weightOf(c))) nominal = add(nominal, mul(exact(c.maxPoints), exact(weightOf(c))));
      if (found.length === 0 && c.scale.kind === "words" && !c.scale.levels.some((l) => l.fraction === 1)) {
        notes.push(`${c.label}: no level gives full marks, so no entry can reach the sheet's full total.`);
      }
    }
  }
  const nominalMax = toNumber(nominal);
  if (allCriteria(sheet).length > 0 && nominalMax !== 100) notes.push(`The sheet adds up to ${num(nominalMax)} points, not the usual 100.`);
  return { ok: problems.length === 0, problems, notes, nominalMax };
}

// ---------------------------------------------------------------------------------------------
// Checking a mark

type Read = { ok: true; points: Q | null } | { ok: false; text: string };

function levelNames(scale: WordsScale): string {
  return scale.levels.map((l) => l.label).join(", ");
}

function readPoints(c: Criterion, step: number, points: number): Read {
  const name = c.label;
  if (typeof points !== "number" || !Number.isFinite(points)) return { ok: false, text: `${name}: the points must be a number.` };
  if (points < 0) return { ok: false, text: `${name}: points can't be below 0 (${num(points)} was given).` };
  if (points > c.maxPoints) return { ok: false, text: `${name}: ${num(points)} is more than the ${num(c.maxPoints)} points this criterion gives.` };
  const p = exact(points);
  const steps = div(p, exact(step));
  if (!isWhole(steps)) {
    const below = mul(exact(step), frac(steps.n / steps.d, 1n));
    const above = add(below, exact(step));
    return { ok: false, text: `${name}: ${num(points)} is not a mark on this scale, which goes in steps of ${num(step)} (try ${num(toNumber(below))} or ${num(toNumber(above))}).` };
  }
  return { ok: true, points: p };
}

function readMark(c: Criterion, mark: Mark): Read {
  const name = c.label;
  if (mark.kind === "na") {
    return c.allowNotApplicable ? { ok: true, points: null } : { ok: false, text: `${name} can't be marked not applicable on this sheet; give it a mark.` };
  }
  if (c.scale.kind === "points") {
    if (mark.kind !== "points") return { ok: false, text: `${name} is marked in points (0 to ${num(c.maxPoints)}), not in words.` };
    return readPoints(c, c.scale.step ?? 1, mark.points);
  }
  if (mark.kind !== "word") return { ok: false, text: `${name} is marked in words (${levelNames(c.scale)}), not in points.` };
  const level = c.scale.levels.find((l) => fold(l.label) === fold(String(mark.level)));
  if (!level) return { ok: false, text: `${name}: "${mark.level}" is not one of its levels (${levelNames(c.scale)}).` };
  return { ok: true, points: mul(exact(level.fraction), exact(c.maxPoints)) };
}

/** A plain-words message when a mark can't be used for this criterion; null when it can (or is absent). */
export function validateMark(criterion: Criterion, mark: Mark | undefined): string | null {
  if (!mark) return null;
  const r = readMark(criterion, mark);
  return r.ok ? null : r.text;
}

/** The points (unweighted) a mark is worth: a word level is fraction × maxPoints; null for N/A or a bad mark. */
export function markPoints(criterion: Criterion, mark: Mark | undefined): number | null {
  if (!mark) return null;
  const r = readMark(criterion, mark);
  return r.ok && r.points ? toNumber(r.points) : null;
}

// ---------------------------------------------------------------------------------------------
// Totals

type Tally = { earned: Q; applicable: Q; nominal: Q; open: Q; lowest: Q; highest: Q; na: string[]; missing: string[]; invalid: MarkProblem[] };
const emptyTally = (): Tally => ({ earned: ZERO, applicable: ZERO, nominal: ZERO, open: ZERO, lowest: ZERO, highest: ZERO, na: [], missing: [], invalid: [] });

function scaleEnds(c: Criterion): [Q, Q] {
  if (c.scale.kind === "points") return [ZERO, exact(c.maxPoints)];
  const fractions = c.scale.levels.map((l) => exact(l.fraction)).sort(cmp);
  return [mul(fractions[0] ?? ZERO, exact(c.maxPoints)), mul(fractions[fractions.length - 1] ?? ZERO, exact(c.maxPoints))];
}

function tallyCriterion(t: Tally, c: Criterion, mark: Mark | undefined) {
  const w = exact(weightOf(c));
  const max = mul(exact(c.maxPoints), w);
  t.nominal = add(t.nominal, max);
  const r = mark ? readMark(c, mark) : null;
  if (r && !r.ok) t.invalid.push({ criterionId: c.id, text: r.text });
  if (!r || !r.ok) {
    const [lo, hi] = scaleEnds(c);
    t.missing.push(c.id);
    t.open = add(t.open, max);
    t.lowest = add(t.lowest, mul(lo, w));
    t.highest = add(t.highest, mul(hi, w));
    return;
  }
  if (r.points === null) {
    t.na.push(c.id);
    return;
  }
  t.earned = add(t.earned, mul(r.points, w));
  t.applicable = add(t.applicable, max);
}

const rescale = (earned: Q, applicable: Q, nominal: Q): Q | null => (applicable.n === 0n ? null : mul(div(earned, applicable), nominal));

function totalReason(t: Tally, partial: boolean, what: string): string | null {
  if (t.missing.length > 0 && !partial) return `Not finished: ${plural(t.missing.length, "criterion", "criteria")} still to score in ${what}.`;
  if (t.applicable.n !== 0n) return null;
  if (t.missing.length > 0) return t.na.length ? `Nothing in ${what} that applies is scored yet.` : `Nothing in ${what} is scored yet.`;
  return `Every criterion in ${what} is marked not applicable, so there is nothing to total.`;
}

function sectionTotal(s: SheetSection, t: Tally, partial: boolean): SectionTotal {
  const reason = totalReason(t, partial, `the section "${s.title}"`);
  const total = reason ? null : rescale(t.earned, t.applicable, t.nominal);
  return {
    sectionId: s.id, title: s.title, earned: toNumber(t.earned), applicableMax: toNumber(t.applicable), nominalMax: toNumber(t.nominal),
    total: total && toNumber(total), reason, naCriteria: t.na, missing: t.missing,
  };
}

function merge(parts: Tally[]): Tally {
  const all = emptyTally();
  for (const p of parts) {
    for (const k of ["earned", "applicable", "nominal", "open", "lowest", "highest"] as const) all[k] = add(all[k], p[k]);
    all.na.push(...p.na);
    all.missing.push(...p.missing);
    all.invalid.push(...p.invalid);
  }
  return all;
}

function tallySheet(sheet: ScoreSheet, marks: Marks): { sections: Tally[]; all: Tally; unknown: string[] } {
  const get = (id: string) => (Object.hasOwn(marks, id) ? marks[id] : undefined);
  const sections = sheet.sections.map((s) => {
    const t = emptyTally();
    for (const c of s.criteria) tallyCriterion(t, c, get(c.id));
    return t;
  });
  const known = new Set(allCriteria(sheet).map((c) => c.id));
  const unknown = Object.keys(marks).filter((id) => !known.has(id) && marks[id] !== undefined);
  return { sections, all: merge(sections), unknown };
}

function refused(sheet: ScoreSheet, check: SheetCheck): SheetTotal {
  return {
    complete: false, missing: allCriteria(sheet).map((c) => c.id), invalid: [], unknownMarks: [], naCriteria: [],
    nominalMax: check.nominalMax, applicableMax: 0, earned: 0, total: null, percent: null,
    reason: `The score sheet needs fixing first: ${check.problems.map((p) => p.text).join(" ")}`, bySection: [],
  };
}

type Tallied = ReturnType<typeof tallySheet>;

function totalFrom(sheet: ScoreSheet, { sections, all, unknown }: Tallied, partial: boolean): SheetTotal {
  const reason = totalReason(all, partial, "this sheet");
  const total = reason ? null : rescale(all.earned, all.applicable, all.nominal);
  const percent = reason ? null : rescale(all.earned, all.applicable, frac(100n, 1n));
  return {
    complete: all.missing.length === 0, missing: all.missing, invalid: all.invalid, unknownMarks: unknown, naCriteria: all.na,
    nominalMax: toNumber(all.nominal), applicableMax: toNumber(all.applicable), earned: toNumber(all.earned),
    total: total && toNumber(total), percent: percent && toNumber(percent), reason,
    bySection: sheet.sections.map((s, i) => sectionTotal(s, sections[i]!, partial)),
  };
}

/**
 * The sheet's total. A criterion marked N/A leaves both what was earned and what could be earned,
 * and the rest is scaled back up to the sheet's nominal maximum: total = earned / applicableMax ×
 * nominalMax. Section subtotals are rescaled the same way within the section, so with N/A marks
 * the subtotals need not add up to the total. An unfinished sheet has total null unless
 * opts.partial; invalid marks count as not yet scored and are listed. A sheet with problems
 * (checkSheet) is not totalled.
 */
export function sheetTotal(sheet: ScoreSheet, marks: Marks, opts: TotalOptions = {}): SheetTotal {
  const check = checkSheet(sheet);
  if (!check.ok) return refused(sheet, check);
  return totalFrom(sheet, tallySheet(sheet, marks), opts.partial ?? false);
}

/**
 * The judge's running total: the total over what is scored so far (N/A rescaled as in sheetTotal),
 * what is still open, and where the final total would land if every open criterion got its lowest
 * or its highest mark. Marking an open criterion N/A instead can land outside these (it rescales
 * what is already scored).
 */
export function runningTotal(sheet: ScoreSheet, marks: Marks): RunningTotal {
  const check = checkSheet(sheet);
  const criteriaCount = allCriteria(sheet).length;
  if (!check.ok) return { ...refused(sheet, check), scoredCount: 0, criteriaCount, openMax: 0, lowestFinal: null, highestFinal: null };
  const tally = tallySheet(sheet, marks);
  const { all } = tally;
  const denominator = add(all.applicable, all.open);
  const at = (extra: Q) => {
    const q = rescale(add(all.earned, extra), denominator, all.nominal);
    return q && toNumber(q);
  };
  return {
    ...totalFrom(sheet, tally, true), scoredCount: criteriaCount - all.missing.length, criteriaCount,
    openMax: toNumber(all.open), lowestFinal: at(all.lowest), highestFinal: at(all.highest),
  };
}
