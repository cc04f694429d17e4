// Checks an uploaded quilt photo against a show's rules and re-encodes it as three clean JPEGs
// (original, web, thumb) with every metadata tag removed. Pure Node: no framework, no storage.
import sharp, { type JpegOptions, type Metadata, type OutputInfo } from "sharp";
import { PHOTO_FORMATS, photoFormatWords } from "../lib/photo-formats";

export type PhotoRules = { maxBytes: number; minWidthPx: number; minHeightPx: number };

export type PhotoSourceType = "image/jpeg" | "image/png" | "image/webp" | "image/heic" | "image/heif";

export type PhotoVersion = {
  buffer: Buffer;
  widthPx: number;
  heightPx: number;
  bytes: number;
  contentType: "image/jpeg";
};

export type ProcessedPhoto = {
  original: PhotoVersion;
  web: PhotoVersion;
  thumb: PhotoVersion;
  sourceType: PhotoSourceType;
};

export type PhotoRejectedCode =
  | "too_large"
  | "not_an_image"
  | "unsupported_type"
  | "too_small"
  | "too_many_pixels"
  | "unreadable";

/** A photo the entrant must replace; `message` is written for them. */
export class PhotoRejected extends Error {
  readonly code: PhotoRejectedCode;
  constructor(code: PhotoRejectedCode, message: string, options?: { cause?: unknown }) {
    super(message, options);
    this.name = "PhotoRejected";
    this.code = code;
  }
}

/** Above this we refuse before decoding: a 100 MP RGB decode is already ~300 MB of pixels. */
export const MAX_INPUT_PIXELS = 100_000_000;
export const WEB_LONG_SIDE_PX = 1600;
export const THUMB_LONG_SIDE_PX = 400;
const ORIGINAL_QUALITY = 90;
const WEB_QUALITY = 82;
const THUMB_QUALITY = 80;

// libvips' operation cache keeps recent results (up to 50 MB by default) in case the same input is
// processed again. Every upload is processed exactly once, so the cache only holds memory.
// Concurrency (libvips threads per image) is left at sharp's default: 1 on glibc without jemalloc,
// as on our Debian servers, to limit allocator fragmentation; uploads run in parallel on libuv's
// pool instead. It is process-wide, so a module setting it would surprise other sharp users.
sharp.cache(false);

/** HEIC needs libheif's HEVC decoder, which prebuilt sharp binaries leave out; ask libvips. */
export function canDecodeHeic(): boolean {
  return sharp.format.heif.input.fileSuffix?.includes(".heic") ?? false;
}

const HEIF_FAMILY = new Set(["image/heic", "image/heif", "image/heic-sequence", "image/heif-sequence"]);

export async function processPhoto(input: Buffer, rules: PhotoRules): Promise<ProcessedPhoto> {
  // Before anything reads the content: an oversize upload costs no decoding.
  if (input.length > rules.maxBytes) throw tooLarge(input.length, rules.maxBytes);
  const sourceType = await detectType(input);
  const { widthPx, heightPx } = await orientedSize(input, sourceType);
  checkMinimum(widthPx, heightPx, rules);

  // Huffman table optimisation makes libjpeg hold the whole image's coefficients until the end:
  // measured on a 24 MP photo here, ~300 MB peak and 0.95 s instead of ~75 MB and 0.45 s, for
  // files only 4–9 % smaller. Worth it for the small versions, not for the full-size one.
  const original = await encode(input, sourceType, { quality: ORIGINAL_QUALITY, optimiseCoding: false });
  const web = await encode(input, sourceType, { quality: WEB_QUALITY }, WEB_LONG_SIDE_PX);
  const thumb = await encode(input, sourceType, { quality: THUMB_QUALITY }, THUMB_LONG_SIDE_PX);
  return { original, web, thumb, sourceType };
}

