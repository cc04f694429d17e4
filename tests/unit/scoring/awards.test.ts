// Show-wide awards on their own (scoring/awards.ts): who may win (category winners, quilting
// method, division, large / small by perimeter), the judges' vote and a tied vote left to the chair,
// the chair's own choice, a judge's choice per judge, and awards one entry may not hold together.
// Best of Show from first-place winners, best hand / home / frame quilting, judge's choice one per
// judge: common practice. Perimeter bands from the Broward Quilt Expo 2013 categories, browardquiltexpo.com.
import { describe, expect, it } from "vitest";
import {
  AWARD_KIND_LABELS, combinationProblems, decideAwards, defaultEligibility, ineligibility,
  type AwardCandidate, type AwardDefinition, type AwardKind, type AwardOutcome, type AwardPickInput,
} from "@/scoring/awards";

const IN = 25_400; // µm per inch (1 in = 2.54 cm exactly, NIST SP 811)
const rosette = { name: "Purple rosette", colour: "#6b21a8" };

const candidate = (n: number, over: Partial<AwardCandidate> = {}): AwardCandidate => ({
  entryId: `e${n}`, label: `entry ${n}`, categoryId: "c10", quiltingMethod: "hand", division: "open", widthUm: 60 * IN, lengthUm: 80 * IN, categoryPlace: 1, ...over,
});
const award = (over: Partial<AwardDefinition> = {}): AwardDefinition => ({
  id: "bos", name: "Best of Show", kind: "best_of_show", sponsor: "", eligibility: { categoryWinnersOnly: true }, chooseBy: "judges_vote", ribbon: rosette, combinesWith: [], keepsCategoryPlace: true, ...over,
});
const vote = (entryId: string, judgeId: string, awardId = "bos"): AwardPickInput => ({ awardId, entryId, judgeId, kind: "vote", reason: "" });
const chairPick = (entryId: string, reason = "", awardId = "bos"): AwardPickInput => ({ awardId, entryId, judgeId: null, kind: "choice", reason });
const choice = (entryId: string, judgeId: string, awardId = "jc"): AwardPickInput => ({ awardId, entryId, judgeId, kind: "choice", reason: "" });

const winners = [candidate(1), candidate(2, { categoryId: "c20" }), candidate(3, { categoryId: "c30" })];

describe("defaultEligibility", () => {
  it("Best of Show starts as category winners only; the quilting awards start with their method; the rest open", () => {
    expect(defaultEligibility("best_of_show")).toEqual({ categoryWinnersOnly: true });
    expect(defaultEligibility("best_hand_quilting")).toEqual({ quiltingMethods: ["hand"] });
    expect(defaultEligibility("best_home_machine")).toEqual({ quiltingMethods: ["home_machine"] });
    expect(defaultEligibility("best_frame_machine")).toEqual({ quiltingMethods: ["frame_machine"] });
    for (const kind of ["judges_choice", "sponsor", "other"] as AwardKind[]) expect(defaultEligibility(kind)).toEqual({});
  });

  it("every kind has a label", () => {
    expect(Object.keys(AWARD_KIND_LABELS).sort()).toEqual(["best_frame_machine", "best_hand_quilting", "best_home_machine", "best_of_show", "judges_choice", "other", "sponsor"]);
    expect(AWARD_KIND_LABELS.judges_choice).toBe("Judge's choice");
  });
});

