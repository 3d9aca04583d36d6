import { optimalCleaningInterval, type CleaningIntervalOptions } from "./optimal-cleaning-interval";
import { EconomicsInputError } from "./errors";
import type { AssetEconomics, CleaningMethod, DutyLossForecast, OptimalCleaningInterval } from "./types";

/** Result of {@link optimalCleaningMethod}. */
export interface CleaningMethodChoice {
  /** The method with the lowest steady mean cost J*. */
  best: { method: CleaningMethod; interval: OptimalCleaningInterval };
  /** Every method with its optimum, in the order given. */
  methods: { method: CleaningMethod; interval: OptimalCleaningInterval }[];
}

/**
 * optimalCleaningMethod: the cleaning method (cost and outage) with the lowest steady mean cost per day.
 *
 * Formula: choose m minimising J*_m = min over τ of [C_m + ∫₀^τ c dt]/(τ + τd,m) (optimalCleaningInterval per method).
 * Validity: every method returns the exchanger to the same clean state (the clean-state forecast is shared).
 * Source: FIELD-NOTES §5 cycle model applied per method; comparison of J* is common practice.
 *
 * @param economics asset economics; its `method` is replaced by each candidate
 * @param methods candidate methods (at least one)
 * @param forecast duty loss over a cycle started clean
 * @throws EconomicsInputError when no method is given
 */
export function optimalCleaningMethod(
  economics: AssetEconomics,
  methods: readonly CleaningMethod[],
  forecast: DutyLossForecast,
  options: Omit<CleaningIntervalOptions, "eventCost"> = {},
): CleaningMethodChoice {
  if (methods.length === 0) {
    throw new EconomicsInputError("cleaning methods", "at least one cleaning method is needed");
  }
  const evaluated = methods.map((method) => ({
    method,
    interval: optimalCleaningInterval({ ...economics, method }, forecast, options),
  }));
  let best = evaluated[0] as (typeof evaluated)[number];
  for (const candidate of evaluated) {
    if (candidate.interval.averageCostPerDay < best.interval.averageCostPerDay) best = candidate;
  }
  return { best, methods: evaluated };
}
