// Journey, at a desk: the chair finds submitted entries, accepts one, opens it to see its
// history, downloads the spreadsheet and looks over the settings.
import { expect, test } from "@playwright/test";
import { DEMO_SHOW, shootAllWidths, signIn, VIEWPORTS } from "./helpers";

test("the chair filters, accepts an entry, reads its history and downloads the spreadsheet", async ({ page }) => {
  await page.setViewportSize(VIEWPORTS.desktop);
  await signIn(page, "chair@ribbonry.test");
  await page.goto(`/shows/${DEMO_SHOW}/manage/entries`);
  await page.getByRole("combobox", { name: "Status" }).selectOption("submitted");
  const firstChoice = page.getByRole("checkbox", { name: /^Choose No\. \d+/ }).first();
  await expect(firstChoice).toBeVisible();
  const label = (await firstChoice.getAttribute("aria-label"))!;
  const number = /No\. (\d+)/.exec(label)![1]!;
  await shootAllWidths(page, "chair-entries-table");
  await firstChoice.check();
  await page.getByRole("button", { name: /^Accept/ }).click();
  await expect(page.getByText("The entrants have been e-mailed.")).toBeVisible();

  // The entry's own page shows the decision in its history.
  await page.getByRole("combobox", { name: "Status" }).selectOption("");
  await page.getByRole("searchbox", { name: "Search" }).or(page.getByRole("textbox", { name: "Search" })).first().fill(number);
  const row = page.getByRole("row").filter({ has: page.getByRole("checkbox", { name: label }) });
  await row.locator(`a[href*="/manage/entries/"]`).first().click();
  await expect(page.getByRole("heading", { level: 1 })).toBeVisible();
  await expect(page.getByRole("main").getByText("Accepted").first()).toBeVisible();
  await shootAllWidths(page, "chair-entry-detail");

  // The spreadsheet comes down as an .xlsx file named for the show.
  await page.goto(`/shows/${DEMO_SHOW}/manage/entries`);
  const [download] = await Promise.all([page.waitForEvent("download"), page.getByRole("link", { name: "Download spreadsheet" }).click()]);
  expect(download.suggestedFilename()).toMatch(new RegExp(`^${DEMO_SHOW}-entries-\\d{4}-\\d{2}-\\d{2}\\.xlsx$`));

  await page.goto(`/shows/${DEMO_SHOW}/manage/settings`);
  await expect(page.getByRole("heading", { level: 1 })).toBeVisible();
  await shootAllWidths(page, "chair-settings");
});