describe("ineligibility", () => {
  it("winners-only: 2nd place or no place is refused, a shared 1st is fine", () => {
    const bos = { name: "Best of Show", eligibility: { categoryWinnersOnly: true } };
    expect(ineligibility(bos, candidate(4, { categoryPlace: 2 }))).toBe("entry 4 did not win 1st in its category; Best of Show goes to a category winner.");
    expect(ineligibility(bos, candidate(5, { categoryPlace: null }))).toBe("entry 5 did not win 1st in its category; Best of Show goes to a category winner.");
    expect(ineligibility(bos, candidate(6, { categoryPlace: 1 }))).toBeNull();
  });

  it("quilting method: a home-machine quilt may not win best hand quilting", () => {
    const hand = { name: "Best hand quilting", eligibility: defaultEligibility("best_hand_quilting") };
    expect(ineligibility(hand, candidate(7, { quiltingMethod: "home_machine", categoryPlace: null }))).toBe("entry 7 is not quilted the way Best hand quilting asks.");
    expect(ineligibility(hand, candidate(8, { quiltingMethod: "hand", categoryPlace: null }))).toBeNull();
    // Several methods may be allowed at once.
    expect(ineligibility({ name: "Best machine quilting", eligibility: { quiltingMethods: ["home_machine", "frame_machine"] } }, candidate(9, { quiltingMethod: "frame_machine" }))).toBeNull();
  });

  it("categories and divisions", () => {
    const youthPieced = { name: "Youth pieced award", eligibility: { categoryIds: ["c10", "c11"], divisions: ["youth"] } };
    expect(ineligibility(youthPieced, candidate(1, { categoryId: "c20", division: "youth" }))).toBe("entry 1 is not in a category Youth pieced award is open to.");
    expect(ineligibility(youthPieced, candidate(2, { categoryId: null, division: "youth" }))).toBe("entry 2 is not in a category Youth pieced award is open to.");
    expect(ineligibility(youthPieced, candidate(3, { categoryId: "c11", division: "open" }))).toBe("entry 3 is not in a division Youth pieced award is open to.");
    expect(ineligibility(youthPieced, candidate(4, { categoryId: "c11", division: "youth" }))).toBeNull();
  });

  it("large / small by perimeter: large is at least the threshold, small is below it (Broward Quilt Expo 2013: large ≥ 280 in)", () => {
    const split = 280 * IN;
    const large = { name: "Best of Show, large", eligibility: { size: { side: "large" as const, perimeterUm: split } } };
    const small = { name: "Best of Show, small", eligibility: { size: { side: "small" as const, perimeterUm: split } } };
    // 60 × 80 in: 2 × (60 + 80) = 280 in, exactly the threshold, so large.
    const exactly = candidate(1, { widthUm: 60 * IN, lengthUm: 80 * IN });
    // 60 × 79½ in: 279 in, just under.
    const under = candidate(2, { widthUm: 60 * IN, lengthUm: 79.5 * IN });
    expect(ineligibility(large, exactly)).toBeNull();
    expect(ineligibility(small, exactly)).toBe("entry 1 is too large for Best of Show, small.");
    expect(ineligibility(large, under)).toBe("entry 2 is below the size for Best of Show, large.");
    expect(ineligibility(small, under)).toBeNull();
  });

  it("every condition must hold; the first one failing is the one given", () => {
    const strict = { name: "Best hand quilting", eligibility: { categoryWinnersOnly: true, quiltingMethods: ["hand" as const] } };
    expect(ineligibility(strict, candidate(1, { categoryPlace: 3, quiltingMethod: "frame_machine" }))).toMatch(/did not win 1st/);
    expect(ineligibility(strict, candidate(2, { categoryPlace: 1, quiltingMethod: "frame_machine" }))).toMatch(/not quilted the way/);
    expect(ineligibility({ name: "Anything", eligibility: {} }, candidate(3, { categoryPlace: null, categoryId: null }))).toBeNull();
  });
});

