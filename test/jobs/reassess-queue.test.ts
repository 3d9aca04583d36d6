// The reassessment queue on a real database: singleton keys, exactly-once processing by workers of two separate
// queue instances (as two processes would have), and imports and cleaning records that enqueue their asset.
import type PgBoss from "pg-boss";
import pg from "pg";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { importReadings } from "../../lib/data/import-readings";
import { recordCleaning } from "../../lib/data/record-cleaning";
import { refreshAfterImport } from "../../lib/data/refresh-after-import";
import { seedDemoFleetIfEmpty } from "../../lib/data/seed-demo-fleet";
import { DEMO_END_MS } from "../../lib/demo/demo-constants";
import { enqueueReassessment, reassessSingletonKey } from "../../lib/jobs/enqueue-reassessment";
import { openJobQueue, REASSESS_QUEUE } from "../../lib/jobs/open-job-queue";
import { startReassessWorkers, type ReassessWorkers } from "../../lib/jobs/start-reassess-workers";
import { CANONICAL_HEADER, textStream } from "../import/support/fixtures";
import { createTestDatabase, type TestDatabase } from "../support/test-database";

const TAGS = ["E-3101", "E-3102", "E-3103"];

let database: TestDatabase;
let queues: PgBoss[] = [];
let assets: { id: number; tag: string }[] = [];

async function jobRows(url: string): Promise<{ singleton_key: string; state: string }[]> {
  const client = new pg.Client({ connectionString: url });
  await client.connect();
  try {
    const result = await client.query<{ singleton_key: string; state: string }>("select singleton_key, state::text as state from pgboss.job where name = $1 order by singleton_key", [REASSESS_QUEUE]);
    return result.rows;
  } finally {
    await client.end();
  }
}

/** Three hourly rows of plausible readings from `startMs`, with the canonical header. */
function readingsCsv(startMs: number): string {
  return `${CANONICAL_HEADER}\n${[0, 1, 2].map((hour) => `${new Date(startMs + hour * 3_600_000).toISOString()},180,120,25,75,12,15`).join("\n")}\n`;
}

/** The jobs of one asset that wait for a worker. */
async function waitingJobs(url: string, assetId: number): Promise<{ singleton_key: string; state: string }[]> {
  return (await jobRows(url)).filter((row) => row.state === "created" && row.singleton_key === reassessSingletonKey(assetId));
}

async function waitFor(condition: () => Promise<boolean>, timeoutMs: number): Promise<void> {
  const deadline = Date.now() + timeoutMs;
  while (!(await condition())) {
    if (Date.now() > deadline) throw new Error(`condition not met within ${timeoutMs} ms`);
    await new Promise((resolve) => setTimeout(resolve, 250));
  }
}

beforeAll(async () => {
  database = await createTestDatabase();
  await seedDemoFleetIfEmpty(database.prisma, { tags: TAGS });
  assets = await database.prisma.asset.findMany({ select: { id: true, tag: true }, orderBy: { tag: "asc" } });
  // Two queue instances on the same database, as two worker processes would have.
  queues = [await openJobQueue(database.url, { maxConnections: 3 }), await openJobQueue(database.url, { maxConnections: 3 })];
}, 120_000);

afterAll(async () => {
  for (const queue of queues) await queue.stop({ graceful: false, wait: true, timeout: 5_000 });
  await database.drop();
});

