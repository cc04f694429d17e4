// The stage guard against the real database: every stage's blockers refuse (409 with the list),
// warnings and steps back need a reason kept in the audit row with the warnings overridden, and
// the judges' lists hold only judged entries (paid, or the chair's recorded exception).
import { and, asc, eq } from "drizzle-orm";
import { beforeEach, describe, expect, it } from "vitest";
import { db } from "@/db/client";
import { changeShowStatus, publishRules } from "@/db/queries/settings";
import { stageMovePreview } from "@/db/queries/stage-counts";
import { judgingQueue } from "@/db/queries/judging";
import { auditLog, judgeSheets, judgingPanels, panelCategories, panelMembers, shows } from "@/db/schema";
import { changeStatusAction } from "@/app/(chair)/shows/[slug]/manage/settings/actions";
import { judgeAnywayAction } from "@/app/(chair)/shows/[slug]/manage/judging/actions";
import { getViewer, type Viewer } from "@/lib/session";
import { actAs } from "../../helpers/request-context";
import { grantRole, makeCategory, makeEntry, makeShow, makeUser, type TestUser } from "../../helpers/factories";

type Show = Awaited<ReturnType<typeof makeShow>>;
let show: Show;
let chair: TestUser;
let judge: TestUser;
let entrant: TestUser;

const viewerOf = async (u: TestUser): Promise<Viewer> => (await getViewer(new Headers({ cookie: u.cookie })))!;
const statusOf = async () => (await db.select({ status: shows.status }).from(shows).where(eq(shows.id, show.id)))[0]!.status;
const audits = () =>
  db.select({ before: auditLog.before, after: auditLog.after }).from(auditLog).where(and(eq(auditLog.showId, show.id), eq(auditLog.action, "show.status_changed"))).orderBy(asc(auditLog.id));

async function seatJudge(categoryId: string) {
  const [panel] = await db.insert(judgingPanels).values({ showId: show.id, name: "Panel A" }).returning({ id: judgingPanels.id });
  await db.insert(panelMembers).values({ panelId: panel!.id, userId: judge.id, role: "judge" });
  await db.insert(panelCategories).values({ panelId: panel!.id, categoryId });
}

beforeEach(async () => {
  show = await makeShow({ status: "entries_open" });
  chair = await makeUser();
  judge = await makeUser();
  entrant = await makeUser();
  await grantRole(chair.id, show.id, "chair");
  await grantRole(judge.id, show.id, "judge");
  await publishRules(await viewerOf(chair), show.slug, { rulesText: "Rules good enough to open with.", releaseText: "A release good enough to open with." });
  actAs(chair.cookie);
});

describe("closing entries", () => {
  it("early, with drafts and unpaid entries: refused without a reason, then recorded with it", async () => {
    await makeEntry(show.id, entrant.id, { status: "draft", entryNumber: null });
    await makeEntry(show.id, entrant.id, { status: "submitted" });
    const preview = await stageMovePreview(await viewerOf(chair), show.slug, "entries_closed");
    expect(preview.blockers).toEqual([]);
    expect(preview.warnings).toEqual([expect.stringMatching(/closing date is still 30 days away/), "1 draft was never sent; it can't be sent after closing.", "1 entry is not paid yet."]);
    expect(preview.needsReason).toBe(true);

    const refused = await changeStatusAction(null, { showSlug: show.slug, status: "entries_closed" });
    expect(refused).toMatchObject({ ok: false, status: 409, message: "Say why you are going ahead despite the open items." });
    expect(await statusOf()).toBe("entries_open");
    expect(await audits()).toHaveLength(0);

    expect(await changeStatusAction(null, { showSlug: show.slug, status: "entries_closed", reason: "The hall is booked early this year." })).toMatchObject({ ok: true });
    expect(await statusOf()).toBe("entries_closed");
    expect((await audits()).map((a) => a.after)).toEqual([
      { status: "entries_closed", stepBack: false, reason: "The hall is booked early this year.", warningsOverridden: preview.warnings },
    ]);
  });
});

