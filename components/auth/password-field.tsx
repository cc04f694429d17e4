"use client";
// A password input with a large "Show" toggle, so people can check what they typed on a phone.
import { useState, type ComponentProps, type ReactNode } from "react";
import { Eye, EyeOff } from "lucide-react";
import { controlClasses, Field } from "@/components/ui/field";
import { cx } from "@/components/ui/cx";

type Props = { label: ReactNode; hint?: ReactNode; error?: string } & Omit<ComponentProps<"input">, "type">;

export function PasswordField({ label, hint, error, id, ...input }: Props) {
  const [visible, setVisible] = useState(false);
  return (
    <Field id={id} label={label} hint={hint} error={error}>
      {(a11y) => (
        <div className="relative">
          <input type={visible ? "text" : "password"} className={cx(controlClasses(), "pr-24")} {...input} {...a11y} />
          <button
            type="button"
            onClick={() => setVisible((v) => !v)}
            aria-pressed={visible}
            aria-controls={a11y.id}
            className="absolute top-0 right-0 inline-flex h-full min-h-tap min-w-tap items-center gap-1.5 rounded-r-control px-3 text-sm font-semibold text-brand-strong hover:bg-plum-50"
          >
            {visible ? <EyeOff aria-hidden className="size-5" /> : <Eye aria-hidden className="size-5" />}
            <span>{visible ? "Hide" : "Show"}</span>
            <span className="sr-only"> password</span>
          </button>
        </div>
      )}
    </Field>
  );
}
