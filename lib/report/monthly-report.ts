// The monthly condition summary of a site as a plain object: what the report page and the PDF show.
import { FLEET_STATUSES, FLEET_STATUS_LABELS, FLEET_STATUS_MEANINGS, type FleetStatus } from "../planning/fleet-status";
import type { AssessmentSummary } from "../planning/assessment-summary";
import { inMonth, nextMonth, previousMonth, type ReportMonth } from "./report-month";

/** Default number of months after the report month whose planned cleanings are listed. */
export const PLANNED_MONTHS = 3;
/** Number of assets in the "costing most" table. */
export const TOP_ASSET_COUNT = 10;

export interface ReportAssetCondition {
  status: FleetStatus;
  summary: AssessmentSummary | null;
}

export interface MonthlyReportInput {
  site: { code: string; name: string; timeZone: string; currency: string };
  month: ReportMonth;
  /** When the report is made, epoch ms. */
  generatedAtMs: number;
  /** End of the site's operating data (end of the last daily period), epoch ms; null without data. */
  dataEndMs: number | null;
  assets: {
    tag: string;
    name: string;
    unitCode: string;
    unitName: string;
    /** Condition at the end of the report month and of the month before. */
    atMonthEnd: ReportAssetCondition;
    atPreviousMonthEnd: ReportAssetCondition;
  }[];
  /** Cleaning records (any dates: those taken out of service in the month are kept). Money in cents. */
  cleanings: { tag: string; dateMs: number; endDateMs: number | null; method: string; costCents: number | null; effectiveness: number | null }[];
  /** Instrument alerts (any dates: those opened, open or acknowledged in the month are kept). */
  alerts: {
    id: number;
    tag: string;
    instrumentTag: string;
    role: string;
    kind: string;
    startMs: number;
    endMs: number | null;
    acknowledgedAtMs: number | null;
    acknowledgedBy: string | null;
  }[];
  /** The site's latest cleaning plan, with the cost of each cleaning (site currency), or null when none was run. */
  plan: {
    id: number;
    createdAt: string;
    horizonStart: string;
    cleanings: { tag: string; start: string; state: "booked" | "proposed"; window: string; method: string; outageDays: number; cost: number | null; saving: number }[];
  } | null;
  /** Months after the report month whose planned cleanings are listed [PLANNED_MONTHS]. */
  plannedMonths?: number;
}

export interface CategoryCount {
  status: FleetStatus;
  label: string;
  meaning: string;
  count: number;
  previousCount: number;
}

export interface MonthlyReport {
  site: MonthlyReportInput["site"];
  month: { key: string; label: string; firstDay: string; lastDay: string };
  previousMonth: { key: string; label: string };
  generatedAt: string;
  /** Whether the operating data reach the end of the month, and the last (UTC) day of daily data. */
  data: { complete: boolean; lastDay: string | null };
  /** What the comparison with the previous month rests on, in words. */
  basis: string;
  assetCount: number;
  categories: CategoryCount[];
  /** Assets whose category differs between the two month ends, most urgent new category first. */
  categoryChanges: { tag: string; name: string; from: FleetStatus; to: FleetStatus }[];
  totals: {
    /** Cost of fouling per day summed over the costed assets, site currency. */
    costPerDay: number;
    previousCostPerDay: number;
    costedAssets: number;
    previousCostedAssets: number;
    /** Duty lost at reference conditions summed over the assets with an estimate, W. */
    dutyLossW: number;
    previousDutyLossW: number;
  };
  units: { code: string; name: string; assets: number; costPerDay: number; previousCostPerDay: number; dutyLossW: number }[];
  topAssets: {
    rank: number;
    tag: string;
    name: string;
    unitCode: string;
    status: FleetStatus;
    costPerDay: number;
    previousCostPerDay: number | null;
    dutyLossW: number | null;
    percentOfClean: number | null;
  }[];
  cleaningsDone: { tag: string; name: string; outOfService: string; returnToService: string | null; method: string; cost: number | null; effectiveness: number | null }[];
  cleaningsDoneCost: { total: number; unknownCost: number };
  planned: {
    plan: { id: number; createdAt: string; horizonStart: string } | null;
    /** The listed period: the day after the report month to the last day of the last listed month (site dates). */
    from: string;
    to: string;
    cleanings: { tag: string; name: string; start: string; state: "booked" | "proposed"; window: string; method: string; outageDays: number; cost: number | null; saving: number }[];
    totalCost: number;
  };
  alerts: {
    opened: number;
    openAtMonthEnd: number;
    acknowledged: number;
    rows: { tag: string; instrumentTag: string; role: string; kind: string; start: string; faultEnded: string | null; acknowledged: string | null; openedInMonth: boolean; openAtMonthEnd: boolean }[];
  };
}

