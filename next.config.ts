import type { NextConfig } from "next";

const nextConfig: NextConfig = {
  // The test suite builds into its own folder so that it never disturbs a running `npm start`.
  distDir: process.env.NEXT_DIST_DIR || ".next",
  experimental: { authInterrupts: true },
  serverExternalPackages: ["@react-pdf/renderer", "pg"],
  poweredByHeader: false,
};

export default nextConfig;
