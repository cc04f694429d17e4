// Grey placeholders for loading states; they keep the shape of what is coming.
import type { ReactNode } from "react";
import { cx } from "./cx";

export function Skeleton({ className }: { className?: string }) {
  return <div aria-hidden className={cx("animate-pulse rounded-control bg-paper-300/70", className)} />;
}

/** Wraps a loading region so assistive technology hears "Loading…" once. */
export function LoadingRegion({ label = "Loading…", children }: { label?: string; children: ReactNode }) {
  return (
    <div role="status" aria-live="polite" aria-busy="true">
      <span className="sr-only">{label}</span>
      {children}
    </div>
  );
}
