// The chair's decision on a judge's conflict with an entry: take the judge off that category's
// panel, or let them judge it with a reason (both go in the audit log).
import { z } from "zod";
import { storableString } from "@/lib/validation";

export const CONFLICT_ACTIONS = ["move", "allow"] as const;

export const resolveConflictSchema = z
  .object({
    judgeUserId: storableString().min(1).max(80),
    entryId: z.uuid(),
    action: z.enum(CONFLICT_ACTIONS),
    reason: storableString().trim().max(300, "Keep the reason under 300 characters.").default(""),
  })
  .refine((d) => d.action === "move" || d.reason.length >= 3, { message: "Say why this judge may judge the entry (it goes in the audit log).", path: ["reason"] });

/** The chair's exception: judge an entry although it is not paid (or accepted), with a reason. */
export const judgeAnywaySchema = z.object({
  entryId: z.uuid("Entry: choose one of the show's entries."),
  judge: z.boolean(),
  reason: storableString().trim().max(2000, "Reason: at most 2,000 characters."),
}).refine((v) => !v.judge || v.reason.length >= 3, { path: ["reason"], message: "Reason: say why this entry is judged although it is not paid." });
export type JudgeAnywayInput = z.output<typeof judgeAnywaySchema>;
