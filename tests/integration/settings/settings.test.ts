// The chair's settings against the real database: each section saves its own columns with an
// audit row (before/after), other roles are refused, a bad value leaves saved values alone,
// rules are versioned, and stage moves are refused with reasons.
import { and, asc, eq } from "drizzle-orm";
import { beforeEach, describe, expect, it } from "vitest";
import { db } from "@/db/client";
import {
  changeShowStatus,
  DEFAULT_SETTINGS,
  publicShowDetails,
  publishRules,
  settingsForChair,
  settingsForShowId,
  updateShowDates,
  updateShowSettings,
} from "@/db/queries/settings";
import { auditLog, showRulesVersions, showSettings, shows } from "@/db/schema";
import { updateDatesAction, updateSettingsAction, publishRulesAction, changeStatusAction } from "@/app/(chair)/shows/[slug]/manage/settings/actions";
import { GET as getSettingsRoute } from "@/app/api/shows/[slug]/settings/route";
import { getViewer, type Viewer } from "@/lib/session";
import { actAs } from "../../helpers/request-context";
import { grantRole, makeCategory, makeEntry, makeShow, makeUser, type TestUser } from "../../helpers/factories";

type Show = Awaited<ReturnType<typeof makeShow>>;
let show: Show;
let chair: TestUser;

async function viewerOf(u: TestUser): Promise<Viewer> {
  return (await getViewer(new Headers({ cookie: u.cookie })))!;
}

async function auditFor(showId: string, action: string) {
  return db
    .select({ before: auditLog.before, after: auditLog.after, actorUserId: auditLog.actorUserId })
    .from(auditLog)
    .where(and(eq(auditLog.showId, showId), eq(auditLog.action, action)))
    .orderBy(asc(auditLog.id));
}

const BLANK_DATES = {
  entryOpensAt: "",
  entryClosesAt: "",
  lateFeeFromAt: "",
  dropOffStartsAt: "",
  dropOffEndsAt: "",
  judgingStartsAt: "",
  judgingEndsAt: "",
  showOpensAt: "",
  showClosesAt: "",
  pickUpStartsAt: "",
  pickUpEndsAt: "",
};

const FEES = { section: "fees", entryFeeCents: "25", memberEntryFeeCents: "$20.00", lateFeeCents: "10", critiqueFeeCents: "19.99", feeCapCents: "100", withdrawalRefundPercent: "50" };

beforeEach(async () => {
  show = await makeShow({ status: "draft" });
  chair = await makeUser({ name: "Chair" });
  await grantRole(chair.id, show.id, "chair");
  actAs(chair.cookie);
});

describe("effective settings", () => {
  it("a show without a settings row runs on the schema's defaults", async () => {
    const s = await settingsForShowId(show.id);
    expect(s.saved).toBe(false);
    expect(s.currentRules).toBeNull();
    // The defaults written in code match the column defaults the database fills in.
    await db.insert(showSettings).values({ showId: show.id });
    const saved = await settingsForShowId(show.id);
    expect(saved.saved).toBe(true);
    const { saved: _a, updatedAt: _b, ...fromDb } = saved;
    const { saved: _c, updatedAt: _d, ...fromDefaults } = s;
    expect(fromDb).toEqual(fromDefaults);
    expect(fromDefaults).toMatchObject({ ...DEFAULT_SETTINGS, showId: show.id });
  });
});

