// A paper card: the basic surface for grouped content.
import type { ComponentProps, ReactNode } from "react";
import { cx } from "./cx";

export function Card({ className, ...rest }: ComponentProps<"section">) {
  return <section className={cx("rounded-card border border-line bg-surface p-4 shadow-card sm:p-6", className)} {...rest} />;
}

/** A heading row for a card, with optional actions on the right. */
export function CardHeader({ title, description, actions, id }: { title: ReactNode; description?: ReactNode; actions?: ReactNode; id?: string }) {
  return (
    <div className="mb-4 flex flex-wrap items-start justify-between gap-3">
      <div className="min-w-0">
        <h2 id={id} className="text-xl sm:text-2xl">
          {title}
        </h2>
        {description ? <p className="mt-1 text-ink-muted">{description}</p> : null}
      </div>
      {actions ? <div className="flex flex-wrap gap-2">{actions}</div> : null}
    </div>
  );
}
