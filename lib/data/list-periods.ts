import type { PrismaClient } from "../../generated/prisma/client";

export interface PeriodRow {
  start: string;
  usable: boolean;
  reason: string | null;
  samplesTotal: number;
  samplesUsed: number;
  excluded: Record<string, number>;
  closure: number | null;
  hotDutyW: number | null;
  coldDutyW: number | null;
  reconciledDutyW: number | null;
  globalTest: number | null;
  globalTestCritical: number | null;
  suspectRole: string | null;
}

/** Screened periods of one asset (daily by default), oldest first. */
export async function listPeriods(prisma: PrismaClient, assetId: number, lengthS = 86400): Promise<PeriodRow[]> {
  const periods = await prisma.operatingPeriod.findMany({ where: { assetId, lengthS }, orderBy: { start: "asc" } });
  return periods.map((period) => ({
    start: period.start.toISOString(),
    usable: period.usable,
    reason: period.reason,
    samplesTotal: period.samplesTotal,
    samplesUsed: period.samplesUsed,
    excluded: period.excluded as Record<string, number>,
    closure: period.closure,
    hotDutyW: period.hotDutyW,
    coldDutyW: period.coldDutyW,
    reconciledDutyW: period.recDutyW,
    globalTest: period.globalTest,
    globalTestCritical: period.globalTestCritical,
    suspectRole: period.suspectRole,
  }));
}
