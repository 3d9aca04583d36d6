// The few figures of an assessment that lists and reports show, stored beside it so a 500-asset table reads kilobytes.
import type { Asset, Site } from "../../generated/prisma/client";
import type { Assessment } from "../core/assessment";
import { economicsSummary } from "./economics-summary";
import { DAY_MS } from "../core/plan";

/** Days of fouling history in the small trend line, and its most points. */
const SPARKLINE_DAYS = 365;
const SPARKLINE_POINTS = 40;

export interface AssessmentSummary {
  asOf: string;
  /** Median observed U over the recent days, W/(m²·K), and as a percentage of the clean-model U at the same flows. */
  currentUWPerM2K: number | null;
  percentOfClean: number | null;
  /** Current fouling resistance from the trend (or the recent median), m²·K/W. */
  foulingM2KPerW: number | null;
  /** Duty at reference conditions: clean, now and lost, W. */
  cleanDutyW: number;
  dutyLossW: number | null;
  /** Duty-threshold forecast: status and P10/P50/P90 dates (ISO-8601), crossedAt when already crossed. */
  threshold: { status: string; p10: string | null; p50: string | null; p90: string | null; crossedAt: string | null };
  trendModel: string | null;
  /** Economics in the site currency; null with the reason when the asset cannot be costed. */
  economics: { currency: string; costPerDay: number; cycleCostToDate: number; optimalIntervalDays: number | null } | null;
  economicsNote: string | null;
  /** Rf over the last year, at most 40 points: [epoch ms, m²·K/W]. */
  sparkline: [number, number][];
}

/**
 * assessmentSummary: the fleet-table figures of one asset's assessment: U as a percentage of clean, Rf, duty loss,
 * the threshold dates, cost of fouling per day (economicsSummary) and a thinned Rf series for a trend line.
 */
export function assessmentSummary(asset: Asset, site: Site, assessment: Assessment): AssessmentSummary {
  const economics = economicsSummary(asset, site, { result: assessment as never });
  const series = assessment.foulingResistance.series.filter((point) => point.timeMs >= assessment.asOfMs - SPARKLINE_DAYS * DAY_MS);
  const step = Math.max(1, Math.ceil(series.length / SPARKLINE_POINTS));
  const sparkline: [number, number][] = series.filter((_, index) => index % step === 0 || index === series.length - 1).map((point) => [point.timeMs, point.foulingM2KPerW]);
  const duty = assessment.forecasts.duty;
  return {
    asOf: assessment.asOf,
    currentUWPerM2K: assessment.currentObservedU?.uWPerM2K ?? null,
    percentOfClean: assessment.currentObservedU?.percentOfClean ?? null,
    foulingM2KPerW: assessment.foulingResistance.current ?? assessment.foulingResistance.recentMedian,
    cleanDutyW: assessment.referenceDuty.cleanW,
    dutyLossW: assessment.referenceDuty.lossW,
    threshold: { status: duty.status, p10: duty.p10, p50: duty.p50, p90: duty.p90, crossedAt: duty.crossedAt },
    trendModel: assessment.trend?.model ?? null,
    economics: economics.ok
      ? {
          currency: economics.summary.currency,
          costPerDay: economics.summary.costPerDay,
          cycleCostToDate: economics.summary.cycleCostToDate,
          optimalIntervalDays: economics.summary.optimalInterval.status === "optimum" ? economics.summary.optimalInterval.intervalDays : null,
        }
      : null,
    economicsNote: economics.ok ? null : economics.reason,
    sparkline,
  };
}
