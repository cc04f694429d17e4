// Judging in the database: panels refused on conflicts, the tablet's session (blind), batches of
// sheet changes synced idempotently, out of order and from two devices, a scribe entering for a
// judge, submit and reopen, and the chair's progress board.
import { randomUUID } from "node:crypto";
import { eq } from "drizzle-orm";
import { beforeAll, describe, expect, it } from "vitest";
import { db } from "@/db/client";
import { auditLog, entrantProfiles, entryPhotos, judgeSheets, judgingPanels, panelCategories, panelMembers, scoreChanges } from "@/db/schema";
import { addDeclaration, judgeConflicts, progressBoard, reopenJudgeSheet, savePanel, saveScoreSheet, setCategoryJudging } from "@/db/queries/judging-setup";
import { judgingSession, sheetHistory, syncSheetChanges } from "@/db/queries/judging";
import { GET as sessionRoute } from "@/app/api/shows/[slug]/judging/session/route";
import { GET as queueRoute } from "@/app/api/shows/[slug]/judging/queue/route";
import { GET as manifestRoute } from "@/app/api/shows/[slug]/judging/manifest/route";
import { GET as photoRoute } from "@/app/api/photos/[photoId]/[size]/route";
import JudgingPage from "@/app/(judging)/shows/[slug]/judging/page";
import { addDeclarationAction } from "@/app/(chair)/shows/[slug]/manage/judging/actions";
import { ensureBucket, putObject } from "@/storage/s3";
import { actAs } from "../../helpers/request-context";
import { pngOf } from "../../helpers/photo-fixtures";
import { POST as syncRoute } from "@/app/api/shows/[slug]/judging/sync/route";
import { syncBatchSchema, type SyncBatch } from "@/lib/schemas/judging";
import type { ScoreSheet } from "@/scoring/score-sheets";
import { grantRole, makeCategory, makeEntry, makeShow, makeUser, type TestUser } from "../../helpers/factories";
import { setSettings, viewerOf } from "../entries/helpers";

// A sheet with the weights of one published judging guideline: visual impact 40, design 20,
// workmanship 20, colour 20 (Melody Crust, "Judging Guidelines").
const SHEET: ScoreSheet = {
  sections: [
    { id: "appearance", title: "General appearance", criteria: [{ id: "impact", label: "Visual impact", maxPoints: 40, scale: { kind: "points" }, allowNotApplicable: false }] },
    { id: "design", title: "Design", criteria: [{ id: "design", label: "Design", maxPoints: 20, scale: { kind: "points" }, allowNotApplicable: false }, { id: "colour", label: "Colour", maxPoints: 20, scale: { kind: "points" }, allowNotApplicable: false }] },
    { id: "workmanship", title: "Workmanship", criteria: [{ id: "piecing", label: "Piecing", maxPoints: 20, scale: { kind: "points" }, allowNotApplicable: true }] },
  ],
};

let show: Awaited<ReturnType<typeof makeShow>>;
let chair: TestUser, judge: TestUser, judge2: TestUser, scribe: TestUser, ada: TestUser;
let category: Awaited<ReturnType<typeof makeCategory>>;
let otherCategory: Awaited<ReturnType<typeof makeCategory>>;
const entryIds: string[] = [];
// What must never reach a judge: the entrants' and makers' names, e-mails, phones and guilds.
const SECRETS: string[] = [];

