// An entrant's entry from first draft to submission: the draft, each saved step, the photos and
// the submission itself. The entrant who owns an entry may change it while the show takes entries;
// the show's chair may change any entry of their show at any time. Everyone else gets a 404.
import "server-only";
import { isUuid } from "@/lib/ids";
import { randomUUID } from "node:crypto";
import { and, desc, eq, notInArray, sql } from "drizzle-orm";
import { db, type Tx } from "@/db/client";
import { entries, entryPhotos, showEntryCounters, shows, type Entry } from "@/db/schema";
import { writeAudit } from "@/db/queries/audit";
import { settingsForShowId, type EffectiveSettings } from "@/db/queries/settings";
import { categoriesLocked, decideEntryTx, placeOnSubmission } from "@/db/queries/categories";
import { entryWindow } from "@/components/shows/entry-window";
import { formatDateTime } from "@/components/format/dates";
import { badInput, conflict, forbiddenError, notFound } from "@/lib/errors";
import { sendEntryReceivedMail } from "@/lib/entry-mails";
import {
  aboutStepSchemaFor,
  dollarsToCents,
  quiltSizeUm,
  type EntryPhotoView,
  type PhotoSize,
  type PhotoView,
  type SubmitInput,
} from "@/lib/schemas/entry";
import type { z } from "zod";
import type { aboutStepSchema, makersStepSchema, quiltStepSchema } from "@/lib/schemas/entry";
import { hasShowRole, type Viewer } from "@/lib/session";
import { entryGaps, UNSET_LENGTH_UM, type Gap } from "@/scoring/entry-completeness";
import { PhotoRejected, processPhoto } from "@/storage/photo-processing";
import { deletePhotoVersions, storePhotoVersions } from "@/storage/photo-store";
import { deleteObject, getObjectBytes, isMissing, presignPut } from "@/storage/s3";

type ShowFacts = { id: string; slug: string; name: string; timeZone: string; status: string; entryOpensAt: Date | null; entryClosesAt: Date | null };

const showFacts = {
  id: shows.id,
  slug: shows.slug,
  name: shows.name,
  timeZone: shows.timeZone,
  status: shows.status,
  entryOpensAt: shows.entryOpensAt,
  entryClosesAt: shows.entryClosesAt,
};

/** Statuses in which the entrant still owns the paperwork; later the show has the quilt. */
const ENTRANT_EDITABLE = new Set(["draft", "submitted", "paid"]);
/** Entries that hold one of the entrant's places (the per-entrant limit). */
const NOT_COUNTED_FOR_ENTRANT = ["draft", "withdrawn"] as const;
/** Entries that hold one of the show's places (capacity). */
const NOT_COUNTED_FOR_CAPACITY = ["draft", "withdrawn", "declined"] as const;


type Access = { entry: Entry; show: ShowFacts; isChair: boolean };

/** The entry if the viewer owns it or chairs its show; a 404 for anyone else, so ids confirm nothing. */
async function entryAccess(viewer: Viewer, entryId: string, reader: Pick<Tx, "select"> = db, lock = false): Promise<Access> {
  if (!isUuid(entryId)) throw notFound("There is no such entry.");
  const query = reader.select({ entry: entries, show: showFacts }).from(entries).innerJoin(shows, eq(shows.id, entries.showId)).where(eq(entries.id, entryId));
  const [row] = lock ? await query.for("update", { of: entries }) : await query;
  if (!row) throw notFound("There is no such entry.");
  const isChair = hasShowRole(viewer, row.show.id, ["chair"]);
  if (row.entry.entrantUserId !== viewer.id && !isChair) throw notFound("There is no such entry.");
  return { ...row, isChair };
}

