// Categories in the database: decided on submission and when the size changes, the moves a changed
// set makes shown first and applied on confirmation, the queue that must be empty before judging,
// overrides with reasons, the intake re-measure, per-entrant and per-category limits, merges, and
// the lock once judging starts. Every write leaves its audit row.
import { randomUUID } from "node:crypto";
import { and, eq } from "drizzle-orm";
import { beforeEach, describe, expect, it } from "vitest";
import { db } from "@/db/client";
import { auditLog, categories, entries, shows } from "@/db/schema";
import { categoryEditor, saveCategorySet } from "@/db/queries/categories";
import { admitFromWaitlist, categoryQueue, overrideEntryCategory, recordMeasurement, reviewSizeFlag, updateSizeTolerance } from "@/db/queries/category-queue";
import { changeShowStatus } from "@/db/queries/settings";
import { saveQuiltAction, submitEntryAction } from "@/app/(entrant)/entries/[id]/actions";
import { categorySetSchema, type CategorySetInput } from "@/lib/schemas/categories";
import { actAs } from "../../helpers/request-context";
import { grantRole, makeEntry, makeShow, makeUser, type TestUser } from "../../helpers/factories";
import { completeDraft, QUILT, setSettings, viewerOf } from "../entries/helpers";

// 1 in = 25,400 µm exactly (NIST SP 811, Appendix B).
const IN = 25_400;

type Band = { code: string; bounds: [op: "<" | "<=" | ">" | ">=", inches: number][]; id?: string; cap?: number | null; mergedIntoId?: string | null };

/** A set of perimeter bands as the editor sends it (through the same schema as the action). */
function bands(list: Band[], extra: Partial<CategorySetInput> = {}): CategorySetInput {
  return categorySetSchema.parse({
    overlap: "flag",
    categories: list.map((b, i) => ({
      id: b.id ?? randomUUID(),
      code: b.code,
      name: `Band ${b.code}`,
      precedence: 10 * (i + 1),
      cap: b.cap ?? null,
      mergedIntoId: b.mergedIntoId ?? null,
      conditions: [{ kind: "size", measure: "perimeter", bounds: b.bounds.map(([op, value]) => ({ op, value, unit: "in" })) }],
    })),
    ...extra,
  });
}

let show: Awaited<ReturnType<typeof makeShow>>;
let chair: TestUser;
let ada: TestUser;

beforeEach(async () => {
  show = await makeShow();
  [chair, ada] = await Promise.all([makeUser({ name: "Chair" }), makeUser({ name: "Ada" })]);
  await grantRole(chair.id, show.id, "chair");
});

async function rowOf(id: string) {
  const [row] = await db.select().from(entries).where(eq(entries.id, id));
  return row!;
}
async function auditOf(subjectId: string, action: string) {
  return db.select().from(auditLog).where(and(eq(auditLog.subjectId, subjectId), eq(auditLog.action, action))).orderBy(auditLog.id);
}
async function submit(u: TestUser, entryId: string) {
  actAs(u.cookie);
  return submitEntryAction(null, { entryId, acceptRules: true, rulesVersionId: "" });
}
/** Saves a set, confirming whatever moves it makes (as the chair would after reading them). */
async function saveConfirmed(input: CategorySetInput) {
  const v = await viewerOf(chair);
  const first = await saveCategorySet(v, show.slug, input);
  if (first.saved) return first;
  const second = await saveCategorySet(v, show.slug, { ...input, confirmMoves: first.digest });
  if (!second.saved) throw new Error("moves changed between two calls");
  return second;
}

