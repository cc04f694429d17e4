// Photo processing: phone photos come out upright and with no metadata left (GPS above all), and
// every bad upload is refused with a plain message and a code, oversize ones before any decoding.
import exifr from "exifr";
import sharp from "sharp";
import { beforeAll, describe, expect, it, vi } from "vitest";
import { canDecodeHeic, PhotoRejected, processPhoto, type PhotoRules, type ProcessedPhoto } from "@/storage/photo-processing";
import { BACKGROUND_RGB, bigJpeg, FIXTURE_GPS, MARKER_RGB, markerSidePx, pdfBytes, phoneStyleJpeg, pngOf } from "@/tests/helpers/photo-fixtures";

// Counts every sharp(...) call, here and in the module under test, to prove the size check runs
// before anything is decoded. Everything else is the real sharp.
const sharpCalls = vi.hoisted(() => ({ count: 0 }));
vi.mock("sharp", async (importOriginal) => {
  const real = (await importOriginal<typeof import("sharp")>()).default;
  const counted = (...args: unknown[]) => {
    sharpCalls.count++;
    return (real as unknown as (...a: unknown[]) => unknown)(...args);
  };
  return { default: Object.assign(counted, real) };
});

// One show's published rule: JPEG, at least 1000 × 500 px, at most 5 MB (decimal megabytes).
const rules: PhotoRules = { maxBytes: 5_000_000, minWidthPx: 1000, minHeightPx: 500 };

async function rejection(p: Promise<unknown>): Promise<PhotoRejected> {
  const err = await p.then(
    () => undefined,
    (e: unknown) => e,
  );
  expect(err).toBeInstanceOf(PhotoRejected);
  return err as PhotoRejected;
}

async function pixelAt(jpeg: Buffer, x: number, y: number): Promise<{ r: number; g: number; b: number }> {
  const { data, info } = await sharp(jpeg).raw().toBuffer({ resolveWithObject: true });
  const i = (y * info.width + x) * info.channels;
  return { r: data[i]!, g: data[i + 1]!, b: data[i + 2]! };
}

// JPEG is lossy: compare colours with a tolerance.
function near(actual: { r: number; g: number; b: number }, expected: { r: number; g: number; b: number }, tol = 24): boolean {
  return Math.abs(actual.r - expected.r) <= tol && Math.abs(actual.g - expected.g) <= tol && Math.abs(actual.b - expected.b) <= tol;
}

