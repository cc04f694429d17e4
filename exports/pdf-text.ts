// Small pdfkit helpers shared by the printed exports: finishing a document into a stream, and
// fitting one line of text into a width (a smaller size, or an ellipsis) with pdfkit's own metrics.
import type { Writable } from "node:stream";

/** Pipes `doc` into `out`; the promise resolves when `out` has the whole PDF. Call doc.end() after. */
export function pipeDone(doc: PDFKit.PDFDocument, out: Writable): Promise<void> {
  const done = new Promise<void>((resolve, reject) => {
    out.on("finish", () => resolve());
    out.on("error", reject);
    doc.on("error", reject);
  });
  doc.pipe(out);
  return done;
}

const ELLIPSIS = "…";

/** `text` cut to fit `width` at the document's current font and size, ending in "…" when cut. */
export function truncate(doc: PDFKit.PDFDocument, text: string, width: number): string {
  const clean = text.replace(/\s+/g, " ").trim();
  if (doc.widthOfString(clean) <= width) return clean;
  // Binary search on whole code points (never half a surrogate pair).
  const chars = Array.from(clean);
  let lo = 0;
  let hi = chars.length;
  while (lo < hi) {
    const mid = Math.ceil((lo + hi) / 2);
    if (doc.widthOfString(chars.slice(0, mid).join("").trimEnd() + ELLIPSIS) <= width) lo = mid;
    else hi = mid - 1;
  }
  return chars.slice(0, lo).join("").trimEnd() + ELLIPSIS;
}

/**
 * The largest font size from `max` down to `min` (in 1 pt steps) at which `text` fits `width` on
 * one line in the document's current font; `min` when none does (the caller truncates).
 */
export function fitSize(doc: PDFKit.PDFDocument, text: string, width: number, max: number, min: number): number {
  for (let size = max; size > min; size--) {
    doc.fontSize(size);
    if (doc.widthOfString(text) <= width) return size;
  }
  doc.fontSize(min);
  return min;
}
