import { foulingCostBetween } from "./fouling-cost-between";
import { foulingCostRate } from "./fouling-cost-rate";
import type { AssetEconomics, DutyLossForecast, OptimalCleaningInterval } from "./types";

/** Options of {@link relativeCycleValue}. */
export interface RelativeCycleValueOptions {
  /** Longest wait searched for the cost rate to reach J*, days; default 3650. */
  maximumWaitDays?: number;
}

/**
 * relativeCycleValue: relative value h(s) of an exchanger whose cycle is s days old, when all later cycles follow
 * the steady optimum (τ*, J*) of the clean-state model: the cost still to come, counted against the steady average.
 *
 * Formula: h(s) = min over r ≥ 0 of ∫ₛ^(s+r) [c(t) − J*] dt + C − J*·τd; for a non-decreasing c the best wait r is
 * up to the first age where c(t) ≥ J*. For the clean-state model itself h(0) = 0 (from J* = (C + ∫₀^τ* c)/(τ* + τd)).
 * Validity: c(t) of `forecast` does not decrease; the wait is capped at maximumWaitDays (where c never reaches J*,
 * e.g. when cleaning never pays, h is the capped sum).
 * Use: the end-of-horizon charge of a finite cleaning plan, so that a plan over W weeks does not leave every
 * exchanger dirty at the horizon end (the horizon effect).
 * Source: relative value (bias) function of an average-cost renewal decision problem, Puterman (1994), Markov
 * Decision Processes, Wiley, Ch. 8 and 11 (average-reward and semi-Markov models; from memory).
 *
 * @param economics asset economics (prices and cleaning event)
 * @param forecast duty loss of the cycle the exchanger is in (may differ from the clean-state model)
 * @param steady optimum of the clean-state model (J*, C, τd from optimalCleaningInterval)
 * @param ageDays s, days since the cycle started
 * @returns site currency (may be negative)
 */
export function relativeCycleValue(
  economics: AssetEconomics,
  forecast: DutyLossForecast,
  steady: OptimalCleaningInterval,
  ageDays: number,
  options: RelativeCycleValueOptions = {},
): number {
  const maximumWaitDays = options.maximumWaitDays ?? 3650;
  const target = steady.averageCostPerDay;
  const above = (days: number): boolean => foulingCostRate(economics, forecast.dutyLossW(days)).totalPerDay >= target;
  let waitDays: number;
  if (above(ageDays)) {
    waitDays = 0;
  } else {
    const step = Math.max(1, Math.min(steady.intervalDays, maximumWaitDays) / 8);
    let low = 0;
    let high = step;
    while (high < maximumWaitDays && !above(ageDays + high)) {
      low = high;
      high = Math.min(maximumWaitDays, high + step);
    }
    if (!above(ageDays + high)) {
      waitDays = maximumWaitDays;
    } else {
      while (high - low > 1e-9 * Math.max(1, high)) {
        const middle = 0.5 * (low + high);
        if (above(ageDays + middle)) high = middle;
        else low = middle;
      }
      waitDays = high;
    }
  }
  return (
    foulingCostBetween(economics, forecast, ageDays, ageDays + waitDays) -
    target * waitDays +
    steady.eventCost -
    target * steady.downtimeDays
  );
}
