// Input schemas for judging: the chair's score sheets, methods, panels, declarations and options,
// and the tablets' batches of sheet changes. Every boundary of the judging area parses with these.
import { z } from "zod";
import { boundedInt, INT4_MAX, MAX_INPUT_DEPTH, storableString } from "@/lib/validation";

const id = storableString().trim().min(1).max(40).regex(/^[A-Za-z0-9_-]+$/, "Use letters, digits, - and _ in ids.");
const positive = (what: string) => z.number({ error: `${what} must be a number.` }).positive(`${what} must be more than 0.`).max(1000, `${what} is too large.`);

export const criterionSchema = z.object({
  id,
  label: storableString().trim().min(1, "Name the criterion.").max(80),
  maxPoints: positive("Most points"),
  weight: positive("Weight").optional(),
  scale: z.discriminatedUnion("kind", [
    z.object({ kind: z.literal("points"), step: positive("Step").optional() }),
    z.object({
      kind: z.literal("words"),
      levels: z
        .array(z.object({ label: storableString().trim().min(1, "Name the level.").max(40), fraction: z.number().min(0, "A level is worth 0 to 1 of the points.").max(1, "A level is worth 0 to 1 of the points.") }))
        .min(2, "A word scale needs at least two levels.")
        .max(10),
    }),
  ]),
  allowNotApplicable: z.boolean(),
});

export const scoreSheetSchema = z.object({
  sections: z
    .array(z.object({ id, title: storableString().trim().min(1, "Name the section.").max(80), criteria: z.array(criterionSchema).min(1, "A section needs at least one criterion.").max(30) }))
    .min(1, "A sheet needs at least one section.")
    .max(12),
});

export const saveSheetSchema = z.object({
  id: z.uuid().optional(),
  name: storableString().trim().min(1, "Name the sheet.").max(80),
  isDefault: z.boolean().default(false),
  sheet: scoreSheetSchema,
});

export const categoryJudgingSchema = z.object({
  categoryId: z.uuid(),
  method: z.enum(["points", "sort_then_points", "sort_then_rank", "rank"]),
  scoreSheetId: z.uuid().nullable(),
});

const day = z.union([z.literal(""), storableString().regex(/^\d{4}-\d{2}-\d{2}$/, "Give the day as a date.")]);

export const panelSchema = z.object({
  id: z.uuid().optional(),
  name: storableString().trim().min(1, "Name the panel, e.g. Panel A.").max(60),
  day,
  room: storableString().trim().max(60).default(""),
  judgeIds: z.array(storableString().min(1)).min(1, "A panel needs at least one judge.").max(6),
  scribeIds: z.array(storableString().min(1)).max(6).default([]),
  categoryIds: z.array(z.uuid()).max(100).default([]),
});

export const deletePanelSchema = z.object({ panelId: z.uuid() });

export const RELATIONS = ["household", "student", "client", "other"] as const;
export const declarationSchema = z
  .object({
    judgeUserId: storableString().min(1).optional(),
    personName: storableString().trim().max(120).default(""),
    personEmail: z.union([z.literal(""), z.email("That e-mail address doesn't look right.")]).default(""),
    relation: z.enum(RELATIONS),
  })
  .refine((d) => d.personName !== "" || d.personEmail !== "", { message: "Give the person's name or e-mail address.", path: ["personName"] });

export const deleteDeclarationSchema = z.object({ declarationId: z.uuid() });

/** Entry fields a show may release to its judges. Names, contacts and guilds are never among them. */
export const JUDGE_FIELDS = ["title", "size", "techniques", "quiltingMethod", "pattern", "statement", "division"] as const;
export type JudgeField = (typeof JUDGE_FIELDS)[number];

export const judgingOptionsSchema = z.object({
  commentPolicy: z.enum(["all", "placed", "none"]),
  judgeFields: z.array(z.enum(JUDGE_FIELDS)).max(JUDGE_FIELDS.length),
  quickPhrases: z.array(storableString().trim().min(1).max(120)).max(60, "Keep the list to 60 phrases."),
});

export const reopenSchema = z.object({
  sheetId: z.uuid(),
  reason: storableString().trim().min(3, "Say why, in a few words (it goes in the audit log).").max(300),
});

// ── Tablet sync ──────────────────────────────────────────────────────────────────────────────────

const jsonTree: z.ZodType<unknown> = z.lazy(() => z.union([z.null(), z.boolean(), z.number(), storableString().max(5000), z.array(jsonTree).max(50), z.record(storableString().max(60), jsonTree)]));
/** A sheet field's value: any JSON, but never nested deep enough to exhaust the parser's stack. */
const json = z.unknown().refine((v) => depthOf(v) <= MAX_INPUT_DEPTH, { message: "This value is nested too deeply.", abort: true }).pipe(jsonTree);

function depthOf(v: unknown): number {
  let deepest = 0;
  const stack: [unknown, number][] = [[v, 0]];
  while (stack.length) {
    const [x, d] = stack.pop()!;
    deepest = Math.max(deepest, d);
    if (deepest > MAX_INPUT_DEPTH) break;
    if (x && typeof x === "object") for (const y of Object.values(x)) stack.push([y, d + 1]);
  }
  return deepest;
}

/** Sequence numbers and versions are PostgreSQL integers. */
const counter = (label: string) => boundedInt(0, INT4_MAX, label);

const base = {
  key: storableString().min(8).max(80),
  entryId: z.uuid(),
  seq: counter("The sequence number"),
  clientAt: z.iso.datetime({ offset: true }).optional(),
};

export const sheetChangeSchema = z.discriminatedUnion("kind", [
  z.object({ ...base, kind: z.enum(["set", "resolve"]), field: storableString().min(1).max(80).regex(/^(mark:|comment:)[A-Za-z0-9_-]+$|^(discuss|sort|rank)$/, "Unknown field."), value: json, baseVersion: counter("The version") }),
  z.object({ ...base, kind: z.literal("submit"), seen: z.record(storableString().max(80), counter("The version")) }),
]);

export const syncBatchSchema = z.object({
  deviceId: storableString().min(8).max(80),
  /** The judge the changes are for: the viewer, or (for a scribe) a judge on their panel. */
  forJudge: storableString().min(1).max(80),
  changes: z.array(sheetChangeSchema).max(500, "Send at most 500 changes at once."),
});

export type SyncBatch = z.output<typeof syncBatchSchema>;
export type SheetChangeInput = z.output<typeof sheetChangeSchema>;
