// Judging in the hall on a 10-inch tablet (820×1180): a judge scores three entries, the Wi-Fi
// drops, two more are scored and the page is reloaded from the service worker, the Wi-Fi comes
// back and all five sheets reach the database; a scribe enters for a judge and the change records
// name both. Runs against a production build (the worker is off in development).
import { expect, test } from "@playwright/test";
import { shootAllWidths, signIn, VIEWPORTS } from "./helpers";
import { changeAuthors, JUDGE2_EMAIL, JUDGE_EMAIL, makeJudgingShow, SCRIBE_EMAIL, storedSheets, type JudgingShow } from "./judging-fixtures";
import { marksFor, openEntry, scoreAndSubmit } from "./judging-steps";

test.describe.configure({ mode: "serial" });
test.use({ viewport: VIEWPORTS.tablet });

let show: JudgingShow;
test.beforeAll(async () => {
  show = await makeJudgingShow("judging-tablet");
});

test("a judge scores five entries, two with the network cut and a reload, and all five reach the server", async ({ page, context }) => {
  test.setTimeout(240_000); // a long journey on a 2-core machine
  await signIn(page, JUDGE_EMAIL);
  await page.goto(`/shows/${show.slug}/judging`);
  await expect(page.getByTestId("entering-for")).toContainText("Scoring as Judge", { timeout: 30_000 });
  await expect(page.getByText("0 of 6 submitted")).toBeVisible();
  // The worker must be in charge of the page before the network goes.
  await page.waitForFunction(async () => !!(await navigator.serviceWorker.ready).active && !!navigator.serviceWorker.controller, null, { timeout: 30_000 });
  await page.waitForFunction(async () => (await (await caches.open("judging-pages")).keys()).length > 0, null, { timeout: 30_000 });
  // Every entry's web photo is kept on the tablet (IndexedDB) before the Wi-Fi goes.
  await expect(page.getByText(/Photos on this tablet: (\d+) of \1$/)).toBeVisible({ timeout: 60_000 });
  await shootAllWidths(page, "judging-queue");

  const numbers = show.entries.map((e) => e.entryNumber);
  for (const [i, n] of numbers.slice(0, 3).entries()) await scoreAndSubmit(page, n, 10 + i);
  await expect(page.getByTestId("session-sync")).toHaveText("Synced", { timeout: 20_000 });

  await context.setOffline(true);
  for (const [i, n] of numbers.slice(3, 5).entries()) await scoreAndSubmit(page, n, 13 + i);
  await expect(page.getByTestId("session-sync")).toHaveText("Saved on this tablet");
  await openEntry(page, numbers[3]!);
  await shootAllWidths(page, "judging-entry-offline");
  await page.getByRole("button", { name: "All entries" }).click();

  // Reload with no network: the worker serves the page, IndexedDB the session and the outbox.
  await page.reload();
  await expect(page.getByTestId("entering-for")).toContainText("Scoring as Judge", { timeout: 30_000 });
  await expect(page.getByText("5 of 6 submitted")).toBeVisible();
  await expect(page.getByTestId("session-sync")).toHaveText("Saved on this tablet");

  // The photos still show, from the tablet's own store.
  await openEntry(page, numbers[3]!);
  const photo = page.getByRole("img", { name: `Entry ${numbers[3]}, Full view` });
  await expect(photo).toHaveAttribute("src", /^blob:/);
  await expect.poll(() => photo.evaluate((el: HTMLImageElement) => el.complete && el.naturalWidth)).toBeGreaterThan(0);
  await page.getByRole("button", { name: "All entries" }).click();

  await context.setOffline(false);
  await expect(page.getByTestId("session-sync")).toHaveText("Synced", { timeout: 30_000 });

  const stored = await storedSheets(show.id, show.users[JUDGE_EMAIL]!.id);
  for (const [i, n] of numbers.slice(0, 5).entries()) {
    const sheet = stored.get(n);
    expect(sheet?.status, `entry ${n}`).toBe("submitted");
    for (const [id, points] of Object.entries(marksFor(10 + i))) expect(sheet?.values[`mark:${id}`], `entry ${n} ${id}`).toEqual({ kind: "points", points });
    expect(sheet?.values["mark:applique"]).toEqual({ kind: "na" });
    expect(sheet?.values["mark:edges"]).toEqual({ kind: "word", level: "Good" });
    expect(sheet?.values["comment:overall"]).toBe("Points meet crisply.");
  }
  expect(stored.has(numbers[5]!)).toBe(false);
});

test("a scribe enters for a judge, and the sheet's history names both", async ({ page }) => {
  test.setTimeout(180_000);
  await signIn(page, SCRIBE_EMAIL);
  await page.goto(`/shows/${show.slug}/judging`);
  const judge2 = show.users[JUDGE2_EMAIL]!.name;
  await expect(page.getByRole("heading", { name: "Which judge are you entering for?" })).toBeVisible({ timeout: 30_000 });
  await shootAllWidths(page, "judging-scribe-pick");
  await page.getByRole("button", { name: new RegExp(`Judge ${judge2}`) }).click();
  await expect(page.getByTestId("entering-for")).toHaveText(`Entering for Judge ${judge2}`);
  const n = show.entries[0]!.entryNumber;
  await openEntry(page, n);
  await page.getByRole("button", { name: "Discuss for award" }).click();
  await shootAllWidths(page, "judging-entry-scribe");
  await page.getByRole("button", { name: "All entries" }).click();
  await scoreAndSubmit(page, n, 19);
  await expect(page.getByTestId("session-sync")).toHaveText("Synced", { timeout: 20_000 });

  const scribe = show.users[SCRIBE_EMAIL]!.name;
  const authors = await changeAuthors(show.id);
  const mine = authors.filter((a) => a.enteredBy === scribe);
  expect(mine.length).toBeGreaterThan(5);
  for (const a of mine) expect(`${a.enteredBy} for ${a.forJudge}`).toBe(`${scribe} for ${judge2}`);
  const stored = await storedSheets(show.id, show.users[JUDGE2_EMAIL]!.id);
  expect(stored.get(n)).toMatchObject({ status: "submitted", values: { discuss: true, "mark:impact": { kind: "points", points: 19 } } });
});
