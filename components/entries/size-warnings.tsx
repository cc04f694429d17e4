"use client";
// Under the size on the quilt step: a word when the size is below the show's minimum, unusual for
// a quilt, or outside every category's sizes (scoring/quilt-size.ts, the same rules the server uses).
import { TriangleAlert } from "lucide-react";
import type { ShowCategory } from "@/scoring/category-sets";
import { parseLength, type LengthUnit } from "@/scoring/measure";
import { sizeWarnings } from "@/scoring/quilt-size";

type Props = { widthText: string; lengthText: string; unit: LengthUnit; minSideUm: number | null; categories: readonly ShowCategory[] };

export function SizeWarnings({ widthText, lengthText, unit, minSideUm, categories }: Props) {
  const w = parseLength(widthText, unit);
  const l = parseLength(lengthText, unit);
  if (!w.ok || !l.ok) return null;
  const warnings = sizeWarnings({ widthUm: w.um, lengthUm: l.um }, { minSideUm, categories });
  if (warnings.length === 0) return null;
  return (
    <div role="status" aria-label="About this size" className="flex gap-3 rounded-control border border-warning-700/40 bg-warning-50 p-3 text-sm">
      <TriangleAlert aria-hidden className="mt-0.5 size-5 shrink-0 text-warning-700" />
      <ul className="space-y-1">
        {warnings.map((m) => (
          <li key={m}>{m}</li>
        ))}
      </ul>
    </div>
  );
}
