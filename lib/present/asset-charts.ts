// The series behind the asset page's charts and their CSV downloads: built once in SI from the stored assessment
// and the screened daily periods, then converted to the user's units in one place (displayAssetCharts).
import type { Assessment, AssessmentPeriod, ForecastBandPoint } from "../core/assessment";
import { observedResistances } from "../core/assessment";
import { cleanResistance } from "../core/clean-model";
import { referenceRating, type ReferenceConditions } from "../core/forecast";
import { ThermalInputError, type Arrangement } from "../core/thermal";
import { displayUnit, toDisplay, type UnitSystem } from "./display-units";

const DAY_MS = 86_400_000;

export const ASSET_CHARTS = ["u", "fouling", "duty", "closure", "cycles"] as const;
export type AssetChartName = (typeof ASSET_CHARTS)[number];

export function isAssetChartName(value: string): value is AssetChartName {
  return (ASSET_CHARTS as readonly string[]).includes(value);
}

/** One screened daily period as stored (reconciled values, closure, usability). */
export interface ChartPeriod extends AssessmentPeriod {
  /** (hot duty − cold duty)/mean duty, a fraction; null when a duty is missing. */
  closure: number | null;
  /** Why the period is not usable (null when usable). */
  reason: string | null;
}

export interface ChartAlert {
  id: number;
  /** Instrument tag and fault kind, e.g. "TI-4101A bias" (register text: treated as untrusted in CSV). */
  label: string;
  startMs: number;
  endMs: number;
}

export interface AssetChartInputs {
  assessment: Assessment;
  /** Daily periods (lengthS 86 400), oldest first. */
  periods: readonly ChartPeriod[];
  alerts: readonly ChartAlert[];
  /** Return-to-service instants of recorded cleanings, epoch ms. */
  cleaningsMs: readonly number[];
  /** Rating at reference conditions (clean resistance from the assessment's clean model). */
  rating: Omit<ReferenceConditions, "cleanResistanceM2KPerW"> & { arrangement: Arrangement };
  designUWPerM2K: number;
  designFoulingM2KPerW: number;
  dutyThresholdW: number;
}

/** All chart series in SI: W/(m²·K), m²·K/W, W; instants epoch ms. */
export interface AssetChartsSI {
  asOfMs: number;
  cleaningsMs: number[];
  u: { timeMs: number; observed: number; clean: number }[];
  fouling: {
    observed: { timeMs: number; rf: number; cycle: number }[];
    band: { timeMs: number; p10: number; p50: number; p90: number; lower95: number; upper95: number }[];
    criticalRf: number | null;
    designRf: number;
  };
  duty: {
    observed: { timeMs: number; duty: number }[];
    /** Duty along the trend (central) and its 80 % and 95 % bands; a higher Rf gives a lower duty. */
    band: { timeMs: number; central: number; lower80: number; upper80: number; lower95: number; upper95: number }[];
    threshold: number;
    clean: number;
    crossing: { status: string; p10Ms: number | null; p50Ms: number | null; p90Ms: number | null; crossedAtMs: number | null };
  };
  closure: { points: { timeMs: number; closurePercent: number; usable: boolean; reason: string | null; alerts: string[] }[]; alerts: ChartAlert[]; endMs: number };
  cycles: { index: number; startMs: number; current: boolean; points: { days: number; rf: number }[] }[];
}

export type ClosureSeriesPoint = AssetChartsSI["closure"]["points"][number];

/** closureSeries: daily closure (as %) of the periods that have one, with the labels of the alerts active that day. */
export function closureSeries(
  periods: readonly Pick<ChartPeriod, "startMs" | "closure" | "usable" | "reason">[],
  alerts: readonly ChartAlert[],
): ClosureSeriesPoint[] {
  return periods
    .filter((period) => period.closure !== null && Number.isFinite(period.closure))
    .map((period) => ({
      timeMs: period.startMs,
      closurePercent: (period.closure as number) * 100,
      usable: period.usable,
      reason: period.reason,
      alerts: alerts.filter((alert) => alert.startMs < period.startMs + DAY_MS && alert.endMs > period.startMs).map((alert) => alert.label),
    }));
}

