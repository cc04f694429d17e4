// Errors that carry the HTTP status and a message safe to show to the person who caused them.
export type FieldErrors = Record<string, string[]>;

export class AppError extends Error {
  constructor(
    readonly status: 400 | 401 | 403 | 404 | 409,
    message: string,
    readonly fieldErrors?: FieldErrors,
  ) {
    super(message);
    this.name = "AppError";
  }
}

export const unauthorized = (message = "Please sign in first.") => new AppError(401, message);
export const forbiddenError = (message = "Your role at this show does not allow this.") =>
  new AppError(403, message);
export const notFound = (message = "Not found.") => new AppError(404, message);
export const conflict = (message: string, fieldErrors?: FieldErrors) => new AppError(409, message, fieldErrors);
export const badInput = (message: string, fieldErrors?: FieldErrors) => new AppError(400, message, fieldErrors);

// ── PostgreSQL errors: the one place that reads their codes ─────────────────────────────────────

/**
 * The PostgreSQL error inside what a query threw: drizzle wraps the driver's error in a
 * DrizzleQueryError and keeps the original as `cause`, so a check of `err.code` alone never
 * matches. Walks the cause chain (a few levels at most).
 */
export function postgresErrorOf(err: unknown): { code: string; constraint?: string } | null {
  let e = err as { code?: unknown; constraint_name?: unknown; cause?: unknown } | null | undefined;
  for (let i = 0; i < 5 && e && typeof e === "object"; i++) {
    // SQLSTATE codes are five characters (PostgreSQL docs, Appendix A); Node's own codes are not.
    if (typeof e.code === "string" && /^[0-9A-Z]{5}$/.test(e.code)) {
      return { code: e.code, constraint: typeof e.constraint_name === "string" ? e.constraint_name : undefined };
    }
    e = e.cause as typeof e;
  }
  return null;
}

/** Postgres unique_violation (23505), optionally on one named constraint. */
export function isUniqueViolation(err: unknown, constraint?: string): boolean {
  const pg = postgresErrorOf(err);
  return pg?.code === "23505" && (constraint === undefined || pg.constraint === constraint);
}

/**
 * For a catch block: a unique violation becomes a 409 with the message (a race or a duplicate the
 * earlier check could not see); anything else comes back unchanged to be rethrown.
 *   catch (err) { throw conflictOnUnique(err, "There is already an award called …", { name: [...] }); }
 */
export function conflictOnUnique(err: unknown, message: string, fieldErrors?: FieldErrors, constraint?: string): unknown {
  return isUniqueViolation(err, constraint) ? conflict(message, fieldErrors) : err;
}
