import { scheduleCost } from "./schedule-cost";
import type { InstanceAsset } from "./types";

/**
 * individuallyBestSchedule: the cheapest schedule of one asset on its own, ignoring locks, earliest week, deadline
 * and every site constraint, keeping only its maximum number of cleanings and their spacing.
 *
 * Method: dynamic programming over the last start week, best[k][w] = min over u <= w − spacing of
 * best[k−1][u] + newCycle[w − u] + event[w], best[1][w] = currentCycle[w] + event[w]; O(K·W²). Ties go to fewer
 * cleanings, then to earlier weeks.
 * Source: shortest path in an acyclic graph by dynamic programming (Bellman 1958, Q. Appl. Math. 16:87; from memory).
 *
 * @param asset the asset (cost table, K, spacing)
 * @param weeks W
 * @returns start weeks (empty = no cleaning) and their cost
 */
export function individuallyBestSchedule(asset: InstanceAsset, weeks: number): { startWeeks: number[]; cost: number } {
  const costs = asset.costs;
  let best = { startWeeks: [] as number[], cost: scheduleCost(costs, weeks, []) };
  // pathCost[w]: cheapest cost up to and including the event of a cleaning starting in week w, with `count` cleanings.
  let pathCost: number[] = [];
  let previousOf: number[][] = [];
  for (let count = 1; count <= asset.maximumCleanings; count += 1) {
    const nextCost: number[] = [];
    const nextPrevious: number[][] = [];
    for (let week = 0; week < weeks; week += 1) {
      let value = Infinity;
      let path: number[] = [];
      if (count === 1) {
        value = (costs.currentCycle[week] as number) + (costs.event[week] as number);
        path = [week];
      } else {
        for (let before = 0; before <= week - asset.spacingWeeks; before += 1) {
          const candidate = (pathCost[before] as number) + (costs.newCycle[week - before] as number) + (costs.event[week] as number);
          if (candidate < value) {
            value = candidate;
            path = [...(previousOf[before] as number[]), week];
          }
        }
      }
      nextCost.push(value);
      nextPrevious.push(path);
      if (Number.isFinite(value)) {
        const total = value + (costs.newCycle[weeks - week] as number) + (costs.newEndCharge[weeks - week] as number);
        if (total < best.cost) best = { startWeeks: path, cost: total };
      }
    }
    pathCost = nextCost;
    previousOf = nextPrevious;
  }
  return best;
}