/** Why this viewer may not change the entry now, in words for them; null when they may. */
export function editBlock(a: { entry: Pick<Entry, "status">; show: ShowFacts; isChair: boolean }, now = new Date()): string | null {
  if (a.entry.status === "withdrawn") return "This entry was withdrawn, so it can't be changed.";
  if (a.isChair) return null;
  if (!ENTRANT_EDITABLE.has(a.entry.status)) {
    return "The show is already handling this entry; ask the show's chair if something needs changing.";
  }
  const window = entryWindow(a.show, now);
  if (window === "closed") {
    const when = formatDateTime(a.show.entryClosesAt, a.show.timeZone);
    return `Entries for ${a.show.name} closed${when ? ` on ${when}` : ""}. You can still read your entry, but not change it.`;
  }
  if (window === "not_yet") return `${a.show.name} is not taking entries yet.`;
  return null;
}

function assertEditable(a: Access): void {
  const block = editBlock(a);
  if (block) throw conflict(block);
}

// ---- Drafts ------------------------------------------------------------------------------------

/** Resumes the viewer's latest draft for the show, or starts one (always a new one with `fresh`). */
export async function createDraft(viewer: Viewer, showSlug: string, opts: { fresh?: boolean } = {}): Promise<{ entryId: string; resumed: boolean }> {
  const [show] = await db.select(showFacts).from(shows).where(eq(shows.slug, showSlug)).limit(1);
  if (!show || show.status === "draft") throw notFound("There is no show at this address.");
  const [draft] = await db
    .select({ id: entries.id })
    .from(entries)
    .where(and(eq(entries.showId, show.id), eq(entries.entrantUserId, viewer.id), eq(entries.status, "draft")))
    .orderBy(desc(entries.updatedAt))
    .limit(1);
  if (draft && !opts.fresh) return { entryId: draft.id, resumed: true };
  const window = entryWindow(show);
  if (window !== "open") throw conflict(window === "closed" ? `Entries for ${show.name} have closed.` : `${show.name} is not taking entries yet.`);
  const entryId = await db.transaction(async (tx) => {
    const [row] = await tx
      .insert(entries)
      .values({
        showId: show.id,
        entrantUserId: viewer.id,
        title: "",
        // The table insists on a positive size; the placeholder reads as "not given yet".
        widthUm: UNSET_LENGTH_UM,
        lengthUm: UNSET_LENGTH_UM,
        quiltingMethod: "home_machine",
        status: "draft",
      })
      .returning({ id: entries.id });
    await writeAudit(tx, { actorUserId: viewer.id, showId: show.id, action: "entry.draft_created", subjectType: "entry", subjectId: row!.id });
    return row!.id;
  });
  return { entryId, resumed: false };
}

// ---- Reading -----------------------------------------------------------------------------------

export type EntryForForm = Awaited<ReturnType<typeof entryForEntrant>>;

/** Everything the entry form and its review page show, for the owner or the show's chair. */
export async function entryForEntrant(viewer: Viewer, entryId: string) {
  const a = await entryAccess(viewer, entryId);
  const settings = await settingsForShowId(a.show.id);
  const photos = await photosOf(db, a.entry.id);
  const e = a.entry;
  const entry = {
    id: e.id,
    entryNumber: e.entryNumber,
    status: e.status,
    waitlisted: e.waitlisted,
    submittedAt: e.submittedAt,
    rulesAcceptedAt: e.rulesAcceptedAt,
    title: e.title,
    sizeUnit: (e.sizeUnit === "cm" ? "cm" : "in") as "in" | "cm",
    widthUm: e.widthUm > UNSET_LENGTH_UM ? e.widthUm : null,
    lengthUm: e.lengthUm > UNSET_LENGTH_UM ? e.lengthUm : null,
    techniques: e.techniques,
    madeBy: e.madeBy,
    // Until the makers step is saved, no quilting method has really been chosen.
    quiltingMethod: e.madeBy.length ? e.quiltingMethod : null,
    quiltedByKind: (e.quiltedForHire ? "hire" : e.quiltedBy ? "other" : "self") as "self" | "other" | "hire",
    quiltedBy: e.quiltedBy,
    patternSource: e.patternSource === "original" ? "original" : ("pattern" as "original" | "pattern"),
    patternName: e.patternName,
    patternDesigner: e.patternDesigner,
    statement: e.statement,
    declaredValueCents: e.declaredValueCents,
    forSale: e.forSale,
    priceCents: e.priceCents,
    judged: e.judged,
    division: e.division,
    youthAge: e.youthAge,
  };
  return {
    entry,
    show: a.show,
    photos,
    settings,
    viewerIsChair: a.isChair,
    viewerIsOwner: e.entrantUserId === viewer.id,
    editBlock: editBlock(a),
    gaps: missingForEntry({ ...e, photoViews: photos.map((p) => p.view) }, settings),
  };
}

