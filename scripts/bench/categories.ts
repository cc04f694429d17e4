// Category engine timings: bulk decisions for 10,000 generated entries against 40 categories, and
// the rule editor's preview over the same entries. Prints figures only; nothing passes or fails.
import { decideAll, previewRule, type Bound, type CategoryRule, type Condition, type EntryFacts } from "../../scoring/categories";
import { mulberry32 } from "../../db/seed/demo-data";
import { checkSet, planMoves, type EntryInSet } from "../../scoring/category-sets";

const IN = 25_400; // µm (NIST SP 811)
const ENTRIES = 10_000;
const DECIDE_RUNS = 9;
const PREVIEW_RUNS = 20;

/** 40 categories: 4 techniques × 5 perimeter bands × 2 maker classes, all judged. */
function benchRules(): CategoryRule[] {
  const techniques: Condition[] = [
    { kind: "techniques", mode: "anyOf", techniques: ["art"] },
    { kind: "techniques", mode: "noneOf", techniques: ["art", "appliqué", "modern"] },
    { kind: "techniques", mode: "anyOf", techniques: ["appliqué"] },
    { kind: "techniques", mode: "anyOf", techniques: ["modern"] },
  ];
  const cuts = [100, 160, 240, 320];
  const makers: Condition[] = [{ kind: "makers", count: "one" }, { kind: "makers", count: "twoOrMore" }];
  const rules: CategoryRule[] = [];
  techniques.forEach((tech, ti) => {
    for (let band = 0; band <= cuts.length; band++) {
      const bounds: Bound[] = [];
      if (band > 0) bounds.push({ op: ">=", value: cuts[band - 1]!, unit: "in" });
      if (band < cuts.length) bounds.push({ op: "<", value: cuts[band]!, unit: "in" });
      makers.forEach((maker, mi) => {
        const code = `${ti + 1}${band}${mi}`;
        rules.push({
          id: `c${code}`, code, name: `Category ${code}`, precedence: rules.length,
          conditions: [{ kind: "judged", value: true }, tech, maker, { kind: "size", measure: "perimeter", bounds }],
        });
      });
    }
  });
  return rules;
}

function benchEntries(): EntryFacts[] {
  const rand = mulberry32(7);
  const pick = <T>(xs: readonly T[]): T => xs[Math.floor(rand() * xs.length)]!;
  const eighths = (lo: number, hi: number) => Math.round((lo + rand() * (hi - lo)) * 8) * (IN / 8);
  const tech = ["pieced", "appliqué", "art", "modern", "wholecloth", "embroidery", "paper piecing"];
  return Array.from({ length: ENTRIES }, () => ({
    widthUm: eighths(12, 110),
    lengthUm: eighths(12, 120),
    techniques: rand() < 0.3 ? [pick(tech), pick(tech)] : [pick(tech)],
    quiltingMethod: pick(["hand", "home_machine", "frame_machine"] as const),
    makerCount: rand() < 0.8 ? 1 : 2 + Math.floor(rand() * 3),
    quiltedForHire: rand() < 0.2,
    division: pick(["open", "youth", "first_time"] as const),
    judged: rand() < 0.97, // a few display-only entries fit none here
  }));
}

const sorted = (xs: number[]) => [...xs].sort((a, b) => a - b);
const quantile = (xs: number[], q: number) => sorted(xs)[Math.min(xs.length - 1, Math.ceil(q * xs.length) - 1)]!;

export async function benchCategories(): Promise<void> {
  const rules = benchRules();
  const entries = benchEntries();

  decideAll(entries, rules); // warm-up
  const decideMs: number[] = [];
  let outcomes = { one: 0, none: 0, several: 0 };
  for (let i = 0; i < DECIDE_RUNS; i++) {
    const t0 = performance.now();
    const decisions = decideAll(entries, rules);
    decideMs.push(performance.now() - t0);
    outcomes = { one: 0, none: 0, several: 0 };
    for (const d of decisions) outcomes[d.kind]++;
  }
  const median = quantile(decideMs, 0.5);
  console.log(`categories: decideAll ${ENTRIES.toLocaleString("en-US")} entries × ${rules.length} categories, ${DECIDE_RUNS} runs`);
  console.log(`  median ${median.toFixed(1)} ms (min ${Math.min(...decideMs).toFixed(1)}, max ${Math.max(...decideMs).toFixed(1)}), ${Math.round(ENTRIES / (median / 1000)).toLocaleString("en-US")} entries/s`);
  console.log(`  outcomes: ${outcomes.one} one, ${outcomes.none} none, ${outcomes.several} several`);

  // The editor's preview: the chair moves one band limit; the preview re-runs on every change.
  const edited = rules[4]!;
  const previewMs: number[] = [];
  for (let i = 0; i < PREVIEW_RUNS + 1; i++) {
    const limit = 150 + (i % 20);
    const rule: CategoryRule = {
      ...edited,
      conditions: edited.conditions.map((c) => (c.kind === "size" ? { ...c, bounds: [{ op: ">=", value: limit, unit: "in" }, { op: "<", value: 240, unit: "in" }] } : c)),
    };
    const t0 = performance.now();
    previewRule(rule, rules, entries);
    if (i > 0) previewMs.push(performance.now() - t0); // the first run is a warm-up
  }
  console.log(`categories: previewRule over ${ENTRIES.toLocaleString("en-US")} entries, ${PREVIEW_RUNS} runs`);
  console.log(`  median ${quantile(previewMs, 0.5).toFixed(1)} ms, p95 ${quantile(previewMs, 0.95).toFixed(1)} ms`);

  // Everything the chair's editor recomputes on a change: the rule's preview, the gap and overlap
  // check over the whole set, and the moves the save would make.
  const decisions = decideAll(entries, rules);
  const inSet: EntryInSet[] = entries.map((facts, i) => {
    const d = decisions[i]!;
    const current = d.kind === "one" ? { state: "decided" as const, categoryId: d.category.id } : d.kind === "several" ? { state: "fits_several" as const, candidateIds: d.categories.map((c) => c.id) } : { state: "fits_none" as const };
    return { id: `e${i}`, entryNumber: 101 + i, title: `Entry ${i}`, facts, current };
  });
  const editorMs: number[] = [];
  let moved = 0;
  for (let i = 0; i < PREVIEW_RUNS + 1; i++) {
    const limit = 150 + (i % 20);
    const rule: CategoryRule = {
      ...edited,
      conditions: edited.conditions.map((c) => (c.kind === "size" ? { ...c, bounds: [{ op: ">=", value: limit, unit: "in" }, { op: "<", value: 240, unit: "in" }] } : c)),
    };
    const next = rules.map((r) => (r.id === rule.id ? rule : r));
    const t0 = performance.now();
    previewRule(rule, rules, entries);
    checkSet(next);
    moved = planMoves(inSet, next).length;
    if (i > 0) editorMs.push(performance.now() - t0);
  }
  const editorMedian = quantile(editorMs, 0.5);
  console.log(`categories: the editor's whole preview (rule preview + gap/overlap check + moves) over ${ENTRIES.toLocaleString("en-US")} entries, ${PREVIEW_RUNS} runs`);
  console.log(`  median ${editorMedian.toFixed(1)} ms, p95 ${quantile(editorMs, 0.95).toFixed(1)} ms (last edit moves ${moved}); ${(editorMedian / 100).toFixed(2)}× a 100 ms "feels instant" budget`);
}
