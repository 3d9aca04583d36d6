// Reads what the monthly condition summary needs and builds it (lib/report/monthly-report).
import type { PrismaClient, Site } from "../../generated/prisma/client";
import { cleaningEventCost, EconomicsInputError } from "../core/economics";
import type { AssessmentSummary } from "../planning/assessment-summary";
import { assetEconomics } from "../planning/asset-economics";
import { planDocument } from "../planning/plan-document";
import { latestPlanRun } from "../planning/run-plan";
import { monthlyReport, type MonthlyReport, type MonthlyReportInput } from "../report/monthly-report";
import { isMonthKey, monthsWithData, previousMonth, reportMonth, type ReportMonth } from "../report/report-month";
import { ensureMonthEndSnapshots } from "./ensure-month-end-snapshots";

/** A report request that cannot be answered: 400 for a malformed one, 404 when the site or its data do not exist. */
export class ReportError extends Error {
  constructor(
    message: string,
    readonly status: 400 | 404,
  ) {
    super(message);
    this.name = "ReportError";
  }
}

export interface ReportMonthEntry {
  month: ReportMonth;
  complete: boolean;
}

/** The first and last instants of a site's daily operating data, or null without any. */
async function dataSpan(prisma: PrismaClient, siteId: number): Promise<{ firstMs: number; endMs: number } | null> {
  const span = await prisma.operatingPeriod.aggregate({ where: { lengthS: 86400, asset: { unit: { siteId } } }, _min: { start: true }, _max: { start: true } });
  if (!span._min.start || !span._max.start) return null;
  return { firstMs: span._min.start.getTime(), endMs: span._max.start.getTime() + 86_400_000 };
}

/** The named site, or the only one when none is named. */
async function resolveSite(prisma: PrismaClient, code: string | null | undefined): Promise<Site> {
  if (code) {
    const site = await prisma.site.findUnique({ where: { code } });
    if (!site) throw new ReportError(`unknown site "${code}"`, 404);
    return site;
  }
  const sites = await prisma.site.findMany({ take: 2, orderBy: { code: "asc" } });
  if (sites.length === 1) return sites[0] as Site;
  throw new ReportError(sites.length === 0 ? "no site in the database yet" : "several sites: name one with site=<code>", sites.length === 0 ? 404 : 400);
}

/** Every site with the months its data touch, newest first (for the report index). */
export async function listReportMonths(prisma: PrismaClient): Promise<{ site: Site; months: ReportMonthEntry[] }[]> {
  const sites = await prisma.site.findMany({ orderBy: { code: "asc" } });
  const result: { site: Site; months: ReportMonthEntry[] }[] = [];
  for (const site of sites) {
    const span = await dataSpan(prisma, site.id);
    result.push({ site, months: span ? monthsWithData(span.firstMs, span.endMs, site.timeZone) : [] });
  }
  return result;
}

/**
 * resolveReportRequest: the site (named, or the only one) and the month (YYYY-MM; default the last month its data
 * cover completely, or the latest month with data). Reads only.
 *
 * @throws ReportError 400 for a malformed month or an unnamed site among several; 404 for an unknown site, a site
 *   without operating data, or a month outside its data
 */
export async function resolveReportRequest(prisma: PrismaClient, request: { site?: string | null; month?: string | null }): Promise<{ site: Site; month: ReportMonth; months: ReportMonthEntry[] }> {
  const site = await resolveSite(prisma, request.site?.trim() || null);
  if (request.month && !isMonthKey(request.month)) throw new ReportError(`month must be YYYY-MM, got "${request.month}"`, 400);
  const span = await dataSpan(prisma, site.id);
  if (!span) throw new ReportError(`site ${site.code} has no operating data yet`, 404);
  const months = monthsWithData(span.firstMs, span.endMs, site.timeZone);
  if (request.month) {
    const entry = months.find((candidate) => candidate.month.key === request.month);
    if (!entry) throw new ReportError(`site ${site.code} has no data in ${request.month} (data from ${months.at(-1)?.month.key} to ${months[0]?.month.key})`, 404);
    return { site, month: entry.month, months };
  }
  const chosen = months.find((entry) => entry.complete) ?? months[0];
  if (!chosen) throw new ReportError(`site ${site.code} has no operating data yet`, 404);
  return { site, month: chosen.month, months };
}

