// Runs the fouling assessment (clean-U model, fouling trend, forecasts) of an
// asset from its stored screened periods and cleaning records, and stores it.
import type { Prisma, PrismaClient } from "../../generated/prisma/client";
import { assessAsset, type Assessment } from "../core/assessment";
import { assessmentInput, assessmentPeriods } from "./assessment-input";
import { assessmentSummary } from "../planning/assessment-summary";

/** Assesses one asset as of its last screened period and stores the result; null when it has no usable data. */
export async function refreshAssessment(prisma: PrismaClient, tag: string, options: { asOfMs?: number } = {}): Promise<Assessment | null> {
  const asset = await prisma.asset.findUnique({ where: { tag }, include: { cleanings: { orderBy: { date: "asc" } }, unit: { include: { site: true } } } });
  if (!asset) throw new Error(`unknown asset ${tag}`);
  const stored = await prisma.operatingPeriod.findMany({ where: { assetId: asset.id, lengthS: 86400 }, orderBy: { start: "asc" } });
  const periods = assessmentPeriods(stored);
  if (!periods.some((period) => period.usable)) {
    await prisma.assetAssessment.deleteMany({ where: { assetId: asset.id } });
    return null;
  }
  const last = stored[stored.length - 1];
  const asOfMs = options.asOfMs ?? (last ? last.start.getTime() + last.lengthS * 1000 : Date.now());
  const assessment = assessAsset(assessmentInput(asset, periods, asset.cleanings, asOfMs));
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
