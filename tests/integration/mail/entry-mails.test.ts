// The entrant mails: received, receipt, decision, drop-off reminder — recipients, entry numbers,
// the show as sender name, its reply-to address, both text and HTML parts, user text escaped.
import { eq } from "drizzle-orm";
import { simpleParser } from "mailparser";
import { beforeAll, describe, expect, it } from "vitest";
import { db } from "@/db/client";
import { paymentItems, payments, showSettings, shows } from "@/db/schema";
import { env } from "@/lib/env";
import { sendDecisionMail, sendDropOffReminderMail, sendEntryReceivedMail, sendPaymentReceiptMail } from "@/lib/entry-mails";
import { makeEntry, makeShow, makeUser, type TestUser } from "../../helpers/factories";
import { waitForMail } from "../../helpers/mailbox";

/** The raw message as a mail client parses it, for the headers the mailbox helper leaves out. */
async function headersOf(id: string) {
  const res = await fetch(`${env.MAIL_WEB_URL.replace(/\/+$/, "")}/api/email/${encodeURIComponent(id)}/source`);
  const parsed = await simpleParser(Buffer.from(await res.arrayBuffer()));
  return { from: parsed.from?.value[0], replyTo: parsed.replyTo?.value[0]?.address ?? null };
}

let show: { id: string; slug: string; name: string };
let plainShow: { id: string; slug: string; name: string };

beforeAll(async () => {
  show = await makeShow({ name: "Riverbend Test Quilt Show" });
  await db.insert(showSettings).values({ showId: show.id, entryFeeCents: 2000, replyToEmail: "quilts@riverbend.example.test" });
  // Drop-off Thu 11 Mar 2027 15:00–19:00 UTC = 9:00 AM–1:00 PM CST (America/Chicago, UTC−6).
  await db
    .update(shows)
    .set({ dropOffStartsAt: new Date("2027-03-11T15:00:00Z"), dropOffEndsAt: new Date("2027-03-11T19:00:00Z"), venueAddress: "12 Mill Road" })
    .where(eq(shows.id, show.id));
  plainShow = await makeShow({ name: "Quiet Test Show" });
});

const person = () => makeUser({ name: "Odile Marchetti" });

describe("sendEntryReceivedMail", () => {
  let entrant: TestUser;
  beforeAll(async () => {
    entrant = await person();
  });

  it("lists the entry numbers and titles, says what comes next, and escapes the titles", async () => {
    const a = await makeEntry(show.id, entrant.id, { title: "Rivers <b>&</b> Roads" });
    const b = await makeEntry(show.id, entrant.id, { title: "Log Cabin Sunrise" });
    await sendEntryReceivedMail([a.id, b.id]);
    const mail = await waitForMail(env.MAIL_WEB_URL, { to: entrant.email, subjectIncludes: "received", timeoutMs: 10_000 });
    expect(mail.to).toEqual([entrant.email]);
    expect(mail.subject).toBe(`Entries received: ${show.name}`);
    for (const part of [mail.text, mail.html]) {
      expect(part).toContain(`Entry ${b.entryNumber} — Log Cabin Sunrise`);
      expect(part).toContain(`Entry ${a.entryNumber}`);
      expect(part).toContain("Pay the entry fee");
      expect(part).toContain("Drop-off:");
    }
    expect(mail.text).toContain("Rivers <b>&</b> Roads");
    expect(mail.html).toContain("Rivers &lt;b&gt;&amp;&lt;/b&gt; Roads");
    expect(mail.html).not.toContain("<b>&</b>");
    const h = await headersOf(mail.id);
    expect(h.replyTo).toBe("quilts@riverbend.example.test");
    expect(h.from?.name).toBe(`${show.name} via Ribbonry`);
  });

  it("has no Reply-To when the show set none", async () => {
    const other = await person();
    const e = await makeEntry(plainShow.id, other.id, { title: "Simple Nine Patch" });
    await sendEntryReceivedMail([e.id]);
    const mail = await waitForMail(env.MAIL_WEB_URL, { to: other.email, subjectIncludes: "Entry received", timeoutMs: 10_000 });
    expect(mail.text).toContain(`Entry ${e.entryNumber} — Simple Nine Patch`);
    expect((await headersOf(mail.id)).replyTo).toBeNull();
  });
});

