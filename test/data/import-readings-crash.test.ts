import { spawn } from "node:child_process";
import fs from "node:fs";
import fsp from "node:fs/promises";
import os from "node:os";
import path from "node:path";
import { Readable } from "node:stream";
import { pipeline } from "node:stream/promises";
import pg from "pg";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { IMPORT_LOCK_CLASS, importReadings } from "../../lib/data/import-readings";
import { ImportFailure } from "../../lib/import/import-errors";
import { sampleCsvChunks } from "../../scripts/bench/import-sample-data";
import { adminQuery, createTestDatabase, type TestDatabase } from "../support/test-database";
import { createTestAsset, readingsState } from "../import/support/fixtures";

let database: TestDatabase;
let folder: string;
let bigFile: string;

const START = Date.UTC(2025, 0, 1);
const BIG_ROWS = 120_000;
const EXISTING_ROWS = 20_000;

beforeAll(async () => {
  database = await createTestDatabase();
  folder = await fsp.mkdtemp(path.join(os.tmpdir(), "foulcast-crash-"));
  bigFile = path.join(folder, "big.csv");
  await pipeline(Readable.from(sampleCsvChunks(BIG_ROWS, START)), fs.createWriteStream(bigFile));
});

afterAll(async () => {
  // Prisma 6.19 with the pg adapter never returns a connection to its pool when the ROLLBACK after a lost connection
  // fails (it sends ROLLBACK through the dead connection first and releases it only when that succeeds), so
  // $disconnect would wait for it forever: give it two seconds, then drop the database regardless.
  await Promise.race([database.prisma.$disconnect(), new Promise((resolve) => setTimeout(resolve, 2000))]);
  await adminQuery(`drop database if exists "${database.name}" with (force)`);
  await fsp.rm(folder, { recursive: true, force: true });
});

async function withClient<T>(work: (client: pg.Client) => Promise<T>): Promise<T> {
  const client = new pg.Client({ connectionString: database.url });
  await client.connect();
  try {
    return await work(client);
  } finally {
    await client.end();
  }
}

/** Backends holding the import lock of the asset (two-key advisory lock: classid = first key, objid = second). */
async function lockHolders(assetId: number): Promise<number[]> {
  return withClient(async (client) => {
    const result = await client.query<{ pid: number }>(
      "select pid from pg_locks where locktype = 'advisory' and classid = $1 and objid = $2 and objsubid = 2 and granted",
      [IMPORT_LOCK_CLASS, assetId],
    );
    return result.rows.map((row) => row.pid);
  });
}

async function existingData(tag: string): Promise<{ id: number }> {
  const asset = await createTestAsset(database.prisma, tag, "UTC");
  // the first rows of the big file, shifted by 0.5 K so the big import would change them
  const lines = [...sampleCsvChunks(EXISTING_ROWS, START)].join("").split("\n");
  const shifted = lines.map((line, index) => (index === 0 || line === "" ? line : line.replace(/^([^,]+),([^,]+),/, (_, time: string, hot: string) => `${time},${Number(hot) + 0.5},`)));
  await importReadings(database.prisma, { assetTag: tag, source: "cli", createdBy: "test", fileName: "first.csv", stream: Readable.from([shifted.join("\n")]) });
  return asset;
}

