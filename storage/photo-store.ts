// Saves the three JPEG versions of a processed photo to S3 under keys nobody has used before, so a
// new upload can never overwrite the photo already saved; the caller swaps its row only on success.
import "server-only";
import { randomUUID } from "node:crypto";
import type { ProcessedPhoto } from "./photo-processing";
import { deleteObject, putObject } from "./s3";

export type PhotoVersionKeys = { originalKey: string; webKey: string; thumbKey: string };

/**
 * Writes `${keyBase}/${fresh id}/original.jpg`, `…/web.jpg` and `…/thumb.jpg`. `keyBase` names the
 * photo (e.g. `shows/<show>/entries/<entry>/full`); each call gets its own id under it, so the
 * objects behind keys already stored in the database are never touched. If any upload fails, the
 * versions this call did write are removed (best effort) and the error is rethrown.
 */
export async function storePhotoVersions(keyBase: string, processed: ProcessedPhoto): Promise<PhotoVersionKeys> {
  assertKeyBase(keyBase);
  const prefix = `${keyBase}/${randomUUID()}`;
  const keys: PhotoVersionKeys = {
    originalKey: `${prefix}/original.jpg`,
    webKey: `${prefix}/web.jpg`,
    thumbKey: `${prefix}/thumb.jpg`,
  };
  const uploads = [
    { key: keys.originalKey, version: processed.original },
    { key: keys.webKey, version: processed.web },
    { key: keys.thumbKey, version: processed.thumb },
  ];
  const results = await Promise.allSettled(uploads.map((u) => putObject(u.key, u.version.buffer, u.version.contentType)));
  const failed = results.find((r): r is PromiseRejectedResult => r.status === "rejected");
  if (!failed) return keys;

  // Objects nobody points at yet: removing them only saves space, so a failure here is logged, not thrown.
  const written = uploads.filter((_, i) => results[i]!.status === "fulfilled").map((u) => u.key);
  await Promise.all(
    written.map((key) =>
      deleteObject(key).catch((err: unknown) => console.error("[photo-store] could not remove partial upload", { key, err })),
    ),
  );
  throw failed.reason;
}

/** Removes one stored set of versions, e.g. the previous photo once the row points at the new one. */
export async function deletePhotoVersions(keys: PhotoVersionKeys): Promise<void> {
  // S3 answers a DELETE of a missing key with success, so deleting twice is harmless.
  await Promise.all([deleteObject(keys.originalKey), deleteObject(keys.webKey), deleteObject(keys.thumbKey)]);
}

function assertKeyBase(keyBase: string): void {
  // A slash at either end or an empty/dot segment would give keys that S3 tools show oddly or that
  // collide across photos; this is a programming error, not the entrant's.
  const segments = keyBase.split("/");
  if (keyBase.length === 0 || segments.some((s) => s === "" || s === "." || s === "..")) {
    throw new Error(`photo-store: invalid key base ${JSON.stringify(keyBase)}`);
  }
}