describe("decideAwards: the judges' vote", () => {
  it("the most votes wins, and the votes are kept per entry", () => {
    const [out] = decideAwards([award()], [vote("e1", "j1"), vote("e2", "j2"), vote("e1", "j3")], winners);
    expect(out).toEqual({
      awardId: "bos", name: "Best of Show", ribbon: rosette, votes: { e1: 2, e2: 1 }, problems: [],
      winners: [{ entryId: "e1", judgeId: null, how: "The judges' vote (2 of 3)." }],
    });
  });

  it("a tied vote goes to the chair: unresolved it is a problem naming the tied entries", () => {
    const [out] = decideAwards([award()], [vote("e1", "j1"), vote("e2", "j2"), vote("e3", "j3"), vote("e2", "j4"), vote("e1", "j5")], winners);
    expect(out!.winners).toEqual([]);
    expect(out!.votes).toEqual({ e1: 2, e2: 2, e3: 1 });
    expect(out!.problems).toEqual(["Best of Show: the vote is tied between entry 1 and entry 2 (2 each); the chair decides."]);
  });

  it("the chair settles a tie by choosing one of the tied entries, no reason needed", () => {
    const [out] = decideAwards([award()], [vote("e1", "j1"), vote("e2", "j2"), chairPick("e2")], winners);
    expect(out!.winners).toEqual([{ entryId: "e2", judgeId: null, how: "Tied vote (1 each); the chair decided." }]);
    expect(out!.problems).toEqual([]);
  });

  it("the chair going against the votes needs a reason", () => {
    const picks = [vote("e1", "j1"), vote("e1", "j2"), vote("e2", "j3")];
    const [blank] = decideAwards([award()], [...picks, chairPick("e3", "  ")], winners);
    expect(blank!.winners).toEqual([]);
    expect(blank!.problems).toEqual(["Best of Show: the chair's choice goes against the judges' votes and needs a reason."]);
    const [given] = decideAwards([award()], [...picks, chairPick("e3", "The judges asked for a second look.")], winners);
    expect(given!.winners).toEqual([{ entryId: "e3", judgeId: null, how: "Chosen by the chair against the votes." }]);
    // Agreeing with a clear vote is just the chair's choice.
    const [agree] = decideAwards([award()], [...picks, chairPick("e1")], winners);
    expect(agree!.winners).toEqual([{ entryId: "e1", judgeId: null, how: "Chosen by the chair." }]);
  });

  it("no votes yet is a problem; picks for other awards do not count", () => {
    const [out] = decideAwards([award()], [vote("e1", "j1", "other-award")], winners);
    expect(out!.winners).toEqual([]);
    expect(out!.votes).toEqual({});
    expect(out!.problems).toEqual(["Best of Show: no judge has voted yet."]);
  });

  it("a winner who may not win is refused, with the reason", () => {
    const [out] = decideAwards([award()], [vote("e4", "j1"), vote("e4", "j2")], [...winners, candidate(4, { categoryPlace: 2 })]);
    expect(out!.winners).toEqual([]);
    expect(out!.votes).toEqual({ e4: 2 });
    expect(out!.problems).toEqual(["Best of Show: entry 4 did not win 1st in its category; Best of Show goes to a category winner."]);
    const [unknown] = decideAwards([award()], [vote("zz", "j1")], winners);
    expect(unknown!.problems).toEqual(["Best of Show: entry zz is not a judged entry of this show."]);
  });
});

describe("decideAwards: the chair's choice", () => {
  const sponsor = award({ id: "sp", name: "Guild sponsor award", kind: "sponsor", sponsor: "Prairie Star Quilters", eligibility: {}, chooseBy: "chair" });

  it("waits for the chair, then goes to the chair's pick", () => {
    expect(decideAwards([sponsor], [], winners)[0]!.problems).toEqual(["Guild sponsor award: the chair has not chosen a winner yet."]);
    const [out] = decideAwards([sponsor], [chairPick("e3", "", "sp")], winners);
    expect(out!.winners).toEqual([{ entryId: "e3", judgeId: null, how: "Chosen by the chair." }]);
    expect(out!.problems).toEqual([]);
  });

  it("judges' votes do not decide an award the chair chooses", () => {
    const [out] = decideAwards([sponsor], [vote("e1", "j1", "sp"), vote("e1", "j2", "sp")], winners);
    expect(out!.winners).toEqual([]);
    expect(out!.problems).toEqual(["Guild sponsor award: the chair has not chosen a winner yet."]);
  });
});

