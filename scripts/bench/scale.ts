// Scale measurements for docs/scale.md, in a scratch database (made and dropped here):
// (1) disk per reading: `--assets` exchangers × one year of one-minute readings written into "Reading" by the server
//     (generate_series, deterministic values of the import benchmark's shape), then pg_relation_size per row;
// (2) the same rows in a table partitioned by month (PostgreSQL declarative partitioning): size, and the time of a
//     one-asset one-day read on both tables;
// (3) hourly and daily aggregates of those rows: rows and size;
// (4) reassessment (screening, alerts, assessment) of one asset from a year of one-minute readings: time and memory
//     (cold cp 2208 J/(kg·K) balances the sample's mean duties: 12 kg/s × 2300 × 60 K = 15 kg/s × 2208 × 50 K ≈ 1.66 MW).
// Run: node --import tsx scripts/bench/scale.ts [--assets 5] [--json]
import os from "node:os";
import pg from "pg";
import { refreshAssessment } from "../../lib/data/refresh-assessment";
import { refreshDataQuality } from "../../lib/data/refresh-data-quality";
import { createPrismaClient } from "../../lib/db";
import { benchServerUrl, createDatabaseIfMissing, dropDatabase } from "./bench-fleet";

const log = (message: string) => console.error(`[bench] ${message}`);
const assetsArgument = process.argv.indexOf("--assets");
const ASSETS = assetsArgument > 0 ? Number(process.argv[assetsArgument + 1]) : 5;
const MINUTES_PER_YEAR = 525_600;
const START = "2025-01-01T00:00:00Z";

async function seconds<T>(work: () => Promise<T>): Promise<{ result: T; seconds: number }> {
  const started = performance.now();
  const result = await work();
  return { result, seconds: Number(((performance.now() - started) / 1000).toFixed(2)) };
}

async function size(client: pg.Client, table: string): Promise<{ heapBytes: number; indexBytes: number; totalBytes: number; rows: number }> {
  const result = await client.query<{ heap: string; total: string; rows: string }>(
    `select sum(pg_relation_size(c.oid)) as heap, sum(pg_total_relation_size(c.oid)) as total, (select count(*) from ${table}) as rows
     from pg_class c where c.oid = $1::regclass or c.oid in (select inhrelid from pg_inherits where inhparent = $1::regclass)`,
    [table],
  );
  const row = result.rows[0];
  const total = Number(row?.total ?? 0);
  const heap = Number(row?.heap ?? 0);
  // pg_total_relation_size includes TOAST and indexes; heap is the main fork only.
  const indexes = await client.query<{ bytes: string }>(
    `select coalesce(sum(pg_relation_size(indexrelid)), 0) as bytes from pg_index where indrelid = $1::regclass or indrelid in (select inhrelid from pg_inherits where inhparent = $1::regclass)`,
    [table],
  );
  return { heapBytes: heap, indexBytes: Number(indexes.rows[0]?.bytes ?? 0), totalBytes: total, rows: Number(row?.rows ?? 0) };
}

/** One year of one-minute readings per asset, in SI, the shape of scripts/bench/import-sample-data.ts (daily and yearly cycles, slow fouling, a hashed wobble). */
const READINGS_SQL = `
insert into "Reading" ("assetId", "time", "hotInK", "hotOutK", "coldInK", "coldOutK", "hotFlowKgPerS", "coldFlowKgPerS", "hotPressureDropPa")
select a.id, timestamptz '${START}' + i * interval '1 minute',
  round((453.15 + 6 * sin(2 * pi() * i / ${MINUTES_PER_YEAR}) + 2 * sin(2 * pi() * (i % 1440) / 1440) + 0.3 * w)::numeric, 2)::float8,
  round((393.15 + 4 * sin(2 * pi() * i / ${MINUTES_PER_YEAR}) + 8 * i::float8 / ${MINUTES_PER_YEAR} + 0.3 * w)::numeric, 2)::float8,
  round((298.15 + 8 * sin(2 * pi() * i / ${MINUTES_PER_YEAR} - 0.5) + 1.5 * sin(2 * pi() * (i % 1440) / 1440) + 0.2 * w)::numeric, 2)::float8,
  round((348.15 + 5 * sin(2 * pi() * i / ${MINUTES_PER_YEAR}) - 6 * i::float8 / ${MINUTES_PER_YEAR} + 0.2 * w)::numeric, 2)::float8,
  round((12 + 0.8 * sin(4 * pi() * (i % 1440) / 1440) + 0.1 * w)::numeric, 3)::float8,
  round((15 + 0.5 * sin(2 * pi() * (i % 1440) / 1440) + 0.1 * w)::numeric, 3)::float8,
  round((45000 + 20000 * i::float8 / ${MINUTES_PER_YEAR} + 1000 * w)::numeric, 0)::float8
from "Asset" a, generate_series(0, ${MINUTES_PER_YEAR - 1}) as i,
  lateral (select ((i * 2654435761::bigint + a.id * 40503) % 4294967296)::float8 / 4294967296 - 0.5 as w) wobble
where a.id = $1`;

