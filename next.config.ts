import type { NextConfig } from "next";
import { ACTION_BODY_LIMIT_BYTES } from "./lib/request-limits";
import { FIXED_HEADERS, permissionsPolicy } from "./lib/security-headers";

const nextConfig: NextConfig = {
  // sharp and the AWS SDK stay as Node modules on the server instead of being bundled.
  serverExternalPackages: ["sharp", "postgres", "pdfkit"],
  poweredByHeader: false,
  // scripts/dev-app.ts gives each side-by-side development server a build directory of its own.
  distDir: process.env.RIBBONRY_DIST_DIR ?? ".next",
  typedRoutes: false,
  experimental: {
    // forbidden() and unauthorized() let a page answer 403/401 with its own screen.
    authInterrupts: true,
    // Next's default (1 MB), stated: forms post text, photos go straight to storage.
    serverActions: { bodySizeLimit: ACTION_BODY_LIMIT_BYTES },
  },
  // Fixed security headers on every response; the CSP (nonce per request) and HSTS come from proxy.ts.
  async headers() {
    return [
      { source: "/:path*", headers: FIXED_HEADERS },
      // The intake desk scans QR labels with the camera (the later rule wins for the same header).
      { source: "/shows/:slug/desk", headers: [{ key: "Permissions-Policy", value: permissionsPolicy(true) }] },
      { source: "/shows/:slug/desk/:path*", headers: [{ key: "Permissions-Policy", value: permissionsPolicy(true) }] },
    ];
  },
};

export default nextConfig;
