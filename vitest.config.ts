import { defineConfig } from "vitest/config";
import { fileURLToPath } from "node:url";

export default defineConfig({
  resolve: {
    alias: { "@": fileURLToPath(new URL("./", import.meta.url)) },
  },
  test: {
    environment: "node",
    pool: "forks",
    include: ["test/**/*.test.ts"],
    globalSetup: ["test/support/global-setup.ts"],
    hookTimeout: 60_000,
    testTimeout: 30_000,
  },
});
