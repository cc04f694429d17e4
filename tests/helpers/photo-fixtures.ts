// Test images made with sharp while the tests run, so no binary fixture is committed: a phone-style
// JPEG (rotated by an EXIF tag, carrying GPS and camera tags), a PDF, a large noisy JPEG, a PNG.
import { randomBytes } from "node:crypto";
import { crc32, deflateSync } from "node:zlib";
import sharp from "sharp";

export type ExifOrientation = 1 | 2 | 3 | 4 | 5 | 6 | 7 | 8;

export type PhoneStyleOptions = { widthPx: number; heightPx: number; orientation?: ExifOrientation; gps?: boolean };

/** The marker block's side: a tenth of the short side, in stored (not displayed) pixels. */
export function markerSidePx(widthPx: number, heightPx: number): number {
  return Math.max(8, Math.round(Math.min(widthPx, heightPx) / 10));
}

export const MARKER_RGB = { r: 255, g: 0, b: 0 } as const;
export const BACKGROUND_RGB = { r: 235, g: 230, b: 220 } as const;

/** Where the fixture says it was taken: Greenwich, in EXIF degrees/minutes/seconds rationals. */
export const FIXTURE_GPS = { latitude: 51.4778, longitude: -0.0014 } as const;

/**
 * A JPEG laid out the way phones store photos: pixels as the sensor read them (widthPx × heightPx),
 * a red block in the stored top-left corner, and an EXIF Orientation tag telling viewers how to
 * turn it. Also carries what phones add: camera make/model, capture time, GPS (optional), XMP and a
 * Display P3 ICC profile — everything processing must remove.
 */
export async function phoneStyleJpeg(opts: PhoneStyleOptions): Promise<Buffer> {
  const side = markerSidePx(opts.widthPx, opts.heightPx);
  const gps = {
    GPSLatitudeRef: "N",
    GPSLatitude: "51/1 28/1 4008/100", // 51° 28′ 40.08″ N
    GPSLongitudeRef: "W",
    GPSLongitude: "0/1 0/1 504/100", // 0° 0′ 5.04″ W
  };
  return sharp({ create: { width: opts.widthPx, height: opts.heightPx, channels: 3, background: BACKGROUND_RGB } })
    .composite([{ input: { create: { width: side, height: side, channels: 3, background: MARKER_RGB } }, left: 0, top: 0 }])
    .jpeg({ quality: 90 })
    .withMetadata({
      orientation: opts.orientation ?? 6,
      icc: "p3",
      // sharp's EXIF keys: IFD0 = main image tags, IFD2 = Exif sub-IFD, IFD3 = GPS IFD.
      exif: {
        IFD0: { Make: "Ribbonry Test Camera", Model: "Fixture 1", DateTime: "2024:05:01 10:00:00", Artist: "Entrant Name" },
        IFD2: { DateTimeOriginal: "2024:05:01 10:00:00" },
        ...(opts.gps === false ? {} : { IFD3: gps }),
      },
    })
    .withXmp(
      '<x:xmpmeta xmlns:x="adobe:ns:meta/"><rdf:RDF xmlns:rdf="http://www.w3.org/1999/02/22-rdf-syntax-ns#">' +
        '<rdf:Description rdf:about="" xmlns:dc="http://purl.org/dc/elements/1.1/"><dc:creator><rdf:Seq><rdf:li>Entrant Name</rdf:li></rdf:Seq></dc:creator>' +
        "</rdf:Description></rdf:RDF></x:xmpmeta>",
    )
    .toBuffer();
}

/** A small valid PDF (header, catalog, one empty page, xref table, trailer). */
export function pdfBytes(): Buffer {
  const objects = [
    "<< /Type /Catalog /Pages 2 0 R >>",
    "<< /Type /Pages /Kids [3 0 R] /Count 1 >>",
    "<< /Type /Page /Parent 2 0 R /MediaBox [0 0 612 792] >>",
  ];
  let body = "%PDF-1.4\n";
  const offsets: number[] = [];
  objects.forEach((obj, i) => {
    offsets.push(Buffer.byteLength(body, "latin1"));
    body += `${i + 1} 0 obj\n${obj}\nendobj\n`;
  });
  const xrefAt = Buffer.byteLength(body, "latin1");
  body += `xref\n0 ${objects.length + 1}\n0000000000 65535 f \n`;
  for (const off of offsets) body += `${String(off).padStart(10, "0")} 00000 n \n`;
  body += `trailer\n<< /Size ${objects.length + 1} /Root 1 0 R >>\nstartxref\n${xrefAt}\n%%EOF\n`;
  return Buffer.from(body, "latin1");
}

/** A JPEG of random noise (which does not compress) of at least `bytesAtLeast` bytes. */
export async function bigJpeg(bytesAtLeast: number): Promise<Buffer> {
  // Noise at quality 90 takes roughly 1.5–2 bytes per pixel; start there and grow until big enough.
  let pixels = Math.ceil(bytesAtLeast / 1.5);
  for (;;) {
    const side = Math.ceil(Math.sqrt(pixels));
    const jpeg = await sharp(randomBytes(side * side * 3), { raw: { width: side, height: side, channels: 3 } })
      .jpeg({ quality: 90 })
      .toBuffer();
    if (jpeg.length >= bytesAtLeast) return jpeg;
    pixels = Math.ceil(pixels * (bytesAtLeast / jpeg.length) * 1.1);
  }
}

/** A plain PNG of the given size (stored upright, no orientation tag). */
export function pngOf(widthPx: number, heightPx: number): Promise<Buffer> {
  return sharp({ create: { width: widthPx, height: heightPx, channels: 3, background: { r: 40, g: 90, b: 160 } } })
    .png()
    .toBuffer();
}

/**
 * A PNG of one colour that is small on disk but huge once decoded: 1-bit greyscale, every row
 * zero, so 20000 × 20000 is ~50 KB of deflate. Written chunk by chunk (PNG spec, ISO/IEC 15948:
 * signature, IHDR, IDAT, IEND, each with a CRC-32) because making it with sharp would allocate it.
 */
export function hugeBlankPng(widthPx: number, heightPx: number): Buffer {
  const rowBytes = 1 + Math.ceil(widthPx / 8); // filter byte 0 (None) + packed 1-bit samples
  const ihdr = Buffer.alloc(13);
  ihdr.writeUInt32BE(widthPx, 0);
  ihdr.writeUInt32BE(heightPx, 4);
  ihdr.set([1, 0, 0, 0, 0], 8); // bit depth 1, colour type 0 (greyscale), deflate, adaptive filter, no interlace
  const idat = deflateSync(Buffer.alloc(rowBytes * heightPx), { level: 9 });
  return Buffer.concat([Buffer.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]), pngChunk("IHDR", ihdr), pngChunk("IDAT", idat), pngChunk("IEND", Buffer.alloc(0))]);
}

function pngChunk(type: string, data: Buffer): Buffer {
  const head = Buffer.alloc(8);
  head.writeUInt32BE(data.length, 0);
  head.write(type, 4, "latin1");
  const crc = Buffer.alloc(4);
  crc.writeUInt32BE(crc32(Buffer.concat([head.subarray(4), data])), 0);
  return Buffer.concat([head, data, crc]);
}
