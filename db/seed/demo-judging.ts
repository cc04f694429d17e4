// The demo show's judging set-up: one score sheet of our own wording (100 points), quick phrases,
// and two panels of judges and scribes splitting the guild starter categories by code.
import type { AwardEligibility, AwardKind, RibbonStyle } from "../../scoring/awards";
import { DEFAULT_RESULT_RULES, type ResultRules } from "../../scoring/results";
import type { ScoreSheet } from "../../scoring/score-sheets";

const points = (id: string, label: string, maxPoints: number, allowNotApplicable = false) => ({ id, label, maxPoints, scale: { kind: "points" as const }, allowNotApplicable });

export const DEMO_SHEET: { name: string; sheet: ScoreSheet } = {
  name: "Guild sheet",
  sheet: {
    sections: [
      { id: "appearance", title: "General appearance", criteria: [points("impact", "Visual impact", 20), points("colour", "Colour and contrast", 10)] },
      { id: "design", title: "Design", criteria: [points("composition", "Composition and balance", 15), points("fabric", "Use of fabric", 10)] },
      {
        id: "workmanship",
        title: "Workmanship",
        criteria: [points("piecing", "Piecing", 15, true), points("applique", "Appliqué", 10, true), points("quilting", "Quilting stitches", 15)],
      },
      {
        id: "finishing",
        title: "Finishing",
        criteria: [
          {
            id: "edges",
            label: "Edges and binding",
            maxPoints: 5,
            allowNotApplicable: false,
            scale: { kind: "words", levels: [{ label: "Excellent", fraction: 1 }, { label: "Good", fraction: 0.8 }, { label: "Fair", fraction: 0.6 }, { label: "Needs work", fraction: 0.4 }] },
          },
        ],
      },
    ],
  },
};

export const DEMO_QUICK_PHRASES = [
  "Points meet crisply.",
  "Lovely movement in the quilting.",
  "Binding is full and even.",
  "Consider a border to frame the centre.",
  "Colour choices draw the eye across the quilt.",
  "Some seams are not quite aligned.",
  "Quilting density varies; aim for even coverage.",
  "A strong, original design.",
];

/** Panel A judges the pieced bands and art; Panel B the technique categories and youth. */
export const DEMO_PANELS = [
  { name: "Panel A", day: "2027-03-11", room: "Fellowship Hall, table 1", judges: ["judge1@ribbonry.test", "judge2@ribbonry.test"], scribes: ["scribe1@ribbonry.test"], categoryCodes: ["10", "11", "12", "20"] },
  { name: "Panel B", day: "2027-03-11", room: "Fellowship Hall, table 2", judges: ["judge3@ribbonry.test"], scribes: ["scribe2@ribbonry.test"], categoryCodes: ["30", "40", "50", "60"] },
];

/**
 * The demo guild's result rules: ranked by the mean; ties broken by the workmanship section, then
 * the judges' first places, then the chair. Fewer ribbons for small categories and "a tie for 2nd
 * means no 3rd", as one guild's ribbon sheet has it (common practice; cut-offs vary by show).
 */
export const DEMO_RESULT_RULES: ResultRules = {
  ...DEFAULT_RESULT_RULES,
  tieBreaks: [{ kind: "section", sectionId: "workmanship", label: "Workmanship" }, { kind: "firstPlaceVotes" }, { kind: "chair" }],
  sizeRules: [{ maxEntries: 3, places: 1 }, { maxEntries: 6, places: 2 }],
  honorableMentions: 1,
  honorableMentionMinimum: 80,
};

/** The demo show's awards: invented names; the sponsor is a made-up shop. */
export const DEMO_AWARDS: { name: string; kind: AwardKind; chooseBy: "chair" | "judges_vote"; sponsor?: string; ribbon: RibbonStyle; eligibility: AwardEligibility; keepsCategoryPlace: boolean }[] = [
  { name: "Best of Show", kind: "best_of_show", chooseBy: "judges_vote", ribbon: { name: "Purple rosette", colour: "#6b21a8" }, eligibility: { categoryWinnersOnly: true }, keepsCategoryPlace: true },
  { name: "Best hand quilting", kind: "best_hand_quilting", chooseBy: "chair", ribbon: { name: "Gold rosette", colour: "#ca8a04" }, eligibility: { quiltingMethods: ["hand"] }, keepsCategoryPlace: true },
  { name: "Judge's choice", kind: "judges_choice", chooseBy: "chair", ribbon: { name: "Teal ribbon", colour: "#0f766e" }, eligibility: {}, keepsCategoryPlace: true },
  { name: "Harbor Row Notions award for colour", kind: "sponsor", chooseBy: "chair", sponsor: "Harbor Row Notions (invented)", ribbon: { name: "Orange ribbon", colour: "#ea580c" }, eligibility: {}, keepsCategoryPlace: true },
];
