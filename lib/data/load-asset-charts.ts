// Reads what the asset charts need (stored assessment, daily periods with reconciled values, alerts, cleanings) and
// builds their series in SI (lib/present/asset-charts).
import type { PrismaClient } from "../../generated/prisma/client";
import type { Assessment } from "../core/assessment";
import { assetChartsSI, type AssetChartsSI, type ChartAlert, type ChartPeriod } from "../present/asset-charts";
import { assetReferenceRating } from "./exchanger-model";
import { getAsset, type AssetDetail } from "./get-asset";

const DAY_S = 86_400;

/** The daily periods of an asset with their reconciled values; days without a reconciliation count as not usable. */
async function listChartPeriods(prisma: PrismaClient, assetId: number): Promise<ChartPeriod[]> {
  const rows = await prisma.operatingPeriod.findMany({ where: { assetId, lengthS: DAY_S }, orderBy: { start: "asc" } });
  return rows.map((row) => {
    const reconciled = row.recHotInK !== null && row.recHotOutK !== null && row.recColdInK !== null && row.recColdOutK !== null && row.recHotFlowKgPerS !== null && row.recColdFlowKgPerS !== null && row.recDutyW !== null;
    return {
      startMs: row.start.getTime(),
      hotInK: row.recHotInK ?? Number.NaN,
      hotOutK: row.recHotOutK ?? Number.NaN,
      coldInK: row.recColdInK ?? Number.NaN,
      coldOutK: row.recColdOutK ?? Number.NaN,
      hotFlowKgPerS: row.recHotFlowKgPerS ?? Number.NaN,
      coldFlowKgPerS: row.recColdFlowKgPerS ?? Number.NaN,
      dutyW: row.recDutyW ?? Number.NaN,
      usable: row.usable && reconciled,
      closure: row.closure,
      reason: row.reason,
    };
  });
}

/** Alerts as chart spans: an alert still present runs to `endMs`. */
export function chartAlerts(alerts: readonly { id: number; instrumentTag: string; kind: string; start: string; end: string | null }[], endMs: number): ChartAlert[] {
  return alerts.map((alert) => ({ id: alert.id, label: `${alert.instrumentTag} ${alert.kind}`, startMs: Date.parse(alert.start), endMs: alert.end ? Date.parse(alert.end) : endMs }));
}

/** buildAssetCharts: the chart series of an already-loaded asset and its assessment (reads the daily periods). */
export async function buildAssetCharts(
  prisma: PrismaClient,
  asset: AssetDetail,
  assessment: Assessment,
  alerts: readonly { id: number; instrumentTag: string; kind: string; start: string; end: string | null }[],
): Promise<AssetChartsSI> {
  const periods = await listChartPeriods(prisma, asset.id);
  const last = periods[periods.length - 1];
  const endMs = last ? last.startMs + DAY_S * 1000 : assessment.asOfMs;
  return assetChartsSI({
    assessment,
    periods,
    alerts: chartAlerts(alerts, endMs),
    cleaningsMs: asset.cleanings.map((cleaning) => (cleaning.endDate ?? cleaning.date).getTime()),
    rating: assetReferenceRating(asset),
    designUWPerM2K: asset.designUWPerM2K,
    designFoulingM2KPerW: asset.designFoulingM2KPerW,
    dutyThresholdW: asset.dutyThresholdW,
  });
}

/** loadAssetCharts: by tag; null for an unknown tag, { charts: null } for an asset not assessed yet. */
export async function loadAssetCharts(prisma: PrismaClient, tag: string): Promise<{ asset: AssetDetail; charts: AssetChartsSI | null } | null> {
  const asset = await getAsset(prisma, tag);
  if (!asset) return null;
  const stored = await prisma.assetAssessment.findUnique({ where: { assetId: asset.id }, select: { result: true } });
  if (!stored) return { asset, charts: null };
  const alerts = await prisma.instrumentAlert.findMany({ where: { assetId: asset.id }, orderBy: { start: "asc" } });
  const charts = await buildAssetCharts(
    prisma,
    asset,
    stored.result as unknown as Assessment,
    alerts.map((alert) => ({ id: alert.id, instrumentTag: alert.instrumentTag, kind: alert.kind, start: alert.start.toISOString(), end: alert.end?.toISOString() ?? null })),
  );
  return { asset, charts };
}