/** What the entry still lacks (see scoring/entry-completeness.ts), with this show's settings. */
export function missingForEntry(entry: Entry & { photoViews: readonly string[] }, settings: Pick<EffectiveSettings, "statementWordLimit" | "requiredPhotoViews">): Gap[] {
  return entryGaps(entry, settings);
}

async function photosOf(reader: Pick<Tx, "select">, entryId: string): Promise<EntryPhotoView[]> {
  return reader
    .select({ id: entryPhotos.id, view: entryPhotos.view, widthPx: entryPhotos.widthPx, heightPx: entryPhotos.heightPx, bytes: entryPhotos.bytes })
    .from(entryPhotos)
    .where(eq(entryPhotos.entryId, entryId));
}

// ---- Saving a step -----------------------------------------------------------------------------

export type StepInput =
  | { step: "quilt"; input: z.output<typeof quiltStepSchema> }
  | { step: "makers"; input: z.output<typeof makersStepSchema> }
  | { step: "about"; input: z.output<typeof aboutStepSchema> };

export async function saveEntryStep(viewer: Viewer, entryId: string, { step, input }: StepInput): Promise<void> {
  const first = await entryAccess(viewer, entryId);
  const settings = await settingsForShowId(first.show.id);
  const changes = columnsFor({ step, input } as StepInput, settings);
  await db.transaction(async (tx) => {
    const a = await entryAccess(viewer, entryId, tx, true);
    assertEditable(a);
    const [saved] = await tx.update(entries).set({ ...changes, updatedAt: new Date() }).where(eq(entries.id, entryId)).returning();
    await writeAudit(tx, { actorUserId: viewer.id, showId: a.show.id, action: `entry.${step}_saved`, subjectType: "entry", subjectId: entryId, after: changes });
    // A sent entry is placed again whenever what the rules read changes (size, techniques, makers…).
    if (saved && saved.status !== "draft" && !categoriesLocked(a.show.status)) await decideEntryTx(tx, saved, viewer.id, `${step} step saved`);
  });
}

function columnsFor({ step, input }: StepInput, settings: EffectiveSettings): Partial<typeof entries.$inferInsert> {
  if (step === "quilt") {
    const unknown = input.techniques.filter((t) => !settings.techniques.includes(t));
    if (unknown.length) throw badInput("Some fields need attention.", { techniques: [`This show doesn't list ${unknown.join(", ")}; choose from its techniques.`] });
    return { title: input.title, sizeUnit: input.sizeUnit, ...quiltSizeUm(input), techniques: [...new Set(input.techniques)] };
  }
  if (step === "makers") {
    return {
      madeBy: input.madeBy.map((r) => r.name),
      quiltedBy: input.quiltedByKind === "self" ? "" : input.quiltedByName,
      quiltedForHire: input.quiltedByKind === "hire",
      quiltingMethod: input.quiltingMethod,
      patternSource: input.patternSource,
      patternName: input.patternSource === "pattern" ? input.patternName : "",
      patternDesigner: input.patternSource === "pattern" ? input.patternDesigner : "",
    };
  }
  // The word limit is the show's: checked here with the same schema the form used.
  const checked = aboutStepSchemaFor(settings.statementWordLimit).safeParse(input);
  if (!checked.success) {
    const fieldErrors: Record<string, string[]> = {};
    for (const issue of checked.error.issues) (fieldErrors[issue.path.join(".") || "_form"] ??= []).push(issue.message);
    throw badInput("Some fields need attention.", fieldErrors);
  }
  return {
    statement: input.statement,
    declaredValueCents: dollarsToCents(input.declaredValue) ?? 0,
    forSale: input.forSale,
    priceCents: input.forSale && input.price ? dollarsToCents(input.price) : null,
    judged: input.judged === "judged",
    division: input.division,
    youthAge: input.division === "youth" ? Number(input.youthAge) : null,
  };
}