/** The refusal for a file over the show's size limit; also used when storage reports the size first. */
export function tooLarge(bytes: number, maxBytes: number): PhotoRejected {
  return new PhotoRejected("too_large", `The photo is ${sizeOver(bytes, maxBytes)}; this show accepts up to ${formatMb(maxBytes)}.`);
}

/** The real type from the bytes (magic numbers), whatever the file was called. */
async function detectType(input: Buffer): Promise<PhotoSourceType> {
  // file-type is ESM-only; a dynamic import keeps this module loadable from CommonJS too.
  const { fileTypeFromBuffer } = await import("file-type");
  const found = await fileTypeFromBuffer(input);
  if (!found) throw new PhotoRejected("not_an_image", `This file is not a photo we recognise. Please upload a ${SUGGESTED}.`);
  if (found.mime === "application/pdf") {
    throw new PhotoRejected("not_an_image", `This file is a PDF, not a photo. Please upload a ${SUGGESTED}.`);
  }
  if (found.mime.startsWith("video/")) {
    throw new PhotoRejected("not_an_image", `This file is a video, not a photo. Please upload a ${SUGGESTED}.`);
  }
  if (!found.mime.startsWith("image/")) {
    throw new PhotoRejected("not_an_image", `This file is not a photo (it looks like a .${found.ext} file). Please upload a ${SUGGESTED}.`);
  }
  if (found.mime === "image/jpeg" || found.mime === "image/png" || found.mime === "image/webp") return found.mime;
  if (HEIF_FAMILY.has(found.mime)) {
    if (found.mime.startsWith("image/heic") && !canDecodeHeic()) throw heicRefused();
    return found.mime.startsWith("image/heic") ? "image/heic" : "image/heif";
  }
  throw new PhotoRejected(
    "unsupported_type",
    `This photo is a ${found.ext.toUpperCase()} file; this show accepts ${acceptedList()} photos. Please save it as a JPEG and upload it again.`,
  );
}

const SUGGESTED = "JPEG or PNG";

/** The formats this server can take now, by label (lib/photo-formats.ts): HEIC only with a decoder. */
export function acceptedPhotoFormats(): string[] {
  return PHOTO_FORMATS.map((f) => f.label).filter((label) => label !== "HEIC" || canDecodeHeic());
}

function acceptedList(): string {
  return photoFormatWords(acceptedPhotoFormats());
}

function heicRefused(cause?: unknown): PhotoRejected {
  return new PhotoRejected(
    "unsupported_type",
    "This photo is in HEIC format, which we can't open. Please upload it as a JPEG (on an iPhone: Settings → Camera → Formats → Most Compatible, or share the photo as JPEG).",
    { cause },
  );
}

/** Width and height as the photo is meant to be seen, read from the header without decoding pixels. */
async function orientedSize(input: Buffer, sourceType: PhotoSourceType): Promise<{ widthPx: number; heightPx: number }> {
  let meta: Metadata;
  try {
    // No pixel limit for the header read: we check it ourselves below, with the real numbers.
    meta = await sharp(input, { limitInputPixels: false }).metadata();
  } catch (err) {
    throw decodeFailed(sourceType, err);
  }
  if (!meta.width || !meta.height) throw decodeFailed(sourceType, new Error("no dimensions in header"));
  const pixels = meta.width * meta.height;
  if (pixels > MAX_INPUT_PIXELS) {
    throw new PhotoRejected(
      "too_many_pixels",
      `The photo is ${meta.width} × ${meta.height} pixels (${megapixels(pixels)} megapixels); the largest we can process is ${megapixels(MAX_INPUT_PIXELS)} megapixels. Please upload a smaller copy.`,
    );
  }
  // EXIF orientation values 5–8 turn the picture a quarter turn, so displayed width and height
  // swap (CIPA DC-008 (Exif 2.3x), tag 0x0112); sharp's autoOrient reports the swapped size.
  return { widthPx: meta.autoOrient.width, heightPx: meta.autoOrient.height };
}

