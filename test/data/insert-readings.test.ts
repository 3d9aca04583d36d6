import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { insertReadings, type ReadingRow } from "../../lib/data/insert-readings";
import { listAssets } from "../../lib/data/list-assets";
import { createTestDatabase, type TestDatabase } from "../support/test-database";

let database: TestDatabase;
let assetId: number;

beforeAll(async () => {
  database = await createTestDatabase();
  const site = await database.prisma.site.create({ data: { code: "TS", name: "Test site", timeZone: "Europe/Berlin" } });
  const unit = await database.prisma.processUnit.create({ data: { siteId: site.id, code: "U1", name: "Unit one" } });
  const asset = await database.prisma.asset.create({
    data: {
      tag: "E-TEST", name: "Test exchanger", unitId: unit.id, service: "test", arrangementKind: "counterflow",
      areaM2: 100, hotStreamName: "oil", hotCpKind: "constant", hotCpIntercept: 2100, coldStreamName: "water",
      coldCpKind: "constant", coldCpIntercept: 4180, designDutyW: 1e6, designUWPerM2K: 400, designFoulingM2KPerW: 3.5e-4,
      refHotInletK: 400, refColdInletK: 300, refHotFlowKgPerS: 10, refColdFlowKgPerS: 8, dutyThresholdW: 8e5,
    },
  });
  assetId = asset.id;
});

afterAll(async () => {
  await database.drop();
});

function rows(count: number, startMs: number): ReadingRow[] {
  return Array.from({ length: count }, (_, index) => ({
    timeMs: startMs + index * 3_600_000,
    hotInK: 400 + index * 1e-3,
    hotOutK: 350,
    coldInK: index % 7 === 0 ? null : 300,
    coldOutK: 330.125,
    hotFlowKgPerS: 10,
    coldFlowKgPerS: 8,
  }));
}

describe("insertReadings", () => {
  const start = Date.UTC(2025, 0, 1);

  it("stores every row across several batches with values, nulls and millisecond times intact", async () => {
    const data = rows(12_345, start);
    expect(await insertReadings(database.prisma, assetId, data)).toBe(12_345);
    const stored = await database.prisma.reading.findMany({ where: { assetId }, orderBy: { time: "asc" } });
    expect(stored).toHaveLength(12_345);
    expect(stored[0]?.time.getTime()).toBe(start);
    expect(stored[7]?.coldInK).toBeNull();
    expect(stored[12_344]?.hotInK).toBeCloseTo(400 + 12_344e-3, 12);
    expect(stored[12_344]?.time.getTime()).toBe(start + 12_344 * 3_600_000);
  });

  it("leaves rows already stored for the same time unchanged and counts only new ones", async () => {
    const overlapping = rows(20, start + 12_340 * 3_600_000).map((row) => ({ ...row, hotOutK: 1 }));
    expect(await insertReadings(database.prisma, assetId, overlapping)).toBe(15);
    const kept = await database.prisma.reading.findUnique({ where: { assetId_time: { assetId, time: new Date(start + 12_340 * 3_600_000) } } });
    expect(kept?.hotOutK).toBe(350);
  });

  it("is summarised per asset by listAssets", async () => {
    const [row] = await listAssets(database.prisma);
    expect(row).toMatchObject({ tag: "E-TEST", siteTimeZone: "Europe/Berlin", readingCount: 12_360, firstReading: new Date(start).toISOString() });
  });
});
