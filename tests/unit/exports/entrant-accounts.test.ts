// Each entrant's account for the entrants spreadsheet, with the arithmetic written out: card
// payments less refunds, offline payments quoted from the schedule when marked paid, what is
// still owed quoted as a checkout now would, and the payment status in words.
// Fee shapes (member rate, late fee, critique add-on, cap per entrant) are common practice at
// guild shows; the amounts and people are invented.
import { describe, expect, it } from "vitest";
import { entrantAccount, entrantAccounts, type AccountEntry, type AccountPayment, type EntrantFacts } from "@/exports/entrant-accounts";
import type { FeeSchedule } from "@/scoring/fees";

const schedule: FeeSchedule = { entryFeeCents: 2500, memberEntryFeeCents: 1500, lateFeeCents: 500, lateFeeFromAt: new Date("2027-02-01T06:00:00Z"), critiqueFeeCents: 1000, feeCapCents: 6000 };
const early = new Date("2027-01-15T12:00:00Z");
const later = new Date("2027-01-20T12:00:00Z");
const late = new Date("2027-02-10T12:00:00Z");
const GUILD = "Cedar Hollow Quilters";
const ctx = (now = early) => ({ schedule, showGuildName: GUILD, now });

const entry = (n: number, fields: Partial<AccountEntry> = {}): AccountEntry => ({
  id: `e${n}`, entryNumber: n, title: `Quilt ${n}`, status: "submitted", waitlisted: false, critiqueRequested: false, paidAt: null, paymentReference: "", ...fields,
});
const cardPaid = (n: number, at = early, fields: Partial<AccountEntry> = {}) => entry(n, { status: "paid", paidAt: at, paymentReference: "card pi_test", ...fields });
const payment = (items: [number, number, string][], fields: Partial<AccountPayment> = {}): AccountPayment => ({
  status: "paid", amountCents: items.reduce((s, [, c]) => s + c, 0), refundedCents: 0, paidAt: early,
  items: items.map(([n, amountCents, description]) => ({ entryId: `e${n}`, amountCents, kind: kindOf(description), description })), ...fields,
});
/** A line's kind from the start of its description, as checkout words it. */
function kindOf(description: string): "entry" | "late" | "critique" {
  return description.startsWith("Late fee") ? "late" : description.startsWith("Critique fee") ? "critique" : "entry";
}
const person = (entries: AccountEntry[], payments: AccountPayment[] = [], fields: Partial<EntrantFacts> = {}): EntrantFacts => ({
  name: "Wren Castellano", email: "wren@example.test", phone: "555-0101", addressLine1: "14 Loom Street", addressLine2: "", city: "Millbrook", region: "WI",
  postalCode: "53000", country: "US", guild: "", publishNameConsent: true, entries, payments, ...fields,
});