// ---- Submission --------------------------------------------------------------------------------

export type SubmitResult = { entryNumber: number; waitlisted: boolean };

export async function submitEntry(viewer: Viewer, entryId: string, input: SubmitInput): Promise<SubmitResult> {
  const first = await entryAccess(viewer, entryId);
  const settings = await settingsForShowId(first.show.id);
  const result = await db.transaction(async (tx) => {
    // Every submission to this show takes the counter row first, so numbers, the per-entrant
    // limit and capacity are decided one submission at a time.
    await tx.insert(showEntryCounters).values({ showId: first.show.id, lastNumber: 100 }).onConflictDoNothing();
    const [counter] = await tx.select({ lastNumber: showEntryCounters.lastNumber }).from(showEntryCounters).where(eq(showEntryCounters.showId, first.show.id)).for("update");
    const a = await entryAccess(viewer, entryId, tx, true);
    if (a.entry.status !== "draft") throw conflict("This entry has already been sent to the show.");
    assertEditable(a);

    const rules = settings.currentRules;
    if (rules && input.rulesVersionId !== rules.id) {
      throw conflict("The show's rules have changed since you opened this page. Please read them again and accept the new version.");
    }
    const photos = await photosOf(tx, entryId);
    const gaps = missingForEntry({ ...a.entry, photoViews: photos.map((p) => p.view) }, settings);
    if (gaps.length) throw badInput("This entry isn't complete yet.", { _form: gaps.map((g) => `Still missing: ${g.message}.`) });

    if (settings.maxEntriesPerEntrant !== null) {
      const [mine] = await tx
        .select({ n: sql<number>`count(*)::int` })
        .from(entries)
        .where(and(eq(entries.showId, a.show.id), eq(entries.entrantUserId, a.entry.entrantUserId), notInArray(entries.status, [...NOT_COUNTED_FOR_ENTRANT])));
      if ((mine?.n ?? 0) >= settings.maxEntriesPerEntrant) {
        throw conflict(`${a.show.name} takes at most ${settings.maxEntriesPerEntrant} ${settings.maxEntriesPerEntrant === 1 ? "entry" : "entries"} per entrant, and you have sent that many. Your draft is kept.`);
      }
    }
    let waitlisted = false;
    if (settings.capacity !== null) {
      const [taken] = await tx
        .select({ n: sql<number>`count(*)::int` })
        .from(entries)
        .where(and(eq(entries.showId, a.show.id), eq(entries.waitlisted, false), notInArray(entries.status, [...NOT_COUNTED_FOR_CAPACITY])));
      waitlisted = (taken?.n ?? 0) >= settings.capacity;
    }

    // The category, the entrant's per-category limit and the category's cap.
    const placed = await placeOnSubmission(tx, a.entry, { maxEntriesPerCategory: settings.maxEntriesPerCategory, toleranceUm: settings.sizeToleranceUm });
    const waitlistReason = waitlisted ? `${a.show.name} is full (${settings.capacity} entries).` : placed.waitlistReason;
    waitlisted = waitlisted || placed.waitlistReason !== "";

    const entryNumber = (counter?.lastNumber ?? 100) + 1;
    const now = new Date();
    await tx.update(showEntryCounters).set({ lastNumber: entryNumber }).where(eq(showEntryCounters.showId, a.show.id));
    await tx
      .update(entries)
      .set({ ...placed.columns, entryNumber, status: "submitted", submittedAt: now, waitlisted, waitlistReason, rulesVersionId: rules?.id ?? null, rulesAcceptedAt: now, updatedAt: now })
      .where(eq(entries.id, entryId));
    await writeAudit(tx, {
      actorUserId: viewer.id,
      showId: a.show.id,
      action: "entry.submitted",
      subjectType: "entry",
      subjectId: entryId,
      before: { status: "draft" },
      after: { status: "submitted", entryNumber, waitlisted, waitlistReason, rulesVersionId: rules?.id ?? null, categoryState: placed.placement.outcome.state, categoryId: placed.columns.categoryId, categoryReasons: placed.placement.reasons },
    });
    return { entryNumber, waitlisted };
  });
  try {
    await sendEntryReceivedMail([entryId]);
  } catch (err) {
    // The entry is in; a lost mail must not undo that.
    console.error("[entries] entry-received mail failed", { entryId, err });
  }
  return result;
}

