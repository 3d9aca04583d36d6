import { findRoot } from "../thermal/find-root";
import { checkAssetEconomics } from "./check-asset-economics";
import { cleaningEventCost } from "./cleaning-event-cost";
import { EconomicsInputError } from "./errors";
import { foulingCostBetween } from "./fouling-cost-between";
import { foulingCostRate } from "./fouling-cost-rate";
import type { AssetEconomics, DutyLossForecast, OptimalCleaningInterval } from "./types";

/** Options of {@link optimalCleaningInterval}; defaults resolved once at the top of the function. */
export interface CleaningIntervalOptions {
  /** Count the outage in the cycle length, J = (C + ∫c)/(τ + τd); default true. */
  includeDowntime?: boolean;
  /** Cost C of one cleaning event; default cleaningEventCost(economics) (whole outage charged). */
  eventCost?: number;
  /** Shortest cycle searched, days; default 0.01. */
  minimumDays?: number;
  /** Longest cycle searched, days; default 3650 (ten years). */
  maximumDays?: number;
  /** Points of the geometric scan that brackets the optimum; default 256. */
  gridPoints?: number;
}

const GOLDEN_SECTION = (Math.sqrt(5) - 1) / 2;

/**
 * optimalCleaningInterval: the cleaning interval τ* that minimises the mean cost per day over repeated cycles.
 *
 * Formula: minimise J(τ) = [C + ∫₀^τ c(t) dt]/(τ + τd); J'(τ) = g(τ)/(τ + τd)² with
 * g(τ) = c(τ)·(τ + τd) − C − ∫₀^τ c dt, so the optimum satisfies c(τ*) = J(τ*).
 * Validity: c(t) = cost rate of the forecast duty loss (foulingCostRate); when c does not decrease, g does not
 * decrease either, so J has a single minimum. Method: a geometric scan of J over [minimumDays, maximumDays] finds
 * the best grid point, then Brent's root finder solves g(τ) = 0 on the neighbouring grid interval (golden-section
 * search on J if g does not change sign there, e.g. for a non-monotone sampled forecast). Closed forms it
 * reproduces (FIELD-NOTES §5 [C]): linear c = a·t gives τ* = sqrt(2C/a), J* = sqrt(2aC); with downtime
 * τ* = −τd + sqrt(τd² + 2C/a); asymptotic c = b·Rf∞(1 − e^(−t/θ)) has an optimum only if C < b·Rf∞·θ.
 * Source: optimality condition c(τ*) = J(τ*) derived in FIELD-NOTES §5; literature line Epstein, and Ma &
 * Epstein (1981), Can. J. Chem. Eng. 59:631 (attribution from memory); Brent (1973) for the root finder.
 *
 * @param economics asset economics
 * @param forecast duty loss over a cycle started clean
 * @returns τ*, J*, c(τ*), C, cycle fouling cost and a status (see OptimalCleaningInterval)
 * @throws EconomicsInputError on invalid economics or search range
 */