describe("saving each section", () => {
  it("dates: wall-clock times in the show's zone are stored in UTC, with an audit row", async () => {
    // The factory's show is in America/Chicago: UTC−6 in winter, UTC−5 in summer (US rules, from memory).
    const r = await updateDatesAction(null, {
      showSlug: show.slug,
      ...BLANK_DATES,
      entryOpensAt: "2027-01-04T09:00",
      lateFeeFromAt: "2027-02-01T00:00",
      entryClosesAt: "2027-02-15T23:59",
      dropOffStartsAt: "2027-03-10T10:00",
      dropOffEndsAt: "2027-03-10T16:00",
      showOpensAt: "2027-03-18T09:00",
      showClosesAt: "2027-03-20T17:00",
      pickUpStartsAt: "2027-03-20T17:30",
      pickUpEndsAt: "2027-03-20T19:00",
    });
    expect(r).toMatchObject({ ok: true, message: "Dates saved." });
    const [row] = await db.select().from(shows).where(eq(shows.id, show.id));
    expect(row!.entryOpensAt?.toISOString()).toBe("2027-01-04T15:00:00.000Z");
    expect(row!.entryClosesAt?.toISOString()).toBe("2027-02-16T05:59:00.000Z");
    expect(row!.showOpensAt?.toISOString()).toBe("2027-03-18T14:00:00.000Z"); // after the 14 March change: CDT
    expect(row!.judgingStartsAt).toBeNull();
    const s = await settingsForShowId(show.id);
    expect(s.lateFeeFromAt?.toISOString()).toBe("2027-02-01T06:00:00.000Z");
    const [audit] = await auditFor(show.id, "show.dates_updated");
    expect(audit!.actorUserId).toBe(chair.id);
    expect(audit!.before).toMatchObject({ entryOpensAt: null, lateFeeFromAt: null });
    expect((audit!.before as Record<string, string>).entryClosesAt).toMatch(/^20\d\d-/); // the factory's date
    expect(audit!.after).toMatchObject({ entryOpensAt: "2027-01-04T15:00:00.000Z", lateFeeFromAt: "2027-02-01T06:00:00.000Z", judgingStartsAt: null });
  });

  it("fees: dollars become exact cents; the first save creates the settings row", async () => {
    expect(await db.select().from(showSettings).where(eq(showSettings.showId, show.id))).toHaveLength(0);
    const r = await updateSettingsAction(null, { showSlug: show.slug, ...FEES });
    expect(r).toMatchObject({ ok: true, message: "Fees saved." });
    const s = await settingsForShowId(show.id);
    expect(s).toMatchObject({ entryFeeCents: 2500, memberEntryFeeCents: 2000, lateFeeCents: 1000, critiqueFeeCents: 1999, feeCapCents: 10000, withdrawalRefundPercent: 50 });
    const [audit] = await auditFor(show.id, "settings.fees_updated");
    expect(audit!.before).toEqual({ entryFeeCents: 0, memberEntryFeeCents: 0, lateFeeCents: 0, critiqueFeeCents: 0, feeCapCents: null, withdrawalRefundPercent: 100 });
    expect(audit!.after).toEqual({ entryFeeCents: 2500, memberEntryFeeCents: 2000, lateFeeCents: 1000, critiqueFeeCents: 1999, feeCapCents: 10000, withdrawalRefundPercent: 50 });
  });

  it("limits, photos and options each save only their own columns", async () => {
    await updateSettingsAction(null, { showSlug: show.slug, ...FEES });
    expect(await updateSettingsAction(null, { showSlug: show.slug, section: "limits", maxEntriesPerEntrant: "5", maxEntriesPerCategory: "2", capacity: "175" })).toMatchObject({ ok: true });
    expect(
      await updateSettingsAction(null, {
        showSlug: show.slug,
        section: "photos",
        requireFullView: true,
        requireDetailView: false,
        photoMinWidthPx: "1200",
        photoMinHeightPx: "800",
        photoMaxBytes: "8",
        statementWordLimit: "100",
        techniques: "pieced\nappliqué\nart",
      }),
    ).toMatchObject({ ok: true, message: "Photos and statement saved." });
    expect(await updateSettingsAction(null, { showSlug: show.slug, section: "options", juried: true, publishNames: false, replyToEmail: "Show@Example.org" })).toMatchObject({ ok: true });
    const s = await settingsForShowId(show.id);
    expect(s).toMatchObject({
      entryFeeCents: 2500,
      maxEntriesPerEntrant: 5,
      maxEntriesPerCategory: 2,
      capacity: 175,
      requiredPhotoViews: ["full"],
      photoMinWidthPx: 1200,
      photoMinHeightPx: 800,
      photoMaxBytes: 8_000_000,
      statementWordLimit: 100,
      techniques: ["pieced", "appliqué", "art"],
      juried: true,
      publishNames: false,
      replyToEmail: "show@example.org",
    });
    const [limits] = await auditFor(show.id, "settings.limits_updated");
    expect(limits!.before).toEqual({ maxEntriesPerEntrant: null, maxEntriesPerCategory: null, capacity: null });
    expect(limits!.after).toEqual({ maxEntriesPerEntrant: 5, maxEntriesPerCategory: 2, capacity: 175 });
    const [photos] = await auditFor(show.id, "settings.photos_updated");
    expect(photos!.before).toMatchObject({ requiredPhotoViews: ["full", "detail"], photoMaxBytes: 5_000_000 });
  });

  it("a bad value in one section leaves every saved value untouched and writes no audit row", async () => {
    await updateSettingsAction(null, { showSlug: show.slug, ...FEES });
    const before = await settingsForShowId(show.id);
    const bad = await updateSettingsAction(null, { showSlug: show.slug, ...FEES, entryFeeCents: "30", critiqueFeeCents: "1.999" });
    expect(bad).toMatchObject({ ok: false, status: 400, fieldErrors: { critiqueFeeCents: ["Critique fee: Give at most two digits of cents, e.g. 19.99."] } });
    expect((bad as { values?: Record<string, unknown> }).values).toMatchObject({ entryFeeCents: "30", critiqueFeeCents: "1.999" });
    const badLimits = await updateSettingsAction(null, { showSlug: show.slug, section: "limits", maxEntriesPerEntrant: "-1", maxEntriesPerCategory: "", capacity: "" });
    expect(badLimits).toMatchObject({ ok: false, status: 400 });
    const badDates = await updateDatesAction(null, { showSlug: show.slug, ...BLANK_DATES, entryOpensAt: "2027-02-01T09:00", entryClosesAt: "2027-01-01T09:00" });
    expect(badDates).toMatchObject({ ok: false, status: 400, fieldErrors: { entryClosesAt: ["Entries close must come after entries open."] } });
    const after = await settingsForShowId(show.id);
    expect(after).toEqual(before);
    expect(await auditFor(show.id, "settings.fees_updated")).toHaveLength(1);
    expect(await auditFor(show.id, "settings.limits_updated")).toHaveLength(0);
    expect(await auditFor(show.id, "show.dates_updated")).toHaveLength(0);
  });
});

