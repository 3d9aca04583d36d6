import type { PrismaClient } from "../../generated/prisma/client";
import type { ReadingColumns } from "../core/screening/types";

/**
 * An asset's readings as time-sorted columns (NaN where missing), read with one
 * query and without building a row object per reading.
 */
export async function loadReadingColumns(prisma: PrismaClient, assetId: number, range: { fromMs?: number; toMs?: number } = {}): Promise<ReadingColumns> {
  const fromS = range.fromMs === undefined ? null : range.fromMs / 1000;
  const toS = range.toMs === undefined ? null : range.toMs / 1000;
  const rows = await prisma.$queryRaw<
    { t: number[]; a: (number | null)[]; b: (number | null)[]; c: (number | null)[]; d: (number | null)[]; e: (number | null)[]; f: (number | null)[] }[]
  >`
    select coalesce(array_agg(extract(epoch from "time") * 1000 order by "time"), '{}') as t,
           coalesce(array_agg("hotInK" order by "time"), '{}') as a, coalesce(array_agg("hotOutK" order by "time"), '{}') as b,
           coalesce(array_agg("coldInK" order by "time"), '{}') as c, coalesce(array_agg("coldOutK" order by "time"), '{}') as d,
           coalesce(array_agg("hotFlowKgPerS" order by "time"), '{}') as e, coalesce(array_agg("coldFlowKgPerS" order by "time"), '{}') as f
    from "Reading"
    where "assetId" = ${assetId}
      and (${fromS}::float8 is null or "time" >= to_timestamp(${fromS}::float8))
      and (${toS}::float8 is null or "time" < to_timestamp(${toS}::float8))`;
  const row = rows[0];
  const column = (values: (number | string | null)[] | undefined) => Float64Array.from(values ?? [], (value) => (value === null ? Number.NaN : Number(value)));
  return {
    timeMs: Float64Array.from(row?.t ?? [], (value) => Math.round(Number(value))),
    hotInK: column(row?.a),
    hotOutK: column(row?.b),
    coldInK: column(row?.c),
    coldOutK: column(row?.d),
    hotFlowKgPerS: column(row?.e),
    coldFlowKgPerS: column(row?.f),
  };
}
