// The chair's bulk actions: accept, decline with a reason, mark paid offline. Each writes the
// entries and one audit row per entry in one transaction; juried shows mail only on release.
import { randomUUID } from "node:crypto";
import { and, asc, eq, inArray } from "drizzle-orm";
import { beforeAll, describe, expect, it } from "vitest";
import { db } from "@/db/client";
import { entryDetailForChair, juryRound } from "@/db/queries/chair-entries";
import { getViewer } from "@/lib/session";
import { auditLog, entries, showSettings, user } from "@/db/schema";
import { env } from "@/lib/env";
import {
  acceptEntriesAction,
  declineEntriesAction,
  markPaidOfflineAction,
  releaseDecisionsAction,
} from "@/app/(chair)/shows/[slug]/manage/entries/actions";
import { grantRole, makeEntry, makeShow, makeUser, unique, type TestUser } from "../../helpers/factories";
import { listMail, waitForMail } from "../../helpers/mailbox";
import { actAs } from "../../helpers/request-context";

type Result = { ok: boolean; status?: number; message?: string; fieldErrors?: Record<string, string[]> };

let chair: TestUser;
let judge: TestUser;

async function entrant(name: string) {
  const id = randomUUID();
  const email = `${unique("entrant")}@example.test`;
  await db.insert(user).values({ id, name, email, emailVerified: true });
  return { id, email, name };
}

async function showWithChair(juried: boolean) {
  const show = await makeShow();
  await grantRole(chair.id, show.id, "chair");
  await grantRole(judge.id, show.id, "judge");
  await db.insert(showSettings).values({ showId: show.id, juried });
  return show;
}

const rowsOf = (ids: string[]) =>
  db
    .select({ id: entries.id, status: entries.status, decisionReason: entries.decisionReason, decisionReleasedAt: entries.decisionReleasedAt, paidAt: entries.paidAt, paymentReference: entries.paymentReference })
    .from(entries)
    .where(inArray(entries.id, ids))
    .orderBy(asc(entries.entryNumber));

const auditOf = (ids: string[], action?: string) =>
  db
    .select({ subjectId: auditLog.subjectId, action: auditLog.action, actor: auditLog.actorUserId, before: auditLog.before, after: auditLog.after })
    .from(auditLog)
    .where(and(eq(auditLog.subjectType, "entry"), inArray(auditLog.subjectId, ids), action ? eq(auditLog.action, action) : undefined));

const mailsTo = async (email: string) => (await listMail(env.MAIL_WEB_URL)).filter((m) => m.to.includes(email.toLowerCase()));

beforeAll(async () => {
  [chair, judge] = await Promise.all([makeUser({ name: "Chair" }), makeUser({ name: "Judge" })]);
});