const STATUS_ORDER = new Map(FLEET_STATUSES.map((status, index) => [status, index]));

/** The calendar date of an instant in the time zone, YYYY-MM-DD. */
export function localDate(instantMs: number, timeZone: string): string {
  return new Intl.DateTimeFormat("en-CA", { timeZone, year: "numeric", month: "2-digit", day: "2-digit" }).format(new Date(instantMs));
}

function costOf(summary: AssessmentSummary | null): number | null {
  return summary?.economics ? summary.economics.costPerDay : null;
}

/**
 * monthlyReport: the monthly condition summary of a site from fetched rows, without I/O or clock.
 *
 * - Categories (lib/planning/fleet-status) are counted at the end of the month and of the month before; both come
 *   from the assessment re-run with the data up to each month end (MonthEndSnapshot), so the two are comparable.
 * - Cost of fouling per day and duty loss at reference conditions are summed over the assets that have them.
 * - The ten assets with the highest cost per day at the month end (ties: by tag), with duty loss and U % of clean.
 * - Cleanings count in the month in which the exchanger was taken out of service (site time zone).
 * - Planned cleanings: the latest plan's cleanings starting after the month, up to `plannedMonths` months later.
 * - Alerts: opened = the fault started in the month; open at month end = started before the month end and not
 *   acknowledged by then; acknowledged = acknowledged in the month.
 */
