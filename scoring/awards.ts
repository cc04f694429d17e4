// Show-wide awards (Best of Show, best hand / home machine / frame quilting, judge's choice,
// sponsor awards): who may win each one, the winners from the judges' votes or the chair's choice,
// and the combinations of awards one entry may hold. Pure: no database, no framework.

/** A ribbon as a show names and colours it (hex colour for the screen swatch). */
export type RibbonStyle = { name: string; colour: string };

export type AwardKind = "best_of_show" | "best_hand_quilting" | "best_home_machine" | "best_frame_machine" | "judges_choice" | "sponsor" | "other";
export type QuiltingMethodCode = "hand" | "home_machine" | "frame_machine";

/** Who may win an award; every condition given must hold. */
export type AwardEligibility = {
  /** Only entries that won 1st place in their category (Best of Show, as is common practice). */
  categoryWinnersOnly?: boolean;
  categoryIds?: string[];
  quiltingMethods?: QuiltingMethodCode[];
  divisions?: string[];
  /** Large / small split by perimeter (µm): large is at least the threshold, small is below it. */
  size?: { side: "large" | "small"; perimeterUm: number };
};

export type AwardDefinition = {
  id: string;
  name: string;
  kind: AwardKind;
  sponsor: string;
  eligibility: AwardEligibility;
  chooseBy: "chair" | "judges_vote";
  ribbon: RibbonStyle;
  combinesWith: readonly string[];
  keepsCategoryPlace: boolean;
};

/** What eligibility reads of an entry. */
export type AwardCandidate = {
  entryId: string;
  label: string;
  categoryId: string | null;
  quiltingMethod: string;
  division: string;
  widthUm: number;
  lengthUm: number;
  /** Its place in its category before any award moved it (1 = category winner). */
  categoryPlace: number | null;
};

/** A judge's vote or choice (judgeId set) or the chair's choice (judgeId null). */
export type AwardPickInput = { awardId: string; entryId: string; judgeId: string | null; kind: "vote" | "choice"; reason: string };

export type AwardOutcome = {
  awardId: string;
  name: string;
  ribbon: RibbonStyle;
  /** The winners: one for most awards, one per judge for a judge's choice. */
  winners: { entryId: string; judgeId: string | null; how: string }[];
  /** Votes per entry for a judges' vote award. */
  votes: Record<string, number>;
  /** Why the award has no winner yet, or what must be fixed (these block publishing). */
  problems: string[];
};

export const AWARD_KIND_LABELS: Record<AwardKind, string> = {
  best_of_show: "Best of Show",
  best_hand_quilting: "Best hand quilting",
  best_home_machine: "Best home machine quilting",
  best_frame_machine: "Best frame machine quilting",
  judges_choice: "Judge's choice",
  sponsor: "Sponsor award",
  other: "Other award",
};

/** The eligibility a new award of this kind starts with. */
export function defaultEligibility(kind: AwardKind): AwardEligibility {
  if (kind === "best_of_show") return { categoryWinnersOnly: true };
  if (kind === "best_hand_quilting") return { quiltingMethods: ["hand"] };
  if (kind === "best_home_machine") return { quiltingMethods: ["home_machine"] };
  if (kind === "best_frame_machine") return { quiltingMethods: ["frame_machine"] };
  return {};
}

const perimeterUm = (c: AwardCandidate) => 2 * (c.widthUm + c.lengthUm);

/** Why `candidate` may not win `award`, in plain words; null when it may. */
export function ineligibility(award: Pick<AwardDefinition, "name" | "eligibility">, c: AwardCandidate): string | null {
  const e = award.eligibility;
  if (e.categoryWinnersOnly && c.categoryPlace !== 1) return `${c.label} did not win 1st in its category; ${award.name} goes to a category winner.`;
  if (e.categoryIds?.length && (!c.categoryId || !e.categoryIds.includes(c.categoryId))) return `${c.label} is not in a category ${award.name} is open to.`;
  if (e.quiltingMethods?.length && !e.quiltingMethods.includes(c.quiltingMethod as QuiltingMethodCode)) return `${c.label} is not quilted the way ${award.name} asks.`;
  if (e.divisions?.length && !e.divisions.includes(c.division)) return `${c.label} is not in a division ${award.name} is open to.`;
  if (e.size) {
    const large = perimeterUm(c) >= e.size.perimeterUm;
    if (e.size.side === "large" && !large) return `${c.label} is below the size for ${award.name}.`;
    if (e.size.side === "small" && large) return `${c.label} is too large for ${award.name}.`;
  }
  return null;
}

