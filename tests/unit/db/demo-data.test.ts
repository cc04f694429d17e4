// The demo scenario: the right people and quilts, plausible sizes, exact unit conversions.
import { describe, expect, it } from "vitest";
import { buildDemoScenario, DEMO_ACCOUNTS, DEMO_PASSWORD, DEMO_SHOW, DEMO_TECHNIQUES, demoScenario, mulberry32 } from "@/db/seed/demo-data";

const scenario = demoScenario();
const countRole = (role: string) => scenario.people.filter((p) => p.role === role).length;

describe("demo scenario", () => {
  it("has 1 admin, 1 chair, 3 judges, 2 scribes, 1 intake volunteer and 40 entrants", () => {
    expect(countRole("admin")).toBe(1);
    expect(countRole("chair")).toBe(1);
    expect(countRole("judge")).toBe(3);
    expect(countRole("scribe")).toBe(2);
    expect(countRole("intake")).toBe(1);
    expect(countRole("entrant")).toBe(40);
    expect(DEMO_ACCOUNTS).toHaveLength(48);
  });

  it("uses the easy-to-type demo e-mails, all on the reserved .test domain (RFC 2606)", () => {
    const emails = DEMO_ACCOUNTS.map((a) => a.email);
    expect(emails.slice(0, 8)).toEqual([
      "admin@ribbonry.test",
      "chair@ribbonry.test",
      "judge1@ribbonry.test",
      "judge2@ribbonry.test",
      "judge3@ribbonry.test",
      "scribe1@ribbonry.test",
      "scribe2@ribbonry.test",
      "intake@ribbonry.test",
    ]);
    expect(emails.slice(8)).toEqual(Array.from({ length: 40 }, (_, i) => `entrant${i + 1}@ribbonry.test`));
    expect(new Set(emails).size).toBe(emails.length);
    for (const e of emails) expect(e).toMatch(/^[a-z0-9]+@[a-z0-9.-]+\.test$/);
    expect(DEMO_PASSWORD).toBe("quilt-show-demo");
  });

  it("gives entrants profiles with fictional 555-0100…0199 phone numbers (NANP fiction range)", () => {
    const entrants = scenario.people.filter((p) => p.role === "entrant");
    const phones = entrants.map((p) => p.profile!.phone);
    for (const phone of phones) expect(phone).toMatch(/ 555-01\d\d$/);
    expect(new Set(phones).size).toBe(40);
    const consents = entrants.map((p) => p.profile!.publishNameConsent);
    expect(consents).toContain(true);
    expect(consents).toContain(false);
    expect(scenario.people.filter((p) => p.role !== "entrant").every((p) => p.profile === null)).toBe(true);
  });

  it("has 120 quilts, 1–5 per entrant, at least 3 for entrant1", () => {
    expect(scenario.quilts).toHaveLength(120);
    const per = new Map<string, number>();
    for (const q of scenario.quilts) per.set(q.entrantEmail, (per.get(q.entrantEmail) ?? 0) + 1);
    expect(per.size).toBe(40);
    for (const n of per.values()) {
      expect(n).toBeGreaterThanOrEqual(1);
      expect(n).toBeLessThanOrEqual(5);
    }
    expect(per.get("entrant1@ribbonry.test")).toBeGreaterThanOrEqual(3);
    expect(new Set(scenario.quilts.map((q) => q.title)).size).toBe(120);
  });

  it("numbers submitted entries 101, 102, … uniquely and leaves drafts unnumbered", () => {
    const numbered = scenario.quilts.filter((q) => q.status !== "draft").map((q) => q.entryNumber);
    const drafts = scenario.quilts.filter((q) => q.status === "draft");
    expect(drafts.length).toBeGreaterThan(0);
    expect(drafts.every((q) => q.entryNumber === null)).toBe(true);
    expect(new Set(numbered).size).toBe(numbered.length);
    expect([...numbered].sort((a, b) => a! - b!)).toEqual(Array.from({ length: numbered.length }, (_, i) => 101 + i));
  });

  it("mixes statuses, divisions and display-only entries using the schema's enum values", () => {
    const statuses = new Set(scenario.quilts.map((q) => q.status));
    expect([...statuses].sort()).toEqual(["draft", "paid", "submitted"]);
    const divisions = scenario.quilts.map((q) => q.division);
    expect(divisions.filter((d) => d === "open").length).toBeGreaterThan(90);
    expect(divisions).toContain("youth");
    expect(divisions).toContain("first_time");
    expect(scenario.quilts.some((q) => !q.judged)).toBe(true);
    for (const q of scenario.quilts) {
      expect(["hand", "home_machine", "frame_machine"]).toContain(q.quiltingMethod);
      expect(q.techniques.length).toBeGreaterThan(0);
      for (const t of q.techniques) expect(DEMO_TECHNIQUES).toContain(t);
      expect(q.madeBy.length).toBeGreaterThanOrEqual(1);
      expect(q.madeBy.length).toBeLessThanOrEqual(2);
      expect(q.quiltedBy).not.toBe("");
      if (q.quiltedForHire) expect(q.quiltingMethod).toBe("frame_machine");
      expect(Number.isInteger(q.declaredValueCents) && q.declaredValueCents > 0).toBe(true);
      const sentences = q.statement.split(/(?<=[.!?])\s+/).length;
      expect(sentences).toBeGreaterThanOrEqual(1);
      expect(sentences).toBeLessThanOrEqual(3);
    }
  });

  it("keeps sizes plausible: 12 in minis up to about 110 in bed quilts", () => {
    for (const q of scenario.quilts) {
      for (const side of [q.widthIn, q.lengthIn]) {
        expect(side).toBeGreaterThanOrEqual(12);
        expect(side).toBeLessThanOrEqual(110);
        expect(Number.isInteger(side * 8)).toBe(true); // written to the eighth of an inch
      }
    }
    expect(scenario.quilts.some((q) => q.widthIn <= 24 && q.lengthIn <= 24)).toBe(true);
    expect(scenario.quilts.some((q) => q.lengthIn >= 90)).toBe(true);
    expect(scenario.quilts.some((q) => !Number.isInteger(q.widthIn))).toBe(true);
  });

  it("stores micrometres that are exact conversions of the inches (1 in = 25.4 mm exactly, NIST SP 811 Appendix B)", () => {
    for (const q of scenario.quilts) {
      expect(Number.isInteger(q.widthUm)).toBe(true);
      expect(Number.isInteger(q.lengthUm)).toBe(true);
      expect(q.widthUm).toBe(q.widthIn * 25_400);
      expect(q.lengthUm).toBe(q.lengthIn * 25_400);
    }
    // Spot checks of the same rule: ¼ in = 0.635 cm = 6,350 µm; 60½ in = 153.67 cm.
    const quarter = scenario.quilts.find((q) => q.widthIn % 1 === 0.25);
    if (quarter) expect(quarter.widthUm % 25_400).toBe(6_350);
    const half = scenario.quilts.find((q) => q.widthIn % 1 === 0.5)!;
    expect(half.widthUm / 10_000).toBeCloseTo(half.widthIn * 2.54, 9);
  });

  it("labels sizes width × length with inch fractions", () => {
    for (const q of scenario.quilts) expect(q.sizeLabel).toMatch(/^\d+[⅛¼⅜½⅝¾⅞]? × \d+[⅛¼⅜½⅝¾⅞]? in$/);
  });

  it("schedules the show in order, in the near future relative to 2 December 2026", () => {
    const order = [
      DEMO_SHOW.entryOpensAt,
      DEMO_SHOW.entryClosesAt,
      DEMO_SHOW.dropOffStartsAt,
      DEMO_SHOW.dropOffEndsAt,
      DEMO_SHOW.judgingStartsAt,
      DEMO_SHOW.judgingEndsAt,
      DEMO_SHOW.showOpensAt,
      DEMO_SHOW.showClosesAt,
      DEMO_SHOW.pickUpStartsAt,
      DEMO_SHOW.pickUpEndsAt,
    ].map((s) => Date.parse(s));
    expect([...order].sort((a, b) => a - b)).toEqual(order);
    const ref = Date.parse("2026-12-02T00:00:00Z");
    expect(order[0]).toBeLessThan(ref); // entries are open now …
    expect(order[1]! - ref).toBeGreaterThan(45 * 86_400_000); // … and close in about two months
    expect(order[1]! - ref).toBeLessThan(75 * 86_400_000);
    expect(DEMO_SHOW.status).toBe("entries_open");
    expect(DEMO_SHOW.timeZone).toBe("America/Chicago");
    expect(DEMO_SHOW.slug).toMatch(/^[a-z0-9]+(-[a-z0-9]+)*$/); // the shows_slug_format check
  });

  it("is deterministic: building it again gives the same scenario", () => {
    expect(buildDemoScenario()).toEqual(scenario);
    const a = mulberry32(123);
    const b = mulberry32(123);
    expect(Array.from({ length: 5 }, () => b())).toEqual(Array.from({ length: 5 }, () => a()));
  });
});
