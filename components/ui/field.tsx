// Form fields: a label, the control, an optional hint and an error, tied together with
// aria-describedby and aria-invalid. The controls take react-hook-form's register() spread.
import { useId, type ComponentProps, type ReactNode } from "react";
import { ChevronDown, CircleX } from "lucide-react";
import { cx } from "./cx";

type FieldText = {
  label: ReactNode;
  hint?: ReactNode;
  error?: string;
  /** Shows "(optional)" after the label; required fields are the default in our forms. */
  optional?: boolean;
  /** Larger control for tablets at the judging table and the intake desk. */
  size?: "md" | "lg";
  className?: string;
};

export type ControlA11y = {
  id: string;
  "aria-describedby"?: string;
  "aria-invalid"?: true;
};

export const controlClasses = (size: "md" | "lg" = "md") =>
  cx(
    "block w-full rounded-control border border-line-strong bg-white text-ink placeholder:text-ink-muted/80",
    "aria-invalid:border-danger-600 aria-invalid:ring-1 aria-invalid:ring-danger-600 disabled:bg-paper-200",
    size === "lg" ? "min-h-tap-lg px-4 text-xl" : "min-h-tap px-3 text-base",
  );

/** The frame around any control; `children` receives the ids and aria props to spread. */
export function Field({
  id: givenId,
  label,
  hint,
  error,
  optional,
  className,
  children,
}: Omit<FieldText, "size"> & { id?: string; children: (a11y: ControlA11y) => ReactNode }) {
  const autoId = useId();
  const id = givenId ?? autoId;
  const hintId = hint ? `${id}-hint` : undefined;
  const errorId = error ? `${id}-error` : undefined;
  const describedBy = [errorId, hintId].filter(Boolean).join(" ") || undefined;
  return (
    <div className={cx("space-y-1.5", className)}>
      <label htmlFor={id} className="block font-medium text-ink">
        {label}
        {optional ? <span className="font-normal text-ink-muted"> (optional)</span> : null}
      </label>
      {hint ? (
        <p id={hintId} className="text-sm text-ink-muted">
          {hint}
        </p>
      ) : null}
      {children({ id, "aria-describedby": describedBy, "aria-invalid": error ? true : undefined })}
      <FieldError id={errorId} message={error} />
    </div>
  );
}

export function FieldError({ id, message }: { id?: string; message?: string }) {
  if (!message) return null;
  return (
    <p id={id} className="flex items-start gap-1.5 text-sm font-medium text-danger-700">
      <CircleX aria-hidden className="mt-0.5 size-4 shrink-0" />
      <span>{message}</span>
    </p>
  );
}

export function TextField({ label, hint, error, optional, size, className, id, ...input }: FieldText & ComponentProps<"input">) {
  return (
    <Field id={id} label={label} hint={hint} error={error} optional={optional} className={className}>
      {(a11y) => <input className={controlClasses(size)} {...input} {...a11y} />}
    </Field>
  );
}

export function TextareaField({ label, hint, error, optional, className, id, rows, ...input }: Omit<FieldText, "size"> & ComponentProps<"textarea">) {
  return (
    <Field id={id} label={label} hint={hint} error={error} optional={optional} className={className}>
      {(a11y) => <textarea rows={rows ?? 3} className={cx(controlClasses(), "py-2")} {...input} {...a11y} />}
    </Field>
  );
}

export function SelectField({ label, hint, error, optional, size, className, id, children, ...select }: FieldText & ComponentProps<"select">) {
  return (
    <Field id={id} label={label} hint={hint} error={error} optional={optional} className={className}>
      {(a11y) => (
        <div className="relative">
          <select className={cx(controlClasses(size), "appearance-none pr-10")} {...select} {...a11y}>
            {children}
          </select>
          <ChevronDown aria-hidden className="pointer-events-none absolute top-1/2 right-3 size-5 -translate-y-1/2 text-ink-muted" />
        </div>
      )}
    </Field>
  );
}

/** A checkbox whose whole label row is the touch target. */
export function CheckboxField({ label, hint, error, className, id: givenId, ...input }: Omit<FieldText, "size" | "optional"> & ComponentProps<"input">) {
  const autoId = useId();
  const id = givenId ?? autoId;
  const hintId = hint ? `${id}-hint` : undefined;
  const errorId = error ? `${id}-error` : undefined;
  return (
    <div className={cx("space-y-1", className)}>
      <label htmlFor={id} className="flex min-h-tap cursor-pointer items-start gap-3 py-2">
        <input
          id={id}
          type="checkbox"
          className="mt-0.5 size-6 shrink-0 cursor-pointer accent-plum-600"
          aria-describedby={[errorId, hintId].filter(Boolean).join(" ") || undefined}
          aria-invalid={error ? true : undefined}
          {...input}
        />
        <span>
          <span className="font-medium text-ink">{label}</span>
          {hint ? (
            <span id={hintId} className="block text-sm text-ink-muted">
              {hint}
            </span>
          ) : null}
        </span>
      </label>
      <FieldError id={errorId} message={error} />
    </div>
  );
}