describe("bulk actions at a show that is not juried", () => {
  it("accepts the chosen entries, audits each one and mails the entrant", async () => {
    const show = await showWithChair(false);
    const pat = await entrant("Pat Invented");
    const a = await makeEntry(show.id, pat.id, { status: "paid", title: "Cedar Steps" });
    const b = await makeEntry(show.id, pat.id, { status: "submitted", title: "Salt Marsh" });
    const untouched = await makeEntry(show.id, pat.id, { status: "paid" });
    actAs(chair.cookie);
    const r = (await acceptEntriesAction({ showSlug: show.slug, entryIds: [a.id, b.id] })) as Result;
    expect(r).toMatchObject({ ok: true, message: "2 entries accepted. The entrants have been e-mailed." });

    const rows = await rowsOf([a.id, b.id, untouched.id]);
    expect(rows.map((x) => x.status)).toEqual(["accepted", "accepted", "paid"]);
    expect(rows[0]!.decisionReleasedAt).toBeInstanceOf(Date);
    const audit = await auditOf([a.id, b.id, untouched.id]);
    expect(audit).toHaveLength(2);
    expect(audit.find((x) => x.subjectId === a.id)).toMatchObject({ action: "entry.accepted", actor: chair.id, before: { status: "paid" }, after: { status: "accepted" } });
    expect(audit.find((x) => x.subjectId === b.id)).toMatchObject({ before: { status: "submitted" }, after: { status: "accepted" } });

    const viewer = (await getViewer(new Headers({ cookie: chair.cookie })))!;
    const detail = await entryDetailForChair(viewer, show.slug, a.id);
    expect(detail.history.map((h) => [h.action, h.actorName, h.before?.status, h.after?.status])).toEqual([["entry.accepted", "Chair", "paid", "accepted"]]);

    const mail = await waitForMail(env.MAIL_WEB_URL, { to: pat.email, subjectIncludes: "Decision on your entries" });
    expect(mail.text).toContain("Cedar Steps");
    expect(mail.text).toContain("Salt Marsh");
    expect(await mailsTo(pat.email)).toHaveLength(1);
  });

  it("declines with the reason kept on the entry and in the audit row", async () => {
    const show = await showWithChair(false);
    const sam = await entrant("Sam Invented");
    const e = await makeEntry(show.id, sam.id, { status: "paid", title: "Rust Belt" });
    actAs(chair.cookie);
    const r = (await declineEntriesAction({ showSlug: show.slug, entryIds: [e.id], reason: "  Larger than the 90 in limit  " })) as Result;
    expect(r.ok).toBe(true);
    const [row] = await rowsOf([e.id]);
    expect(row).toMatchObject({ status: "declined", decisionReason: "Larger than the 90 in limit" });
    const [audit] = await auditOf([e.id]);
    expect(audit).toMatchObject({ action: "entry.declined", before: { status: "paid", decisionReason: "" }, after: { status: "declined", decisionReason: "Larger than the 90 in limit" } });
    const mail = await waitForMail(env.MAIL_WEB_URL, { to: sam.email, subjectIncludes: "Decision on your entry" });
    expect(mail.text).toContain("Larger than the 90 in limit");
  });

  it("refuses a decline without a reason, naming the field, and changes nothing", async () => {
    const show = await showWithChair(false);
    const kim = await entrant("Kim Invented");
    const e = await makeEntry(show.id, kim.id, { status: "paid" });
    actAs(chair.cookie);
    for (const reason of [undefined, "", "   "]) {
      const r = (await declineEntriesAction({ showSlug: show.slug, entryIds: [e.id], reason })) as Result;
      expect(r.ok).toBe(false);
      expect(r.status).toBe(400);
      expect(Object.keys(r.fieldErrors ?? {})).toEqual(["reason"]);
    }
    expect((await rowsOf([e.id]))[0]!.status).toBe("paid");
    expect(await auditOf([e.id])).toEqual([]);
    expect(await mailsTo(kim.email)).toEqual([]);
  });

  it("marks entries paid offline with the reference; a missing reference changes nothing", async () => {
    const show = await showWithChair(false);
    const lee = await entrant("Lee Invented");
    const a = await makeEntry(show.id, lee.id, { status: "submitted" });
    const b = await makeEntry(show.id, lee.id, { status: "accepted" });
    actAs(chair.cookie);
    const missing = (await markPaidOfflineAction({ showSlug: show.slug, entryIds: [a.id, b.id], reference: " " })) as Result;
    expect(missing).toMatchObject({ ok: false, status: 400 });
    expect(Object.keys(missing.fieldErrors ?? {})).toEqual(["reference"]);
    expect((await rowsOf([a.id, b.id])).map((x) => x.paidAt)).toEqual([null, null]);

    const r = (await markPaidOfflineAction({ showSlug: show.slug, entryIds: [a.id, b.id], reference: "cheque 1042" })) as Result;
    expect(r).toMatchObject({ ok: true, message: "2 entries marked paid (cheque 1042)." });
    const rows = await rowsOf([a.id, b.id]);
    // A submitted entry becomes paid; an accepted one stays accepted, now with its fee recorded.
    expect(rows.map((x) => x.status)).toEqual(["paid", "accepted"]);
    expect(rows.map((x) => x.paymentReference)).toEqual(["cheque 1042", "cheque 1042"]);
    expect(rows.every((x) => x.paidAt instanceof Date)).toBe(true);
    const audit = await auditOf([a.id, b.id], "entry.paid_offline");
    expect(audit).toHaveLength(2);
    expect(audit.find((x) => x.subjectId === a.id)).toMatchObject({ before: { status: "submitted", paidAt: null }, after: { status: "paid", paymentReference: "cheque 1042" } });

    const again = (await markPaidOfflineAction({ showSlug: show.slug, entryIds: [a.id], reference: "cash" })) as Result;
    expect(again).toMatchObject({ ok: false, status: 409 });
    expect((await rowsOf([a.id]))[0]!.paymentReference).toBe("cheque 1042");
  });

  it("changes nothing when one chosen entry is from another show or past the decision", async () => {
    const show = await showWithChair(false);
    const other = await makeShow();
    const ana = await entrant("Ana Invented");
    const ok = await makeEntry(show.id, ana.id, { status: "paid" });
    const elsewhere = await makeEntry(other.id, ana.id, { status: "paid" });
    const hung = await makeEntry(show.id, ana.id, { status: "hung" });
    actAs(chair.cookie);
    expect(await acceptEntriesAction({ showSlug: show.slug, entryIds: [ok.id, elsewhere.id] })).toMatchObject({ ok: false, status: 404 });
    expect(await acceptEntriesAction({ showSlug: show.slug, entryIds: [ok.id, hung.id] })).toMatchObject({ ok: false, status: 409 });
    expect((await rowsOf([ok.id, elsewhere.id, hung.id])).map((x) => x.status).sort()).toEqual(["hung", "paid", "paid"]);
    expect(await auditOf([ok.id, elsewhere.id, hung.id])).toEqual([]);
  });

  it("refuses a judge and the chair of another show", async () => {
    const show = await showWithChair(false);
    const ana = await entrant("Ana Invented");
    const e = await makeEntry(show.id, ana.id, { status: "paid" });
    actAs(judge.cookie);
    expect(await acceptEntriesAction({ showSlug: show.slug, entryIds: [e.id] })).toMatchObject({ ok: false, status: 403 });
    const otherChair = await makeUser();
    await grantRole(otherChair.id, (await makeShow()).id, "chair");
    actAs(otherChair.cookie);
    expect(await markPaidOfflineAction({ showSlug: show.slug, entryIds: [e.id], reference: "cash" })).toMatchObject({ ok: false, status: 403 });
    expect((await rowsOf([e.id]))[0]!.status).toBe("paid");
  });
});

