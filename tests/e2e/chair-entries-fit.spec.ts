// Journey, at a laptop: the chair reads the whole entries table, category included, without
// scrolling sideways at the usual desktop widths (1280 and 1440 px, common practice for laptops),
// and filters by category.
import { expect, test } from "@playwright/test";
import { DEMO_SHOW, signIn } from "./helpers";

for (const width of [1280, 1440]) {
  test(`the entries table fits ${width} px and names each entry's category`, async ({ page }) => {
    test.setTimeout(180_000);
    await page.setViewportSize({ width, height: 900 });
    await signIn(page, "chair@ribbonry.test");
    await page.goto(`/shows/${DEMO_SHOW}/manage/entries`, { timeout: 120_000 });
    const table = page.getByRole("table");
    await expect(table.getByRole("columnheader", { name: "Category" })).toBeVisible({ timeout: 120_000 });
    await expect(table.getByRole("columnheader", { name: "Status" })).toBeVisible();
    // The category's name beside its code, e.g. "11 Pieced, Medium", not a bare "11".
    const named = table.getByRole("cell", { name: /^\d+ \p{L}/u }).first();
    await expect(named).toBeVisible();
    const label = (await named.innerText()).trim();
    const overflow = await table.evaluate((t) => {
      const box = t.parentElement!;
      return box.scrollWidth - box.clientWidth;
    });
    expect(overflow).toBeLessThanOrEqual(0);
    await page.screenshot({ path: `tests/artifacts/screenshots/chair-entries-fit-${width}.png`, fullPage: true });

    // Filtering by that category leaves only its entries.
    const before = (await page.getByText(/^Entries 1–\d+ of \d+\.$/).innerText()).trim();
    await page.getByRole("combobox", { name: "Category" }).selectOption({ label });
    await expect(page.getByText(/^Entries 1–\d+ of \d+\.$/)).not.toHaveText(before);
    const rows = await table.getByRole("row").count();
    await expect(table.getByRole("cell", { name: label, exact: true })).toHaveCount(rows - 1);
    await expect(page.getByText("Filtering by category comes with categories in a later update.")).toHaveCount(0);
  });
}
