// The server goes away mid-session: this journey starts its own app instance on port 3155 (from
// the build Playwright already runs against), scores with it up, kills it, scores more (held on
// the tablet), starts it again, and checks that every change reaches the database.
import { spawn, type ChildProcess } from "node:child_process";
import path from "node:path";
import { expect, test } from "@playwright/test";
import { envFor } from "../../scripts/ports";
import { signIn, VIEWPORTS } from "./helpers";
import { JUDGE_EMAIL, makeJudgingShow, storedSheets, type JudgingShow } from "./judging-fixtures";
import { marksFor, scoreAndSubmit } from "./judging-steps";

const PORT = 3155;
const URL_3155 = `http://127.0.0.1:${PORT}`;
const NEXT = path.join(process.cwd(), "node_modules/next/dist/bin/next");

test.use({ viewport: VIEWPORTS.tablet, baseURL: URL_3155 });

function startApp(): ChildProcess {
  const env = {
    ...process.env,
    ...envFor("test"),
    NODE_ENV: "production",
    NEXT_TELEMETRY_DISABLED: "1",
    AUTH_SIGN_IN_LIMIT_PER_MINUTE: "1000",
    PORT: String(PORT),
    APP_URL: URL_3155,
  } as NodeJS.ProcessEnv;
  return spawn(process.execPath, [NEXT, "start", "-p", String(PORT), "-H", "127.0.0.1"], { env, stdio: "ignore" });
}

async function waitUp(timeoutMs = 90_000) {
  const until = Date.now() + timeoutMs;
  while (Date.now() < until) {
    try {
      if ((await fetch(`${URL_3155}/api/health`)).ok) return;
    } catch {
      // not listening yet
    }
    await new Promise((r) => setTimeout(r, 300));
  }
  throw new Error(`the second app did not answer on ${PORT}`);
}

async function stopApp(app: ChildProcess | undefined) {
  if (!app || app.exitCode !== null) return;
  const exited = new Promise((r) => app.once("exit", r));
  app.kill("SIGKILL");
  await exited;
}

let app: ChildProcess | undefined;
let show: JudgingShow;

test.beforeAll(async () => {
  show = await makeJudgingShow("judging-restart", 4);
  app = startApp();
  await waitUp();
});
test.afterAll(async () => stopApp(app));

test("changes made while the server is down reach the database once it is back", async ({ page }) => {
  test.setTimeout(240_000); // a long journey on a 2-core machine
  await signIn(page, JUDGE_EMAIL);
  await page.goto(`/shows/${show.slug}/judging`);
  await expect(page.getByTestId("entering-for")).toContainText("Scoring as Judge", { timeout: 30_000 });
  const [a, b, c] = show.entries.map((e) => e.entryNumber);
  await scoreAndSubmit(page, a!, 11);
  await expect(page.getByTestId("session-sync")).toHaveText("Synced", { timeout: 20_000 });

  await stopApp(app); // the server dies; the tablet does not know yet
  await scoreAndSubmit(page, b!, 12);
  await scoreAndSubmit(page, c!, 13);
  await expect(page.getByTestId("session-sync")).toHaveText("Saved on this tablet");
  await expect(page.getByText(/No connection to the server/)).toBeVisible({ timeout: 30_000 });

  app = startApp();
  await waitUp();
  // The interval (or a retry) sends the outbox without any tap.
  await expect(page.getByTestId("session-sync")).toHaveText("Synced", { timeout: 60_000 });

  const stored = await storedSheets(show.id, show.users[JUDGE_EMAIL]!.id);
  for (const [n, impact] of [[a!, 11], [b!, 12], [c!, 13]] as const) {
    expect(stored.get(n)?.status, `entry ${n}`).toBe("submitted");
    expect(stored.get(n)?.values["mark:impact"]).toEqual({ kind: "points", points: marksFor(impact).impact });
  }
});
