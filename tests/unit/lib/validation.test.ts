// The input types every schema builds on: text PostgreSQL can store, whole numbers its integer
// columns hold, and the raw-input walk the action wrapper runs before any schema.
import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { boundedInt, findUnstorable, hasUnstorableChar, int4, INT4_MAX, INT4_MIN, MAX_INPUT_DEPTH, storableString, UNSTORABLE_MESSAGE } from "@/lib/validation";

describe("storableString", () => {
  // PostgreSQL refuses U+0000 in text and jsonb (PostgreSQL docs §8.3, §8.14); a lone surrogate has
  // no UTF-8 form (RFC 3629 §3).
  it.each([
    ["a NUL", "abc\u0000def"],
    ["a lone high surrogate", "quilt \ud83d"],
    ["a lone low surrogate", "\ude00 quilt"],
    ["two high surrogates in a row", "\ud83d\ud83d"],
    ["a reversed pair", "\ude00\ud83d"],
  ])("refuses %s with a plain message", (_, s) => {
    const r = storableString().safeParse(s);
    expect(r.success).toBe(false);
    expect(r.error!.issues[0]!.message).toBe(UNSTORABLE_MESSAGE);
    expect(UNSTORABLE_MESSAGE).toContain("a character we can't store");
  });

  it.each(["", "Log Cabin", "Grandmother’s Flower Garden 🧵", "日本の刺し子", "tab\tand\nnewline", "\u00e9\u0301"])("accepts %j", (s) => {
    expect(storableString().safeParse(s)).toEqual({ success: true, data: s });
  });

  it("keeps z.string()'s chain: trim, min, max, regex and its own message", () => {
    const s = storableString("Give a name.").trim().min(2).max(5).regex(/^[a-z]+$/);
    expect(s.safeParse("  abc ").data).toBe("abc");
    expect(s.safeParse("a").success).toBe(false);
    expect(s.safeParse("abcdef").success).toBe(false);
    expect(s.safeParse(42).error!.issues[0]!.message).toBe("Give a name.");
  });

  it("agrees with the UTF-8 round trip on any string (fast-check)", () => {
    fc.assert(
      fc.property(fc.string({ unit: "binary" }), (s) => {
        const roundTrips = Buffer.from(s, "utf8").toString("utf8") === s;
        expect(hasUnstorableChar(s)).toBe(!roundTrips || s.includes("\u0000"));
      }),
      { numRuns: 2000, seed: 20270313 },
    );
  });
});

describe("bounded integers", () => {
  it("int4 takes exactly PostgreSQL's integer range (PostgreSQL docs §8.1.1)", () => {
    expect(INT4_MAX).toBe(2 ** 31 - 1);
    expect(INT4_MIN).toBe(-(2 ** 31));
    for (const ok of [0, -0, 1, INT4_MAX, INT4_MIN]) expect(int4().safeParse(ok).success).toBe(true);
    for (const bad of [2 ** 31, -(2 ** 31) - 1, 2 ** 53, 2 ** 53 + 2, 1.5, NaN, Infinity, -Infinity, 1e309, "1", null]) {
      expect(int4().safeParse(bad).success, String(bad)).toBe(false);
    }
  });

  it("boundedInt names the field and the limits", () => {
    const n = boundedInt(1, 10_000, "A cap");
    expect(n.safeParse(10_001).error!.issues[0]!.message).toBe("A cap must be at most 10,000.");
    expect(n.safeParse(0).error!.issues[0]!.message).toBe("A cap must be at least 1.");
    expect(n.safeParse(2.5).error!.issues[0]!.message).toBe("A cap must be a whole number.");
    expect(n.safeParse("7").error!.issues[0]!.message).toBe("A cap must be a number.");
  });
});

describe("findUnstorable", () => {
  it("finds a bad string anywhere, and a bad key, with its path", () => {
    expect(findUnstorable({ a: "ok", b: [1, { c: "x\u0000" }] })).toEqual({ path: "b.1.c", message: UNSTORABLE_MESSAGE });
    expect(findUnstorable({ ["k\ud800"]: 1 })?.message).toBe(UNSTORABLE_MESSAGE);
    expect(findUnstorable("\udfff")).toEqual({ path: "_form", message: UNSTORABLE_MESSAGE });
    expect(findUnstorable({ a: "fine", n: 1, t: true, z: null })).toBeNull();
  });

  it("refuses nesting past the limit without recursing", () => {
    let deep: unknown = "leaf";
    for (let i = 0; i < 100_000; i++) deep = [deep];
    expect(findUnstorable(deep)?.message).toMatch(/nested too deeply/);
    let ok: unknown = "leaf";
    for (let i = 0; i < MAX_INPUT_DEPTH - 1; i++) ok = { x: ok };
    expect(findUnstorable(ok)).toBeNull();
  });
});
