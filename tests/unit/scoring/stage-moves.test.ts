import { describe, expect, it } from "vitest";
import { checkStageMove, needsReason, NEXT_STAGE, STAGES, STEP_BACK, type StageCounts } from "@/scoring/stage-moves";
import { isJudgedEntry } from "@/scoring/judged-entries";

const now = new Date("2027-03-01T12:00:00Z");
const ready: StageCounts = {
  now,
  entryClosesAt: new Date("2027-02-01T12:00:00Z"),
  rulesPublished: true,
  juried: false,
  entries: 40,
  drafts: 0,
  notCleared: 0,
  judged: 40,
  exceptions: 0,
  notReceived: null,
  undecided: 0,
  activeCategories: 6,
  categoriesWithoutPanel: [],
  judgesWithoutPanel: [],
  openConflicts: [],
  sheetsSubmitted: 0,
  sheetsMissing: 80,
};
const at = (over: Partial<StageCounts>) => ({ ...ready, ...over });

describe("every stage pair", () => {
  for (const from of STAGES) {
    for (const to of STAGES) {
      const allowed = NEXT_STAGE[from] === to || STEP_BACK[from] === to;
      it(`${from} → ${to} is ${allowed ? "allowed when ready" : "refused"}`, () => {
        // Reopening entries needs a closing date still ahead.
        const counts = to === "entries_open" ? at({ entryClosesAt: new Date("2027-04-01T12:00:00Z") }) : ready;
        const check = checkStageMove(from, to, counts);
        if (allowed) {
          expect(check.blockers).toEqual([]);
          expect(check.effects.length).toBeGreaterThan(0);
          expect(check.stepBack).toBe(STEP_BACK[from] === to);
        } else {
          expect(check.blockers.length).toBeGreaterThan(0);
        }
      });
    }
  }
});

describe("the main button is never a step back", () => {
  it.each(STAGES)("%s", (s) => {
    const next = NEXT_STAGE[s];
    if (next) expect(STAGES.indexOf(next)).toBeGreaterThan(STAGES.indexOf(s));
    const back = STEP_BACK[s];
    if (back) expect(STAGES.indexOf(back)).toBeLessThan(STAGES.indexOf(s));
  });
});

describe("closing entries", () => {
  it("warns about an early close, drafts and unpaid entries, and needs a reason", () => {
    const c = checkStageMove("entries_open", "entries_closed", at({ entryClosesAt: new Date("2027-04-26T12:00:00Z"), drafts: 8, notCleared: 39 }));
    expect(c.blockers).toEqual([]);
    expect(c.warnings).toEqual([
      "The closing date is still 56 days away; entrants expect to send quilts until then.",
      "8 drafts were never sent; they can't be sent after closing.",
      "39 entries are not paid yet.",
    ]);
    expect(needsReason(c)).toBe(true);
  });
  it("needs no reason when nothing is open", () => {
    expect(needsReason(checkStageMove("entries_open", "entries_closed", ready))).toBe(false);
  });
  it("at a juried show says accepted, not paid", () => {
    expect(checkStageMove("entries_open", "entries_closed", at({ juried: true, notCleared: 1 })).warnings).toEqual(["1 entry is not accepted yet."]);
  });
});

describe("reopening entries", () => {
  it("is a step back and refused once the closing date has passed", () => {
    const c = checkStageMove("entries_closed", "entries_open", ready);
    expect(c.stepBack).toBe(true);
    expect(c.blockers).toEqual(["The closing date for entries has passed; move it later first (Dates)."]);
  });
  it("needs published rules", () => {
    expect(checkStageMove("entries_closed", "entries_open", at({ entryClosesAt: new Date("2027-04-01"), rulesPublished: false })).blockers).toEqual(["Publish the rules and release first (Rules and release)."]);
  });
  it("opening from draft is not a step back", () => {
    const c = checkStageMove("draft", "entries_open", at({ entryClosesAt: new Date("2027-04-01") }));
    expect(c.stepBack).toBe(false);
    expect(needsReason(c)).toBe(false);
  });
});

describe("starting judging", () => {
  it("is blocked by missing categories, undecided entries, conflicts and nothing to judge", () => {
    const c = checkStageMove("entries_closed", "judging", at({ activeCategories: 0, undecided: 2, openConflicts: ["A judge conflict is open."], judged: 0 }));
    expect(c.blockers).toEqual([
      "Set up the categories first (Categories).",
      "2 entries have no category yet; place them from the queue first (Categories).",
      "A judge conflict is open.",
      "No entry would be judged: none is paid (or accepted) and none has your recorded exception.",
    ]);
  });
  it("warns about unpaid entries, drafts, unreceived quilts, categories and judges without panels", () => {
    const c = checkStageMove("entries_closed", "judging", at({ notCleared: 39, drafts: 8, notReceived: 3, categoriesWithoutPanel: ["A1 Bed quilts"], judgesWithoutPanel: ["Jo Judge"], exceptions: 1 }));
    expect(c.blockers).toEqual([]);
    expect(c.effects[0]).toBe("40 entries reach the judges' lists (1 by your recorded exception).");
    expect(c.warnings).toEqual([
      "39 entries are not paid and will not be judged unless you record an exception (Judging set-up).",
      "8 drafts were never sent and will not be judged.",
      "3 quilts to be judged have not been received.",
      "No panel judges A1 Bed quilts; its entries will not be judged.",
      "Jo Judge is on no panel and will see no quilts.",
    ]);
  });
  it("says nothing of receipt while there is no check-in", () => {
    expect(checkStageMove("entries_closed", "judging", ready).warnings).toEqual([]);
  });
});

describe("back from judging", () => {
  it("is allowed while no sheet is submitted, with a reason", () => {
    const c = checkStageMove("judging", "entries_closed", ready);
    expect(c.blockers).toEqual([]);
    expect(needsReason(c)).toBe(true);
  });
  it("is refused once a sheet is submitted", () => {
    expect(checkStageMove("judging", "entries_closed", at({ sheetsSubmitted: 1 })).blockers).toEqual(["1 sheet is already submitted; judging can't go back once a judge has submitted a sheet."]);
  });
  it("publishing goes through Results and names the missing sheets", () => {
    expect(checkStageMove("judging", "results_published", at({ sheetsMissing: 3 })).blockers[0]).toMatch(/from Results.*3 sheets are still missing/);
  });
});

describe("who is judged", () => {
  const base = { status: "submitted", judged: true, entryNumber: 101, paidAt: null, judgeAnywayAt: null } as const;
  it("an unpaid entry is not judged until the chair records an exception", () => {
    expect(isJudgedEntry(base, false)).toBe(false);
    expect(isJudgedEntry({ ...base, judgeAnywayAt: now }, false)).toBe(true);
  });
  it("a paid entry is judged; display-only, drafts, withdrawn and declined never", () => {
    expect(isJudgedEntry({ ...base, status: "paid", paidAt: now }, false)).toBe(true);
    expect(isJudgedEntry({ ...base, status: "paid", paidAt: now, judged: false }, false)).toBe(false);
    for (const status of ["draft", "withdrawn", "declined"]) expect(isJudgedEntry({ ...base, status, paidAt: now, judgeAnywayAt: now }, false)).toBe(false);
  });
  it("at a juried show, accepted (or later) is what counts", () => {
    expect(isJudgedEntry({ ...base, status: "paid", paidAt: now }, true)).toBe(false);
    expect(isJudgedEntry({ ...base, status: "accepted" }, true)).toBe(true);
    expect(isJudgedEntry({ ...base, status: "received" }, true)).toBe(true);
  });
});
