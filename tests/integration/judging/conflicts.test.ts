// Judges' conflicts with entries, looked for again whenever something changes: a declaration
// (recorded without telling the judge), an entrant's submission (which goes through), a category
// move; a blocker before judging starts; refused in the sync route; the chair's decision, audited.
import { randomUUID } from "node:crypto";
import { and, eq } from "drizzle-orm";
import { beforeEach, describe, expect, it } from "vitest";
import { db } from "@/db/client";
import { auditLog, judgeConflictRecords, judgeSheets, judgingPanels, panelCategories, panelMembers, shows } from "@/db/schema";
import { judgingBlockers } from "@/db/queries/categories";
import { overrideEntryCategory } from "@/db/queries/category-queue";
import { addDeclaration, judgingSetup } from "@/db/queries/judging-setup";
import { resolveConflict } from "@/db/queries/judge-conflicts";
import { changeShowStatus } from "@/db/queries/settings";
import { addDeclarationAction, resolveConflictAction } from "@/app/(chair)/shows/[slug]/manage/judging/actions";
import { submitEntryAction } from "@/app/(entrant)/entries/[id]/actions";
import { POST as syncRoute } from "@/app/api/shows/[slug]/judging/sync/route";
import { actAs } from "../../helpers/request-context";
import { grantRole, makeCategory, makeEntry, makeShow, makeUser, type TestUser } from "../../helpers/factories";
import { completeDraft, viewerOf } from "../entries/helpers";

let show: Awaited<ReturnType<typeof makeShow>>;
let chair: TestUser, judge: TestUser, judge2: TestUser, ada: TestUser;
let pieced: Awaited<ReturnType<typeof makeCategory>>, applique: Awaited<ReturnType<typeof makeCategory>>;
let panelId: string;

beforeEach(async () => {
  show = await makeShow({ status: "entries_open" });
  [chair, judge, judge2, ada] = await Promise.all([makeUser({ name: "Chair Person" }), makeUser({ name: "Judge Juniper" }), makeUser({ name: "Judge Rowan" }), makeUser({ name: "Ada Entrantly" })]);
  await grantRole(chair.id, show.id, "chair");
  for (const u of [judge, judge2]) await grantRole(u.id, show.id, "judge");
  // Every judged quilt falls in Pieced by the rules; Appliqué takes only what the chair puts there.
  pieced = await makeCategory(show.id, { code: "10", name: "Pieced", precedence: 10 });
  applique = await makeCategory(show.id, { code: "20", name: "Appliqué", precedence: 20, conditions: [{ kind: "judged", value: false }] });
  const [panel] = await db.insert(judgingPanels).values({ showId: show.id, name: "Panel A" }).returning();
  panelId = panel!.id;
  await db.insert(panelMembers).values([
    { panelId, userId: judge.id, role: "judge" },
    { panelId, userId: judge2.id, role: "judge" },
  ]);
  await db.insert(panelCategories).values({ panelId, categoryId: pieced.id });
});

const recordsOf = (judgeId: string) => db.select().from(judgeConflictRecords).where(and(eq(judgeConflictRecords.showId, show.id), eq(judgeConflictRecords.judgeUserId, judgeId)));
const openOf = async () => (await judgingSetup(await viewerOf(chair), show.slug)).conflicts.open;

