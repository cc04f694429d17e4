// A category's conditions as one short line of plain words, for the list of categories.
import type { Condition } from "@/scoring/categories";
import { DIVISION_WORDS, MAKERS_WORDS, MEASURE_WORDS, METHOD_WORDS, OP_SHORT } from "./form-model";

const join = (xs: readonly string[], word: string) => (xs.length <= 1 ? (xs[0] ?? "") : `${xs.slice(0, -1).join(", ")} ${word} ${xs[xs.length - 1]}`);

export function conditionWords(c: Condition): string {
  switch (c.kind) {
    case "size": {
      const measure = MEASURE_WORDS[c.measure].replace(/ \(.*\)$/, "").toLowerCase();
      return `${measure} ${c.bounds.map((b) => `${OP_SHORT[b.op]} ${b.value} ${b.unit}`).join(" and ")}`;
    }
    case "techniques": {
      const word = c.mode === "allOf" ? "and" : "or";
      if (c.mode === "noneOf") return `no ${join(c.techniques, "or")}`;
      return c.mode === "allOf" ? `all of ${join(c.techniques, word)}` : join(c.techniques, word);
    }
    case "quiltingMethod":
      return `quilted by ${join(c.methods.map((m) => METHOD_WORDS[m].toLowerCase()), "or")}`;
    case "makers":
      return MAKERS_WORDS[c.count].toLowerCase();
    case "quiltedForHire":
      return c.value ? "quilted for hire" : "not quilted for hire";
    case "judged":
      return c.value ? "judged" : "display only";
    case "division": {
      const ages =
        c.youthMinAge !== undefined && c.youthMaxAge !== undefined
          ? ` (youth ${c.youthMinAge} to ${c.youthMaxAge})`
          : c.youthMaxAge !== undefined
            ? ` (youth ${c.youthMaxAge} and under)`
            : c.youthMinAge !== undefined
              ? ` (youth ${c.youthMinAge} and over)`
              : "";
      return `${join(c.divisions.map((d) => DIVISION_WORDS[d].toLowerCase()), "or")} division${ages}`;
    }
  }
}

export const ruleWords = (conditions: readonly Condition[]) => (conditions.length ? conditions.map(conditionWords).join(" · ") : "every entry");
