// The one reader of PostgreSQL error codes: drizzle wraps the driver's error (code 23505 on its
// `cause`), so every check goes through postgresErrorOf.
import { describe, expect, it } from "vitest";
import { AppError, conflictOnUnique, isUniqueViolation, postgresErrorOf } from "@/lib/errors";

/** The shape drizzle-orm 0.45 throws: DrizzleQueryError with the postgres.js error as `cause`. */
function drizzleError(code: string, constraint?: string) {
  const cause = Object.assign(new Error("duplicate key value violates unique constraint"), { code, constraint_name: constraint });
  return Object.assign(new Error("Failed query: insert …\nparams: secret"), { query: "insert …", params: ["secret"], cause });
}

describe("PostgreSQL error mapping", () => {
  it("reads the code from the driver's error inside drizzle's", () => {
    expect(postgresErrorOf(drizzleError("23505", "show_awards_show_name"))).toEqual({ code: "23505", constraint: "show_awards_show_name" });
    expect(isUniqueViolation(drizzleError("23505"))).toBe(true);
    expect(isUniqueViolation(drizzleError("23503"))).toBe(false);
    expect(isUniqueViolation(drizzleError("23505", "a"), "b")).toBe(false);
    expect(isUniqueViolation(drizzleError("23505", "a"), "a")).toBe(true);
  });

  it("ignores Node's own error codes and non-errors", () => {
    expect(postgresErrorOf(Object.assign(new Error("x"), { code: "ECONNREFUSED" }))).toBeNull();
    expect(postgresErrorOf(null)).toBeNull();
    expect(postgresErrorOf("23505")).toBeNull();
  });

  it("turns a unique violation into a 409 and leaves anything else alone", () => {
    const mapped = conflictOnUnique(drizzleError("23505"), "There is already an award called “Best”.", { name: ["Choose another name."] });
    expect(mapped).toBeInstanceOf(AppError);
    expect(mapped).toMatchObject({ status: 409, message: "There is already an award called “Best”.", fieldErrors: { name: ["Choose another name."] } });
    const other = drizzleError("22P02");
    expect(conflictOnUnique(other, "x")).toBe(other);
  });
});