beforeAll(async () => {
  show = await makeShow({ status: "judging" });
  [chair, judge, judge2, scribe, ada] = await Promise.all([
    makeUser({ name: "Chair Person" }),
    makeUser({ name: "Judge Juniper" }),
    makeUser({ name: "Judge Rowan" }),
    makeUser({ name: "Scribe Sorrel" }),
    makeUser({ name: "Ada Entrantly", email: `${randomUUID().slice(0, 8)}-ada@example.test` }),
  ]);
  await grantRole(chair.id, show.id, "chair");
  for (const [u, role] of [[judge, "judge"], [judge2, "judge"], [scribe, "scribe"]] as const) await grantRole(u.id, show.id, role);
  await db.insert(entrantProfiles).values({ userId: ada.id, displayName: "Ada Entrantly", phone: "(217) 555-0177", guild: "Thimbleton Piecers' Circle" });
  SECRETS.push("Ada Entrantly", ada.email, "(217) 555-0177", "Thimbleton Piecers' Circle", "Maker Marigold", "Longarm Larkspur");
  category = await makeCategory(show.id, { code: "10", name: "Pieced" });
  otherCategory = await makeCategory(show.id, { code: "20", name: "Appliqué" });
  for (let i = 0; i < 6; i++) {
    const e = await makeEntry(show.id, ada.id, { categoryId: category.id, categoryState: "decided", paidAt: new Date(), status: "received", madeBy: ["Maker Marigold"], quiltedBy: "Longarm Larkspur", quiltedForHire: true, title: `Blind Quilt ${i}` });
    entryIds.push(e.id);
  }
  const cv = await viewerOf(chair);
  await saveScoreSheet(cv, show.slug, { name: "Standard", isDefault: true, sheet: SHEET });
  await savePanel(cv, show.slug, { name: "Panel A", day: "2027-03-11", room: "Hall B, table 1", judgeIds: [judge.id], scribeIds: [scribe.id], categoryIds: [category.id] });
});

let seq = 0;
const key = () => `k-${randomUUID()}`;
const mark = (entryId: string, criterion: string, points: number | null, baseVersion = 0, deviceSeq = ++seq) => ({ kind: "set" as const, key: key(), entryId, seq: deviceSeq, field: `mark:${criterion}`, value: points === null ? { kind: "na" } : { kind: "points", points }, baseVersion });
const batchOf = (deviceId: string, forJudge: string, changes: unknown[]): SyncBatch => syncBatchSchema.parse({ deviceId, forJudge, changes });

async function sheetRow(entryId: string, judgeId = judge.id) {
  const [row] = await db.select().from(judgeSheets).where(eq(judgeSheets.entryId, entryId));
  return row && row.judgeUserId === judgeId ? row : undefined;
}

describe("panels and conflicts", () => {
  it("refuses a judge on a category holding their own entry, or a declared person's, with the reason", async () => {
    const cv = await viewerOf(chair);
    // Judge Rowan enters a quilt in Appliqué.
    await makeEntry(show.id, judge2.id, { categoryId: otherCategory.id, categoryState: "decided", paidAt: new Date() });
    await expect(savePanel(cv, show.slug, { name: "Panel R", day: "", room: "", judgeIds: [judge2.id], scribeIds: [], categoryIds: [otherCategory.id] })).rejects.toMatchObject({
      status: 409,
      message: "This panel can't be saved: Judge Rowan has an entry in 20 Appliqué, so can't judge it.",
    });
    // Judge Juniper declares Ada (a student), who has entries in Pieced, which Juniper judges:
    // recorded without a word about the match (the chair sees it; see conflicts.test.ts).
    await expect(addDeclaration(await viewerOf(judge), show.slug, { personName: "", personEmail: ada.email, relation: "student" })).rejects.toMatchObject({ status: 409, message: "Judging has started at this show; tell the chair, who records declarations from now on." });
    // Declared for Rowan by the chair: Rowan can't take Pieced.
    await addDeclaration(cv, show.slug, { judgeUserId: judge2.id, personName: "Maker Marigold", personEmail: "", relation: "household" });
    expect(await judgeConflicts(db, show.id, [judge2.id], [category.id])).toEqual(["Judge Rowan declared Maker Marigold (household), who has an entry in 10 Pieced."]);
    await expect(savePanel(cv, show.slug, { name: "Panel R", day: "", room: "", judgeIds: [judge2.id], scribeIds: [], categoryIds: [category.id] })).rejects.toMatchObject({ status: 409 });
  });

  it("refuses a sheet whose criteria are wrong, naming the problem", async () => {
    const bad: ScoreSheet = { sections: [{ id: "a", title: "A", criteria: [{ id: "x", label: "X", maxPoints: 10, scale: { kind: "points" }, allowNotApplicable: false }, { id: "x", label: "X again", maxPoints: 10, scale: { kind: "points" }, allowNotApplicable: false }] }] };
    await expect(saveScoreSheet(await viewerOf(chair), show.slug, { name: "Broken", isDefault: false, sheet: bad })).rejects.toMatchObject({ status: 400 });
  });

  it("won't change a category's method once judges have started on it", async () => {
    await syncSheetChanges(await viewerOf(judge), show.slug, batchOf("tab-method-0001", judge.id, [mark(entryIds[5]!, "impact", 30)]));
    await expect(setCategoryJudging(await viewerOf(chair), show.slug, { categoryId: category.id, method: "rank", scoreSheetId: null })).rejects.toMatchObject({ status: 409 });
  });
});

