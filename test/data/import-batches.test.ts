import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { getImportBatch } from "../../lib/data/get-import-batch";
import { getImportContext } from "../../lib/data/get-import-context";
import { importReadings } from "../../lib/data/import-readings";
import { listImportBatches } from "../../lib/data/list-import-batches";
import { createTestDatabase, type TestDatabase } from "../support/test-database";
import { CANONICAL_HEADER, canonicalCsv, createTestAsset, textStream } from "../import/support/fixtures";

let database: TestDatabase;

beforeAll(async () => {
  database = await createTestDatabase();
});

afterAll(async () => {
  await database.drop();
});

const START = Date.UTC(2026, 2, 1);

describe("listImportBatches and getImportBatch", () => {
  it("list an asset's imports newest first, completed and failed, and give one with its rejects", async () => {
    const asset = await createTestAsset(database.prisma, "E-LIST");
    const done = await importReadings(database.prisma, {
      assetTag: asset.tag, source: "web", createdBy: "anonymous", fileName: "one.csv", stream: textStream(`${canonicalCsv(5, START)}2026-03-01T00:04Z,x,1,1,1,1,1\n`),
    });
    await importReadings(database.prisma, { assetTag: asset.tag, source: "cli", createdBy: "me", fileName: "empty.csv", stream: textStream(`${CANONICAL_HEADER}\n`) }).catch(() => undefined);
    const batches = await listImportBatches(database.prisma, asset.tag);
    expect(batches?.map((batch) => [batch.fileName, batch.status])).toEqual([["empty.csv", "failed"], ["one.csv", "completed"]]);
    expect(batches?.[0]?.error).toBe("the file has no data rows (only a header)");
    expect(await listImportBatches(database.prisma, "E-NONE")).toBeNull();
    const detail = await getImportBatch(database.prisma, done.batchId);
    expect(detail).toMatchObject({ id: done.batchId, assetTag: "E-LIST", status: "completed", rowsRead: 6, rowsNew: 5, rowsRejected: 1, source: "web" });
    expect(detail?.rejects).toEqual([{ line: 7, reason: 'duplicate timestamp 2026-03-01T00:04Z, first at line 6; hot_in_C: "x" is not a number' }]);
    expect(await getImportBatch(database.prisma, 987_654)).toBeNull();
    expect(await getImportBatch(database.prisma, -1)).toBeNull();
  });
});

describe("getImportContext", () => {
  it("gives the site's time zone and the saved mapping, or null for an unknown tag", async () => {
    const asset = await createTestAsset(database.prisma, "E-CONTEXT", "America/Chicago");
    expect(await getImportContext(database.prisma, asset.tag)).toMatchObject({ tag: "E-CONTEXT", siteTimeZone: "America/Chicago", savedMapping: null });
    await database.prisma.columnMapping.create({ data: { assetId: asset.id, mapping: { timestamp: { column: "t" }, columns: { hotIn: { column: "a", unit: "C" } } } } });
    // an invalid saved mapping (missing roles) is offered as none
    expect((await getImportContext(database.prisma, asset.tag))?.savedMapping).toBeNull();
    expect(await getImportContext(database.prisma, "E-NONE")).toBeNull();
  });
});