/**
 * Shows publish minimums as "W × H px". A quilt may be photographed either way up, so we read the
 * rule orientation-free: the photo's long side (as displayed) must reach the larger number and
 * its short side the smaller one. 600 × 1200 passes a "1000 × 500" rule; 1200 × 400 does not.
 */
function checkMinimum(widthPx: number, heightPx: number, rules: PhotoRules): void {
  const needLong = Math.max(rules.minWidthPx, rules.minHeightPx);
  const needShort = Math.min(rules.minWidthPx, rules.minHeightPx);
  if (Math.max(widthPx, heightPx) >= needLong && Math.min(widthPx, heightPx) >= needShort) return;
  throw new PhotoRejected(
    "too_small",
    `The photo is ${widthPx} × ${heightPx} pixels; this show needs at least ${rules.minWidthPx} × ${rules.minHeightPx} pixels ` +
      `(the long side at least ${needLong} and the short side at least ${needShort}, either way up).`,
  );
}

/**
 * One pipeline per output, run one after another: each decodes the upload again (JPEG and WebP
 * shrink-on-load make the small ones cheap) and only one full-size decode is alive at a time.
 * Nothing is carried over from the input: sharp writes no EXIF, XMP, IPTC or ICC unless asked,
 * and converts the pixels to sRGB first, so an output without a profile is read as sRGB.
 */
async function encode(
  input: Buffer,
  sourceType: PhotoSourceType,
  jpeg: JpegOptions,
  longSidePx?: number,
): Promise<PhotoVersion> {
  let pipeline = sharp(input, { limitInputPixels: MAX_INPUT_PIXELS })
    .rotate() // apply the EXIF orientation to the pixels; the tag itself is not written out
    .flatten({ background: "#ffffff" }); // JPEG has no alpha: transparent PNG areas become white, not black
  if (longSidePx) pipeline = pipeline.resize({ width: longSidePx, height: longSidePx, fit: "inside", withoutEnlargement: true });
  let out: { data: Buffer; info: OutputInfo };
  try {
    out = await pipeline.jpeg(jpeg).toBuffer({ resolveWithObject: true });
  } catch (err) {
    throw decodeFailed(sourceType, err);
  }
  await assertNoMetadata(out.data);
  return { buffer: out.data, widthPx: out.info.width, heightPx: out.info.height, bytes: out.data.length, contentType: "image/jpeg" };
}

/** Fails closed: GPS tags are the entrant's home address, so a tag that slipped through is a bug. */
async function assertNoMetadata(jpeg: Buffer): Promise<void> {
  const m = await sharp(jpeg).metadata();
  const left = (["exif", "xmp", "iptc", "icc"] as const).filter((k) => m[k] !== undefined);
  if (left.length > 0) throw new Error(`photo-processing: output still carries ${left.join(", ")} metadata`);
}

function decodeFailed(sourceType: PhotoSourceType, err: unknown): PhotoRejected {
  // A HEIF container we cannot decode is almost always a codec this build lacks, not a broken file.
  if (sourceType === "image/heic" || sourceType === "image/heif") return heicRefused(err);
  return new PhotoRejected(
    "unreadable",
    "We couldn't read this photo; the file may be damaged or only partly uploaded. Please try again, or save it as a JPEG first.",
    { cause: err },
  );
}

// Sizes in decimal megabytes (1 MB = 1,000,000 bytes), as phones and macOS show file sizes.
function formatMb(bytes: number, decimals = 1): string {
  return `${Number((bytes / 1_000_000).toFixed(decimals))} MB`;
}

/** The upload's size with enough decimals that it never reads as equal to the limit. */
function sizeOver(bytes: number, limit: number): string {
  for (let decimals = 1; decimals <= 3; decimals++) {
    const shown = formatMb(bytes, decimals);
    if (parseFloat(shown) > parseFloat(formatMb(limit, decimals))) return shown;
  }
  return `${bytes.toLocaleString("en-US")} bytes`;
}

function megapixels(pixels: number): string {
  return String(Number((pixels / 1_000_000).toFixed(1)));
}