// ---- Photos ------------------------------------------------------------------------------------

const UPLOAD_URL_SECONDS = 10 * 60;
const uploadPrefix = (entryId: string, view: string) => `uploads/entries/${entryId}/${view}/`;

function allowedViews(settings: EffectiveSettings): string[] {
  return [...new Set([...settings.requiredPhotoViews, "other"])];
}

/** A presigned PUT for the raw upload, to a private key only this entry's attach step accepts. */
export async function presignEntryPhoto(viewer: Viewer, entryId: string, view: PhotoView, contentType: string, bytes: number) {
  const a = await entryAccess(viewer, entryId);
  assertEditable(a);
  const settings = await settingsForShowId(a.show.id);
  if (!allowedViews(settings).includes(view)) throw badInput("This show doesn't ask for that view.", { view: ["Choose one of the views the show asks for."] });
  if (bytes > settings.photoMaxBytes) {
    const mb = (n: number) => `${Number((n / 1_000_000).toFixed(1))} MB`;
    throw badInput(`The photo is ${mb(bytes)}; this show accepts up to ${mb(settings.photoMaxBytes)}.`, { bytes: ["The file is too large."] });
  }
  const uploadKey = `${uploadPrefix(entryId, view)}${randomUUID()}`;
  return { uploadUrl: await presignPut(uploadKey, contentType, UPLOAD_URL_SECONDS), uploadKey, maxBytes: settings.photoMaxBytes };
}

export type AttachedPhoto = EntryPhotoView & { thumbUrl: string; webUrl: string };

/**
 * Checks the uploaded file (processPhoto), stores its clean versions and swaps the entry's photo
 * row for that view in one transaction. A refused file leaves the saved photo as it was.
 */