export function monthlyReport(input: MonthlyReportInput): MonthlyReport {
  const { site, month } = input;
  const zone = site.timeZone;
  const previous = previousMonth(month);
  const date = (ms: number) => localDate(ms, zone);
  const names = new Map(input.assets.map((asset) => [asset.tag, asset.name]));

  const categories: CategoryCount[] = FLEET_STATUSES.map((status) => ({
    status,
    label: FLEET_STATUS_LABELS[status],
    meaning: FLEET_STATUS_MEANINGS[status],
    count: input.assets.filter((asset) => asset.atMonthEnd.status === status).length,
    previousCount: input.assets.filter((asset) => asset.atPreviousMonthEnd.status === status).length,
  }));
  const categoryChanges = input.assets
    .filter((asset) => asset.atMonthEnd.status !== asset.atPreviousMonthEnd.status)
    .map((asset) => ({ tag: asset.tag, name: asset.name, from: asset.atPreviousMonthEnd.status, to: asset.atMonthEnd.status }))
    .sort((a, b) => (STATUS_ORDER.get(a.to) ?? 0) - (STATUS_ORDER.get(b.to) ?? 0) || a.tag.localeCompare(b.tag));

  let costPerDay = 0;
  let previousCostPerDay = 0;
  let costedAssets = 0;
  let previousCostedAssets = 0;
  let dutyLossW = 0;
  let previousDutyLossW = 0;
  const units = new Map<string, MonthlyReport["units"][number]>();
  for (const asset of input.assets) {
    const cost = costOf(asset.atMonthEnd.summary);
    const previousCost = costOf(asset.atPreviousMonthEnd.summary);
    const loss = asset.atMonthEnd.summary?.dutyLossW ?? null;
    if (cost !== null) {
      costPerDay += cost;
      costedAssets += 1;
    }
    if (previousCost !== null) {
      previousCostPerDay += previousCost;
      previousCostedAssets += 1;
    }
    if (loss !== null) dutyLossW += loss;
    previousDutyLossW += asset.atPreviousMonthEnd.summary?.dutyLossW ?? 0;
    const unit = units.get(asset.unitCode) ?? { code: asset.unitCode, name: asset.unitName, assets: 0, costPerDay: 0, previousCostPerDay: 0, dutyLossW: 0 };
    unit.assets += 1;
    unit.costPerDay += cost ?? 0;
    unit.previousCostPerDay += previousCost ?? 0;
    unit.dutyLossW += loss ?? 0;
    units.set(asset.unitCode, unit);
  }

  const topAssets = input.assets
    .flatMap((asset) => {
      const cost = costOf(asset.atMonthEnd.summary);
      return cost !== null && cost > 0 ? [{ asset, cost }] : [];
    })
    .sort((a, b) => b.cost - a.cost || a.asset.tag.localeCompare(b.asset.tag))
    .slice(0, TOP_ASSET_COUNT)
    .map(({ asset, cost }, index) => ({
      rank: index + 1,
      tag: asset.tag,
      name: asset.name,
      unitCode: asset.unitCode,
      status: asset.atMonthEnd.status,
      costPerDay: cost,
      previousCostPerDay: costOf(asset.atPreviousMonthEnd.summary),
      dutyLossW: asset.atMonthEnd.summary?.dutyLossW ?? null,
      percentOfClean: asset.atMonthEnd.summary?.percentOfClean ?? null,
    }));

  const cleaningsDone = input.cleanings
    .filter((cleaning) => inMonth(cleaning.dateMs, month))
    .sort((a, b) => a.dateMs - b.dateMs || a.tag.localeCompare(b.tag))
    .map((cleaning) => ({
      tag: cleaning.tag,
      name: names.get(cleaning.tag) ?? cleaning.tag,
      outOfService: date(cleaning.dateMs),
      returnToService: cleaning.endDateMs === null ? null : date(cleaning.endDateMs),
      method: cleaning.method,
      cost: cleaning.costCents === null ? null : cleaning.costCents / 100,
      effectiveness: cleaning.effectiveness,
    }));

  // Plan dates are calendar dates of the site (YYYY-MM-DD), so the window is compared as dates.
  const plannedMonths = input.plannedMonths ?? PLANNED_MONTHS;
  let lastListed = month;
  for (let index = 0; index < plannedMonths; index += 1) lastListed = nextMonth(lastListed);
  const from = date(month.endMs);
  const to = date(lastListed.endMs - 1);
  const plannedCleanings = (input.plan?.cleanings ?? [])
    .filter((cleaning) => cleaning.start >= from && cleaning.start <= to)
    .sort((a, b) => a.start.localeCompare(b.start) || a.tag.localeCompare(b.tag))
    .map((cleaning) => ({ ...cleaning, name: names.get(cleaning.tag) ?? cleaning.tag }));

  const alertRows = input.alerts
    .map((alert) => {
      const openedInMonth = inMonth(alert.startMs, month);
      const openAtMonthEnd = alert.startMs < month.endMs && (alert.acknowledgedAtMs === null || alert.acknowledgedAtMs >= month.endMs);
      const acknowledgedInMonth = alert.acknowledgedAtMs !== null && inMonth(alert.acknowledgedAtMs, month);
      return { alert, openedInMonth, openAtMonthEnd, acknowledgedInMonth };
    })
    .filter((row) => row.openedInMonth || row.openAtMonthEnd || row.acknowledgedInMonth)
    .sort((a, b) => a.alert.startMs - b.alert.startMs || a.alert.id - b.alert.id);

  const dataComplete = input.dataEndMs !== null && input.dataEndMs >= month.endMs;
  return {
    site,
    month: { key: month.key, label: month.label, firstDay: date(month.startMs), lastDay: date(month.endMs - 1) },
    previousMonth: { key: previous.key, label: previous.label },
    generatedAt: new Date(input.generatedAtMs).toISOString(),
    // daily periods are UTC days: the last one is named by its UTC date
    data: { complete: dataComplete, lastDay: input.dataEndMs === null ? null : new Date(input.dataEndMs - 1).toISOString().slice(0, 10) },
    basis:
      `Both month ends are assessed the same way: the fouling assessment is re-run with only the operating data and ` +
      `cleaning records up to the end of ${month.label} and up to the end of ${previous.label}, and each asset's ` +
      `category is taken from the duty-threshold forecast as it stood at that instant. Data imported later for ` +
      `earlier dates, or register changes, recompute both.`,
    assetCount: input.assets.length,
    categories,
    categoryChanges,
    totals: { costPerDay, previousCostPerDay, costedAssets, previousCostedAssets, dutyLossW, previousDutyLossW },
    units: [...units.values()].sort((a, b) => a.code.localeCompare(b.code)),
    topAssets,
    cleaningsDone,
    cleaningsDoneCost: {
      total: cleaningsDone.reduce((sum, cleaning) => sum + (cleaning.cost ?? 0), 0),
      unknownCost: cleaningsDone.filter((cleaning) => cleaning.cost === null).length,
    },
    planned: {
      plan: input.plan ? { id: input.plan.id, createdAt: input.plan.createdAt, horizonStart: input.plan.horizonStart } : null,
      from,
      to,
      cleanings: plannedCleanings,
      totalCost: plannedCleanings.reduce((sum, cleaning) => sum + (cleaning.cost ?? 0), 0),
    },
    alerts: {
      opened: alertRows.filter((row) => row.openedInMonth).length,
      openAtMonthEnd: alertRows.filter((row) => row.openAtMonthEnd).length,
      acknowledged: alertRows.filter((row) => row.acknowledgedInMonth).length,
      rows: alertRows.map(({ alert, openedInMonth, openAtMonthEnd }) => ({
        tag: alert.tag,
        instrumentTag: alert.instrumentTag,
        role: alert.role,
        kind: alert.kind,
        start: date(alert.startMs),
        faultEnded: alert.endMs === null ? null : date(alert.endMs),
        acknowledged: alert.acknowledgedAtMs === null ? null : date(alert.acknowledgedAtMs),
        openedInMonth,
        openAtMonthEnd,
      })),
    },
  };
}
