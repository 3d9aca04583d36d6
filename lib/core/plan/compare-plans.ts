import { PlanInputError } from "./errors";
import type { CleaningPlan } from "./types";

/** One asset whose schedule differs between two plans. */
export interface ScheduleChange {
  assetId: string;
  tag: string;
  /** moved: cleaned in both plans at different weeks; added: only in the second; removed: only in the first. */
  change: "moved" | "added" | "removed";
  fromWeeks: number[];
  toWeeks: number[];
  /** Second plan's cost of this asset minus the first's. */
  costDifference: number;
}

/** Result of {@link comparePlans}. */
export interface PlanComparison {
  changes: ScheduleChange[];
  unchangedAssets: number;
  /** Second plan's total cost minus the first's (each in its own prices). */
  costDifference: number;
  savingDifference: number;
  /** Assets planned in only one of the two plans. */
  onlyInFirst: string[];
  onlyInSecond: string[];
}

/**
 * comparePlans: what moved between two plans of the same horizon (e.g. before and after a re-plan) and the cost
 * difference, per asset and in total.
 *
 * @throws PlanInputError when the horizons differ (weeks would not be comparable)
 */
export function comparePlans(first: CleaningPlan, second: CleaningPlan): PlanComparison {
  if (first.horizon.startMs !== second.horizon.startMs || first.horizon.weeks !== second.horizon.weeks) {
    throw new PlanInputError("horizon", "plans with different horizons cannot be compared week by week");
  }
  const secondById = new Map(second.assets.map((outcome) => [outcome.assetId, outcome]));
  const firstIds = new Set(first.assets.map((outcome) => outcome.assetId));
  const changes: ScheduleChange[] = [];
  let unchangedAssets = 0;
  for (const before of first.assets) {
    const after = secondById.get(before.assetId);
    if (!after) continue;
    const same = before.startWeeks.length === after.startWeeks.length && before.startWeeks.every((week, index) => week === after.startWeeks[index]);
    if (same) {
      unchangedAssets += 1;
      continue;
    }
    changes.push({
      assetId: before.assetId,
      tag: after.tag,
      change: before.startWeeks.length === 0 ? "added" : after.startWeeks.length === 0 ? "removed" : "moved",
      fromWeeks: [...before.startWeeks],
      toWeeks: [...after.startWeeks],
      costDifference: after.planCost - before.planCost,
    });
  }
  return {
    changes,
    unchangedAssets,
    costDifference: second.totals.planCost - first.totals.planCost,
    savingDifference: second.totals.saving - first.totals.saving,
    onlyInFirst: first.assets.filter((outcome) => !secondById.has(outcome.assetId)).map((outcome) => outcome.assetId),
    onlyInSecond: second.assets.filter((outcome) => !firstIds.has(outcome.assetId)).map((outcome) => outcome.assetId),
  };
}
