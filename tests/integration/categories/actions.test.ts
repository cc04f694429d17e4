// The chair's category actions as the browser calls them: the answers for bad input (field
// errors that name the field, what was typed sent back), the judging lock, a wrong role, and the
// two-step save (moves first, nothing written; then applied with their fingerprint, or stale).
import { randomUUID } from "node:crypto";
import { eq } from "drizzle-orm";
import { beforeEach, describe, expect, it } from "vitest";
import { db } from "@/db/client";
import { categories, entries, shows } from "@/db/schema";
import {
  admitFromWaitlistAction,
  overrideCategoryAction,
  reviewSizeFlagAction,
  saveCategoriesAction,
  updateToleranceAction,
} from "@/app/(chair)/shows/[slug]/manage/categories/actions";
import { inchesToUm } from "@/scoring/units";
import { actAs } from "../../helpers/request-context";
import { grantRole, makeCategory, makeEntry, makeShow, makeUser, type TestUser } from "../../helpers/factories";

type Show = Awaited<ReturnType<typeof makeShow>>;
let show: Show;
let chair: TestUser;
let entrant: TestUser;

const band = (code: string, name: string, op: "<" | ">=", inches: number | string) => ({
  id: randomUUID(),
  code,
  name,
  description: "",
  precedence: Number(code),
  conditions: [{ kind: "size", measure: "perimeter", bounds: [{ op, value: inches, unit: "in" }] }],
  cap: null,
  mergedIntoId: null,
});

beforeEach(async () => {
  show = await makeShow({ status: "entries_closed" });
  [chair, entrant] = await Promise.all([makeUser({ name: "Chair" }), makeUser({ name: "Entrant" })]);
  await grantRole(chair.id, show.id, "chair");
  actAs(chair.cookie);
});

describe("saveCategoriesAction", () => {
  it("asks an anonymous caller to sign in and refuses another role", async () => {
    actAs(null);
    expect(await saveCategoriesAction(null, { showSlug: show.slug, overlap: "flag", categories: [] })).toMatchObject({ ok: false, status: 401 });
    actAs(entrant.cookie);
    expect(await saveCategoriesAction(null, { showSlug: show.slug, overlap: "flag", categories: [] })).toMatchObject({ ok: false, status: 403 });
  });

  it("names the field of a bad limit and keeps what was typed", async () => {
    const input = { showSlug: show.slug, overlap: "flag", categories: [band("10", "Small", "<", "two hundred"), band("20", "Large", ">=", 240)] };
    const r = await saveCategoriesAction(null, input);
    expect(r).toMatchObject({ ok: false, status: 400 });
    if (r.ok) return;
    expect(r.fieldErrors?.["categories.0.conditions.0.bounds.0.value"]?.[0]).toMatch(/as a number/);
    expect(r.values?.categories).toEqual(input.categories);
    expect(await db.select().from(categories).where(eq(categories.showId, show.id))).toHaveLength(0);
  });

  it("names the second of two categories sharing a code", async () => {
    const r = await saveCategoriesAction(null, { showSlug: show.slug, overlap: "flag", categories: [band("10", "Small", "<", 240), band("10", "Large", ">=", 240)] });
    expect(r).toMatchObject({ ok: false, status: 400 });
    if (!r.ok) expect(r.fieldErrors?.["categories.1.code"]?.[0]).toMatch(/used twice/);
  });

  it("shows the moves first and writes nothing, then applies them with their fingerprint", async () => {
    // Perimeters 2 × (w + l): 220 in and 280 in.
    await makeEntry(show.id, entrant.id, { widthUm: inchesToUm(50), lengthUm: inchesToUm(60) });
    await makeEntry(show.id, entrant.id, { widthUm: inchesToUm(60), lengthUm: inchesToUm(80) });
    const input = { showSlug: show.slug, overlap: "flag", categories: [band("10", "Small", "<", 240), band("20", "Large", ">=", 240)] };
    const first = await saveCategoriesAction(null, input);
    expect(first.ok).toBe(true);
    if (!first.ok || !first.data || first.data.saved) throw new Error("expected the moves");
    expect(first.data.moves.map((m) => m.to)).toEqual(["10 Small", "20 Large"]);
    expect(first.message).toMatch(/would move 2 entries/);
    expect(await db.select().from(categories).where(eq(categories.showId, show.id))).toHaveLength(0);

    const wrong = await saveCategoriesAction(null, { ...input, confirmMoves: "2-00000000" });
    expect(wrong.ok && wrong.data && !wrong.data.saved && wrong.data.stale).toBe(true);

    const applied = await saveCategoriesAction(null, { ...input, confirmMoves: first.data.digest, note: "two bands" });
    expect(applied).toMatchObject({ ok: true, message: "2 categories saved. 2 entries moved." });
    const states = await db.select({ state: entries.categoryState }).from(entries).where(eq(entries.showId, show.id));
    expect(states.map((s) => s.state)).toEqual(["decided", "decided"]);
  });

  it("refuses changes once judging has started", async () => {
    await db.update(shows).set({ status: "judging" }).where(eq(shows.id, show.id));
    const r = await saveCategoriesAction(null, { showSlug: show.slug, overlap: "flag", categories: [band("10", "Small", "<", 240)] });
    expect(r).toMatchObject({ ok: false, status: 409, message: "Judging has started, so the categories are locked." });
  });
});