describe("sendPaymentReceiptMail", () => {
  it("lists each line, the total and the entry numbers", async () => {
    const entrant = await person();
    const e = await makeEntry(show.id, entrant.id, { title: "Ocean Waves", status: "paid", paymentReference: "card pi_test_receipt" });
    const [p] = await db.insert(payments).values({ showId: show.id, entrantUserId: entrant.id, checkoutSessionId: `cs_test_receipt_${e.id}`, amountCents: 3000, currency: "usd", status: "paid", paidAt: new Date(), cardBrand: "visa", cardLast4: "4242" }).returning();
    await db.insert(paymentItems).values([
      { paymentId: p!.id, entryId: e.id, amountCents: 2000, kind: "entry", description: `Entry fee — entry ${e.entryNumber}: Ocean Waves` },
      { paymentId: p!.id, entryId: e.id, amountCents: 1000, kind: "critique", description: `Critique fee — entry ${e.entryNumber}: Ocean Waves` },
    ]);
    await sendPaymentReceiptMail(p!.id);
    const mail = await waitForMail(env.MAIL_WEB_URL, { to: entrant.email, subjectIncludes: "Payment received", timeoutMs: 10_000 });
    expect(mail.subject).toBe(`Payment received: ${show.name} ($30.00)`);
    for (const part of [mail.text, mail.html]) {
      expect(part).toContain(`Entry fee — entry ${e.entryNumber}: Ocean Waves: $20.00`);
      expect(part).toContain(`Critique fee — entry ${e.entryNumber}: Ocean Waves: $10.00`);
      expect(part).toContain("Total: $30.00"); // 2000 + 1000 = 3000 cents
      // Our receipt number and the card in words, never the provider's internal id.
      expect(part).toContain(`Receipt number: ${p!.receiptNumber}. Paid by Visa card ending 4242.`);
      expect(part).not.toContain("pi_test");
    }
    expect((await headersOf(mail.id)).replyTo).toBe("quilts@riverbend.example.test");
  });
});

describe("sendDecisionMail", () => {
  it("says which entries were accepted and which declined, with the reason", async () => {
    const entrant = await person();
    const yes = await makeEntry(show.id, entrant.id, { title: "Tumbling Blocks", status: "accepted" });
    const no = await makeEntry(show.id, entrant.id, { title: "Dresden Plate", status: "declined", decisionReason: "Photos show the quilt is unfinished <edge>." });
    const undecided = await makeEntry(show.id, entrant.id, { title: "Still Waiting", status: "paid" });
    await sendDecisionMail([yes.id, no.id, undecided.id]);
    const mail = await waitForMail(env.MAIL_WEB_URL, { to: entrant.email, subjectIncludes: "Decision", timeoutMs: 10_000 });
    expect(mail.subject).toBe(`Decision on your entries: ${show.name}`);
    for (const part of [mail.text, mail.html]) {
      expect(part).toContain(`Entry ${yes.entryNumber} — Tumbling Blocks`);
      expect(part).toContain(`Entry ${no.entryNumber} — Dresden Plate`);
      expect(part).toContain("Accepted");
      expect(part).toContain("Declined");
      expect(part).not.toContain("Still Waiting");
    }
    expect(mail.text).toContain("Reason: Photos show the quilt is unfinished <edge>.");
    expect(mail.html).toContain("Reason: Photos show the quilt is unfinished &lt;edge&gt;.");
    expect((await headersOf(mail.id)).replyTo).toBe("quilts@riverbend.example.test");
  });
});

describe("sendDropOffReminderMail", () => {
  it("gives the entry numbers, the drop-off times in the show's zone and what to bring", async () => {
    const entrant = await person();
    const a = await makeEntry(show.id, entrant.id, { title: "Flying Geese", status: "paid" });
    const b = await makeEntry(show.id, entrant.id, { title: "Bear Paw", status: "accepted" });
    const gone = await makeEntry(show.id, entrant.id, { title: "Withdrawn One", status: "withdrawn" });
    await sendDropOffReminderMail(show.id, entrant.id);
    const mail = await waitForMail(env.MAIL_WEB_URL, { to: entrant.email, subjectIncludes: "Drop-off reminder", timeoutMs: 10_000 });
    expect(mail.subject).toBe(`Drop-off reminder: ${show.name}`);
    for (const part of [mail.text, mail.html]) {
      expect(part).toContain(`Entry ${a.entryNumber} — Flying Geese`);
      expect(part).toContain(`Entry ${b.entryNumber} — Bear Paw`);
      expect(part).not.toContain(`Entry ${gone.entryNumber}`);
      // 15:00–19:00 UTC in America/Chicago (CST, UTC−6).
      expect(part).toMatch(/Thu, Mar 11, 2027, 9:00\s?AM\s?[–-]\s?1:00\s?PM CST/);
      expect(part).toContain("Test Hall, 12 Mill Road");
      // Sleeve 4 in: Hill Country Quilt Guild show instructions, hillcountryquiltguild.com; label lower right on the back and a bag per quilt: common practice.
      expect(part).toContain("4 in deep");
      expect(part).toContain("lower right corner");
      expect(part).toContain("cloth bag");
    }
    expect((await headersOf(mail.id)).replyTo).toBe("quilts@riverbend.example.test");
  });
});
