// A ribbon's colour as a small rosette-like dot, always beside its name in text (never colour alone).
import type { RibbonStyle } from "@/scoring/awards";

export function RibbonSwatch({ ribbon, label }: { ribbon: RibbonStyle | null; label?: string }) {
  if (!ribbon) return null;
  return (
    <span className="inline-flex items-center gap-1.5">
      <span aria-hidden className="inline-block size-4 shrink-0 rounded-full border border-ink/30" style={{ backgroundColor: ribbon.colour }} />
      <span>{label ?? ribbon.name}</span>
    </span>
  );
}
