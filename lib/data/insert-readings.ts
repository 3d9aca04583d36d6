import type { Prisma, PrismaClient } from "../../generated/prisma/client";

export interface ReadingRow {
  timeMs: number;
  hotInK: number | null;
  hotOutK: number | null;
  coldInK: number | null;
  coldOutK: number | null;
  hotFlowKgPerS: number | null;
  coldFlowKgPerS: number | null;
}

type Database = PrismaClient | Prisma.TransactionClient;

const BATCH_ROWS = 5_000;

/**
 * Inserts readings of one asset in batches (one statement per batch, columns
 * passed as arrays and expanded with unnest). Rows whose time is already
 * stored are left unchanged. Returns the number of rows inserted.
 */
export async function insertReadings(database: Database, assetId: number, rows: readonly ReadingRow[]): Promise<number> {
  let inserted = 0;
  for (let start = 0; start < rows.length; start += BATCH_ROWS) {
    const batch = rows.slice(start, start + BATCH_ROWS);
    inserted += await database.$executeRawUnsafe(
      `insert into "Reading" ("assetId", "time", "hotInK", "hotOutK", "coldInK", "coldOutK", "hotFlowKgPerS", "coldFlowKgPerS")
       select $1, to_timestamp(t / 1000.0), a, b, c, d, e, f
       from unnest($2::float8[], $3::float8[], $4::float8[], $5::float8[], $6::float8[], $7::float8[], $8::float8[]) as u(t, a, b, c, d, e, f)
       on conflict ("assetId", "time") do nothing`,
      assetId,
      batch.map((row) => row.timeMs),
      batch.map((row) => row.hotInK),
      batch.map((row) => row.hotOutK),
      batch.map((row) => row.coldInK),
      batch.map((row) => row.coldOutK),
      batch.map((row) => row.hotFlowKgPerS),
      batch.map((row) => row.coldFlowKgPerS),
    );
  }
  return inserted;
}
