// The title block at the top of every page: an optional eyebrow (usually the show), the title,
// a line of description and actions.
import type { ReactNode } from "react";

type Props = { eyebrow?: ReactNode; title: ReactNode; description?: ReactNode; actions?: ReactNode; meta?: ReactNode };

export function PageHeader({ eyebrow, title, description, actions, meta }: Props) {
  return (
    <header className="mb-6 flex flex-wrap items-end justify-between gap-4 pb-4 stitch sm:mb-8">
      <div className="min-w-0 space-y-2">
        {eyebrow ? <p className="text-sm font-semibold tracking-wide text-gold-700 uppercase">{eyebrow}</p> : null}
        <h1 className="text-3xl sm:text-4xl">{title}</h1>
        {description ? <p className="max-w-prose text-lg text-ink-muted">{description}</p> : null}
        {meta ? <div className="flex flex-wrap items-center gap-2">{meta}</div> : null}
      </div>
      {actions ? <div className="flex flex-wrap gap-2">{actions}</div> : null}
    </header>
  );
}
