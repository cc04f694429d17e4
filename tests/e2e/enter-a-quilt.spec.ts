// Journey, on a phone: a new quilter creates an account, registers a quilt in steps with two
// photos, sends it, pays the entry fee on the (local) payment page, sees it paid in "My
// entries", and the entry and receipt e-mails arrive; someone else's entry is a plain 404.
import { expect, test } from "@playwright/test";
import { phoneStyleJpeg, pngOf } from "../helpers/photo-fixtures";
import { waitForMail } from "../helpers/mailbox";
import { someoneElsesEntryId } from "./db";
import { DEMO_SHOW, expectNoSidewaysScroll, linkFromMail, MAIL_WEB_URL, shootAllWidths, VIEWPORTS } from "./helpers";

test("an entrant registers a quilt with two photos, pays, and gets the receipt", async ({ page }) => {
  test.setTimeout(180_000);
  const email = `quilter-${Date.now()}@example.test`;
  page.on("console", (m) => {
    if (m.type() === "error") console.log(`[browser] ${m.text()}`);
  });
  await page.setViewportSize(VIEWPORTS.phone);

  // A new account, confirmed from the e-mail.
  await page.goto(`/sign-up?next=/shows/${DEMO_SHOW}/enter`);
  await page.getByLabel("Your name").fill("Wren Quilter");
  await page.getByLabel("E-mail").fill(email);
  await page.getByLabel("Password", { exact: true }).fill("a-quilters-long-password");
  await page.getByRole("button", { name: /create/i }).click();
  await page.waitForURL(/check-email/);
  await page.goto(await linkFromMail(email, "Confirm", "/verify-email"));
  await page.waitForURL((url) => !url.pathname.includes("/api/auth"));

  // Step 1: the quilt. A fraction typed the way quilters write it.
  await page.goto(`/shows/${DEMO_SHOW}/enter`);
  await page.waitForURL(/\/entries\/[0-9a-f-]+/);
  await page.getByLabel("Title").fill("Lantern Field");
  await page.getByLabel("Width (in)").fill("60 1/2");
  await page.getByLabel("Length (in)").fill("72");
  await expect(page.getByText(/153\.7/).first()).toBeVisible(); // 60½ in = 153.67 cm (NIST SP 811: 1 in = 2.54 cm)
  await page.getByLabel("Pieced").check();
  await expectNoSidewaysScroll(page);
  await shootAllWidths(page, "entry-step-quilt");
  await page.getByRole("button", { name: "Save and continue" }).click();

  // Step 2: the makers.
  await page.getByLabel("Maker 1").fill("Wren Quilter");
  await page.getByLabel("I quilted it myself").check();
  await page.getByLabel("Quilted on a home machine").check();
  await page.getByLabel("My own original design").check();
  await page.getByRole("button", { name: "Save and continue" }).click();

  // Step 3: about the quilt.
  await page.getByLabel("Artist statement").fill("Evening light over a field of lanterns, pieced from scraps of old shirts.");
  await page.getByLabel("Declared value (US dollars)").fill("450");
  await page.getByLabel("Enter it to be judged").check();
  await page.getByLabel("Open").check();
  await page.getByRole("button", { name: "Save and continue" }).click();

  // Step 4: two photos, straight to storage, then checked by the server.
  const full = await phoneStyleJpeg({ widthPx: 1600, heightPx: 1200, orientation: 6, gps: true });
  const detail = await pngOf(1200, 1200);
  const fullSection = page.getByRole("region", { name: "Full view showing all four edges" });
  await fullSection.locator('input[type="file"]').setInputFiles({ name: "full.jpg", mimeType: "image/jpeg", buffer: full });
  await expect(fullSection.getByText("Photo saved.")).toBeVisible({ timeout: 30_000 });
  const detailSection = page.getByRole("region", { name: "Detail showing the quilting" });
  await detailSection.locator('input[type="file"]').setInputFiles({ name: "detail.png", mimeType: "image/png", buffer: detail });
  await expect(detailSection.getByText("Photo saved.")).toBeVisible({ timeout: 30_000 });
  await shootAllWidths(page, "entry-step-photos");
  await page.getByRole("link", { name: "Continue to review" }).click();

  // Step 5: review, accept the rules, send.
  await page.getByLabel("I have read and accept the show's rules and release").check();
  await shootAllWidths(page, "entry-step-review");
  await page.getByRole("button", { name: "Send my entry" }).click();
  const received = await waitForMail(MAIL_WEB_URL, { to: email, subjectIncludes: "received", timeoutMs: 20_000 });
  const entryNumber = /\b(\d{3,})\b/.exec(received.text)?.[1];
  expect(entryNumber, "the entry number in the confirmation").toBeTruthy();

  // Pay on the local payment page, come back to "My entries".
  await page.goto("/my");
  await expect(page.getByText("Lantern Field").first()).toBeVisible();
  await page.getByRole("button", { name: /^Pay \$/ }).click();
  await page.waitForURL(/\/pay\//);
  await page.getByRole("button", { name: "Pay now" }).click();
  await page.waitForURL(/\/my/);
  const receipt = await waitForMail(MAIL_WEB_URL, { to: email, subjectIncludes: "Payment received", timeoutMs: 20_000 });
  expect(receipt.text).toContain(entryNumber!);
  expect(receipt.html).toContain("Lantern Field");
  await page.reload();
  await expect(page.getByText("Paid").first()).toBeVisible();
  await expectNoSidewaysScroll(page);
  await shootAllWidths(page, "entry-my-entries-paid");

  // Another entrant's entry, and each of its steps, answers 404 (no loading boundary streams a 200 first).
  const theirs = await someoneElsesEntryId(email);
  for (const path of [`/entries/${theirs}`, `/entries/${theirs}?step=photos`, `/entries/${theirs}?step=review`]) {
    const res = await page.goto(path);
    expect(res?.status(), path).toBe(404);
    await expect(page.getByRole("heading", { level: 1 })).toHaveText("We can’t find that page");
  }
});
