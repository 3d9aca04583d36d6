// SIGKILL of an importing process at seeded random moments, from start-up to commit: every asset ends either
// exactly as before or exactly as after a complete import, never in between. (test/data/import-readings-crash.test.ts
// kills once at a fixed row count; this covers the whole span, the merge and the commit included.)
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
import { sampleCsvChunks } from "../../scripts/bench/import-sample-data";
import { createTestDatabase, type TestDatabase } from "../support/test-database";
import { createTestAsset } from "../import/support/fixtures";
import { seededRandom, valuesState, type ValuesState } from "./support/readings-values";

const START = Date.UTC(2025, 6, 1);
const ROWS = 40_000;
const EXISTING_ROWS = 4000;
const KILL_POINTS = 8;
const SEED = 20_261_201;
const CHILD = path.join("test", "import", "support", "import-child.ts");

let database: TestDatabase;
let folder: string;
let file: string;

beforeAll(async () => {
  database = await createTestDatabase();
  folder = await fsp.mkdtemp(path.join(os.tmpdir(), "foulcast-kill-"));
  file = path.join(folder, "year.csv");
  await pipeline(Readable.from(sampleCsvChunks(ROWS, START)), fs.createWriteStream(file));
});

afterAll(async () => {
  await database.drop();
  await fsp.rm(folder, { recursive: true, force: true });
});

/** Runs the import child; kills it with SIGKILL `killAfterMs` after it starts (null: let it finish). Returns how it ended. */
function runChild(tag: string, killAfterMs: number | null): Promise<{ killed: boolean; finished: boolean; ms: number; stderr: string }> {
  const started = Date.now();
  const child = spawn(process.execPath, ["--import", "tsx", CHILD, database.url, tag, file], { cwd: process.cwd(), stdio: ["ignore", "pipe", "pipe"] });
  let stdout = "";
  let stderr = "";
  child.stdout.on("data", (chunk: Buffer) => (stdout += chunk.toString()));
  child.stderr.on("data", (chunk: Buffer) => (stderr += chunk.toString()));
  const timer = killAfterMs === null ? null : setTimeout(() => child.kill("SIGKILL"), killAfterMs);
  return new Promise((resolve) => {
    child.on("exit", (_code, signal) => {
      if (timer) clearTimeout(timer);
      resolve({ killed: signal === "SIGKILL", finished: stdout.includes("done "), ms: Date.now() - started, stderr });
    });
  });
}

async function lockHeld(assetId: number): Promise<boolean> {
  const client = new pg.Client({ connectionString: database.url });
  await client.connect();
  try {
    const result = await client.query("select 1 from pg_locks where locktype = 'advisory' and classid = $1 and objid = $2 and objsubid = 2", [IMPORT_LOCK_CLASS, assetId]);
    return (result.rowCount ?? 0) > 0;
  } finally {
    await client.end();
  }
}

/** An asset holding the first EXISTING_ROWS rows of the file with other values (hot inlet +0.5 K), so the import changes them. */
async function assetWithData(tag: string): Promise<{ id: number }> {
  const asset = await createTestAsset(database.prisma, tag, "UTC");
  const text = [...sampleCsvChunks(EXISTING_ROWS, START)].join("");
  const shifted = text.split("\n").map((line, index) => (index === 0 || line === "" ? line : line.replace(/^([^,]+),([^,]+),/, (_, time: string, hot: string) => `${time},${Number(hot) + 0.5},`)));
  await importReadings(database.prisma, { assetTag: tag, source: "cli", createdBy: "test", fileName: "existing.csv", stream: Readable.from([shifted.join("\n")]) });
  return asset;
}

describe("importReadings killed with SIGKILL at seeded random moments", () => {
  it("leaves each asset exactly as before or exactly as after a complete import", async () => {
    // the reference: the same file imported to the end in a child process, for the "after" state and the duration
    const reference = await assetWithData("E-KILL-REF");
    const referenceRun = await runChild("E-KILL-REF", null);
    expect(referenceRun.finished, referenceRun.stderr).toBe(true);
    const after: ValuesState = await valuesState(database.prisma, reference.id);
    expect(after.count).toBe(ROWS);

    const random = seededRandom(SEED);
    const outcomes: string[] = [];
    for (let point = 0; point < KILL_POINTS; point++) {
      const tag = `E-KILL-${point}`;
      const asset = await assetWithData(tag);
      const before = await valuesState(database.prisma, asset.id);
      const batchesBefore = await database.prisma.importBatch.count({ where: { assetId: asset.id } });
      // from 30 % to 110 % of the full run: start-up, reading, staging, merge and commit
      const killAfterMs = Math.round(referenceRun.ms * (0.3 + 0.8 * random()));
      const run = await runChild(tag, killAfterMs);
      // PostgreSQL rolls the killed session's transaction back once it notices the closed socket
      for (let wait = 0; wait < 100 && (await lockHeld(asset.id)); wait++) await new Promise((resolve) => setTimeout(resolve, 100));
      expect(await lockHeld(asset.id)).toBe(false);
      const state = await valuesState(database.prisma, asset.id);
      const batches = await database.prisma.importBatch.findMany({ where: { assetId: asset.id }, select: { status: true } });
      expect(batches.filter((batch) => batch.status === "running")).toEqual([]);
      if (run.finished) {
        expect(state).toEqual(after);
        outcomes.push(`${killAfterMs} ms: finished`);
      } else {
        expect(run.killed).toBe(true);
        // all or nothing: either the commit happened (complete) or nothing of the import is visible
        expect([JSON.stringify(before), JSON.stringify(after)]).toContain(JSON.stringify(state));
        expect(batches.length).toBe(state.checksum === after.checksum ? batchesBefore + 1 : batchesBefore);
        outcomes.push(`${killAfterMs} ms: ${state.checksum === after.checksum ? "killed after commit" : "killed, unchanged"}`);
      }
    }
    if (process.env.FOULCAST_FUZZ_REPORT) console.info(`full run ${referenceRun.ms} ms; ${outcomes.join("; ")}`);
    // the seeded points must include real kills mid-import
    expect(outcomes.filter((outcome) => outcome.endsWith("killed, unchanged")).length).toBeGreaterThanOrEqual(3);
  }, 180_000);
});