describe("who may change settings", () => {
  it("refuses a judge, an entrant, another show's chair and an anonymous caller", async () => {
    const judge = await makeUser({ name: "Judge" });
    await grantRole(judge.id, show.id, "judge");
    const entrant = await makeUser({ name: "Entrant" });
    const other = await makeShow();
    const otherChair = await makeUser({ name: "Other chair" });
    await grantRole(otherChair.id, other.id, "chair");
    for (const u of [judge, entrant, otherChair]) {
      actAs(u.cookie);
      expect(await updateSettingsAction(null, { showSlug: show.slug, ...FEES })).toMatchObject({ ok: false, status: 403 });
      expect(await publishRulesAction(null, { showSlug: show.slug, rulesText: "Rules that nobody may publish.", releaseText: "A release that nobody may publish." })).toMatchObject({ ok: false, status: 403 });
      await expect(settingsForChair(await viewerOf(u), show.slug)).rejects.toMatchObject({ status: 403 });
    }
    actAs(null);
    expect(await updateDatesAction(null, { showSlug: show.slug, ...BLANK_DATES })).toMatchObject({ ok: false, status: 401 });
    expect((await settingsForShowId(show.id)).saved).toBe(false);
    expect(await auditFor(show.id, "settings.fees_updated")).toHaveLength(0);
  });
});

