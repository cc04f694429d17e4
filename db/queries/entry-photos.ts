// An entry's photos: a presigned upload to a private key, the check and clean-up of the uploaded
// file before it is attached, and serving the bytes only to those who may see them (photoForViewer).
import "server-only";
import { randomUUID } from "node:crypto";
import { and, eq } from "drizzle-orm";
import { db } from "@/db/client";
import { entries, entryPhotos } from "@/db/schema";
import { writeAudit } from "@/db/queries/audit";
import { inSessions, judgingScope } from "@/db/queries/judging-scope";
import { assertEditable, entryAccess } from "@/db/queries/entry-access";
import { settingsForShowId, type EffectiveSettings } from "@/db/queries/settings";
import { badInput, notFound } from "@/lib/errors";
import { isUuid } from "@/lib/ids";
import type { EntryPhotoView, PhotoSize, PhotoView } from "@/lib/schemas/entry";
import { hasShowRole, type Viewer } from "@/lib/session";
import { PhotoRejected, processPhoto, tooLarge } from "@/storage/photo-processing";
import { deletePhotoVersions, storePhotoVersions } from "@/storage/photo-store";
import { deleteObject, getObjectBytesUpTo, isMissing, ObjectTooLarge, objectSize, presignPost } from "@/storage/s3";

const UPLOAD_URL_SECONDS = 10 * 60;
const uploadPrefix = (entryId: string, view: string) => `uploads/entries/${entryId}/${view}/`;

function allowedViews(settings: EffectiveSettings): string[] {
  return [...new Set([...settings.requiredPhotoViews, "other"])];
}

/**
 * A presigned form POST for the raw upload, to a private key only this entry's attach step
 * accepts; its policy binds the type and the show's size limit, so the store refuses a larger file.
 */
export async function presignEntryPhoto(viewer: Viewer, entryId: string, view: PhotoView, contentType: string, bytes: number) {
  const a = await entryAccess(viewer, entryId);
  assertEditable(a);
  const settings = await settingsForShowId(a.show.id);
  if (!allowedViews(settings).includes(view)) throw badInput("This show doesn't ask for that view.", { view: ["Choose one of the views the show asks for."] });
  if (bytes > settings.photoMaxBytes) throw badInput(tooLarge(bytes, settings.photoMaxBytes).message, { bytes: ["The file is too large."] });
  const uploadKey = `${uploadPrefix(entryId, view)}${randomUUID()}`;
  const { url, fields } = await presignPost(uploadKey, contentType, settings.photoMaxBytes, UPLOAD_URL_SECONDS);
  return { uploadUrl: url, uploadFields: fields, uploadKey, maxBytes: settings.photoMaxBytes };
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
  const raw = await readUpload(uploadKey, settings.photoMaxBytes);
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

/**
 * The raw upload, read only when its stored size is within the show's limit: the size from the
 * object's headers first (any store, whether or not it enforced the upload policy), then a read
 * that stops at the limit. A refused upload is removed.
 */
async function readUpload(uploadKey: string, maxBytes: number): Promise<Buffer> {
  let bytesOver: number;
  try {
    const stored = await objectSize(uploadKey);
    if (stored <= maxBytes) return await getObjectBytesUpTo(uploadKey, maxBytes);
    bytesOver = stored;
  } catch (err) {
    if (isMissing(err)) throw badInput("We didn't receive the file; please choose it again.", { photo: ["The upload did not arrive."] });
    if (!(err instanceof ObjectTooLarge)) throw err;
    bytesOver = err.bytesSeen;
  }
  await removeUpload(uploadKey);
  const refused = tooLarge(bytesOver, maxBytes);
  throw badInput(refused.message, { photo: [refused.message] });
}

async function removeUpload(key: string): Promise<void> {
  await deleteObject(key).catch((err: unknown) => console.error("[entries] could not remove raw upload", { key, err }));
}

/**
 * Which stored object a viewer may see: the entrant who owns it and the show's chair always;
 * intake once the entry is sent (they check quilts in); a judge or scribe only for an entry of
 * their own sessions (judging-scope.ts). Drafts are the owner's and the chair's alone. Everyone
 * else gets the same 404 as a missing photo, so an id confirms nothing.
 */
export async function photoForViewer(viewer: Viewer, photoId: string, size: PhotoSize = "web"): Promise<{ key: string; contentType: string }> {
  const missing = () => notFound("There is no such photo.");
  if (!isUuid(photoId)) throw missing();
  const [row] = await db
    .select({ storageKey: entryPhotos.storageKey, webKey: entryPhotos.webKey, thumbKey: entryPhotos.thumbKey, contentType: entryPhotos.contentType, entryId: entries.id, showId: entries.showId, entrantUserId: entries.entrantUserId, status: entries.status })
    .from(entryPhotos)
    .innerJoin(entries, eq(entries.id, entryPhotos.entryId))
    .where(eq(entryPhotos.id, photoId));
  if (!row) throw missing();
  const found = { key: keyForSize(row, size), contentType: row.contentType };
  if (row.entrantUserId === viewer.id || hasShowRole(viewer, row.showId, ["chair"])) return found;
  if (row.status === "draft") throw missing();
  if (hasShowRole(viewer, row.showId, ["intake"])) return found;
  if (hasShowRole(viewer, row.showId, ["judge", "scribe"])) {
    const { categoryIds } = await judgingScope(db, row.showId, viewer.id);
    const [inSession] = categoryIds.length ? await db.select({ id: entries.id }).from(entries).where(and(eq(entries.id, row.entryId), inSessions(row.showId, categoryIds))) : [];
    if (inSession) return found;
  }
  throw missing();
}

/** The stored version of a photo for a size; the original where that version was never made. */
export function keyForSize(row: { storageKey: string; webKey: string | null; thumbKey: string | null }, size: PhotoSize): string {
  if (size === "thumb") return row.thumbKey ?? row.storageKey;
  if (size === "web") return row.webKey ?? row.storageKey;
  return row.storageKey;
}
