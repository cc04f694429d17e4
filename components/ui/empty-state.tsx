// What a list says when it has nothing in it yet, and what to do about it.
import type { ReactNode } from "react";
import type { LucideIcon } from "lucide-react";

type Props = { icon?: LucideIcon; title: ReactNode; children?: ReactNode; action?: ReactNode };

export function EmptyState({ icon: Icon, title, children, action }: Props) {
  return (
    <div className="flex flex-col items-center gap-3 rounded-card border-2 border-dashed border-line-strong/50 bg-surface/60 px-6 py-10 text-center">
      {Icon ? <Icon aria-hidden className="size-10 text-plum-400" /> : null}
      <h2 className="text-xl">{title}</h2>
      {children ? <div className="max-w-prose text-ink-muted">{children}</div> : null}
      {action ? <div className="mt-2">{action}</div> : null}
    </div>
  );
}