describe("rules versions", () => {
  it("publishing twice gives versions 1 and 2 and leaves version 1's text as it was", async () => {
    const v = await viewerOf(chair);
    const one = await publishRules(v, show.slug, { rulesText: "Version one rules: quilts must be finished.", releaseText: "Version one release text for entrants." });
    const two = await publishRules(v, show.slug, { rulesText: "Version two rules: quilts must be finished and labelled.", releaseText: "Version two release text for entrants." });
    expect([one.version, two.version]).toEqual([1, 2]);
    const rows = await db.select().from(showRulesVersions).where(eq(showRulesVersions.showId, show.id)).orderBy(asc(showRulesVersions.version));
    expect(rows.map((r) => [r.version, r.rulesText, r.releaseText, r.publishedBy])).toEqual([
      [1, "Version one rules: quilts must be finished.", "Version one release text for entrants.", chair.id],
      [2, "Version two rules: quilts must be finished and labelled.", "Version two release text for entrants.", chair.id],
    ]);
    const current = (await settingsForShowId(show.id)).currentRules;
    expect(current).toMatchObject({ id: two.id, version: 2, rulesText: "Version two rules: quilts must be finished and labelled." });
    const page = await settingsForChair(v, show.slug);
    expect(page.rulesHistory.map((r) => [r.version, r.publishedByName])).toEqual([[2, "Chair"], [1, "Chair"]]);
    const audits = await auditFor(show.id, "rules.published");
    expect(audits.map((a) => [a.before, (a.after as { version: number }).version])).toEqual([[null, 1], [{ id: one.id, version: 1 }, 2]]);
  });

  it("the action answers with the version number", async () => {
    expect(await publishRulesAction(null, { showSlug: show.slug, rulesText: "Our rules, in full, for this show.", releaseText: "Our release, in full, for this show." })).toMatchObject({
      ok: true,
      message: "Version 1 of the rules and release is published.",
      data: { version: 1 },
    });
  });
});

describe("show status", () => {
  it("won't open entries without a closing date and published rules, and says so", async () => {
    await db.update(shows).set({ entryClosesAt: null }).where(eq(shows.id, show.id));
    const r = await changeStatusAction(null, { showSlug: show.slug, status: "entries_open" });
    expect(r).toMatchObject({
      ok: false,
      status: 409,
      fieldErrors: { status: ["Set the date entries close first (Dates).", "Publish the rules and release first (Rules and release)."] },
    });
    const past = new Date(Date.now() - 86_400_000);
    await db.update(shows).set({ entryClosesAt: past }).where(eq(shows.id, show.id));
    await publishRules(await viewerOf(chair), show.slug, { rulesText: "Rules good enough to open with.", releaseText: "A release good enough to open with." });
    expect(await changeStatusAction(null, { showSlug: show.slug, status: "entries_open" })).toMatchObject({
      ok: false,
      status: 409,
      message: "The closing date for entries has passed; move it later first (Dates).",
    });
    expect((await db.select({ status: shows.status }).from(shows).where(eq(shows.id, show.id)))[0]!.status).toBe("draft");
    expect(await auditFor(show.id, "show.status_changed")).toHaveLength(0);
  });

  it("moves step by step, with an audit row per move, and refuses a jump", async () => {
    await publishRules(await viewerOf(chair), show.slug, { rulesText: "Rules good enough to open with.", releaseText: "A release good enough to open with." });
    expect(await changeStatusAction(null, { showSlug: show.slug, status: "judging" })).toMatchObject({
      ok: false,
      status: 409,
      message: "A show at “Being set up” can't move to “Judging”; it can move to “Taking entries”.",
    });
    expect(await changeStatusAction(null, { showSlug: show.slug, status: "entries_open" })).toMatchObject({ ok: true, message: "The show is now taking entries." });
    expect(await changeStatusAction(null, { showSlug: show.slug, status: "entries_open" })).toMatchObject({ ok: false, status: 409, message: "The show is already at “Taking entries”." });
    const v = await viewerOf(chair);
    // Closing before the closing date is a warning: the move needs a reason.
    await changeShowStatus(v, show.slug, { status: "entries_closed", reason: "Closing early in this test." });
    // Judging waits for categories (tests/integration/categories covers the queue).
    await expect(changeShowStatus(v, show.slug, { status: "judging" })).rejects.toMatchObject({ status: 409, message: expect.stringContaining("Set up the categories first (Categories).") });
    const category = await makeCategory(show.id);
    await makeEntry(show.id, chair.id, { status: "paid", categoryId: category.id, categoryState: "decided" });
    await changeShowStatus(v, show.slug, { status: "judging", reason: "No panel yet in this test." });
    await expect(changeShowStatus(v, show.slug, { status: "entries_open" })).rejects.toMatchObject({ status: 409 });
    const audits = await auditFor(show.id, "show.status_changed");
    expect(audits.map((a) => [a.before, a.after])).toEqual([
      [{ status: "draft" }, { status: "entries_open", stepBack: false }],
      [{ status: "entries_open" }, expect.objectContaining({ status: "entries_closed", reason: "Closing early in this test." })],
      [{ status: "entries_closed" }, expect.objectContaining({ status: "judging", reason: "No panel yet in this test." })],
    ]);
  });

  it("a show taking entries can't lose its closing date", async () => {
    await db.update(shows).set({ status: "entries_open" }).where(eq(shows.id, show.id));
    const r = await updateShowDates(await viewerOf(chair), show.slug, { ...BLANK_DATES, entryOpensAt: null, entryClosesAt: null } as never).catch((e: unknown) => e);
    expect(r).toMatchObject({ status: 400, fieldErrors: { entryClosesAt: ["Entries close: a show taking entries needs a closing date."] } });
  });
});

