import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { resetDemoFleet, seedDemoFleetIfEmpty } from "../../lib/data/seed-demo-fleet";
import { DEMO_END_MS, DEMO_START_MS, simulateDemoFleet } from "../../lib/demo";
import { createTestDatabase, type TestDatabase } from "../support/test-database";

let database: TestDatabase;
// Two assets keep the test fast: one with an instrument fault, one with two cleanings.
const TAGS = ["E-1105", "E-3104"];
const HOURS = Math.round((DEMO_END_MS - DEMO_START_MS) / 3_600_000) + 1;

beforeAll(async () => {
  database = await createTestDatabase();
});
afterAll(async () => {
  await database.drop();
});

describe("seedDemoFleetIfEmpty", () => {
  it("loads site, units, assets, instruments, cleanings, hourly readings and ground truth into an empty database", async () => {
    const result = await seedDemoFleetIfEmpty(database.prisma, { tags: TAGS });
    expect(result).toEqual({ assets: 2, readings: 2 * HOURS });
    const prisma = database.prisma;
    expect(await prisma.site.findFirst()).toMatchObject({ code: "BWH", timeZone: "Europe/Amsterdam" });
    expect(await prisma.processUnit.count()).toBe(3);
    const asset = await prisma.asset.findUniqueOrThrow({ where: { tag: "E-3104" }, include: { instruments: true, cleanings: true, demoTruth: true } });
    expect(asset.instruments).toHaveLength(6);
    const [simulated] = simulateDemoFleet({ assets: ["E-3104"] });
    expect(asset.cleanings.map((cleaning) => cleaning.date.getTime())).toEqual(simulated?.result.cleanings.map((cleaning) => cleaning.startMs));
    const truth = asset.demoTruth?.truth as { faults: { kind: string; role: string }[]; thresholdCrossingMs: number | null; daily: { timeMs: number[] } };
    expect(truth.faults).toEqual([expect.objectContaining({ kind: "stuck", role: "coldFlow" })]);
    expect(truth.thresholdCrossingMs).toBe(simulated?.trueCrossingMs);
    expect(truth.daily.timeMs).toHaveLength(Math.ceil(HOURS / 24));
    // Readings are stored exactly as the simulator measured them (SI, nulls where missing).
    const first = simulated?.result.readings[100];
    const stored = await prisma.reading.findUniqueOrThrow({ where: { assetId_time: { assetId: asset.id, time: new Date(first?.timeMs ?? 0) } } });
    expect(stored).toMatchObject({ hotInK: first?.hotInK, coldOutK: first?.coldOutK, coldFlowKgPerS: first?.coldFlowKgPerS });
  });

  it("loads nothing when the database already holds assets", async () => {
    expect(await seedDemoFleetIfEmpty(database.prisma, { tags: TAGS })).toBeNull();
    expect(await database.prisma.asset.count()).toBe(2);
  });
});

describe("resetDemoFleet", () => {
  it("replaces everything stored with a fresh demo fleet", async () => {
    await database.prisma.asset.update({ where: { tag: "E-1105" }, data: { name: "edited" } });
    const result = await resetDemoFleet(database.prisma, { tags: ["E-1105"] });
    expect(result).toEqual({ assets: 1, readings: HOURS });
    expect(await database.prisma.asset.findMany({ select: { tag: true, name: true } })).toEqual([{ tag: "E-1105", name: expect.not.stringMatching("edited") }]);
    expect(await database.prisma.site.count()).toBe(1);
  });
});