describe("the tablet's session", () => {
  it("lists the panel's queue with released facts and photos, and never a name, e-mail, phone or guild (judge and scribe)", async () => {
    for (const u of [judge, scribe]) {
      const res = await sessionRoute(new Request(`http://t/api/shows/${show.slug}/judging/session`, { headers: { cookie: u.cookie } }), { params: Promise.resolve({ slug: show.slug }) });
      expect(res.status).toBe(200);
      const text = await res.text();
      for (const secret of SECRETS) expect(text, `${u.name}'s session mentions ${secret}`).not.toContain(secret);
      const body = JSON.parse(text) as Awaited<ReturnType<typeof judgingSession>>;
      expect(body.entries.map((e) => e.id).sort()).toEqual([...entryIds].sort());
      expect(body.entries[0]).toMatchObject({ title: expect.stringMatching(/^Blind Quilt/), size: "60 × 80 in (152.4 × 203.2 cm)", techniques: [] });
      expect(Object.keys(body.entries[0]!).sort()).toEqual(["categoryId", "entryNumber", "id", "lengthUm", "pattern", "photos", "quiltingMethod", "size", "techniques", "title", "widthUm"]);
      expect(body.judges.map((j) => j.name)).toEqual(["Judge Juniper"]);
    }
  });

  it("tells which of the viewer's sessions judges each category, and its precedence, for the list in judging order", async () => {
    const s = await judgingSession(await viewerOf(judge), show.slug);
    const panelId = s.me.seats[0]!.panelId;
    expect(s.categories).toEqual([expect.objectContaining({ id: category.id, code: "10", sessionId: panelId, precedence: expect.any(Number) })]);
  });

  it("a judge on no panel has an empty queue", async () => {
    const s = await judgingSession(await viewerOf(judge2), show.slug);
    expect(s.entries).toEqual([]);
  });
});