describe("stepping back", () => {
  it("reopens entries only with a reason, and names the closing date when it has passed", async () => {
    await db.update(shows).set({ status: "entries_closed" }).where(eq(shows.id, show.id));
    expect(await changeStatusAction(null, { showSlug: show.slug, status: "entries_open" })).toMatchObject({ ok: false, status: 409, message: "Going back a stage needs a reason." });
    expect(await changeStatusAction(null, { showSlug: show.slug, status: "entries_open", reason: "Closed by mistake." })).toMatchObject({ ok: true });
    expect((await audits()).map((a) => a.after)).toEqual([{ status: "entries_open", stepBack: true, reason: "Closed by mistake." }]);

    await db.update(shows).set({ status: "entries_closed", entryClosesAt: new Date(Date.now() - 86_400_000) }).where(eq(shows.id, show.id));
    await expect(changeShowStatus(await viewerOf(chair), show.slug, { status: "entries_open", reason: "Again." })).rejects.toMatchObject({
      status: 409,
      fieldErrors: { status: ["The closing date for entries has passed; move it later first (Dates)."] },
    });
  });

  it("goes back from judging while no sheet is submitted, never after", async () => {
    const category = await makeCategory(show.id);
    const entry = await makeEntry(show.id, entrant.id, { status: "paid", paidAt: new Date(), categoryId: category.id, categoryState: "decided" });
    await seatJudge(category.id);
    await db.update(shows).set({ status: "judging" }).where(eq(shows.id, show.id));
    expect(await changeStatusAction(null, { showSlug: show.slug, status: "entries_closed" })).toMatchObject({ ok: false, status: 409, message: "Going back a stage needs a reason." });
    expect(await changeStatusAction(null, { showSlug: show.slug, status: "entries_closed", reason: "The judges' day moved." })).toMatchObject({ ok: true });
    await db.update(shows).set({ status: "judging" }).where(eq(shows.id, show.id));
    await db.insert(judgeSheets).values({ showId: show.id, entryId: entry.id, judgeUserId: judge.id, status: "submitted", state: { status: "submitted", version: 2, fields: {}, conflicts: [] } as never });
    expect(await changeStatusAction(null, { showSlug: show.slug, status: "entries_closed", reason: "Again." })).toMatchObject({
      ok: false,
      status: 409,
      message: "1 sheet is already submitted; judging can't go back once a judge has submitted a sheet.",
    });
    expect(await statusOf()).toBe("judging");
  });
});

describe("starting judging", () => {
  it("is refused with the list when nothing could be judged, and warns about unpaid entries", async () => {
    const category = await makeCategory(show.id);
    await makeEntry(show.id, entrant.id, { status: "submitted", categoryId: category.id, categoryState: "decided" });
    await db.update(shows).set({ status: "entries_closed" }).where(eq(shows.id, show.id));
    const refused = await changeStatusAction(null, { showSlug: show.slug, status: "judging", reason: "Go." });
    expect(refused).toMatchObject({ ok: false, status: 409 });
    expect(refused.ok === false && refused.fieldErrors?.status).toEqual(["No entry would be judged: none is paid (or accepted) and none has your recorded exception."]);

    await makeEntry(show.id, entrant.id, { status: "paid", paidAt: new Date(), categoryId: category.id, categoryState: "decided" });
    const preview = await stageMovePreview(await viewerOf(chair), show.slug, "judging");
    expect(preview.blockers).toEqual([]);
    expect(preview.effects[0]).toBe("1 entry reaches the judges' lists.");
    expect(preview.warnings).toContain("1 entry is not paid and will not be judged unless you record an exception (Judging set-up).");
    expect(preview.warnings).toContain(`No panel judges ${category.code} ${category.name}; its entries will not be judged.`);
  });

  it("display-only categories need no panel", async () => {
    const shown = await makeCategory(show.id, { name: "Display only", conditions: [{ kind: "judged", value: false }] });
    await makeEntry(show.id, entrant.id, { status: "paid", paidAt: new Date(), judged: false, categoryId: shown.id, categoryState: "decided" });
    const judged = await makeCategory(show.id);
    await makeEntry(show.id, entrant.id, { status: "paid", paidAt: new Date(), categoryId: judged.id, categoryState: "decided" });
    await seatJudge(judged.id);
    await db.update(shows).set({ status: "entries_closed" }).where(eq(shows.id, show.id));
    const preview = await stageMovePreview(await viewerOf(chair), show.slug, "judging");
    expect(preview.warnings).toEqual([]);
    expect(await changeStatusAction(null, { showSlug: show.slug, status: "judging" })).toMatchObject({ ok: true });
  });
});

describe("who is judged", () => {
  it("an unpaid entry is not on the judge's list until the chair records an exception", async () => {
    const category = await makeCategory(show.id);
    const paid = await makeEntry(show.id, entrant.id, { status: "paid", paidAt: new Date(), categoryId: category.id, categoryState: "decided" });
    const unpaid = await makeEntry(show.id, entrant.id, { status: "submitted", categoryId: category.id, categoryState: "decided" });
    await seatJudge(category.id);
    await db.update(shows).set({ status: "judging" }).where(eq(shows.id, show.id));
    const listed = async () => (await judgingQueue(await viewerOf(judge), show.slug)).entries.map((e) => e.entryNumber).sort((a, b) => a - b);
    expect(await listed()).toEqual([paid.entryNumber]);

    actAs(chair.cookie);
    expect(await judgeAnywayAction(null, { showSlug: show.slug, entryId: unpaid.id, judge: true, reason: "" })).toMatchObject({ ok: false, status: 400 });
    expect(await judgeAnywayAction(null, { showSlug: show.slug, entryId: unpaid.id, judge: true, reason: "Paid in cash at the meeting." })).toMatchObject({ ok: true });
    expect(await listed()).toEqual([paid.entryNumber, unpaid.entryNumber]);
    const [row] = await db.select({ after: auditLog.after }).from(auditLog).where(and(eq(auditLog.subjectId, unpaid.id), eq(auditLog.action, "entry.judge_anyway")));
    expect(row?.after).toEqual({ judgeAnyway: true, reason: "Paid in cash at the meeting." });
  });
});
