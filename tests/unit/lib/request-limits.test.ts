// The browser's own check of a server action's size, before Next.js refuses the body
// (next.config.ts experimental.serverActions.bodySizeLimit, Next.js docs).
import { describe, expect, it } from "vitest";
import { ACTION_BODY_LIMIT_BYTES, tooLargeForAction } from "@/lib/request-limits";

describe("tooLargeForAction", () => {
  it("lets an ordinary form through", () => {
    expect(tooLargeForAction({ title: "Lantern Field", statement: "Evening light over a field.".repeat(40) })).toBe(false);
  });

  it("stops a pasted text over the limit", () => {
    expect(tooLargeForAction({ statement: "x".repeat(ACTION_BODY_LIMIT_BYTES) })).toBe(true);
  });

  it("counts UTF-8 bytes, not characters", () => {
    // "é" is two bytes in UTF-8 (RFC 3629): 600,000 of them are 1.2 MB.
    expect(tooLargeForAction({ statement: "é".repeat(600_000) })).toBe(true);
  });
});