describe("processPhoto: a phone photo with EXIF orientation 6 and GPS", () => {
  const stored = { widthPx: 4000, heightPx: 3000 }; // landscape as the sensor stores it
  let fixture: Buffer;
  let out: ProcessedPhoto;

  beforeAll(async () => {
    fixture = await phoneStyleJpeg({ ...stored, orientation: 6, gps: true });
    out = await processPhoto(fixture, rules);
  });

  it("the fixture really carries orientation 6, GPS, XMP and an ICC profile (read back with exifr and sharp)", async () => {
    expect(await exifr.orientation(fixture)).toBe(6);
    const gps = await exifr.gps(fixture);
    expect(gps?.latitude).toBeCloseTo(FIXTURE_GPS.latitude, 4);
    expect(gps?.longitude).toBeCloseTo(FIXTURE_GPS.longitude, 4);
    const meta = await sharp(fixture).metadata();
    expect([meta.width, meta.height]).toEqual([stored.widthPx, stored.heightPx]);
    expect(meta.exif).toBeDefined();
    expect(meta.xmp).toBeDefined();
    expect(meta.icc).toBeDefined();
  });

  it("comes out upright: orientation 6 means 'rotate 90° CW to display', so width and height swap (CIPA DC-008 (Exif 2.3x), tag 0x0112)", () => {
    expect(out.sourceType).toBe("image/jpeg");
    expect([out.original.widthPx, out.original.heightPx]).toEqual([3000, 4000]);
    expect([out.web.widthPx, out.web.heightPx]).toEqual([1200, 1600]); // long side 1600
    expect([out.thumb.widthPx, out.thumb.heightPx]).toEqual([300, 400]); // long side 400
    for (const v of [out.original, out.web, out.thumb]) {
      expect(v.contentType).toBe("image/jpeg");
      expect(v.bytes).toBe(v.buffer.length);
    }
  });

  it("the red block stored top-left is now in the top-RIGHT corner of every version (turned 90° clockwise)", async () => {
    for (const v of [out.original, out.web, out.thumb]) {
      const half = Math.floor(markerSidePx(v.widthPx, v.heightPx) / 2); // marker is 1/10 of the short side
      expect(near(await pixelAt(v.buffer, v.widthPx - 1 - half, half), MARKER_RGB), "top-right").toBe(true);
      expect(near(await pixelAt(v.buffer, half, half), BACKGROUND_RGB), "top-left").toBe(true);
      expect(near(await pixelAt(v.buffer, half, v.heightPx - 1 - half), BACKGROUND_RGB), "bottom-left").toBe(true);
      expect(near(await pixelAt(v.buffer, v.widthPx - 1 - half, v.heightPx - 1 - half), BACKGROUND_RGB), "bottom-right").toBe(true);
    }
  });

  it("leaves no orientation tag, no GPS and no other metadata in any version (exifr and sharp)", async () => {
    for (const v of [out.original, out.web, out.thumb]) {
      expect(await exifr.parse(v.buffer, true)).toBeUndefined(); // `true`: every block exifr knows (TIFF/EXIF, GPS, XMP, IPTC, ICC, JFIF)
      expect(await exifr.gps(v.buffer)).toBeUndefined();
      expect(await exifr.orientation(v.buffer)).toBeUndefined();
      const meta = await sharp(v.buffer).metadata();
      expect(meta.orientation).toBeUndefined();
      expect(meta.exif).toBeUndefined();
      expect(meta.xmp).toBeUndefined();
      expect(meta.iptc).toBeUndefined();
      expect(meta.icc).toBeUndefined(); // pixels converted to sRGB, profile dropped
      // Nothing of the entrant survives even as stray bytes (APP1 "Exif\0\0" header, names).
      expect(v.buffer.includes("Exif\0\0")).toBe(false);
      expect(v.buffer.includes("Entrant Name")).toBe(false);
      expect(v.buffer.includes("Ribbonry Test Camera")).toBe(false);
    }
  });
});

