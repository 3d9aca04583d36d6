import {
  cleaningEventCost,
  foulingCostBetween,
  optimalCleaningInterval,
  relativeCycleValue,
  type OptimalCleaningInterval,
} from "../economics";
import { chargedOutageDays } from "./charged-outage-days";
import { DAY_MS, DAYS_PER_WEEK } from "./constants";
import type { AssetCostTable, PlanAsset, PlanningHorizon, TurnaroundWindow } from "./types";

/** What the cost table depends on beyond the asset. */
export interface AssetCostContext {
  horizon: PlanningHorizon;
  turnarounds: readonly TurnaroundWindow[];
  endOfHorizon: "steady-cycle" | "none";
}

/**
 * assetCostTable: the week-level cost table of one asset (see AssetCostTable) from its economics and forecasts.
 *
 * Formula (days from the horizon start, a0 = age of the running cycle at the start, d = outage days, T = 7W):
 * currentCycle[w] = ∫ c_current over ages [a0, a0 + 7w]; event[w] = cleaningEventCost(d outside turnarounds);
 * newCycle[g] = ∫₀^max(0, 7g − d) c_clean; with the steady-cycle end charge, currentEndCharge = h_current(a0 + T),
 * newEndCharge[g] = h_clean(7g − d) if 7g >= d, else −J*·(d − 7g) (the rest of the outage still to run), where h is
 * relativeCycleValue against the clean-state optimum (τ*, J*) of optimalCleaningInterval.
 * Validity: as the economics functions; a running cycle that started after the horizon start (a0 < 0) costs from
 * its start. Source: FIELD-NOTES §5 cycle cost model; end charge per relativeCycleValue (Puterman 1994, from memory).
 *
 * @returns the cost table and the clean-state optimum it used
 */
export function assetCostTable(
  asset: PlanAsset,
  context: AssetCostContext,
): { costs: AssetCostTable; steady: OptimalCleaningInterval } {
  const { economics, currentCycle: current, cleanCycle: clean } = asset;
  const weeks = context.horizon.weeks;
  const outageDays = economics.method.outageDays;
  const initialAgeDays = (context.horizon.startMs - asset.lastReturnToServiceMs) / DAY_MS;
  const steady = optimalCleaningInterval(economics, clean);
  const withEndCharge = context.endOfHorizon === "steady-cycle";

  const currentCycle: number[] = [0];
  let total = 0;
  for (let week = 1; week <= weeks; week += 1) {
    const from = Math.max(0, initialAgeDays + DAYS_PER_WEEK * (week - 1));
    const to = Math.max(0, initialAgeDays + DAYS_PER_WEEK * week);
    total += foulingCostBetween(economics, current, from, to);
    currentCycle.push(total);
  }
  const currentEndCharge = withEndCharge
    ? relativeCycleValue(economics, current, steady, Math.max(0, initialAgeDays + DAYS_PER_WEEK * weeks))
    : 0;

  const event: number[] = [];
  for (let week = 0; week < weeks; week += 1) {
    event.push(cleaningEventCost(economics, chargedOutageDays(week, outageDays, context.turnarounds)));
  }

  const newCycle: number[] = [];
  const newEndCharge: number[] = [];
  let cumulative = 0;
  let previousAge = 0;
  for (let gap = 0; gap <= weeks; gap += 1) {
    const age = DAYS_PER_WEEK * gap - outageDays;
    if (age > 0) {
      cumulative += foulingCostBetween(economics, clean, previousAge, age);
      previousAge = age;
    }
    newCycle.push(cumulative);
    newEndCharge.push(
      !withEndCharge ? 0 : age >= 0 ? relativeCycleValue(economics, clean, steady, age) : steady.averageCostPerDay * age,
    );
  }
  return { costs: { currentCycle, currentEndCharge, event, newCycle, newEndCharge }, steady };
}
