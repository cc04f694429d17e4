// Journey: the chair invites a judge by e-mail; the judge creates an account from the link,
// confirms the address, accepts, and lands in the judging area (empty until the chair puts them on a panel). An entrant cannot get in.
import { expect, test } from "@playwright/test";
import { DEMO_SHOW, expectNoSidewaysScroll, linkFromMail, shootAllWidths, signIn, signOut, VIEWPORTS } from "./helpers";

test("chair invites a judge, who accepts and sees the judging area; an entrant does not", async ({ page }) => {
  const judgeEmail = `new-judge-${Date.now()}@example.test`;

  // The chair, at a desk.
  await page.setViewportSize(VIEWPORTS.desktop);
  await signIn(page, "chair@ribbonry.test");
  await page.goto(`/shows/${DEMO_SHOW}/manage`);
  await expect(page.getByRole("heading", { level: 1 })).toBeVisible();
  await shootAllWidths(page, "chair-manage");
  const invite = page.getByRole("form", { name: /invite/i });
  await invite.getByLabel("E-mail").fill(judgeEmail);
  await invite.getByLabel("Role").selectOption("judge");
  await invite.getByRole("button", { name: /invite|send/i }).click();
  await expect(page.getByText(`Invitation sent to ${judgeEmail}`)).toBeVisible();
  await expect(page.getByText(judgeEmail).first()).toBeVisible();
  await signOut(page);

  // The judge, on a tablet: from the invitation mail to a new account.
  await page.setViewportSize(VIEWPORTS.tablet);
  const invitation = await linkFromMail(judgeEmail, "invited", "/invitations/");
  await page.goto(invitation);
  await expect(page.getByText(/judge/i).first()).toBeVisible();
  await shootAllWidths(page, "invitation-signed-out");
  await page.getByRole("link", { name: /create an account/i }).click();
  await expect(page.getByLabel("E-mail")).toHaveValue(judgeEmail);
  await page.getByLabel("Your name").fill("Nova Judge");
  await page.getByLabel("Password", { exact: true }).fill("a-judges-long-password");
  await page.getByRole("button", { name: /create/i }).click();
  await page.waitForURL(/check-email/);
  const verify = await linkFromMail(judgeEmail, "Confirm", "/verify-email");
  await page.goto(verify);
  await page.waitForURL((url) => !url.pathname.includes("/api/auth"));

  await page.goto(invitation);
  await page.getByRole("button", { name: /accept/i }).click();
  await page.waitForURL(new RegExp(`/shows/${DEMO_SHOW}/judging`));
  await expect(page.getByRole("heading", { level: 1 })).toContainText(/judging/i);
  // A judge sees only the quilts of their own sessions: not on a panel yet, so none at all.
  await expect(page.getByText(/not on a judging panel/i).first()).toBeVisible();
  await expect(page.getByText("#101")).toHaveCount(0);
  await expectNoSidewaysScroll(page);
  await shootAllWidths(page, "judge-judging-area");
  await signOut(page);

  // An entrant, on a phone: no judging link, and the area itself answers "not allowed".
  await page.setViewportSize(VIEWPORTS.phone);
  await signIn(page, "entrant1@ribbonry.test");
  await expect(page.getByRole("link", { name: /^judging$/i })).toHaveCount(0);
  const res = await page.goto(`/shows/${DEMO_SHOW}/judging`);
  expect(res?.status()).toBe(403);
  await expect(page.getByRole("heading", { level: 1 })).toBeVisible();
  await shootAllWidths(page, "entrant-judging-forbidden");
  await page.goto("/my");
  await expectNoSidewaysScroll(page);
  await shootAllWidths(page, "entrant-my-entries");
});

test("each demo role sees its own area and is refused the others", async ({ page }) => {
  const areas = { manage: "manage", judging: "judging", desk: "desk" } as const;
  const cases: [string, Record<keyof typeof areas, number>][] = [
    ["chair@ribbonry.test", { manage: 200, judging: 403, desk: 200 }],
    ["judge1@ribbonry.test", { manage: 403, judging: 200, desk: 403 }],
    ["scribe1@ribbonry.test", { manage: 403, judging: 200, desk: 403 }],
    ["intake@ribbonry.test", { manage: 403, judging: 403, desk: 200 }],
    ["entrant2@ribbonry.test", { manage: 403, judging: 403, desk: 403 }],
    ["admin@ribbonry.test", { manage: 403, judging: 403, desk: 403 }],
  ];
  for (const [email, expected] of cases) {
    await signIn(page, email);
    for (const area of Object.keys(areas) as (keyof typeof areas)[]) {
      const res = await page.goto(`/shows/${DEMO_SHOW}/${area}`);
      expect(res?.status(), `${email} → ${area}`).toBe(expected[area]);
    }
    await signOut(page);
  }
  const anonymous = await page.goto(`/shows/${DEMO_SHOW}/manage`);
  expect(anonymous?.status()).toBe(401);
  const admin = await page.goto("/admin");
  expect(admin?.status()).toBe(401);
});
