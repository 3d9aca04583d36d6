import type { AssetCostTable } from "./types";

/**
 * scheduleCost: cost over the horizon of one asset's cleaning schedule, from its cost table.
 *
 * Formula: none: currentCycle[W] + currentEndCharge; starts s1 < … < sk: currentCycle[s1] + Σ event[si]
 * + Σ newCycle[s(i+1) − si] + newCycle[W − sk] + newEndCharge[W − sk].
 * Validity: starts ascending integers in [0, W − 1].
 *
 * @param costs the asset's cost table
 * @param weeks W
 * @param startWeeks ascending start weeks (empty: no cleaning)
 */
export function scheduleCost(costs: AssetCostTable, weeks: number, startWeeks: readonly number[]): number {
  const value = (array: readonly number[], index: number): number => {
    const entry = array[index];
    if (entry === undefined) throw new RangeError(`scheduleCost: index ${index} outside the cost table`);
    return entry;
  };
  if (startWeeks.length === 0) return value(costs.currentCycle, weeks) + costs.currentEndCharge;
  let total = value(costs.currentCycle, startWeeks[0] as number);
  for (let index = 0; index < startWeeks.length; index += 1) {
    const start = startWeeks[index] as number;
    total += value(costs.event, start);
    const next = startWeeks[index + 1];
    total += next === undefined ? value(costs.newCycle, weeks - start) + value(costs.newEndCharge, weeks - start) : value(costs.newCycle, next - start);
  }
  return total;
}
