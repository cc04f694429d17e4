// Two starter category sets a chair can load and then edit: a small guild show and a larger
// regional show. Names and codes are our own; the size limits are common practice, not any one
// show's. Both are built so that every judged entry fits exactly one category: technique
// categories form a chain (art first, then modern, …, each taking none of the earlier techniques)
// that ends in a "pieced and other techniques" catch-all, and size bands meet with "<" on one side
// and ">=" on the other, so no size falls between bands or on two.
import type { CategoryRule, Condition, OverlapMode } from "./categories";

export type StarterSet = {
  key: "guild" | "regional";
  name: string;
  description: string;
  overlap: OverlapMode;
  rules: CategoryRule[];
};

const judged: Condition = { kind: "judged", value: true };
const adults: Condition = { kind: "division", divisions: ["open", "first_time"] };
const perimeterIn = (bounds: [op: "<" | ">=", inches: number][]): Condition => ({
  kind: "size",
  measure: "perimeter",
  bounds: bounds.map(([op, value]) => ({ op, value, unit: "in" })),
});
const anyOf = (...techniques: string[]): Condition => ({ kind: "techniques", mode: "anyOf", techniques });
const noneOf = (...techniques: string[]): Condition => ({ kind: "techniques", mode: "noneOf", techniques });

const displayOnly = (code: string, precedence: number): CategoryRule => ({
  id: `display-only`,
  code,
  name: "Display only",
  description: "Quilts hung for the show but not judged.",
  precedence,
  conditions: [{ kind: "judged", value: false }],
});

const youth = (code: string, precedence: number): CategoryRule => ({
  id: "youth",
  code,
  name: "Youth",
  description: "Any judged quilt from the youth division, whatever its size or technique (the entry form sets the age limit).",
  precedence,
  conditions: [judged, { kind: "division", divisions: ["youth"] }],
});

// The technique chain shared by both sets: each step takes none of the techniques before it.
type TechniqueStep = { key: string; name: string; conditions: Condition[] };
const GUILD_TECHNIQUES: TechniqueStep[] = [
  { key: "art", name: "Art quilt (original design)", conditions: [anyOf("art")] },
  { key: "modern", name: "Modern", conditions: [anyOf("modern"), noneOf("art")] },
  { key: "wholecloth", name: "Wholecloth", conditions: [anyOf("wholecloth"), noneOf("art", "modern")] },
  { key: "applique", name: "Appliqué", conditions: [anyOf("appliqué"), noneOf("art", "modern", "wholecloth")] },
];

function guildRules(): CategoryRule[] {
  const pieced = noneOf("art", "modern", "wholecloth", "appliqué");
  const bands: [key: string, name: string, size: Condition][] = [
    ["small", "Small", perimeterIn([["<", 200]])],
    ["medium", "Medium", perimeterIn([[">=", 200], ["<", 300]])],
    ["large", "Large", perimeterIn([[">=", 300]])],
  ];
  return [
    ...bands.map(([key, name, size], i): CategoryRule => ({
      id: `pieced-${key}`,
      code: `${10 + i}`,
      name: `Pieced, ${name}`,
      description: "Pieced, mixed and other techniques not in a category below; perimeter " +
        ["under 200 in", "200 in or more and under 300 in", "300 in or more"][i] + ".",
      precedence: 10 + i,
      conditions: [judged, adults, pieced, size],
    })),
    ...GUILD_TECHNIQUES.map((t, i): CategoryRule => ({
      id: t.key,
      code: `${20 + 10 * i}`,
      name: t.name,
      precedence: 20 + 10 * i,
      conditions: [judged, adults, ...t.conditions],
    })),
    youth("60", 60),
    displayOnly("90", 90),
  ];
}

