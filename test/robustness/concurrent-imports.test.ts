// Eight imports of overlapping files into one asset at the same time, in one process (Promise.all) and in eight
// processes: no duplicate and no lost rows, each time holding the values of the last file committed over it,
// every batch completed or failed with a reason, no lock left behind.
import { spawn } from "node:child_process";
import fsp from "node:fs/promises";
import os from "node:os";
import path from "node:path";
import pg from "pg";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { IMPORT_LOCK_CLASS, importReadings } from "../../lib/data/import-readings";
import { createTestDatabase, type TestDatabase } from "../support/test-database";
import { canonicalCsv, createTestAsset, textStream } from "../import/support/fixtures";

const START = Date.UTC(2026, 0, 1);
const FILES = 8;
const ROWS_PER_FILE = 3000;
const OFFSET_ROWS = 1000; // file k covers minutes k·1000 … k·1000 + 2999: neighbours overlap by 2000 rows
const MINUTE = 60_000;

let database: TestDatabase;

beforeAll(async () => {
  database = await createTestDatabase();
});

afterAll(async () => {
  await database.drop();
});

/** File k: its own shift (k + 1) × 0.5 °C on the temperatures, so each file's values differ from every other's. */
const fileText = (k: number) => canonicalCsv(ROWS_PER_FILE, START + k * OFFSET_ROWS * MINUTE, (k + 1) * 0.5);
const fileName = (k: number) => `part-${k}.csv`;
/** Cold outlet of file k in K: canonicalCsv writes 60 + shift °C on every row. */
const coldOutOf = (k: number) => 60 + (k + 1) * 0.5 + 273.15;

async function checkFinalState(assetId: number): Promise<void> {
  const batches = await database.prisma.importBatch.findMany({ where: { assetId }, orderBy: { id: "asc" } });
  expect(batches).toHaveLength(FILES);
  for (const batch of batches) {
    expect(["completed", "failed"]).toContain(batch.status);
    if (batch.status === "failed") expect(batch.error ?? "").not.toBe("");
  }
  const completed = batches.filter((batch) => batch.status === "completed");
  // with the asset's advisory lock the imports run one after another, so all of them complete
  expect(completed).toHaveLength(FILES);
  const fileOfBatch = new Map(completed.map((batch) => [batch.id, Number(/part-(\d+)/.exec(batch.fileName)?.[1])]));
  // commit order: finishedAt is set inside each transaction, and the lock orders the transactions
  const commitOrder = [...completed].sort((a, b) => (a.finishedAt as Date).getTime() - (b.finishedAt as Date).getTime()).map((batch) => fileOfBatch.get(batch.id) as number);

  const rows = await database.prisma.reading.findMany({ where: { assetId }, select: { time: true, coldOutK: true, importBatchId: true }, orderBy: { time: "asc" } });
  // union of the files' times: minutes 0 … (FILES − 1)·OFFSET_ROWS + ROWS_PER_FILE − 1, each once (no loss, no duplicate)
  const expectedCount = (FILES - 1) * OFFSET_ROWS + ROWS_PER_FILE;
  expect(rows).toHaveLength(expectedCount);
  expect(new Set(rows.map((row) => row.time.getTime())).size).toBe(expectedCount);
  for (const row of rows) {
    const minute = (row.time.getTime() - START) / MINUTE;
    const covering = commitOrder.filter((k) => minute >= k * OFFSET_ROWS && minute < k * OFFSET_ROWS + ROWS_PER_FILE);
    const last = covering.at(-1) as number;
    // the last file committed over this time wrote it, and its values are that file's
    expect(fileOfBatch.get(row.importBatchId as number)).toBe(last);
    expect(row.coldOutK).toBeCloseTo(coldOutOf(last), 9);
  }
  const client = new pg.Client({ connectionString: database.url });
  await client.connect();
  try {
    const locks = await client.query("select 1 from pg_locks where locktype = 'advisory' and classid = $1 and objid = $2", [IMPORT_LOCK_CLASS, assetId]);
    expect(locks.rowCount).toBe(0);
  } finally {
    await client.end();
  }
}

describe("concurrent imports into one asset", () => {
  it("eight importReadings calls at once (Promise.all): the union of the rows, the last writer's values, all completed", async () => {
    const asset = await createTestAsset(database.prisma, "E-PARALLEL", "UTC");
    const started = Date.now();
    const results = await Promise.allSettled(
      Array.from({ length: FILES }, (_, k) => importReadings(database.prisma, { assetTag: asset.tag, source: "api", createdBy: `writer-${k}`, fileName: fileName(k), stream: textStream(fileText(k), 4096) })),
    );
    expect(Date.now() - started).toBeLessThan(60_000);
    for (const result of results) expect(result.status, result.status === "rejected" ? String(result.reason) : "").toBe("fulfilled");
    await checkFinalState(asset.id);
  }, 90_000);

  it("eight processes importing at once: the same guarantees across processes", async () => {
    const asset = await createTestAsset(database.prisma, "E-PROCESSES", "UTC");
    const folder = await fsp.mkdtemp(path.join(os.tmpdir(), "foulcast-concurrent-"));
    try {
      const files = await Promise.all(Array.from({ length: FILES }, async (_, k) => {
        const file = path.join(folder, fileName(k));
        await fsp.writeFile(file, fileText(k));
        return file;
      }));
      const exits = await Promise.all(files.map((file) => new Promise<{ code: number | null; output: string }>((resolve) => {
        const child = spawn(process.execPath, ["--import", "tsx", path.join("test", "import", "support", "import-child.ts"), database.url, asset.tag, file], { cwd: process.cwd(), stdio: ["ignore", "pipe", "pipe"] });
        let output = "";
        child.stdout.on("data", (chunk: Buffer) => (output += chunk.toString()));
        child.stderr.on("data", (chunk: Buffer) => (output += chunk.toString()));
        const timer = setTimeout(() => child.kill("SIGKILL"), 100_000);
        child.on("exit", (code) => {
          clearTimeout(timer);
          resolve({ code, output });
        });
      })));
      for (const exit of exits) expect(exit.code, exit.output.slice(-500)).toBe(0);
      await checkFinalState(asset.id);
    } finally {
      await fsp.rm(folder, { recursive: true, force: true });
    }
  }, 120_000);
});
