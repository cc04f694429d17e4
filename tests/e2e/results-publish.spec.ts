// Journey, at a desk then on a phone: before publishing, the public results page shows nothing;
// the chair reviews a judged category, changes one placement with a reason (audited), publishes;
// the public page then shows the ribbons with the consenting entrant's name, and the entrant's
// mail arrives with each entry's critique sheet attached, and My entries shows the results and
// opens the critique.
import { expect, test } from "@playwright/test";
import { waitForMail } from "../helpers/mailbox";
import { removeShow } from "./db";
import { MAIL_WEB_URL, expectNoSidewaysScroll, shootAllWidths, signIn, signOut, VIEWPORTS } from "./helpers";
import { judgingSql } from "./judging-fixtures";
import { makeResultsShow, type ResultsShow } from "./results-fixtures";

let show: ResultsShow;

test.beforeAll(async () => {
  show = await makeResultsShow("results");
});
test.afterAll(async () => {
  if (show) await removeShow(show.id);
});

const REASON = "Judges asked for a mention for the hand-quilted border.";

test("the chair changes a placement with a reason and publishes; the public page shows the ribbons; the entrant's mail brings the critique", async ({ page }) => {
  test.setTimeout(240_000);
  await page.setViewportSize(VIEWPORTS.desktop);

  // Before publishing: no results, no titles.
  await page.goto(`/shows/${show.slug}/results`);
  await expect(page.getByText(/not (been )?published yet/i)).toBeVisible();
  await expect(page.getByText("Scratch quilt 101")).toHaveCount(0);

  await signIn(page, "chair@ribbonry.test");
  await page.goto(`/shows/${show.slug}/manage/results`);
  await expect(page.getByRole("heading", { level: 1, name: "Results" })).toBeVisible();
  const entry = (n: number) => page.getByRole("listitem", { name: `Entry ${n}`, exact: true });
  await expect(entry(101)).toContainText("1st place");
  await expect(entry(102)).toContainText("2nd place");
  await expect(entry(104)).toContainText("No placement");
  await expect(page.getByText("Ready to publish")).toBeVisible();

  // Change 104 to an honorable mention: a reason is required.
  await entry(104).getByRole("button", { name: "Change the placement of entry 104" }).click();
  const form = page.getByRole("form", { name: "Change the placement of entry 104" });
  await form.getByLabel("New placement").selectOption("hm");
  await form.getByRole("button", { name: "Save the change" }).click();
  await expect(form.getByText(/Give a reason/).first()).toBeVisible(); // beside the field and in the form's summary
  await form.getByLabel("Reason").fill(REASON);
  await form.getByRole("button", { name: "Save the change" }).click();
  await expect(entry(104)).toContainText("Changed by the chair");
  await expect(entry(104)).toContainText(REASON);
  await shootAllWidths(page, "results-review");

  await page.getByRole("button", { name: "Publish the results" }).click();
  // The panel turns into the published state, says what went out, and counts the mails sent.
  await expect(page.getByRole("status").filter({ hasText: "Results published (version 1). 1 entrant e-mailed." }).first()).toBeVisible({ timeout: 30_000 });
  await expect(page.getByText("Version 1 is published")).toBeVisible();
  await expect(page.getByText("Results mail: 1 sent.")).toBeVisible();

  const sql = judgingSql();
  try {
    const audit = await sql<{ action: string; after: { reason?: string } }[]>`select action, "after" from audit_log where show_id = ${show.id} and action like 'results.%' order by id`;
    expect(audit.map((a) => a.action)).toEqual(["results.placement_changed", "results.published"]);
    expect(audit[0]!.after.reason).toBe(REASON);
  } finally {
    await sql.end();
  }

  // The public page, signed out, on a phone.
  await signOut(page);
  await page.setViewportSize(VIEWPORTS.phone);
  await page.goto(`/shows/${show.slug}/results`);
  const card = (title: string) => page.getByRole("article").filter({ hasText: title });
  await expect(card("Scratch quilt 101")).toContainText("1st");
  await expect(card("Scratch quilt 101")).toContainText("Blue");
  await expect(card("Scratch quilt 101")).toContainText(show.entrant.name);
  await expect(card("Scratch quilt 104")).toContainText(/Honorable mention/i);
  await expectNoSidewaysScroll(page);
  await shootAllWidths(page, "results-public");

  // The entrant's mail: every entry's result, with the critique sheets attached.
  const mail = await waitForMail(MAIL_WEB_URL, { to: show.entrant.email, subjectIncludes: "esults", timeoutMs: 30_000 });
  expect(mail.text).toContain("101");
  expect(mail.text).toMatch(/1st place/);
  expect(mail.text).toMatch(/Honorable mention/i);
  const names = mail.attachments.map((a) => a.filename);
  expect(names).toEqual(expect.arrayContaining(["critique-101.pdf", "critique-104.pdf"]));
  expect(mail.attachments.every((a) => a.contentType === "application/pdf" && a.size > 1000)).toBe(true);

  // The entrant on a phone: My entries shows each result and the critique to open.
  await signIn(page, show.entrant.email);
  await page.goto("/my");
  const mine = page.getByRole("listitem").filter({ hasText: "Scratch quilt 101" });
  await expect(mine).toContainText("Result: 1st place (Blue)");
  const link = mine.getByRole("link", { name: /critique of entry 101/i });
  const pdf = await page.request.get((await link.getAttribute("href"))!);
  expect(pdf.status()).toBe(200);
  expect(pdf.headers()["content-type"]).toBe("application/pdf");
  await expect(page.getByRole("listitem").filter({ hasText: "Scratch quilt 104" })).toContainText("Result: Honorable mention (Green)");
  await expectNoSidewaysScroll(page);
  await shootAllWidths(page, "results-my-entries");
});
