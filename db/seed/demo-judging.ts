// The demo show's judging set-up: one score sheet of our own wording (100 points), quick phrases,
// and two panels of judges and scribes splitting the guild starter categories by code.
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
