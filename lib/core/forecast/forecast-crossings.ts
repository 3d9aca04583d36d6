import { trendBand, trendBandQuantiles, trendValue, type TrendFit } from "../trend";
import { firstCrossingTime } from "./first-crossing-time";
import type { CriticalFouling, CrossingCriterion, CrossingForecast } from "./types";

const MS_PER_DAY = 86_400_000;

/** One limit to forecast: its kind and its critical fouling resistance. */
export interface CrossingTarget {
  criterion: CrossingCriterion["kind"];
  critical: CriticalFouling;
}

/** Input of forecastCrossings. */
export interface ForecastCrossingsInput {
  targets: readonly CrossingTarget[];
  /** Trend of the current cycle (null: none could be fitted). */
  fit: TrendFit | null;
  /** Origin of the current cycle (t = 0 of the trend), epoch ms. */
  cycleOriginMs: number;
  asOfMs: number;
  /** Search horizon after asOf, days. */
  horizonDays: number;
  /** Grid step of the crossing search, days [1]. */
  searchStepDays?: number;
}

function isoOrNull(ms: number | null): string | null {
  return ms === null ? null : new Date(ms).toISOString();
}

/**
 * forecastCrossings: P10/P50/P90 dates at which the current cycle's fouling reaches each target's critical resistance.
 *
 * Method: P50 = first time the central trend Rf̂(t) reaches Rf*; P10 (earliest plausible) = first time the upper 80 %
 * prediction band (90th percentile of Rf) reaches it; P90 = first time the lower 80 % band (10th percentile) does, each
 * by firstCrossingTime on a daily grid refined by bisection (the three curves are evaluated on the grid once and shared
 * by all targets). The search runs from asOf to asOf + horizon; a curve already at or above Rf* at asOf is searched
 * from the cycle origin instead, giving a date in the past (status already-crossed, crossedAt = the central date).
 * A null date means "not within the horizon". Rf* comes from criticalFoulingResistance (one bisection on Rf per limit,
 * not a rating per day), valid because every limit is monotone in Rf at reference conditions.
 * Valid: the trend extrapolated with its delta-method band (see trendBand); no cleaning before the crossing.
 * Source: delta-method bands (Seber & Wild 1989, Sect. 5.1, from memory); P10 from the upper band as in the brief.
 *
 * @param input targets, the current cycle's trend, cycle origin, asOf, horizon (not modified)
 * @returns one CrossingForecast per target, in order
 */
export function forecastCrossings(input: ForecastCrossingsInput): CrossingForecast[] {
  const horizonEnd = new Date(input.asOfMs + input.horizonDays * MS_PER_DAY).toISOString();
  const fit = input.fit;
  const step = input.searchStepDays ?? 1;
  const asOfDays = (input.asOfMs - input.cycleOriginMs) / MS_PER_DAY;
  const endDays = asOfDays + input.horizonDays;
  const quantiles = fit === null ? null : trendBandQuantiles(fit);

  // Curve values on a grid are cached by the grid's bounds, so the targets share them.
  type Curve = "center" | "upper" | "lower";
  const cache = new Map<string, number[]>();
  const evaluate = (curve: Curve, times: readonly number[]): number[] => {
    if (fit === null || quantiles === null) return [];
    if (curve === "center") return times.map((time) => trendValue(fit, time));
    const band = trendBand(fit, times, quantiles);
    return band.map((point) => (curve === "upper" ? point.upper80 : point.lower80));
  };
  const curveFunction = (curve: Curve) => (times: readonly number[]): number[] => {
    if (times.length < 3) return evaluate(curve, times);
    const key = `${curve}:${times[0]}:${times[times.length - 1]}:${times.length}`;
    const cached = cache.get(key);
    if (cached !== undefined) return cached;
    const values = evaluate(curve, times);
    cache.set(key, values);
    return values;
  };
  const nowValue = new Map<Curve, number>();
  const crossing = (curve: Curve, level: number): number | null => {
    const function_ = curveFunction(curve);
    const now = nowValue.get(curve) ?? (function_([asOfDays])[0] as number);
    nowValue.set(curve, now);
    const days = now >= level ? firstCrossingTime(function_, level, 0, asOfDays, step) : firstCrossingTime(function_, level, asOfDays, endDays, step);
    return days === null ? null : Math.round(input.cycleOriginMs + days * MS_PER_DAY);
  };

  return input.targets.map((target) => {
    const base: CrossingForecast = {
      criterion: target.criterion,
      criticalFoulingM2KPerW: target.critical.foulingM2KPerW,
      status: "no-trend",
      p10: null,
      p50: null,
      p90: null,
      p10Ms: null,
      p50Ms: null,
      p90Ms: null,
      crossedAt: null,
      crossedAtMs: null,
      horizonEnd,
    };
    if (target.critical.status === "broken-when-clean") return { ...base, status: "broken-when-clean" };
    if (target.critical.status === "never-broken" || target.critical.foulingM2KPerW === null) return { ...base, status: "never-broken" };
    if (fit === null) return base;
    const level = target.critical.foulingM2KPerW;
    const p50Ms = crossing("center", level);
    const p10Ms = crossing("upper", level);
    const p90Ms = crossing("lower", level);
    const alreadyCrossed = p50Ms !== null && p50Ms <= input.asOfMs;
    return {
      ...base,
      status: alreadyCrossed ? "already-crossed" : p50Ms === null ? "beyond-horizon" : "ahead",
      p10: isoOrNull(p10Ms),
      p50: isoOrNull(p50Ms),
      p90: isoOrNull(p90Ms),
      p10Ms,
      p50Ms,
      p90Ms,
      crossedAt: alreadyCrossed ? isoOrNull(p50Ms) : null,
      crossedAtMs: alreadyCrossed ? p50Ms : null,
    };
  });
}
