// Journey on the seeded demo: last year's show has its results out. Anyone on a phone sees the
// ribbons and Best of Show; an entrant who asked for a critique finds their result and opens the
// judges' critique from "My entries"; the chair sees the published state on the Results page.
import { expect, test } from "@playwright/test";
import { expectNoSidewaysScroll, shootAllWidths, signIn, signOut, VIEWPORTS } from "./helpers";
import { judgingSql } from "./judging-fixtures";

const SLUG = "pennywhistle-falls-quilt-show-2026";

type Snapshot = { categories: { entries: { entryId: string; entryNumber: number; title: string; place: number | null; honorableMention: boolean; awards: { name: string }[] }[] }[] };

test("last year's demo results: public ribbons on a phone, an entrant's critique, the chair's published state", async ({ page }) => {
  test.setTimeout(120_000);
  const sql = judgingSql();
  let first: { title: string; email: string; entryNumber: number };
  try {
    const [pub] = await sql<{ snapshot: Snapshot }[]>`select p.snapshot from result_publications p join shows s on s.id = p.show_id where s.slug = ${SLUG} and p.unpublished_at is null`;
    const winners = pub!.snapshot.categories.flatMap((c) => c.entries.filter((e) => e.place === 1));
    const rows = await sql<{ id: string; email: string; critique: boolean }[]>`select e.id, u.email, e.critique_requested as critique from entries e join "user" u on u.id = e.entrant_user_id where e.id in ${sql(winners.map((w) => w.entryId))}`;
    const withCritique = winners.find((w) => rows.find((r) => r.id === w.entryId)?.critique)!;
    first = { title: withCritique.title, entryNumber: withCritique.entryNumber, email: rows.find((r) => r.id === withCritique.entryId)!.email };
  } finally {
    await sql.end();
  }

  await page.setViewportSize(VIEWPORTS.phone);
  await page.goto(`/shows/${SLUG}`);
  await page.getByRole("link", { name: "See the ribbons and awards" }).click();
  await expect(page.getByRole("heading", { level: 1, name: "Results" })).toBeVisible();
  await expect(page.getByRole("heading", { name: "Show awards" })).toBeVisible();
  await expect(page.getByRole("article").filter({ hasText: first.title }).first()).toContainText("1st place (Blue)");
  // Photos of awarded quilts load without signing in.
  const img = page.getByRole("img", { name: new RegExp(`^Entry ${first.entryNumber}, `) }).first();
  await expect(img).toBeVisible();
  await img.scrollIntoViewIfNeeded(); // the cards' photos load lazily
  await expect.poll(() => img.evaluate((el) => (el as HTMLImageElement).naturalWidth), { timeout: 15_000 }).toBeGreaterThan(0);
  await expectNoSidewaysScroll(page);
  await shootAllWidths(page, "demo-results-public");

  await signIn(page, first.email);
  await page.goto("/my");
  const card = page.getByRole("listitem").filter({ hasText: first.title });
  await expect(card).toContainText("Result: 1st place (Blue)");
  const href = await card.getByRole("link", { name: new RegExp(`critique of entry ${first.entryNumber}`, "i") }).getAttribute("href");
  const pdf = await page.request.get(href!);
  expect([pdf.status(), pdf.headers()["content-type"]]).toEqual([200, "application/pdf"]);
  await shootAllWidths(page, "demo-results-my-entries");

  await signOut(page);
  await page.setViewportSize(VIEWPORTS.desktop);
  await signIn(page, "chair@ribbonry.test");
  await page.goto(`/shows/${SLUG}/manage/results`);
  await expect(page.getByText("Version 1 is published")).toBeVisible();
  await expect(page.getByText("The results are published; unpublish them to change the rules.")).toBeVisible();
  await shootAllWidths(page, "demo-results-chair");
});