describe("submission", () => {
  it("places the entry and stores the reasons in plain words", async () => {
    const set = bands([{ code: "10", bounds: [["<", 200]] }, { code: "11", bounds: [[">=", 200], ["<", 300]] }, { code: "12", bounds: [[">=", 300]] }]);
    await saveConfirmed(set);
    const entryId = await completeDraft(ada, show.slug); // 60½ × 72 in: perimeter 265 in
    expect(await submit(ada, entryId)).toMatchObject({ ok: true });
    const row = await rowOf(entryId);
    expect(row).toMatchObject({ categoryState: "decided", categoryId: set.categories[1]!.id });
    expect(row.categoryReasons).toEqual(["perimeter 265 in is at least 200 in and under 300 in (Band 11)"]);
  });

  it("with no categories yet, leaves it undecided; saving a set shows the move first and applies it on confirmation", async () => {
    const entryId = await completeDraft(ada, show.slug);
    await submit(ada, entryId);
    expect((await rowOf(entryId)).categoryState).toBe("undecided");
    const v = await viewerOf(chair);
    const set = bands([{ code: "10", bounds: [["<", 300]] }, { code: "11", bounds: [[">=", 300]] }]);
    const first = await saveCategorySet(v, show.slug, set);
    expect(first).toMatchObject({ saved: false, stale: false });
    if (first.saved) throw new Error("unreachable");
    expect(first.moves).toEqual([expect.objectContaining({ entryId, from: "not decided", to: "10 Band 10" })]);
    expect(await db.select().from(categories).where(eq(categories.showId, show.id))).toHaveLength(0); // nothing written yet
    expect(await saveCategorySet(v, show.slug, { ...set, confirmMoves: first.digest })).toEqual({ saved: true, moved: 1, categories: 2 });
    expect((await rowOf(entryId)).categoryState).toBe("decided");
    const moved = await auditOf(entryId, "entry.category_moved");
    expect(moved).toHaveLength(1);
    expect(moved[0]!.actorUserId).toBe(chair.id);
  });

  it("refuses a quilt over the entrant's per-category limit and keeps the draft", async () => {
    await setSettings(show.id, { maxEntriesPerCategory: 1 });
    await saveConfirmed(bands([{ code: "10", bounds: [[">", 0]] }]));
    const first = await completeDraft(ada, show.slug);
    expect(await submit(ada, first)).toMatchObject({ ok: true });
    const second = await completeDraft(ada, show.slug);
    const refused = await submit(ada, second);
    expect(refused).toMatchObject({ ok: false, status: 409 });
    if (!refused.ok) expect(refused.message).toContain("at most 1 per entrant in one category");
    expect((await rowOf(second)).status).toBe("draft");
  });

  it("puts an entry over the category's cap on the waiting list with the reason; the chair can give it a place", async () => {
    const set = bands([{ code: "10", bounds: [[">", 0]], cap: 1 }]);
    await saveConfirmed(set);
    const bea = await makeUser({ name: "Bea" });
    const one = await completeDraft(ada, show.slug);
    const two = await completeDraft(bea, show.slug);
    await submit(ada, one);
    expect(await submit(bea, two)).toMatchObject({ ok: true, data: { waitlisted: true } });
    expect(await rowOf(two)).toMatchObject({ waitlisted: true, waitlistReason: "10 Band 10 is full (1 entries).", categoryState: "decided" });
    const v = await viewerOf(chair);
    expect((await categoryQueue(v, show.slug)).waiting.map((w) => w.id)).toEqual([two]);
    await admitFromWaitlist(v, show.slug, { entryId: two, reason: "a place freed up" });
    expect(await rowOf(two)).toMatchObject({ waitlisted: false, waitlistReason: "" });
    expect(await auditOf(two, "entry.admitted_from_waitlist")).toHaveLength(1);
  });

  it("decides again when the entrant changes the size after sending it", async () => {
    const set = bands([{ code: "10", bounds: [["<", 300]] }, { code: "11", bounds: [[">=", 300]] }]);
    await saveConfirmed(set);
    const entryId = await completeDraft(ada, show.slug);
    await submit(ada, entryId);
    expect((await rowOf(entryId)).categoryId).toBe(set.categories[0]!.id);
    actAs(ada.cookie);
    expect(await saveQuiltAction(null, { ...QUILT, entryId, width: "80", length: "80" })).toMatchObject({ ok: true }); // 320 in
    expect((await rowOf(entryId)).categoryId).toBe(set.categories[1]!.id);
    expect((await auditOf(entryId, "entry.category_decided"))[0]!.after).toMatchObject({ cause: "quilt step saved", categoryId: set.categories[1]!.id });
  });
});

