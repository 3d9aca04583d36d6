import { chargedOutageDays } from "./charged-outage-days";
import { DAY_MS, WEEK_MS } from "./constants";
import { explainSolution } from "./explain-solution";
import { overlappingTurnaround } from "./overlapping-turnaround";
import type { CleaningPlan, InstanceSolution, PlanInput, PlannedCleaning, PlanningInstance, ThresholdMargin } from "./types";

/**
 * assemblePlan: a CleaningPlan from the input, its instance and the solution: dated cleanings with their window
 * (turnaround or routine), charged outage days and threshold margins, per-asset outcomes with explanations
 * (explainSolution), violations, excluded assets and totals.
 *
 * @param input the plan input (tags, dates, methods, thresholds, turnarounds)
 * @param instance buildPlanningInstance(input)
 * @param solution solvePlanningInstance(instance)
 */
export function assemblePlan(input: PlanInput, instance: PlanningInstance, solution: InstanceSolution): CleaningPlan {
  const startMs = input.horizon.startMs;
  const turnarounds = input.site.turnarounds ?? [];
  const byId = new Map(input.assets.map((asset) => [asset.id, asset]));
  const tagOf = (id: string): string => byId.get(id)?.tag ?? id;
  const cleanings: PlannedCleaning[] = [];
  for (const instanceAsset of instance.assets) {
    const asset = byId.get(instanceAsset.id);
    if (!asset) continue;
    const outageDays = asset.economics.method.outageDays;
    for (const startWeek of solution.startWeeks[asset.id] ?? []) {
      const cleaningStartMs = startMs + startWeek * WEEK_MS;
      const turnaround = overlappingTurnaround(startWeek, outageDays, turnarounds);
      const thresholds: ThresholdMargin[] = [];
      const crossing = asset.thresholdCrossing;
      if (crossing) {
        const entries: [ThresholdMargin["quantile"], number | null | undefined][] = [
          ["p10", crossing.p10Ms],
          ["p50", crossing.p50Ms],
          ["p90", crossing.p90Ms],
        ];
        for (const [quantile, crossingMs] of entries) {
          if (crossingMs !== null && crossingMs !== undefined) {
            thresholds.push({ quantile, crossingMs, marginDays: (crossingMs - cleaningStartMs) / DAY_MS });
          }
        }
      }
      cleanings.push({
        assetId: asset.id,
        tag: asset.tag,
        startWeek,
        startMs: cleaningStartMs,
        returnMs: cleaningStartMs + outageDays * DAY_MS,
        outageDays,
        method: asset.economics.method.name,
        locked: instanceAsset.lockedWeeks.includes(startWeek),
        chargedOutageDays: chargedOutageDays(startWeek, outageDays, turnarounds),
        window: turnaround ? { kind: "turnaround", name: turnaround.name } : { kind: "routine" },
        thresholds,
      });
    }
  }
  cleanings.sort((a, b) => a.startWeek - b.startWeek || a.tag.localeCompare(b.tag));
  const assets = explainSolution(instance, solution).map((outcome) => ({ ...outcome, tag: tagOf(outcome.assetId) }));
  const planCost = assets.reduce((sum, outcome) => sum + outcome.planCost, 0);
  const noCleaningCost = assets.reduce((sum, outcome) => sum + outcome.noCleaningCost, 0);
  return {
    horizon: { ...input.horizon },
    status: solution.status,
    solver: solution.solver,
    cleanings,
    assets,
    violations: solution.violations,
    excludedAssetIds: input.assets.filter((asset) => asset.excluded).map((asset) => asset.id),
    totals: { planCost, noCleaningCost, saving: noCleaningCost - planCost },
  };
}
