// Each asset's condition at given month ends, assessed with the data up to each instant, stored for reuse.
import { Prisma, type PrismaClient } from "../../generated/prisma/client";
import { assessAsset } from "../core/assessment";
import { assessmentSummary, type AssessmentSummary } from "../planning/assessment-summary";
import { fleetStatus, type FleetStatus } from "../planning/fleet-status";
import { ASSESSMENT_PERIOD_COLUMNS, assessmentInput, assessmentPeriods } from "./assessment-input";

export interface MonthEndCondition {
  status: FleetStatus;
  summary: AssessmentSummary | null;
}

/** Snapshots by asset id, then by month-end instant (epoch ms). */
export type MonthEndConditions = Map<number, Map<number, MonthEndCondition>>;

/**
 * ensureMonthEndSnapshots: the condition of every asset of a site at each instant in `monthEnds` (the first instant
 * of the following month): the fouling assessment re-run with only the daily periods and cleanings up to that
 * instant (a cleaning counts once its exchanger is back in service), its summary, and the fleet category relative to
 * that instant. Stored in MonthEndSnapshot; a stored snapshot is reused unless the asset's current assessment or its
 * register entry changed after it was computed (new data, a cleaning record, an edit), then it is recomputed.
 *
 * Assessments take about 0.2 s each on a 2-core machine: the first report of a month for the 24-asset demo site costs
 * about 10 s, later views only read. Between assets the event loop is let go so other requests are served.
 */
export async function ensureMonthEndSnapshots(prisma: PrismaClient, options: { siteCode: string; monthEnds: readonly number[] }): Promise<MonthEndConditions> {
  const monthEnds = [...new Set(options.monthEnds)];
  const assets = await prisma.asset.findMany({
    where: { unit: { site: { code: options.siteCode } } },
    include: { unit: { include: { site: true } }, assessment: { select: { computedAt: true } }, cleanings: { orderBy: { date: "asc" } } },
    orderBy: { tag: "asc" },
  });
  const stored = await prisma.monthEndSnapshot.findMany({
    where: { assetId: { in: assets.map((asset) => asset.id) }, monthEnd: { in: monthEnds.map((ms) => new Date(ms)) } },
  });
  const result: MonthEndConditions = new Map();
  for (const asset of assets) {
    const conditions = new Map<number, MonthEndCondition>();
    result.set(asset.id, conditions);
    const validAfter = Math.max(asset.updatedAt.getTime(), asset.assessment?.computedAt.getTime() ?? 0);
    const missing: number[] = [];
    for (const monthEnd of monthEnds) {
      const snapshot = stored.find((row) => row.assetId === asset.id && row.monthEnd.getTime() === monthEnd);
      if (snapshot && snapshot.computedAt.getTime() >= validAfter) {
        conditions.set(monthEnd, { status: snapshot.status as FleetStatus, summary: snapshot.summary as AssessmentSummary | null });
      } else {
        missing.push(monthEnd);
      }
    }
    if (missing.length === 0) continue;
    const periods = assessmentPeriods(
      await prisma.operatingPeriod.findMany({ where: { assetId: asset.id, lengthS: 86400, start: { lt: new Date(Math.max(...missing)) } }, select: ASSESSMENT_PERIOD_COLUMNS, orderBy: { start: "asc" } }),
    );
    for (const monthEnd of missing) {
      const before = periods.filter((period) => period.startMs < monthEnd);
      let summary: AssessmentSummary | null = null;
      if (before.some((period) => period.usable)) {
        const cleanings = asset.cleanings.filter((cleaning) => (cleaning.endDate ?? cleaning.date).getTime() <= monthEnd);
        const assessment = assessAsset(assessmentInput(asset, before, cleanings, monthEnd));
        summary = assessmentSummary(asset, asset.unit.site, assessment);
      }
      const condition: MonthEndCondition = { status: fleetStatus(summary, monthEnd), summary };
      conditions.set(monthEnd, condition);
      const data = { status: condition.status, summary: summary ? (summary as unknown as Prisma.InputJsonValue) : Prisma.DbNull, computedAt: new Date() };
      await prisma.monthEndSnapshot.upsert({
        where: { assetId_monthEnd: { assetId: asset.id, monthEnd: new Date(monthEnd) } },
        create: { assetId: asset.id, monthEnd: new Date(monthEnd), ...data },
        update: data,
      });
      await new Promise((resolve) => setImmediate(resolve));
    }
  }
  return result;
}