export function optimalCleaningInterval(
  economics: AssetEconomics,
  forecast: DutyLossForecast,
  options: CleaningIntervalOptions = {},
): OptimalCleaningInterval {
  checkAssetEconomics(economics);
  const eventCost = options.eventCost ?? cleaningEventCost(economics);
  const downtimeDays = (options.includeDowntime ?? true) ? economics.method.outageDays : 0;
  const minimumDays = options.minimumDays ?? 1e-2;
  const maximumDays = options.maximumDays ?? 3650;
  const gridPoints = Math.max(8, Math.floor(options.gridPoints ?? 256));
  if (!(minimumDays > 0) || !(maximumDays > minimumDays) || !Number.isFinite(maximumDays)) {
    throw new EconomicsInputError(
      "cycle search range",
      `cycle search range needs 0 < minimumDays < maximumDays < Infinity, got [${minimumDays}, ${maximumDays}] days`,
    );
  }
  if (!Number.isFinite(eventCost) || eventCost < 0) {
    throw new EconomicsInputError("event cost", `event cost must be a finite number >= 0, got ${eventCost}`);
  }

  const costRate = (days: number): number => foulingCostRate(economics, forecast.dutyLossW(days)).totalPerDay;
  const ratio = Math.pow(maximumDays / minimumDays, 1 / (gridPoints - 1));
  const grid: number[] = [];
  const cumulative: number[] = [];
  let previousDays = 0;
  let total = 0;
  for (let index = 0; index < gridPoints; index += 1) {
    const days = index === gridPoints - 1 ? maximumDays : minimumDays * Math.pow(ratio, index);
    total += foulingCostBetween(economics, forecast, previousDays, days);
    grid.push(days);
    cumulative.push(total);
    previousDays = days;
  }
  const at = (index: number): { days: number; integral: number } => ({
    days: grid[index] as number,
    integral: cumulative[index] as number,
  });
  // Integral from 0 to τ, starting from the nearest grid point at or below τ within the given interval.
  const integralFrom = (anchor: number, days: number): number => {
    const start = at(anchor);
    return start.integral + foulingCostBetween(economics, forecast, start.days, days);
  };
  const average = (days: number, integral: number): number => (eventCost + integral) / (days + downtimeDays);
  const slopeSign = (days: number, integral: number): number =>
    costRate(days) * (days + downtimeDays) - eventCost - integral;

  let bestIndex = 0;
  let bestAverage = Infinity;
  for (let index = 0; index < gridPoints; index += 1) {
    const point = at(index);
    const value = average(point.days, point.integral);
    if (value < bestAverage) {
      bestAverage = value;
      bestIndex = index;
    }
  }

  const result = (status: OptimalCleaningInterval["status"], days: number, integral: number): OptimalCleaningInterval => ({
    status,
    intervalDays: days,
    averageCostPerDay: average(days, integral),
    costRateAtIntervalPerDay: costRate(days),
    eventCost,
    cycleFoulingCost: integral,
    downtimeDays,
  });

  const best = at(bestIndex);
  const bestSlope = slopeSign(best.days, best.integral);
  if (bestIndex === gridPoints - 1 && bestSlope < 0) {
    return result("no-optimum-within-maximum", best.days, best.integral);
  }
  if (bestIndex === 0 && bestSlope >= 0) {
    return result("at-minimum", best.days, best.integral);
  }

  // The sign change of g lies on the side where J falls towards the best grid point.
  const lowerIndex = bestSlope >= 0 ? bestIndex - 1 : bestIndex;
  const upperIndex = lowerIndex + 1;
  const lower = at(lowerIndex);
  const upper = at(upperIndex);
  const gOf = (days: number): number => slopeSign(days, integralFrom(lowerIndex, days));
  if (gOf(lower.days) < 0 && gOf(upper.days) >= 0) {
    const days = findRoot(gOf, lower.days, upper.days);
    return result("optimum", days, integralFrom(lowerIndex, days));
  }

  // Fallback for a non-monotone cost rate: golden-section search on J over the two grid intervals around the best
  // point (Kiefer 1953, Proc. AMS 4:502), to a bracket of 1e-10 relative.
  const leftIndex = Math.max(0, bestIndex - 1);
  const rightIndex = Math.min(gridPoints - 1, bestIndex + 1);
  const objective = (days: number): number => average(days, integralFrom(leftIndex, days));
  let low = at(leftIndex).days;
  let high = at(rightIndex).days;
  let inner1 = high - GOLDEN_SECTION * (high - low);
  let inner2 = low + GOLDEN_SECTION * (high - low);
  let value1 = objective(inner1);
  let value2 = objective(inner2);
  while (high - low > 1e-10 * high) {
    if (value1 <= value2) {
      high = inner2;
      inner2 = inner1;
      value2 = value1;
      inner1 = high - GOLDEN_SECTION * (high - low);
      value1 = objective(inner1);
    } else {
      low = inner1;
      inner1 = inner2;
      value1 = value2;
      inner2 = low + GOLDEN_SECTION * (high - low);
      value2 = objective(inner2);
    }
  }
  const days = 0.5 * (low + high);
  return result("optimum", days, integralFrom(leftIndex, days));
}
