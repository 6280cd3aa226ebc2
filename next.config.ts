import type { NextConfig } from "next";

const nextConfig: NextConfig = {
  // The test suite builds into its own folder so that it never disturbs a running `npm start`.
  distDir: process.env.NEXT_DIST_DIR || ".next",
  experimental: { authInterrupts: true },
  serverExternalPackages: ["@react-pdf/renderer", "pg", "pg-boss"],
  poweredByHeader: false,
  // `npm test` has type-checked everything (route types included, from `next typegen`) before it builds
  // for the end-to-end tests; the build need not check it a second time. Other builds check as usual.
  typescript: { ignoreBuildErrors: process.env.BLOCKWRIGHT_TYPES_CHECKED === "1" },
};

export default nextConfig;