describe("importReadings crash safety", () => {
  it("leaves the readings exactly as before when the importing process is killed, and a later import succeeds", async () => {
    const asset = await existingData("E-KILLED");
    const before = await readingsState(database.prisma, asset.id);
    const batchesBefore = await database.prisma.importBatch.count({ where: { assetId: asset.id } });
    const child = spawn(process.execPath, ["--import", "tsx", path.join("test", "import", "support", "import-child.ts"), database.url, "E-KILLED", bigFile], {
      cwd: process.cwd(),
      stdio: ["ignore", "pipe", "pipe"],
    });
    let stderr = "";
    child.stderr.on("data", (chunk: Buffer) => (stderr += chunk.toString()));
    const killedAt = await new Promise<number>((resolve, reject) => {
      let buffered = "";
      child.stdout.on("data", (chunk: Buffer) => {
        buffered += chunk.toString();
        const rows = [...buffered.matchAll(/progress (\d+)/g)].map((match) => Number(match[1]));
        const latest = rows.at(-1) ?? 0;
        if (latest >= 30_000 && child.exitCode === null && !child.killed) {
          child.kill("SIGKILL");
          resolve(latest);
        }
        if (buffered.includes("done")) reject(new Error("the child finished before it could be killed"));
      });
      child.on("exit", (code, signal) => {
        if (signal !== "SIGKILL") reject(new Error(`child exited (${code}) before it was killed: ${stderr}`));
      });
    });
    await new Promise((resolve) => (child.exitCode !== null || child.signalCode !== null ? resolve(null) : child.once("exit", resolve)));
    expect(killedAt).toBeLessThan(BIG_ROWS);
    // PostgreSQL ends the killed client's session and rolls its transaction back once it sees the socket closed
    for (let attempt = 0; attempt < 100 && (await lockHolders(asset.id)).length > 0; attempt++) await new Promise((resolve) => setTimeout(resolve, 100));
    expect(await lockHolders(asset.id)).toEqual([]);
    expect(await readingsState(database.prisma, asset.id)).toEqual(before);
    // a killed process cannot record its failure; no "running" batch is left behind either
    expect(await database.prisma.importBatch.count({ where: { assetId: asset.id } })).toBe(batchesBefore);

    const again = await importReadings(database.prisma, { assetTag: "E-KILLED", source: "cli", createdBy: "test", fileName: "big.csv", stream: fs.createReadStream(bigFile) });
    expect(again).toMatchObject({ rowsRead: BIG_ROWS, rowsNew: BIG_ROWS - EXISTING_ROWS, rowsChanged: EXISTING_ROWS, rowsRejected: 0 });
  }, 60_000);

  it("fails clearly and changes nothing when the database connection is terminated mid-import", async () => {
    const asset = await existingData("E-TERMINATED");
    const before = await readingsState(database.prisma, asset.id);
    let terminated = false;
    let termination: Promise<unknown> | null = null;
    // the file stalls once the termination is under way, so the import is certainly mid-way when it lands
    async function* stallingFile(): AsyncGenerator<string> {
      for (const chunk of sampleCsvChunks(60_000, START)) {
        yield chunk;
        if (termination) await termination;
      }
    }
    const attempt = importReadings(database.prisma, {
      assetTag: "E-TERMINATED",
      source: "api",
      createdBy: "test",
      fileName: "slow.csv",
      stream: stallingFile(),
      onProgress: ({ rowsRead }) => {
        if (rowsRead < 15_000 || terminated) return;
        terminated = true;
        termination = lockHolders(asset.id).then((pids) => withClient((client) => client.query("select pg_terminate_backend(pid) from unnest($1::int[]) as pid", [pids])));
      },
    });
    const failure = await attempt.then(
      () => null,
      (error: unknown) => error,
    );
    expect(terminated).toBe(true);
    expect(failure).toBeInstanceOf(ImportFailure);
    // the cause is PostgreSQL's "terminating connection due to administrator command" (SQLSTATE 57P01, PostgreSQL
    // docs Appendix A) when a query is running, or the pg client's broken-connection message when it is idle
    expect((failure as ImportFailure).message).toMatch(
      /^the connection to the database was lost during the import; nothing was committed and the readings are unchanged\. Cause: (terminating connection due to administrator command \(PostgreSQL 57P01\)|Client has encountered a connection error and is not queryable)$/,
    );
    expect(await readingsState(database.prisma, asset.id)).toEqual(before);
    const batch = await database.prisma.importBatch.findUnique({ where: { id: (failure as ImportFailure).batchId ?? -1 } });
    expect(batch).toMatchObject({ status: "failed", fileName: "slow.csv", error: (failure as ImportFailure).message });
    // the connection pool recovers: the same data imports afterwards
    const again = await importReadings(database.prisma, { assetTag: "E-TERMINATED", source: "api", createdBy: "test", fileName: "slow.csv", stream: Readable.from(sampleCsvChunks(60_000, START)) });
    expect(again).toMatchObject({ rowsRead: 60_000, rowsNew: 60_000 - EXISTING_ROWS, rowsChanged: EXISTING_ROWS });
  }, 60_000);
});
