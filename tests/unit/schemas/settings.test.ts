// The settings schemas: dollars → exact integer cents, counts, photo rules, dates, status words.
import { describe, expect, it } from "vitest";
import {
  centsToInput,
  datesSchema,
  feesSchema,
  limitsSchema,
  optionsSchema,
  parseMoneyToCents,
  photosSchema,
  publishRulesSchema,
  settingsSectionSchema,
  statusChangeSchema,
} from "@/lib/schemas/settings";

const cents = (s: string) => {
  const r = parseMoneyToCents(s);
  if (!r.ok) throw new Error(`${s}: ${r.message}`);
  return r.cents;
};
const messageOf = (s: string) => {
  const r = parseMoneyToCents(s);
  return r.ok ? null : r.message;
};

describe("parseMoneyToCents", () => {
  it("reads whole dollars, cents and a dollar sign exactly", () => {
    expect(cents("25")).toBe(2500);
    expect(cents("25.00")).toBe(2500);
    expect(cents("$25")).toBe(2500);
    expect(cents(" $ 25.5 ")).toBe(2550);
    expect(cents("19.99")).toBe(1999);
    expect(cents("0")).toBe(0);
    expect(cents(".5")).toBe(50);
    expect(cents("25.")).toBe(2500);
    expect(cents("1,250.50")).toBe(125050);
  });

  it("never goes through a float: the usual binary traps come out exact", () => {
    // 0.1 + 0.2 is 0.30000000000000004 in floating point; in cents it is 10 + 20 = 30.
    expect(cents("0.1") + cents("0.2")).toBe(cents("0.3"));
    expect(cents("0.3")).toBe(30);
    // In floating point 4.35 * 100 is 434.99999999999994 and 1.15 * 100 is 114.99999999999999.
    expect(cents("4.35")).toBe(435);
    expect(cents("1.15")).toBe(115);
    expect(cents("0.07")).toBe(7);
    expect(cents("99999.99")).toBe(9_999_999);
  });

  it("refuses bad amounts with a message that says what to type", () => {
    expect(messageOf("")).toBe("Enter an amount in dollars, e.g. 25 or 25.00.");
    expect(messageOf("-5")).toBe("The amount can't be negative.");
    expect(messageOf("1.005")).toBe("Give at most two digits of cents, e.g. 19.99.");
    expect(messageOf("twenty")).toBe("Enter dollars and cents with digits only, e.g. 25, 25.00 or $25.");
    expect(messageOf("25$")).toBe("Enter dollars and cents with digits only, e.g. 25, 25.00 or $25.");
    expect(messageOf("1,25")).toBe("Enter dollars and cents with digits only, e.g. 25, 25.00 or $25.");
    expect(messageOf("1e3")).toBe("Enter dollars and cents with digits only, e.g. 25, 25.00 or $25.");
    expect(messageOf(".")).toBe("Enter dollars and cents with digits only, e.g. 25, 25.00 or $25.");
    expect(messageOf("100000.01")).toBe("That amount is too large; fees here go up to $100,000.");
  });

  it("writes cents back for an input", () => {
    expect(centsToInput(2500)).toBe("25.00");
    expect(centsToInput(1999)).toBe("19.99");
    expect(centsToInput(5)).toBe("0.05");
    expect(centsToInput(null)).toBe("");
  });
});

const fees = { section: "fees", entryFeeCents: "25", memberEntryFeeCents: "$20", lateFeeCents: "10.00", critiqueFeeCents: "15", feeCapCents: "", withdrawalRefundPercent: "50" };

describe("feesSchema", () => {
  it("turns the form's text into cents, with a blank cap meaning no cap", () => {
    expect(feesSchema.parse(fees)).toEqual({
      section: "fees",
      entryFeeCents: 2500,
      memberEntryFeeCents: 2000,
      lateFeeCents: 1000,
      critiqueFeeCents: 1500,
      feeCapCents: null,
      withdrawalRefundPercent: 50,
    });
    expect(feesSchema.parse({ ...fees, feeCapCents: "100" }).feeCapCents).toBe(10000);
  });

  it("names the field in each message", () => {
    const r = feesSchema.safeParse({ ...fees, entryFeeCents: "abc", withdrawalRefundPercent: "150" });
    expect(r.success).toBe(false);
    const issues = r.error!.issues.map((i) => [i.path.join("."), i.message]);
    expect(issues).toContainEqual(["entryFeeCents", "Entry fee: Enter dollars and cents with digits only, e.g. 25, 25.00 or $25."]);
    expect(issues).toContainEqual(["withdrawalRefundPercent", "Refund on withdrawal: enter a number from 0 to 100."]);
  });

  it("refuses a member rate above the entry fee and a cap below one entry", () => {
    const r = feesSchema.safeParse({ ...fees, memberEntryFeeCents: "30", feeCapCents: "20" });
    const paths = r.error!.issues.map((i) => i.path.join("."));
    expect(paths).toEqual(["memberEntryFeeCents", "feeCapCents"]);
  });
});

describe("limitsSchema", () => {
  it("reads blanks as no limit", () => {
    expect(limitsSchema.parse({ section: "limits", maxEntriesPerEntrant: "5", maxEntriesPerCategory: "2", capacity: "" })).toEqual({
      section: "limits",
      maxEntriesPerEntrant: 5,
      maxEntriesPerCategory: 2,
      capacity: null,
    });
  });
  it("refuses fractions and zero", () => {
    const r = limitsSchema.safeParse({ section: "limits", maxEntriesPerEntrant: "2.5", maxEntriesPerCategory: "0", capacity: "175" });
    expect(r.error!.issues.map((i) => i.message)).toEqual([
      "Entries per entrant: enter a whole number, or leave it blank for no limit.",
      "Entries per entrant in one category: enter a number from 1 to 1,000.",
    ]);
  });
});

