// Mails to entrants about their entries: received, payment receipt, decision, drop-off reminder.
// Each goes out under the show's name, with the show's reply-to address when the chair set one.
import "server-only";
import { and, asc, eq, inArray } from "drizzle-orm";
import { db } from "@/db/client";
import { settingsForShowId } from "@/db/queries/settings";
import { entries, paymentItems, payments, shows, user } from "@/db/schema";
import { formatDateRange } from "@/components/format/dates";
import { env } from "@/lib/env";
import { sendMail } from "@/lib/mail";
import { cardWords, formatMoney } from "@/scoring/fees";

const escapeHtml = (s: string) =>
  s.replace(/[&<>"']/g, (c) => ({ "&": "&amp;", "<": "&lt;", ">": "&gt;", '"': "&quot;", "'": "&#39;" })[c]!);

type Section = { title: string; items: string[] };
type Body = { heading: string; intro: string[]; sections: Section[]; closing?: string[]; link?: { text: string; url: string } };

/** One message as text and HTML; every piece of text is escaped in the HTML part. */
export function renderEntryMail(b: Body): { text: string; html: string } {
  const text = [
    b.heading,
    "",
    ...b.intro,
    ...b.sections.flatMap((s) => ["", `${s.title}:`, ...s.items.map((i) => `  - ${i}`)]),
    ...(b.closing?.length ? ["", ...b.closing] : []),
    ...(b.link ? ["", `${b.link.text}: ${b.link.url}`] : []),
    "",
    "— Sent by Ribbonry for the show",
  ].join("\n");
  const p = (s: string) => `<p>${escapeHtml(s)}</p>`;
  const html = `<!doctype html><html><body style="font-family:system-ui,sans-serif;color:#1f1a2e;line-height:1.5">
<h1 style="font-size:20px;color:#5b2a86">${escapeHtml(b.heading)}</h1>
${b.intro.map(p).join("\n")}
${b.sections.map((s) => `<h2 style="font-size:16px;margin-bottom:4px">${escapeHtml(s.title)}</h2>\n<ul>${s.items.map((i) => `<li>${escapeHtml(i)}</li>`).join("")}</ul>`).join("\n")}
${(b.closing ?? []).map(p).join("\n")}
${b.link ? `<p><a href="${escapeHtml(b.link.url)}" style="display:inline-block;background:#5b2a86;color:#fff;padding:10px 16px;border-radius:6px;text-decoration:none">${escapeHtml(b.link.text)}</a></p>` : ""}
</body></html>`;
  return { text, html };
}

const myEntriesUrl = () => new URL("/my", env.APP_URL).toString();
const numbered = (e: { entryNumber: number | null; title: string }) => (e.entryNumber === null ? e.title : `Entry ${e.entryNumber} — ${e.title}`);

async function senderFor(show: { id: string; name: string }) {
  const settings = await settingsForShowId(show.id);
  return { settings, fromName: show.name, replyTo: settings.replyToEmail.trim() || undefined };
}

const entryColumns = {
  id: entries.id,
  entryNumber: entries.entryNumber,
  title: entries.title,
  status: entries.status,
  waitlisted: entries.waitlisted,
  decisionReason: entries.decisionReason,
  entrantUserId: entries.entrantUserId,
  email: user.email,
  name: user.name,
  showId: shows.id,
  showName: shows.name,
  timeZone: shows.timeZone,
  venueName: shows.venueName,
  venueAddress: shows.venueAddress,
  dropOffStartsAt: shows.dropOffStartsAt,
  dropOffEndsAt: shows.dropOffEndsAt,
};

type EntryRow = { [K in keyof typeof entryColumns]: (typeof entryColumns)[K]["_"]["data"] };

/** The entries with their show and entrant, one group per (show, entrant): one mail each. */
async function entryGroups(entryIds: string[]): Promise<EntryRow[][]> {
  if (entryIds.length === 0) return [];
  const rows = (await db
    .select(entryColumns)
    .from(entries)
    .innerJoin(shows, eq(shows.id, entries.showId))
    .innerJoin(user, eq(user.id, entries.entrantUserId))
    .where(inArray(entries.id, entryIds))
    .orderBy(asc(entries.entryNumber))) as EntryRow[];
  const groups = new Map<string, EntryRow[]>();
  for (const r of rows) groups.set(`${r.showId}|${r.entrantUserId}`, [...(groups.get(`${r.showId}|${r.entrantUserId}`) ?? []), r]);
  return [...groups.values()];
}

const dropOffLine = (r: EntryRow) => {
  const when = formatDateRange(r.dropOffStartsAt, r.dropOffEndsAt, r.timeZone, { withTime: true });
  const where = [r.venueName, r.venueAddress].filter(Boolean).join(", ");
  return when ? `Drop-off: ${when} at ${where}.` : `Drop-off times will be announced by the show (${where}).`;
};

/** Tells the entrant which entries were received (numbers, titles) and what comes next. */
export async function sendEntryReceivedMail(entryIds: string[]): Promise<void> {
  for (const group of await entryGroups(entryIds)) {
    const first = group[0]!;
    const { fromName, replyTo } = await senderFor({ id: first.showId, name: first.showName });
    const waiting = group.filter((e) => e.waitlisted);
    await sendMail({
      to: first.email,
      subject: `${group.length === 1 ? "Entry" : "Entries"} received: ${first.showName}`,
      fromName,
      replyTo,
      ...renderEntryMail({
        heading: `${first.showName} has your ${group.length === 1 ? "entry" : "entries"}`,
        intro: [`Hello ${first.name}, thank you for entering. Please keep your entry numbers: they go on the label and the bag.`],
        sections: [
          { title: group.length === 1 ? "Your entry" : "Your entries", items: group.map((e) => `${numbered(e)}${e.waitlisted ? " (waiting list)" : ""}`) },
          {
            title: "What's next",
            items: [
              waiting.length === group.length
                ? "The show is full for now: you are on the waiting list and will hear from the show if a place opens. Nothing to pay yet."
                : "Pay the entry fee from My entries; the entry is confirmed once it is paid.",
              dropOffLine(first),
            ],
          },
        ],
        link: { text: "Open My entries", url: myEntriesUrl() },
      }),
    });
  }
}

/** The receipt for one checkout: its lines, the total and the entry numbers. */
export async function sendPaymentReceiptMail(paymentId: string): Promise<void> {
  const [payment] = await db
    .select({ id: payments.id, amountCents: payments.amountCents, currency: payments.currency, status: payments.status, receiptNumber: payments.receiptNumber, cardBrand: payments.cardBrand, cardLast4: payments.cardLast4, checkoutSessionId: payments.checkoutSessionId, showId: shows.id, showName: shows.name, email: user.email, name: user.name })
    .from(payments)
    .innerJoin(shows, eq(shows.id, payments.showId))
    .innerJoin(user, eq(user.id, payments.entrantUserId))
    .where(eq(payments.id, paymentId))
    .limit(1);
  if (!payment || payment.status === "open" || payment.status === "expired") return;
  const lines = await db
    .select({ description: paymentItems.description, amountCents: paymentItems.amountCents, entryNumber: entries.entryNumber, title: entries.title })
    .from(paymentItems)
    .innerJoin(entries, eq(entries.id, paymentItems.entryId))
    .where(eq(paymentItems.paymentId, paymentId))
    .orderBy(asc(entries.entryNumber));
  const numbers = [...new Set(lines.map((l) => l.entryNumber).filter((n): n is number => n !== null))];
  const money = (c: number) => formatMoney(c, payment.currency);
  const { fromName, replyTo } = await senderFor({ id: payment.showId, name: payment.showName });
  await sendMail({
    to: payment.email,
    subject: `Payment received: ${payment.showName} (${money(payment.amountCents)})`,
    fromName,
    replyTo,
    ...renderEntryMail({
      heading: `Receipt ${payment.receiptNumber}: ${money(payment.amountCents)} to ${payment.showName}`,
      intro: [`Hello ${payment.name}, we have received your payment for ${numbers.length === 1 ? "entry" : "entries"} ${numbers.join(", ")}.`],
      sections: [{ title: "What you paid for", items: [...lines.map((l) => `${l.description}: ${money(l.amountCents)}`), `Total: ${money(payment.amountCents)}`] }],
      closing: [
        // Our receipt number and the card in words; the provider's internal ids stay out of the mail.
        `Receipt number: ${payment.receiptNumber}.${payment.checkoutSessionId ? ` Paid by ${cardWords(payment.cardBrand, payment.cardLast4)}.` : ""}`,
        "Next: bring each quilt to drop-off with its label sewn on and its entry number on the bag.",
      ],
      link: { text: "Open My entries", url: myEntriesUrl() },
    }),
  });
}

/** Accepted or declined (with the reason) for decided entries; entries not yet decided are left out. */
export async function sendDecisionMail(entryIds: string[]): Promise<void> {
  for (const all of await entryGroups(entryIds)) {
    const group = all.filter((e) => e.status === "accepted" || e.status === "declined");
    const first = group[0];
    if (!first) continue;
    const { fromName, replyTo } = await senderFor({ id: first.showId, name: first.showName });
    const accepted = group.filter((e) => e.status === "accepted");
    const declined = group.filter((e) => e.status === "declined");
    await sendMail({
      to: first.email,
      subject: `Decision on your ${group.length === 1 ? "entry" : "entries"}: ${first.showName}`,
      fromName,
      replyTo,
      ...renderEntryMail({
        heading: `The committee of ${first.showName} has decided`,
        intro: [`Hello ${first.name}, here is the committee's decision.`],
        sections: [
          ...(accepted.length ? [{ title: "Accepted", items: accepted.map(numbered) }] : []),
          ...(declined.length ? [{ title: "Declined", items: declined.map((e) => `${numbered(e)}${e.decisionReason.trim() ? `. Reason: ${e.decisionReason.trim()}` : ""}`) }] : []),
        ],
        closing: accepted.length ? [dropOffLine(first)] : ["Thank you for entering; we hope to see your work at a future show."],
        link: { text: "Open My entries", url: myEntriesUrl() },
      }),
    });
  }
}

/**
 * Before drop-off: the entrant's entry numbers expected at the show, the drop-off times in the
 * show's zone, and what to bring. Sleeve, label and bag are common practice.
 */
export async function sendDropOffReminderMail(showId: string, entrantUserId: string): Promise<void> {
  const settings = await settingsForShowId(showId);
  // At a juried show only accepted entries come in; otherwise every paid entry does.
  const expected = settings.juried ? (["accepted"] as const) : (["paid", "accepted"] as const);
  const rows = (await db
    .select(entryColumns)
    .from(entries)
    .innerJoin(shows, eq(shows.id, entries.showId))
    .innerJoin(user, eq(user.id, entries.entrantUserId))
    .where(and(eq(entries.showId, showId), eq(entries.entrantUserId, entrantUserId), inArray(entries.status, [...expected])))
    .orderBy(asc(entries.entryNumber))) as EntryRow[];
  const first = rows[0];
  if (!first) return;
  await sendMail({
    to: first.email,
    subject: `Drop-off reminder: ${first.showName}`,
    fromName: first.showName,
    replyTo: settings.replyToEmail.trim() || undefined,
    ...renderEntryMail({
      heading: `Bringing your quilts to ${first.showName}`,
      intro: [`Hello ${first.name}, your quilts are expected at drop-off.`, dropOffLine(first)],
      sections: [
        { title: rows.length === 1 ? "Your entry" : "Your entries", items: rows.map(numbered) },
        {
          title: "What to bring",
          items: [
            "A hanging sleeve sewn to the top of the back (4 in deep is the usual size, unless the show's rules say otherwise).",
            "Your label sewn on the back, in the lower right corner as seen from the back.",
            "A cloth bag for each quilt, marked with your name and the entry number.",
          ],
        },
      ],
      link: { text: "Open My entries", url: myEntriesUrl() },
    }),
  });
}
