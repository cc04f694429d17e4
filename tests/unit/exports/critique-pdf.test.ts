// The critique PDF read back with an independent reader (pdfjs-dist): one page per judge, the
// right entry, marks, N/A, rescaled totals and comments.
import path from "node:path";
import { PassThrough } from "node:stream";
import { describe, expect, it } from "vitest";
import { getDocument } from "pdfjs-dist/legacy/build/pdf.mjs";
import { writeCritique, type CritiqueData } from "@/exports/critique-pdf";

async function pdfText(data: CritiqueData): Promise<string[]> {
  const out = new PassThrough();
  const chunks: Buffer[] = [];
  out.on("data", (c: Buffer) => chunks.push(c));
  await writeCritique(data, out);
  const pdf = await getDocument({ data: new Uint8Array(Buffer.concat(chunks)), useSystemFonts: false, standardFontDataUrl: `${path.join(process.cwd(), "node_modules/pdfjs-dist/standard_fonts")}/` }).promise;
  const pages: string[] = [];
  for (let p = 1; p <= pdf.numPages; p++) {
    const content = await (await pdf.getPage(p)).getTextContent();
    pages.push(content.items.map((i) => ("str" in i ? i.str : "")).join(" ").replace(/\s+/g, " "));
  }
  return pages;
}

const DATA: CritiqueData = {
  showName: "Test Show 2027",
  entryNumber: 142,
  title: "Marigold Crossing",
  category: "11 Pieced, Medium",
  sheet: {
    sections: [
      { id: "look", title: "General appearance", criteria: [{ id: "impact", label: "Visual impact", maxPoints: 40, scale: { kind: "points" }, allowNotApplicable: false }] },
      { id: "work", title: "Workmanship", criteria: [{ id: "piecing", label: "Piecing", maxPoints: 30, scale: { kind: "points" }, allowNotApplicable: true }, { id: "quilting", label: "Quilting", maxPoints: 30, scale: { kind: "points" }, allowNotApplicable: false }] },
    ],
  },
  judges: [
    { label: "Judge 1", marks: { impact: { kind: "points", points: 36 }, piecing: { kind: "points", points: 27 }, quilting: { kind: "points", points: 25 } }, sectionComments: { work: "Points meet crisply." }, overallComment: "A joyful quilt." },
    { label: "Judge 2", marks: { impact: { kind: "points", points: 34 }, piecing: { kind: "na" }, quilting: { kind: "points", points: 27 } }, sectionComments: {}, overallComment: "Even stitches throughout." },
  ],
};

describe("critique PDF", () => {
  it("has one page per judge with the entry, the marks, the totals and the comments", async () => {
    const pages = await pdfText(DATA);
    expect(pages).toHaveLength(2);
    expect(pages[0]).toContain("Entry 142: Marigold Crossing");
    expect(pages[0]).toContain("11 Pieced, Medium · Judge 1");
    expect(pages[0]).toContain("Points meet crisply.");
    expect(pages[0]).toContain("Total: 88 of 100"); // 36 + 27 + 25
    expect(pages[0]).toContain("A joyful quilt.");
    expect(pages[0]).not.toContain("Even stitches");
    // Judge 2 marked piecing N/A: 61 of the 70 points that apply, on 100 → 87.14.
    expect(pages[1]).toContain("N/A of 30");
    expect(pages[1]).toContain("Total: 87.14 of 100");
    expect(pages[1]).toContain("Even stitches throughout.");
    expect(pages.join(" ")).not.toContain("A joyful quilt. Even");
  });
});
