// Reading the exports back with independent readers, not the libraries that wrote them: SheetJS
// for spreadsheets, pdfjs-dist for PDFs (text with positions, and the drawing operators).
import path from "node:path";
import type { Writable } from "node:stream";
import { getDocument, OPS } from "pdfjs-dist/legacy/build/pdf.mjs";
import * as XLSX from "xlsx";
import { collect } from "@/exports/xlsx-sheet";

/** A piece of text on a page: x and y of its baseline start in PDF points (y from the bottom). */
export type PdfItem = { str: string; x: number; y: number; width: number; size: number };
export type PdfPage = { items: PdfItem[]; text: string; dashes: number; width: number; height: number };

export async function readPdf(write: (out: Writable) => Promise<void>): Promise<PdfPage[]> {
  const data = new Uint8Array(await collect(write));
  const pdf = await getDocument({ data, useSystemFonts: false, standardFontDataUrl: `${path.join(process.cwd(), "node_modules/pdfjs-dist/standard_fonts")}/` }).promise;
  const pages: PdfPage[] = [];
  for (let p = 1; p <= pdf.numPages; p++) {
    const page = await pdf.getPage(p);
    const content = await page.getTextContent();
    const items = content.items
      .filter((i) => "str" in i && i.str.trim() !== "")
      .map((i) => {
        const t = i as { str: string; transform: number[]; width: number };
        return { str: t.str, x: t.transform[4]!, y: t.transform[5]!, width: t.width, size: Math.abs(t.transform[3]!) };
      });
    const ops = await page.getOperatorList();
    const dashes = ops.fnArray.filter((f, k) => f === OPS.setDash && ((ops.argsArray[k] as [number[]])[0]?.length ?? 0) > 0).length;
    const [, , width, height] = page.view as [number, number, number, number];
    pages.push({ items, text: items.map((i) => i.str).join(" ").replace(/\s+/g, " "), dashes, width, height });
  }
  return pages;
}

/** Lines of a page: items sharing a baseline (within half a point), top to bottom, left to right. */
export function linesOf(page: PdfPage): PdfItem[][] {
  const lines: PdfItem[][] = [];
  for (const item of [...page.items].sort((a, b) => b.y - a.y || a.x - b.x)) {
    const line = lines.find((l) => Math.abs(l[0]!.y - item.y) < 0.5);
    if (line) line.push(item);
    else lines.push([item]);
  }
  return lines.map((l) => l.sort((a, b) => a.x - b.x));
}

export type ReadBook = { wb: XLSX.WorkBook; xml: (sheetIndex: number) => string };

export async function readXlsx(write: (out: Writable) => Promise<unknown>): Promise<ReadBook> {
  const buffer = await collect(write);
  const wb = XLSX.read(buffer, { type: "buffer", cellDates: true, cellNF: true, bookFiles: true });
  const files = (wb as unknown as { files: Record<string, { content: Uint8Array }> }).files;
  return { wb, xml: (i) => Buffer.from(files[`xl/worksheets/sheet${i}.xml`]!.content).toString("utf8") };
}

/** The frozen header as exceljs writes it: a pane split below row 1. */
export const FROZEN_HEADER = /<pane[^>]*ySplit="1"[^>]*state="frozen"|<pane[^>]*state="frozen"[^>]*ySplit="1"/;