describe("syncing sheet changes", () => {
  it("the same batch posted twice gives the same rows; the second time every change is a duplicate", async () => {
    const v = await viewerOf(judge);
    const e = entryIds[0]!;
    const batch = batchOf("tab-juniper-0001", judge.id, [mark(e, "impact", 36), mark(e, "design", 18), mark(e, "colour", 17), mark(e, "piecing", 19)]);
    const first = await syncSheetChanges(v, show.slug, batch);
    expect(first.results.map((r) => r.outcome.kind)).toEqual(["applied", "applied", "applied", "applied"]);
    const after1 = await sheetRow(e);
    const second = await syncSheetChanges(v, show.slug, batch);
    expect(second.results.every((r) => r.duplicate)).toBe(true);
    expect(second.results.map((r) => r.outcome)).toEqual(first.results.map((r) => r.outcome));
    const after2 = await sheetRow(e);
    expect(after2!.state).toEqual(after1!.state);
    expect(after2!.total).toEqual({ total: 90, complete: true, percent: 90 });
    const rows = await db.select().from(scoreChanges).where(eq(scoreChanges.sheetId, after2!.id));
    expect(rows).toHaveLength(4);
  });

  it("N/A is not zero: the total is rescaled over the criteria that apply", async () => {
    const e = entryIds[1]!;
    await syncSheetChanges(await viewerOf(judge), show.slug, batchOf("tab-juniper-0001", judge.id, [mark(e, "impact", 36), mark(e, "design", 18), mark(e, "colour", 18), mark(e, "piecing", null)]));
    // 72 of the 80 points that apply, on the sheet's 100: 72 / 80 × 100 = 90.
    expect((await sheetRow(e))!.total).toEqual({ total: 90, complete: true, percent: 90 });
  });

  it("out-of-order changes from one device end with its last edit", async () => {
    const e = entryIds[2]!;
    const [a, b, c] = [mark(e, "impact", 30, 0, 101), mark(e, "impact", 33, 0, 102), mark(e, "impact", 35, 0, 103)];
    const r = await syncSheetChanges(await viewerOf(judge), show.slug, batchOf("tab-juniper-0001", judge.id, [c, a, b]));
    expect(r.results.map((x) => x.outcome.kind)).toEqual(["applied", "stale", "stale"]);
    expect((await sheetRow(e))!.state.fields["mark:impact"]!.value).toEqual({ kind: "points", points: 35 });
  });

  it("two devices editing the same field make a conflict record, never a silent overwrite", async () => {
    const e = entryIds[3]!;
    const v = await viewerOf(judge);
    await syncSheetChanges(v, show.slug, batchOf("tab-juniper-0001", judge.id, [mark(e, "design", 15)]));
    const r = await syncSheetChanges(await viewerOf(scribe), show.slug, batchOf("tab-sorrel-0002", judge.id, [mark(e, "design", 12)]));
    expect(r.results[0]!.outcome).toMatchObject({ kind: "conflict", field: "mark:design", serverValue: { kind: "points", points: 15 } });
    const row = (await sheetRow(e))!;
    expect(row.state.fields["mark:design"]!.value).toEqual({ kind: "points", points: 15 });
    expect(row.state.conflicts).toHaveLength(1);
    const [stored] = await db.select().from(scoreChanges).where(eq(scoreChanges.changeKey, r.results[0]!.key));
    expect(stored!.outcome.kind).toBe("conflict");
    // Submitting waits until it is resolved.
    const refused = await syncSheetChanges(v, show.slug, batchOf("tab-juniper-0001", judge.id, [{ kind: "submit", key: key(), entryId: e, seq: ++seq, seen: {} }]));
    expect(refused.results[0]!.outcome.kind).toBe("refused");
    const resolved = await syncSheetChanges(v, show.slug, batchOf("tab-juniper-0001", judge.id, [{ kind: "resolve", key: key(), entryId: e, seq: ++seq, field: "mark:design", value: { kind: "points", points: 12 }, baseVersion: 1 }]));
    expect(resolved.results[0]!.outcome.kind).toBe("applied");
    expect((await sheetRow(e))!.state.conflicts).toEqual([]);
  });

  it("a scribe enters for the judge; the history names both; submit locks; the chair reopens with a reason", async () => {
    const e = entryIds[4]!;
    const sv = await viewerOf(scribe);
    const changes = [mark(e, "impact", 38), mark(e, "design", 19), mark(e, "colour", 19), mark(e, "piecing", 18), { kind: "set", key: key(), entryId: e, seq: ++seq, field: "comment:overall", value: "Crisp points; lively colour.", baseVersion: 0 }];
    await syncSheetChanges(sv, show.slug, batchOf("tab-sorrel-0002", judge.id, changes));
    const row = (await sheetRow(e))!;
    const seen = Object.fromEntries(Object.entries(row.state.fields).map(([k, f]) => [k, f.version]));
    const submitted = await syncSheetChanges(sv, show.slug, batchOf("tab-sorrel-0002", judge.id, [{ kind: "submit", key: key(), entryId: e, seq: ++seq, seen }]));
    expect(submitted.results[0]!.outcome.kind).toBe("applied");
    expect((await sheetRow(e))!).toMatchObject({ status: "submitted", total: { total: 94, complete: true, percent: 94 } });
    const late = await syncSheetChanges(sv, show.slug, batchOf("tab-sorrel-0002", judge.id, [mark(e, "impact", 20, 1)]));
    expect(late.results[0]!.outcome).toMatchObject({ kind: "refused", text: "This sheet has been submitted; the chair can reopen it." });

    const history = await sheetHistory(await viewerOf(chair), show.slug, row.id);
    expect(history[0]).toMatchObject({ enteredByName: "Scribe Sorrel", forJudgeName: "Judge Juniper", text: "Scribe Sorrel for Judge Juniper" });
    // Criteria and comments by their names on the sheet, never their keys.
    expect(history.map((h) => h.fieldName).slice(0, 6)).toEqual(["Mark for Visual impact", "Mark for Design", "Mark for Colour", "Mark for Piecing", "Overall comment", "Submitted"]);

    await reopenJudgeSheet(await viewerOf(chair), show.slug, { sheetId: row.id, reason: "judge asked to revisit" });
    expect((await sheetRow(e))!.status).toBe("open");
    const audit = await db.select().from(auditLog).where(eq(auditLog.subjectId, row.id)).orderBy(auditLog.id);
    expect(audit.map((a) => a.action)).toEqual(["judge_sheet.submitted", "judge_sheet.reopened"]);
  });

  it("refuses a scribe entering for a judge who is not on their panel, and entries outside the queue", async () => {
    await expect(syncSheetChanges(await viewerOf(scribe), show.slug, batchOf("tab-sorrel-0002", judge2.id, []))).rejects.toMatchObject({ status: 403 });
    const outsider = await makeEntry(show.id, ada.id, { categoryId: otherCategory.id, categoryState: "decided", paidAt: new Date() });
    const r = await syncSheetChanges(await viewerOf(judge), show.slug, batchOf("tab-juniper-0001", judge.id, [mark(outsider.id, "impact", 30)]));
    expect(r.results[0]!.outcome).toEqual({ kind: "refused", text: "This entry isn't in your queue." });
  });

  it("refuses a value the sheet can't take, one change at a time, keeping the others", async () => {
    const e = entryIds[5]!;
    const r = await syncSheetChanges(await viewerOf(judge), show.slug, batchOf("tab-juniper-0001", judge.id, [mark(e, "impact", 55), mark(e, "design", 10), { ...mark(e, "impact", 1), field: "mark:nonesuch" }]));
    expect(r.results.map((x) => x.outcome.kind)).toEqual(["refused", "applied", "refused"]);
  });

  it("takes no changes before judging starts: the tablet keeps them", async () => {
    const early = await makeShow({ status: "entries_closed" });
    await grantRole(judge.id, early.id, "judge");
    await expect(syncSheetChanges(await viewerOf(judge), early.slug, batchOf("tab-juniper-0001", judge.id, []))).rejects.toMatchObject({
      status: 409,
      message: "Judging hasn't started at this show yet; changes stay on this device until it does.",
    });
  });

  it("the sync route's answers carry no name, e-mail, phone or guild either (judge and scribe)", async () => {
    for (const [u, device] of [[judge, "tab-juniper-0001"], [scribe, "tab-sorrel-0002"]] as const) {
      const body = batchOf(device, judge.id, [mark(entryIds[5]!, "colour", 11), { kind: "set", key: key(), entryId: entryIds[5]!, seq: ++seq, field: "comment:overall", value: "Even binding.", baseVersion: 0 }]);
      const res = await syncRoute(new Request(`http://t/api/shows/${show.slug}/judging/sync`, { method: "POST", headers: { cookie: u.cookie, "content-type": "application/json" }, body: JSON.stringify(body) }), { params: Promise.resolve({ slug: show.slug }) });
      expect(res.status).toBe(200);
      const text = await res.text();
      for (const secret of SECRETS) expect(text, `${u.name}'s sync answer mentions ${secret}`).not.toContain(secret);
    }
  });

  it("answers a bad batch at the route with 400 and field errors", async () => {
    const res = await syncRoute(new Request(`http://t/api/shows/${show.slug}/judging/sync`, { method: "POST", headers: { cookie: judge.cookie, "content-type": "application/json" }, body: JSON.stringify({ deviceId: "x", forJudge: judge.id, changes: [{ kind: "set" }] }) }), { params: Promise.resolve({ slug: show.slug }) });
    expect(res.status).toBe(400);
  });
});