describe("public details", () => {
  it("null for drafts; fees, limits, photo rules and current rules once public", async () => {
    expect(await publicShowDetails(show.slug)).toBeNull();
    expect(await publicShowDetails("no-such-show")).toBeNull();
    await updateShowSettings(await viewerOf(chair), show.slug, { section: "fees", entryFeeCents: 2500, memberEntryFeeCents: 2000, lateFeeCents: 500, critiqueFeeCents: 0, feeCapCents: null, withdrawalRefundPercent: 100 });
    await publishRules(await viewerOf(chair), show.slug, { rulesText: "Public rules text for this show.", releaseText: "Public release text for this show." });
    await db.update(shows).set({ status: "entries_open" }).where(eq(shows.id, show.id));
    const d = await publicShowDetails(show.slug);
    expect(d!.show.slug).toBe(show.slug);
    expect(d!.fees).toMatchObject({ entryFeeCents: 2500, memberEntryFeeCents: 2000, lateFeeCents: 500, feeCapCents: null });
    expect(d!.limits).toEqual({ maxEntriesPerEntrant: null, maxEntriesPerCategory: null, capacity: null });
    expect(d!.photos).toMatchObject({ requiredPhotoViews: ["full", "detail"], photoMinWidthPx: 1000, photoMinHeightPx: 500 });
    expect(d!.currentRules).toMatchObject({ version: 1, rulesText: "Public rules text for this show." });
    expect(d).not.toHaveProperty("replyToEmail");
  });
});

describe("GET /api/shows/[slug]/settings", () => {
  const call = (slug: string, cookie?: string) =>
    getSettingsRoute(new Request(`http://127.0.0.1:3100/api/shows/${slug}/settings`, { headers: cookie ? { cookie } : {} }), { params: Promise.resolve({ slug }) });

  it("gives the chair the effective settings as JSON, defaults included", async () => {
    await updateSettingsAction(null, { showSlug: show.slug, section: "limits", maxEntriesPerEntrant: "3", maxEntriesPerCategory: "", capacity: "" });
    const res = await call(show.slug, chair.cookie);
    expect(res.status).toBe(200);
    const body = (await res.json()) as Record<string, unknown>;
    expect(body).toMatchObject({ showId: show.id, saved: true, maxEntriesPerEntrant: 3, entryFeeCents: 0, photoMinWidthPx: 1000, currentRules: null });
  });

  it("answers 401 to nobody and 403 to an entrant", async () => {
    expect((await call(show.slug)).status).toBe(401);
    const entrant = await makeUser();
    expect((await call(show.slug, entrant.cookie)).status).toBe(403);
  });
});
