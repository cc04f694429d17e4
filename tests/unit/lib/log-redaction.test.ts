// Errors Next.js logs on its own must not carry what people typed (OWASP ASVS 4.0 V7.1.1).
import { DrizzleQueryError } from "drizzle-orm/errors";
import { describe, expect, it } from "vitest";
import { redactLogArgs } from "@/lib/log-redaction";

describe("redactLogArgs", () => {
  it("logs a failed drizzle query as its summary: the statement with placeholders, not the values typed", () => {
    const cause = Object.assign(new Error("duplicate key value violates unique constraint"), { code: "23505", name: "PostgresError" });
    const err = new DrizzleQueryError("insert into users (email) values ($1)", ["ada.secret@example.test"], cause);
    expect(err.message).toContain("ada.secret@example.test"); // drizzle's own message holds it
    const [out] = redactLogArgs([err]);
    const text = JSON.stringify(out);
    expect(text).not.toContain("ada.secret@example.test");
    expect(text).toContain("insert into users (email) values ($1)");
    expect(text).toContain("23505");
  });

  it("leaves other log arguments as they are", () => {
    const plain = new Error("a plain failure");
    expect(redactLogArgs(["[api] failed", plain, 3])).toEqual(["[api] failed", plain, 3]);
  });
});
