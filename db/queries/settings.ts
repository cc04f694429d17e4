// A show's settings: the effective values (row or schema defaults) with the current rules
// version, the public page's view of them, and the chair's audited changes.
import "server-only";
import { publicShowColumns } from "@/db/queries/shows";
import { and, count, desc, eq, ne } from "drizzle-orm";
import { db, type Tx } from "@/db/client";
import { entries, showRulesVersions, showSettings, shows, user } from "@/db/schema";
import { writeAudit } from "@/db/queries/audit";
import { categorySetFor } from "@/db/queries/categories";
import { stageCounts } from "@/db/queries/stage-counts";
import { checkStageMove, needsReason, NEXT_STAGE, STEP_BACK } from "@/scoring/stage-moves";
import { activeCategories } from "@/scoring/category-sets";
import { utcToZonedInput, zonedInputToUtc } from "@/components/format/zoned-time";
import { badInput, conflict } from "@/lib/errors";
import {
  DATE_FIELDS,
  STATUS_MOVES,
  type DateField,
  type DatesInput,
  type PublishRulesInput,
  type SettingsSectionInput,
  type StatusChangeInput,
} from "@/lib/schemas/settings";
import { requireShowRole, type Viewer } from "@/lib/session";
import { acceptedPhotoFormats } from "@/storage/photo-processing";

/** What a show without a settings row uses; mirrors the column defaults in db/schema/settings.ts. */
export const DEFAULT_SETTINGS = {
  lateFeeFromAt: null as Date | null,
  entryFeeCents: 0,
  memberEntryFeeCents: 0,
  lateFeeCents: 0,
  critiqueFeeCents: 0,
  memberEmails: [] as string[],
  feeCapCents: null as number | null,
  withdrawalRefundPercent: 100,
  currency: "usd",
  maxEntriesPerEntrant: null as number | null,
  minQuiltSideUm: null as number | null,
  maxEntriesPerCategory: null as number | null,
  capacity: null as number | null,
  requiredPhotoViews: ["full", "detail"] as string[],
  photoMinWidthPx: 1000,
  photoMinHeightPx: 500,
  photoMaxBytes: 5_000_000,
  statementWordLimit: 150,
  techniques: ["pieced", "appliqué", "mixed", "art", "modern", "wholecloth", "paper piecing", "embroidery"] as string[],
  juried: false,
  publishNames: true,
  replyToEmail: "",
  categoryOverlap: "flag" as "flag" | "firstByPrecedence",
  /** 1 in (25,400 µm): within 1 in of the registered size, a common show rule. */
  sizeToleranceUm: 25_400,
  commentPolicy: "all" as "all" | "placed" | "none",
  quickPhrases: [] as string[],
  judgeFields: ["title", "size", "techniques", "quiltingMethod", "pattern"] as string[],
};

export type CurrentRules = { id: string; version: number; rulesText: string; releaseText: string; publishedAt: Date };

export type EffectiveSettings = typeof DEFAULT_SETTINGS & {
  showId: string;
  /** False while the show still runs on defaults (no settings row saved yet). */
  saved: boolean;
  updatedAt: Date | null;
  currentRules: CurrentRules | null;
  /** The photo formats taken, by label ("JPEG", "PNG", …), named the same on every screen. */
  photoFormats: string[];
};

const settingsColumns = {
  lateFeeFromAt: showSettings.lateFeeFromAt,
  entryFeeCents: showSettings.entryFeeCents,
  memberEntryFeeCents: showSettings.memberEntryFeeCents,
  lateFeeCents: showSettings.lateFeeCents,
  critiqueFeeCents: showSettings.critiqueFeeCents,
  memberEmails: showSettings.memberEmails,
  feeCapCents: showSettings.feeCapCents,
  withdrawalRefundPercent: showSettings.withdrawalRefundPercent,
  currency: showSettings.currency,
  maxEntriesPerEntrant: showSettings.maxEntriesPerEntrant,
  minQuiltSideUm: showSettings.minQuiltSideUm,
  maxEntriesPerCategory: showSettings.maxEntriesPerCategory,
  capacity: showSettings.capacity,
  requiredPhotoViews: showSettings.requiredPhotoViews,
  photoMinWidthPx: showSettings.photoMinWidthPx,
  photoMinHeightPx: showSettings.photoMinHeightPx,
  photoMaxBytes: showSettings.photoMaxBytes,
  statementWordLimit: showSettings.statementWordLimit,
  techniques: showSettings.techniques,
  juried: showSettings.juried,
  publishNames: showSettings.publishNames,
  replyToEmail: showSettings.replyToEmail,
  categoryOverlap: showSettings.categoryOverlap,
  sizeToleranceUm: showSettings.sizeToleranceUm,
  commentPolicy: showSettings.commentPolicy,
  quickPhrases: showSettings.quickPhrases,
  judgeFields: showSettings.judgeFields,
  updatedAt: showSettings.updatedAt,
};

