// Keeps what people typed out of the server's own logs. Next.js logs an error thrown while
// rendering a page with console.error(err) itself, and a database error from drizzle carries the
// query's parameters in its message ("Failed query: … params: …"): such errors are logged as their
// summary (lib/error-log.ts) instead (OWASP ASVS 4.0 V7.1.1).
import { errorSummary } from "@/lib/error-log";

/** An error that holds query parameters: its own, or one of its causes. */
function carriesParameters(err: unknown, depth = 0): boolean {
  if (!(err instanceof Error) || depth > 3) return false;
  const e = err as Error & { params?: unknown; parameters?: unknown };
  if (e.params !== undefined || e.parameters !== undefined || e.name === "PostgresError" || e.constructor?.name === "DrizzleQueryError") return true;
  return carriesParameters(e.cause, depth + 1);
}

/** The arguments of a log call with every parameter-carrying error replaced by its summary. */
export function redactLogArgs(args: unknown[]): unknown[] {
  return args.map((a) => (carriesParameters(a) ? { error: errorSummary(a) } : a));
}

let installed = false;

/** Wraps console.error and console.warn once per process. */
export function installLogRedaction() {
  if (installed) return;
  installed = true;
  for (const level of ["error", "warn"] as const) {
    const original = console[level].bind(console);
    console[level] = (...args: unknown[]) => original(...redactLogArgs(args));
  }
}
