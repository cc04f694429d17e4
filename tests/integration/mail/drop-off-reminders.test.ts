// The chair's "send drop-off reminders": one mail per entrant with quilts expected at drop-off
// (paid ones at an open show), none to entrants with only drafts, and an audit row.
import { and, eq } from "drizzle-orm";
import { describe, expect, it } from "vitest";
import { sendDropOffRemindersAction } from "@/app/(chair)/shows/[slug]/manage/actions";
import { db } from "@/db/client";
import { auditLog } from "@/db/schema";
import { env } from "@/lib/env";
import { grantRole, makeEntry, makeShow, makeUser } from "../../helpers/factories";
import { listMail, waitForMail } from "../../helpers/mailbox";
import { actAs } from "../../helpers/request-context";

describe("drop-off reminders", () => {
  it("mail each entrant with paid quilts their entry numbers and what to bring", async () => {
    const show = await makeShow();
    const chair = await makeUser({ name: "Chair" });
    await grantRole(chair.id, show.id, "chair");
    const [ada, ben, cal] = await Promise.all([makeUser({ name: "Ada Pieceworth" }), makeUser({ name: "Ben Bindley" }), makeUser({ name: "Cal Draftsby" })]);
    const a1 = await makeEntry(show.id, ada!.id, { status: "paid", title: "First Light" });
    const a2 = await makeEntry(show.id, ada!.id, { status: "paid", title: "Second Wind" });
    const b1 = await makeEntry(show.id, ben!.id, { status: "paid", title: "Blue Hour" });
    await makeEntry(show.id, cal!.id, { status: "draft", entryNumber: null, title: "Not Yet" });

    actAs(chair.cookie);
    const r = await sendDropOffRemindersAction(null, { showSlug: show.slug });
    expect(r).toMatchObject({ ok: true, message: "Drop-off reminders sent to 2 entrants." });

    const adaMail = await waitForMail(env.MAIL_WEB_URL, { to: ada!.email, subjectIncludes: "Drop-off reminder", timeoutMs: 10_000 });
    expect(adaMail.text).toContain(String(a1.entryNumber));
    expect(adaMail.text).toContain(String(a2.entryNumber));
    expect(adaMail.text).toMatch(/hanging sleeve/i);
    expect(adaMail.html).toContain("Second Wind");
    const benMail = await waitForMail(env.MAIL_WEB_URL, { to: ben!.email, subjectIncludes: "Drop-off reminder", timeoutMs: 10_000 });
    expect(benMail.text).toContain(String(b1.entryNumber));
    expect(benMail.text).not.toContain(String(a1.entryNumber));
    expect((await listMail(env.MAIL_WEB_URL)).some((m) => m.to.includes(cal!.email.toLowerCase()))).toBe(false);

    const audit = await db.select({ after: auditLog.after }).from(auditLog).where(and(eq(auditLog.showId, show.id), eq(auditLog.action, "reminders.drop_off_sent")));
    expect(audit.map((a) => a.after)).toEqual([{ sent: 2, failed: 0 }]);
  });
});
