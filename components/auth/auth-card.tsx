// The frame of every sign-in style page: the mark, a heading, a line of help, the form, links.
import type { ReactNode } from "react";
import { RibbonMark } from "@/components/brand/ribbon-mark";

type Props = { title: ReactNode; description?: ReactNode; children: ReactNode; footer?: ReactNode };

export function AuthCard({ title, description, children, footer }: Props) {
  return (
    <div className="space-y-6">
      <div className="space-y-3 text-center">
        <RibbonMark className="mx-auto size-14" />
        <h1 className="text-3xl sm:text-4xl">{title}</h1>
        {description ? <div className="text-lg text-ink-muted">{description}</div> : null}
      </div>
      <div className="rounded-card border border-line bg-surface p-5 shadow-card sm:p-8">{children}</div>
      {footer ? <div className="space-y-2 text-center">{footer}</div> : null}
    </div>
  );
}
