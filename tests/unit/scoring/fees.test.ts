// Entry fees, the per-entrant cap and withdrawal refunds, with the arithmetic written out.
// Fee shapes (member/non-member rates, caps per entrant, critique add-ons) are common practice
// at guild shows (common practice); the amounts here are invented.
import { describe, expect, it } from "vitest";
import { formatMoney, isGuildMember, isLate, quoteFees, withdrawalRefundCents, type FeeSchedule } from "@/scoring/fees";

const schedule: FeeSchedule = {
  entryFeeCents: 2500,
  memberEntryFeeCents: 1500,
  lateFeeCents: 500,
  lateFeeFromAt: new Date("2027-02-01T06:00:00Z"),
  critiqueFeeCents: 1000,
  feeCapCents: 6000,
};
const early = new Date("2027-01-15T12:00:00Z");
const late = new Date("2027-02-10T12:00:00Z");
const entry = (n: number, critiqueRequested = false) => ({ entryId: `e${n}`, entryNumber: n, title: `Quilt ${n}`, critiqueRequested });

describe("isGuildMember", () => {
  it("matches the show's guild name ignoring case and surrounding spaces", () => {
    expect(isGuildMember("  prairie star quilters ", "Prairie Star Quilters")).toBe(true);
    expect(isGuildMember("Prairie Star", "Prairie Star Quilters")).toBe(false);
    expect(isGuildMember("", "")).toBe(false);
    expect(isGuildMember(null, "Prairie Star Quilters")).toBe(false);
  });
});

describe("quoteFees", () => {
  it("two non-member entries before the late date, one with a critique: 2500 + 2500 + 1000 = 6000", () => {
    const q = quoteFees({ schedule, member: false, at: early, entries: [entry(101), entry(102, true)], entryFeesAlreadyPaidCents: 0 });
    expect(q.lines.map((l) => [l.entryId, l.kind, l.amountCents])).toEqual([
      ["e101", "entry", 2500],
      ["e102", "entry", 2500],
      ["e102", "critique", 1000],
    ]);
    expect(q.lines[0]!.description).toBe("Entry fee — entry 101: Quilt 101");
    expect(q.totalCents).toBe(6000);
    expect(q.entryFeesCents).toBe(5000);
    expect(q.late).toBe(false);
  });

  it("a member pays the member rate: 2 × 1500 = 3000", () => {
    const q = quoteFees({ schedule, member: true, at: early, entries: [entry(1), entry(2)], entryFeesAlreadyPaidCents: 0 });
    expect(q.totalCents).toBe(3000);
    expect(q.member).toBe(true);
  });

  it("after the late date each entry adds the late fee: 2 × (2500 + 500) = 6000", () => {
    const q = quoteFees({ schedule, member: false, at: late, entries: [entry(1), entry(2)], entryFeesAlreadyPaidCents: 0 });
    expect(q.lines.filter((l) => l.kind === "late").map((l) => l.amountCents)).toEqual([500, 500]);
    expect(q.totalCents).toBe(6000);
  });

  it("the late fee starts strictly after the late-fee moment", () => {
    expect(isLate(schedule, new Date("2027-02-01T06:00:00Z"))).toBe(false);
    expect(isLate(schedule, new Date("2027-02-01T06:00:01Z"))).toBe(true);
    expect(isLate({ lateFeeFromAt: null }, late)).toBe(false);
  });

  it("caps entry fees per entrant; late and critique fees come on top", () => {
    // Cap 6000, already paid 2500 → 3500 left. Three entries at 2500: 2500, then 1000, then 0.
    // Late fees 3 × 500 = 1500, critique on the third 1000. Total 2500 + 1000 + 1500 + 1000 = 6000.
    const q = quoteFees({ schedule, member: false, at: late, entries: [entry(1), entry(2), entry(3, true)], entryFeesAlreadyPaidCents: 2500 });
    expect(q.lines.filter((l) => l.kind === "entry").map((l) => [l.entryId, l.amountCents])).toEqual([
      ["e1", 2500],
      ["e2", 1000],
    ]);
    expect(q.entryFeesCents).toBe(3500);
    expect(q.capSavingCents).toBe(3 * 2500 - 3500); // 4000
    expect(q.lines.filter((l) => l.kind === "late")).toHaveLength(3);
    expect(q.totalCents).toBe(6000);
  });

  it("charges no entry fee once the cap is already reached", () => {
    const q = quoteFees({ schedule, member: false, at: early, entries: [entry(9)], entryFeesAlreadyPaidCents: 7000 });
    expect(q.lines).toEqual([]);
    expect(q.totalCents).toBe(0);
  });

  it("without a cap every entry pays the full rate: 4 × 2500 = 10000", () => {
    const q = quoteFees({ schedule: { ...schedule, feeCapCents: null }, member: false, at: early, entries: [1, 2, 3, 4].map((n) => entry(n)), entryFeesAlreadyPaidCents: 0 });
    expect(q.totalCents).toBe(10000);
  });

  it("stores lines whose kind can be read back", () => {
    const q = quoteFees({ schedule, member: false, at: late, entries: [entry(5, true)], entryFeesAlreadyPaidCents: 0 });
    expect(q.lines.map((l) => l.kind)).toEqual(["entry", "late", "critique"]);
    expect(q.lines.map((l) => l.description.split(" — ")[0])).toEqual(["Entry fee", "Late fee", "Critique fee"]);
  });
});

describe("withdrawalRefundCents", () => {
  it("is the show's percent of the entry fee, rounded down to the cent", () => {
    expect(withdrawalRefundCents(2500, 50)).toBe(1250); // 2500 × 50 / 100 = 1250
    expect(withdrawalRefundCents(2500, 100)).toBe(2500);
    expect(withdrawalRefundCents(1999, 75)).toBe(1499); // 1999 × 75 / 100 = 1499.25 → 1499
    expect(withdrawalRefundCents(1001, 33)).toBe(330); // 1001 × 33 / 100 = 330.33 → 330
    expect(withdrawalRefundCents(2500, 0)).toBe(0);
  });
});

describe("formatMoney", () => {
  it("shows cents as dollars", () => {
    expect(formatMoney(6000)).toBe("$60.00");
    expect(formatMoney(1499, "usd")).toBe("$14.99");
  });
});

describe("a critique asked for after the entry fee was paid", () => {
  it("is charged on its own: no entry or late fee, and the cap is not touched", async () => {
    const { quoteFees: quote, critiqueFeeDue } = await import("@/scoring/fees");
    const q = quote({
      schedule: { entryFeeCents: 2500, memberEntryFeeCents: 1500, lateFeeCents: 500, lateFeeFromAt: new Date(0), critiqueFeeCents: 500, feeCapCents: 5000 },
      member: false,
      at: new Date(),
      entries: [{ entryId: "e1", entryNumber: 101, title: "Quilt 101", critiqueRequested: true, critiqueOnly: true }],
      entryFeesAlreadyPaidCents: 2500,
    });
    expect(q.lines).toEqual([{ entryId: "e1", kind: "critique", amountCents: 500, description: "Critique fee — entry 101: Quilt 101" }]);
    expect(q.totalCents).toBe(500);
    const paid = { critiqueRequested: true, paidAt: new Date(), paymentReference: "card pi_1" };
    expect(critiqueFeeDue(paid, 500, false)).toBe(true);
    expect(critiqueFeeDue(paid, 500, true)).toBe(false);
    expect(critiqueFeeDue({ ...paid, paymentReference: "cash" }, 500, false)).toBe(false);
    expect(critiqueFeeDue({ ...paid, paidAt: null }, 500, false)).toBe(false);
  });
});