type Reader = Pick<typeof db, "select">;

export async function currentRulesFor(reader: Reader, showId: string): Promise<CurrentRules | null> {
  const [rules] = await reader
    .select({
      id: showRulesVersions.id,
      version: showRulesVersions.version,
      rulesText: showRulesVersions.rulesText,
      releaseText: showRulesVersions.releaseText,
      publishedAt: showRulesVersions.publishedAt,
    })
    .from(showRulesVersions)
    .where(eq(showRulesVersions.showId, showId))
    .orderBy(desc(showRulesVersions.version))
    .limit(1);
  return rules ?? null;
}

/**
 * The settings a show runs on: its saved row, or the defaults when the chair has saved nothing
 * yet, plus the current (highest) rules version. No role check: callers are server code that
 * has already checked the viewer (entry form, payments).
 */
export async function settingsForShowId(showId: string, reader: Reader = db): Promise<EffectiveSettings> {
  const [row] = await reader.select(settingsColumns).from(showSettings).where(eq(showSettings.showId, showId)).limit(1);
  const currentRules = await currentRulesFor(reader, showId);
  // The photo formats every screen and message names: one list (lib/photo-formats.ts).
  const photoFormats = acceptedPhotoFormats();
  if (!row) return { ...DEFAULT_SETTINGS, requiredPhotoViews: [...DEFAULT_SETTINGS.requiredPhotoViews], techniques: [...DEFAULT_SETTINGS.techniques], memberEmails: [], quickPhrases: [], judgeFields: [...DEFAULT_SETTINGS.judgeFields], showId, saved: false, updatedAt: null, currentRules, photoFormats };
  const { updatedAt, categoryOverlap, commentPolicy, ...values } = row;
  const overlap = categoryOverlap === "firstByPrecedence" ? "firstByPrecedence" : "flag";
  const policy = commentPolicy === "placed" || commentPolicy === "none" ? commentPolicy : "all";
  return { ...values, categoryOverlap: overlap, commentPolicy: policy, showId, saved: true, updatedAt, currentRules, photoFormats };
}

// ── Reading ─────────────────────────────────────────────────────────────────────────────────────


/**
 * What the public show page shows about a show past its draft: the show, its fees, limits,
 * photo rules and the current rules and release text. Null for drafts and unknown shows.
 */
export async function publicShowDetails(slug: string) {
  const [show] = await db
    .select(publicShowColumns)
    .from(shows)
    .where(and(eq(shows.slug, slug), ne(shows.status, "draft")))
    .limit(1);
  if (!show) return null;
  const s = await settingsForShowId(show.id);
  return {
    show,
    fees: {
      currency: s.currency,
      entryFeeCents: s.entryFeeCents,
      memberEntryFeeCents: s.memberEntryFeeCents,
      lateFeeCents: s.lateFeeCents,
      lateFeeFromAt: s.lateFeeFromAt,
      critiqueFeeCents: s.critiqueFeeCents,
      feeCapCents: s.feeCapCents,
      withdrawalRefundPercent: s.withdrawalRefundPercent,
    },
    limits: { maxEntriesPerEntrant: s.maxEntriesPerEntrant, maxEntriesPerCategory: s.maxEntriesPerCategory, capacity: s.capacity },
    photos: {
      requiredPhotoViews: s.requiredPhotoViews,
      photoMinWidthPx: s.photoMinWidthPx,
      photoMinHeightPx: s.photoMinHeightPx,
      photoMaxBytes: s.photoMaxBytes,
      photoFormats: s.photoFormats,
      statementWordLimit: s.statementWordLimit,
      techniques: s.techniques,
    },
    juried: s.juried,
    currentRules: s.currentRules,
    categories: activeCategories(await categorySetFor(show.id)).map((c) => ({ id: c.id, code: c.code, name: c.name, description: c.description ?? "", conditions: c.conditions })),
  };
}
export type PublicShowDetails = NonNullable<Awaited<ReturnType<typeof publicShowDetails>>>;

