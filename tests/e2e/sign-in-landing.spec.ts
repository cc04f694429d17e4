// Journey: signing in lands each person where their role at a current show is — the chair on the
// show's pages, an entrant on "My entries" — and My entries is one tap away at every width.
import { expect, test } from "@playwright/test";
import { shootAllWidths, signIn, VIEWPORTS } from "./helpers";

test.setTimeout(180_000);

test("the chair lands on the show's pages, with My entries one tap away", async ({ page }) => {
  await page.setViewportSize(VIEWPORTS.phone);
  await signIn(page, "chair@ribbonry.test");
  // The chair runs the demo show (and, in a test database, the shows other journeys made).
  await page.waitForURL(/\/shows\/[^/]+\/manage$/, { timeout: 120_000 });
  const mine = page.getByRole("banner").getByRole("link", { name: "My entries" });
  await expect(mine).toBeVisible();
  await shootAllWidths(page, "landing-chair");
  await page.setViewportSize(VIEWPORTS.phone);
  await mine.click();
  await page.waitForURL(/\/my$/);
});

test("an entrant with no show role lands on My entries", async ({ page }) => {
  await page.setViewportSize(VIEWPORTS.desktop);
  await signIn(page, "entrant3@ribbonry.test");
  await page.waitForURL(/\/my$/, { timeout: 120_000 });
  await expect(page.getByRole("heading", { name: "My entries" }).first()).toBeVisible({ timeout: 60_000 });
});
