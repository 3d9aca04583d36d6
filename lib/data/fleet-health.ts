// One row per exchanger for the fleet health table, the API and the monthly summary.
import type { Prisma, PrismaClient } from "../../generated/prisma/client";
import type { Assessment } from "../core/assessment";
import { WEEK_MS } from "../core/plan";
import { assessmentSummary, type AssessmentSummary } from "../planning/assessment-summary";
import { fleetStatus, type FleetStatus } from "../planning/fleet-status";
import { isoDate } from "../planning/planning-calendar";

export interface FleetHealthRow {
  tag: string;
  name: string;
  siteCode: string;
  siteName: string;
  siteTimeZone: string;
  unitCode: string;
  unitName: string;
  service: string;
  status: FleetStatus;
  summary: AssessmentSummary | null;
  openAlerts: number;
  lastCleaning: string | null;
  /** First cleaning of the asset in the site's latest plan (YYYY-MM-DD) and whether a planner booked it. */
  nextCleaning: { start: string; booked: boolean } | null;
}

/**
 * fleetHealth: every exchanger (of one site, or all) with its category, stored assessment summary, open instrument
 * alerts, last recorded and next planned cleaning. Reads the summaries only (not the full assessments); a missing
 * summary (an assessment stored before summaries existed) is computed once and stored.
 */
export async function fleetHealth(prisma: PrismaClient, options: { siteCode?: string; nowMs?: number } = {}): Promise<FleetHealthRow[]> {
  const nowMs = options.nowMs ?? Date.now();
  const where: Prisma.AssetWhereInput = options.siteCode ? { unit: { site: { code: options.siteCode } } } : {};
  const assets = await prisma.asset.findMany({
    where,
    include: { unit: { include: { site: true } }, assessment: { select: { summary: true } } },
    orderBy: [{ unit: { code: "asc" } }, { tag: "asc" }],
  });
  const ids = assets.map((asset) => asset.id);
  const [alerts, cleanings, bookings, plans] = await Promise.all([
    prisma.instrumentAlert.groupBy({ by: ["assetId"], where: { assetId: { in: ids }, acknowledgedAt: null }, _count: { _all: true } }),
    prisma.cleaning.groupBy({ by: ["assetId"], where: { assetId: { in: ids } }, _max: { date: true } }),
    prisma.cleaningBooking.findMany({ where: { assetId: { in: ids }, weekStart: { gte: new Date(nowMs - WEEK_MS) } }, orderBy: { weekStart: "asc" } }),
    prisma.planRun
      .groupBy({ by: ["siteId"], where: { kind: "plan", ...(options.siteCode ? { site: { code: options.siteCode } } : {}) }, _max: { id: true } })
      .then((latest) => prisma.planRun.findMany({ where: { id: { in: latest.map((row) => row._max.id ?? -1) } }, select: { siteId: true, result: true } })),
  ]);
  const alertsByAsset = new Map(alerts.map((row) => [row.assetId, row._count._all]));
  const lastCleaning = new Map(cleanings.map((row) => [row.assetId, row._max.date]));
  const nextPlanned = new Map<number, string>();
  for (const plan of plans) {
    const cleaningsOfPlan = (plan.result as unknown as { cleanings: { assetId: string; startMs: number }[] }).cleanings;
    for (const cleaning of cleaningsOfPlan) {
      const id = Number(cleaning.assetId);
      if (!nextPlanned.has(id) && cleaning.startMs >= nowMs - WEEK_MS) nextPlanned.set(id, isoDate(cleaning.startMs));
    }
  }
  const nextBooked = new Map<number, string>();
  for (const booking of bookings) if (!nextBooked.has(booking.assetId)) nextBooked.set(booking.assetId, isoDate(booking.weekStart.getTime()));

  const rows: FleetHealthRow[] = [];
  for (const asset of assets) {
    let summary = (asset.assessment?.summary ?? null) as AssessmentSummary | null;
    if (asset.assessment && !summary) {
      const stored = await prisma.assetAssessment.findUnique({ where: { assetId: asset.id }, select: { result: true } });
      if (stored) {
        summary = assessmentSummary(asset, asset.unit.site, stored.result as unknown as Assessment);
        await prisma.assetAssessment.update({ where: { assetId: asset.id }, data: { summary: summary as unknown as Prisma.InputJsonValue } });
      }
    }
    const booked = nextBooked.get(asset.id);
    const planned = nextPlanned.get(asset.id);
    const next = booked && (!planned || booked <= planned) ? { start: booked, booked: true } : planned ? { start: planned, booked: false } : null;
    rows.push({
      tag: asset.tag,
      name: asset.name,
      siteCode: asset.unit.site.code,
      siteName: asset.unit.site.name,
      siteTimeZone: asset.unit.site.timeZone,
      unitCode: asset.unit.code,
      unitName: asset.unit.name,
      service: asset.service,
      status: fleetStatus(summary, nowMs),
      summary,
      openAlerts: alertsByAsset.get(asset.id) ?? 0,
      lastCleaning: lastCleaning.get(asset.id)?.toISOString() ?? null,
      nextCleaning: next,
    });
  }
  return rows;
}
