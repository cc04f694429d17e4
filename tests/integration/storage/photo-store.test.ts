// Photo versions on the local S3 fake: a good photo is stored under fresh keys, a bad upload (or a
// failed one) leaves the saved photo byte-identical, and old versions live until deleted.
import { randomUUID } from "node:crypto";
import { ListObjectsV2Command } from "@aws-sdk/client-s3";
import { beforeAll, describe, expect, it, vi } from "vitest";
import { env } from "@/lib/env";
import { PhotoRejected, processPhoto, type PhotoRules } from "@/storage/photo-processing";
import { deletePhotoVersions, storePhotoVersions, type PhotoVersionKeys } from "@/storage/photo-store";
import { ensureBucket, getObjectBytes, isMissing, s3 } from "@/storage/s3";
import { pdfBytes, phoneStyleJpeg, pngOf } from "@/tests/helpers/photo-fixtures";

// Lets one test make the thumb upload fail, to prove a half-written new photo is cleaned up and
// the saved one untouched. Every other call is the real S3 helper.
const failing = vi.hoisted(() => ({ thumbUpload: false }));
vi.mock("@/storage/s3", async (importOriginal) => {
  const real = await importOriginal<typeof import("@/storage/s3")>();
  return {
    ...real,
    putObject: async (key: string, body: Buffer, contentType: string) => {
      if (failing.thumbUpload && key.endsWith("/thumb.jpg")) throw new Error("simulated S3 outage");
      return real.putObject(key, body, contentType);
    },
  };
});

const rules: PhotoRules = { maxBytes: 5_000_000, minWidthPx: 1000, minHeightPx: 500 };
const keyBase = `tests/photo-store/${randomUUID()}/full`;

/** What an upload handler does: process, then store; the caller keeps the old keys on any error. */
async function upload(bytes: Buffer): Promise<PhotoVersionKeys> {
  return storePhotoVersions(keyBase, await processPhoto(bytes, rules));
}

async function keysUnder(prefix: string): Promise<string[]> {
  const res = await s3.send(new ListObjectsV2Command({ Bucket: env.S3_BUCKET, Prefix: `${prefix}/` }));
  return (res.Contents ?? []).map((o) => o.Key!).sort();
}

async function missing(key: string): Promise<boolean> {
  return getObjectBytes(key).then(
    () => false,
    (err: unknown) => isMissing(err),
  );
}

beforeAll(async () => {
  await ensureBucket();
});

describe("storage/photo-store", () => {
  let first: PhotoVersionKeys;
  let savedOriginal: Buffer;

  it("stores the three versions of a good photo under a fresh id below the key base", async () => {
    const processed = await processPhoto(await phoneStyleJpeg({ widthPx: 1600, heightPx: 1200, orientation: 6, gps: true }), rules);
    first = await storePhotoVersions(keyBase, processed);
    const id = first.originalKey.slice(keyBase.length + 1).split("/")[0]!;
    expect(id).toMatch(/^[0-9a-f-]{36}$/);
    expect(first).toEqual({
      originalKey: `${keyBase}/${id}/original.jpg`,
      webKey: `${keyBase}/${id}/web.jpg`,
      thumbKey: `${keyBase}/${id}/thumb.jpg`,
    });
    savedOriginal = await getObjectBytes(first.originalKey);
    expect(Buffer.compare(savedOriginal, processed.original.buffer)).toBe(0);
    expect(Buffer.compare(await getObjectBytes(first.webKey), processed.web.buffer)).toBe(0);
    expect(Buffer.compare(await getObjectBytes(first.thumbKey), processed.thumb.buffer)).toBe(0);
  });

  it("refuses a bad upload (a PDF) and leaves the saved original byte-identical", async () => {
    const err = await upload(pdfBytes()).catch((e: unknown) => e);
    expect(err).toBeInstanceOf(PhotoRejected);
    expect((err as PhotoRejected).code).toBe("not_an_image");
    expect(Buffer.compare(await getObjectBytes(first.originalKey), savedOriginal)).toBe(0);
    expect(await keysUnder(keyBase)).toEqual([first.originalKey, first.thumbKey, first.webKey].sort());
  });

  it("when an upload fails halfway, removes what it wrote and leaves the saved photo alone", async () => {
    failing.thumbUpload = true;
    try {
      await expect(upload(await pngOf(1200, 800))).rejects.toThrow("simulated S3 outage");
    } finally {
      failing.thumbUpload = false;
    }
    expect(Buffer.compare(await getObjectBytes(first.originalKey), savedOriginal)).toBe(0);
    expect(await keysUnder(keyBase)).toEqual([first.originalKey, first.thumbKey, first.webKey].sort());
  });

  it("gives a second good upload new keys; the first keys still exist until deleted", async () => {
    const second = await upload(await pngOf(1200, 800));
    expect(second.originalKey).not.toBe(first.originalKey);
    expect(second.webKey).not.toBe(first.webKey);
    expect(second.thumbKey).not.toBe(first.thumbKey);
    expect(Buffer.compare(await getObjectBytes(first.originalKey), savedOriginal)).toBe(0);
    expect(await missing(first.webKey)).toBe(false);
    expect(await missing(first.thumbKey)).toBe(false);

    await deletePhotoVersions(first);
    for (const key of Object.values(first)) expect(await missing(key)).toBe(true);
    for (const key of Object.values(second)) expect(await missing(key)).toBe(false);

    await deletePhotoVersions(first); // deleting again is harmless
    await deletePhotoVersions(second);
    expect(await keysUnder(keyBase)).toEqual([]);
  });

  it("refuses a key base that would give odd keys", async () => {
    const processed = await processPhoto(await pngOf(1200, 800), rules);
    for (const bad of ["", "/entries/1", "entries/1/", "entries//1", "entries/../1"]) {
      await expect(storePhotoVersions(bad, processed)).rejects.toThrow(/invalid key base/);
    }
  });
});