describe("the chair's set", () => {
  it("shows a gap's entry in the queue, blocks judging until it is placed, and records the override", async () => {
    // The 240 → 241 gap (Heritage Quilters of Huntsville's published bands): 240.5 in fits none.
    const gap = await makeEntry(show.id, ada.id, { widthUm: 60 * IN, lengthUm: 60.25 * IN, status: "paid" });
    await saveConfirmed(bands([{ code: "10", bounds: [["<", 240]] }, { code: "11", bounds: [[">=", 241]] }]));
    expect(await rowOf(gap.id)).toMatchObject({ categoryState: "fits_none" });
    const v = await viewerOf(chair);
    const queue = await categoryQueue(v, show.slug);
    expect(queue.unplaced.map((e) => e.id)).toEqual([gap.id]);
    expect(queue.unplaced[0]!.reasons.join(" ")).toContain("240½ in");

    await db.update(shows).set({ status: "entries_closed" }).where(eq(shows.id, show.id));
    await expect(changeShowStatus(v, show.slug, { status: "judging" })).rejects.toMatchObject({
      status: 409,
      message: "1 entry has no category yet; place it from the queue first (Categories).",
    });

    const large = (await categoryEditor(v, show.slug)).categories.find((c) => c.code === "11")!;
    await overrideEntryCategory(v, show.slug, { entryId: gap.id, categoryId: large.id, reason: "measured 241 at the desk" });
    expect(await rowOf(gap.id)).toMatchObject({ categoryState: "overridden", categoryId: large.id, categoryOverrideReason: "measured 241 at the desk" });
    const audit = await auditOf(gap.id, "entry.category_overridden");
    expect(audit.at(-1)!.after).toMatchObject({ reason: "measured 241 at the desk", category: "11 Band 11 (chair's choice)" });
    expect((await categoryQueue(v, show.slug)).unplaced).toEqual([]);

    // Back to the rules puts it in the queue again.
    await overrideEntryCategory(v, show.slug, { entryId: gap.id, categoryId: "rules", reason: "rules fixed instead" });
    expect((await rowOf(gap.id)).categoryState).toBe("fits_none");
    await overrideEntryCategory(v, show.slug, { entryId: gap.id, categoryId: large.id, reason: "after all" });
    // No panel judges band 11 yet: a warning, so the move needs the chair's reason.
    await changeShowStatus(v, show.slug, { status: "judging", reason: "Panels are set on the day." });
  });

  it("a stale confirmation is not applied: the fresh moves come back", async () => {
    await saveConfirmed(bands([{ code: "10", bounds: [["<", 300]] }, { code: "11", bounds: [[">=", 300]] }]));
    const before = await categoryEditor(await viewerOf(chair), show.slug);
    const ids = before.categories.map((c) => c.id);
    const a = await makeEntry(show.id, ada.id, { widthUm: 70 * IN, lengthUm: 80 * IN }); // 300 in
    const next = bands([{ id: ids[0], code: "10", bounds: [["<=", 300]] }, { id: ids[1], code: "11", bounds: [[">", 300]] }]);
    const v = await viewerOf(chair);
    const first = await saveCategorySet(v, show.slug, next);
    if (first.saved) throw new Error("expected moves");
    await makeEntry(show.id, ada.id, { widthUm: 65 * IN, lengthUm: 85 * IN }); // another 300 in quilt arrives meanwhile
    const second = await saveCategorySet(v, show.slug, { ...next, confirmMoves: "1-00000000" });
    expect(second).toMatchObject({ saved: false, stale: true });
    if (second.saved) throw new Error("unreachable");
    expect(second.moves).toHaveLength(2);
    expect(second.moves[0]).toMatchObject({ entryId: a.id, to: "10 Band 10" });
    expect((await rowOf(a.id)).categoryState).toBe("undecided"); // untouched until confirmed
  });

  it("swaps two codes in one save, merges a category with its entries moved and recorded, and deletes one", async () => {
    const set = bands([{ code: "A", bounds: [["<", 200]] }, { code: "B", bounds: [[">=", 200], ["<", 300]] }, { code: "C", bounds: [[">=", 300]] }]);
    const [a, b, c] = set.categories.map((x) => x.id);
    const small = await makeEntry(show.id, ada.id, { widthUm: 40 * IN, lengthUm: 50 * IN }); // 180 in
    const big = await makeEntry(show.id, ada.id, { widthUm: 90 * IN, lengthUm: 90 * IN }); // 360 in
    await saveConfirmed(set);
    expect((await rowOf(small.id)).categoryId).toBe(a);

    // Swap codes A and B, and merge A into B.
    const swapped = bands(
      [
        { id: a, code: "B", bounds: [["<", 200]], mergedIntoId: b },
        { id: b, code: "A", bounds: [[">=", 200], ["<", 300]] },
        { id: c, code: "C", bounds: [[">=", 300]] },
      ],
      { note: "too few small quilts" },
    );
    expect(await saveConfirmed(swapped)).toMatchObject({ saved: true, moved: 1 });
    const small2 = await rowOf(small.id);
    expect(small2.categoryId).toBe(b);
    expect(small2.categoryReasons.at(-1)).toBe("B Band B was merged into A Band A");
    expect((await auditOf(small.id, "entry.category_moved")).at(-1)!.after).toMatchObject({ cause: "too few small quilts" });
    const codes = await db.select({ id: categories.id, code: categories.code, mergedIntoId: categories.mergedIntoId }).from(categories).where(eq(categories.showId, show.id));
    expect(Object.fromEntries(codes.map((r) => [r.id, [r.code, r.mergedIntoId]]))).toEqual({ [a!]: ["B", b], [b!]: ["A", null], [c!]: ["C", null] });

    // Deleting C: its quilt fits nothing now.
    const without = bands([
      { id: a, code: "B", bounds: [["<", 200]], mergedIntoId: b },
      { id: b, code: "A", bounds: [[">=", 200], ["<", 300]] },
    ]);
    await saveConfirmed(without);
    expect((await rowOf(big.id)).categoryState).toBe("fits_none");
    expect(await auditOf(show.id, "categories.saved")).toHaveLength(3);
  });

  it("refuses a category id of another show", async () => {
    const other = await makeShow();
    const [foreign] = await db.insert(categories).values({ showId: other.id, code: "X", name: "X", precedence: 1, conditions: [] }).returning();
    await expect(saveCategorySet(await viewerOf(chair), show.slug, bands([{ id: foreign!.id, code: "10", bounds: [[">", 0]] }]))).rejects.toMatchObject({ status: 400 });
  });

  it("only the chair sees or changes the set", async () => {
    await expect(categoryEditor(await viewerOf(ada), show.slug)).rejects.toMatchObject({ status: 403 });
    await expect(saveCategorySet(await viewerOf(ada), show.slug, bands([]))).rejects.toMatchObject({ status: 403 });
  });
});