describe("entrantAccount", () => {
  it("lists declined entries that were paid and not refunded for the treasurer to check", () => {
    const f = person(
      [cardPaid(101, early, { status: "declined" }), cardPaid(102, early, { status: "declined" }), entry(103, { status: "declined", paidAt: early, paymentReference: "cash" }), entry(104, { status: "declined" }), cardPaid(105)],
      [payment([[101, 2500, "Entry fee — entry 101"]], { status: "refunded", refundedCents: 2500 }), payment([[102, 2500, "Entry fee — entry 102"], [105, 2500, "Entry fee — entry 105"]])],
    );
    // 101 was refunded, 104 was never paid, 105 is still in the show: 102 (card) and 103 (cash) remain.
    expect(entrantAccount(f, ctx()).refundToCheck).toEqual([102, 103]);
  });

  it("card payment for everything: 2500 + 2500 + 1000 critique = 6000 due and paid", () => {
    const f = person([cardPaid(101), cardPaid(102)], [payment([[101, 2500, "Entry fee — entry 101: Harbor Lights"], [102, 2500, "Entry fee — entry 102"], [102, 1000, "Critique fee — entry 102"]], { paidAt: later })]);
    expect(entrantAccount(f, ctx(late))).toMatchObject({ entries: 2, feesDueCents: 6000, paidCents: 6000, outstandingCents: 0, paymentStatus: "paid", lastPaymentAt: later, member: false });
  });

  it("one entry paid by card, one not yet: part paid, the rest quoted at today's rate", () => {
    const f = person([cardPaid(101), entry(102)], [payment([[101, 2500, "Entry fee — entry 101"]])]);
    expect(entrantAccount(f, ctx(early))).toMatchObject({ feesDueCents: 5000, paidCents: 2500, outstandingCents: 2500, paymentStatus: "part paid" });
    // After the late date a checkout would add the late fee: 2500 + 500.
    expect(entrantAccount(f, ctx(late))).toMatchObject({ feesDueCents: 5500, outstandingCents: 3000 });
  });

  it("nothing paid: unpaid, with an open checkout counting for nothing", () => {
    const f = person([entry(101, { critiqueRequested: true })], [payment([[101, 2500, "Entry fee — entry 101"], [101, 1000, "Critique fee — entry 101"]], { status: "open", paidAt: null })]);
    expect(entrantAccount(f, ctx())).toMatchObject({ feesDueCents: 3500, paidCents: 0, outstandingCents: 3500, paymentStatus: "unpaid", lastPaymentAt: null });
  });

  it("offline payments are quoted at the member rate when the guild matches, late fee by the day marked paid", () => {
    const f = person(
      [entry(101, { status: "accepted", paidAt: early, paymentReference: "cash" }), entry(102, { status: "paid", paidAt: late, paymentReference: "cheque 1042", critiqueRequested: true })],
      [],
      { guild: "  cedar hollow quilters " },
    );
    // 1500 (member, on time) + 1500 + 500 late + 1000 critique = 4500.
    expect(entrantAccount(f, ctx(late))).toMatchObject({ member: true, feesDueCents: 4500, paidCents: 4500, outstandingCents: 0, paymentStatus: "paid", lastPaymentAt: late });
  });

  it("the cap counts card and offline entry fees: 6000 − 2500 − 2500 leaves 1000 for the third entry", () => {
    const f = person([cardPaid(101), entry(102, { paidAt: early, paymentReference: "cash" }), entry(103, { critiqueRequested: true }), entry(104)], [payment([[101, 2500, "Entry fee — entry 101"]])]);
    // Entry 103: 1000 entry fee (cap reached) + 1000 critique; entry 104: nothing.
    expect(entrantAccount(f, ctx())).toMatchObject({ entries: 4, paidCents: 5000, outstandingCents: 2000, feesDueCents: 7000, paymentStatus: "part paid" });
  });

  it("a withdrawn entry refunded in part keeps what the show kept; refunded in full, nothing", () => {
    const withdrawn = cardPaid(101, early, { status: "withdrawn" });
    const part = person([withdrawn], [payment([[101, 2500, "Entry fee — entry 101"]], { status: "partially_refunded", refundedCents: 1250 })]);
    expect(entrantAccount(part, ctx())).toMatchObject({ entries: 0, withdrawnOrDeclined: 1, feesDueCents: 1250, paidCents: 1250, outstandingCents: 0, paymentStatus: "part refunded" });
    const full = person([withdrawn], [payment([[101, 2500, "Entry fee — entry 101"]], { status: "refunded", refundedCents: 2500 })]);
    expect(entrantAccount(full, ctx())).toMatchObject({ feesDueCents: 0, paidCents: 0, paymentStatus: "refunded", lastPaymentAt: early });
  });

  it("waiting-list, declined and free entries owe nothing", () => {
    const f = person(
      [entry(101, { waitlisted: true }), entry(102, { status: "declined" }), entry(103, { status: "paid", paidAt: early, paymentReference: "no fee due" })],
      [payment([], { amountCents: 0 })],
    );
    expect(entrantAccount(f, ctx())).toMatchObject({ entries: 2, withdrawnOrDeclined: 1, feesDueCents: 0, paidCents: 0, outstandingCents: 0, paymentStatus: "nothing due", lastPaymentAt: null });
  });

  it("keeps the contact details and consent as given", () => {
    const row = entrantAccount(person([entry(101)], [], { publishNameConsent: false, addressLine2: "Apt 3" }), ctx());
    expect(row).toMatchObject({ name: "Wren Castellano", email: "wren@example.test", phone: "555-0101", addressLine1: "14 Loom Street", addressLine2: "Apt 3", city: "Millbrook", publishNameConsent: false });
    expect(row).not.toHaveProperty("payments");
  });
});

describe("entrantAccounts", () => {
  it("has one row per entrant with a sent entry, by name ignoring case", () => {
    const rows = entrantAccounts(
      [
        person([entry(101)], [], { name: "odile Faraday", email: "o@example.test" }),
        person([entry(102, { status: "draft", entryNumber: null })], [], { name: "Drafts Only", email: "d@example.test" }),
        person([entry(103)], [], { name: "Basil Okonkwo", email: "b@example.test" }),
      ],
      ctx(),
    );
    expect(rows.map((r) => r.name)).toEqual(["Basil Okonkwo", "odile Faraday"]);
  });
});
