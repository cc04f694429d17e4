"use server";
// The chair's bulk actions on entries: accept, decline with a reason, mark paid offline, and (for
// juried shows) release the recorded decisions to the entrants.
import { revalidatePath } from "next/cache";
import { acceptEntries, declineEntries, markEntriesPaidOffline, releaseDecisions } from "@/db/queries/chair-entries";
import { defineAction } from "@/lib/action";
import { sendDecisionMail } from "@/lib/entry-mails";
import { acceptEntriesSchema, declineEntriesSchema, markPaidOfflineSchema, releaseDecisionsSchema } from "@/lib/schemas/chair-entries";
import { plural } from "@/scoring/words";
import { errorSummary } from "@/lib/error-log";

function revalidate(slug: string) {
  revalidatePath(`/shows/${slug}/manage/entries`);
  revalidatePath(`/shows/${slug}/manage/jurying`);
}

/** Mails after the commit, so a failed mail never undoes a recorded decision. */
async function mailDecisions(entryIds: string[], done: string): Promise<{ message: string }> {
  try {
    await sendDecisionMail(entryIds);
    return { message: `${done} The entrants have been e-mailed.` };
  } catch (err) {
    console.error("[entries] decision mail failed", errorSummary(err));
    return { message: `${done} The e-mails could not be sent; the decisions are saved.` };
  }
}

/** What a decision did, in words; entries that already had it are named apart and never mailed. */
async function reportDecision(r: { juried: boolean; entryIds: string[]; unchanged: number }, verb: "accepted" | "declined") {
  const already = r.unchanged ? ` ${plural(r.unchanged, "entry was", "entries were")} already ${verb}; nothing changed for ${r.unchanged === 1 ? "it" : "them"}.` : "";
  if (r.entryIds.length === 0) return { message: already.trim() };
  const done = `${plural(r.entryIds.length, "entry", "entries")} ${verb}.${already}`;
  if (r.juried) return { message: `${done} Entrants hear when you release decisions.` };
  return mailDecisions(r.entryIds, done);
}

export const acceptEntriesAction = defineAction(acceptEntriesSchema, async (input, viewer) => {
  const r = await acceptEntries(viewer, input.showSlug, input.entryIds);
  revalidate(r.show.slug);
  return reportDecision(r, "accepted");
});

export const declineEntriesAction = defineAction(declineEntriesSchema, async (input, viewer) => {
  const r = await declineEntries(viewer, input.showSlug, input.entryIds, input.reason);
  revalidate(r.show.slug);
  return reportDecision(r, "declined");
});

export const markPaidOfflineAction = defineAction(markPaidOfflineSchema, async (input, viewer) => {
  const r = await markEntriesPaidOffline(viewer, input.showSlug, input.entryIds, input.reference);
  revalidate(r.show.slug);
  return { message: `${plural(r.entryIds.length, "entry", "entries")} marked paid (${input.reference}).` };
});

export const releaseDecisionsAction = defineAction(releaseDecisionsSchema, async (input, viewer) => {
  const r = await releaseDecisions(viewer, input.showSlug);
  revalidate(r.show.slug);
  if (r.entryIds.length === 0) return { message: "There are no new decisions to release." };
  return mailDecisions(r.entryIds, `${plural(r.entryIds.length, "decision")} released.`);
});
