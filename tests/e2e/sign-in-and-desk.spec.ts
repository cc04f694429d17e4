// Journeys: a wrong password gets a plain message and keeps the e-mail typed; the home page and
// sign-in work on a phone; the intake volunteer finds a quilt by number at the desk.
import { expect, test } from "@playwright/test";
import { DEMO_SHOW, expectNoSidewaysScroll, shootAllWidths, signIn, VIEWPORTS } from "./helpers";

test("home page lists the demo show, and a wrong password is explained", async ({ page }) => {
  await page.setViewportSize(VIEWPORTS.phone);
  await page.goto("/");
  await expect(page.getByRole("main").getByText("Pennywhistle Falls Quilt Show 2027").first()).toBeVisible();
  await expectNoSidewaysScroll(page);
  await shootAllWidths(page, "home");

  await page.goto("/sign-in");
  await page.getByLabel("E-mail").fill("entrant3@ribbonry.test");
  await page.getByLabel("Password", { exact: true }).fill("not-my-password");
  await page.getByRole("button", { name: /sign in/i }).click();
  await expect(page.getByText("That e-mail and password don't match.").or(page.getByText("That e-mail and password don’t match.")).first()).toBeVisible();
  await expect(page.getByLabel("E-mail")).toHaveValue("entrant3@ribbonry.test");
  await shootAllWidths(page, "sign-in-wrong-password");
});

test("the intake volunteer finds a quilt by its entry number", async ({ page }) => {
  await page.setViewportSize(VIEWPORTS.tablet);
  await signIn(page, "intake@ribbonry.test");
  await page.goto(`/shows/${DEMO_SHOW}/desk`);
  await expect(page.getByText(/\d+ entries\./)).toBeVisible();
  await page.getByLabel("Find an entry").fill("101");
  await expect(page.getByText("1 of")).toBeVisible();
  await expect(page.getByText("Pennywhistle Stars")).toBeVisible();
  await expect(page.getByText(/Up to date as of/)).toBeVisible();
  await shootAllWidths(page, "desk-search");
});
