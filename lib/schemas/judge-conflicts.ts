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
