// Journey: the chair closes entries early on a show of its own, sees what is still open (the
// closing date ahead, a draft, an unpaid entry), is asked for a reason, confirms with one, then
// steps back to taking entries with a reason. The main button is always the next stage.
import { randomUUID } from "node:crypto";
import postgres from "postgres";
import { expect, test } from "@playwright/test";
import { envFor } from "../../scripts/ports";
import { shootAllWidths, signIn, VIEWPORTS } from "./helpers";

const UM_PER_INCH = 25_400; // 1 in = 25.4 mm exactly (NIST SP 811, App. B)
const connect = () => postgres(process.env.DATABASE_URL ?? envFor("test").DATABASE_URL!, { max: 1, onnotice: () => {} });
let slug = "";

test.beforeAll(async () => {
  const sql = connect();
  try {
    slug = `stage-changes-${randomUUID().slice(0, 8)}`;
    const [chair] = await sql<{ id: string }[]>`select id from "user" where email = 'chair@ribbonry.test'`;
    if (!chair) throw new Error("chair@ribbonry.test is not seeded; start the app once so it seeds the demo");
    const [show] = await sql<{ id: string }[]>`
      insert into shows (slug, name, guild_name, venue_name, time_zone, status, entry_closes_at)
      values (${slug}, 'Stage changes show', 'Scratch Guild', 'Scratch Hall', 'America/Chicago', 'entries_open', now() + interval '56 days')
      returning id`;
    await sql`insert into show_roles (show_id, user_id, role) values (${show!.id}, ${chair.id}, 'chair')`;
    await sql`insert into show_rules_versions (show_id, version, rules_text, release_text, published_by) values (${show!.id}, 1, 'Rules good enough to open with.', 'A release good enough to open with.', ${chair.id})`;
    const entry = (number: number | null, status: string, paid: boolean) => sql`
      insert into entries (show_id, entrant_user_id, entry_number, title, width_um, length_um, quilting_method, status, paid_at)
      values (${show!.id}, ${chair.id}, ${number}, 'Scratch quilt', ${40 * UM_PER_INCH}, ${50 * UM_PER_INCH}, 'home_machine', ${status}, ${paid ? new Date() : null})`;
    await entry(101, "paid", true);
    await entry(102, "submitted", false);
    await entry(null, "draft", false);
  } finally {
    await sql.end();
  }
});
test.afterAll(async () => {
  const sql = connect();
  await sql`delete from shows where slug = ${slug}`;
  await sql.end();
});

test("the chair closes entries with a reason after seeing what is open, then steps back with a reason", async ({ page }) => {
  test.setTimeout(240_000); // the dev app compiles each page on first visit
  await page.setViewportSize(VIEWPORTS.desktop);
  await signIn(page, "chair@ribbonry.test");
  await page.goto(`/shows/${slug}/manage/settings`, { timeout: 180_000 });
  const stage = page.getByRole("region", { name: "Stage" });
  await expect(stage.getByRole("button", { name: "Move to “Entries closed”…" })).toBeVisible({ timeout: 60_000 });
  await expect(stage.getByRole("button", { name: /Go back/ })).toHaveCount(0);

  await stage.getByRole("button", { name: "Move to “Entries closed”…" }).click();
  const confirm = stage.getByRole("form", { name: "Move to “Entries closed”?" });
  await expect(confirm).toContainText("Entrants can no longer send, change or withdraw quilts");
  await expect(confirm).toContainText("The closing date is still 56 days away");
  await expect(confirm).toContainText("1 draft was never sent");
  await expect(confirm).toContainText("1 entry is not paid yet.");
  await shootAllWidths(page, "stage-changes-confirm");

  await confirm.getByRole("button", { name: "Move to “Entries closed”" }).click();
  await expect(confirm).toContainText("Say why you are going ahead despite the open items.");
  await confirm.getByLabel("Reason").fill("The hall is booked early this year.");
  await confirm.getByRole("button", { name: "Move to “Entries closed”" }).click();

  // Now the main button is the next stage; going back is the secondary action.
  await expect(stage.getByRole("button", { name: "Move to “Judging under way”…" })).toBeVisible({ timeout: 30_000 });
  await shootAllWidths(page, "stage-changes-closed");
  await stage.getByRole("button", { name: "Go back to “Taking entries”…" }).click();
  const back = stage.getByRole("form", { name: "Go back to “Taking entries”?" });
  await expect(back).toContainText("Entrants can send, change and withdraw quilts again");
  await back.getByLabel("Reason").fill("Closed by mistake; the date was right.");
  await back.getByRole("button", { name: "Go back to “Taking entries”" }).click();
  await expect(stage.getByRole("button", { name: "Move to “Entries closed”…" })).toBeVisible({ timeout: 30_000 });

  const sql = connect();
  const rows = await sql<{ after: { status: string; reason?: string; stepBack: boolean } }[]>`
    select a.after from audit_log a join shows s on s.id = a.show_id where s.slug = ${slug} and a.action = 'show.status_changed' order by a.id`;
  await sql.end();
  expect(rows.map((r) => [r.after.status, r.after.reason, r.after.stepBack])).toEqual([
    ["entries_closed", "The hall is booked early this year.", false],
    ["entries_open", "Closed by mistake; the date was right.", true],
  ]);
});

test("the chair has an unpaid entry judged anyway, with a reason, from Judging set-up", async ({ page }) => {
  test.setTimeout(120_000);
  await page.setViewportSize(VIEWPORTS.desktop);
  await signIn(page, "chair@ribbonry.test");
  await page.goto(`/shows/${slug}/manage/judging#uncleared`);
  const list = page.getByRole("list", { name: "Entries not cleared for judging" });
  const row = list.getByRole("listitem").filter({ hasText: "Entry 102" });
  await expect(row).toContainText("not on the judges’ lists");
  await expect(list.getByRole("listitem").filter({ hasText: "Entry 101" })).toHaveCount(0); // paid: cleared
  await row.getByRole("button", { name: "Judge it anyway" }).click();
  await expect(row.getByText("Reason: say why this entry is judged although it is not paid.")).toBeVisible();
  await row.getByLabel("Reason to judge it anyway").fill("Paid in cash at the guild meeting.");
  await row.getByRole("button", { name: "Judge it anyway" }).click();
  await expect(row).toContainText("judged anyway: Paid in cash at the guild meeting.", { timeout: 30_000 });
  await shootAllWidths(page, "judging-setup-not-paid");
});
