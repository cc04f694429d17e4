// Ribbonry's mark: a pleated rosette on two notched tails, drawn inline so nothing is fetched.
import { cx } from "@/components/ui/cx";

const CX = 16;
const CY = 12.5;
// Twelve round pleats on a ring give the rosette its scalloped edge.
const PLEATS = Array.from({ length: 12 }, (_, i) => {
  const a = (i / 12) * Math.PI * 2;
  return { x: +(CX + Math.cos(a) * 8.6).toFixed(2), y: +(CY + Math.sin(a) * 8.6).toFixed(2) };
});

type Props = { className?: string; title?: string };

/** Decorative unless given a title. Size it with className (e.g. "size-8"). */
export function RibbonMark({ className, title }: Props) {
  return (
    <svg
      viewBox="0 0 32 32"
      className={cx("shrink-0", className)}
      role={title ? "img" : undefined}
      aria-hidden={title ? undefined : true}
      aria-label={title}
      focusable="false"
    >
      <path className="fill-plum-500" d="M11.2 17.5 6.6 30.4l3.3-1.5 2.2 2.6 4.3-12.4z" />
      <path className="fill-plum-400" d="M20.8 17.5 25.4 30.4l-3.3-1.5-2.2 2.6-4.3-12.4z" />
      <circle className="fill-gold-400" cx={CX} cy={CY} r={8.8} />
      {PLEATS.map((p) => (
        <circle key={`${p.x}-${p.y}`} className="fill-gold-400" cx={p.x} cy={p.y} r={2.6} />
      ))}
      <circle className="fill-plum-600" cx={CX} cy={CY} r={6.2} />
      <circle
        className="stroke-paper-100"
        cx={CX}
        cy={CY}
        r={4.4}
        fill="none"
        strokeWidth={0.9}
        strokeDasharray="1.6 1.2"
      />
      <circle className="fill-gold-300" cx={CX} cy={CY} r={1.6} />
    </svg>
  );
}