/** Everything the chair's settings page shows: the show's dates, its settings, every rules version. */
export async function settingsForChair(viewer: Viewer, slug: string) {
  const { showId } = await requireShowRole(viewer, slug, ["chair"]);
  const [show] = await db.select(publicShowColumns).from(shows).where(eq(shows.id, showId)).limit(1);
  if (!show) throw new Error(`show ${showId} vanished after its role check`);
  const [settings, rulesHistory, [entryTotal]] = await Promise.all([
    settingsForShowId(showId),
    db
      .select({
        id: showRulesVersions.id,
        version: showRulesVersions.version,
        rulesText: showRulesVersions.rulesText,
        releaseText: showRulesVersions.releaseText,
        publishedAt: showRulesVersions.publishedAt,
        publishedByName: user.name,
      })
      .from(showRulesVersions)
      .leftJoin(user, eq(user.id, showRulesVersions.publishedBy))
      .where(eq(showRulesVersions.showId, showId))
      .orderBy(desc(showRulesVersions.version)),
    db.select({ n: count() }).from(entries).where(eq(entries.showId, showId)),
  ]);
  return { show, settings, rulesHistory, entryCount: entryTotal?.n ?? 0, allowedMoves: STATUS_MOVES[show.status], nextStage: NEXT_STAGE[show.status], stepBack: STEP_BACK[show.status] };
}
export type ChairSettings = Awaited<ReturnType<typeof settingsForChair>>;

// ── Writing ─────────────────────────────────────────────────────────────────────────────────────

const SHOW_DATE_FIELDS = Object.keys(DATE_FIELDS).filter((k) => k !== "lateFeeFromAt") as Exclude<DateField, "lateFeeFromAt">[];

export async function lockShow(tx: Tx, showId: string) {
  const [show] = await tx.select(publicShowColumns).from(shows).where(eq(shows.id, showId)).for("update");
  if (!show) throw new Error(`show ${showId} vanished after its role check`);
  return show;
}

const iso = (d: Date | null | undefined) => (d ? d.toISOString() : null);

/** Dates arrive as wall-clock text in the show's zone and are stored as UTC instants. */
export async function updateShowDates(viewer: Viewer, slug: string, input: DatesInput) {
  const { showId } = await requireShowRole(viewer, slug, ["chair"]);
  return db.transaction(async (tx) => {
    const show = await lockShow(tx, showId);
    const current = await settingsForShowId(showId, tx);
    const next: Record<DateField, Date | null> = {} as never;
    for (const field of Object.keys(DATE_FIELDS) as DateField[]) {
      const value = input[field];
      next[field] = value ? zonedInputToUtc(value, show.timeZone) : null;
      if (value && !next[field]) throw badInput("Some fields need attention.", { [field]: [`${DATE_FIELDS[field]}: that is not a real date and time.`] });
    }
    if (show.status === "entries_open" && !next.entryClosesAt) {
      throw badInput("Entries are open, so they need a closing date.", { entryClosesAt: ["Entries close: a show taking entries needs a closing date."] });
    }
    const before = Object.fromEntries([...SHOW_DATE_FIELDS.map((f) => [f, iso(show[f])]), ["lateFeeFromAt", iso(current.lateFeeFromAt)]]);
    const after = Object.fromEntries(Object.entries(next).map(([k, v]) => [k, iso(v)]));
    const { lateFeeFromAt, ...showDates } = next;
    await tx.update(shows).set({ ...showDates, updatedAt: new Date() }).where(eq(shows.id, showId));
    await tx
      .insert(showSettings)
      .values({ showId, lateFeeFromAt })
      .onConflictDoUpdate({ target: showSettings.showId, set: { lateFeeFromAt, updatedAt: new Date() } });
    await writeAudit(tx, { actorUserId: viewer.id, showId, action: "show.dates_updated", subjectType: "show", subjectId: showId, before, after });
    return { after: Object.fromEntries(Object.entries(next).map(([k, v]) => [k, utcToZonedInput(v, show.timeZone)])) };
  });
}

