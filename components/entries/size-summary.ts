// A quilt's size in both units, as the entry form and its review write it.
import { formatCm, formatInches, UM_PER_CM } from "@/scoring/units";

/** "60½ × 72 in = 153.7 × 182.9 cm", in the order of the unit typed. */
export function sizeSummary(widthUm: number, lengthUm: number, unit: "in" | "cm"): string {
  const inches = `${formatInches(widthUm, false)} × ${formatInches(lengthUm)}`;
  const cm = `${(widthUm / UM_PER_CM).toFixed(1)} × ${formatCm(lengthUm)}`;
  return unit === "in" ? `${inches} = ${cm}` : `${cm} = ${inches}`;
}