/**
 * loadMonthlyReport: the monthly condition summary of a site: month-end snapshots of the month and the month before
 * (computed on first use, see ensureMonthEndSnapshots), cleaning records, instrument alerts and the latest plan.
 */
export async function loadMonthlyReport(prisma: PrismaClient, options: { site: Site; month: ReportMonth; nowMs?: number }): Promise<MonthlyReport> {
  const { site, month } = options;
  const previous = previousMonth(month);
  const assets = await prisma.asset.findMany({
    where: { unit: { siteId: site.id } },
    include: { unit: true, assessment: { select: { summary: true } } },
    orderBy: [{ unit: { code: "asc" } }, { tag: "asc" }],
  });
  const ids = assets.map((asset) => asset.id);
  const tags = new Map(assets.map((asset) => [asset.id, asset.tag]));
  const [conditions, cleanings, alerts, planRun, span] = await Promise.all([
    ensureMonthEndSnapshots(prisma, { siteCode: site.code, monthEnds: [month.endMs, previous.endMs] }),
    prisma.cleaning.findMany({ where: { assetId: { in: ids }, date: { gte: new Date(month.startMs), lt: new Date(month.endMs) } }, orderBy: { date: "asc" } }),
    prisma.instrumentAlert.findMany({
      where: {
        assetId: { in: ids },
        start: { lt: new Date(month.endMs) },
        OR: [{ acknowledgedAt: null }, { acknowledgedAt: { gte: new Date(month.startMs) } }, { start: { gte: new Date(month.startMs) } }],
      },
    }),
    latestPlanRun(prisma, site.code),
    dataSpan(prisma, site.id),
  ]);

  let plan: MonthlyReportInput["plan"] = null;
  if (planRun) {
    const document = planDocument(planRun);
    const byTag = new Map(assets.map((asset) => [asset.tag, asset]));
    plan = {
      id: document.id,
      createdAt: document.createdAt,
      horizonStart: document.horizon.start,
      cleanings: document.cleanings.map((cleaning) => {
        const asset = byTag.get(cleaning.tag);
        let cost: number | null = null;
        if (asset) {
          try {
            const cleanDutyW = (asset.assessment?.summary as AssessmentSummary | null)?.cleanDutyW ?? 0;
            cost = cleaningEventCost(assetEconomics(asset, site, cleanDutyW), cleaning.chargedOutageDays);
          } catch (error) {
            if (!(error instanceof EconomicsInputError)) throw error;
          }
        }
        return { tag: cleaning.tag, start: cleaning.start, state: cleaning.state, window: cleaning.window, method: cleaning.method, outageDays: cleaning.outageDays, cost, saving: cleaning.savingVsNoCleaning };
      }),
    };
  }

  const none = { status: "no-estimate", summary: null } as const;
  return monthlyReport({
    site: { code: site.code, name: site.name, timeZone: site.timeZone, currency: site.currency },
    month,
    generatedAtMs: options.nowMs ?? Date.now(),
    dataEndMs: span?.endMs ?? null,
    assets: assets.map((asset) => ({
      tag: asset.tag,
      name: asset.name,
      unitCode: asset.unit.code,
      unitName: asset.unit.name,
      atMonthEnd: conditions.get(asset.id)?.get(month.endMs) ?? none,
      atPreviousMonthEnd: conditions.get(asset.id)?.get(previous.endMs) ?? none,
    })),
    cleanings: cleanings.map((cleaning) => ({
      tag: tags.get(cleaning.assetId) ?? String(cleaning.assetId),
      dateMs: cleaning.date.getTime(),
      endDateMs: cleaning.endDate?.getTime() ?? null,
      method: cleaning.method,
      costCents: cleaning.costCents,
      effectiveness: cleaning.effectiveness,
    })),
    alerts: alerts.map((alert) => ({
      id: alert.id,
      tag: tags.get(alert.assetId) ?? String(alert.assetId),
      instrumentTag: alert.instrumentTag,
      role: alert.role,
      kind: alert.kind,
      startMs: alert.start.getTime(),
      endMs: alert.end?.getTime() ?? null,
      acknowledgedAtMs: alert.acknowledgedAt?.getTime() ?? null,
      acknowledgedBy: alert.acknowledgedBy,
    })),
    plan,
  });
}
