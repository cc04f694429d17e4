// Shared steps for the browser journeys: signing in, reading caught mail, screenshots at the
// three widths people use (phone 390×844, tablet 820×1180, desktop 1440×900).
import path from "node:path";
import { expect, type Page } from "@playwright/test";
import { envFor } from "../../scripts/ports";
import { waitForMail } from "../helpers/mailbox";

export const DEMO_SHOW = "pennywhistle-falls-quilt-show-2027";
export const DEMO_PASSWORD = "quilt-show-demo";
export const MAIL_WEB_URL = process.env.MAIL_WEB_URL ?? envFor("test").MAIL_WEB_URL!;

export const VIEWPORTS = {
  phone: { width: 390, height: 844 },
  tablet: { width: 820, height: 1180 },
  desktop: { width: 1440, height: 900 },
} as const;

const SHOTS = path.join(process.cwd(), "tests/artifacts/screenshots");

export async function signIn(page: Page, email: string, password = DEMO_PASSWORD) {
  await page.goto("/sign-in");
  await page.getByLabel("E-mail").fill(email);
  await page.getByLabel("Password", { exact: true }).fill(password);
  await page.getByRole("button", { name: /sign in/i }).click();
  await page.waitForURL((url) => !url.pathname.startsWith("/sign-in"));
}

export async function signOut(page: Page) {
  await page.context().clearCookies();
}

/** The newest mail to `to` with `subject` in its subject line, and the link in it containing `linkPart`. */
export async function linkFromMail(to: string, subject: string, linkPart: string): Promise<string> {
  const mail = await waitForMail(MAIL_WEB_URL, { to, subjectIncludes: subject, timeoutMs: 15_000 });
  const link = mail.links.find((l) => l.includes(linkPart));
  expect(link, `a link with ${linkPart} in "${mail.subject}"`).toBeTruthy();
  return link!;
}

/** Full-page screenshots of the current page at phone, tablet and desktop widths. */
export async function shootAllWidths(page: Page, name: string) {
  const original = page.viewportSize();
  for (const [label, size] of Object.entries(VIEWPORTS)) {
    await page.setViewportSize(size);
    await page.waitForTimeout(150);
    await page.screenshot({ path: path.join(SHOTS, `${name}-${label}.png`), fullPage: true });
  }
  if (original) await page.setViewportSize(original);
}

/** Nothing on the page scrolls sideways: the layout fits the viewport. */
export async function expectNoSidewaysScroll(page: Page) {
  const overflow = await page.evaluate(() => document.documentElement.scrollWidth - document.documentElement.clientWidth);
  expect(overflow).toBeLessThanOrEqual(1);
}
