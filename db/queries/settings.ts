// A show's settings: the effective values (row or schema defaults) with the current rules
// version, the public page's view of them, and the chair's audited changes.
import "server-only";
import { desc, eq } from "drizzle-orm";
import { db } from "@/db/client";
import { showRulesVersions, showSettings } from "@/db/schema";

/** What a show without a settings row uses; mirrors the column defaults in db/schema/settings.ts. */
export const DEFAULT_SETTINGS = {
  lateFeeFromAt: null as Date | null,
  entryFeeCents: 0,
  memberEntryFeeCents: 0,
  lateFeeCents: 0,
  critiqueFeeCents: 0,
  feeCapCents: null as number | null,
  withdrawalRefundPercent: 100,
  currency: "usd",
  maxEntriesPerEntrant: null as number | null,
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
};

export type CurrentRules = { id: string; version: number; rulesText: string; releaseText: string; publishedAt: Date };

export type EffectiveSettings = typeof DEFAULT_SETTINGS & {
  showId: string;
  /** False while the show still runs on defaults (no settings row saved yet). */
  saved: boolean;
  updatedAt: Date | null;
  currentRules: CurrentRules | null;
};

const settingsColumns = {
  lateFeeFromAt: showSettings.lateFeeFromAt,
  entryFeeCents: showSettings.entryFeeCents,
  memberEntryFeeCents: showSettings.memberEntryFeeCents,
  lateFeeCents: showSettings.lateFeeCents,
  critiqueFeeCents: showSettings.critiqueFeeCents,
  feeCapCents: showSettings.feeCapCents,
  withdrawalRefundPercent: showSettings.withdrawalRefundPercent,
  currency: showSettings.currency,
  maxEntriesPerEntrant: showSettings.maxEntriesPerEntrant,
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
  updatedAt: showSettings.updatedAt,
};

type Reader = Pick<typeof db, "select">;

async function currentRulesFor(reader: Reader, showId: string): Promise<CurrentRules | null> {
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
  if (!row) return { ...DEFAULT_SETTINGS, requiredPhotoViews: [...DEFAULT_SETTINGS.requiredPhotoViews], techniques: [...DEFAULT_SETTINGS.techniques], showId, saved: false, updatedAt: null, currentRules };
  const { updatedAt, ...values } = row;
  return { ...values, showId, saved: true, updatedAt, currentRules };
}
