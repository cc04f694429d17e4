// scoring/awards.ts on its own: who may win a show-wide award, the winner from the judges' votes
// or the chair's choice, one judge's choice per judge, and which awards one entry may hold together.
import { describe, expect, it } from "vitest";
import { combinationProblems, decideAwards, defaultEligibility, ineligibility, type AwardCandidate, type AwardDefinition, type AwardPickInput } from "@/scoring/awards";

const IN = 25_400; // µm per inch, exact (NIST SP 811)
const PURPLE = { name: "Purple rosette", colour: "#6b21a8" };

function award(over: Partial<AwardDefinition> & Pick<AwardDefinition, "id" | "name" | "kind">): AwardDefinition {
  return { sponsor: "", eligibility: defaultEligibility(over.kind), chooseBy: "chair", ribbon: PURPLE, combinesWith: [], keepsCategoryPlace: true, ...over };
}
function candidate(n: number, over: Partial<AwardCandidate> = {}): AwardCandidate {
  return { entryId: `e${n}`, label: `entry ${n}`, categoryId: "c1", quiltingMethod: "hand", division: "open", widthUm: 60 * IN, lengthUm: 72 * IN, categoryPlace: 1, ...over };
}
const vote = (awardId: string, entryId: string, judgeId: string): AwardPickInput => ({ awardId, entryId, judgeId, kind: "vote", reason: "" });
const chair = (awardId: string, entryId: string, reason = ""): AwardPickInput => ({ awardId, entryId, judgeId: null, kind: "choice", reason });

describe("who may win", () => {
  it("starts each kind with the usual eligibility (Best of Show from category winners: common practice)", () => {
    expect(defaultEligibility("best_of_show")).toEqual({ categoryWinnersOnly: true });
    expect(defaultEligibility("best_home_machine")).toEqual({ quiltingMethods: ["home_machine"] });
    expect(defaultEligibility("sponsor")).toEqual({});
  });

  it("gives each reason in plain words", () => {
    const bos = award({ id: "bos", name: "Best of Show", kind: "best_of_show" });
    expect(ineligibility(bos, candidate(1))).toBeNull();
    expect(ineligibility(bos, candidate(2, { categoryPlace: 2 }))).toBe("entry 2 did not win 1st in its category; Best of Show goes to a category winner.");
    const frame = award({ id: "f", name: "Best frame machine quilting", kind: "best_frame_machine" });
    expect(ineligibility(frame, candidate(3))).toBe("entry 3 is not quilted the way Best frame machine quilting asks.");
    const youth = award({ id: "y", name: "Youth award", kind: "sponsor", eligibility: { divisions: ["youth"] } });
    expect(ineligibility(youth, candidate(4))).toBe("entry 4 is not in a division Youth award is open to.");
    const artOnly = award({ id: "a", name: "Art prize", kind: "sponsor", eligibility: { categoryIds: ["c9"] } });
    expect(ineligibility(artOnly, candidate(5))).toBe("entry 5 is not in a category Art prize is open to.");
  });

  it("splits large and small by perimeter at the threshold (large is at least it)", () => {
    // 60 × 72 in: perimeter 2 × (60 + 72) = 264 in.
    const large = award({ id: "l", name: "Best of Show, large", kind: "best_of_show", eligibility: { size: { side: "large", perimeterUm: 264 * IN } } });
    const small = award({ id: "s", name: "Best of Show, small", kind: "best_of_show", eligibility: { size: { side: "small", perimeterUm: 264 * IN } } });
    expect(ineligibility(large, candidate(1))).toBeNull();
    expect(ineligibility(small, candidate(1))).toBe("entry 1 is too large for Best of Show, small.");
    const smaller = candidate(2, { lengthUm: 72 * IN - 1 });
    expect(ineligibility(large, smaller)).toBe("entry 2 is below the size for Best of Show, large.");
    expect(ineligibility(small, smaller)).toBeNull();
  });
});

