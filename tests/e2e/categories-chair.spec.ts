// Journey, at a desk: the chair builds two size bands for a show of their own, previews the
// entries each would take, sees the gap the bands leave (240 → 241 in leaves 240.5 in nowhere,
// a boundary trap seen in real show rules: Heritage Quilters of Huntsville, hsvquilters.org),
// closes it, saves with the moves confirmed, and finds the result after a reload.
import { expect, test, type Page } from "@playwright/test";
import { makeScratchShow, type ScratchShow } from "./db";
import { expectNoSidewaysScroll, shootAllWidths, signIn, VIEWPORTS } from "./helpers";

const CHAIR = "chair@ribbonry.test";
// Perimeters 2 × (width + length): 100, 220, 240, 240.5, 300 and 380 in.
const QUILTS = [
  { entryNumber: 101, title: "Pocket Garden", widthIn: 20, lengthIn: 30 },
  { entryNumber: 102, title: "Sunrise Star", widthIn: 50, lengthIn: 60 },
  { entryNumber: 103, title: "Harbour Lights", widthIn: 60, lengthIn: 60 },
  { entryNumber: 104, title: "Long Meadow", widthIn: 60, lengthIn: 60.25 },
  { entryNumber: 105, title: "Orchard Rows", widthIn: 70, lengthIn: 80 },
  { entryNumber: 106, title: "Night Train", widthIn: 90, lengthIn: 100 },
];

let show: ScratchShow;
test.beforeAll(async () => {
  show = await makeScratchShow("categories-journey", CHAIR, QUILTS);
});
test.afterAll(async () => {
  await show?.remove();
});

/** Adds a category with one perimeter limit (besides the "judged" condition a new one starts with). */
async function addBand(page: Page, code: string, name: string, op: string, inches: string) {
  await page.getByRole("button", { name: "Add a category" }).click();
  const form = page.getByRole("form", { name: "New category" });
  await form.getByLabel("Code", { exact: true }).fill(code);
  await form.getByLabel("Name", { exact: true }).fill(name);
  await form.getByRole("button", { name: "Add a condition" }).click();
  await form.getByLabel("Measured on", { exact: true }).selectOption("perimeter");
  await form.getByLabel("Limit", { exact: true }).selectOption(op);
  await form.getByLabel("Value", { exact: true }).fill(inches);
  return form;
}

test("the chair builds size bands, sees the gap between them, fixes it and saves", async ({ page }) => {
  test.setTimeout(180_000); // a long journey with nine screenshots
  await page.setViewportSize(VIEWPORTS.desktop);
  await signIn(page, CHAIR);
  await page.goto(`/shows/${show.slug}/manage`);
  await page.getByRole("navigation", { name: "Manage show" }).getByRole("link", { name: "Categories" }).click();
  await page.waitForURL(/\/manage\/categories$/);
  await expect(page.getByRole("heading", { level: 1, name: "Categories", exact: true })).toBeVisible({ timeout: 60_000 });
  await expect(page.getByTestId("queue-count")).toContainText("6");

  // Small: perimeter under 240 in. The preview lists the entries it would take as typed.
  let form = await addBand(page, "10", "Small", "<", "240");
  const takes = form.getByTestId("rule-takes");
  await expect(takes).toContainText("#101 Pocket Garden");
  await expect(takes).toContainText("#102 Sunrise Star");
  await expect(takes).not.toContainText("Harbour Lights"); // 240 in exactly is not under 240 in
  await form.getByRole("button", { name: "Done" }).click();

  // Large: perimeter at least 241 in, which leaves 240 up to 241 in to no category.
  form = await addBand(page, "20", "Large", ">=", "241");
  await expect(form.getByTestId("rule-takes")).toContainText("#105 Orchard Rows");
  await expect(form.getByTestId("rule-takes")).toContainText("#106 Night Train");
  const gaps = page.getByTestId("gaps");
  await expect(gaps).toContainText("Perimeter at least 240 in and under 241 in fits no category: between Small and Large");
  await expect(page.getByTestId("entries-none")).toContainText("#103 Harbour Lights");
  await expect(page.getByTestId("entries-none")).toContainText("#104 Long Meadow");
  await shootAllWidths(page, "categories-gap");
  await form.getByRole("button", { name: "Done" }).click();
  await expect(gaps).toBeVisible();

  // Fix: Large from 240 in (at least), so the bands meet with "<" on one side and "≥" on the other.
  await page.getByRole("button", { name: "Edit 20 Large" }).click();
  form = page.getByRole("form", { name: "Editing 20 Large" });
  await form.getByLabel("Value", { exact: true }).fill("240");
  await expect(page.getByText("No gaps or overlaps between size bands")).toBeVisible();
  await expect(form.getByTestId("rule-takes")).toContainText("#103 Harbour Lights");
  await expect(page.getByText("Every current entry fits a category.")).toBeVisible();
  await form.getByRole("button", { name: "Done" }).click();

  // Save: the moves come first, then they are applied.
  await page.getByLabel("Note for the record").fill("Two size bands for the scratch show");
  await page.getByRole("button", { name: "Save categories" }).click();
  const moves = page.getByTestId("moves");
  await expect(moves).toContainText("#102 Sunrise Star: not decided");
  await expect(moves).toContainText("10 Small");
  await expect(moves.getByRole("listitem")).toHaveCount(6);
  await shootAllWidths(page, "categories-moves");
  await page.getByRole("button", { name: "Apply 6 moves" }).click();
  await expect(page.getByText("2 categories saved. 6 entries moved.")).toBeVisible();

  // After a reload the saved set and its entries are on the page, and the queue is empty.
  await page.reload();
  const list = page.getByRole("table", { name: "Categories in precedence order" });
  await expect(list.getByRole("row").filter({ hasText: "Small" })).toContainText("perimeter under 240 in");
  await expect(list.getByRole("row").filter({ hasText: "Small" }).getByRole("cell").nth(2)).toHaveText(/2/);
  await expect(list.getByRole("row").filter({ hasText: "Large" })).toContainText("perimeter at least 240 in");
  await expect(list.getByRole("row").filter({ hasText: "Large" }).getByRole("cell").nth(2)).toHaveText(/4/);
  await expect(page.getByTestId("queue-count")).toContainText("0");
  await expect(page.getByText("No gaps or overlaps between size bands")).toBeVisible();
  await shootAllWidths(page, "categories-saved");
  await page.setViewportSize(VIEWPORTS.phone);
  await expectNoSidewaysScroll(page);
});
