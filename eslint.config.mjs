// ESLint with Next.js's own rules (core web vitals + TypeScript).
import { defineConfig, globalIgnores } from "eslint/config";
import nextVitals from "eslint-config-next/core-web-vitals";
import nextTs from "eslint-config-next/typescript";

export default defineConfig([
  ...nextVitals,
  ...nextTs,
  globalIgnores([".next/**", ".next-dev-*/**", ".next-sw-*/**", "public/sw.js", ".data/**", "node_modules/**", "next-env.d.ts", "db/migrations/**", "tests/artifacts/**"]),
  {
    rules: {
      "@typescript-eslint/no-unused-vars": ["error", { argsIgnorePattern: "^_", varsIgnorePattern: "^_" }],
    },
  },
]);
