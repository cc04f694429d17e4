// Registering a quilt: the draft saved step by step, refused input, submission numbers, the
// per-entrant limit, capacity, the entry deadline, and other people's drafts.
import { eq } from "drizzle-orm";
import { beforeAll, describe, expect, it } from "vitest";
import { db } from "@/db/client";
import { auditLog, entries, showRulesVersions, shows } from "@/db/schema";
import { createDraft, entryForEntrant } from "@/db/queries/entries";
import { saveAboutAction, saveQuiltAction, submitEntryAction } from "@/app/(entrant)/entries/[id]/actions";
import { AppError } from "@/lib/errors";
import { actAs } from "../../helpers/request-context";
import { grantRole, makeShow, makeUser, type TestUser } from "../../helpers/factories";
import { ABOUT, completeDraft, QUILT, setSettings, viewerOf } from "./helpers";

let show: Awaited<ReturnType<typeof makeShow>>;
let ada: TestUser;
let bea: TestUser;
let chair: TestUser;

beforeAll(async () => {
  show = await makeShow();
  [ada, bea, chair] = await Promise.all([makeUser({ name: "Ada" }), makeUser({ name: "Bea" }), makeUser({ name: "Chair" })]);
  await grantRole(chair.id, show.id, "chair");
});

async function submit(u: TestUser, entryId: string, rulesVersionId = "") {
  actAs(u.cookie);
  return submitEntryAction(null, { entryId, acceptRules: true, rulesVersionId });
}

async function rowOf(entryId: string) {
  const [row] = await db.select().from(entries).where(eq(entries.id, entryId));
  return row!;
}

