// Applies the Prisma migrations in prisma/migrations in order, each in its own
// transaction, and records them in Prisma's _prisma_migrations table (same
// columns and sha256 checksum as `prisma migrate deploy`, so the Prisma CLI
// sees the same history). A PostgreSQL advisory lock, the key Prisma's own
// migrate uses, makes concurrent starters wait for each other.
import { createHash, randomUUID } from "node:crypto";
import fsp from "node:fs/promises";
import path from "node:path";
import pg from "pg";
import { projectRoot } from "./connection-settings";

/** Advisory lock key used by Prisma Migrate (pg_advisory_lock(72707369)). */
const MIGRATION_LOCK_KEY = 72707369;

export interface MigrationFile {
  name: string;
  sql: string;
  checksum: string;
}

export function migrationsFolder(): string {
  return path.join(projectRoot(), "prisma", "migrations");
}

export async function readMigrations(folder = migrationsFolder()): Promise<MigrationFile[]> {
  const entries = await fsp.readdir(folder, { withFileTypes: true });
  const names = entries.filter((entry) => entry.isDirectory()).map((entry) => entry.name).sort();
  return Promise.all(
    names.map(async (name) => {
      const sql = await fsp.readFile(path.join(folder, name, "migration.sql"), "utf8");
      return { name, sql, checksum: createHash("sha256").update(sql).digest("hex") };
    }),
  );
}

export interface MigrationReport {
  applied: string[];
  alreadyApplied: number;
}

const CREATE_HISTORY = `
create table if not exists "_prisma_migrations" (
  "id" varchar(36) primary key not null,
  "checksum" varchar(64) not null,
  "finished_at" timestamptz,
  "migration_name" varchar(255) not null,
  "logs" text,
  "rolled_back_at" timestamptz,
  "started_at" timestamptz not null default now(),
  "applied_steps_count" integer not null default 0
)`;

/** Applies pending migrations to the database at `url` (optionally inside `schema`). */
export async function migrate(url: string, options: { folder?: string; schema?: string } = {}): Promise<MigrationReport> {
  const migrations = await readMigrations(options.folder);
  const client = new pg.Client({ connectionString: url });
  await client.connect();
  try {
    if (options.schema) await client.query(`set search_path to "${options.schema.replaceAll('"', '""')}"`);
    await client.query("select pg_advisory_lock($1)", [MIGRATION_LOCK_KEY]);
    try {
      await client.query(CREATE_HISTORY);
      const done = await client.query<{ migration_name: string; checksum: string }>(
        `select migration_name, checksum from "_prisma_migrations" where finished_at is not null and rolled_back_at is null`,
      );
      const appliedChecksums = new Map(done.rows.map((row) => [row.migration_name, row.checksum]));
      const applied: string[] = [];
      for (const migration of migrations) {
        const previous = appliedChecksums.get(migration.name);
        if (previous !== undefined) {
          if (previous !== migration.checksum) {
            throw new Error(`Migration ${migration.name} was changed after it was applied (checksum differs); add a new migration instead`);
          }
          continue;
        }
        await client.query("begin");
        try {
          await client.query(migration.sql);
          await client.query(
            `insert into "_prisma_migrations" (id, checksum, migration_name, started_at, finished_at, applied_steps_count)
             values ($1, $2, $3, now(), now(), 1)`,
            [randomUUID(), migration.checksum, migration.name],
          );
          await client.query("commit");
        } catch (error) {
          await client.query("rollback");
          throw new Error(`Migration ${migration.name} failed and was rolled back: ${(error as Error).message}`);
        }
        applied.push(migration.name);
      }
      return { applied, alreadyApplied: migrations.length - applied.length };
    } finally {
      await client.query("select pg_advisory_unlock($1)", [MIGRATION_LOCK_KEY]).catch(() => undefined);
    }
  } finally {
    await client.end();
  }
}
