// Browser tests in Debian's chromium (never a downloaded browser), against the app that
// scripts/run.ts builds and serves on the test port.
import { defineConfig } from "@playwright/test";
import { envFor } from "./scripts/ports";

const env = envFor("test");

export default defineConfig({
  testDir: "tests/e2e",
  outputDir: ".data/test-results/playwright",
  timeout: 60_000,
  expect: { timeout: 10_000 },
  fullyParallel: false,
  workers: 1,
  retries: 0,
  reporter: [["list"], ["json"]],
  use: {
    baseURL: process.env.APP_URL ?? env.APP_URL,
    trace: "retain-on-failure",
    screenshot: "only-on-failure",
    launchOptions: {
      executablePath: process.env.CHROMIUM_PATH ?? "/usr/bin/chromium",
      args: [
        "--no-sandbox",
        "--disable-gpu",
        "--disable-quic",
        "--no-first-run",
        "--disable-background-networking",
        "--disable-component-update",
        "--disable-sync",
        "--disable-dev-shm-usage",
      ],
    },
  },
  projects: [{ name: "chromium", use: { browserName: "chromium" } }],
});
