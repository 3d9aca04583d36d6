// Screens an asset's stored readings (steady state, outliers, plausibility),
// reconciles each period, detects instrument faults, and stores the periods
// and alerts. Run after every import and when the register entry changes.
import type { Prisma, PrismaClient } from "../../generated/prisma/client";
import { assessDataQuality, type DataQualityAssessment } from "../core/data-quality";
import type { InstrumentAlert as DetectedAlert } from "../core/faults/types";
import { exchangerModel } from "./exchanger-model";
import { loadReadingColumns } from "./load-reading-columns";

export interface DataQualityRefresh {
  tag: string;
  periods: number;
  usablePeriods: number;
  alerts: { new: number; updated: number };
  sampleCounts: DataQualityAssessment["sampleCounts"];
}

const DAY_MS = 86_400_000;
/** A re-detected alert whose start moved by less than this is the same alert (its onset estimate shifts with new data). */
const SAME_ALERT_WINDOW_MS = 14 * DAY_MS;
const PERIOD_BATCH = 2_000;

/** The stored alert a detection continues: same role and kind, overlapping or starting within two weeks. */
function matchStored<T extends { id: number; role: string; kind: string; start: Date; end: Date | null }>(stored: T[], alert: DetectedAlert): T | undefined {
  return stored.find((candidate) => {
    if (candidate.role !== alert.role || candidate.kind !== alert.kind) return false;
    const candidateEnd = candidate.end?.getTime() ?? Number.POSITIVE_INFINITY;
    const alertEnd = alert.endMs ?? Number.POSITIVE_INFINITY;
    const overlaps = candidate.start.getTime() <= alertEnd && alert.startMs <= candidateEnd;
    return overlaps || Math.abs(candidate.start.getTime() - alert.startMs) < SAME_ALERT_WINDOW_MS;
  });
}

export async function refreshDataQuality(prisma: PrismaClient, tag: string, options: { periodS?: 3600 | 86400 } = {}): Promise<DataQualityRefresh> {
  const asset = await prisma.asset.findUnique({ where: { tag }, include: { instruments: true } });
  if (!asset) throw new Error(`unknown asset ${tag}`);
  const columns = await loadReadingColumns(prisma, asset.id);
  const periodS = options.periodS ?? 86400;
  const result = assessDataQuality(columns, exchangerModel(asset), { periodS });
  let created = 0;
  let updated = 0;
  await prisma.$transaction(
    async (tx) => {
      await tx.operatingPeriod.deleteMany({ where: { assetId: asset.id, lengthS: periodS } });
      for (let start = 0; start < result.periods.length; start += PERIOD_BATCH) {
        const batch: Prisma.OperatingPeriodCreateManyInput[] = result.periods.slice(start, start + PERIOD_BATCH).map((period) => ({
          assetId: asset.id,
          start: new Date(period.startMs),
          lengthS: period.lengthS,
          samplesTotal: period.samplesTotal,
          samplesUsed: period.samplesUsed,
          excluded: period.excluded,
          usable: period.usable,
          reason: period.reason,
          hotInK: period.means.hotInK,
          hotOutK: period.means.hotOutK,
          coldInK: period.means.coldInK,
          coldOutK: period.means.coldOutK,
          hotFlowKgPerS: period.means.hotFlowKgPerS,
          coldFlowKgPerS: period.means.coldFlowKgPerS,
          hotDutyW: period.hotDutyW,
          coldDutyW: period.coldDutyW,
          closure: period.closure,
          recHotInK: period.reconciled?.hotInK ?? null,
          recHotOutK: period.reconciled?.hotOutK ?? null,
          recColdInK: period.reconciled?.coldInK ?? null,
          recColdOutK: period.reconciled?.coldOutK ?? null,
          recHotFlowKgPerS: period.reconciled?.hotFlowKgPerS ?? null,
          recColdFlowKgPerS: period.reconciled?.coldFlowKgPerS ?? null,
          recDutyW: period.reconciled?.dutyW ?? null,
          globalTest: period.globalTest,
          globalTestCritical: period.globalTestCritical,
          suspectRole: period.suspectRole,
        }));
        await tx.operatingPeriod.createMany({ data: batch });
      }
      const stored = await tx.instrumentAlert.findMany({ where: { assetId: asset.id } });
      for (const alert of result.alerts) {
        const values = {
          instrumentTag: alert.instrumentTag,
          start: new Date(alert.startMs),
          end: alert.endMs === null ? null : new Date(alert.endMs),
          size: alert.size,
          sizeUnit: alert.sizeUnit,
          evidence: alert.evidence,
        };
        const existing = matchStored(stored, alert);
        if (existing) {
          await tx.instrumentAlert.update({ where: { id: existing.id }, data: values });
          updated += 1;
        } else {
          const createdAlert = await tx.instrumentAlert.create({ data: { assetId: asset.id, role: alert.role, kind: alert.kind, ...values } });
          stored.push(createdAlert);
          created += 1;
        }
      }
    },
    { timeout: 120_000 },
  );
  return {
    tag,
    periods: result.periods.length,
    usablePeriods: result.periods.filter((period) => period.usable).length,
    alerts: { new: created, updated },
    sampleCounts: result.sampleCounts,
  };
}
