// Buttons and button-looking links. Every size keeps a 44 × 44 px target (WCAG 2.2 SC 2.5.5).
import Link from "next/link";
import type { ComponentProps, ReactNode } from "react";
import { LoaderCircle } from "lucide-react";
import { cx } from "./cx";

export type ButtonVariant = "primary" | "secondary" | "ghost" | "danger";
export type ButtonSize = "md" | "lg";

const base =
  "inline-flex items-center justify-center gap-2 rounded-control font-semibold no-underline select-none " +
  "transition-colors disabled:cursor-not-allowed disabled:opacity-60 aria-disabled:cursor-not-allowed aria-disabled:opacity-60";

const variants: Record<ButtonVariant, string> = {
  primary: "bg-brand text-white hover:bg-brand-strong active:bg-plum-800",
  secondary: "border-2 border-brand bg-surface text-brand-strong hover:bg-plum-50 active:bg-plum-100",
  ghost: "text-brand-strong hover:bg-plum-50 active:bg-plum-100",
  danger: "bg-danger-600 text-white hover:bg-danger-700",
};

const sizes: Record<ButtonSize, string> = {
  md: "min-h-tap min-w-tap px-4 text-base",
  lg: "min-h-tap-lg min-w-tap-lg px-6 text-lg",
};

export function buttonClasses(opts: { variant?: ButtonVariant; size?: ButtonSize; className?: string } = {}) {
  return cx(base, variants[opts.variant ?? "primary"], sizes[opts.size ?? "md"], opts.className);
}

type Common = { variant?: ButtonVariant; size?: ButtonSize; icon?: ReactNode };

type ButtonProps = ComponentProps<"button"> & Common & { pending?: boolean; pendingLabel?: string };

export function Button({ variant, size, icon, pending, pendingLabel, className, children, disabled, type, ...rest }: ButtonProps) {
  return (
    <button
      type={type ?? "button"}
      className={buttonClasses({ variant, size, className })}
      disabled={disabled || pending}
      aria-busy={pending || undefined}
      {...rest}
    >
      {pending ? <LoaderCircle aria-hidden className="size-5 animate-spin" /> : icon}
      <span>{pending && pendingLabel ? pendingLabel : children}</span>
    </button>
  );
}

type ButtonLinkProps = ComponentProps<typeof Link> & Common;

export function ButtonLink({ variant, size, icon, className, children, ...rest }: ButtonLinkProps) {
  return (
    <Link className={buttonClasses({ variant, size, className })} {...rest}>
      {icon}
      <span>{children}</span>
    </Link>
  );
}