describe("reassessment queue", () => {
  it("queues an asset once while its job waits, and two workers process every queued asset exactly once", async () => {
    expect(assets.map((asset) => asset.tag)).toEqual(TAGS);
    const [first, second] = queues as [PgBoss, PgBoss];
    expect(await enqueueReassessment(first, assets)).toEqual({ queued: 3, alreadyQueued: 0 });
    // the same assets again, from the other instance: refused by the singleton key while the first jobs wait
    expect(await enqueueReassessment(second, assets)).toEqual({ queued: 0, alreadyQueued: 3 });
    expect(await jobRows(database.url)).toHaveLength(3);

    const handled: string[] = [];
    const workers: ReassessWorkers[] = [];
    for (const queue of queues) {
      workers.push(await startReassessWorkers(queue, database.prisma, database.url, { pollingIntervalSeconds: 0.5, onJob: (outcome) => handled.push(outcome.tag ?? "?") }));
    }
    await waitFor(async () => (await jobRows(database.url)).every((row) => row.state === "completed"), 150_000);
    // two more polling rounds: nothing is taken a second time
    await new Promise((resolve) => setTimeout(resolve, 1_500));
    for (const worker of workers) await worker.stop();

    expect([...handled].sort()).toEqual(TAGS);
    expect(await jobRows(database.url)).toEqual(assets.map((asset) => ({ singleton_key: reassessSingletonKey(asset.id), state: "completed" })));
    // the pipeline ran: screened days and an assessment for each asset
    for (const asset of assets) {
      expect(await database.prisma.operatingPeriod.count({ where: { assetId: asset.id, lengthS: 86400, usable: true } })).toBeGreaterThan(300);
      expect(await database.prisma.assetAssessment.count({ where: { assetId: asset.id } })).toBe(1);
    }
  }, 180_000);

  it("makes an import that adds readings enqueue its asset instead of reassessing inline", async () => {
    const [queue] = queues as [PgBoss];
    const asset = assets[0] as { id: number; tag: string };
    const before = await database.prisma.assetAssessment.findUniqueOrThrow({ where: { assetId: asset.id } });
    const importOnce = async (startMs: number) => {
      const summary = await importReadings(database.prisma, { assetTag: asset.tag, source: "cli", createdBy: "test", fileName: "new.csv", stream: textStream(readingsCsv(startMs)) });
      expect(summary.rowsNew).toBe(3);
      return refreshAfterImport(database.prisma, summary, { queue });
    };
    expect(await importOnce(DEMO_END_MS + 3_600_000)).toEqual({ reassessed: false, queued: true });
    // a second import before a worker runs: still one waiting job for the asset
    expect(await importOnce(DEMO_END_MS + 4 * 3_600_000)).toEqual({ reassessed: false, queued: true });
    const waiting = (await jobRows(database.url)).filter((row) => row.state === "created");
    expect(waiting).toEqual([{ singleton_key: reassessSingletonKey(asset.id), state: "created" }]);
    // nothing was recomputed inline
    const after = await database.prisma.assetAssessment.findUniqueOrThrow({ where: { assetId: asset.id } });
    expect(after.computedAt).toEqual(before.computedAt);
    // without a queue the same call reassesses inline
    const summary = await importReadings(database.prisma, { assetTag: asset.tag, source: "cli", createdBy: "test", fileName: "more.csv", stream: textStream(readingsCsv(DEMO_END_MS + 8 * 3_600_000)) });
    expect(await refreshAfterImport(database.prisma, summary, { queue: null })).toEqual({ reassessed: true, queued: false });
  }, 120_000);

  it("makes a cleaning record enqueue its asset once, shared with imports, and reassess inline without a queue", async () => {
    const [queue] = queues as [PgBoss];
    // E-3102: its job from the first test has completed, so nothing of it waits
    const asset = assets[1] as { id: number; tag: string };
    expect(await waitingJobs(database.url, asset.id)).toEqual([]);
    const before = await database.prisma.assetAssessment.findUniqueOrThrow({ where: { assetId: asset.id } });

    const first = await recordCleaning(database.prisma, { tag: asset.tag, date: "2026-11-02", endDate: "2026-11-04", method: "hydroblast" }, "test", null, { queue });
    expect(first).toEqual({ id: expect.any(Number), reassessed: false, queued: true });
    expect(await database.prisma.cleaning.count({ where: { id: first.id, assetId: asset.id } })).toBe(1);
    expect(await waitingJobs(database.url, asset.id)).toEqual([{ singleton_key: reassessSingletonKey(asset.id), state: "created" }]);

    // a second cleaning and an import of the same asset while its job waits: the same job, no second one
    const second = await recordCleaning(database.prisma, { tag: asset.tag, date: "2026-11-16", method: "chemical clean" }, "test", null, { queue });
    expect(second).toEqual({ id: expect.any(Number), reassessed: false, queued: true });
    const summary = await importReadings(database.prisma, { assetTag: asset.tag, source: "cli", createdBy: "test", fileName: "after-cleaning.csv", stream: textStream(readingsCsv(DEMO_END_MS + 3_600_000)) });
    expect(summary.rowsNew).toBe(3);
    expect(await refreshAfterImport(database.prisma, summary, { queue })).toEqual({ reassessed: false, queued: true });
    expect(await waitingJobs(database.url, asset.id)).toHaveLength(1);
    // nothing was recomputed inline
    expect((await database.prisma.assetAssessment.findUniqueOrThrow({ where: { assetId: asset.id } })).computedAt).toEqual(before.computedAt);

    // without a queue the cleaning's assessment is recomputed inline, and no job is added
    const inline = await recordCleaning(database.prisma, { tag: asset.tag, date: "2026-11-24", method: "hydroblast" }, "test", null, { queue: null });
    expect(inline).toEqual({ id: expect.any(Number), reassessed: true, queued: false });
    const after = await database.prisma.assetAssessment.findUniqueOrThrow({ where: { assetId: asset.id } });
    expect(after.computedAt.getTime()).toBeGreaterThan(before.computedAt.getTime());
    expect(await waitingJobs(database.url, asset.id)).toHaveLength(1);
  }, 120_000);
});

describe("startReassessWorkers", () => {
  it("can be stopped twice (signal handler and normal end) without failing", async () => {
    const [queue] = queues as [PgBoss];
    const workers = await startReassessWorkers(queue, database.prisma, database.url, { pollingIntervalSeconds: 0.5 });
    await expect(Promise.all([workers.stop(), workers.stop()])).resolves.toEqual([undefined, undefined]);
    await expect(workers.stop()).resolves.toBeUndefined();
  });
});
