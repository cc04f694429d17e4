// Entry photos against the local S3 fake: a presigned form upload bound to the show's size, the
// server's check (size before reading, pixels before decoding, upright, no GPS), refused files
// that leave the saved photo untouched, and who may see a photo.
import { and, eq } from "drizzle-orm";
import exifr from "exifr";
import sharp from "sharp";
import { GetObjectCommand } from "@aws-sdk/client-s3";
import { afterEach, beforeAll, describe, expect, it, vi } from "vitest";
import { db } from "@/db/client";
import { entryPhotos } from "@/db/schema";
import { createDraft } from "@/db/queries/entries";
import { POST as presignRoute } from "@/app/api/entries/[id]/photos/route";
import { POST as attachRoute } from "@/app/api/entries/[id]/photos/[view]/route";
import { GET as photoRoute } from "@/app/api/photos/[photoId]/[size]/route";
import { ensureBucket, getObjectBytes, isMissing, s3 } from "@/storage/s3";
import { bigJpeg, hugeBlankPng, MARKER_RGB, pdfBytes, phoneStyleJpeg } from "../../helpers/photo-fixtures";
import { grantRole, makeShow, makeUser, type TestUser } from "../../helpers/factories";
import { setSettings, viewerOf } from "./helpers";

type Route = (req: Request, ctx: { params: Promise<Record<string, string>> }) => Promise<Response>;

async function call(route: Route, method: string, params: Record<string, string>, cookie: string | null, body?: unknown) {
  const headers = new Headers(cookie ? { cookie } : {});
  if (body !== undefined) headers.set("content-type", "application/json");
  return route(new Request("http://127.0.0.1:3100/api/test", { method, headers, body: body === undefined ? undefined : JSON.stringify(body) }), { params: Promise.resolve(params) });
}

let show: Awaited<ReturnType<typeof makeShow>>;
let ada: TestUser;
let bea: TestUser;
let chair: TestUser;
let entryId: string;

/** The browser's three calls: presign, a form POST straight to storage, then ask the server to check it. */
async function upload(u: TestUser, view: string, bytes: Buffer, contentType = "image/jpeg", declaredBytes = bytes.length) {
  const presign = await call(presignRoute as Route, "POST", { id: entryId }, u.cookie, { view, contentType, bytes: declaredBytes });
  expect(presign.status, await presign.clone().text()).toBe(201);
  const { uploadUrl, uploadFields, uploadKey } = (await presign.json()) as { uploadUrl: string; uploadFields: Record<string, string>; uploadKey: string };
  expect(uploadKey).toMatch(new RegExp(`^uploads/entries/${entryId}/${view}/`));
  const form = new FormData();
  for (const [name, value] of Object.entries(uploadFields)) form.append(name, value);
  form.append("file", new Blob([new Uint8Array(bytes)], { type: contentType }), "photo");
  const post = await fetch(uploadUrl, { method: "POST", body: form });
  // s3rver stores whatever arrives (it does not enforce the policy); real S3 answers 400 for a
  // file outside content-length-range, and the server's own check below covers both.
  expect(post.status).toBe(204);
  const attach = await call(attachRoute as Route, "POST", { id: entryId, view }, u.cookie, { uploadKey });
  return { attach, uploadKey, body: (await attach.clone().json()) as Record<string, unknown> };
}

async function photoRow(view: "full" | "detail") {
  const [row] = await db.select().from(entryPhotos).where(and(eq(entryPhotos.entryId, entryId), eq(entryPhotos.view, view)));
  return row;
}

async function gone(key: string): Promise<boolean> {
  return getObjectBytes(key).then(() => false, (err: unknown) => isMissing(err));
}

afterEach(() => {
  vi.restoreAllMocks();
});

beforeAll(async () => {
  await ensureBucket();
  show = await makeShow();
  await setSettings(show.id, { photoMaxBytes: 400_000 });
  [ada, bea, chair] = await Promise.all([makeUser({ name: "Ada" }), makeUser({ name: "Bea" }), makeUser({ name: "Chair" })]);
  await grantRole(chair.id, show.id, "chair");
  entryId = (await createDraft(await viewerOf(ada), show.slug)).entryId;
});

