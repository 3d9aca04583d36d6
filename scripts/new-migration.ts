// `npm run db:migration -- <name>`: writes prisma/migrations/<timestamp>_<name>/migration.sql
// with the SQL that takes the schema of the latest migration to prisma/schema.prisma.
// Each migration folder keeps a copy of the schema it produces (schema.prisma), so
// the diff is datamodel to datamodel: the Prisma CLI cannot diff a live database
// when it runs through a driver adapter. The CLI still connects once (through the
// adapter in prisma.config.ts), so the configured database is prepared first.
import { execFileSync } from "node:child_process";
import fs from "node:fs";
import path from "node:path";
import { prepareDatabase } from "../lib/database/prepare-database";
import { migrationsFolder, readMigrations } from "../lib/database/migrate";

const name = process.argv[2];
if (!name || !/^[a-z0-9_]+$/.test(name)) {
  console.error("Usage: npm run db:migration -- <name in lower_snake_case>");
  process.exit(2);
}

const database = await prepareDatabase({ log: (message) => console.error(message) });
try {
  const latest = (await readMigrations()).at(-1);
  const from = latest ? ["--from-schema-datamodel", path.join(migrationsFolder(), latest.name, "schema.prisma")] : ["--from-empty"];
  const sql = execFileSync("node_modules/.bin/prisma", ["migrate", "diff", ...from, "--to-schema-datamodel", "prisma/schema.prisma", "--script"], {
    env: { ...process.env, DATABASE_URL: database.url },
    encoding: "utf8",
  });
  if (!/\b(CREATE|ALTER|DROP)\b/i.test(sql)) {
    console.log("prisma/schema.prisma matches the latest migration: nothing to write.");
  } else {
    const stamp = new Date().toISOString().replace(/\D/g, "").slice(0, 14);
    const folder = path.join(migrationsFolder(), `${stamp}_${name}`);
    fs.mkdirSync(folder, { recursive: true });
    fs.writeFileSync(path.join(folder, "migration.sql"), sql);
    fs.copyFileSync("prisma/schema.prisma", path.join(folder, "schema.prisma"));
    console.log(`Wrote ${path.relative(process.cwd(), folder)}/migration.sql; review it, then run npm run db:generate.`);
  }
} finally {
  await database.release();
}
process.exit(0);
