// Input schemas for results: the show's result rules and ribbons, the chair's changes to proposed
// placements and tie orders (always with a reason), show-wide awards and their picks, publishing.
import { z } from "zod";
import { storableString } from "@/lib/validation";

const reason = storableString().trim().min(3, "Give a reason (a few words) — it goes in the audit log.").max(500, "Keep the reason under 500 characters.");
const colour = storableString().regex(/^#[0-9a-fA-F]{6}$/, "Pick a colour.");
export const ribbonSchema = z.object({ name: storableString().trim().min(1, "Name the ribbon, e.g. Blue.").max(40), colour });
const score = z.number({ error: "A minimum must be a number." }).min(0, "A minimum can't be negative.").max(1000, "That minimum is too high.");

export const tieBreakRuleSchema = z.discriminatedUnion("kind", [
  z.object({ kind: z.literal("section"), sectionId: storableString().min(1).max(40), label: storableString().trim().min(1).max(80) }),
  z.object({ kind: z.literal("firstPlaceVotes") }),
  z.object({ kind: z.literal("median") }),
  z.object({ kind: z.literal("chair") }),
]);

export const resultRulesSchema = z
  .object({
    rankBy: z.enum(["mean", "adjusted"], "Choose what ranks the entries."),
    tieBreaks: z.array(tieBreakRuleSchema).max(6, "Six tie-breaks at most."),
    places: z.number({ error: "Places must be a number." }).int("Places: a whole number.").min(1, "Offer at least 1st place.").max(10, "Ten places at most."),
    minimumScores: z.array(score.nullable()).max(10),
    sizeRules: z
      .array(z.object({ maxEntries: z.number().int("A whole number of entries.").min(1, "At least 1 entry.").max(500), places: z.number().int().min(0, "Places can't be negative.").max(10) }))
      .max(6),
    ties: z.enum(["shareAndSkip", "shareNoSkip", "shareWithinCount"], "Choose how a tie is handled."),
    honorableMentions: z.number().int("A whole number.").min(0, "Can't be negative.").max(20, "Twenty at most."),
    honorableMentionMinimum: score.nullable(),
    spreadFlag: z.number({ error: "The spread flag must be a number." }).min(0).max(1000),
    ribbons: z.object({ places: z.array(ribbonSchema).min(1, "Set at least the 1st-place ribbon.").max(10), honorableMention: ribbonSchema }),
  })
  .superRefine((r, ctx) => {
    if (r.ribbons.places.length < r.places) ctx.addIssue({ code: "custom", path: ["ribbons", "places"], message: `Set a ribbon for each of the ${r.places} places.` });
    const kinds = r.tieBreaks.map((t) => (t.kind === "section" ? `section:${t.sectionId}` : t.kind));
    if (new Set(kinds).size !== kinds.length) ctx.addIssue({ code: "custom", path: ["tieBreaks"], message: "Each tie-break once." });
    const chair = r.tieBreaks.findIndex((t) => t.kind === "chair");
    if (chair !== -1 && chair !== r.tieBreaks.length - 1) ctx.addIssue({ code: "custom", path: ["tieBreaks"], message: "The chair's decision comes last: nothing can break a tie after it." });
    const mins = r.minimumScores.filter((m): m is number => m !== null);
    if (mins.some((m, i) => i > 0 && m > mins[i - 1]!)) ctx.addIssue({ code: "custom", path: ["minimumScores"], message: "A lower place can't need a higher minimum than the place above it." });
  });
export type ResultRulesInput = z.output<typeof resultRulesSchema>;

export const placementSchema = z
  .object({
    entryId: z.uuid("Choose an entry."),
    outcome: z.union([z.literal("none"), z.literal("hm"), z.coerce.number().int().min(1).max(10)]),
    reason,
  })
  .transform((v) => ({ entryId: v.entryId, place: typeof v.outcome === "number" ? v.outcome : null, honorableMention: v.outcome === "hm", reason: v.reason }));
export type PlacementInput = z.output<typeof placementSchema>;

export const clearPlacementSchema = z.object({ entryId: z.uuid(), reason });
export const tieOrderSchema = z.object({ categoryId: z.uuid(), entryIds: z.array(z.uuid()).min(2, "Order at least two tied entries.").max(50), reason });

const AWARD_KINDS = ["best_of_show", "best_hand_quilting", "best_home_machine", "best_frame_machine", "judges_choice", "sponsor", "other"] as const;
export const awardSchema = z
  .object({
    id: z.uuid().optional(),
    name: storableString().trim().min(1, "Name the award.").max(80),
    kind: z.enum(AWARD_KINDS, "Choose the kind of award."),
    sponsor: storableString().trim().max(120).default(""),
    chooseBy: z.enum(["chair", "judges_vote"]),
    ribbon: ribbonSchema,
    eligibility: z.object({
      categoryWinnersOnly: z.boolean().optional(),
      categoryIds: z.array(z.uuid()).max(200).optional(),
      quiltingMethods: z.array(z.enum(["hand", "home_machine", "frame_machine"])).max(3).optional(),
      divisions: z.array(z.enum(["open", "youth", "first_time"])).max(3).optional(),
      size: z.object({ side: z.enum(["large", "small"]), perimeterUm: z.number().int().positive("Give the perimeter that splits large from small.").max(100_000_000) }).optional(),
    }),
    combinesWith: z.array(z.uuid()).max(50).default([]),
    keepsCategoryPlace: z.boolean().default(true),
  })
  .superRefine((a, ctx) => {
    if (a.kind === "sponsor" && !a.sponsor) ctx.addIssue({ code: "custom", path: ["sponsor"], message: "Name the sponsor." });
    if (a.kind === "judges_choice" && a.chooseBy !== "chair") ctx.addIssue({ code: "custom", path: ["chooseBy"], message: "Each judge chooses their own; there is no vote." });
  });
export type AwardInput = z.output<typeof awardSchema>;

export const deleteAwardSchema = z.object({ awardId: z.uuid() });
export const pickSchema = z.object({
  awardId: z.uuid(),
  entryId: z.uuid("Choose an entry."),
  /** The judge voting or choosing; empty for the chair's own choice. */
  judgeUserId: storableString().max(100).default(""),
  reason: storableString().trim().max(500).default(""),
});
export const removePickSchema = z.object({ pickId: z.uuid(), reason });
export const publishSchema = z.object({ reason: storableString().trim().max(500).default("") });
export const unpublishSchema = z.object({ reason });
