// Award cards to pin on the quilts: four to a Letter page (2 × 2) with light dashed cut lines,
// each with the show, the category, the place or award in large type, the ribbon, the entry
// number and the title. Never the entrant: the cards hang in the show before pick-up, so they
// stay as blind as the judging (the type has no name field and nothing else is read).
import type { Writable } from "node:stream";
import PDFDocument from "pdfkit";
import { pipeDone, fitSize, truncate } from "./pdf-text";

export type AwardCard = {
  categoryCode: string;
  categoryName: string;
  /** "1st", "Honorable mention", "Best of Show", … */
  award: string;
  ribbon: string;
  entryNumber: number;
  title: string;
};

export type AwardCardsData = { showName: string; cards: readonly AwardCard[] };

export const CARDS_PER_PAGE = 4;
const PAGE = { width: 612, height: 792 }; // US Letter in points
const CARD = { width: PAGE.width / 2, height: PAGE.height / 2 };
const PAD = 30;
const INK = "#2b2230";
const MUTED = "#6b6270";
const CUT = "#b9b1bd";

function cutLines(doc: PDFKit.PDFDocument): void {
  doc.save().lineWidth(0.5).strokeColor(CUT).dash(4, { space: 4 });
  doc.moveTo(CARD.width, 0).lineTo(CARD.width, PAGE.height).stroke();
  doc.moveTo(0, CARD.height).lineTo(PAGE.width, CARD.height).stroke();
  doc.undash().restore();
}

/** One centred line at (x, y) in the given font and size, cut with an ellipsis to the width. */
function line(doc: PDFKit.PDFDocument, text: string, x: number, y: number, width: number, font: string, size: number, colour = INK): void {
  doc.font(font).fontSize(size).fillColor(colour);
  doc.text(truncate(doc, text, width), x, y, { width, align: "center", lineBreak: false });
}

function card(doc: PDFKit.PDFDocument, showName: string, c: AwardCard, slot: number): void {
  const x = (slot % 2) * CARD.width + PAD;
  const top = Math.floor(slot / 2) * CARD.height + PAD + 24; // centres the content on the card
  const width = CARD.width - 2 * PAD;
  line(doc, showName, x, top + 6, width, "Helvetica", 11, MUTED);
  line(doc, [c.categoryCode, c.categoryName].filter((s) => s.trim()).join(" "), x, top + 26, width, "Helvetica", 13);
  doc.save().lineWidth(0.75).strokeColor(CUT).moveTo(x + 40, top + 50).lineTo(x + width - 40, top + 50).stroke().restore();

  doc.font("Helvetica-Bold");
  const size = fitSize(doc, c.award, width, 40, 20);
  line(doc, c.award, x, top + 64 + (40 - size) / 2, width, "Helvetica-Bold", size);
  if (c.ribbon.trim()) line(doc, c.ribbon, x, top + 118, width, "Helvetica-Oblique", 14, MUTED);

  line(doc, "ENTRY", x, top + 158, width, "Helvetica", 10, MUTED);
  line(doc, String(c.entryNumber), x, top + 172, width, "Helvetica-Bold", 64);
  // The title may take two lines; pdfkit ends the second with an ellipsis when it runs over.
  doc.font("Helvetica").fontSize(14).fillColor(INK);
  doc.text(c.title.replace(/\s+/g, " ").trim(), x, top + 258, { width, height: 36, align: "center", ellipsis: "…" });
}

/** Writes the cards to `out` in the order given and resolves when the PDF is complete. */
export function writeAwardCards(data: AwardCardsData, out: Writable): Promise<void> {
  const doc = new PDFDocument({ size: "LETTER", margin: 0, autoFirstPage: false, info: { Title: `${data.showName} award cards`, Producer: "Ribbonry" } });
  const done = pipeDone(doc, out);
  data.cards.forEach((c, i) => {
    const slot = i % CARDS_PER_PAGE;
    if (slot === 0) {
      doc.addPage();
      cutLines(doc);
    }
    card(doc, data.showName, c, slot);
  });
  if (!data.cards.length) {
    doc.addPage();
    line(doc, `${data.showName}: no award cards to print.`, 54, 72, PAGE.width - 108, "Helvetica", 12);
  }
  doc.end();
  return done;
}
