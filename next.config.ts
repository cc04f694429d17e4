import type { NextConfig } from "next";

const nextConfig: NextConfig = {
  // sharp and the AWS SDK stay as Node modules on the server instead of being bundled.
  serverExternalPackages: ["sharp", "postgres", "pdfkit"],
  poweredByHeader: false,
  // scripts/dev-app.ts gives each side-by-side development server a build directory of its own.
  distDir: process.env.RIBBONRY_DIST_DIR ?? ".next",
  typedRoutes: false,
  // forbidden() and unauthorized() let a page answer 403/401 with its own screen.
  experimental: { authInterrupts: true },
};

export default nextConfig;