describe("processPhoto: refusals", () => {
  it("refuses a PDF renamed to .jpg, by its content", async () => {
    const err = await rejection(processPhoto(pdfBytes(), rules));
    expect(err.code).toBe("not_an_image");
    expect(err.message).toBe("This file is a PDF, not a photo. Please upload a JPEG or PNG.");
  });

  it("refuses an oversize file before decoding: 6 MB of zeros never reaches sharp", async () => {
    const zeros = Buffer.alloc(6_000_000);
    sharpCalls.count = 0;
    const err = await rejection(processPhoto(zeros, rules));
    expect(err.code).toBe("too_large"); // not "not_an_image": the bytes were never looked at
    expect(err.message).toBe("The photo is 6 MB; this show accepts up to 5 MB.");
    expect(sharpCalls.count).toBe(0);
    await pngOf(10, 10);
    expect(sharpCalls.count, "the counter sees sharp calls at all").toBeGreaterThan(0);
  });

  it("names the size to one decimal, and never rounds an oversize file down to the limit", async () => {
    expect((await rejection(processPhoto(Buffer.alloc(7_200_000), rules))).message).toBe("The photo is 7.2 MB; this show accepts up to 5 MB.");
    expect((await rejection(processPhoto(Buffer.alloc(5_000_001), rules))).message).toBe(
      "The photo is 5,000,001 bytes; this show accepts up to 5 MB.",
    );
  });

  it("refuses a real oversize photo (noise JPEG over 5 MB)", async () => {
    const big = await bigJpeg(5_500_000);
    expect((await rejection(processPhoto(big, rules))).code).toBe("too_large");
  });

  it("refuses a too-small photo, naming what it got and what the show needs", async () => {
    const err = await rejection(processPhoto(await pngOf(900, 400), rules));
    expect(err.code).toBe("too_small");
    expect(err.message).toBe(
      "The photo is 900 × 400 pixels; this show needs at least 1000 × 500 pixels (the long side at least 1000 and the short side at least 500, either way up).",
    );
  });

  it("measures after orientation: stored 1200 × 450 with orientation 6 is a 450 × 1200 photo, short side too short", async () => {
    const err = await rejection(processPhoto(await phoneStyleJpeg({ widthPx: 1200, heightPx: 450, orientation: 6 }), rules));
    expect(err.code).toBe("too_small");
    expect(err.message).toMatch(/^The photo is 450 × 1200 pixels; /);
  });

  it("refuses a photo over 100 megapixels from its header alone", async () => {
    // A small JPEG whose frame header (SOF0, ITU-T T.81 B.2.2) claims 12000 × 10000 pixels.
    const jpeg = await sharp({ create: { width: 16, height: 16, channels: 3, background: "#888" } }).jpeg().toBuffer();
    const sof = jpeg.indexOf(Buffer.from([0xff, 0xc0]));
    jpeg.writeUInt16BE(10_000, sof + 5); // height
    jpeg.writeUInt16BE(12_000, sof + 7); // width
    const err = await rejection(processPhoto(jpeg, rules));
    expect(err.code).toBe("too_many_pixels");
    expect(err.message).toBe(
      "The photo is 12000 × 10000 pixels (120 megapixels); the largest we can process is 100 megapixels. Please upload a smaller copy.",
    );
  });

  it("refuses a damaged JPEG (cut off halfway) as unreadable", async () => {
    const whole = await phoneStyleJpeg({ widthPx: 1600, heightPx: 1200, orientation: 1, gps: false });
    const err = await rejection(processPhoto(whole.subarray(0, Math.floor(whole.length / 2)), rules));
    expect(err.code).toBe("unreadable");
    expect(err.message).toMatch(/^We couldn't read this photo/);
  });

  it("refuses a GIF as an unsupported type, suggesting JPEG", async () => {
    const gif = await sharp({ create: { width: 1200, height: 800, channels: 3, background: "#888" } }).gif().toBuffer();
    const err = await rejection(processPhoto(gif, rules));
    expect(err.code).toBe("unsupported_type");
    expect(err.message).toMatch(/^This photo is a GIF file; .* Please save it as a JPEG/);
  });

  it.skipIf(canDecodeHeic())("refuses HEIC when this sharp build has no HEVC decoder, suggesting JPEG", async () => {
    // The start of an ISO BMFF file with major brand "heic" (ISO/IEC 23008-12): enough for type detection.
    const heic = Buffer.alloc(64);
    heic.writeUInt32BE(24, 0);
    heic.write("ftypheic", 4, "latin1");
    heic.write("heicmif1", 16, "latin1");
    const err = await rejection(processPhoto(heic, rules));
    expect(err.code).toBe("unsupported_type");
    expect(err.message).toMatch(/HEIC format, which we can't open\. Please upload it as a JPEG/);
  });
});

describe("processPhoto: accepted formats", () => {
  it("accepts a PNG and outputs JPEG", async () => {
    const out = await processPhoto(await pngOf(1200, 800), rules);
    expect(out.sourceType).toBe("image/png");
    for (const v of [out.original, out.web, out.thumb]) {
      expect(v.contentType).toBe("image/jpeg");
      expect([...v.buffer.subarray(0, 3)]).toEqual([0xff, 0xd8, 0xff]); // JPEG SOI + marker (ITU-T T.81)
      expect((await sharp(v.buffer).metadata()).format).toBe("jpeg");
    }
    expect([out.original.widthPx, out.original.heightPx]).toEqual([1200, 800]);
    expect([out.web.widthPx, out.web.heightPx]).toEqual([1200, 800]); // never enlarged
    expect([out.thumb.widthPx, out.thumb.heightPx]).toEqual([400, 267]);
  });

  it("accepts a portrait photo that meets a landscape-worded minimum either way up (600 × 1200 vs 1000 × 500)", async () => {
    const out = await processPhoto(await pngOf(600, 1200), rules);
    expect([out.original.widthPx, out.original.heightPx]).toEqual([600, 1200]);
  });

  it("accepts WebP, and turns transparent areas white rather than black", async () => {
    const webp = await sharp({ create: { width: 1200, height: 800, channels: 4, background: { r: 0, g: 0, b: 0, alpha: 0 } } })
      .webp({ lossless: true })
      .toBuffer();
    const out = await processPhoto(webp, rules);
    expect(out.sourceType).toBe("image/webp");
    expect(near(await pixelAt(out.original.buffer, 10, 10), { r: 255, g: 255, b: 255 }, 4)).toBe(true);
  });
});
