// The chair's judging set-up actions on their error paths: each answers with a status, a plain
// message and the field it concerns, and writes nothing. Called directly, as the forms call them.
import { and, eq } from "drizzle-orm";
import { beforeAll, describe, expect, it } from "vitest";
import { db } from "@/db/client";
import { categories, judgeDeclarations, judgeSheets, judgingPanels, scoreSheets } from "@/db/schema";
import {
  addDeclarationAction,
  deletePanelAction,
  removeDeclarationAction,
  reopenSheetAction,
  saveJudgingOptionsAction,
  savePanelAction,
  saveScoreSheetAction,
  setCategoryJudgingAction,
  sheetHistoryAction,
} from "@/app/(chair)/shows/[slug]/manage/judging/actions";
import { grantRole, makeCategory, makeEntry, makeShow, makeUser, type TestUser } from "../../helpers/factories";
import { actAs } from "../../helpers/request-context";

// Weights of one published guideline, totalling 100: visual impact 40, design 20, workmanship 20,
// colour 20 (Melody Crust, "Judging Guidelines").
const points = (id: string, label: string, maxPoints: number) => ({ id, label, maxPoints, scale: { kind: "points" as const }, allowNotApplicable: false });
const SHEET = { sections: [{ id: "all", title: "Whole quilt", criteria: [points("impact", "Visual impact", 40), points("design", "Design", 20), points("work", "Workmanship", 20), points("colour", "Colour", 20)] }] };

let show: Awaited<ReturnType<typeof makeShow>>;
let other: Awaited<ReturnType<typeof makeShow>>;
let chair: TestUser, judge: TestUser, judge2: TestUser, scribe: TestUser, entrant: TestUser;
let pieced: Awaited<ReturnType<typeof makeCategory>>;
let applique: Awaited<ReturnType<typeof makeCategory>>;

beforeAll(async () => {
  show = await makeShow({ status: "judging" });
  other = await makeShow();
  [chair, judge, judge2, scribe, entrant] = await Promise.all([
    makeUser({ name: "Chair Clementine" }),
    makeUser({ name: "Judge Wren" }),
    makeUser({ name: "Judge Alder" }),
    makeUser({ name: "Scribe Tansy" }),
    makeUser({ name: "Entrant Briar" }),
  ]);
  await grantRole(chair.id, show.id, "chair");
  await grantRole(chair.id, other.id, "chair");
  await grantRole(judge.id, show.id, "judge");
  await grantRole(judge2.id, show.id, "judge");
  await grantRole(scribe.id, show.id, "scribe");
  pieced = await makeCategory(show.id, { code: "10", name: "Pieced" });
  applique = await makeCategory(show.id, { code: "20", name: "Appliqué" });
  // Judge Alder has a quilt in Appliqué; Entrant Briar one in Pieced.
  await makeEntry(show.id, judge2.id, { categoryId: applique.id, categoryState: "decided", paidAt: new Date(), status: "received" });
  await makeEntry(show.id, entrant.id, { categoryId: pieced.id, categoryState: "decided", paidAt: new Date(), status: "received", madeBy: ["Entrant Briar"] });
});

const asChair = () => actAs(chair.cookie);

describe("who may call", () => {
  it("asks an anonymous caller to sign in, and refuses a judge the chair's actions (403)", async () => {
    actAs(null);
    expect(await saveScoreSheetAction(null, { showSlug: show.slug, name: "Sheet", sheet: SHEET })).toMatchObject({ ok: false, status: 401 });
    actAs(judge.cookie);
    expect(await savePanelAction(null, { showSlug: show.slug, name: "Mine", day: "", room: "", judgeIds: [judge.id] })).toMatchObject({ ok: false, status: 403 });
    expect(await sheetHistoryAction(null, { showSlug: show.slug, sheetId: crypto.randomUUID() })).toMatchObject({ ok: false, status: 403 });
  });
});