describe("declarations", () => {
  it("answer a judge the same whether or not the person has an entry; the chair sees the match", async () => {
    await makeEntry(show.id, ada.id, { categoryId: pieced.id, categoryState: "decided", paidAt: new Date() });
    actAs(judge.cookie);
    const match = await addDeclarationAction(null, { showSlug: show.slug, personName: "", personEmail: ada.email, relation: "student" });
    const none = await addDeclarationAction(null, { showSlug: show.slug, personName: "", personEmail: `${randomUUID().slice(0, 8)}@example.test`, relation: "student" });
    expect(match).toEqual(none);
    expect(match).toEqual({ ok: true, message: "Declaration recorded." });
    const open = await openOf();
    expect(open.map((c) => c.reason)).toEqual([`Judge Juniper declared ${ada.email} (student), who has an entry in 10 Pieced.`]);
    expect((await recordsOf(judge.id)).map((r) => r.foundWhen)).toEqual(["declaration"]);
  });

  it("are recorded only by the chair once judging has started, whatever the person", async () => {
    await db.update(shows).set({ status: "judging" }).where(eq(shows.id, show.id));
    for (const personEmail of [ada.email, "nobody@example.test"]) {
      await expect(addDeclaration(await viewerOf(judge), show.slug, { personName: "", personEmail, relation: "client" })).rejects.toMatchObject({ status: 409, message: "Judging has started at this show; tell the chair, who records declarations from now on." });
    }
    await addDeclaration(await viewerOf(chair), show.slug, { judgeUserId: judge.id, personName: "", personEmail: ada.email, relation: "client" });
  });
});

describe("an entry sent into a category its entrant judges", () => {
  it("goes through for the entrant, is kept for the chair, and blocks the start of judging", async () => {
    const entryId = await completeDraft(judge, show.slug);
    actAs(judge.cookie);
    const sent = await submitEntryAction(null, { entryId, acceptRules: true, rulesVersionId: "" });
    expect(sent).toMatchObject({ ok: true });
    const [record] = await recordsOf(judge.id);
    expect(record).toMatchObject({ entryId, foundWhen: "submission", decision: null, reason: "Judge Juniper has an entry in 10 Pieced, so can't judge it." });
    const audit = await db.select().from(auditLog).where(and(eq(auditLog.subjectId, record!.id), eq(auditLog.action, "judge.conflict_found")));
    expect(audit).toHaveLength(1);

    const blockers = await judgingBlockers(db, show.id);
    expect(blockers.some((b) => b.includes("1 judge conflict is open: Judge Juniper and entry"))).toBe(true);
    await db.update(shows).set({ status: "entries_closed" }).where(eq(shows.id, show.id));
    await expect(changeShowStatus(await viewerOf(chair), show.slug, { status: "judging" })).rejects.toMatchObject({ status: 409, message: expect.stringContaining("judge conflict is open") });

    // The chair allows it, with a reason: the blocker goes, the decision is audited.
    actAs(chair.cookie);
    expect(await resolveConflictAction(null, { showSlug: show.slug, judgeUserId: judge.id, entryId, action: "allow", reason: "" })).toMatchObject({ ok: false, status: 400, fieldErrors: { reason: ["Say why this judge may judge the entry (it goes in the audit log)."] } });
    expect(await resolveConflictAction(null, { showSlug: show.slug, judgeUserId: judge.id, entryId, action: "allow", reason: "Display of the judge's own work, scored by the panel's other judge too" })).toMatchObject({ ok: true });
    expect(await judgingBlockers(db, show.id)).toEqual([]);
    const decided = await db.select().from(auditLog).where(and(eq(auditLog.subjectId, record!.id), eq(auditLog.action, "judge.conflict_allowed")));
    expect(decided).toHaveLength(1);
  });
});