const SECTION_LABELS: Record<SettingsSectionInput["section"], string> = {
  fees: "Fees",
  limits: "Limits",
  photos: "Photos and statement",
  options: "Judging, names and mail",
};

/** Saves one section (fees, limits, photos, options); the other sections' columns are not touched. */
export async function updateShowSettings(viewer: Viewer, slug: string, input: SettingsSectionInput) {
  const { showId } = await requireShowRole(viewer, slug, ["chair"]);
  const { section, ...values } = input;
  return db.transaction(async (tx) => {
    // Lock the show so two saves of the first settings row can't race each other.
    await lockShow(tx, showId);
    const current = await settingsForShowId(showId, tx);
    const before = Object.fromEntries(Object.keys(values).map((k) => [k, current[k as keyof typeof values]]));
    await tx
      .insert(showSettings)
      .values({ showId, ...values })
      .onConflictDoUpdate({ target: showSettings.showId, set: { ...values, updatedAt: new Date() } });
    await writeAudit(tx, { actorUserId: viewer.id, showId, action: `settings.${section}_updated`, subjectType: "show_settings", subjectId: showId, before, after: values });
    return { section, label: SECTION_LABELS[section] };
  });
}

/** Publishes rules and release text as the next version; earlier versions are never changed. */
export async function publishRules(viewer: Viewer, slug: string, input: PublishRulesInput) {
  const { showId } = await requireShowRole(viewer, slug, ["chair"]);
  return db.transaction(async (tx) => {
    // The show's row lock serialises version numbers between two chairs publishing at once.
    await lockShow(tx, showId);
    const previous = await currentRulesFor(tx, showId);
    const version = (previous?.version ?? 0) + 1;
    const [row] = await tx
      .insert(showRulesVersions)
      .values({ showId, version, rulesText: input.rulesText, releaseText: input.releaseText, publishedBy: viewer.id })
      .returning({ id: showRulesVersions.id, version: showRulesVersions.version, publishedAt: showRulesVersions.publishedAt });
    if (!row) throw new Error("insert returned no row");
    await writeAudit(tx, {
      actorUserId: viewer.id,
      showId,
      action: "rules.published",
      subjectType: "show_rules_version",
      subjectId: row.id,
      before: previous ? { id: previous.id, version: previous.version } : null,
      after: { id: row.id, version, rulesText: input.rulesText, releaseText: input.releaseText },
    });
    return row;
  });
}

export const STATUS_WORDS: Record<string, string> = {
  draft: "being set up",
  entries_open: "taking entries",
  entries_closed: "entries closed",
  judging: "judging",
  results_published: "results out",
  archived: "finished",
};

/**
 * Moves the show between stages after the same check the chair saw (scoring/stage-moves.ts):
 * blockers refuse it (409 with the list); warnings and steps back need the chair's reason, kept in
 * the audit row with the warnings overridden.
 */
export async function changeShowStatus(viewer: Viewer, slug: string, input: StatusChangeInput, now: Date = new Date()) {
  const { showId } = await requireShowRole(viewer, slug, ["chair"]);
  return db.transaction(async (tx) => {
    const show = await lockShow(tx, showId);
    const from = show.status;
    const to = input.status;
    const check = checkStageMove(from, to, await stageCounts(tx, showId, now));
    if (check.blockers.length) throw conflict(check.blockers.join(" "), { status: check.blockers });
    const reason = input.reason?.trim() ?? "";
    if (needsReason(check) && !reason) {
      const why = check.stepBack ? "Going back a stage needs a reason." : "Say why you are going ahead despite the open items.";
      throw conflict(why, { reason: [why], warnings: check.warnings });
    }
    await tx.update(shows).set({ status: to, updatedAt: now }).where(eq(shows.id, showId));
    await writeAudit(tx, {
      actorUserId: viewer.id,
      showId,
      action: "show.status_changed",
      subjectType: "show",
      subjectId: showId,
      before: { status: from },
      after: { status: to, stepBack: check.stepBack, ...(reason ? { reason } : {}), ...(check.warnings.length ? { warningsOverridden: check.warnings } : {}) },
    });
    return { from, to };
  });
}
