// Journey, at a desk: the chair opens Judging for a show of its own, edits the score sheet (the
// total is worked out live), tries to put a judge on a panel with the category holding that
// judge's own quilt, reads the refusal and its reason, fixes the panel, records and removes a
// declaration, and watches the progress board. Judges may not judge a category holding their own
// quilt (seen in several guilds' rules: common practice).
import { expect, test, type Page } from "@playwright/test";
import { expectNoSidewaysScroll, shootAllWidths, signIn, VIEWPORTS } from "./helpers";
import { makeConflictShow, type ConflictShow } from "./judging-setup-fixtures";

let show: ConflictShow;

test.beforeAll(async () => {
  show = await makeConflictShow("chair@ribbonry.test");
});
test.afterAll(async () => {
  await show?.remove();
});

async function fitsTablet(page: Page) {
  await page.setViewportSize(VIEWPORTS.tablet);
  await page.waitForTimeout(150);
  await expectNoSidewaysScroll(page);
  await page.setViewportSize(VIEWPORTS.desktop);
}

test("the chair sets up judging, is refused a conflicting panel with the reason, fixes it and sees the progress board", async ({ page }) => {
  test.setTimeout(240_000); // a long journey on a 2-core machine
  await page.setViewportSize(VIEWPORTS.desktop);
  await signIn(page, "chair@ribbonry.test");
  await page.goto(`/shows/${show.slug}/manage`);
  const tab = page.getByRole("navigation", { name: "Manage show" }).getByRole("link", { name: "Judging" });
  await expect(tab).toHaveAttribute("href", `/shows/${show.slug}/manage/judging`);
  await page.goto(`/shows/${show.slug}/manage/judging`);
  await expect(page.getByRole("heading", { level: 1, name: "Judging set-up" })).toBeVisible();
  const panels = page.getByRole("region", { name: "Panels" });
  await expect(panels).toContainText("2 categories have no panel yet.");
  await shootAllWidths(page, "judging-setup");
  await fitsTablet(page);

  // The sheet: raising one criterion shows the new total and the note at once; lowering another
  // brings it back to 100, and it saves.
  await page.getByRole("button", { name: `Edit ${show.sheetName}` }).click();
  const editor = page.getByRole("form", { name: `Edit “${show.sheetName}”` });
  const total = editor.getByTestId("sheet-total");
  await expect(total).toHaveText("Total 100");
  const impact = editor.getByRole("group", { name: "Criterion 1 of section 1" });
  await expect(impact.getByLabel("Criterion")).toHaveValue("Visual impact");
  await impact.getByLabel("Most points").fill("25");
  await expect(total).toHaveText("Total 105");
  await expect(editor.getByText("The sheet adds up to 105 points, not the usual 100.")).toBeVisible();
  await editor.getByRole("group", { name: "Criterion 2 of section 1" }).getByLabel("Most points").fill("5");
  await expect(total).toHaveText("Total 100");
  // Try it: full marks on the first criterion only give a partial total.
  await editor.getByText("Try it with sample marks").click();
  await editor.getByLabel("Visual impact", { exact: true }).last().fill("25");
  await expect(editor.getByText("Sample total 100 of 100 so far")).toBeVisible();
  await shootAllWidths(page, "judging-setup-sheet-editor");
  await fitsTablet(page);
  await editor.getByRole("button", { name: "Save sheet" }).click();
  await expect(page.getByText(`“${show.sheetName}” saved (total 100).`)).toBeVisible();

  // A category on a named method.
  const art = page.getByRole("form", { name: `Judging for ${show.categories.art}` });
  await art.getByLabel(`Method for ${show.categories.art}`).selectOption({ label: "Sorting pass, then ranking" });
  await art.getByRole("button", { name: `Save judging for ${show.categories.art}` }).click();
  await expect(art.getByText("Saved.")).toBeVisible();

  // The panel: both judges on both categories is refused, with the reason beside the judges.
  await page.getByRole("button", { name: "New panel" }).click();
  const panel = page.getByRole("form", { name: "New panel" });
  await panel.getByLabel("Panel name").fill("Panel C");
  await panel.getByLabel("Day").fill("2027-03-11");
  await panel.getByLabel("Room or table").fill("Fellowship Hall, table 3");
  await panel.getByLabel(show.judges.clear).check();
  await panel.getByLabel(show.judges.entered).check();
  await panel.getByLabel(show.scribe).check();
  await panel.getByLabel(show.categories.pieced).check();
  await panel.getByLabel(show.categories.art).check();
  await panel.getByRole("button", { name: "Save panel" }).click();
  const reason = `${show.judges.entered} has an entry in ${show.categories.art}, so can't judge it.`;
  await expect(panel.getByRole("listitem").filter({ hasText: reason })).toBeVisible();
  await expect(panel.getByText("Not saved: a judge can’t judge one of these categories.")).toBeVisible();
  await panel.scrollIntoViewIfNeeded();
  await shootAllWidths(page, "judging-setup-panel-conflict");
  await fitsTablet(page);

  // Fixed: Art quilts goes to another panel later; this one judges Pieced.
  await panel.getByLabel(show.categories.art).uncheck();
  await panel.getByRole("button", { name: "Save panel" }).click();
  await expect(page.getByText("Panel C saved.")).toBeVisible();
  await expect(page.getByRole("heading", { level: 3, name: "Panel C" })).toBeVisible();
  await expect(panels).toContainText("One category has no panel yet.");

  // A declaration, recorded and removed.
  const declare = page.getByRole("form", { name: "Record a declaration" });
  await declare.getByLabel("Judge").selectOption({ label: show.judges.clear });
  await declare.getByLabel("Name").fill("Rosalind Pike");
  await declare.getByLabel("Relation").selectOption({ label: "Student" });
  await declare.getByRole("button", { name: "Record declaration" }).click();
  await expect(page.getByText("Declaration recorded.")).toBeVisible();
  await expect(page.getByRole("listitem").filter({ hasText: "must not judge Rosalind Pike" })).toBeVisible();
  await page.getByRole("button", { name: `Remove Rosalind Pike for ${show.judges.clear}` }).click();
  await expect(page.getByText(`Rosalind Pike is no longer declared for ${show.judges.clear}.`)).toBeVisible();

  // The progress board: Panel C's sheets to do, Art quilts warned as unjudged, live.
  await expect(page.getByRole("link", { name: "Progress board" })).toHaveAttribute("href", `/shows/${show.slug}/manage/judging/progress`);
  await page.goto(`/shows/${show.slug}/manage/judging/progress`);
  await expect(page.getByRole("heading", { level: 1, name: "Judging progress" })).toBeVisible();
  await expect(page.getByText("Live: updates every 10 seconds")).toBeVisible();
  await expect(page.getByText(show.categories.art, { exact: true })).toBeVisible();
  const row = page.getByRole("row").filter({ hasText: "Panel C" });
  await expect(row).toContainText("Not enough sheets yet to tell");
  await expect(page.getByText("Slowest: Panel C")).toBeVisible();
  await shootAllWidths(page, "judging-progress");
  await fitsTablet(page);
});