function tally(picks: readonly AwardPickInput[]): Record<string, number> {
  const votes: Record<string, number> = {};
  for (const p of picks) if (p.kind === "vote" && p.judgeId) votes[p.entryId] = (votes[p.entryId] ?? 0) + 1;
  return votes;
}

function decideOne(award: AwardDefinition, picks: readonly AwardPickInput[], labelOf: (id: string) => string): Pick<AwardOutcome, "winners" | "votes" | "problems"> {
  const chair = picks.find((p) => p.judgeId === null);
  const votes = tally(picks);
  if (award.chooseBy === "chair") {
    return chair ? { winners: [{ entryId: chair.entryId, judgeId: null, how: "Chosen by the chair." }], votes, problems: [] } : { winners: [], votes, problems: [`${award.name}: the chair has not chosen a winner yet.`] };
  }
  const best = Math.max(0, ...Object.values(votes));
  const leaders = Object.keys(votes).filter((id) => votes[id] === best);
  if (chair) {
    const against = best > 0 && !leaders.includes(chair.entryId);
    if (against && !chair.reason.trim()) return { winners: [], votes, problems: [`${award.name}: the chair's choice goes against the judges' votes and needs a reason.`] };
    const how = leaders.length > 1 && leaders.includes(chair.entryId) ? `Tied vote (${best} each); the chair decided.` : against ? "Chosen by the chair against the votes." : "Chosen by the chair.";
    return { winners: [{ entryId: chair.entryId, judgeId: null, how }], votes, problems: [] };
  }
  if (best === 0) return { winners: [], votes, problems: [`${award.name}: no judge has voted yet.`] };
  if (leaders.length > 1) return { winners: [], votes, problems: [`${award.name}: the vote is tied between ${leaders.map(labelOf).join(" and ")} (${best} each); the chair decides.`] };
  return { winners: [{ entryId: leaders[0]!, judgeId: null, how: `The judges' vote (${best} of ${picks.filter((p) => p.kind === "vote").length}).` }], votes, problems: [] };
}

function judgesChoice(award: AwardDefinition, picks: readonly AwardPickInput[]): Pick<AwardOutcome, "winners" | "votes" | "problems"> {
  const winners = picks.filter((p) => p.judgeId !== null).map((p) => ({ entryId: p.entryId, judgeId: p.judgeId, how: "The judge's own choice." }));
  return { winners, votes: {}, problems: winners.length ? [] : [`${award.name}: no judge has made a choice yet.`] };
}

/**
 * Each award's winners from the picks, refusing ineligible ones. A judge's choice has one winner
 * per judge; a judges' vote award goes to the most votes, a tied vote to the chair.
 */
export function decideAwards(awards: readonly AwardDefinition[], picks: readonly AwardPickInput[], candidates: readonly AwardCandidate[]): AwardOutcome[] {
  const byId = new Map(candidates.map((c) => [c.entryId, c]));
  const labelOf = (id: string) => byId.get(id)?.label ?? `entry ${id}`;
  return awards.map((award) => {
    const mine = picks.filter((p) => p.awardId === award.id);
    const decided = award.kind === "judges_choice" ? judgesChoice(award, mine) : decideOne(award, mine, labelOf);
    const problems = [...decided.problems];
    const winners = decided.winners.filter((w) => {
      const c = byId.get(w.entryId);
      const why = c ? ineligibility(award, c) : `${labelOf(w.entryId)} is not a judged entry of this show.`;
      if (why) problems.push(`${award.name}: ${why}`);
      return !why;
    });
    return { awardId: award.id, name: award.name, ribbon: award.ribbon, winners, votes: decided.votes, problems };
  });
}

/** Pairs of awards one entry holds that the show does not allow together. */
export function combinationProblems(awards: readonly AwardDefinition[], outcomes: readonly AwardOutcome[], labelOf: (entryId: string) => string): string[] {
  const byId = new Map(awards.map((a) => [a.id, a]));
  const held = new Map<string, string[]>();
  for (const o of outcomes) for (const w of o.winners) held.set(w.entryId, [...new Set([...(held.get(w.entryId) ?? []), o.awardId])]);
  const problems: string[] = [];
  for (const [entryId, ids] of held) {
    for (let i = 0; i < ids.length; i++) {
      for (let j = i + 1; j < ids.length; j++) {
        const a = byId.get(ids[i]!)!;
        const b = byId.get(ids[j]!)!;
        if (!a.combinesWith.includes(b.id) && !b.combinesWith.includes(a.id)) problems.push(`${labelOf(entryId)} holds ${a.name} and ${b.name}, which this show does not allow together.`);
      }
    }
  }
  return problems;
}