describe("decideAwards: judge's choice (each judge picks one: common practice)", () => {
  const jc = award({ id: "jc", name: "Judge's choice", kind: "judges_choice", eligibility: {}, chooseBy: "chair" });

  it("one winner per judge, two judges may pick the same quilt, and the chair's pick is not a judge's", () => {
    const [out] = decideAwards([jc], [choice("e1", "j1"), choice("e2", "j2"), choice("e1", "j3"), chairPick("e3", "", "jc")], winners);
    expect(out!.winners).toEqual([
      { entryId: "e1", judgeId: "j1", how: "The judge's own choice." },
      { entryId: "e2", judgeId: "j2", how: "The judge's own choice." },
      { entryId: "e1", judgeId: "j3", how: "The judge's own choice." },
    ]);
    expect(out!.votes).toEqual({});
    expect(out!.problems).toEqual([]);
  });

  it("no choice yet is a problem; an ineligible choice is refused on its own", () => {
    expect(decideAwards([jc], [], winners)[0]!.problems).toEqual(["Judge's choice: no judge has made a choice yet."]);
    const youth = { ...jc, eligibility: { divisions: ["youth"] } };
    const [out] = decideAwards([youth], [choice("e1", "j1"), choice("e5", "j2")], [...winners, candidate(5, { division: "youth" })]);
    expect(out!.winners.map((w) => [w.entryId, w.judgeId])).toEqual([["e5", "j2"]]);
    expect(out!.problems).toEqual(["Judge's choice: entry 1 is not in a division Judge's choice is open to."]);
  });
});

describe("keepsCategoryPlace", () => {
  it("does not change who wins here: moving the category place is done when results are assembled", () => {
    const picks = [vote("e1", "j1"), vote("e1", "j2")];
    expect(decideAwards([award({ keepsCategoryPlace: false })], picks, winners)).toEqual(decideAwards([award({ keepsCategoryPlace: true })], picks, winners));
  });
});

describe("combinationProblems", () => {
  const bos = award();
  const hand = award({ id: "hand", name: "Best hand quilting", kind: "best_hand_quilting", eligibility: defaultEligibility("best_hand_quilting"), chooseBy: "chair" });
  const jc = award({ id: "jc", name: "Judge's choice", kind: "judges_choice", eligibility: {}, chooseBy: "chair" });
  const outcome = (a: AwardDefinition, ...held: [string, string | null][]): AwardOutcome => ({
    awardId: a.id, name: a.name, ribbon: a.ribbon, votes: {}, problems: [], winners: held.map(([entryId, judgeId]) => ({ entryId, judgeId, how: "" })),
  });
  const labelOf = (id: string) => `entry ${id.slice(1)}`;

  it("one entry holding two awards that may not combine", () => {
    expect(combinationProblems([bos, hand], [outcome(bos, ["e1", null]), outcome(hand, ["e1", null])], labelOf)).toEqual([
      "entry 1 holds Best of Show and Best hand quilting, which this show does not allow together.",
    ]);
  });

  it("none when either award lists the other, or when the awards went to different entries", () => {
    expect(combinationProblems([bos, { ...hand, combinesWith: ["bos"] }], [outcome(bos, ["e1", null]), outcome(hand, ["e1", null])], labelOf)).toEqual([]);
    expect(combinationProblems([{ ...bos, combinesWith: ["hand"] }, hand], [outcome(bos, ["e1", null]), outcome(hand, ["e1", null])], labelOf)).toEqual([]);
    expect(combinationProblems([bos, hand], [outcome(bos, ["e1", null]), outcome(hand, ["e2", null])], labelOf)).toEqual([]);
  });

  it("checks every pair of three awards on one entry", () => {
    // Best of Show with hand quilting is allowed; judge's choice combines with neither.
    const defs = [{ ...bos, combinesWith: ["hand"] }, hand, jc];
    expect(combinationProblems(defs, [outcome(defs[0]!, ["e1", null]), outcome(hand, ["e1", null]), outcome(jc, ["e1", "j1"])], labelOf)).toEqual([
      "entry 1 holds Best of Show and Judge's choice, which this show does not allow together.",
      "entry 1 holds Best hand quilting and Judge's choice, which this show does not allow together.",
    ]);
  });

  it("two judges choosing the same quilt is one award, not a pair", () => {
    expect(combinationProblems([jc], [outcome(jc, ["e1", "j1"], ["e1", "j2"])], labelOf)).toEqual([]);
  });
});
