// What moving a show from one stage to another will do, what refuses it and what the chair should
// know first. Pure: the caller gathers the counts (db/queries/stage-counts.ts) and applies the move.
export const STAGES = ["draft", "entries_open", "entries_closed", "judging", "results_published", "archived"] as const;
export type Stage = (typeof STAGES)[number];

export const STAGE_NAMES: Record<Stage, string> = {
  draft: "Being set up",
  entries_open: "Taking entries",
  entries_closed: "Entries closed",
  judging: "Judging",
  results_published: "Results out",
  archived: "Finished",
};

/** The usual next step from each stage (the main button); results go out from the Results page. */
export const NEXT_STAGE: Record<Stage, Stage | null> = {
  draft: "entries_open",
  entries_open: "entries_closed",
  entries_closed: "judging",
  judging: null,
  results_published: "archived",
  archived: null,
};

/** The safe steps back (always with a reason); taking results down is on the Results page. */
export const STEP_BACK: Record<Stage, Stage | null> = {
  draft: null,
  entries_open: null,
  entries_closed: "entries_open",
  judging: "entries_closed",
  results_published: null,
  archived: null,
};

/** Everything about the show the checks read; numbers count entries unless named otherwise. */
export type StageCounts = {
  now: Date;
  entryClosesAt: Date | null;
  rulesPublished: boolean;
  juried: boolean;
  /** Sent entries still in the show (not draft, withdrawn or declined), display-only included. */
  entries: number;
  drafts: number;
  /** Sent, for judging, not paid (or at a juried show not accepted), with no recorded exception. */
  notCleared: number;
  /** Entries that will reach the judges' lists (the judged-entries rule, exceptions included). */
  judged: number;
  /** Of `judged`, those there by the chair's recorded exception. */
  exceptions: number;
  /** Judged entries whose quilt has not been checked in; null while there is no drop-off check-in. */
  notReceived: number | null;
  /** Judged entries with no category yet (undecided, fits none, fits several). */
  undecided: number;
  activeCategories: number;
  /** Categories holding judged entries that no panel judges. */
  categoriesWithoutPanel: string[];
  judgesWithoutPanel: string[];
  openConflicts: string[];
  /** Sheets a judge has submitted, and sheets still to do (judged entries × their panel's judges). */
  sheetsSubmitted: number;
  sheetsMissing: number;
};

export type StageMoveCheck = { effects: string[]; blockers: string[]; warnings: string[]; stepBack: boolean };

const plural = (n: number, one: string, many: string) => `${n} ${n === 1 ? one : many}`;
const DAY_MS = 86_400_000;