describe("intake re-measure", () => {
  it("within the tolerance changes nothing; beyond it flags the quilt and decides on the measured size", async () => {
    const intake = await makeUser({ name: "Ina Take" });
    await grantRole(intake.id, show.id, "intake");
    const set = bands([{ code: "10", bounds: [["<", 280]] }, { code: "11", bounds: [[">=", 280]] }]);
    const quilt = await makeEntry(show.id, ada.id, { widthUm: 59 * IN, lengthUm: 80 * IN, status: "paid" }); // 278 in
    await saveConfirmed(set);
    expect((await rowOf(quilt.id)).categoryId).toBe(set.categories[0]!.id);
    const v = await viewerOf(intake);

    const within = await recordMeasurement(v, show.slug, { entryId: quilt.id, width: "60", length: "80", unit: "in" });
    expect(within).toMatchObject({ flagged: false, category: "10 Band 10" });
    expect(await rowOf(quilt.id)).toMatchObject({ measuredWidthUm: 60 * IN, sizeFlag: "", categoryId: set.categories[0]!.id });

    // 152.4 cm is 60 in; 157.48 cm is 62 in — 3 in over the registered 59 in.
    const outside = await recordMeasurement(v, show.slug, { entryId: quilt.id, width: "157.48", length: "203.2", unit: "cm" });
    expect(outside).toMatchObject({ flagged: true, category: "11 Band 11" });
    const row = await rowOf(quilt.id);
    expect(row).toMatchObject({ measuredWidthUm: 62 * IN, measuredLengthUm: 80 * IN, categoryId: set.categories[1]!.id });
    expect(row.sizeFlag).toBe("Measured 62 × 80 in, registered 59 × 80 in: off by 3 in, more than the 1 in allowed, so the measured size decides the category.");
    expect(await auditOf(quilt.id, "entry.measured")).toHaveLength(2);

    const cv = await viewerOf(chair);
    expect((await categoryQueue(cv, show.slug)).sizeFlags.map((e) => e.id)).toEqual([quilt.id]);
    await reviewSizeFlag(cv, show.slug, { entryId: quilt.id });
    expect((await categoryQueue(cv, show.slug)).sizeFlags).toEqual([]);
  });

  it("a wider tolerance keeps the registered size; bad lengths are refused with the field named", async () => {
    const set = bands([{ code: "10", bounds: [["<", 280]] }, { code: "11", bounds: [[">=", 280]] }]);
    const quilt = await makeEntry(show.id, ada.id, { widthUm: 59 * IN, lengthUm: 80 * IN, status: "paid" });
    await saveConfirmed(set);
    const cv = await viewerOf(chair);
    await updateSizeTolerance(cv, show.slug, { tolerance: "3", unit: "in" });
    expect(await recordMeasurement(cv, show.slug, { entryId: quilt.id, width: "62", length: "80", unit: "in" })).toMatchObject({ flagged: false, category: "10 Band 10" });
    await expect(recordMeasurement(cv, show.slug, { entryId: quilt.id, width: "sixty", length: "80", unit: "in" })).rejects.toMatchObject({ status: 400, fieldErrors: { width: [expect.stringContaining("isn't a length")] } });
    expect((await rowOf(quilt.id)).measuredWidthUm).toBe(62 * IN);
    await expect(updateSizeTolerance(cv, show.slug, { tolerance: "20", unit: "in" })).rejects.toMatchObject({ status: 400 });
  });

  it("a judge may not measure", async () => {
    const judge = await makeUser();
    await grantRole(judge.id, show.id, "judge");
    const quilt = await makeEntry(show.id, ada.id);
    await expect(recordMeasurement(await viewerOf(judge), show.slug, { entryId: quilt.id, width: "60", length: "80", unit: "in" })).rejects.toMatchObject({ status: 403 });
  });
});