describe("progress board", () => {
  it("counts scored and remaining sheets per panel, category and judge", async () => {
    const board = await progressBoard(await viewerOf(chair), show.slug);
    const panel = board.panels.find((p) => p.name === "Panel A")!;
    expect(panel).toMatchObject({ total: 6, scored: 0, remaining: 6, reopened: 1 });
    expect(board.judges.find((j) => j.name === "Judge Juniper")).toMatchObject({ total: 6, remaining: 6 });
    expect(board.unassigned).toEqual(["20 Appliqué"]);
  });
});

describe("a show that releases only the size: every answer to a judge or scribe", () => {
  // Values no judge of this show may see: every fact it does not release, and the other panel's entries.
  const UNRELEASED = ["Zephyr Unreleased Title", "trapunto-unreleased", "frame_machine", "Quillon Pattern", "Designer Dervla", "Statement Xylophone", "first_time", "Other Panel Title"];
  const ALLOWED_KEYS = ["categoryId", "entryNumber", "id", "lengthUm", "photos", "size", "widthUm"];
  let blind: Awaited<ReturnType<typeof makeShow>>;
  let judgeA: TestUser, scribeA: TestUser, judgeB: TestUser, maker: TestUser;
  const mine: string[] = [];
  let theirs: string;
  let myPhoto: string, theirPhoto: string;

  const call = async <P extends Record<string, string>>(handler: (r: Request, c: { params: Promise<P> }) => Promise<Response>, u: TestUser, url: string, params: P, init: RequestInit = {}) => {
    const res = await handler(new Request(`http://t${url}`, { ...init, headers: { cookie: u.cookie, ...(init.body ? { "content-type": "application/json" } : {}) } }), { params: Promise.resolve(params) });
    return { status: res.status, text: await res.text() };
  };
  const scan = (text: string, what: string) => {
    for (const secret of [...SECRETS, ...UNRELEASED, theirs]) expect(text, `${what} mentions ${secret}`).not.toContain(secret);
  };

  beforeAll(async () => {
    blind = await makeShow({ status: "judging" });
    [judgeA, scribeA, judgeB, maker] = await Promise.all([makeUser({ name: "Judge Aspen" }), makeUser({ name: "Scribe Alder" }), makeUser({ name: "Judge Birch" }), makeUser({ name: "Ada Entrantly" })]);
    for (const [u, role] of [[judgeA, "judge"], [scribeA, "scribe"], [judgeB, "judge"]] as const) await grantRole(u.id, blind.id, role);
    await setSettings(blind.id, { judgeFields: ["size"] });
    const [catA, catB] = [await makeCategory(blind.id, { code: "A1" }), await makeCategory(blind.id, { code: "B1" })];
    const facts = { madeBy: ["Maker Marigold"], quiltedBy: "Longarm Larkspur", techniques: ["trapunto-unreleased"], quiltingMethod: "frame_machine" as const, patternSource: "pattern", patternName: "Quillon Pattern", patternDesigner: "Designer Dervla", statement: "Statement Xylophone", division: "first_time" as const, status: "received" as const, categoryState: "decided" as const };
    for (let i = 0; i < 2; i++) mine.push((await makeEntry(blind.id, maker.id, { ...facts, categoryId: catA.id, title: "Zephyr Unreleased Title" })).id);
    theirs = (await makeEntry(blind.id, maker.id, { ...facts, categoryId: catB.id, title: "Other Panel Title" })).id;
    for (const [panel, cat, members] of [["Panel A", catA, [[judgeA, "judge"], [scribeA, "scribe"]]], ["Panel B", catB, [[judgeB, "judge"]]]] as const) {
      const [p] = await db.insert(judgingPanels).values({ showId: blind.id, name: panel }).returning();
      await db.insert(panelMembers).values(members.map(([u, role]) => ({ panelId: p!.id, userId: u.id, role })));
      await db.insert(panelCategories).values({ panelId: p!.id, categoryId: cat.id });
    }
    await ensureBucket();
    const photoOf = async (entryId: string) => {
      const key = `tests/blind/${randomUUID()}/web.png`;
      await putObject(key, await pngOf(40, 30), "image/png");
      const [row] = await db.insert(entryPhotos).values({ entryId, view: "full", storageKey: key, webKey: key, thumbKey: key, widthPx: 40, heightPx: 30, bytes: 100, contentType: "image/png" }).returning({ id: entryPhotos.id });
      return row!.id;
    };
    [myPhoto, theirPhoto] = [await photoOf(mine[0]!), await photoOf(theirs)];
  });

  it("the queue: only the size, only the viewer's own sessions (judge and scribe)", async () => {
    for (const u of [judgeA, scribeA]) {
      const { status, text } = await call(queueRoute, u, `/api/shows/${blind.slug}/judging/queue`, { slug: blind.slug });
      expect(status).toBe(200);
      scan(text, `${u.name}'s queue`);
      const body = JSON.parse(text) as { entries: Record<string, unknown>[] };
      expect(body.entries).toHaveLength(2);
      for (const e of body.entries) expect(Object.keys(e).sort()).toEqual(["entryNumber", "lengthUm", "size", "widthUm"]);
    }
    // Judge Birch sees only Panel B's entry.
    const b = JSON.parse((await call(queueRoute, judgeB, `/api/shows/${blind.slug}/judging/queue`, { slug: blind.slug })).text) as { entries: unknown[] };
    expect(b.entries).toHaveLength(1);
  });

  it("the session: only the size, only the viewer's own sessions (judge and scribe)", async () => {
    for (const u of [judgeA, scribeA]) {
      const { status, text } = await call(sessionRoute, u, `/api/shows/${blind.slug}/judging/session`, { slug: blind.slug });
      expect(status).toBe(200);
      scan(text, `${u.name}'s session`);
      const body = JSON.parse(text) as Awaited<ReturnType<typeof judgingSession>>;
      expect(body.entries.map((e) => e.id).sort()).toEqual([...mine].sort());
      for (const e of body.entries) expect(Object.keys(e).sort()).toEqual(ALLOWED_KEYS);
    }
  });

  it("the judging page hands its client only the size of the viewer's own entries", async () => {
    // A judge on no panel of this show yet: the page's list is the same scoped, released queue.
    const newcomer = await makeUser({ name: "Judge Cedar" });
    await grantRole(newcomer.id, blind.id, "judge");
    for (const u of [judgeA, scribeA, newcomer]) {
      actAs(u.cookie);
      const element = await JudgingPage({ params: Promise.resolve({ slug: blind.slug }) });
      // What React would serialise into the page for the browser: every prop, nested elements included.
      const text = JSON.stringify(element, (k, v: unknown) => (k.startsWith("_") || typeof v === "function" || typeof v === "symbol" ? undefined : v));
      scan(text, `${u.name}'s judging page`);
      const numbers = [...text.matchAll(/"entryNumber":(\d+)/g)].map((m) => m[1]);
      expect(numbers).toHaveLength(u === newcomer ? 0 : 2);
    }
  });

  it("the sync answers: only the viewer's sheets, and a change outside the sessions is refused without a word about the entry", async () => {
    for (const [u, device] of [[judgeA, "tab-aspen-0001"], [scribeA, "tab-alder-0002"]] as const) {
      const body = batchOf(device, judgeA.id, [mark(mine[0]!, "impact", 30), mark(theirs, "impact", 30)]);
      const { status, text } = await call(syncRoute, u, `/api/shows/${blind.slug}/judging/sync`, { slug: blind.slug }, { method: "POST", body: JSON.stringify(body) });
      expect(status).toBe(200);
      const answer = JSON.parse(text) as { results: { entryId: string; outcome: { kind: string; text?: string } }[]; sheets: { entryId: string }[] };
      expect(answer.results.find((r) => r.entryId === theirs)!.outcome).toEqual({ kind: "refused", text: "This entry isn't in your queue." });
      expect(answer.sheets.map((x) => x.entryId)).toEqual([mine[0]]);
      // The refused change names the entry id the tablet sent; nothing else about it comes back.
      scan(text.replaceAll(theirs, "<sent id>"), `${u.name}'s sync answer`);
    }
  });

  it("the manifest names only the page's address", async () => {
    const { status, text } = await call(manifestRoute, judgeA, `/api/shows/${blind.slug}/judging/manifest`, { slug: blind.slug });
    expect(status).toBe(200);
    scan(text, "the manifest");
  });

  it("photos: an entry of the viewer's session answers, another panel's is the same 404 as a missing one", async () => {
    for (const u of [judgeA, scribeA]) {
      expect((await call(photoRoute, u, `/api/photos/${myPhoto}/web`, { photoId: myPhoto, size: "web" })).status).toBe(200);
      const other = await call(photoRoute, u, `/api/photos/${theirPhoto}/web`, { photoId: theirPhoto, size: "web" });
      const missing = await call(photoRoute, u, `/api/photos/${randomUUID()}/web`, { photoId: randomUUID(), size: "web" });
      expect(other).toEqual(missing);
      expect(other.status).toBe(404);
    }
  });

  it("declarations: the judge's answer names nothing and is the same whether or not the person entered", async () => {
    const early = await makeShow({ status: "entries_closed" });
    await grantRole(judgeA.id, early.id, "judge");
    await setSettings(early.id, { judgeFields: ["size"] });
    const cat = await makeCategory(early.id, { code: "A1" });
    await makeEntry(early.id, maker.id, { categoryId: cat.id, categoryState: "decided", paidAt: new Date(), title: "Zephyr Unreleased Title", madeBy: ["Maker Marigold"] });
    const [p] = await db.insert(judgingPanels).values({ showId: early.id, name: "Panel A" }).returning();
    await db.insert(panelMembers).values({ panelId: p!.id, userId: judgeA.id, role: "judge" });
    await db.insert(panelCategories).values({ panelId: p!.id, categoryId: cat.id });
    actAs(judgeA.cookie);
    const answers = [];
    for (const person of [{ personName: "", personEmail: maker.email }, { personName: "Maker Marigold", personEmail: "" }, { personName: "Nobody Entered", personEmail: `${randomUUID().slice(0, 8)}@example.test` }]) {
      const r = await addDeclarationAction(null, { showSlug: early.slug, ...person, relation: "student" });
      answers.push(JSON.stringify(r));
      scan(JSON.stringify(r).replace(maker.email, "").replace("Maker Marigold", "").replace(/Nobody Entered|[0-9a-f]{8}@example\.test/g, ""), "the declaration answer");
    }
    expect(new Set(answers).size).toBe(1);
    expect(JSON.parse(answers[0]!)).toEqual({ ok: true, message: "Declaration recorded." });
  });
});