describe("deciding the winners", () => {
  const bos = award({ id: "bos", name: "Best of Show", kind: "best_of_show", chooseBy: "judges_vote" });
  const cands = [candidate(1), candidate(2, { categoryId: "c2" }), candidate(3, { categoryId: "c3" })];

  it("gives a judges' vote to the most votes", () => {
    const [o] = decideAwards([bos], [vote("bos", "e1", "j1"), vote("bos", "e1", "j2"), vote("bos", "e2", "j3")], cands);
    expect(o!.votes).toEqual({ e1: 2, e2: 1 });
    expect(o!.winners).toEqual([{ entryId: "e1", judgeId: null, how: "The judges' vote (2 of 3)." }]);
    expect(o!.problems).toEqual([]);
  });

  it("leaves a tied vote to the chair, and takes the chair's decision between the tied entries", () => {
    const tied = [vote("bos", "e1", "j1"), vote("bos", "e2", "j2")];
    let [o] = decideAwards([bos], tied, cands);
    expect(o!.winners).toEqual([]);
    expect(o!.problems).toEqual(["Best of Show: the vote is tied between entry 1 and entry 2 (1 each); the chair decides."]);
    [o] = decideAwards([bos], [...tied, chair("bos", "e2")], cands);
    expect(o!.winners).toEqual([{ entryId: "e2", judgeId: null, how: "Tied vote (1 each); the chair decided." }]);
  });

  it("asks for a reason when the chair goes against the votes", () => {
    const votes = [vote("bos", "e1", "j1"), vote("bos", "e1", "j2")];
    let [o] = decideAwards([bos], [...votes, chair("bos", "e3")], cands);
    expect(o!.problems).toEqual(["Best of Show: the chair's choice goes against the judges' votes and needs a reason."]);
    [o] = decideAwards([bos], [...votes, chair("bos", "e3", "Entry 1 was found to break the show's rules.")], cands);
    expect(o!.winners).toEqual([{ entryId: "e3", judgeId: null, how: "Chosen by the chair against the votes." }]);
  });

  it("refuses an ineligible winner and says why", () => {
    const [o] = decideAwards([bos], [vote("bos", "e4", "j1")], [...cands, candidate(4, { categoryPlace: 3 })]);
    expect(o!.winners).toEqual([]);
    expect(o!.problems).toEqual(["Best of Show: entry 4 did not win 1st in its category; Best of Show goes to a category winner."]);
  });

  it("gives one judge's choice per judge", () => {
    const jc = award({ id: "jc", name: "Judge's choice", kind: "judges_choice" });
    const picks: AwardPickInput[] = [
      { awardId: "jc", entryId: "e2", judgeId: "j1", kind: "choice", reason: "" },
      { awardId: "jc", entryId: "e3", judgeId: "j2", kind: "choice", reason: "" },
    ];
    const [o] = decideAwards([jc], picks, cands);
    expect(o!.winners.map((w) => [w.judgeId, w.entryId])).toEqual([["j1", "e2"], ["j2", "e3"]]);
    expect(decideAwards([jc], [], cands)[0]!.problems).toEqual(["Judge's choice: no judge has made a choice yet."]);
  });

  it("waits for the chair when the chair chooses", () => {
    const hand = award({ id: "h", name: "Best hand quilting", kind: "best_hand_quilting" });
    expect(decideAwards([hand], [], cands)[0]!.problems).toEqual(["Best hand quilting: the chair has not chosen a winner yet."]);
    expect(decideAwards([hand], [chair("h", "e1")], cands)[0]!.winners).toEqual([{ entryId: "e1", judgeId: null, how: "Chosen by the chair." }]);
  });
});

describe("awards one entry may hold together", () => {
  it("names a pair the show does not allow together, and nothing once one of them allows the other", () => {
    const bos = award({ id: "bos", name: "Best of Show", kind: "best_of_show" });
    const hand = award({ id: "h", name: "Best hand quilting", kind: "best_hand_quilting" });
    const picks = [chair("bos", "e1"), chair("h", "e1")];
    const outcomes = decideAwards([bos, hand], picks, [candidate(1)]);
    expect(combinationProblems([bos, hand], outcomes, (id) => `entry ${id.slice(1)}`)).toEqual(["entry 1 holds Best of Show and Best hand quilting, which this show does not allow together."]);
    const allowed = [bos, { ...hand, combinesWith: ["bos"] }];
    expect(combinationProblems(allowed, decideAwards(allowed, picks, [candidate(1)]), String)).toEqual([]);
  });
});