describe("once judging starts", () => {
  it("the set, overrides and moves are locked; a measurement is flagged but moves nothing", async () => {
    const set = bands([{ code: "10", bounds: [["<", 280]] }, { code: "11", bounds: [[">=", 280]] }]);
    const quilt = await makeEntry(show.id, ada.id, { widthUm: 59 * IN, lengthUm: 80 * IN, status: "paid" });
    await saveConfirmed(set);
    await db.update(shows).set({ status: "judging" }).where(eq(shows.id, show.id));
    const cv = await viewerOf(chair);
    await expect(saveCategorySet(cv, show.slug, set)).rejects.toMatchObject({ status: 409, message: "Judging has started, so the categories are locked." });
    await expect(overrideEntryCategory(cv, show.slug, { entryId: quilt.id, categoryId: set.categories[1]!.id, reason: "late change" })).rejects.toMatchObject({ status: 409 });
    const r = await recordMeasurement(cv, show.slug, { entryId: quilt.id, width: "64", length: "80", unit: "in" });
    expect(r).toMatchObject({ flagged: true, category: null });
    const row = await rowOf(quilt.id);
    expect(row.categoryId).toBe(set.categories[0]!.id);
    expect(row.sizeFlag).toContain("Judging had started, so the category was not changed.");
    expect((await categoryEditor(cv, show.slug)).show.locked).toBe(true);
  });
});
