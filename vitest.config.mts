// Two vitest projects: unit (pure modules, no services) and integration (real PostgreSQL and the
// local fakes, started by tests/setup/integration-global.ts unless `npm test` already did).
import path from "node:path";
import { defineConfig } from "vitest/config";
import { envFor } from "./scripts/ports";

const root = path.dirname(new URL(import.meta.url).pathname);

export default defineConfig({
  resolve: {
    alias: [
      { find: /^@\//, replacement: `${root}/` },
      // "server-only" throws outside React's server build; in tests we are the server.
      { find: /^server-only$/, replacement: `${root}/tests/setup/empty-module.ts` },
    ],
  },
  test: {
    reporters: process.env.VITEST_JSON ? ["default", ["json", { outputFile: process.env.VITEST_JSON }]] : ["default"],
    projects: [
      {
        extends: true,
        test: { name: "unit", include: ["tests/unit/**/*.test.ts"], environment: "node" },
      },
      {
        extends: true,
        test: {
          name: "integration",
          include: ["tests/integration/**/*.test.ts"],
          environment: "node",
          globalSetup: ["tests/setup/integration-global.ts"],
          setupFiles: ["tests/setup/next-request.ts"],
          env: { ...envFor("test"), NODE_ENV: "test", AUTH_SIGN_IN_LIMIT_PER_MINUTE: "5", AUTH_ACCOUNT_FAILURE_LIMIT: "5" },
          testTimeout: 30_000,
          hookTimeout: 120_000,
        },
      },
    ],
  },
});
