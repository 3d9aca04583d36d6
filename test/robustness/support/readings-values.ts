// The stored values of an asset's readings, without the import batch that wrote them: equal for two assets that
// hold the same times and values, whichever import wrote them.
import type { PrismaClient } from "../../../generated/prisma/client";

export interface ValuesState {
  count: number;
  checksum: string;
}

/** Count and an order-independent checksum of time and every value (importBatchId left out). */
export async function valuesState(prisma: PrismaClient, assetId: number): Promise<ValuesState> {
  const rows = await prisma.$queryRawUnsafe<{ count: bigint; checksum: string | null }[]>(
    `select count(*) as count, sum(hashtext(concat_ws('|', "time", "hotInK", "hotOutK", "coldInK", "coldOutK", "hotFlowKgPerS",
       "coldFlowKgPerS", "hotPressureDropPa", "coldPressureDropPa"))::bigint)::text as checksum
     from "Reading" where "assetId" = $1`,
    assetId,
  );
  return { count: Number(rows[0]?.count ?? 0), checksum: rows[0]?.checksum ?? "0" };
}

/** A seeded pseudo-random generator (mulberry32, Tommy Ettinger's public-domain generator): the same kill points every run. */
export function seededRandom(seed: number): () => number {
  let state = seed >>> 0;
  return () => {
    state = (state + 0x6d2b79f5) >>> 0;
    let mixed = state;
    mixed = Math.imul(mixed ^ (mixed >>> 15), mixed | 1);
    mixed ^= mixed + Math.imul(mixed ^ (mixed >>> 7), mixed | 61);
    return ((mixed ^ (mixed >>> 14)) >>> 0) / 4294967296;
  };
}