/** The check for one move: effects (what it does), blockers (refuse it), warnings (need a reason). */
export function checkStageMove(from: Stage, to: Stage, c: StageCounts): StageMoveCheck {
  const out: StageMoveCheck = { effects: [], blockers: [], warnings: [], stepBack: STEP_BACK[from] === to };
  const { effects, blockers, warnings } = out;
  if (from === to) {
    blockers.push(`The show is already at “${STAGE_NAMES[to]}”.`);
    return out;
  }
  if (to === "results_published" || (from === "results_published" && to === "judging")) {
    const missing = from === "judging" && c.sheetsMissing > 0 ? ` ${plural(c.sheetsMissing, "sheet is", "sheets are")} still missing.` : "";
    blockers.push(`Publish or take down the results from Results, which checks every sheet first.${missing}`);
    return out;
  }
  if (NEXT_STAGE[from] !== to && STEP_BACK[from] !== to) {
    const allowed = [NEXT_STAGE[from], STEP_BACK[from]].filter((s): s is Stage => s !== null).map((s) => `“${STAGE_NAMES[s]}”`);
    blockers.push(`A show at “${STAGE_NAMES[from]}” can't move to “${STAGE_NAMES[to]}”${allowed.length ? `; it can move to ${allowed.join(" or ")}` : ""}.`);
    return out;
  }

  if (to === "entries_open") {
    effects.push(from === "draft" ? "The show appears on the public page and entrants can send quilts." : "Entrants can send, change and withdraw quilts again until the closing date.");
    if (from === "entries_closed") effects.push("Entries sent since closing are not affected; nothing already decided changes.");
    if (!c.entryClosesAt) blockers.push("Set the date entries close first (Dates).");
    else if (c.entryClosesAt <= c.now) blockers.push("The closing date for entries has passed; move it later first (Dates).");
    if (!c.rulesPublished) blockers.push("Publish the rules and release first (Rules and release).");
    return out;
  }

  if (from === "entries_open" && to === "entries_closed") {
    effects.push("Entrants can no longer send, change or withdraw quilts; the chair still can.");
    effects.push(`${plural(c.entries, "sent entry stays", "sent entries stay")} in the show.`);
    if (c.entryClosesAt && c.entryClosesAt > c.now) {
      const days = Math.ceil((c.entryClosesAt.getTime() - c.now.getTime()) / DAY_MS);
      warnings.push(`The closing date is still ${plural(days, "day", "days")} away; entrants expect to send quilts until then.`);
    }
    if (c.drafts > 0) warnings.push(`${plural(c.drafts, "draft was", "drafts were")} never sent; ${c.drafts === 1 ? "it" : "they"} can't be sent after closing.`);
    if (c.notCleared > 0) warnings.push(`${plural(c.notCleared, "entry is", "entries are")} ${c.juried ? "not accepted yet" : "not paid yet"}.`);
    return out;
  }

  if (from === "entries_closed" && to === "judging") {
    effects.push(`${plural(c.judged, "entry reaches", "entries reach")} the judges' lists${c.exceptions ? ` (${c.exceptions} by your recorded exception)` : ""}.`);
    effects.push("Categories, overrides and moves lock; judges' declarations close to judges; sheets take scores.");
    if (c.activeCategories === 0) blockers.push("Set up the categories first (Categories).");
    if (c.undecided > 0) blockers.push(`${plural(c.undecided, "entry has", "entries have")} no category yet; place ${c.undecided === 1 ? "it" : "them"} from the queue first (Categories).`);
    blockers.push(...c.openConflicts);
    if (c.judged === 0) blockers.push("No entry would be judged: none is paid (or accepted) and none has your recorded exception.");
    if (c.notCleared > 0) {
      warnings.push(`${plural(c.notCleared, "entry is", "entries are")} ${c.juried ? "not accepted" : "not paid"} and will not be judged unless you record an exception (Judging set-up).`);
    }
    if (c.drafts > 0) warnings.push(`${plural(c.drafts, "draft was", "drafts were")} never sent and will not be judged.`);
    if (c.notReceived !== null && c.notReceived > 0) warnings.push(`${plural(c.notReceived, "quilt to be judged has", "quilts to be judged have")} not been received.`);
    if (c.categoriesWithoutPanel.length) warnings.push(`No panel judges ${c.categoriesWithoutPanel.join(", ")}; ${c.categoriesWithoutPanel.length === 1 ? "its" : "their"} entries will not be judged.`);
    if (c.judgesWithoutPanel.length) warnings.push(`${c.judgesWithoutPanel.join(", ")} ${c.judgesWithoutPanel.length === 1 ? "is" : "are"} on no panel and will see no quilts.`);
    return out;
  }

  if (from === "judging" && to === "entries_closed") {
    effects.push("Sheets stop taking scores; what judges entered so far is kept.");
    effects.push("Categories, overrides and moves unlock.");
    if (c.sheetsSubmitted > 0) {
      blockers.push(`${plural(c.sheetsSubmitted, "sheet is", "sheets are")} already submitted; judging can't go back once a judge has submitted a sheet.`);
    }
    return out;
  }

  if (from === "results_published" && to === "archived") {
    effects.push("The show is finished: its stage no longer changes; the results stay public.");
    return out;
  }
  return out;
}

/** True when the move needs the chair's written reason: a step back, or warnings overridden. */
export function needsReason(check: StageMoveCheck): boolean {
  return check.stepBack || check.warnings.length > 0;
}
