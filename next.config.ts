import type { NextConfig } from "next";

const nextConfig: NextConfig = {
  // sharp and the AWS SDK stay as Node modules on the server instead of being bundled.
  serverExternalPackages: ["sharp", "postgres"],
  poweredByHeader: false,
  typedRoutes: false,
  // forbidden() and unauthorized() let a page answer 403/401 with its own screen.
  experimental: { authInterrupts: true },
};

export default nextConfig;
