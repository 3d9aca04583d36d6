// Read by the Prisma CLI only (generate, migrate diff). Foulcast applies its
// migrations itself (lib/database/migrate.ts); the CLI uses the JavaScript
// schema engine through the pg driver adapter, so no native engine is needed.
import { defineConfig } from "prisma/config";
import { PrismaPg } from "@prisma/adapter-pg";

process.env.DATABASE_URL ??= "postgresql://placeholder@127.0.0.1:1/placeholder";

let adapter: PrismaPg | undefined;

export default defineConfig({
  experimental: { adapter: true },
  engine: "js",
  schema: "prisma/schema.prisma",
  migrations: { path: "prisma/migrations" },
  // The CLI calls this more than once per command: build the adapter once.
  adapter: async () => (adapter ??= new PrismaPg({ connectionString: process.env.DATABASE_URL })),
});
