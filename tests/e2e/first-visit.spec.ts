// A first visit: the browser's own request for /favicon.ico finds the app's icon, and the home
// page logs no console error (a 404 for the icon used to).
import { expect, test } from "@playwright/test";

test.setTimeout(180_000);

test("/favicon.ico answers with the app's icon", async ({ request }) => {
  const res = await request.get("/favicon.ico", { timeout: 120_000 });
  expect(res.status()).toBe(200);
  expect(res.headers()["content-type"]).toContain("image/");
  // ICO header: reserved 0, type 1 (icon).
  const body = await res.body();
  expect([...body.subarray(0, 4)]).toEqual([0, 0, 1, 0]);
});

test("the home page logs no console error on a first visit", async ({ page }) => {
  const errors: string[] = [];
  page.on("console", (m) => {
    if (m.type() === "error") errors.push(m.text());
  });
  await page.goto("/", { timeout: 120_000 });
  await page.waitForLoadState("load");
  await page.waitForTimeout(500);
  expect(errors).toEqual([]);
});
