// Shared helpers of the import tests: an asset to import into, CSV text as a stream, a checksum of readings.
import { Readable } from "node:stream";
import type { PrismaClient } from "../../../generated/prisma/client";

let siteCount = 0;

/** Creates a site (time zone as given), a process unit and one counterflow exchanger; returns its id and tag. */
export async function createTestAsset(prisma: PrismaClient, tag: string, timeZone = "Europe/Amsterdam"): Promise<{ id: number; tag: string }> {
  siteCount += 1;
  const site = await prisma.site.create({ data: { code: `TS-${tag}-${siteCount}`, name: "Test site", timeZone } });
  const unit = await prisma.processUnit.create({ data: { siteId: site.id, code: "U1", name: "Unit one" } });
  const asset = await prisma.asset.create({
    data: {
      tag, name: `Test exchanger ${tag}`, unitId: unit.id, service: "test", arrangementKind: "counterflow",
      areaM2: 100, hotStreamName: "oil", hotCpKind: "constant", hotCpIntercept: 2100, coldStreamName: "water",
      coldCpKind: "constant", coldCpIntercept: 4180, designDutyW: 1e6, designUWPerM2K: 400, designFoulingM2KPerW: 3.5e-4,
      refHotInletK: 400, refColdInletK: 300, refHotFlowKgPerS: 10, refColdFlowKgPerS: 8, dutyThresholdW: 8e5,
    },
  });
  return { id: asset.id, tag };
}

/** The text as a byte stream in chunks of `chunkBytes` (small chunks exercise records cut across chunks). */
export function textStream(text: string, chunkBytes = 16 * 1024): Readable {
  const bytes = Buffer.from(text, "utf8");
  const chunks: Buffer[] = [];
  for (let start = 0; start < bytes.length; start += chunkBytes) chunks.push(bytes.subarray(start, start + chunkBytes));
  return Readable.from(chunks, { objectMode: false });
}

export const CANONICAL_HEADER = "timestamp,hot_in_C,hot_out_C,cold_in_C,cold_out_C,hot_flow_kg_s,cold_flow_kg_s";

/** Canonical CSV of `count` rows a minute apart from `startMs`; values vary with the row and `shift` (°C, kg/s). */
export function canonicalCsv(count: number, startMs: number, shift = 0, lineEnd = "\n"): string {
  const lines = [CANONICAL_HEADER];
  for (let index = 0; index < count; index++) {
    const time = new Date(startMs + index * 60_000).toISOString();
    lines.push(`${time},${(150 + (index % 17) * 0.5 + shift).toFixed(2)},${(90 + (index % 5)).toFixed(1)},25,${(60 + shift).toFixed(1)},${(10 + (index % 3)).toFixed(3)},12.5`);
  }
  return lines.join(lineEnd) + lineEnd;
}

export interface ReadingsState {
  count: number;
  checksum: string;
}

/** Count and an order-independent checksum of every stored value of the asset's readings. */
export async function readingsState(prisma: PrismaClient, assetId: number): Promise<ReadingsState> {
  const rows = await prisma.$queryRawUnsafe<{ count: bigint; checksum: string | null }[]>(
    `select count(*) as count, sum(hashtext(concat_ws('|', "time", "hotInK", "hotOutK", "coldInK", "coldOutK", "hotFlowKgPerS",
       "coldFlowKgPerS", "hotPressureDropPa", "coldPressureDropPa", "importBatchId"))::bigint)::text as checksum
     from "Reading" where "assetId" = $1`,
    assetId,
  );
  const row = rows[0];
  return { count: Number(row?.count ?? 0), checksum: row?.checksum ?? "0" };
}
