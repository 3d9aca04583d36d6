import fsp from "node:fs/promises";
import os from "node:os";
import path from "node:path";
import pg from "pg";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { migrate, readMigrations } from "../../lib/database/migrate";
import { adminQuery } from "../support/test-database";
import { inject } from "vitest";
import { randomBytes } from "node:crypto";

// A blank database (not cloned from the migrated template) for each case.
async function blankDatabase(): Promise<string> {
  const name = `${inject("templateDatabase")}_blank_${randomBytes(4).toString("hex")}`;
  await adminQuery(`create database "${name}"`);
  const url = new URL(inject("serverUrl"));
  url.pathname = `/${name}`;
  return url.toString();
}

async function tableNames(url: string): Promise<string[]> {
  const client = new pg.Client({ connectionString: url });
  await client.connect();
  const result = await client.query<{ table_name: string }>(
    "select table_name from information_schema.tables where table_schema = 'public' order by table_name",
  );
  await client.end();
  return result.rows.map((row) => row.table_name);
}

describe("migrate", () => {
  let url: string;
  beforeAll(async () => {
    url = await blankDatabase();
  });

  it("applies every migration once and records it in Prisma's history table", async () => {
    const files = await readMigrations();
    const report = await migrate(url);
    expect(report.applied).toEqual(files.map((file) => file.name));
    expect(await tableNames(url)).toEqual(expect.arrayContaining(["Asset", "Reading", "Site", "_prisma_migrations"]));
    const again = await migrate(url);
    expect(again).toEqual({ applied: [], alreadyApplied: files.length });
  });

  it("has a migration for the current schema: the latest migration's schema copy equals prisma/schema.prisma", async () => {
    const latest = (await readMigrations()).at(-1);
    expect(latest).toBeDefined();
    const snapshot = await fsp.readFile(path.join("prisma", "migrations", latest?.name ?? "", "schema.prisma"), "utf8");
    // A difference means prisma/schema.prisma was edited without `npm run db:migration -- <name>`.
    expect(snapshot).toBe(await fsp.readFile(path.join("prisma", "schema.prisma"), "utf8"));
  });

  it("lets two processes migrate the same database at once without error or double application", async () => {
    const fresh = await blankDatabase();
    const [first, second] = await Promise.all([migrate(fresh), migrate(fresh)]);
    const total = (first?.applied.length ?? 0) + (second?.applied.length ?? 0);
    expect(total).toBe((await readMigrations()).length);
    const client = new pg.Client({ connectionString: fresh });
    await client.connect();
    const rows = await client.query(`select migration_name from "_prisma_migrations"`);
    await client.end();
    expect(rows.rowCount).toBe(total);
  });

  describe("with a changed or failing migration", () => {
    let folder: string;
    beforeAll(async () => {
      folder = await fsp.mkdtemp(path.join(os.tmpdir(), "foulcast-migrations-"));
      await fsp.mkdir(path.join(folder, "001_first"));
      await fsp.writeFile(path.join(folder, "001_first", "migration.sql"), "create table first_table (id int);");
    });
    afterAll(async () => {
      await fsp.rm(folder, { recursive: true, force: true });
    });

    it("refuses a migration whose text changed after it was applied", async () => {
      const target = await blankDatabase();
      await migrate(target, { folder });
      await fsp.writeFile(path.join(folder, "001_first", "migration.sql"), "create table first_table (id bigint);");
      await expect(migrate(target, { folder })).rejects.toThrow("Migration 001_first was changed after it was applied");
    });

    it("rolls a failing migration back completely and names it", async () => {
      const target = await blankDatabase();
      await fsp.mkdir(path.join(folder, "002_broken"));
      await fsp.writeFile(path.join(folder, "002_broken", "migration.sql"), "create table second_table (id int); select * from no_such_table;");
      await fsp.writeFile(path.join(folder, "001_first", "migration.sql"), "create table first_table (id int);");
      await expect(migrate(target, { folder })).rejects.toThrow(/Migration 002_broken failed and was rolled back: .*no_such_table/);
      const tables = await tableNames(target);
      expect(tables).toContain("first_table");
      expect(tables).not.toContain("second_table");
    });
  });
});
