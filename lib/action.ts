// The one wrapper every server action goes through: parse with the zod schema, find the viewer,
// run the handler, and answer `{ ok }` or `{ ok: false, status, message, fieldErrors, values }`.
// Server actions are public POST endpoints, so the handler itself does the role check.
import "server-only";
import type { z } from "zod";
import { AppError, type FieldErrors } from "@/lib/errors";
import { errorSummary } from "@/lib/error-log";
import { getViewer, type Viewer } from "@/lib/session";
import { fieldErrorsOf, findUnstorable, formDataToObject } from "@/lib/validation";

export type ActionResult<T = undefined> =
  | { ok: true; message?: string; data?: T }
  | {
      ok: false;
      status: 400 | 401 | 403 | 404 | 409 | 500;
      message: string;
      fieldErrors?: FieldErrors;
      /** What the user typed, so the form can show it again. */
      values?: Record<string, unknown>;
    };

type Handler<S extends z.ZodType, T> = (
  input: z.output<S>,
  viewer: Viewer,
) => Promise<{ message?: string; data?: T } | void>;

type Options = { allowAnonymous?: false };

/**
 * Makes a server action from a schema and a handler. The action accepts FormData (from a
 * <form action>) or a plain object (from react-hook-form), and the previous state first when it
 * is used with useActionState.
 */
export function defineAction<S extends z.ZodType, T = undefined>(schema: S, handler: Handler<S, T>, _opts?: Options) {
  return async function action(...args: unknown[]): Promise<ActionResult<T>> {
    const raw = args.length > 1 ? args[1] : args[0];
    const values = raw instanceof FormData ? formDataToObject(raw) : ((raw ?? {}) as Record<string, unknown>);
    const safeValues = redact(values);
    try {
      const viewer = await getViewer();
      if (!viewer) return { ok: false, status: 401, message: "Please sign in first.", values: safeValues };
      // The last line of defence: whatever a schema forgot, no string PostgreSQL can't store (NUL,
      // half a surrogate pair) and no hostile nesting gets past here.
      const unstorable = findUnstorable(values);
      if (unstorable) {
        return { ok: false, status: 400, message: "Some fields need attention.", fieldErrors: { [unstorable.path]: [unstorable.message] }, values: safeValues };
      }
      const parsed = schema.safeParse(values);
      if (!parsed.success) {
        return {
          ok: false,
          status: 400,
          message: "Some fields need attention.",
          fieldErrors: fieldErrorsOf(parsed.error),
          values: safeValues,
        };
      }
      const result = (await handler(parsed.data, viewer)) ?? {};
      return { ok: true, ...result };
    } catch (err) {
      if (err instanceof AppError) {
        return { ok: false, status: err.status, message: err.message, fieldErrors: err.fieldErrors, values: safeValues };
      }
      // Next.js signals redirect()/notFound() by throwing; let those through.
      if (isNextControlFlow(err)) throw err;
      // Kind, code and stack frames only: the message or a query's parameters can hold what was typed.
      console.error("[action] unexpected failure", errorSummary(err));
      return { ok: false, status: 500, message: "Something went wrong on our side; nothing was saved.", values: safeValues };
    }
  };
}

function isNextControlFlow(err: unknown): boolean {
  const digest = (err as { digest?: unknown } | null)?.digest;
  return typeof digest === "string" && (digest.startsWith("NEXT_") || digest.includes("HTTP_ERROR_FALLBACK"));
}

// Never send a password back to the browser, even to its owner.
function redact(values: Record<string, unknown>): Record<string, unknown> {
  const out: Record<string, unknown> = {};
  for (const [k, v] of Object.entries(values)) if (!/password|token|secret/i.test(k)) out[k] = v;
  return out;
}
