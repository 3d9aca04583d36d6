// Import benchmark: a year of one-minute data for one exchanger (525,600 rows) through importReadings, against
// PostgreSQL's own bulk load (COPY FROM STDIN) of the same rows into an identical table.
// Run: node --import tsx scripts/bench/import.ts [--rows N]
// (add --max-old-space-size=128 before --import to see the import live within a small heap)
// Uses the configured server (embedded by default, or DATABASE_URL) with a scratch database made and dropped here.
import fs from "node:fs";
import fsp from "node:fs/promises";
import os from "node:os";
import path from "node:path";
import { pipeline } from "node:stream/promises";
import pg from "pg";
import { from as copyFrom } from "pg-copy-streams";
import { toSI } from "../../lib/core/units";
import { importReadings } from "../../lib/data/import-readings";
import { prepareDatabase } from "../../lib/database/prepare-database";
import { migrate } from "../../lib/database/migrate";
import { createPrismaClient } from "../../lib/db";
import { pressureToPascal } from "../../lib/import/pressure-units";
import { sampleCsvChunks, sampleReading } from "./import-sample-data";

const rowsArgument = process.argv.indexOf("--rows");
const ROWS = rowsArgument > 0 ? Number(process.argv[rowsArgument + 1]) : 525_600;
const START_MS = Date.UTC(2025, 0, 1);

const log = (message: string) => console.error(`[bench] ${message}`);

function withDatabaseName(url: string, name: string): string {
  const parsed = new URL(url);
  parsed.pathname = `/${name}`;
  return parsed.toString();
}

/** Peak resident set and heap while `work` runs, sampled every 10 ms. */
async function measure<T>(
  work: () => Promise<T>,
): Promise<{ result: T; seconds: number; startRssMB: number; peakRssMB: number; startHeapMB: number; peakHeapMB: number }> {
  const start = process.memoryUsage();
  let peakRss = start.rss;
  let peakHeap = start.heapUsed;
  const timer = setInterval(() => {
    const usage = process.memoryUsage();
    peakRss = Math.max(peakRss, usage.rss);
    peakHeap = Math.max(peakHeap, usage.heapUsed);
  }, 10);
  const started = performance.now();
  try {
    const result = await work();
    return {
      result,
      seconds: (performance.now() - started) / 1000,
      startRssMB: start.rss / 2 ** 20,
      peakRssMB: peakRss / 2 ** 20,
      startHeapMB: start.heapUsed / 2 ** 20,
      peakHeapMB: peakHeap / 2 ** 20,
    };
  } finally {
    clearInterval(timer);
  }
}

let lastReported = 0;
function reportProgress({ rowsRead }: { rowsRead: number }): void {
  if (rowsRead < lastReported) lastReported = 0;
  if (rowsRead - lastReported < 100_000 && rowsRead !== ROWS) return;
  lastReported = rowsRead;
  log(`  ${rowsRead} rows read`);
}

async function writeLines(file: string, chunks: Iterable<string>): Promise<number> {
  await pipeline(chunks, fs.createWriteStream(file));
  return (await fsp.stat(file)).size;
}

function* copyRows(assetId: number): Generator<string> {
  const lines: string[] = [];
  for (let index = 0; index < ROWS; index++) {
    const reading = sampleReading(index, START_MS);
    lines.push(
      [
        assetId,
        new Date(reading.timeMs).toISOString(),
        toSI("temperature", reading.hotInC, "degC"),
        toSI("temperature", reading.hotOutC, "degC"),
        toSI("temperature", reading.coldInC, "degC"),
        toSI("temperature", reading.coldOutC, "degC"),
        reading.hotFlowKgPerS,
        reading.coldFlowKgPerS,
        pressureToPascal(reading.hotPressureDropKPa, "kPa"),
      ].join(","),
    );
    if (lines.length === 5000) yield `${lines.splice(0).join("\n")}\n`;
  }
  if (lines.length) yield `${lines.join("\n")}\n`;
}

