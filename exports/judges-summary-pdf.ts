// The judges' summary: one section per category (each starting on a new page) with the judges'
// names and a table of every entry's rank, number, title, each judge's total, mean, median,
// spread, severity-adjusted score and place or award. No entrant names: the type has none.
// Long titles are cut with an ellipsis to their column; a table that runs over the page goes on
// the next one under the category heading "(continued)" and the column headings again.
import type { Writable } from "node:stream";
import PDFDocument from "pdfkit";
import { formatScore } from "../scoring/score-sheets";
import { pipeDone, truncate } from "./pdf-text";

export type JudgesSummaryEntry = {
  /** "1", "=2", "—" */
  displayRank: string;
  entryNumber: number;
  title: string;
  /** Each judge's sheet total by judge id; missing or null when the judge has no submitted sheet. */
  totals: Readonly<Record<string, number | null | undefined>>;
  mean: number | null;
  median: number | null;
  spread: number | null;
  adjusted: number | null;
  /** e.g. ["1st", "Best of Show"]; empty when none. */
  placeAwards: string[];
};

export type JudgesSummaryCategory = { code: string; name: string; judges: { id: string; name: string }[]; entries: JudgesSummaryEntry[] };

export type JudgesSummaryData = { showName: string; categories: readonly JudgesSummaryCategory[] };

const MARGIN = 40;
const PAGE = { width: 792, height: 612 }; // US Letter, landscape, in points
const WIDTH = PAGE.width - 2 * MARGIN;
const BOTTOM = PAGE.height - MARGIN;
const ROW = 15;
const INK = "#2b2230";
const MUTED = "#6b6270";
const RULE = "#d8cfdc";

type Col = { header: string; width: number; align: "left" | "right"; cell: (e: JudgesSummaryEntry) => string };

const score = (x: number | null | undefined) => formatScore(x, 2);

const W = { rank: 30, entry: 36, mean: 40, median: 42, spread: 40, adjusted: 46, place: 104 };

/** Columns for a category: fixed ones, a share of what is left per judge, the rest for the title. */
function columnsFor(judges: JudgesSummaryCategory["judges"]): Col[] {
  const flexible = WIDTH - Object.values(W).reduce((a, b) => a + b, 0);
  const perJudge = judges.length ? Math.max(24, Math.min(64, (flexible - 110) / judges.length)) : 0;
  const title = Math.max(60, flexible - perJudge * judges.length);
  return [
    { header: "Rank", width: W.rank, align: "left", cell: (e) => e.displayRank },
    { header: "Entry", width: W.entry, align: "right", cell: (e) => String(e.entryNumber) },
    { header: "Title", width: title, align: "left", cell: (e) => e.title },
    ...judges.map((j): Col => ({ header: j.name, width: perJudge, align: "right", cell: (e) => score(e.totals[j.id]) })),
    { header: "Mean", width: W.mean, align: "right", cell: (e) => score(e.mean) },
    { header: "Median", width: W.median, align: "right", cell: (e) => score(e.median) },
    { header: "Spread", width: W.spread, align: "right", cell: (e) => score(e.spread) },
    { header: "Adjusted", width: W.adjusted, align: "right", cell: (e) => formatScore(e.adjusted, 3) },
    { header: "Place / award", width: W.place, align: "left", cell: (e) => e.placeAwards.join(", ") },
  ];
}

/** Space kept clear on each side of a cell's text, so neighbouring cells never touch. */
const PAD_X = 4;

function cells(doc: PDFKit.PDFDocument, cols: Col[], texts: string[], y: number): void {
  let x = MARGIN;
  cols.forEach((c, i) => {
    const inner = c.width - 2 * PAD_X;
    doc.text(truncate(doc, texts[i] ?? "", inner), x + PAD_X, y, { width: inner, align: c.align, lineBreak: false });
    x += c.width;
  });
}

/** Column headings may take two lines (a judge's first and last name); returns their height. */
function headings(doc: PDFKit.PDFDocument, cols: Col[], y: number): number {
  doc.font("Helvetica-Bold").fontSize(8).fillColor(INK);
  const lineHeight = doc.currentLineHeight(true);
  let x = MARGIN;
  for (const c of cols) {
    const inner = c.width - 2 * PAD_X;
    doc.text(c.header, x + PAD_X, y, { width: inner, height: 2 * lineHeight, align: c.align, ellipsis: "…" });
    x += c.width;
  }
  return 2 * lineHeight;
}

function rule(doc: PDFKit.PDFDocument, y: number, colour: string): void {
  doc.save().lineWidth(0.5).strokeColor(colour).moveTo(MARGIN, y).lineTo(MARGIN + WIDTH, y).stroke().restore();
}

/** The category heading on a fresh page, then the column headings; returns the first row's y. */
function startPage(doc: PDFKit.PDFDocument, showName: string, cat: JudgesSummaryCategory, cols: Col[], continued: boolean): number {
  doc.addPage();
  doc.font("Helvetica").fontSize(9).fillColor(MUTED).text(truncate(doc, `${showName} · Judges' summary`, WIDTH), MARGIN, MARGIN, { lineBreak: false });
  doc.font("Helvetica-Bold").fontSize(15).fillColor(INK);
  doc.text(truncate(doc, `${[cat.code, cat.name].filter((s) => s.trim()).join(" ")}${continued ? " (continued)" : ""}`, WIDTH), MARGIN, MARGIN + 14, { lineBreak: false });
  doc.font("Helvetica").fontSize(9.5).fillColor(MUTED);
  const judges = cat.judges.length ? `Judges: ${cat.judges.map((j) => j.name).join("; ")}` : "Judges: none recorded";
  doc.text(judges, MARGIN, MARGIN + 36, { width: WIDTH });
  const y = Math.max(doc.y, MARGIN + 48) + 8;
  const height = headings(doc, cols, y);
  rule(doc, y + height + 2, MUTED);
  return y + height + 6;
}

function category(doc: PDFKit.PDFDocument, showName: string, cat: JudgesSummaryCategory): void {
  const cols = columnsFor(cat.judges);
  let y = startPage(doc, showName, cat, cols, false);
  if (!cat.entries.length) {
    doc.font("Helvetica-Oblique").fontSize(10).fillColor(MUTED).text("No entries in this category.", MARGIN, y, { lineBreak: false });
    return;
  }
  for (const e of cat.entries) {
    if (y + ROW > BOTTOM) y = startPage(doc, showName, cat, cols, true);
    doc.font(e.placeAwards.length ? "Helvetica-Bold" : "Helvetica").fontSize(9).fillColor(INK);
    cells(doc, cols, cols.map((c) => c.cell(e)), y);
    rule(doc, y + ROW - 3, RULE);
    y += ROW;
  }
}

/** Writes the summary to `out` (categories in the order given) and resolves when it is complete. */
export function writeJudgesSummary(data: JudgesSummaryData, out: Writable): Promise<void> {
  const doc = new PDFDocument({ size: "LETTER", layout: "landscape", margin: MARGIN, autoFirstPage: false, info: { Title: `${data.showName} judges' summary`, Producer: "Ribbonry" } });
  const done = pipeDone(doc, out);
  for (const cat of data.categories) category(doc, data.showName, cat);
  if (!data.categories.length) {
    doc.addPage();
    doc.font("Helvetica").fontSize(12).fillColor(INK).text(`${data.showName}: no categories to summarise.`, MARGIN, MARGIN);
  }
  doc.end();
  return done;
}
