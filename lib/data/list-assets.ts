import type { PrismaClient } from "../../generated/prisma/client";

export interface AssetListRow {
  tag: string;
  name: string;
  siteCode: string;
  siteName: string;
  siteTimeZone: string;
  unitCode: string;
  unitName: string;
  service: string;
  arrangementKind: string;
  shells: number;
  tubePasses: number;
  areaM2: number;
  designDutyW: number;
  designUWPerM2K: number;
  readingCount: number;
  firstReading: string | null;
  lastReading: string | null;
  lastCleaning: string | null;
  openAlerts: number;
}

/** Every asset with its place in the site hierarchy and a summary of its data. */
export async function listAssets(prisma: PrismaClient): Promise<AssetListRow[]> {
  const assets = await prisma.asset.findMany({
    include: { unit: { include: { site: true } } },
    orderBy: [{ unit: { code: "asc" } }, { tag: "asc" }],
  });
  const readingStats = await prisma.reading.groupBy({
    by: ["assetId"],
    _count: { _all: true },
    _min: { time: true },
    _max: { time: true },
  });
  const cleaningStats = await prisma.cleaning.groupBy({ by: ["assetId"], _max: { date: true } });
  const alertStats = await prisma.instrumentAlert.groupBy({ by: ["assetId"], where: { acknowledgedAt: null }, _count: { _all: true } });
  const alertsByAsset = new Map(alertStats.map((row) => [row.assetId, row._count._all]));
  const readingsByAsset = new Map(readingStats.map((row) => [row.assetId, row]));
  const cleaningByAsset = new Map(cleaningStats.map((row) => [row.assetId, row._max.date]));
  return assets.map((asset) => {
    const stats = readingsByAsset.get(asset.id);
    return {
      tag: asset.tag,
      name: asset.name,
      siteCode: asset.unit.site.code,
      siteName: asset.unit.site.name,
      siteTimeZone: asset.unit.site.timeZone,
      unitCode: asset.unit.code,
      unitName: asset.unit.name,
      service: asset.service,
      arrangementKind: asset.arrangementKind,
      shells: asset.shells,
      tubePasses: asset.tubePasses,
      areaM2: asset.areaM2,
      designDutyW: asset.designDutyW,
      designUWPerM2K: asset.designUWPerM2K,
      readingCount: stats?._count._all ?? 0,
      firstReading: stats?._min.time?.toISOString() ?? null,
      lastReading: stats?._max.time?.toISOString() ?? null,
      lastCleaning: cleaningByAsset.get(asset.id)?.toISOString() ?? null,
      openAlerts: alertsByAsset.get(asset.id) ?? 0,
    };
  });
}
