// Journey on the judging tablet: quick phrases show once, under the comment box in use, and
// follow the judge from box to box; the sheet stays short enough to work through.
import { expect, test } from "@playwright/test";
import { shootAllWidths, signIn, VIEWPORTS } from "./helpers";
import { JUDGE_EMAIL, makeJudgingShow } from "./judging-fixtures";
import { openEntry } from "./judging-steps";

test.use({ viewport: VIEWPORTS.tablet });

test("quick phrases show only under the focused comment box", async ({ page }) => {
  test.setTimeout(240_000);
  const show = await makeJudgingShow("quick-phrases", 1);
  await signIn(page, JUDGE_EMAIL);
  await page.goto(`/shows/${show.slug}/judging`);
  await openEntry(page, show.entries[0]!.entryNumber);
  const phraseLists = page.getByRole("list", { name: /^Quick phrases for/ });
  await expect(page.getByRole("textbox", { name: "Overall comment" })).toBeVisible();
  await expect(phraseLists).toHaveCount(0);

  await page.getByRole("textbox", { name: "Overall comment" }).click();
  await expect(phraseLists).toHaveCount(1);
  await expect(page.getByRole("list", { name: "Quick phrases for overall comment" })).toBeVisible();
  await page.getByRole("list", { name: "Quick phrases for overall comment" }).getByRole("button").first().click();
  await expect(page.getByRole("textbox", { name: "Overall comment" })).toBeFocused();

  const sectionBox = page.getByRole("textbox", { name: /^Comment on / }).first();
  await sectionBox.click();
  await expect(phraseLists).toHaveCount(1);
  await expect(page.getByRole("list", { name: "Quick phrases for overall comment" })).toHaveCount(0);
  await shootAllWidths(page, "judging-quick-phrases");
});
