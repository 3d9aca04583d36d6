import type { PrismaClient } from "../../generated/prisma/client";

export interface DailyReading {
  day: string; // ISO date (UTC day)
  samples: number;
  hotInK: number | null;
  hotOutK: number | null;
  coldInK: number | null;
  coldOutK: number | null;
  hotFlowKgPerS: number | null;
  coldFlowKgPerS: number | null;
}

/** Daily means of the raw readings of one asset (unscreened; for overview charts only). */
export async function dailyReadings(prisma: PrismaClient, assetId: number): Promise<DailyReading[]> {
  const rows = await prisma.$queryRaw<
    { day: string; samples: bigint; hot_in: number | null; hot_out: number | null; cold_in: number | null; cold_out: number | null; hot_flow: number | null; cold_flow: number | null }[]
  >`
    select to_char("time" at time zone 'UTC', 'YYYY-MM-DD') as day, count(*) as samples,
           avg("hotInK") as hot_in, avg("hotOutK") as hot_out, avg("coldInK") as cold_in, avg("coldOutK") as cold_out,
           avg("hotFlowKgPerS") as hot_flow, avg("coldFlowKgPerS") as cold_flow
    from "Reading" where "assetId" = ${assetId}
    group by 1 order by 1`;
  return rows.map((row) => ({
    day: row.day,
    samples: Number(row.samples),
    hotInK: row.hot_in,
    hotOutK: row.hot_out,
    coldInK: row.cold_in,
    coldOutK: row.cold_out,
    hotFlowKgPerS: row.hot_flow,
    coldFlowKgPerS: row.cold_flow,
  }));
}