/** Daily periods are stamped at their start; the assessment places each day at mid-day, and so do the charts. */
const HALF_DAY_MS = DAY_MS / 2;

/** Forecast band shown: up to 60 days past the P90 duty crossing, at least one year, at most the horizon. */
function bandWindow(assessment: Assessment): ForecastBandPoint[] {
  const band = assessment.trend?.band ?? [];
  const p90 = assessment.forecasts.duty.p90Ms;
  const until = Math.max(assessment.asOfMs + 365 * DAY_MS, (p90 ?? 0) + 60 * DAY_MS);
  return band.filter((point) => point.timeMs <= until);
}

/**
 * assetChartsSI: the five chart series of one asset.
 * - u: observed U = Q/(A·F·LMTD) per usable day (thermal core observedU via observedResistances) against the clean
 *   model's U at that day's flows, 1/U_clean = a_h(m_h/m_h,ref)^−n_h + a_c(m_c/m_c,ref)^−n_c + R_w (cleanResistance).
 * - fouling: the assessment's Rf series, its trend and 80 %/95 % prediction bands, the duty-threshold and design Rf.
 * - duty: duty at reference conditions for each observed Rf and along the band, U_ref = 1/(R0 + Rf) rated by ε–NTU
 *   (referenceRating; Kern 1950 ch. 6, Incropera et al. 2007 §11.4); days whose Rf cannot be rated are left out.
 * - closure: daily heat-balance closure with the instrument alerts active that day.
 * - cycles: Rf against days since each cycle's start.
 */
export function assetChartsSI(inputs: AssetChartInputs): AssetChartsSI {
  const { assessment } = inputs;
  const asOfMs = assessment.asOfMs;
  const model = assessment.cleanModel;

  const u: AssetChartsSI["u"] = [];
  if (model) {
    const used = inputs.periods.filter((period) => period.usable && period.startMs <= asOfMs);
    for (const point of observedResistances(inputs.rating, used).points) {
      u.push({ timeMs: point.timeMs + HALF_DAY_MS, observed: 1 / point.resistanceM2KPerW, clean: 1 / cleanResistance(model.parameters, point.hotFlowKgPerS, point.coldFlowKgPerS) });
    }
  }

  const band = bandWindow(assessment);
  const conditions: ReferenceConditions = {
    ...inputs.rating,
    cleanResistanceM2KPerW: model?.cleanResistanceAtReferenceM2KPerW ?? 1 / inputs.designUWPerM2K - inputs.designFoulingM2KPerW,
  };
  const dutyAt = (rf: number): number | null => {
    if (!(conditions.cleanResistanceM2KPerW + rf > 0)) return null;
    try {
      return referenceRating(conditions, rf).dutyW;
    } catch (error) {
      if (error instanceof ThermalInputError) return null;
      throw error;
    }
  };
  const dutyObserved: AssetChartsSI["duty"]["observed"] = [];
  for (const point of assessment.foulingResistance.series) {
    const duty = dutyAt(point.foulingM2KPerW);
    if (duty !== null) dutyObserved.push({ timeMs: point.timeMs, duty });
  }
  const dutyBand: AssetChartsSI["duty"]["band"] = [];
  for (const point of band) {
    const values = [dutyAt(point.p50), dutyAt(point.p90), dutyAt(point.p10), dutyAt(point.upper95), dutyAt(point.lower95)];
    if (values.some((value) => value === null)) continue;
    const [central, lower80, upper80, lower95, upper95] = values as number[];
    dutyBand.push({ timeMs: point.timeMs, central: central as number, lower80: lower80 as number, upper80: upper80 as number, lower95: lower95 as number, upper95: upper95 as number });
  }
  const forecast = assessment.forecasts.duty;

  const lastPeriod = inputs.periods[inputs.periods.length - 1];
  const endMs = lastPeriod ? lastPeriod.startMs + DAY_MS : asOfMs;
  const closurePoints = closureSeries(inputs.periods, inputs.alerts);

  const cycles = assessment.cycles.map((cycle) => {
    const startMs = Date.parse(cycle.start);
    return {
      index: cycle.index,
      startMs,
      current: cycle.end === null,
      points: assessment.foulingResistance.series.filter((point) => point.cycle === cycle.index).map((point) => ({ days: (point.timeMs - startMs) / DAY_MS, rf: point.foulingM2KPerW })),
    };
  });

  return {
    asOfMs,
    cleaningsMs: [...inputs.cleaningsMs].sort((a, b) => a - b),
    u,
    fouling: {
      observed: assessment.foulingResistance.series.map((point) => ({ timeMs: point.timeMs, rf: point.foulingM2KPerW, cycle: point.cycle })),
      band: band.map((point) => ({ timeMs: point.timeMs, p10: point.p10, p50: point.p50, p90: point.p90, lower95: point.lower95, upper95: point.upper95 })),
      criticalRf: forecast.criticalFoulingM2KPerW,
      designRf: inputs.designFoulingM2KPerW,
    },
    duty: {
      observed: dutyObserved,
      band: dutyBand,
      threshold: inputs.dutyThresholdW,
      clean: dutyAt(0) ?? assessment.referenceDuty.cleanW,
      crossing: { status: forecast.status, p10Ms: forecast.p10Ms, p50Ms: forecast.p50Ms, p90Ms: forecast.p90Ms, crossedAtMs: forecast.crossedAtMs },
    },
    closure: { points: closurePoints, alerts: [...inputs.alerts], endMs },
    cycles,
  };
}

