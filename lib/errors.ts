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

/** Postgres unique_violation, for turning a race into a 409 instead of a 500. */
export function isUniqueViolation(err: unknown): boolean {
  const e = err as { code?: string; cause?: { code?: string } } | null;
  return e?.code === "23505" || e?.cause?.code === "23505";
}
