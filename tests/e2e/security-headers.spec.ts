// Every kind of response carries the security headers (OWASP ASVS 4.0 V14.4; OWASP Secure Headers
// Project), the Content-Security-Policy lets the app's own pages run without one violation, the
// server refuses a broken address with a 400 and a foreign page's write with a 403, and a form
// whose server action call fails says so in plain words.
import { expect, test, type APIResponse, type Page } from "@playwright/test";
import { JUDGE_EMAIL } from "./judging-fixtures";
import { DEMO_SHOW, shootAllWidths, signIn, VIEWPORTS } from "./helpers";

function expectSecurityHeaders(res: APIResponse, what: string) {
  const h = res.headers();
  const csp = h["content-security-policy"] ?? "";
  expect(csp, `${what}: CSP`).toContain("frame-ancestors 'none'");
  expect(csp, `${what}: CSP`).toContain("object-src 'none'");
  expect(csp, `${what}: no eval in production (Next.js CSP guide)`).not.toContain("'unsafe-eval'");
  expect(csp, `${what}: scripts by nonce, never inline`).not.toMatch(/script-src[^;]*'unsafe-inline'/);
  expect(h["x-frame-options"], what).toBe("DENY");
  expect(h["x-content-type-options"], what).toBe("nosniff");
  expect(h["referrer-policy"], what).toBe("strict-origin-when-cross-origin");
  expect(h["permissions-policy"], what).toContain("camera=()");
}

test("pages, route handlers, a 404 and static files all carry the security headers", async ({ page, request }) => {
  const home = await request.get("/");
  expect(home.status()).toBe(200);
  expectSecurityHeaders(home, "home page");

  // A static file the home page loads, and the files in public/.
  await page.goto("/");
  const asset = await page.evaluate(() => (document.querySelector("script[src^='/_next/static/']") as HTMLScriptElement | null)?.getAttribute("src"));
  expect(asset).toBeTruthy();
  for (const [what, path] of [
    ["a page", "/sign-in"],
    ["a route handler", "/api/shows"],
    ["a route handler's 401", "/api/me"],
    ["a 404 page", "/no-such-page-here"],
    ["a static script", asset!],
    ["a public file", "/icons/ribbonry.svg"],
    ["the web app manifest", "/manifest.webmanifest"],
  ] as const) {
    const res = await request.get(path);
    expectSecurityHeaders(res, `${what} (${path}, ${res.status()})`);
  }

  // The intake desk may use the camera for QR labels; nowhere else may.
  const desk = await request.get(`/shows/${DEMO_SHOW}/desk`);
  expect(desk.headers()["permissions-policy"]).toContain("camera=(self)");
});

test("a broken %-escape or a NUL in the address is a 400, never a 500 (RFC 3986 §2.1)", async ({ request }) => {
  for (const path of [`/api/shows/%E0%A4%A/team`, `/api/shows/${DEMO_SHOW}%00/team`, "/shows/%E0%A4%A", "/shows/a%00b", `/api/shows/${DEMO_SHOW}/entries?q=%00`]) {
    const res = await request.get(path);
    expect(res.status(), path).toBe(400);
    expectSecurityHeaders(res, path);
    if (path.startsWith("/api/")) expect(await res.json()).toMatchObject({ error: "invalid_address" });
  }
});

test("a foreign page cannot post to a route handler (OWASP CSRF Prevention Cheat Sheet)", async ({ page }) => {
  await signIn(page, "chair@ribbonry.test");
  const foreign = await page.request.post(`/api/shows/${DEMO_SHOW}/team`, {
    headers: { origin: "https://evil.example", "content-type": "application/x-www-form-urlencoded" },
    data: "email=attacker%40example.test&role=judge",
  });
  expect(foreign.status()).toBe(403);
  const form = await page.request.post(`/api/shows/${DEMO_SHOW}/team`, {
    headers: { "content-type": "application/x-www-form-urlencoded" },
    data: "email=attacker%40example.test&role=judge",
  });
  expect(form.status()).toBe(415);
  // better-auth's own endpoints check Origin themselves (its trustedOrigins, from lib/origins.ts).
  const signInFromAfar = await page.request.post("/api/auth/sign-in/email", {
    headers: { origin: "https://evil.example", "content-type": "application/json" },
    data: JSON.stringify({ email: "chair@ribbonry.test", password: "not-the-password" }),
  });
  expect(signInFromAfar.status()).toBe(403);
});

