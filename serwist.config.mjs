// @ts-check
// Serwist in "configurator" mode: `serwist build serwist.config.mjs`, run after `next build`
// (Turbopack), bundles app/sw.ts with the precache manifest of that build into public/sw.js.
// The build directory comes from next.config.ts (RIBBONRY_DIST_DIR), so side-by-side builds
// each get a worker for their own files.
import path from "node:path";
import { serwist } from "@serwist/next/config";

export default await serwist.withNextConfig((nextConfig) => ({
  swSrc: "app/sw.ts",
  swDest: "public/sw.js",
  // Pages are per viewer and dynamic; the judging page is cached at run time instead (app/sw.ts).
  precachePrerendered: false,
  globPatterns: [path.posix.join(nextConfig.distDir, "static/**/*.{js,css,woff,woff2,png,svg,ico,json}"), "public/icons/*.svg"],
  maximumFileSizeToCacheInBytes: 8 * 1024 * 1024,
}));
