import { describe, expect, it } from "vitest";
import { measureSchema } from "@/lib/schemas/categories";

const base = { entryId: "00000000-0000-4000-8000-000000000001", width: "60", length: "80", unit: "in" as const };
const errorsOf = (input: object) => {
  const r = measureSchema.safeParse({ ...base, ...input });
  return r.success ? {} : Object.fromEntries(r.error.issues.map((i) => [String(i.path[0]), i.message]));
};

describe("the desk's measured size", () => {
  it("accepts lengths people type", () => {
    expect(measureSchema.safeParse({ ...base, width: "60½", length: "80 1/4" }).success).toBe(true);
  });

  it("says why a width or length that is not a number is refused, beside that field", () => {
    const e = errorsOf({ width: "abc" });
    expect(Object.keys(e)).toEqual(["width"]);
    expect(e.width).toMatch(/\S/);
    expect(Object.keys(errorsOf({ length: "abc", unit: "cm" }))).toEqual(["length"]);
  });

  it("still asks for an empty length", () => {
    expect(errorsOf({ length: "" })).toEqual({ length: "Enter the measured length." });
  });
});
