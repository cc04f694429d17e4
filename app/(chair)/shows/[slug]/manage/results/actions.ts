"use server";
// The chair's results actions: rules and ribbons, a placement changed by hand, a tie order,
// show-wide awards and their picks, publish and unpublish. Each query checks the chair role.
import { revalidatePath } from "next/cache";
import { z } from "zod";
import { storableString } from "@/lib/validation";
import { clearPlacement, deleteAward, overridePlacement, recordPick, removePick, saveAward, saveResultRules, saveTieOrder } from "@/db/queries/result-changes";
import { currentPublicationForChair, publishResults, unpublishResults } from "@/db/queries/results";
import { defineAction } from "@/lib/action";
import { sendResultMails, type ResultMailReport } from "@/lib/result-mails";
import {
  awardSchema, clearPlacementSchema, deleteAwardSchema, pickSchema, placementSchema, publishSchema, removePickSchema, resultRulesSchema, tieOrderSchema, unpublishSchema,
} from "@/lib/schemas/results";
import { plural } from "@/scoring/words";
import { errorSummary } from "@/lib/error-log";

const showSlug = storableString().min(1, "The show is missing.").max(120);
const withSlug = <S extends z.ZodType>(schema: S) => z.intersection(schema, z.object({ showSlug }));

function refresh(slug: string) {
  revalidatePath(`/shows/${slug}/manage/results`);
  revalidatePath(`/shows/${slug}/results`);
  revalidatePath(`/shows/${slug}`);
}

export const saveResultRulesAction = defineAction(withSlug(resultRulesSchema), async ({ showSlug: slug, ...rules }, viewer) => {
  await saveResultRules(viewer, slug, rules);
  refresh(slug);
  return { message: "Result rules saved." };
});

export const overridePlacementAction = defineAction(withSlug(placementSchema), async ({ showSlug: slug, ...input }, viewer) => {
  await overridePlacement(viewer, slug, input);
  refresh(slug);
  return { message: "Placement changed; the reason is in the audit log." };
});

export const clearPlacementAction = defineAction(withSlug(clearPlacementSchema), async ({ showSlug: slug, ...input }, viewer) => {
  await clearPlacement(viewer, slug, input);
  refresh(slug);
  return { message: "Back to the proposed placement." };
});

export const saveTieOrderAction = defineAction(withSlug(tieOrderSchema), async ({ showSlug: slug, ...input }, viewer) => {
  await saveTieOrder(viewer, slug, input);
  refresh(slug);
  return { message: "Tie order saved." };
});

export const saveAwardAction = defineAction(withSlug(awardSchema), async ({ showSlug: slug, ...input }, viewer) => {
  const { id } = await saveAward(viewer, slug, input);
  refresh(slug);
  return { message: `${input.name} saved.`, data: { id } };
});

export const deleteAwardAction = defineAction(withSlug(deleteAwardSchema), async ({ showSlug: slug, ...input }, viewer) => {
  await deleteAward(viewer, slug, input);
  refresh(slug);
  return { message: "Award removed." };
});

export const recordPickAction = defineAction(withSlug(pickSchema), async ({ showSlug: slug, ...input }, viewer) => {
  await recordPick(viewer, slug, input);
  refresh(slug);
  return { message: input.judgeUserId ? "Recorded." : "The chair's choice is recorded." };
});

export const removePickAction = defineAction(withSlug(removePickSchema), async ({ showSlug: slug, ...input }, viewer) => {
  await removePick(viewer, slug, input);
  refresh(slug);
  return { message: "Removed." };
});

/** The mails go after the commit: a failed mail never undoes publishing, and "Send again" retries. */
async function mailResults(publicationId: string, done: string): Promise<{ message: string }> {
  let report: ResultMailReport;
  try {
    report = await sendResultMails(publicationId);
  } catch (err) {
    console.error("[results] mails failed", errorSummary(err));
    return { message: `${done} The e-mails could not be sent; use "Send the mails again".` };
  }
  const parts = [
    report.sent ? `${plural(report.sent, "entrant")} e-mailed` : "",
    report.failed ? `${report.failed} could not be e-mailed (use "Send the mails again")` : "",
    report.unchanged ? `${plural(report.unchanged, "entrant")} with unchanged results not e-mailed again` : "",
  ].filter(Boolean);
  return { message: `${done}${parts.length ? ` ${parts.join("; ")}.` : ""}` };
}

export const publishResultsAction = defineAction(withSlug(publishSchema), async ({ showSlug: slug, ...input }, viewer) => {
  const { id, version } = await publishResults(viewer, slug, input);
  refresh(slug);
  return mailResults(id, `Results published (version ${version}).`);
});

export const resendResultMailsAction = defineAction(z.object({ showSlug }), async ({ showSlug: slug }, viewer) => {
  const { id } = await currentPublicationForChair(viewer, slug);
  return mailResults(id, "Mails retried.");
});

export const unpublishResultsAction = defineAction(withSlug(unpublishSchema), async ({ showSlug: slug, ...input }, viewer) => {
  const { version } = await unpublishResults(viewer, slug, input);
  refresh(slug);
  return { message: `Version ${version} taken down. The public page and the entrants' pages show no results until you publish again.` };
});