describe("the draft", () => {
  it("keeps each saved step, and the enter page resumes the same draft", async () => {
    const { entryId, resumed } = await createDraft(await viewerOf(ada), show.slug);
    expect(resumed).toBe(false);
    actAs(ada.cookie);
    expect(await saveQuiltAction(null, { ...QUILT, entryId })).toMatchObject({ ok: true });

    // "Closing the browser": a fresh visit to the enter page finds the same draft, values intact.
    const again = await createDraft(await viewerOf(ada), show.slug);
    expect(again).toEqual({ entryId, resumed: true });
    const { entry, gaps } = await entryForEntrant(await viewerOf(ada), entryId);
    expect(entry).toMatchObject({ title: "Prairie Stars", sizeUnit: "in", widthUm: 1_536_700, lengthUm: 1_828_800, techniques: ["pieced", "appliqué"], status: "draft", entryNumber: null });
    expect(gaps.map((g) => g.step)).toEqual(["makers", "about", "about", "photos", "photos"]);
    const audit = await db.select({ action: auditLog.action }).from(auditLog).where(eq(auditLog.subjectId, entryId));
    expect(audit.map((a) => a.action).sort()).toEqual(["entry.draft_created", "entry.quilt_saved"]);
  });

  it("refuses bad input with field errors, echoes what was typed and keeps the saved values", async () => {
    const { entryId } = await createDraft(await viewerOf(ada), show.slug);
    actAs(ada.cookie);
    const bad = await saveQuiltAction(null, { ...QUILT, entryId, title: "Changed title", width: "sixty" });
    expect(bad).toMatchObject({ ok: false, status: 400, values: { width: "sixty", title: "Changed title" } });
    if (bad.ok) throw new Error("unreachable");
    expect(bad.fieldErrors?.width?.[0]).toMatch(/^Width: "sixty" isn't a length/);
    const row = await rowOf(entryId);
    expect([row.title, row.widthUm]).toEqual(["Prairie Stars", 1_536_700]);

    const unknownTechnique = await saveQuiltAction(null, { ...QUILT, entryId, techniques: ["crochet"] });
    expect(unknownTechnique).toMatchObject({ ok: false, status: 400, fieldErrors: { techniques: ["This show doesn't list crochet; choose from its techniques."] } });
  });

  it("enforces the show's statement word limit on the server", async () => {
    const wordy = await makeShow();
    await setSettings(wordy.id, { statementWordLimit: 5 });
    const { entryId } = await createDraft(await viewerOf(ada), wordy.slug);
    actAs(ada.cookie);
    const r = await saveAboutAction(null, { ...ABOUT, entryId, statement: "one two three four five six" });
    expect(r).toMatchObject({ ok: false, status: 400, fieldErrors: { statement: ["The statement has 6 words; this show allows 5."] } });
    expect((await rowOf(entryId)).statement).toBe("");
    expect(await saveAboutAction(null, { ...ABOUT, entryId, statement: "one two three four five" })).toMatchObject({ ok: true });
    expect((await rowOf(entryId)).declaredValueCents).toBe(125_000);
  });

  it("hides a draft from another entrant: 404 to read or change it", async () => {
    const { entryId } = await createDraft(await viewerOf(ada), show.slug);
    await expect(entryForEntrant(await viewerOf(bea), entryId)).rejects.toMatchObject({ status: 404 } satisfies Partial<AppError>);
    actAs(bea.cookie);
    expect(await saveQuiltAction(null, { ...QUILT, entryId, title: "Mine now" })).toMatchObject({ ok: false, status: 404 });
    expect(await submitEntryAction(null, { entryId, acceptRules: true, rulesVersionId: "" })).toMatchObject({ ok: false, status: 404 });
    actAs(null);
    expect(await saveQuiltAction(null, { ...QUILT, entryId })).toMatchObject({ ok: false, status: 401 });
  });
});

describe("submission", () => {
  it("assigns increasing unique numbers from 101, never reusing a withdrawn entry's", async () => {
    const s = await makeShow();
    const [first, second] = [await completeDraft(ada, s.slug), await completeDraft(bea, s.slug)];
    const incomplete = (await createDraft(await viewerOf(chair), s.slug)).entryId;
    expect(await submit(ada, first)).toMatchObject({ ok: true, data: { entryNumber: 101, waitlisted: false } });
    expect(await submit(bea, second)).toMatchObject({ ok: true, data: { entryNumber: 102 } });
    const sent = await rowOf(second);
    expect(sent).toMatchObject({ status: "submitted", entryNumber: 102, waitlisted: false });
    expect(sent.submittedAt).toBeInstanceOf(Date);
    expect(sent.rulesAcceptedAt).toBeInstanceOf(Date);

    await db.update(entries).set({ status: "withdrawn" }).where(eq(entries.id, second));
    const third = await completeDraft(bea, s.slug);
    expect(await submit(bea, third)).toMatchObject({ ok: true, data: { entryNumber: 103 } });

    // Submitted at the same moment: still one number each.
    const racers = await Promise.all([completeDraft(ada, s.slug), completeDraft(ada, s.slug), completeDraft(ada, s.slug)]);
    actAs(ada.cookie);
    const results = await Promise.all(racers.map((entryId) => submitEntryAction(null, { entryId, acceptRules: true, rulesVersionId: "" })));
    const numbers = results.map((r) => (r.ok ? (r.data as { entryNumber: number }).entryNumber : r.message)).sort();
    expect(numbers).toEqual([104, 105, 106]);

    const refused = await submit(chair, incomplete);
    expect(refused).toMatchObject({ ok: false, status: 400, message: "This entry isn't complete yet." });
    if (!refused.ok) expect(refused.fieldErrors?._form).toContain("Still missing: The quilt's title.");
    const audit = await db.select({ after: auditLog.after }).from(auditLog).where(eq(auditLog.subjectId, first));
    expect(audit.map((a) => a.after)).toContainEqual(expect.objectContaining({ status: "submitted", entryNumber: 101, waitlisted: false, rulesVersionId: null, categoryState: "undecided" }));
  });

  it("records the rules version accepted and refuses an out-of-date one", async () => {
    const s = await makeShow();
    const [v1] = await db.insert(showRulesVersions).values({ showId: s.id, version: 1, rulesText: "Quilts must be clean.", releaseText: "The show does not insure." }).returning();
    const [v2] = await db.insert(showRulesVersions).values({ showId: s.id, version: 2, rulesText: "Quilts must be clean and labelled.", releaseText: "The show does not insure." }).returning();
    const entryId = await completeDraft(ada, s.slug);
    expect(await submit(ada, entryId, v1!.id)).toMatchObject({ ok: false, status: 409 });
    expect(await submit(ada, entryId, v2!.id)).toMatchObject({ ok: true });
    expect((await rowOf(entryId)).rulesVersionId).toBe(v2!.id);
  });

  it("holds an entrant to the show's per-entrant limit and keeps the refused draft", async () => {
    const s = await makeShow();
    await setSettings(s.id, { maxEntriesPerEntrant: 1 });
    const one = await completeDraft(ada, s.slug);
    const two = await completeDraft(ada, s.slug);
    expect(await submit(ada, one)).toMatchObject({ ok: true });
    const r = await submit(ada, two);
    expect(r).toMatchObject({ ok: false, status: 409 });
    if (!r.ok) expect(r.message).toContain("at most 1 entry per entrant");
    expect((await rowOf(two)).status).toBe("draft");
    // Withdrawn entries give the place back.
    await db.update(entries).set({ status: "withdrawn" }).where(eq(entries.id, one));
    expect(await submit(ada, two)).toMatchObject({ ok: true, data: { entryNumber: 102 } });
  });

  it("puts entries beyond the show's capacity on the waiting list and says so", async () => {
    const s = await makeShow();
    await setSettings(s.id, { capacity: 1 });
    const one = await completeDraft(ada, s.slug);
    const two = await completeDraft(bea, s.slug);
    expect(await submit(ada, one)).toMatchObject({ ok: true, data: { waitlisted: false } });
    const r = await submit(bea, two);
    expect(r).toMatchObject({ ok: true, data: { entryNumber: 102, waitlisted: true } });
    if (r.ok) expect(r.message).toContain("waiting list");
    expect(await rowOf(two)).toMatchObject({ status: "submitted", waitlisted: true });
  });

  it("after the deadline refuses the entrant with a clear message and lets the chair change and send", async () => {
    const s = await makeShow();
    await grantRole(chair.id, s.id, "chair");
    const entryId = await completeDraft(ada, s.slug);
    await db.update(shows).set({ entryClosesAt: new Date(Date.now() - 60_000) }).where(eq(shows.id, s.id));

    actAs(ada.cookie);
    const refused = await saveQuiltAction(null, { ...QUILT, entryId, title: "Late change" });
    expect(refused).toMatchObject({ ok: false, status: 409 });
    if (!refused.ok) expect(refused.message).toMatch(/^Entries for .+ closed on .+\. You can still read your entry, but not change it\.$/);
    expect(await submit(ada, entryId)).toMatchObject({ ok: false, status: 409 });
    const read = await entryForEntrant(await viewerOf(ada), entryId);
    expect(read.entry.title).toBe("Prairie Stars");
    expect(read.editBlock).toContain("closed");
    await expect(createDraft(await viewerOf(bea), s.slug)).rejects.toMatchObject({ status: 409 });

    actAs(chair.cookie);
    expect(await saveQuiltAction(null, { ...QUILT, entryId, title: "Corrected by the chair" })).toMatchObject({ ok: true });
    expect(await submit(chair, entryId)).toMatchObject({ ok: true, data: { entryNumber: 101 } });
    expect(await rowOf(entryId)).toMatchObject({ title: "Corrected by the chair", status: "submitted", entrantUserId: ada.id });
  });
});