async function main(): Promise<void> {
  const database = await prepareDatabase({ log });
  const scratch = `foulcast_bench_${Date.now().toString(36)}`;
  const admin = new pg.Client({ connectionString: database.url });
  await admin.connect();
  const folder = await fsp.mkdtemp(path.join(os.tmpdir(), "foulcast-bench-"));
  const csvFile = path.join(folder, "year.csv");
  const copyFile = path.join(folder, "copy.csv");
  let prisma: ReturnType<typeof createPrismaClient> | null = null;
  try {
    await admin.query(`create database "${scratch}"`);
    const url = withDatabaseName(database.url, scratch);
    await migrate(url);
    prisma = createPrismaClient(url);
    const site = await prisma.site.create({ data: { code: "BENCH", name: "Benchmark site", timeZone: "UTC" } });
    const unit = await prisma.processUnit.create({ data: { siteId: site.id, code: "B1", name: "Benchmark unit" } });
    const asset = await prisma.asset.create({
      data: {
        tag: "E-BENCH", name: "Benchmark exchanger", unitId: unit.id, service: "benchmark", arrangementKind: "counterflow",
        areaM2: 250, hotStreamName: "gas oil", hotCpKind: "constant", hotCpIntercept: 2300, coldStreamName: "crude",
        coldCpKind: "constant", coldCpIntercept: 2000, designDutyW: 5e6, designUWPerM2K: 350, designFoulingM2KPerW: 4e-4,
        refHotInletK: 453, refColdInletK: 298, refHotFlowKgPerS: 12, refColdFlowKgPerS: 15, dutyThresholdW: 4e6,
      },
    });

    log(`writing ${ROWS} rows of canonical CSV`);
    const csvBytes = await writeLines(csvFile, sampleCsvChunks(ROWS, START_MS));
    await writeLines(copyFile, copyRows(asset.id));

    const activePrisma = prisma;
    const runImport = () =>
      importReadings(activePrisma, { assetTag: asset.tag, source: "cli", createdBy: "bench", fileName: "year.csv", stream: fs.createReadStream(csvFile), onProgress: reportProgress });
    log("importing (first time)");
    const first = await measure(runImport);
    log("importing again (nothing changes)");
    const again = await measure(runImport);

    log("COPY FROM STDIN into an identical table");
    const copyClient = new pg.Client({ connectionString: url });
    await copyClient.connect();
    await copyClient.query(`create table "ReadingCopy" (like "Reading" including all)`);
    const copy = await measure(() =>
      pipeline(
        fs.createReadStream(copyFile),
        copyClient.query(copyFrom(`copy "ReadingCopy" ("assetId", "time", "hotInK", "hotOutK", "coldInK", "coldOutK", "hotFlowKgPerS", "coldFlowKgPerS", "hotPressureDropPa") from stdin with (format csv)`)),
      ),
    );
    const copied = await copyClient.query<{ count: string }>(`select count(*) as count from "ReadingCopy"`);
    await copyClient.end();

    const importRate = ROWS / first.seconds;
    const copyRate = ROWS / copy.seconds;
    const report = {
      rows: ROWS,
      csvMB: Number((csvBytes / 2 ** 20).toFixed(1)),
      cpus: os.cpus().length,
      server: database.embedded ? "embedded" : "external",
      import: {
        seconds: Number(first.seconds.toFixed(2)),
        rowsPerSecond: Math.round(importRate),
        rowsNew: first.result.rowsNew,
        rssBeforeMB: Math.round(first.startRssMB),
        peakRssMB: Math.round(first.peakRssMB),
        heapUsedBeforeMB: Math.round(first.startHeapMB),
        peakHeapUsedMB: Math.round(first.peakHeapMB),
      },
      reimport: {
        seconds: Number(again.seconds.toFixed(2)),
        rowsPerSecond: Math.round(ROWS / again.seconds),
        rowsNew: again.result.rowsNew,
        rowsChanged: again.result.rowsChanged,
        rowsUnchanged: again.result.rowsUnchanged,
        peakRssMB: Math.round(again.peakRssMB),
      },
      copy: { seconds: Number(copy.seconds.toFixed(2)), rowsPerSecond: Math.round(copyRate), rows: Number(copied.rows[0]?.count ?? 0) },
      importToCopyRatio: Number((importRate / copyRate).toFixed(3)),
    };
    console.log(JSON.stringify(report, null, 2));
  } finally {
    await prisma?.$disconnect();
    await admin.query(`drop database if exists "${scratch}" with (force)`).catch((error: Error) => log(`could not drop ${scratch}: ${error.message}`));
    await admin.end();
    await fsp.rm(folder, { recursive: true, force: true });
    await database.release();
  }
}

await main();
process.exit(0);
