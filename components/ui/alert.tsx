// Notices in four tones, each with an icon and words so colour is never the only signal.
import type { ReactNode } from "react";
import { CircleCheck, CircleX, Info, TriangleAlert, type LucideIcon } from "lucide-react";
import { cx } from "./cx";

export type AlertTone = "info" | "success" | "warning" | "error";

const tones: Record<AlertTone, { box: string; icon: LucideIcon; label: string }> = {
  info: { box: "border-info-700/30 bg-info-50 text-info-700", icon: Info, label: "Note" },
  success: { box: "border-success-700/30 bg-success-50 text-success-700", icon: CircleCheck, label: "Done" },
  warning: { box: "border-warning-700/30 bg-warning-50 text-warning-700", icon: TriangleAlert, label: "Caution" },
  error: { box: "border-danger-700/30 bg-danger-50 text-danger-700", icon: CircleX, label: "Problem" },
};

type Props = {
  tone?: AlertTone;
  title?: ReactNode;
  children?: ReactNode;
  className?: string;
  /** Announce it when it appears (form results). Static notices stay quiet. */
  live?: boolean;
  id?: string;
};

export function Alert({ tone = "info", title, children, className, live, id }: Props) {
  const t = tones[tone];
  const Icon = t.icon;
  const role = live ? (tone === "error" ? "alert" : "status") : undefined;
  return (
    <div id={id} role={role} className={cx("flex gap-3 rounded-control border p-4", t.box, className)}>
      <Icon aria-hidden className="mt-0.5 size-5 shrink-0" />
      <div className="min-w-0 space-y-1">
        {title ? (
          <p className="font-semibold">
            <span className="sr-only">{t.label}: </span>
            {title}
          </p>
        ) : (
          <span className="sr-only">{t.label}: </span>
        )}
        {children ? <div className="text-ink [&_a]:font-semibold">{children}</div> : null}
      </div>
    </div>
  );
}