/** A small guild show: pieced quilts in three perimeter bands, four technique categories, youth, display only. */
export const GUILD_STARTER: StarterSet = {
  key: "guild",
  name: "Small guild show",
  description: "Pieced quilts by perimeter (under 200 in, 200 to under 300 in, 300 in or more); art, modern, wholecloth and appliqué any size; youth; display only.",
  overlap: "flag",
  rules: guildRules(),
};

const REGIONAL_TECHNIQUES: TechniqueStep[] = [
  { key: "pieced", name: "Pieced", conditions: [noneOf("art", "modern", "appliqué")] },
  { key: "applique", name: "Appliqué", conditions: [anyOf("appliqué"), noneOf("art", "modern")] },
  { key: "art", name: "Art", conditions: [anyOf("art")] },
  { key: "modern", name: "Modern", conditions: [anyOf("modern"), noneOf("art")] },
];
const REGIONAL_MAKERS: { key: string; name: string; conditions: Condition[] }[] = [
  { key: "solo", name: "one maker", conditions: [{ kind: "makers", count: "one" }, { kind: "quiltedForHire", value: false }] },
  { key: "hired", name: "quilted for hire", conditions: [{ kind: "makers", count: "one" }, { kind: "quiltedForHire", value: true }] },
  { key: "team", name: "two or more makers", conditions: [{ kind: "makers", count: "twoOrMore" }] },
];
const overMiniature: Condition = { kind: "size", measure: "longestSide", bounds: [{ op: ">", value: 24, unit: "in" }] };
const REGIONAL_SIZES: { key: string; name: string; condition: Condition }[] = [
  { key: "small", name: "small", condition: perimeterIn([["<", 240]]) },
  { key: "large", name: "large", condition: perimeterIn([[">=", 240]]) },
];

function regionalRules(): CategoryRule[] {
  const cells: CategoryRule[] = [];
  REGIONAL_MAKERS.forEach((maker, mi) => {
    REGIONAL_TECHNIQUES.forEach((tech, ti) => {
      REGIONAL_SIZES.forEach((size, si) => {
        const code = 100 * (mi + 1) + 10 * (ti + 1) + (si + 1);
        cells.push({
          id: `${maker.key}-${tech.key}-${size.key}`,
          code: String(code),
          name: `${tech.name}, ${size.name}, ${maker.name}`,
          description: `${size.key === "small" ? "Perimeter under 240 in" : "Perimeter 240 in or more"}, longest side over 24 in.`,
          precedence: code,
          conditions: [judged, adults, ...tech.conditions, ...maker.conditions, overMiniature, size.condition],
        });
      });
    });
  });
  return [
    ...cells,
    {
      id: "miniature",
      code: "400",
      name: "Miniature",
      description: "No side over 24 in, any technique and makers; blocks and quilting scaled down to match.",
      precedence: 400,
      conditions: [judged, adults, { kind: "size", measure: "longestSide", bounds: [{ op: "<=", value: 24, unit: "in" }] }],
    },
    youth("500", 500),
    displayOnly("900", 900),
  ];
}

/**
 * A larger regional show: technique (pieced and other, appliqué, art, modern) × size (perimeter
 * under 240 in, 240 in or more) × makers (one maker who quilted it, one maker quilted for hire,
 * two or more makers), plus miniature (no side over 24 in), youth and display only: 27 categories.
 */
export const REGIONAL_STARTER: StarterSet = {
  key: "regional",
  name: "Regional show",
  description: "Technique × size × makers (one maker, quilted for hire, two or more makers), with miniature, youth and display only.",
  overlap: "flag",
  rules: regionalRules(),
};

export const STARTER_SETS: readonly StarterSet[] = [GUILD_STARTER, REGIONAL_STARTER];

/** A fresh copy of a starter set's rules for a chair to edit (the constants stay untouched). */
export function loadStarterSet(key: StarterSet["key"]): CategoryRule[] {
  const set = STARTER_SETS.find((s) => s.key === key);
  if (!set) throw new Error(`No starter set called "${key}".`);
  return structuredClone(set.rules);
}
