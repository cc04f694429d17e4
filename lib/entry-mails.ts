// Mails to entrants about their entries: received, payment receipt, decision, drop-off reminder.
import "server-only";

/** Tells the entrant which entries were received (numbers, titles) and what comes next. */
export async function sendEntryReceivedMail(entryIds: string[]): Promise<void> {
  void entryIds;
}
