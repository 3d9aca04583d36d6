import { cleaningEventCost } from "./cleaning-event-cost";
import { foulingCostBetween } from "./fouling-cost-between";
import type { AssetEconomics, DutyLossForecast } from "./types";

/** Options of {@link averageCostRate}. */
export interface AverageCostRateOptions {
  /** Count the outage in the cycle length (denominator τ + τd); default true. */
  includeDowntime?: boolean;
  /** Cost C of one cleaning event; default cleaningEventCost(economics) (whole outage charged). */
  eventCost?: number;
}

/**
 * averageCostRate: mean cost per day J(τ) of repeating cycles of τ days in service followed by one cleaning.
 *
 * Formula: J(τ) = [C + ∫₀^τ c(t) dt] / (τ + τd), τd = outage days (or 0 without downtime).
 * Validity: τ > 0; identical cycles (the exchanger returns to the same clean state); no fouling cost during the
 * outage (its cost is inside C).
 * Source: the cleaning-cycle cost model of FIELD-NOTES §5 (literature line: Epstein; Ma & Epstein 1981,
 * Can. J. Chem. Eng. 59:631; attribution from memory).
 *
 * @param economics asset economics
 * @param forecast duty loss over a cycle started clean
 * @param cycleDays τ, days in service (> 0)
 * @returns site currency per day
 */
export function averageCostRate(
  economics: AssetEconomics,
  forecast: DutyLossForecast,
  cycleDays: number,
  options: AverageCostRateOptions = {},
): number {
  const eventCost = options.eventCost ?? cleaningEventCost(economics);
  const downtimeDays = (options.includeDowntime ?? true) ? economics.method.outageDays : 0;
  return (eventCost + foulingCostBetween(economics, forecast, 0, cycleDays)) / (cycleDays + downtimeDays);
}
