// Runs the fouling assessment (clean-U model, fouling trend, forecasts) of an
// asset from its stored screened periods and cleaning records, and stores it.
import type { Prisma, PrismaClient } from "../../generated/prisma/client";
import { assessAsset, type Assessment, type AssessmentPeriod } from "../core/assessment";
import { arrangementFromColumns } from "./asset-columns";
import { assetHeatCapacities } from "./exchanger-model";
import { assessmentSummary } from "../planning/assessment-summary";

/** Assesses one asset as of its last screened period and stores the result; null when it has no usable data. */
export async function refreshAssessment(prisma: PrismaClient, tag: string, options: { asOfMs?: number } = {}): Promise<Assessment | null> {
  const asset = await prisma.asset.findUnique({ where: { tag }, include: { cleanings: { orderBy: { date: "asc" } }, unit: { include: { site: true } } } });
  if (!asset) throw new Error(`unknown asset ${tag}`);
  const stored = await prisma.operatingPeriod.findMany({ where: { assetId: asset.id, lengthS: 86400 }, orderBy: { start: "asc" } });
  const periods: AssessmentPeriod[] = [];
  for (const period of stored) {
    if (period.recHotInK === null || period.recHotOutK === null || period.recColdInK === null || period.recColdOutK === null || period.recHotFlowKgPerS === null || period.recColdFlowKgPerS === null || period.recDutyW === null) continue;
    periods.push({
      startMs: period.start.getTime(),
      hotInK: period.recHotInK,
      hotOutK: period.recHotOutK,
      coldInK: period.recColdInK,
      coldOutK: period.recColdOutK,
      hotFlowKgPerS: period.recHotFlowKgPerS,
      coldFlowKgPerS: period.recColdFlowKgPerS,
      dutyW: period.recDutyW,
      usable: period.usable,
    });
  }
  if (!periods.some((period) => period.usable)) {
    await prisma.assetAssessment.deleteMany({ where: { assetId: asset.id } });
    return null;
  }
  const last = stored[stored.length - 1];
  const asOfMs = options.asOfMs ?? (last ? last.start.getTime() + last.lengthS * 1000 : Date.now());
  const capacities = assetHeatCapacities(asset);
  const assessment = assessAsset({
    asset: {
      arrangement: arrangementFromColumns(asset),
      areaM2: asset.areaM2,
      hotHeatCapacity: capacities.hot,
      coldHeatCapacity: capacities.cold,
      designUWPerM2K: asset.designUWPerM2K,
      designFoulingM2KPerW: asset.designFoulingM2KPerW,
      reference: { hotInletK: asset.refHotInletK, coldInletK: asset.refColdInletK, hotFlowKgPerS: asset.refHotFlowKgPerS, coldFlowKgPerS: asset.refColdFlowKgPerS },
      dutyThresholdW: asset.dutyThresholdW,
      ...(asset.minimumOutletK !== null && (asset.minimumOutletStream === "hot" || asset.minimumOutletStream === "cold")
        ? { minimumOutlet: { stream: asset.minimumOutletStream, temperatureK: asset.minimumOutletK } }
        : {}),
    },
    periods,
    cleanings: asset.cleanings.map((cleaning) => ({
      timeMs: (cleaning.endDate ?? cleaning.date).getTime(),
      method: cleaning.method,
      ...(cleaning.costCents === null ? {} : { costCents: cleaning.costCents }),
    })),
    asOfMs,
  });
  const summary = assessmentSummary(asset, asset.unit.site, assessment) as unknown as Prisma.InputJsonValue;
  await prisma.$transaction(async (tx) => {
    await tx.assetAssessment.upsert({
      where: { assetId: asset.id },
      create: { assetId: asset.id, asOf: new Date(asOfMs), result: assessment as unknown as Prisma.InputJsonValue, summary },
      update: { asOf: new Date(asOfMs), computedAt: new Date(), result: assessment as unknown as Prisma.InputJsonValue, summary },
    });
    // Each cycle that ended with a cleaning carries that cleaning's effectiveness; cycles and cleanings are in time order.
    const ended = assessment.cycles.filter((cycle) => cycle.end !== null);
    for (const [index, cleaning] of asset.cleanings.entries()) {
      const cycle = ended.find((candidate) => Math.abs(Date.parse(candidate.end ?? "") - (cleaning.endDate ?? cleaning.date).getTime()) < 86_400_000 * 2) ?? ended[index];
      const effectiveness = cycle?.effectivenessOfCleaningThatEndedIt ?? null;
      await tx.cleaning.update({
        where: { id: cleaning.id },
        data: {
          effectiveness: effectiveness?.value ?? null,
          foulingBeforeM2KPerW: effectiveness?.beforeM2KPerW ?? null,
          foulingAfterM2KPerW: effectiveness?.afterM2KPerW ?? null,
        },
      });
    }
  });
  return assessment;
}

/** The stored assessment of an asset, or null. */
export async function getStoredAssessment(prisma: PrismaClient, tag: string): Promise<{ computedAt: string; assessment: Assessment } | null> {
  const row = await prisma.assetAssessment.findFirst({ where: { asset: { tag } } });
  return row ? { computedAt: row.computedAt.toISOString(), assessment: row.result as unknown as Assessment } : null;
}
