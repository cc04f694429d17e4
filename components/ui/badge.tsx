// A status label: always a word and an icon, with colour as a third, never the only, signal.
import type { ReactNode } from "react";
import type { LucideIcon } from "lucide-react";
import { cx } from "./cx";

export type BadgeTone = "neutral" | "brand" | "info" | "success" | "warning" | "danger" | "gold";

const tones: Record<BadgeTone, string> = {
  neutral: "border-line-strong/40 bg-paper-200 text-ink",
  brand: "border-plum-300 bg-plum-50 text-plum-700",
  info: "border-info-700/30 bg-info-50 text-info-700",
  success: "border-success-700/30 bg-success-50 text-success-700",
  warning: "border-warning-700/30 bg-warning-50 text-warning-700",
  danger: "border-danger-700/30 bg-danger-50 text-danger-700",
  gold: "border-gold-500/50 bg-gold-100 text-gold-800",
};

type Props = { tone?: BadgeTone; icon?: LucideIcon; children: ReactNode; className?: string; title?: string };

export function Badge({ tone = "neutral", icon: Icon, children, className, title }: Props) {
  return (
    <span
      title={title}
      className={cx(
        "inline-flex items-center gap-1.5 rounded-full border px-2.5 py-0.5 text-sm font-semibold whitespace-nowrap",
        tones[tone],
        className,
      )}
    >
      {Icon ? <Icon aria-hidden className="size-4 shrink-0" /> : null}
      {children}
    </span>
  );
}
