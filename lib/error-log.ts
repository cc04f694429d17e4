// What the server logs about an unexpected error: its kind, code and where it was thrown, never
// its message, query parameters or the request body, which can hold what people typed (OWASP
// ASVS 4.0 V7.1.1, V7.1.2: no sensitive data in logs). For a database error, the SQL state code
// and the statement text with its $1, $2 placeholders, without the values.
export type ErrorSummary = {
  name: string;
  code?: string;
  sqlState?: string;
  query?: string;
  at?: string[];
  cause?: ErrorSummary;
};

const SQLSTATE = /^[0-9A-Z]{5}$/;
const FRAME = /^\s+at \S.*:\d+:\d+\)?$/;

export function errorSummary(err: unknown, depth = 0): ErrorSummary {
  if (!(err instanceof Error)) return { name: typeof err };
  const e = err as Error & { code?: unknown; query?: unknown; cause?: unknown };
  const name = e.constructor?.name && e.constructor.name !== "Error" ? e.constructor.name : e.name;
  const out: ErrorSummary = { name };
  if (typeof e.code === "string" || typeof e.code === "number") {
    if (SQLSTATE.test(String(e.code)) && name === "PostgresError") out.sqlState = String(e.code);
    else out.code = String(e.code);
  }
  if (typeof e.query === "string") out.query = e.query.slice(0, 2000);
  // The first stack line repeats the message; keep only the frames.
  const frames = (e.stack ?? "").split("\n").filter((l) => FRAME.test(l)).slice(0, 6).map((l) => l.trim());
  if (frames.length) out.at = frames;
  if (e.cause !== undefined && depth < 3) out.cause = errorSummary(e.cause, depth + 1);
  return out;
}
