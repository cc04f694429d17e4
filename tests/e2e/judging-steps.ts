// Steps the judging-tablet journeys share: open an entry by number, mark the demo sheet, submit.
import { expect, type Page } from "@playwright/test";

/** The marks one test sheet gets: Visual impact varies by entry so each sheet is told apart. */
export const marksFor = (impact: number) => ({ impact, colour: 8, composition: 12, fabric: 7, piecing: 12, quilting: 11 });

export async function openEntry(page: Page, entryNumber: number) {
  await page.getByLabel("Jump to entry number").fill(String(entryNumber));
  await page.getByRole("button", { name: "Open" }).click();
  await expect(page.getByRole("heading", { level: 2, name: `Scratch quilt ${entryNumber}` })).toBeVisible();
}

const LABELS: Record<string, string> = { impact: "Visual impact", colour: "Colour and contrast", composition: "Composition and balance", fabric: "Use of fabric", piecing: "Piecing", quilting: "Quilting stitches" };

/** Marks every criterion of the demo sheet (Appliqué N/A, edges "Good"), a quick phrase, and submits. */
export async function scoreAndSubmit(page: Page, entryNumber: number, impact: number) {
  await openEntry(page, entryNumber);
  for (const [id, points] of Object.entries(marksFor(impact))) {
    await page.getByRole("group", { name: new RegExp(`^${LABELS[id]}`) }).getByRole("button", { name: `${points} points`, exact: true }).click();
  }
  await page.getByRole("group", { name: /^Appliqué/ }).getByRole("button", { name: /^N\/A/ }).click();
  await page.getByRole("group", { name: /^Edges and binding/ }).getByRole("button", { name: "Good", exact: true }).click();
  await page.getByRole("textbox", { name: "Overall comment" }).click(); // phrases show under the box in use
  await page.getByRole("list", { name: "Quick phrases for overall comment" }).getByRole("button", { name: "+ Points meet crisply." }).click();
  await expect(page.getByRole("textbox", { name: "Overall comment" })).toHaveValue("Points meet crisply.");
  await page.getByRole("button", { name: "Submit sheet" }).click();
  await page.getByRole("button", { name: /^Yes, submit/ }).click();
  await expect(page.getByText(/^Submitted/).first()).toBeVisible();
  await page.getByRole("button", { name: "All entries" }).click();
}
