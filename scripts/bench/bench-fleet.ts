// Benchmark fleets in their own databases: the demo fleet (24 simulated exchangers, screened and assessed), and
// larger fleets made by copying the demo assets' register rows under new tags together with their readings and
// derived rows (instruments, screened periods, alerts, cleanings, assessment) with `insert … select` in the server.
// Copies are data-identical to their originals, which is what a load or storage test needs; they are not new physics.
import pg from "pg";
import { migrate } from "../../lib/database/migrate";
import { refreshFleet } from "../../lib/data/refresh-fleet";
import { seedDemoFleetIfEmpty } from "../../lib/data/seed-demo-fleet";
import { seedDemoUsersIfNone } from "../../lib/data/seed-demo-users";
import { createPrismaClient } from "../../lib/db";

/** The server benchmarks use: DATABASE_URL's, else the local PostgreSQL (127.0.0.1:5432, trust auth). */
export function benchServerUrl(): string {
  return process.env.DATABASE_URL?.trim() || "postgresql://postgres@127.0.0.1:5432/test";
}

export function withDatabaseName(url: string, name: string): string {
  const parsed = new URL(url);
  parsed.pathname = `/${name}`;
  return parsed.toString();
}

/** Tables copied with each asset (every column but a generated id; "assetId" mapped to the copy). */
const CHILD_TABLES = ["Instrument", "Cleaning", "OperatingPeriod", "InstrumentAlert", "AssetAssessment", "Reading"];

async function columnsOf(client: pg.Client, table: string): Promise<string[]> {
  const result = await client.query<{ column_name: string }>(
    `select column_name from information_schema.columns
     where table_schema = 'public' and table_name = $1 and coalesce(column_default, '') not like 'nextval(%'
     order by ordinal_position`,
    [table],
  );
  return result.rows.map((row) => row.column_name);
}

const quote = (name: string) => `"${name.replaceAll('"', '""')}"`;

export async function createDatabaseIfMissing(serverUrl: string, name: string): Promise<string> {
  const admin = new pg.Client({ connectionString: serverUrl });
  await admin.connect();
  try {
    const found = await admin.query("select 1 from pg_database where datname = $1", [name]);
    if (found.rowCount === 0) await admin.query(`create database ${quote(name)}`);
  } finally {
    await admin.end();
  }
  const url = withDatabaseName(serverUrl, name);
  await migrate(url);
  return url;
}

export async function dropDatabase(serverUrl: string, name: string): Promise<void> {
  const admin = new pg.Client({ connectionString: serverUrl });
  await admin.connect();
  try {
    await admin.query(`drop database if exists ${quote(name)} with (force)`);
  } finally {
    await admin.end();
  }
}

/** Loads the demo fleet, its demo users and its derived results into an empty database (about a minute of CPU). */
export async function ensureDemoFleet(url: string, log: (message: string) => void): Promise<void> {
  const prisma = createPrismaClient(url);
  try {
    const seeded = await seedDemoFleetIfEmpty(prisma, {});
    if (seeded) {
      log(`loaded the demo fleet (${seeded.assets} assets, ${seeded.readings} readings); screening and assessing it`);
      await refreshFleet(prisma, {});
    }
    await seedDemoUsersIfNone(prisma);
  } finally {
    await prisma.$disconnect();
  }
}

/**
 * Grows the fleet in the database at `url` to `assets` assets by copying the demo assets in turn (tags
 * "<tag>-c<copy>"); returns the number of assets and readings. Needs the demo fleet (ensureDemoFleet) first.
 */
export async function growFleet(url: string, assets: number, log: (message: string) => void): Promise<{ assets: number; readings: number }> {
  const client = new pg.Client({ connectionString: url });
  await client.connect();
  try {
    await client.query("set synchronous_commit to off");
    const sources = (await client.query<{ id: number; tag: string }>(`select id, tag from "Asset" where tag not like '%-c%' order by tag`)).rows;
    let count = Number((await client.query<{ count: string }>(`select count(*) as count from "Asset"`)).rows[0]?.count ?? 0);
    if (sources.length === 0) throw new Error("no demo assets to copy: load the demo fleet first");
    const assetColumns = (await columnsOf(client, "Asset")).filter((column) => column !== "tag");
    const childColumns = new Map<string, string[]>();
    for (const table of CHILD_TABLES) childColumns.set(table, await columnsOf(client, table));
    let copy = 1;
    while (count < assets) {
      const batch: { old: number; tag: string }[] = [];
      for (const source of sources) {
        if (count + batch.length >= assets) break;
        const tag = `${source.tag}-c${String(copy).padStart(3, "0")}`;
        const exists = await client.query(`select 1 from "Asset" where tag = $1`, [tag]);
        if (exists.rowCount === 0) batch.push({ old: source.id, tag });
      }
      copy += 1;
      if (batch.length === 0) continue;
      await client.query("begin");
      await client.query(`create temporary table if not exists asset_copy (old_id int, new_id int) on commit drop`);
      for (const item of batch) {
        const list = assetColumns.map(quote).join(", ");
        const inserted = await client.query<{ id: number }>(`insert into "Asset" (tag, ${list}) select $1, ${list} from "Asset" where id = $2 returning id`, [item.tag, item.old]);
        await client.query(`insert into asset_copy values ($1, $2)`, [item.old, inserted.rows[0]?.id]);
      }
      for (const table of CHILD_TABLES) {
        const columns = childColumns.get(table) ?? [];
        const selected = columns.map((column) => (column === "assetId" ? "m.new_id" : `t.${quote(column)}`)).join(", ");
        await client.query(`insert into ${quote(table)} (${columns.map(quote).join(", ")}) select ${selected} from ${quote(table)} t join asset_copy m on t."assetId" = m.old_id`);
      }
      await client.query("commit");
      count += batch.length;
      log(`fleet: ${count} of ${assets} assets`);
    }
    await client.query(`analyze`);
    const readings = Number((await client.query<{ count: string }>(`select count(*) as count from "Reading"`)).rows[0]?.count ?? 0);
    return { assets: count, readings };
  } finally {
    await client.end();
  }
}