describe("score sheets", () => {
  it("names the field when a criterion has no label or a number isn't one", async () => {
    asChair();
    const bad = { sections: [{ id: "all", title: "Whole quilt", criteria: [{ ...points("impact", "", 40) }, { ...points("design", "Design", 20), maxPoints: "lots" }] }] };
    const r = await saveScoreSheetAction(null, { showSlug: show.slug, name: "Broken", sheet: bad });
    expect(r).toMatchObject({ ok: false, status: 400 });
    if (r.ok) return;
    expect(r.fieldErrors?.["sheet.sections.0.criteria.0.label"]).toEqual(["Name the criterion."]);
    expect(r.fieldErrors?.["sheet.sections.0.criteria.1.maxPoints"]).toEqual(["Most points must be a number."]);
  });

  it("refuses a sheet checkSheet rejects (a top mark its step can't reach), with the reason", async () => {
    asChair();
    const sheet = { sections: [{ id: "all", title: "Whole quilt", criteria: [{ ...points("impact", "Visual impact", 10), scale: { kind: "points", step: 3 } }] }] };
    const r = await saveScoreSheetAction(null, { showSlug: show.slug, name: "Steps", sheet });
    expect(r).toMatchObject({ ok: false, status: 400, message: "The sheet needs attention." });
    if (r.ok) return;
    expect(r.fieldErrors?.sheet?.[0]).toMatch(/can't be reached in steps of 3/);
    expect(await db.select().from(scoreSheets).where(and(eq(scoreSheets.showId, show.id), eq(scoreSheets.name, "Steps")))).toEqual([]);
  });

  it("refuses a second sheet of the same name, beside the name", async () => {
    asChair();
    expect(await saveScoreSheetAction(null, { showSlug: show.slug, name: "Guild card", sheet: SHEET })).toMatchObject({ ok: true });
    const r = await saveScoreSheetAction(null, { showSlug: show.slug, name: "Guild card", sheet: SHEET });
    expect(r).toMatchObject({ ok: false, status: 400, fieldErrors: { name: ["There is already a sheet called “Guild card”."] } });
  });
});

describe("categories", () => {
  it("refuses another show's sheet, and a change once judges have started", async () => {
    asChair();
    const theirs = await saveScoreSheetAction(null, { showSlug: other.slug, name: "Their sheet", sheet: SHEET });
    const r = await setCategoryJudgingAction(null, { showSlug: show.slug, categoryId: pieced.id, method: "points", scoreSheetId: (theirs as { data: { id: string } }).data.id });
    expect(r).toMatchObject({ ok: false, status: 400, fieldErrors: { scoreSheetId: ["That score sheet isn't in this show."] } });

    const started = await makeCategory(show.id, { code: "30", name: "Started" });
    const entry = await makeEntry(show.id, entrant.id, { categoryId: started.id, categoryState: "decided", paidAt: new Date(), status: "received" });
    await db.insert(judgeSheets).values({ showId: show.id, entryId: entry.id, judgeUserId: judge.id, state: { status: "open", version: 0, fields: {}, conflicts: [] } });
    const late = await setCategoryJudgingAction(null, { showSlug: show.slug, categoryId: started.id, method: "rank", scoreSheetId: null });
    expect(late).toMatchObject({ ok: false, status: 409, message: "Judges have started on 30 Started; its method and sheet can't change now." });
    const [row] = await db.select({ method: categories.judgingMethod }).from(categories).where(eq(categories.id, started.id));
    expect(row!.method).toBe("points");
  });
});

describe("panels", () => {
  it("refuses a judge on a category holding their own entry (409), listing the reason for the judges field", async () => {
    asChair();
    const r = await savePanelAction(null, { showSlug: show.slug, name: "Panel Z", day: "2027-03-11", room: "Hall", judgeIds: [judge.id, judge2.id], scribeIds: [], categoryIds: [pieced.id, applique.id] });
    expect(r).toMatchObject({ ok: false, status: 409, fieldErrors: { judgeIds: ["Judge Alder has an entry in 20 Appliqué, so can't judge it."] } });
    expect(await db.select().from(judgingPanels).where(eq(judgingPanels.showId, show.id))).toEqual([]);
  });

  it("refuses a panel member who isn't one of the show's judges, and someone as judge and scribe", async () => {
    asChair();
    expect(await savePanelAction(null, { showSlug: show.slug, name: "Panel Y", day: "", room: "", judgeIds: [scribe.id] })).toMatchObject({ ok: false, status: 400, fieldErrors: { judgeIds: [expect.stringMatching(/one of the show's judges/)] } });
    await grantRole(judge.id, show.id, "scribe");
    expect(await savePanelAction(null, { showSlug: show.slug, name: "Panel Y", day: "", room: "", judgeIds: [judge.id], scribeIds: [judge.id] })).toMatchObject({ ok: false, status: 400, fieldErrors: { scribeIds: ["Someone can't be judge and scribe on one panel."] } });
  });

  it("asks for a judge and a proper day, and answers 404 for a panel that isn't there", async () => {
    asChair();
    const r = await savePanelAction(null, { showSlug: show.slug, name: "", day: "next Tuesday", room: "", judgeIds: [] });
    expect(r).toMatchObject({ ok: false, status: 400 });
    if (!r.ok) expect(Object.keys(r.fieldErrors ?? {}).sort()).toEqual(["day", "judgeIds", "name"]);
    expect(await deletePanelAction(null, { showSlug: show.slug, panelId: crypto.randomUUID() })).toMatchObject({ ok: false, status: 404, message: "There is no such panel." });
  });
});

describe("declarations", () => {
  it("needs a name or an e-mail, and only the chair records one for another judge", async () => {
    asChair();
    expect(await addDeclarationAction(null, { showSlug: show.slug, judgeUserId: judge.id, personName: "", personEmail: "", relation: "other" })).toMatchObject({ ok: false, status: 400, fieldErrors: { personName: ["Give the person's name or e-mail address."] } });
    expect(await addDeclarationAction(null, { showSlug: show.slug, judgeUserId: judge.id, personName: "", personEmail: "not-an-address", relation: "other" })).toMatchObject({ ok: false, status: 400, fieldErrors: { personEmail: ["That e-mail address doesn't look right."] } });
    actAs(judge.cookie);
    expect(await addDeclarationAction(null, { showSlug: show.slug, judgeUserId: judge2.id, personName: "Someone", relation: "client" })).toMatchObject({ ok: false, status: 403 });
  });

  it("a judge can't remove another judge's declaration", async () => {
    const [row] = await db.insert(judgeDeclarations).values({ showId: show.id, judgeUserId: judge2.id, personName: "Sage Pennyroyal", relation: "household" }).returning();
    actAs(judge.cookie);
    expect(await removeDeclarationAction(null, { showSlug: show.slug, declarationId: row!.id })).toMatchObject({ ok: false, status: 403, message: "Only the chair can remove another judge's declaration." });
    asChair();
    expect(await removeDeclarationAction(null, { showSlug: show.slug, declarationId: crypto.randomUUID() })).toMatchObject({ ok: false, status: 404 });
  });
});

describe("options and reopening", () => {
  it("refuses a field that is never released to judges", async () => {
    asChair();
    const r = await saveJudgingOptionsAction(null, { showSlug: show.slug, commentPolicy: "all", quickPhrases: [], judgeFields: ["title", "entrantName"] });
    expect(r).toMatchObject({ ok: false, status: 400 });
    if (!r.ok) expect(Object.keys(r.fieldErrors ?? {})).toEqual(["judgeFields.1"]);
  });

  it("needs a reason, and refuses to reopen a sheet that is still open (409)", async () => {
    asChair();
    const entry = await makeEntry(show.id, entrant.id, { categoryId: pieced.id, categoryState: "decided", paidAt: new Date(), status: "received" });
    const [sheet] = await db.insert(judgeSheets).values({ showId: show.id, entryId: entry.id, judgeUserId: judge.id, state: { status: "open", version: 0, fields: {}, conflicts: [] } }).returning();
    expect(await reopenSheetAction(null, { showSlug: show.slug, sheetId: sheet!.id, reason: "" })).toMatchObject({ ok: false, status: 400, fieldErrors: { reason: ["Say why, in a few words (it goes in the audit log)."] } });
    expect(await reopenSheetAction(null, { showSlug: show.slug, sheetId: sheet!.id, reason: "Judge asked" })).toMatchObject({ ok: false, status: 409, message: "That sheet is still open; there is nothing to reopen." });
    // Another show's chair can't reach it through their own show.
    expect(await reopenSheetAction(null, { showSlug: other.slug, sheetId: sheet!.id, reason: "Judge asked" })).toMatchObject({ ok: false, status: 404 });
  });
});