describe("a decision that changes nothing", () => {
  it("20 accepts of one entry at once: one change, one audit row, exactly one mail", async () => {
    const show = await showWithChair(false);
    const ivy = await entrant("Ivy Invented");
    const e = await makeEntry(show.id, ivy.id, { status: "paid", title: "Twenty Clicks" });
    actAs(chair.cookie);
    const results = (await Promise.all(Array.from({ length: 20 }, () => acceptEntriesAction({ showSlug: show.slug, entryIds: [e.id] })))) as Result[];
    expect(results.every((r) => r.ok)).toBe(true);
    expect(results.filter((r) => r.message === "1 entry accepted. The entrants have been e-mailed.")).toHaveLength(1);
    expect(results.filter((r) => r.message === "1 entry was already accepted; nothing changed for it.")).toHaveLength(19);
    expect(await auditOf([e.id], "entry.accepted")).toHaveLength(1);

    await waitForMail(env.MAIL_WEB_URL, { to: ivy.email, subjectIncludes: "Decision on your entry" });
    await new Promise((r) => setTimeout(r, 500)); // a late duplicate would have arrived by now
    expect(await mailsTo(ivy.email)).toHaveLength(1);
  });

  it("accepting an accepted entry keeps its release time; only the entries that change are mailed", async () => {
    const show = await showWithChair(false);
    const rue = await entrant("Rue Invented");
    const released = new Date("2026-04-01T12:00:00Z");
    const done = await makeEntry(show.id, rue.id, { status: "accepted", decisionReleasedAt: released, title: "Already In" });
    const fresh = await makeEntry(show.id, rue.id, { status: "paid", title: "Newly In" });
    actAs(chair.cookie);
    const r = (await acceptEntriesAction({ showSlug: show.slug, entryIds: [done.id, fresh.id] })) as Result;
    expect(r).toMatchObject({ ok: true, message: "1 entry accepted. 1 entry was already accepted; nothing changed for it. The entrants have been e-mailed." });
    expect((await rowsOf([done.id]))[0]!.decisionReleasedAt).toEqual(released);
    expect(await auditOf([done.id])).toEqual([]);
    const mail = await waitForMail(env.MAIL_WEB_URL, { to: rue.email, subjectIncludes: "Decision on your entry" });
    expect(mail.text).toContain("Newly In");
    expect(mail.text).not.toContain("Already In");
  });
});

