// A table that stacks into labelled cards on phones. Each cell repeats its column label for
// sighted phone users (hidden from screen readers, which keep the real column headers).
import type { ComponentProps, ReactNode } from "react";
import { cx } from "./cx";

export function Table({ className, caption, children }: { className?: string; caption?: ReactNode; children: ReactNode }) {
  return (
    <div className={cx("sm:overflow-x-auto sm:rounded-card sm:border sm:border-line sm:bg-surface", className)}>
      {/* Explicit roles keep table semantics when the phone layout changes the display type. */}
      <table role="table" className="w-full border-collapse text-left">
        {caption ? <caption className="sr-only">{caption}</caption> : null}
        {children}
      </table>
    </div>
  );
}

export function THead({ children }: { children: ReactNode }) {
  return (
    <thead role="rowgroup" className="sr-only sm:not-sr-only sm:table-header-group sm:bg-paper-200">
      {children}
    </thead>
  );
}

export function TBody({ children }: { children: ReactNode }) {
  return (
    <tbody role="rowgroup" className="block space-y-3 sm:table-row-group sm:space-y-0">
      {children}
    </tbody>
  );
}

export function Tr({ className, ...rest }: ComponentProps<"tr">) {
  return (
    <tr
      role="row"
      className={cx(
        "block rounded-card border border-line bg-surface p-3 shadow-card",
        "sm:table-row sm:rounded-none sm:border-0 sm:border-t sm:p-0 sm:shadow-none sm:first:border-t-0",
        className,
      )}
      {...rest}
    />
  );
}

export function Th({ className, ...rest }: ComponentProps<"th">) {
  return (
    <th
      role="columnheader"
      scope="col"
      className={cx("px-4 py-3 text-sm font-semibold whitespace-nowrap text-ink-muted", className)}
      {...rest}
    />
  );
}

type TdProps = ComponentProps<"td"> & { label: string; /** The row's title cell: shown first and larger on phones. */ primary?: boolean };

export function Td({ label, primary, className, children, ...rest }: TdProps) {
  return (
    <td
      role="cell"
      className={cx(
        "flex gap-3 py-1 sm:table-cell sm:px-4 sm:py-3 sm:align-top",
        primary ? "text-lg font-semibold sm:text-base" : "items-baseline",
        className,
      )}
      {...rest}
    >
      {primary ? null : (
        <span aria-hidden className="w-28 shrink-0 text-sm text-ink-muted sm:hidden">
          {label}
        </span>
      )}
      <div className="min-w-0">{children}</div>
    </td>
  );
}