describe("overrideCategoryAction", () => {
  it("needs a reason", async () => {
    const entry = await makeEntry(show.id, entrant.id);
    const category = await makeCategory(show.id);
    const r = await overrideCategoryAction(null, { showSlug: show.slug, entryId: entry.id, categoryId: category.id, reason: " " });
    expect(r).toMatchObject({ ok: false, status: 400 });
    if (!r.ok) expect(r.fieldErrors?.reason?.[0]).toMatch(/Say why/);
  });

  it("refuses a category of another show, and any change once judging has started", async () => {
    const entry = await makeEntry(show.id, entrant.id);
    const elsewhere = await makeCategory((await makeShow()).id);
    const r = await overrideCategoryAction(null, { showSlug: show.slug, entryId: entry.id, categoryId: elsewhere.id, reason: "Judges asked" });
    expect(r).toMatchObject({ ok: false, status: 400 });
    if (!r.ok) expect(r.fieldErrors?.categoryId?.[0]).toMatch(/isn't in this show/);

    await db.update(shows).set({ status: "judging" }).where(eq(shows.id, show.id));
    const mine = await makeCategory(show.id);
    expect(await overrideCategoryAction(null, { showSlug: show.slug, entryId: entry.id, categoryId: mine.id, reason: "Judges asked" })).toMatchObject({ ok: false, status: 409 });
  });

  it("answers 404 for an entry of another show", async () => {
    const other = await makeShow();
    const entry = await makeEntry(other.id, entrant.id);
    expect(await overrideCategoryAction(null, { showSlug: show.slug, entryId: entry.id, categoryId: "rules", reason: "Judges asked" })).toMatchObject({ ok: false, status: 404 });
  });
});

describe("the queue's other actions and the tolerance", () => {
  it("refuses to mark reviewed an entry with no size flag", async () => {
    const entry = await makeEntry(show.id, entrant.id);
    expect(await reviewSizeFlagAction(null, { showSlug: show.slug, entryId: entry.id })).toMatchObject({ ok: false, status: 409 });
  });

  it("refuses to give a place to an entry that isn't waiting, and needs a reason", async () => {
    const entry = await makeEntry(show.id, entrant.id);
    expect(await admitFromWaitlistAction(null, { showSlug: show.slug, entryId: entry.id, reason: "A place freed up" })).toMatchObject({ ok: false, status: 409 });
    const waiting = await makeEntry(show.id, entrant.id, { waitlisted: true });
    const r = await admitFromWaitlistAction(null, { showSlug: show.slug, entryId: waiting.id, reason: "" });
    expect(r).toMatchObject({ ok: false, status: 400 });
    if (!r.ok) expect(Object.keys(r.fieldErrors ?? {})).toEqual(["reason"]);
  });

  it("names the tolerance field for a word or an absurd size", async () => {
    const word = await updateToleranceAction(null, { showSlug: show.slug, tolerance: "an inch", unit: "in" });
    expect(word).toMatchObject({ ok: false, status: 400 });
    if (!word.ok) expect(word.fieldErrors?.tolerance).toHaveLength(1);
    const huge = await updateToleranceAction(null, { showSlug: show.slug, tolerance: "13", unit: "in" });
    expect(huge).toMatchObject({ ok: false, status: 400 });
    if (!huge.ok) expect(huge.fieldErrors?.tolerance?.[0]).toMatch(/over 12 in/);
    // 2.54 cm is 1 in exactly (NIST SP 811, App. B).
    expect(await updateToleranceAction(null, { showSlug: show.slug, tolerance: "2.54", unit: "cm" })).toMatchObject({ ok: true, message: expect.stringContaining("within 1 in") });
  });
});