describe("entry photos", () => {
  it("stores a phone photo upright (EXIF orientation 6) with no GPS or other metadata", async () => {
    // Orientation 6: the stored picture is shown turned a quarter turn clockwise (CIPA DC-008, tag 0x0112).
    const phone = await phoneStyleJpeg({ widthPx: 1600, heightPx: 1200, orientation: 6, gps: true });
    expect((await exifr.gps(phone))?.latitude).toBeCloseTo(51.4778, 3);
    const { attach, uploadKey, body } = await upload(ada, "full", phone);
    expect(attach.status, JSON.stringify(body)).toBe(201);
    expect(body).toMatchObject({ view: "full", widthPx: 1200, heightPx: 1600 });

    const row = (await photoRow("full"))!;
    const original = await getObjectBytes(row.storageKey);
    const meta = await sharp(original).metadata();
    expect([meta.width, meta.height, meta.orientation, meta.exif, meta.xmp, meta.icc]).toEqual([1200, 1600, undefined, undefined, undefined, undefined]);
    expect(await exifr.gps(original)).toBeUndefined();
    // The red block stored top-left is top-right once turned upright.
    const { data, info } = await sharp(original).raw().toBuffer({ resolveWithObject: true });
    const px = (x: number, y: number) => [...data.subarray((y * info.width + x) * info.channels, (y * info.width + x) * info.channels + 3)];
    const [r, g, b] = px(info.width - 20, 20);
    expect(r).toBeGreaterThan(MARKER_RGB.r - 30);
    expect(g! + b!).toBeLessThan(60);
    expect(px(20, 20)[0]).toBeLessThan(240);
    expect((await sharp(await getObjectBytes(row.thumbKey!)).metadata()).height).toBe(400);
    expect(await gone(uploadKey)).toBe(true);
  });

  it("refuses a PDF renamed as a photo, with the reason, and saves nothing", async () => {
    const { attach, body, uploadKey } = await upload(ada, "detail", pdfBytes(), "image/jpeg");
    expect(attach.status).toBe(400);
    expect(body.message).toBe("This file is a PDF, not a photo. Please upload a JPEG or PNG.");
    expect(body.fieldErrors).toEqual({ photo: ["This file is a PDF, not a photo. Please upload a JPEG or PNG."] });
    expect(await photoRow("detail")).toBeUndefined();
    expect(await gone(uploadKey)).toBe(true);
  });

  it("refuses an oversize file and keeps the saved photo byte-identical", async () => {
    const before = (await photoRow("full"))!;
    const served = await call(photoRoute as Route, "GET", { photoId: before.id, size: "original" }, ada.cookie);
    const savedBytes = Buffer.from(await served.arrayBuffer());

    const big = await bigJpeg(450_000);
    const early = await call(presignRoute as Route, "POST", { id: entryId }, ada.cookie, { view: "full", contentType: "image/jpeg", bytes: big.length });
    expect(early.status).toBe(400);
    // A browser that lies about the size is caught when the server reads the file.
    const { attach, body } = await upload(ada, "full", big, "image/jpeg", 1000);
    expect(attach.status).toBe(400);
    expect(body.message).toMatch(/^The photo is 0\.\d+ MB; this show accepts up to 0\.4 MB\.$/);

    const after = (await photoRow("full"))!;
    expect(after).toEqual(before);
    expect(Buffer.compare(await getObjectBytes(after.storageKey), savedBytes)).toBe(0);
  });

  it("binds the upload to the show's size limit and refuses a larger stored file without reading it", async () => {
    const before = (await photoRow("full"))!;
    const presign = await call(presignRoute as Route, "POST", { id: entryId }, ada.cookie, { view: "full", contentType: "image/jpeg", bytes: 1000 });
    const { uploadFields } = (await presign.json()) as { uploadFields: Record<string, string> };
    // The signed policy: S3 itself refuses a file over the limit (AWS S3 API reference, "Creating a POST policy").
    const policy = JSON.parse(Buffer.from(uploadFields.Policy!, "base64").toString("utf8")) as { conditions: unknown[] };
    expect(policy.conditions).toContainEqual(["content-length-range", 1, 400_000]);
    expect(policy.conditions).toContainEqual({ "Content-Type": "image/jpeg" });

    // A store that ignores the policy (as s3rver does) keeps a 1.2 MB file: the stored size is
    // checked from the object's headers and the body is never fetched.
    const send = vi.spyOn(s3, "send");
    const { attach, body, uploadKey } = await upload(ada, "full", await bigJpeg(1_200_000), "image/jpeg", 1000);
    expect(attach.status).toBe(400);
    expect(body.message).toMatch(/^The photo is 1\.\d+ MB; this show accepts up to 0\.4 MB\.$/);
    expect(body.fieldErrors).toEqual({ photo: [body.message] });
    const reads = send.mock.calls.filter(([cmd]) => cmd instanceof GetObjectCommand && cmd.input.Key === uploadKey);
    expect(reads).toHaveLength(0);
    expect(await gone(uploadKey)).toBe(true);
    expect(await photoRow("full")).toEqual(before);
  });

  it("refuses a small file that declares 20000 × 20000 pixels from its header, before decoding it", async () => {
    const before = (await photoRow("full"))!;
    const png = hugeBlankPng(20_000, 20_000);
    expect(png.length).toBeLessThan(400_000);
    const { attach, body, uploadKey } = await upload(ada, "full", png, "image/png");
    expect(attach.status).toBe(400);
    // The header check's own message; a decode stopped by sharp's limit would read "couldn't read".
    expect(body.message).toBe("The photo is 20000 × 20000 pixels (400 megapixels); the largest we can process is 100 megapixels. Please upload a smaller copy.");
    expect(await gone(uploadKey)).toBe(true);
    expect(await photoRow("full")).toEqual(before);
  });

  it("replacing a photo swaps the row and removes the old versions", async () => {
    const before = (await photoRow("full"))!;
    const { attach } = await upload(ada, "full", await phoneStyleJpeg({ widthPx: 1400, heightPx: 1000, orientation: 1 }));
    expect(attach.status).toBe(201);
    const after = (await photoRow("full"))!;
    expect(after.id).not.toBe(before.id);
    expect([after.widthPx, after.heightPx]).toEqual([1400, 1000]);
    expect(await Promise.all([before.storageKey, before.webKey!, before.thumbKey!].map(gone))).toEqual([true, true, true]);
  });

  it("serves the photo to its owner and the show's chair, not to another entrant or anonymously", async () => {
    const row = (await photoRow("full"))!;
    const owner = await call(photoRoute as Route, "GET", { photoId: row.id, size: "web" }, ada.cookie);
    expect(owner.status).toBe(200);
    expect(owner.headers.get("content-type")).toBe("image/jpeg");
    expect(owner.headers.get("cache-control")).toBe("private, max-age=300");
    expect(Buffer.compare(Buffer.from(await owner.arrayBuffer()), await getObjectBytes(row.webKey!))).toBe(0);
    expect((await call(photoRoute as Route, "GET", { photoId: row.id, size: "thumb" }, chair.cookie)).status).toBe(200);
    expect((await call(photoRoute as Route, "GET", { photoId: row.id, size: "thumb" }, bea.cookie)).status).toBe(404); // the same 404 as a missing photo: an id confirms nothing
    expect((await call(photoRoute as Route, "GET", { photoId: row.id, size: "thumb" }, null)).status).toBe(401);
    expect((await call(photoRoute as Route, "GET", { photoId: row.id, size: "huge" }, ada.cookie)).status).toBe(404);
  });

  it("lets no one else upload to the entry", async () => {
    const body = { view: "full", contentType: "image/jpeg", bytes: 1000 };
    expect((await call(presignRoute as Route, "POST", { id: entryId }, bea.cookie, body)).status).toBe(404);
    expect((await call(presignRoute as Route, "POST", { id: entryId }, null, body)).status).toBe(401);
    const foreign = await call(attachRoute as Route, "POST", { id: entryId, view: "full" }, ada.cookie, { uploadKey: `shows/${show.id}/entries/${entryId}/full/x/original.jpg` });
    expect(foreign.status).toBe(400);
  });
});