async function main(): Promise<void> {
  const server = benchServerUrl();
  const name = `foulcast_bench_scale_${Date.now().toString(36)}`;
  const url = await createDatabaseIfMissing(server, name);
  const client = new pg.Client({ connectionString: url });
  await client.connect();
  const prisma = createPrismaClient(url);
  try {
    await client.query("set synchronous_commit to off");
    const version = (await client.query<{ server_version: string }>("show server_version")).rows[0]?.server_version;
    const site = await prisma.site.create({ data: { code: "SCALE", name: "Scale site", timeZone: "UTC" } });
    const unit = await prisma.processUnit.create({ data: { siteId: site.id, code: "S1", name: "Scale unit" } });
    const ids: number[] = [];
    for (let index = 0; index < ASSETS; index += 1) {
      const asset = await prisma.asset.create({
        data: {
          tag: `E-S${String(index + 1).padStart(3, "0")}`, name: "Scale exchanger", unitId: unit.id, service: "scale", arrangementKind: "counterflow",
          areaM2: 250, hotStreamName: "gas oil", hotCpKind: "constant", hotCpIntercept: 2300, coldStreamName: "crude",
          coldCpKind: "constant", coldCpIntercept: 2208, designDutyW: 5e6, designUWPerM2K: 350, designFoulingM2KPerW: 4e-4,
          refHotInletK: 453, refColdInletK: 298, refHotFlowKgPerS: 12, refColdFlowKgPerS: 15, dutyThresholdW: 4e6,
        },
      });
      ids.push(asset.id);
    }
    log(`writing ${ASSETS} × ${MINUTES_PER_YEAR} one-minute readings in the server`);
    const write = await seconds(async () => {
      for (const id of ids) await client.query(READINGS_SQL, [id]);
    });
    await client.query(`vacuum analyze "Reading"`);
    const plain = await size(client, `"Reading"`);

    log("monthly partitions");
    await client.query(`create table "ReadingByMonth" (like "Reading" including defaults) partition by range ("time")`);
    await client.query(`alter table "ReadingByMonth" add primary key ("assetId", "time")`);
    for (let month = 0; month < 12; month += 1) {
      const from = new Date(Date.UTC(2025, month, 1)).toISOString();
      const to = new Date(Date.UTC(2025, month + 1, 1)).toISOString();
      await client.query(`create table "ReadingByMonth_${month + 1}" partition of "ReadingByMonth" for values from ('${from}') to ('${to}')`);
    }
    const partitionWrite = await seconds(() => client.query(`insert into "ReadingByMonth" select * from "Reading"`));
    await client.query(`vacuum analyze "ReadingByMonth"`);
    const partitioned = await size(client, `"ReadingByMonth"`);
    const dayQuery = (table: string) => `select count(*), avg("hotInK") from ${table} where "assetId" = ${ids[0]} and "time" >= '2025-07-01' and "time" < '2025-07-02'`;
    const dayRead = async (table: string) => {
      const times: number[] = [];
      for (let run = 0; run < 7; run += 1) {
        const started = performance.now();
        await client.query(dayQuery(table));
        times.push(performance.now() - started);
      }
      return times.sort((a, b) => a - b)[3] as number; // median of 7, ms
    };
    const plainDayMs = await dayRead(`"Reading"`);
    const partitionedDayMs = await dayRead(`"ReadingByMonth"`);
    const pruned = (await client.query<{ "QUERY PLAN": string }>(`explain ${dayQuery(`"ReadingByMonth"`)}`)).rows.map((row) => row["QUERY PLAN"]).join("\n");
    const partitionsScanned = (pruned.match(/ReadingByMonth_\d+/g) ?? []).filter((value, index, all) => all.indexOf(value) === index).length;

    log("hourly and daily aggregates");
    const aggregate = (table: string, unitName: string) =>
      client.query(`create table ${table} as select "assetId", date_trunc('${unitName}', "time") as "start", count(*)::int as samples,
        avg("hotInK") as "hotInK", avg("hotOutK") as "hotOutK", avg("coldInK") as "coldInK", avg("coldOutK") as "coldOutK",
        avg("hotFlowKgPerS") as "hotFlowKgPerS", avg("coldFlowKgPerS") as "coldFlowKgPerS",
        min("hotInK") as "hotInMinK", max("hotInK") as "hotInMaxK", stddev("hotInK") as "hotInStdK"
        from "Reading" group by 1, 2`);
    const hourlyWrite = await seconds(() => aggregate(`"ReadingHourly"`, "hour"));
    await client.query(`alter table "ReadingHourly" add primary key ("assetId", "start")`);
    await aggregate(`"ReadingDaily"`, "day");
    await client.query(`alter table "ReadingDaily" add primary key ("assetId", "start")`);
    const hourly = await size(client, `"ReadingHourly"`);
    const daily = await size(client, `"ReadingDaily"`);

    log("reassessing one asset from a year of one-minute readings");
    const tag = `E-S001`;
    let peakRss = process.memoryUsage().rss;
    const sampler = setInterval(() => (peakRss = Math.max(peakRss, process.memoryUsage().rss)), 20);
    const cpuBefore = process.cpuUsage();
    const quality = await seconds(() => refreshDataQuality(prisma, tag));
    const assessment = await seconds(() => refreshAssessment(prisma, tag));
    const cpu = process.cpuUsage(cpuBefore);
    clearInterval(sampler);

    const perRow = (figures: { totalBytes: number; rows: number }) => Number((figures.totalBytes / figures.rows).toFixed(1));
    const report = {
      postgres: version,
      cpus: os.cpus().length,
      loadAverage: os.loadavg().map((value) => Number(value.toFixed(2))),
      readings: {
        assets: ASSETS,
        rows: plain.rows,
        writeSeconds: write.seconds,
        heapBytesPerRow: Number((plain.heapBytes / plain.rows).toFixed(1)),
        indexBytesPerRow: Number((plain.indexBytes / plain.rows).toFixed(1)),
        totalBytesPerRow: perRow(plain),
        totalMB: Number((plain.totalBytes / 2 ** 20).toFixed(1)),
      },
      partitionedByMonth: {
        partitions: 12,
        copySeconds: partitionWrite.seconds,
        totalBytesPerRow: perRow(partitioned),
        oneAssetOneDayReadMs: { plain: Number(plainDayMs.toFixed(2)), partitioned: Number(partitionedDayMs.toFixed(2)) },
        partitionsInPlanForOneDay: partitionsScanned,
      },
      aggregates: {
        hourly: { rows: hourly.rows, totalBytesPerRow: perRow(hourly), totalMB: Number((hourly.totalBytes / 2 ** 20).toFixed(2)), buildSeconds: hourlyWrite.seconds },
        daily: { rows: daily.rows, totalBytesPerRow: perRow(daily), totalMB: Number((daily.totalBytes / 2 ** 20).toFixed(3)) },
      },
      reassessOneYearMinuteData: {
        readings: MINUTES_PER_YEAR,
        screeningSeconds: quality.seconds,
        assessmentSeconds: assessment.seconds,
        cpuSeconds: Number(((cpu.user + cpu.system) / 1e6).toFixed(1)),
        peakRssMB: Math.round(peakRss / 2 ** 20),
        usableDays: quality.result.usablePeriods,
        days: quality.result.periods,
        assessed: assessment.result !== null,
      },
    };
    console.log(JSON.stringify(report, null, process.argv.includes("--json") ? undefined : 2));
  } finally {
    await prisma.$disconnect();
    await client.end();
    await dropDatabase(server, name);
  }
}

await main();
process.exit(0);
