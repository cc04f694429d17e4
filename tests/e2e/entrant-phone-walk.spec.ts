// Journey, on a phone (390 × 844): a new entrant reads the show page and starts an entry. The
// rules line wraps as words; a 3 × 2 in "quilt" gets a word about its size; a negative price left
// in the hidden price field after unticking "for sale" doesn't block "Save and continue"; the
// critique can be asked for while entering; the step tabs keep the current step in view.
import { expect, test, type Locator } from "@playwright/test";
import { DEMO_SHOW, linkFromMail, VIEWPORTS } from "./helpers";

/** The element's box lies inside the strip's visible part. */
async function inView(strip: Locator, item: Locator) {
  const s = (await strip.boundingBox())!;
  const b = (await item.boundingBox())!;
  return b.x >= s.x - 1 && b.x + b.width <= s.x + s.width + 1;
}

test("an entrant's walk on a phone: rules line, size words, hidden price, critique, step tabs", async ({ page }) => {
  test.setTimeout(420_000);
  await page.setViewportSize(VIEWPORTS.phone);
  const email = `walker-${Date.now()}@example.test`;

  // The show page's rules line reads as a sentence, not squeezed columns: at most three lines.
  await page.goto(`/shows/${DEMO_SHOW}`, { timeout: 120_000 });
  const versionLine = page.getByText(/You accept\s+this version when you enter/);
  await expect(versionLine).toBeVisible();
  const lineHeight = await versionLine.evaluate((el) => parseFloat(getComputedStyle(el).lineHeight) || 20);
  expect((await versionLine.boundingBox())!.height).toBeLessThanOrEqual(lineHeight * 3 + 2);

  await page.goto(`/sign-up?next=/shows/${DEMO_SHOW}/enter`, { timeout: 120_000 });
  await page.getByLabel("Your name").fill("Juniper Walker");
  await page.getByLabel("E-mail").fill(email);
  await page.getByLabel("Password", { exact: true }).fill("a-quilters-long-password");
  await page.getByRole("button", { name: /create/i }).click();
  await page.waitForURL(/check-email/);
  await page.goto(await linkFromMail(email, "Confirm", "/verify-email"), { waitUntil: "commit", timeout: 120_000 });
  await page.waitForURL((url) => !url.pathname.includes("/api/auth"));

  // Step 1: a 3 × 2 in quilt gets a word before it is saved.
  await page.goto(`/shows/${DEMO_SHOW}/enter`, { timeout: 120_000 });
  await page.waitForURL(/\/entries\/[0-9a-f-]+/);
  const entryUrl = page.url().split("?")[0]!;
  await page.getByLabel("Title").fill("Postage Stamp");
  await page.getByLabel("Width (in)").fill("3");
  await page.getByLabel("Length (in)").fill("2");
  await expect(page.getByRole("status", { name: "About this size" })).toContainText("unusually small");
  await page.getByLabel("Width (in)").fill("40");
  await page.getByLabel("Length (in)").fill("50");
  await page.getByLabel("Pieced").check();
  await page.getByRole("button", { name: "Save and continue" }).click();

  await page.getByLabel("Maker 1").fill("Juniper Walker");
  await page.getByLabel("I quilted it myself").check();
  await page.getByLabel("Quilted on a home machine").check();
  await page.getByLabel("My own original design").check();
  await page.getByRole("button", { name: "Save and continue" }).click();

  // Step 3: a negative price typed, then "for sale" unticked: the hidden field doesn't block.
  await page.getByLabel("Artist statement").fill("Tiny squares from a year of scraps.");
  await page.getByLabel("Declared value (US dollars)").fill("300");
  await page.getByLabel("This quilt is for sale").check();
  await page.getByLabel("Price (US dollars)").fill("-40");
  await page.getByLabel("This quilt is for sale").uncheck();
  await page.getByLabel("Enter it to be judged").check();
  await page.getByRole("radio", { name: "Open" }).check();
  const critique = page.getByLabel(/Ask for a judge’s critique/);
  if (await critique.count()) await critique.check();
  await page.getByRole("button", { name: "Save and continue" }).click();
  await page.waitForURL(/step=photos/, { timeout: 30_000 });

  // A blocked save says why at the top: a bad declared value.
  await page.goto(`${entryUrl}?step=about`);
  await page.getByLabel("Declared value (US dollars)").fill("lots");
  await page.getByRole("button", { name: "Save and continue" }).click();
  await expect(page.getByRole("alert").filter({ hasText: "Not saved yet" })).toBeVisible();

  // The step tabs: on the last step, the current tab is scrolled into view.
  await page.goto(`${entryUrl}?step=review`);
  const strip = page.getByRole("navigation", { name: "Entry steps" });
  const current = strip.locator('[aria-current="step"]');
  await expect(current).toContainText("Review");
  await expect.poll(() => inView(strip, current)).toBe(true);
  await page.screenshot({ path: "tests/artifacts/screenshots/entrant-walk-review-phone.png", fullPage: false });
});
