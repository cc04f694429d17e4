// An entrant's critique sheet as a PDF: one page per judge with the marks per section, the
// section and sheet totals (N/A rescaled) and the judge's comments. Only this entry's data goes
// in; the caller sends it only after results are published. pdfkit's built-in Helvetica metrics
// ship inside the npm package, so nothing is fetched.
import { PassThrough, type Writable } from "node:stream";
import PDFDocument from "pdfkit";
import { formatScore, markPoints, sheetTotal, type Mark, type ScoreSheet } from "../scoring/score-sheets";

export type CritiqueJudge = {
  /** How the sheet names the judge, e.g. "Judge 1" (shows choose whether to print names). */
  label: string;
  marks: Record<string, Mark | undefined>;
  sectionComments: Record<string, string>;
  overallComment: string;
};

export type CritiqueData = {
  showName: string;
  entryNumber: number;
  title: string;
  category: string;
  sheet: ScoreSheet;
  judges: CritiqueJudge[];
};

const MARGIN = 54;
const INK = "#2b2230";
const MUTED = "#6b6270";

function markText(mark: Mark | undefined, points: number | null): string {
  if (!mark) return "—";
  if (mark.kind === "na") return "N/A";
  if (mark.kind === "word") return `${mark.level} (${formatScore(points)})`;
  return formatScore(points);
}

/** Writes the critique to `out` and resolves when the PDF is complete. */
export function writeCritique(data: CritiqueData, out: Writable): Promise<void> {
  const doc = new PDFDocument({ size: "LETTER", margin: MARGIN, info: { Title: `Critique, entry ${data.entryNumber}`, Producer: "Ribbonry" } });
  const done = new Promise<void>((resolve, reject) => {
    out.on("finish", () => resolve());
    out.on("error", reject);
    doc.on("error", reject);
  });
  doc.pipe(out);
  const width = doc.page.width - 2 * MARGIN;

  data.judges.forEach((judge, i) => {
    if (i > 0) doc.addPage();
    doc.fillColor(MUTED).font("Helvetica").fontSize(10).text(data.showName);
    doc.moveDown(0.3).fillColor(INK).font("Helvetica-Bold").fontSize(18).text(`Entry ${data.entryNumber}: ${data.title}`);
    doc.font("Helvetica").fontSize(11).fillColor(MUTED).text(`${data.category} · ${judge.label}`);
    doc.moveDown(0.8);

    const total = sheetTotal(data.sheet, judge.marks);
    for (const section of data.sheet.sections) {
      const sub = total.bySection.find((s) => s.sectionId === section.id);
      doc.fillColor(INK).font("Helvetica-Bold").fontSize(12).text(section.title, { continued: true });
      doc.font("Helvetica").fillColor(MUTED).text(sub && sub.total !== null ? `   ${formatScore(sub.total)} of ${formatScore(sub.nominalMax)}` : "");
      doc.moveDown(0.2);
      for (const c of section.criteria) {
        const mark = judge.marks[c.id];
        const y = doc.y;
        doc.fillColor(INK).font("Helvetica").fontSize(10.5).text(c.label, MARGIN + 12, y, { width: width - 140 });
        doc.text(`${markText(mark, markPoints(c, mark))} of ${formatScore(c.maxPoints * (c.weight ?? 1))}`, MARGIN + width - 128, y, { width: 128, align: "right" });
        doc.x = MARGIN;
      }
      const comment = judge.sectionComments[section.id]?.trim();
      if (comment) doc.moveDown(0.2).fillColor(INK).font("Helvetica-Oblique").fontSize(10.5).text(comment, MARGIN + 12, doc.y, { width: width - 12 });
      doc.x = MARGIN;
      doc.moveDown(0.7);
    }
    doc.moveTo(MARGIN, doc.y).lineTo(MARGIN + width, doc.y).strokeColor("#d8cfdc").stroke();
    doc.moveDown(0.5);
    const totalLine = total.total === null ? "Total: not complete" : `Total: ${formatScore(total.total)} of ${formatScore(total.nominalMax)}`;
    doc.fillColor(INK).font("Helvetica-Bold").fontSize(13).text(totalLine);
    if (total.naCriteria.length) doc.font("Helvetica").fontSize(9.5).fillColor(MUTED).text("Criteria marked N/A do not count; the total is taken over the criteria that apply.");
    if (judge.overallComment.trim()) {
      doc.moveDown(0.6).fillColor(INK).font("Helvetica-Bold").fontSize(11).text("Comments");
      doc.font("Helvetica").fontSize(10.5).text(judge.overallComment.trim());
    }
  });
  if (!data.judges.length) doc.font("Helvetica").fontSize(12).text(`Entry ${data.entryNumber}: no judge's sheet to show.`);
  doc.end();
  return done;
}

/** The whole critique PDF in memory (for a download or a mail attachment). */
export async function critiqueBytes(data: CritiqueData): Promise<Buffer> {
  const out = new PassThrough();
  const chunks: Buffer[] = [];
  out.on("data", (c: Buffer) => chunks.push(c));
  await writeCritique(data, out);
  return Buffer.concat(chunks);
}
