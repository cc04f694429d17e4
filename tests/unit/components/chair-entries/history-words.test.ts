// The entry history reads as plain words: no action codes, field keys, micrometers or cents.
import { describe, expect, it } from "vitest";
import { actionLabel, changeLine, changedFields, fieldLabel } from "@/components/chair-entries/history-words";

const ctx = { timeZone: "America/Chicago", currency: "usd" };

describe("entry history words", () => {
  it("names each action in words, not its code", () => {
    expect(actionLabel("entry.quilt_saved")).toBe("Quilt details saved");
    expect(actionLabel("entry.about_saved")).toBe("Story and value saved");
    expect(actionLabel("entry.something_new")).toBe("something new");
  });

  it("gives sizes in inches and centimeters, money as money, choices by their labels", () => {
    // 1 in = 25,400 µm exactly (NIST SP 811): 1,270,000 µm is 50 in.
    expect(changeLine("widthUm", null, { widthUm: 1_270_000 }, ctx)).toBe("Width: 50 in (127.0 cm)");
    expect(changeLine("declaredValueCents", null, { declaredValueCents: 125_050 }, ctx)).toBe("Declared value: $1,250.50");
    expect(changeLine("quiltingMethod", null, { quiltingMethod: "frame_machine" }, ctx)).toBe("Quilting: Quilted on a frame machine");
    expect(changeLine("status", { status: "paid" }, { status: "accepted" }, ctx)).toBe("Status: Paid → Accepted");
    expect(changeLine("techniques", null, { techniques: ["pieced", "appliqué"] }, ctx)).toBe("Techniques: pieced, appliqué");
    expect(changeLine("forSale", null, { forSale: false }, ctx)).toBe("For sale: No");
  });

  it("leaves ids out and never shows a developer's key", () => {
    expect(changedFields(null, { categoryId: "x", rulesVersionId: "y", entryNumber: 12 })).toEqual(["entryNumber"]);
    for (const key of ["widthUm", "declaredValueCents", "quiltingMethod", "priceCents", "someNewUm"]) expect(fieldLabel(key)).not.toMatch(/Um$|Cents$|[a-z][A-Z]/);
  });
});
