// What the server logs about an unexpected error keeps what people typed out (OWASP ASVS 4.0
// V7.1.1, V7.1.2): no message, no query parameters; the SQL state and the statement's placeholders.
import { DrizzleQueryError } from "drizzle-orm/errors";
import { describe, expect, it } from "vitest";
import { errorSummary } from "@/lib/error-log";

class PostgresError extends Error {
  code = "22021";
  query = "select * from entries where title = $1";
  parameters = ["Grandmother's secret\u0000quilt"];
}

describe("errorSummary", () => {
  it("names a database error by its SQL state and statement, without parameter values", () => {
    const pg = new PostgresError('invalid byte sequence for encoding "UTF8": 0x00 near "Grandmother\'s secret"');
    const err = new DrizzleQueryError(pg.query, pg.parameters, pg);
    const out = JSON.stringify(errorSummary(err));
    expect(out).not.toContain("secret");
    expect(out).toContain('"sqlState":"22021"');
    expect(out).toContain("select * from entries where title = $1");
    expect(out).toContain("DrizzleQueryError");
  });

  it("keeps an error's kind, code and stack frames, not its message", () => {
    const err = Object.assign(new TypeError("cannot read chairEmail of someone@example.test"), { code: "ERR_X" });
    const out = errorSummary(err);
    expect(out).toMatchObject({ name: "TypeError", code: "ERR_X" });
    expect(JSON.stringify(out)).not.toContain("someone@example.test");
    expect(out.at?.[0]).toMatch(/^at /);
  });

  it("copes with things thrown that are not errors", () => {
    expect(errorSummary("a string with a password")).toEqual({ name: "string" });
  });
});