async function violationsWhileLoading(page: Page, path: string): Promise<string[]> {
  const seen: string[] = [];
  const onConsole = (m: { text(): string }) => {
    if (/Content Security Policy|Refused to (load|execute|apply|connect|create)/i.test(m.text())) seen.push(m.text());
  };
  page.on("console", onConsole);
  await page.goto(path);
  // "networkidle" never comes on pages that keep a request open; scripts have run by "load", and
  // a short pause lets late refusals (fonts, workers) reach the console.
  await page.waitForLoadState("load");
  await page.waitForTimeout(1_500);
  page.off("console", onConsole);
  return seen;
}

test("the home page, sign-in, the entry form and the judging page run under the CSP without a violation", async ({ page }) => {
  test.setTimeout(120_000);
  await page.setViewportSize(VIEWPORTS.phone);
  expect(await violationsWhileLoading(page, "/")).toEqual([]);
  // Hydrated: the client bundle ran (a nonce-less script would have been refused).
  await expect(page.locator("html")).toHaveAttribute("lang", "en");
  expect(await violationsWhileLoading(page, "/sign-in")).toEqual([]);
  await shootAllWidths(page, "csp-sign-in");

  await signIn(page, "entrant6@ribbonry.test");
  expect(await violationsWhileLoading(page, `/shows/${DEMO_SHOW}/enter`)).toEqual([]);
  await page.waitForURL(/\/entries\/[0-9a-f-]+/);
  // The live category preview is client code: it answers only if scripts run.
  await page.getByLabel("Width (in)").fill("60");
  await page.getByLabel("Length (in)").fill("68");
  await expect(page.getByTestId("category-headline")).toContainText("This quilt will be in");
  await shootAllWidths(page, "csp-entry-form");

  await page.context().clearCookies();
  await signIn(page, JUDGE_EMAIL);
  expect(await violationsWhileLoading(page, `/shows/${DEMO_SHOW}/judging`)).toEqual([]);
  await shootAllWidths(page, "csp-judging");
});

test("a profile form whose action call fails shows a plain message and keeps what was typed", async ({ page }) => {
  await page.setViewportSize(VIEWPORTS.desktop);
  await signIn(page, "entrant6@ribbonry.test");
  await page.goto("/account");
  await page.waitForLoadState("networkidle"); // hydrated: the form's own handler runs, not a plain post
  // The server refusing the call (as Next.js does for a body over its limit, or an encoding it
  // cannot read) reaches the browser as a failed request.
  await page.route("**/account", (route) => (route.request().method() === "POST" ? route.abort("failed") : route.continue()));
  await page.getByLabel("Guild").fill("Lantern Quilters");
  await page.getByRole("button", { name: /save/i }).click();
  await expect(page.getByText(/too much to send at once/)).toBeVisible();
  await expect(page.getByLabel("Guild")).toHaveValue("Lantern Quilters");
  await shootAllWidths(page, "form-call-failed");
});

test("a server action call over the size limit is a 413 with a plain message, not the framework's 500 (RFC 9110 §15.5.14)", async ({ page }) => {
  const res = await page.request.post("/account", {
    headers: { "next-action": "0".repeat(40), "content-type": "text/plain;charset=UTF-8" },
    data: "x".repeat(2 * 1024 * 1024),
  });
  expect(res.status()).toBe(413);
  expect(await res.text()).toMatch(/too much to send at once/);
});