describe("photosSchema", () => {
  // 1000 × 500 px and 5 MB: minimums seen in a show's published photo rules (common practice).
  const photos = { section: "photos", requireFullView: true, requireDetailView: "on", photoMinWidthPx: "1000", photoMinHeightPx: "500", photoMaxBytes: "5", statementWordLimit: "150", techniques: "pieced\nAppliqué\n\npieced\n  art  " };
  it("reads views, pixels, megabytes and the technique list", () => {
    expect(photosSchema.parse(photos)).toEqual({
      section: "photos",
      requiredPhotoViews: ["full", "detail"],
      photoMinWidthPx: 1000,
      photoMinHeightPx: 500,
      photoMaxBytes: 5_000_000,
      statementWordLimit: 150,
      techniques: ["pieced", "Appliqué", "art"],
    });
    expect(photosSchema.parse({ ...photos, requireDetailView: false, photoMaxBytes: "2.5" })).toMatchObject({ requiredPhotoViews: ["full"], photoMaxBytes: 2_500_000 });
  });
  it("refuses an empty technique list and silly sizes", () => {
    const r = photosSchema.safeParse({ ...photos, techniques: "\n \n", photoMaxBytes: "5.25" });
    expect(r.error!.issues.map((i) => i.message)).toEqual([
      "Largest photo file: enter megabytes from 0.1 to 100, e.g. 5.",
      "Techniques: list at least one, one per line.",
    ]);
  });
});

describe("optionsSchema and the section union", () => {
  it("accepts a blank reply-to and refuses a malformed one", () => {
    expect(optionsSchema.parse({ section: "options", juried: "on", publishNames: false, replyToEmail: "" })).toEqual({ section: "options", juried: true, publishNames: false, replyToEmail: "" });
    expect(optionsSchema.safeParse({ section: "options", juried: false, publishNames: true, replyToEmail: "show@" }).error!.issues[0]!.message).toBe(
      "Reply-to address: enter an e-mail address like show@example.org, or leave it blank.",
    );
  });
  it("picks the section's schema by its name", () => {
    expect(settingsSectionSchema.parse({ section: "limits", maxEntriesPerEntrant: "", maxEntriesPerCategory: "", capacity: "350" })).toMatchObject({ capacity: 350 });
    expect(settingsSectionSchema.safeParse({ section: "nonsense" }).success).toBe(false);
  });
});

describe("datesSchema", () => {
  const blank = { entryOpensAt: "", entryClosesAt: "", lateFeeFromAt: "", dropOffStartsAt: "", dropOffEndsAt: "", judgingStartsAt: "", judgingEndsAt: "", showOpensAt: "", showClosesAt: "", pickUpStartsAt: "", pickUpEndsAt: "" };
  it("keeps wall-clock text and reads blanks as no date", () => {
    const d = datesSchema.parse({ ...blank, entryOpensAt: "2027-01-04T09:00", entryClosesAt: "2027-02-15T23:59" });
    expect(d.entryOpensAt).toBe("2027-01-04T09:00");
    expect(d.entryClosesAt).toBe("2027-02-15T23:59");
    expect(d.pickUpEndsAt).toBeNull();
  });
  it("refuses an end before its start and a malformed time", () => {
    const r = datesSchema.safeParse({ ...blank, entryOpensAt: "2027-02-04T09:00", entryClosesAt: "2027-01-15T23:59", lateFeeFromAt: "tomorrow" });
    expect(r.error!.issues.map((i) => [i.path.join("."), i.message])).toEqual([
      ["lateFeeFromAt", "Late fee from: enter a date and time, e.g. 2027-03-13 09:00."],
    ]);
    const r2 = datesSchema.safeParse({ ...blank, entryOpensAt: "2027-02-04T09:00", entryClosesAt: "2027-01-15T23:59" });
    expect(r2.error!.issues.map((i) => [i.path.join("."), i.message])).toEqual([["entryClosesAt", "Entries close must come after entries open."]]);
  });
});

describe("rules and status", () => {
  it("needs some rules and release text", () => {
    expect(publishRulesSchema.safeParse({ rulesText: "short", releaseText: "" }).error!.issues.map((i) => i.path[0])).toEqual(["rulesText", "releaseText"]);
  });
  it("knows only the show's stages", () => {
    expect(statusChangeSchema.safeParse({ status: "entries_open" }).success).toBe(true);
    expect(statusChangeSchema.safeParse({ status: "open" }).error!.issues[0]!.message).toBe("Status: choose one of the show's stages.");
  });
});

describe("datesSchema between stages", () => {
  const blank = { entryOpensAt: "", entryClosesAt: "", lateFeeFromAt: "", dropOffStartsAt: "", dropOffEndsAt: "", judgingStartsAt: "", judgingEndsAt: "", showOpensAt: "", showClosesAt: "", pickUpStartsAt: "", pickUpEndsAt: "" };
  it("lets pick-up start the moment the show closes, but not before", () => {
    expect(datesSchema.safeParse({ ...blank, showClosesAt: "2027-03-20T17:00", pickUpStartsAt: "2027-03-20T17:00" }).success).toBe(true);
    expect(datesSchema.safeParse({ ...blank, showClosesAt: "2027-03-20T17:00", pickUpStartsAt: "2027-03-20T16:00" }).error!.issues[0]!.message).toBe(
      "Pick-up starts must not come before show closes.",
    );
  });
});