export interface ChartUnitLabels {
  u: string;
  rf: string;
  duty: string;
}

/** The same series in the user's units (closure stays %, times epoch ms), with the unit labels for axes and headers. */
export interface AssetChartsDisplay extends AssetChartsSI {
  system: UnitSystem;
  units: ChartUnitLabels;
  /** Plain-ASCII unit labels for CSV headers. */
  asciiUnits: ChartUnitLabels;
}

/** displayAssetCharts: converts every SI value of the series with lib/present/display-units (the only conversion path). */
export function displayAssetCharts(charts: AssetChartsSI, system: UnitSystem): AssetChartsDisplay {
  const u = (value: number) => toDisplay(system, "u", value) as number;
  const rf = (value: number) => toDisplay(system, "foulingResistance", value) as number;
  const duty = (value: number) => toDisplay(system, "duty", value) as number;
  return {
    ...charts,
    system,
    units: { u: displayUnit(system, "u").label, rf: displayUnit(system, "foulingResistance").label, duty: displayUnit(system, "duty").label },
    asciiUnits: { u: displayUnit(system, "u").ascii, rf: displayUnit(system, "foulingResistance").ascii, duty: displayUnit(system, "duty").ascii },
    u: charts.u.map((point) => ({ timeMs: point.timeMs, observed: u(point.observed), clean: u(point.clean) })),
    fouling: {
      observed: charts.fouling.observed.map((point) => ({ ...point, rf: rf(point.rf) })),
      band: charts.fouling.band.map((point) => ({ timeMs: point.timeMs, p10: rf(point.p10), p50: rf(point.p50), p90: rf(point.p90), lower95: rf(point.lower95), upper95: rf(point.upper95) })),
      criticalRf: charts.fouling.criticalRf === null ? null : rf(charts.fouling.criticalRf),
      designRf: rf(charts.fouling.designRf),
    },
    duty: {
      ...charts.duty,
      observed: charts.duty.observed.map((point) => ({ timeMs: point.timeMs, duty: duty(point.duty) })),
      band: charts.duty.band.map((point) => ({ timeMs: point.timeMs, central: duty(point.central), lower80: duty(point.lower80), upper80: duty(point.upper80), lower95: duty(point.lower95), upper95: duty(point.upper95) })),
      threshold: duty(charts.duty.threshold),
      clean: duty(charts.duty.clean),
    },
    cycles: charts.cycles.map((cycle) => ({ ...cycle, points: cycle.points.map((point) => ({ days: point.days, rf: rf(point.rf) })) })),
  };
}