describe("a category move", () => {
  it("into a category the entrant's declared judge judges is kept for the chair; moving the judge off the panel resolves it", async () => {
    await addDeclaration(await viewerOf(chair), show.slug, { judgeUserId: judge.id, personName: "Maker Marigold", personEmail: "", relation: "household" });
    const entry = await makeEntry(show.id, ada.id, { categoryId: applique.id, categoryState: "decided", paidAt: new Date(), madeBy: ["Maker Marigold"] });
    expect(await recordsOf(judge.id)).toEqual([]);
    await overrideEntryCategory(await viewerOf(chair), show.slug, { entryId: entry.id, categoryId: pieced.id, reason: "It is pieced after all" });
    expect((await recordsOf(judge.id)).map((r) => [r.entryId, r.foundWhen])).toEqual([[entry.id, "category_move"]]);
    expect((await openOf()).map((c) => c.judgeUserId)).toEqual([judge.id]);

    await resolveConflict(await viewerOf(chair), show.slug, { judgeUserId: judge.id, entryId: entry.id, action: "move", reason: "" });
    const left = await db.select().from(panelMembers).where(eq(panelMembers.panelId, panelId));
    expect(left.map((m) => m.userId)).toEqual([judge2.id]);
    expect(await openOf()).toEqual([]);
    const [record] = await recordsOf(judge.id);
    expect(record).toMatchObject({ decision: "moved", decidedBy: chair.id });
    // Judge Rowan is now the panel's only judge: taking them off too is refused with the way out.
    await makeEntry(show.id, judge2.id, { categoryId: pieced.id, categoryState: "decided", paidAt: new Date() });
    const [own] = (await openOf()).filter((c) => c.judgeUserId === judge2.id);
    await expect(resolveConflict(await viewerOf(chair), show.slug, { judgeUserId: judge2.id, entryId: own!.entryId, action: "move", reason: "" })).rejects.toMatchObject({ status: 409, message: "Judge Rowan is the only judge on Panel A; add another judge to that panel first (Panels), or allow the conflict with a reason." });
  });

  it("only the chair decides conflicts", async () => {
    const entry = await makeEntry(show.id, judge.id, { categoryId: pieced.id, categoryState: "decided", paidAt: new Date() });
    await expect(resolveConflict(await viewerOf(judge), show.slug, { judgeUserId: judge.id, entryId: entry.id, action: "allow", reason: "mine is fine" })).rejects.toMatchObject({ status: 403 });
  });
});

describe("the sync route", () => {
  it("refuses a conflicted judge's marks on that entry with 403 naming it, applies nothing, and takes them once the chair allows", async () => {
    await db.update(shows).set({ status: "judging" }).where(eq(shows.id, show.id));
    const own = await makeEntry(show.id, judge.id, { categoryId: pieced.id, categoryState: "decided", paidAt: new Date(), status: "received" });
    const other = await makeEntry(show.id, ada.id, { categoryId: pieced.id, categoryState: "decided", paidAt: new Date(), status: "received" });
    const change = (entryId: string, seq: number) => ({ kind: "set", key: `k-${randomUUID()}`, entryId, seq, field: "discuss", value: true, baseVersion: 0 });
    const post = async (changes: unknown[]) => {
      const res = await syncRoute(new Request(`http://t/api/shows/${show.slug}/judging/sync`, { method: "POST", headers: { cookie: judge.cookie, "content-type": "application/json" }, body: JSON.stringify({ deviceId: "tab-juniper-0001", forJudge: judge.id, changes }) }), { params: Promise.resolve({ slug: show.slug }) });
      return { status: res.status, body: (await res.json()) as { message?: string; fieldErrors?: Record<string, string[]>; results?: { outcome: { kind: string } }[] } };
    };
    const refused = await post([change(own.id, 1), change(other.id, 2)]);
    expect(refused.status).toBe(403);
    expect(Object.keys(refused.body.fieldErrors ?? {})).toEqual([own.id]);
    expect(refused.body.message).toBe(`The chair has a possible conflict of interest on record for Judge Juniper and entry ${own.entryNumber}, so no marks can be taken for it until the chair decides.`);
    expect(await db.select().from(judgeSheets).where(eq(judgeSheets.showId, show.id))).toEqual([]);

    await resolveConflict(await viewerOf(chair), show.slug, { judgeUserId: judge.id, entryId: own.id, action: "allow", reason: "Judged by both judges; the chair has checked" });
    const taken = await post([change(own.id, 3), change(other.id, 4)]);
    expect(taken.status).toBe(200);
    expect(taken.body.results!.map((r) => r.outcome.kind)).toEqual(["applied", "applied"]);
  });
});