describe("a juried show", () => {
  it("records decisions without mail, then releases them in one mail per entrant", async () => {
    const show = await showWithChair(true);
    const [jo, max, nell] = await Promise.all([entrant("Jo Invented"), entrant("Max Invented"), entrant("Nell Invented")]);
    const jo1 = await makeEntry(show.id, jo.id, { status: "paid", title: "North Window" });
    const jo2 = await makeEntry(show.id, jo.id, { status: "paid", title: "South Window" });
    const max1 = await makeEntry(show.id, max.id, { status: "paid", title: "Kettle Pond" });
    const nell1 = await makeEntry(show.id, nell.id, { status: "paid", title: "Undecided" });
    actAs(chair.cookie);
    expect(await acceptEntriesAction({ showSlug: show.slug, entryIds: [jo1.id, max1.id] })).toMatchObject({
      ok: true,
      message: "2 entries accepted. Entrants hear when you release decisions.",
    });
    expect((await declineEntriesAction({ showSlug: show.slug, entryIds: [jo2.id], reason: "Binding not finished" })).ok).toBe(true);
    const decided = await rowsOf([jo1.id, jo2.id, max1.id]);
    expect(decided.map((x) => [x.status, x.decisionReleasedAt])).toEqual([
      ["accepted", null],
      ["declined", null],
      ["accepted", null],
    ]);
    await new Promise((r) => setTimeout(r, 500));
    expect(await mailsTo(jo.email)).toEqual([]);
    expect(await mailsTo(max.email)).toEqual([]);

    // The round is blind: nothing in it names the entrant, maker, quilter or guild.
    const viewer = (await getViewer(new Headers({ cookie: chair.cookie })))!;
    const round = await juryRound(viewer, show.slug);
    expect(round.progress).toEqual({ total: 4, decided: 3, unreleased: 3 });
    const text = JSON.stringify(round.entries);
    for (const who of [jo, max, nell]) {
      expect(text).not.toContain(who.name);
      expect(text).not.toContain(who.email);
    }
    expect(text).not.toContain("Test Maker");
    expect(Object.keys(round.entries[0]!).sort()).toEqual(
      ["decisionReason", "decisionReleasedAt", "division", "entryNumber", "id", "judged", "lengthUm", "photos", "quiltingMethod", "status", "techniques", "title", "widthUm"].sort(),
    );

    const r = (await releaseDecisionsAction({ showSlug: show.slug })) as Result;
    expect(r).toMatchObject({ ok: true, message: "3 decisions released. The entrants have been e-mailed." });
    const released = await rowsOf([jo1.id, jo2.id, max1.id, nell1.id]);
    expect(released.slice(0, 3).every((x) => x.decisionReleasedAt instanceof Date)).toBe(true);
    expect(released[3]).toMatchObject({ status: "paid", decisionReleasedAt: null });
    const audit = await auditOf([jo1.id, jo2.id, max1.id, nell1.id], "entry.decision_released");
    expect(audit.map((x) => x.subjectId).sort()).toEqual([jo1.id, jo2.id, max1.id].sort());

    const joMail = await waitForMail(env.MAIL_WEB_URL, { to: jo.email, subjectIncludes: "Decision on your entries" });
    expect(joMail.text).toContain("North Window");
    expect(joMail.text).toContain("Binding not finished");
    await waitForMail(env.MAIL_WEB_URL, { to: max.email, subjectIncludes: "Decision on your entry" });
    expect(await mailsTo(jo.email)).toHaveLength(1);
    expect(await mailsTo(max.email)).toHaveLength(1);
    expect(await mailsTo(nell.email)).toEqual([]);

    // Releasing again finds nothing new and sends nothing.
    expect(await releaseDecisionsAction({ showSlug: show.slug })).toMatchObject({ ok: true, message: "There are no new decisions to release." });
    expect(await mailsTo(jo.email)).toHaveLength(1);
  });

  it("refuses to release at a show that is not juried", async () => {
    const show = await showWithChair(false);
    actAs(chair.cookie);
    expect(await releaseDecisionsAction({ showSlug: show.slug })).toMatchObject({ ok: false, status: 409 });
  });
});
