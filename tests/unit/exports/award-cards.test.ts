// Award cards read back with pdfjs-dist: Letter pages of four cards (2 × 2) with dashed cut lines,
// each quarter holding its own card's text and nobody else's, the award and the entry number in
// large type, and never an entrant's name.
import { describe, expect, it } from "vitest";
import { writeAwardCards, type AwardCard } from "@/exports/award-cards";
import { readPdf, type PdfItem, type PdfPage } from "./read-back";

const SHOW = "Cedar Hollow Quilt Show 2027";
const LONG_CATEGORY = "Youth, ages 12 to 17, any technique, made and quilted by the entrant alone";
const LONG_TITLE = "Grandmother's Flower Garden Revisited in Indigo, Madder and Weld-Dyed Cottons from the Old Mill";

// Invented entries; the names are passed along as callers might (rows that carry them) and must not print.
const WITH_NAMES = [
  { categoryCode: "101", categoryName: "Large Pieced", award: "Best of Show", ribbon: "Purple rosette", entryNumber: 112, title: "Harbor Lights", entrantName: "Wren Castellano" },
  { categoryCode: "101", categoryName: "Large Pieced", award: "2nd", ribbon: "Red", entryNumber: 131, title: "Salt Marsh at Dusk", entrantName: "Odile Faraday" },
  { categoryCode: "101", categoryName: "Large Pieced", award: "Honorable mention", ribbon: "Green", entryNumber: 140, title: "Tide Chart", entrantName: "Basil Okonkwo" },
  { categoryCode: "205", categoryName: "Small Appliqué", award: "1st", ribbon: "Blue", entryNumber: 207, title: "Fern Hollow", entrantName: "Junia Marchetti" },
  { categoryCode: "310", categoryName: "Art Quilts", award: "3rd", ribbon: "Yellow", entryNumber: 318, title: LONG_TITLE, entrantName: "Tobias Lindqvist" },
  { categoryCode: "410", categoryName: LONG_CATEGORY, award: "1st", ribbon: "Blue", entryNumber: 402, title: "Comet Tail", entrantName: "Priya Natarajan" },
];
const CARDS: AwardCard[] = WITH_NAMES;
const NAMES = WITH_NAMES.map((c) => c.entrantName);

/** The card's quarter of a Letter page: 0 top left, 1 top right, 2 bottom left, 3 bottom right. */
const slotOf = (page: PdfPage, i: PdfItem) => (i.y < page.height / 2 ? 2 : 0) + (i.x < page.width / 2 ? 0 : 1);
const slotText = (page: PdfPage, slot: number) => page.items.filter((i) => slotOf(page, i) === slot).map((i) => i.str).join(" ");

describe("award cards", () => {
  it("puts four cards on each Letter page with dashed cut lines", async () => {
    const pages = await readPdf((out) => writeAwardCards({ showName: SHOW, cards: CARDS }, out));
    expect(pages).toHaveLength(2);
    for (const p of pages) {
      expect([p.width, p.height]).toEqual([612, 792]); // US Letter, 8.5 × 11 in
      expect(p.dashes).toBeGreaterThan(0);
    }
    expect(slotText(pages[1]!, 2)).toBe("");
    expect(slotText(pages[1]!, 3)).toBe("");
  });

  it("keeps each card's show, category, award, ribbon, number and title in its own quarter", async () => {
    const pages = await readPdf((out) => writeAwardCards({ showName: SHOW, cards: CARDS }, out));
    CARDS.forEach((card, k) => {
      const page = pages[Math.floor(k / 4)]!;
      const text = slotText(page, k % 4);
      expect(text).toContain(SHOW);
      if (card.categoryName !== LONG_CATEGORY) expect(text).toContain(`${card.categoryCode} ${card.categoryName}`);
      expect(text).toContain(card.award);
      expect(text).toContain(card.ribbon);
      expect(text).toContain(String(card.entryNumber));
      if (card.title !== LONG_TITLE) expect(text).toContain(card.title);
      // No other card's number or title crept into this quarter.
      for (const other of CARDS.filter((o) => o !== card)) {
        expect(text).not.toContain(String(other.entryNumber));
        expect(text).not.toContain(other.title.slice(0, 12));
      }
    });
  });

  it("prints the award and the entry number in large type", async () => {
    const [page] = await readPdf((out) => writeAwardCards({ showName: SHOW, cards: CARDS }, out));
    const number = page!.items.find((i) => i.str === "112")!;
    const award = page!.items.find((i) => i.str === "Best of Show")!;
    const title = page!.items.find((i) => i.str === "Harbor Lights")!;
    expect(number.size).toBe(64);
    expect(award.size).toBeGreaterThanOrEqual(20);
    expect(award.size).toBeGreaterThan(title.size);
    // "Honorable mention" is shrunk to fit the card's width rather than running past its edge.
    const hm = page!.items.find((i) => i.str === "Honorable mention")!;
    expect(hm.size).toBeLessThan(40);
    expect(hm.x).toBeGreaterThanOrEqual(30);
    expect(hm.x + hm.width).toBeLessThanOrEqual(306 - 30 + 0.5);
  });

  it("keeps every line inside its card, cutting a long category with an ellipsis", async () => {
    const pages = await readPdf((out) => writeAwardCards({ showName: SHOW, cards: CARDS }, out));
    for (const page of pages) {
      for (const item of page.items) {
        const left = (slotOf(page, item) % 2) * (page.width / 2);
        expect(item.x, item.str).toBeGreaterThanOrEqual(left + 30 - 0.5);
        expect(item.x + item.width, item.str).toBeLessThanOrEqual(left + page.width / 2 - 30 + 0.5);
      }
    }
    expect(slotText(pages[1]!, 1)).toMatch(/410 Youth, ages 12 to 17, any .*…/);
  });

  it("cuts a long title to two lines with an ellipsis", async () => {
    const pages = await readPdf((out) => writeAwardCards({ showName: SHOW, cards: CARDS }, out));
    const text = slotText(pages[1]!, 0);
    expect(text).toContain("Grandmother's Flower Garden");
    expect(text).toContain("…");
    expect(text).not.toContain("Old Mill");
  });

  it("never prints an entrant's name", async () => {
    const pages = await readPdf((out) => writeAwardCards({ showName: SHOW, cards: CARDS }, out));
    const all = pages.map((p) => p.text).join(" ");
    for (const name of NAMES) expect(all).not.toContain(name);
  });
});
