"use client";
// Runs a server action from a react-hook-form form, so every form reads the same: the zod schema
// checks in the browser first, the action checks again on the server, and its `fieldErrors` land
// beside the fields (setError) while its `message` shows in an alert. What was typed stays.
import { useState, type BaseSyntheticEvent, type ReactNode } from "react";
import {
  useForm,
  type DefaultValues,
  type FieldErrors,
  type FieldValues,
  type Path,
  type UseFormReturn,
} from "react-hook-form";
import { zodResolver } from "@hookform/resolvers/zod";
import type { z } from "zod";
import type { ActionResult } from "@/lib/action";
import { TOO_LARGE_MESSAGE, tooLargeForAction } from "@/lib/request-limits";
import { Alert } from "@/components/ui/alert";
import { cx } from "@/components/ui/cx";

export type FormStatus = { tone: "success" | "error"; message: string; details?: string[] } | null;

type Success<R> = Extract<ActionResult<R>, { ok: true }>;

type Options<TIn extends FieldValues, TOut extends FieldValues, R> = {
  schema: z.ZodType<TOut, TIn>;
  defaultValues: DefaultValues<TIn>;
  /** Calls the server action with the parsed values (add hidden context such as showSlug here). */
  action: (values: TOut) => Promise<ActionResult<R>>;
  /** Shown when the action succeeds without a message of its own. */
  successMessage?: string;
  resetOnSuccess?: boolean;
  onSuccess?: (result: Success<R>) => void;
};

export type ActionFormController<TIn extends FieldValues, TOut extends FieldValues> = {
  form: UseFormReturn<TIn, unknown, TOut>;
  onSubmit: (e?: BaseSyntheticEvent) => Promise<void>;
  status: FormStatus;
  setStatus: (s: FormStatus) => void;
  pending: boolean;
  /** The message to show beside a field, from the browser check or the server. */
  errorOf: (name: Path<TIn>) => string | undefined;
};

export function useActionForm<TIn extends FieldValues, TOut extends FieldValues, R = unknown>(
  opts: Options<TIn, TOut, R>,
): ActionFormController<TIn, TOut> {
  const form = useForm<TIn, unknown, TOut>({
    resolver: zodResolver(opts.schema),
    defaultValues: opts.defaultValues,
    mode: "onTouched",
  });
  const [status, setStatus] = useState<FormStatus>(null);

  const onSubmit = form.handleSubmit(async (values) => {
    setStatus(null);
    // Next.js refuses an action body over the limit before the action runs; say so plainly here.
    if (tooLargeForAction(values)) {
      setStatus({ tone: "error", message: TOO_LARGE_MESSAGE });
      return;
    }
    let result: ActionResult<R> | undefined;
    try {
      result = await opts.action(values);
    } catch (err) {
      // A server action that calls redirect() rejects with Next's redirect signal while the
      // router is already navigating; there is nothing to show.
      if (isRedirectSignal(err)) return;
      console.error("[form] action failed", err);
      setStatus({ tone: "error", message: thrownMessage() });
      return;
    }
    if (!result) return;
    if (!result.ok) {
      const known = new Set(Object.keys(form.getValues() ?? {}));
      const details: string[] = [];
      let focused = false;
      for (const [key, messages] of Object.entries(result.fieldErrors ?? {})) {
        const message = messages[0];
        if (!message) continue;
        if (known.has(key)) {
          form.setError(key as Path<TIn>, { type: "server", message }, { shouldFocus: !focused });
          focused = true;
        } else {
          details.push(message);
        }
      }
      setStatus({ tone: "error", message: result.message, details });
      return;
    }
    setStatus({ tone: "success", message: result.message ?? opts.successMessage ?? "Saved." });
    if (opts.resetOnSuccess) form.reset(opts.defaultValues);
    opts.onSuccess?.(result);
  }, (errors) => {
    // The browser check stopped the save: say so at the top, with every reason, so a message beside
    // a field scrolled out of view (or one the form does not show) never leaves the button silent.
    const details = Object.values(errors as Record<string, { message?: unknown } | undefined>)
      .map((e) => (typeof e?.message === "string" ? e.message : null))
      .filter((m): m is string => m !== null);
    setStatus({ tone: "error", message: "Not saved yet: some fields need attention.", details });
  });

  const errorOf = (name: Path<TIn>) => messageAt(form.formState.errors, name);

  return { form, onSubmit, status, setStatus, pending: form.formState.isSubmitting, errorOf };
}

function messageAt<T extends FieldValues>(errors: FieldErrors<T>, name: string): string | undefined {
  const entry = (errors as Record<string, { message?: unknown } | undefined>)[name];
  return typeof entry?.message === "string" ? entry.message : undefined;
}

// The call itself failed: no network, or the server could not read what was sent (too large, or
// an encoding it refuses), which reaches the browser as a rejected call, not an answer.
function thrownMessage(): string {
  if (typeof navigator !== "undefined" && navigator.onLine === false) {
    return "You seem to be offline. Check your connection and try again; nothing was saved.";
  }
  return "Ribbonry could not take that. If you pasted a lot of text, it may be too much to send at once: shorten it and try again. Otherwise check your connection and try again; nothing was saved.";
}

function isRedirectSignal(err: unknown): boolean {
  const digest = (err as { digest?: unknown } | null)?.digest;
  return typeof digest === "string" && digest.startsWith("NEXT_REDIRECT");
}

type ActionFormProps<TIn extends FieldValues, TOut extends FieldValues> = {
  controller: ActionFormController<TIn, TOut>;
  children: ReactNode;
  className?: string;
  "aria-labelledby"?: string;
  "aria-label"?: string;
};

/** The <form> element with the result alert at its top. */
export function ActionForm<TIn extends FieldValues, TOut extends FieldValues>({
  controller,
  children,
  className,
  ...aria
}: ActionFormProps<TIn, TOut>) {
  return (
    <form noValidate onSubmit={controller.onSubmit} className={cx("space-y-5", className)} {...aria}>
      <FormStatusAlert status={controller.status} />
      {children}
    </form>
  );
}

export function FormStatusAlert({ status }: { status: FormStatus }) {
  if (!status) return null;
  return (
    <Alert live tone={status.tone} title={status.message}>
      {status.details?.length ? (
        <ul className="list-disc pl-5">
          {status.details.map((d) => (
            <li key={d}>{d}</li>
          ))}
        </ul>
      ) : null}
    </Alert>
  );
}
