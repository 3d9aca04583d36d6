import { SECONDS_PER_DAY } from "./constants";
import { energyCostPerJoule } from "./energy-cost-per-joule";
import { integrateAdaptiveSimpson } from "./integrate-adaptive-simpson";
import type { AssetEconomics, DutyLossForecast } from "./types";

/** Bisection on time stops when the bracket is this narrow, days (about 1 ms). */
const CROSSING_TOLERANCE_DAYS = 1e-8;

/**
 * Days within [from, to] during which the duty loss exceeds the limit, assuming the loss does not decrease with
 * time: 0 if it is not above the limit at `to`, the whole interval if it already is at `from`, otherwise the time
 * after the crossing found by bisection.
 */
function daysAboveLimit(forecast: DutyLossForecast, limitW: number, fromDays: number, toDays: number): number {
  if (!(forecast.dutyLossW(toDays) > limitW)) return 0;
  if (forecast.dutyLossW(fromDays) > limitW) return toDays - fromDays;
  let low = fromDays;
  let high = toDays;
  while (high - low > CROSSING_TOLERANCE_DAYS * Math.max(1, Math.abs(high))) {
    const middle = 0.5 * (low + high);
    if (forecast.dutyLossW(middle) > limitW) high = middle;
    else low = middle;
  }
  return toDays - high;
}

/**
 * foulingCostBetween: fouling cost accumulated between two ages of a cycle, ∫ c(t) dt over [from, to].
 *
 * Formula: ∫c dt = 86400·(cost per J)·∫ΔQ(t) dt + L_limit·(days with ΔQ > ΔQ_limit).
 * Validity: ΔQ(t) finite; the throughput part assumes ΔQ(t) does not decrease within [from, to] (its crossing is
 * found by bisection to 1e-8 days). The energy integral is the forecast's own exact integral when it has one,
 * otherwise adaptive Simpson quadrature (relative error 1e-10).
 * Source: definition of the cycle cost in FIELD-NOTES §5 (J(τ) numerator); quadrature per integrateAdaptiveSimpson.
 *
 * @param economics asset economics
 * @param forecast duty loss against days since return to service
 * @param fromDays start age, days (>= 0)
 * @param toDays end age, days (>= fromDays)
 * @returns money accumulated over the interval
 */
export function foulingCostBetween(
  economics: AssetEconomics,
  forecast: DutyLossForecast,
  fromDays: number,
  toDays: number,
): number {
  if (!(toDays > fromDays)) return 0;
  const lossIntegralWDays = forecast.dutyLossIntegralWDays
    ? forecast.dutyLossIntegralWDays(fromDays, toDays)
    : integrateAdaptiveSimpson((days) => forecast.dutyLossW(days), fromDays, toDays);
  const energy = SECONDS_PER_DAY * energyCostPerJoule(economics.energy) * lossIntegralWDays;
  const limit = economics.throughputLimit;
  const lostProduction =
    limit && limit.lostProductionPerDay > 0
      ? limit.lostProductionPerDay * daysAboveLimit(forecast, limit.dutyLossW, fromDays, toDays)
      : 0;
  return energy + lostProduction;
}