export async function attachEntryPhoto(viewer: Viewer, entryId: string, view: PhotoView, uploadKey: string): Promise<AttachedPhoto> {
  const a = await entryAccess(viewer, entryId);
  assertEditable(a);
  if (!uploadKey.startsWith(uploadPrefix(entryId, view)) || !isUuid(uploadKey.slice(uploadPrefix(entryId, view).length))) {
    throw badInput("That upload doesn't belong to this photo; please choose the file again.", { uploadKey: ["Unknown upload."] });
  }
  const settings = await settingsForShowId(a.show.id);
  let raw: Buffer;
  try {
    raw = await getObjectBytes(uploadKey);
  } catch (err) {
    if (isMissing(err)) throw badInput("We didn't receive the file; please choose it again.", { photo: ["The upload did not arrive."] });
    throw err;
  }
  let processed;
  try {
    processed = await processPhoto(raw, { maxBytes: settings.photoMaxBytes, minWidthPx: settings.photoMinWidthPx, minHeightPx: settings.photoMinHeightPx });
  } catch (err) {
    await removeUpload(uploadKey);
    if (err instanceof PhotoRejected) throw badInput(err.message, { photo: [err.message] });
    throw err;
  }
  const keys = await storePhotoVersions(`shows/${a.show.id}/entries/${entryId}/${view}`, processed);
  let swapped: { row: EntryPhotoView; old: { storageKey: string; webKey: string | null; thumbKey: string | null } | undefined };
  try {
    swapped = await db.transaction(async (tx) => {
      const locked = await entryAccess(viewer, entryId, tx, true);
      assertEditable(locked);
      const [old] = await tx
        .select({ storageKey: entryPhotos.storageKey, webKey: entryPhotos.webKey, thumbKey: entryPhotos.thumbKey })
        .from(entryPhotos)
        .where(and(eq(entryPhotos.entryId, entryId), eq(entryPhotos.view, view)))
        .for("update");
      if (old) await tx.delete(entryPhotos).where(and(eq(entryPhotos.entryId, entryId), eq(entryPhotos.view, view)));
      const [row] = await tx
        .insert(entryPhotos)
        .values({
          entryId,
          view,
          storageKey: keys.originalKey,
          webKey: keys.webKey,
          thumbKey: keys.thumbKey,
          widthPx: processed.original.widthPx,
          heightPx: processed.original.heightPx,
          bytes: processed.original.bytes,
          contentType: processed.original.contentType,
        })
        .returning({ id: entryPhotos.id, view: entryPhotos.view, widthPx: entryPhotos.widthPx, heightPx: entryPhotos.heightPx, bytes: entryPhotos.bytes });
      await tx.update(entries).set({ updatedAt: new Date() }).where(eq(entries.id, entryId));
      await writeAudit(tx, {
        actorUserId: viewer.id,
        showId: a.show.id,
        action: old ? "entry.photo_replaced" : "entry.photo_added",
        subjectType: "entry",
        subjectId: entryId,
        after: { view, photoId: row!.id, widthPx: row!.widthPx, heightPx: row!.heightPx },
      });
      return { row: row!, old };
    });
  } catch (err) {
    await deletePhotoVersions(keys).catch((e: unknown) => console.error("[entries] could not remove unused photo versions", { keys, e }));
    await removeUpload(uploadKey);
    throw err;
  }
  // After commit: nothing points at the old versions or the raw upload any more.
  if (swapped.old) {
    const { storageKey, webKey, thumbKey } = swapped.old;
    await deletePhotoVersions({ originalKey: storageKey, webKey: webKey ?? storageKey, thumbKey: thumbKey ?? storageKey }).catch((err: unknown) =>
      console.error("[entries] could not remove replaced photo versions", { storageKey, err }),
    );
  }
  await removeUpload(uploadKey);
  return { ...swapped.row, ...photoUrls(swapped.row.id) };
}

export const photoUrls = (photoId: string) => ({ thumbUrl: `/api/photos/${photoId}/thumb`, webUrl: `/api/photos/${photoId}/web` });

async function removeUpload(key: string): Promise<void> {
  await deleteObject(key).catch((err: unknown) => console.error("[entries] could not remove raw upload", { key, err }));
}

/** Which stored object a viewer may see: the entrant who owns it, or the show's chair, intake, judges and scribes. */
export async function photoForViewer(viewer: Viewer, photoId: string, size: PhotoSize = "web"): Promise<{ key: string; contentType: string }> {
  if (!isUuid(photoId)) throw notFound("There is no such photo.");
  const [row] = await db
    .select({ storageKey: entryPhotos.storageKey, webKey: entryPhotos.webKey, thumbKey: entryPhotos.thumbKey, contentType: entryPhotos.contentType, showId: entries.showId, entrantUserId: entries.entrantUserId })
    .from(entryPhotos)
    .innerJoin(entries, eq(entries.id, entryPhotos.entryId))
    .where(eq(entryPhotos.id, photoId));
  if (!row) throw notFound("There is no such photo.");
  const allowed = row.entrantUserId === viewer.id || hasShowRole(viewer, row.showId, ["chair", "intake", "judge", "scribe"]);
  if (!allowed) throw forbiddenError("This photo belongs to another entrant.");
  const key = size === "thumb" ? (row.thumbKey ?? row.storageKey) : size === "web" ? (row.webKey ?? row.storageKey) : row.storageKey;
  return { key, contentType: row.contentType };
}
