// The results announcement: once per entrant per publication, each entrant's own results with the
// critique sheets attached (where the show returns comments for that entry). A corrected
// publication (version 2 on) goes only to the entrants whose results changed. Sent after the
// publication commits, so a failed mail never undoes publishing; failures are kept per entrant in
// result_mails and "Send again" retries only those.
import "server-only";
import { and, eq, isNotNull } from "drizzle-orm";
import { db } from "@/db/client";
import { critiqueAvailability, critiqueOf, entrantContacts, previousSnapshot } from "@/db/queries/published-results";
import { settingsForShowId } from "@/db/queries/settings";
import { entries, resultMails, resultPublications, shows } from "@/db/schema";
import { critiqueBytes } from "@/exports/critique-pdf";
import { env } from "@/lib/env";
import { renderEntryMail } from "@/lib/entry-mails";
import { sendMail, type Mail } from "@/lib/mail";
import { changedEntrants, resultWords, type PublishedEntry, type PublishedResults } from "@/scoring/results";
import { errorSummary } from "@/lib/error-log";

export type ResultMailReport = { sent: number; failed: number; alreadySent: number; unchanged: number };

const url = (path: string) => new URL(path, env.APP_URL).toString();

/** Mails the entrants of a publication who have not had it yet. Nothing goes out unless it is current. */
export async function sendResultMails(publicationId: string): Promise<ResultMailReport> {
  const [pub] = await db
    .select({ id: resultPublications.id, showId: resultPublications.showId, version: resultPublications.version, reason: resultPublications.reason, snapshot: resultPublications.snapshot, unpublishedAt: resultPublications.unpublishedAt, showName: shows.name, slug: shows.slug, status: shows.status })
    .from(resultPublications)
    .innerJoin(shows, eq(shows.id, resultPublications.showId))
    .where(eq(resultPublications.id, publicationId));
  const report: ResultMailReport = { sent: 0, failed: 0, alreadySent: 0, unchanged: 0 };
  if (!pub || pub.unpublishedAt || pub.status !== "results_published") return report;
  const snapshot = pub.snapshot as PublishedResults;

  const everyone = [...new Set(snapshot.categories.flatMap((c) => c.entries.map((e) => e.entrantUserId)))];
  const changed = pub.version > 1 ? changedEntrants(await previousSnapshot(db, pub.showId, pub.version), snapshot) : new Set(everyone);
  const done = new Set(
    (await db.select({ id: resultMails.entrantUserId }).from(resultMails).where(and(eq(resultMails.publicationId, pub.id), isNotNull(resultMails.sentAt)))).map((r) => r.id),
  );
  report.unchanged = everyone.filter((id) => !changed.has(id)).length;
  report.alreadySent = everyone.filter((id) => changed.has(id) && done.has(id)).length;
  const todo = everyone.filter((id) => changed.has(id) && !done.has(id));
  if (todo.length === 0) return report;

  const settings = await settingsForShowId(pub.showId);
  const asked = new Map((await db.select({ id: entries.id, critiqueRequested: entries.critiqueRequested }).from(entries).where(eq(entries.showId, pub.showId))).map((e) => [e.id, e]));
  const contacts = new Map((await entrantContacts(todo)).map((c) => [c.id, c]));
  const categoryOf = new Map(snapshot.categories.flatMap((c) => c.entries.map((e) => [e.entryId, `${c.code} ${c.name}`] as const)));

  for (const entrantId of todo) {
    const contact = contacts.get(entrantId);
    if (!contact) continue;
    const mine = snapshot.categories.flatMap((c) => c.entries).filter((e) => e.entrantUserId === entrantId).sort((a, b) => a.entryNumber - b.entryNumber);
    let error = "";
    try {
      const attachments: NonNullable<Mail["attachments"]> = [];
      const notes: string[] = [];
      for (const e of mine) {
        const allowed = critiqueAvailability(settings, asked.get(e.entryId) ?? { critiqueRequested: false }, e);
        if (!allowed.available) {
          notes.push(`Entry ${e.entryNumber}: ${allowed.why}`);
          continue;
        }
        const data = await critiqueOf({ entryId: e.entryId, entryNumber: e.entryNumber, title: e.title, category: categoryOf.get(e.entryId) ?? "", showName: pub.showName });
        if (data.judges.length === 0) continue;
        attachments.push({ filename: `critique-${e.entryNumber}.pdf`, content: await critiqueBytes(data), contentType: "application/pdf" });
      }
      await sendMail({ to: contact.email, fromName: pub.showName, replyTo: settings.replyToEmail.trim() || undefined, attachments, ...resultMail(pub, contact.name, mine, categoryOf, attachments.length, notes) });
      report.sent++;
    } catch (err) {
      error = err instanceof Error ? err.message : String(err);
      report.failed++;
      console.error("[results] mail failed", entrantId, errorSummary(err));
    }
    await db
      .insert(resultMails)
      .values({ publicationId: pub.id, entrantUserId: entrantId, sentAt: error ? null : new Date(), error })
      .onConflictDoUpdate({ target: [resultMails.publicationId, resultMails.entrantUserId], set: { sentAt: error ? null : new Date(), error } });
  }
  return report;
}

function resultMail(
  pub: { version: number; reason: string; showName: string; slug: string },
  name: string,
  mine: PublishedEntry[],
  categoryOf: Map<string, string>,
  critiques: number,
  notes: string[],
): Pick<Mail, "subject" | "text" | "html"> {
  const corrected = pub.version > 1;
  const items = mine.map((e) => `Entry ${e.entryNumber} — ${e.title} (${categoryOf.get(e.entryId) ?? ""}): ${resultWords(e)}`);
  const closing = [
    critiques > 0 ? `The judges' critique ${critiques === 1 ? "sheet is" : "sheets are"} attached: one page per judge, with the scores per section and their comments.` : "",
    ...notes,
    `All the show's ribbons: ${url(`/shows/${pub.slug}/results`)}`,
    "Ribbons and critiques also go home with your quilt at pick-up.",
  ].filter(Boolean);
  return {
    subject: `${corrected ? "Corrected results" : "Results"}: ${pub.showName}`,
    ...renderEntryMail({
      heading: corrected ? `The results of ${pub.showName} have been corrected` : `The results of ${pub.showName} are out`,
      intro: [`Hello ${name}, thank you for entering.`, ...(corrected ? [`The show corrected its results: ${pub.reason}`] : [])],
      sections: [{ title: mine.length === 1 ? "Your entry" : "Your entries", items }],
      closing,
      link: { text: "Open My entries", url: url("/my") },
    }),
  };
}
