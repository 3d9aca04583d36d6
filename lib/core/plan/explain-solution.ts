import { individuallyBestSchedule } from "./individually-best-schedule";
import { planOccupancy } from "./plan-occupancy";
import { scheduleCost } from "./schedule-cost";
import { startWeekBlockers } from "./start-week-blockers";
import type { AssetPlanOutcome, BindingConstraint, InstanceSolution, PlanningInstance } from "./types";

/** Costs closer than this (relative) count as equal. */
const EQUAL_COST_TOLERANCE = 1e-9;

function blockerKey(blocker: BindingConstraint): string {
  return blocker.kind === "group-conflict" ? `${blocker.kind}:${blocker.group}` : blocker.kind;
}

/**
 * explainSolution: for every asset of a solved instance, its cost and saving against no cleaning, its individually
 * best schedule, the constraints that kept it from that schedule, and (single-cleaning assets without a lock) the
 * cheapest other feasible choice with the rest of the plan fixed.
 *
 * Logic: the individually best schedule ignores locks, earliest week, deadline and site constraints
 * (individuallyBestSchedule). For each of its start weeks missing from the plan, startWeekBlockers lists what stops a
 * move there with everyone else in place (lock, earliest spacing, deadline, blackout, full crew, group conflict);
 * a planned cleaning outside that schedule is explained by its lock, or by the deadline when the individually best
 * first cleaning comes after the deadline and after the planned one (cleaning earlier meets the deadline or, when it
 * cannot be met, shortens the lateness). If nothing applies, the move would be feasible: "equal-cost" when it costs the same (within 1e-9 relative), otherwise
 * "optimality-gap" (the solver stopped at its gap or time limit).
 *
 * @returns one outcome per instance asset (tag left to the caller), in instance order
 */
export function explainSolution(instance: PlanningInstance, solution: InstanceSolution): Omit<AssetPlanOutcome, "tag">[] {
  const weeks = instance.weeks;
  const occupancy = planOccupancy(instance, solution.startWeeks);
  return instance.assets.map((asset) => {
    const starts = solution.startWeeks[asset.id] ?? [];
    const planCost = scheduleCost(asset.costs, weeks, starts);
    const noCleaningCost = scheduleCost(asset.costs, weeks, []);
    const best = individuallyBestSchedule(asset, weeks);
    const same = best.startWeeks.length === starts.length && best.startWeeks.every((week, index) => week === starts[index]);
    const bindingConstraints: BindingConstraint[] = [];
    if (!same) {
      const found = new Map<string, BindingConstraint>();
      const collect = (list: BindingConstraint[]) => {
        for (const blocker of list) if (!found.has(blockerKey(blocker))) found.set(blockerKey(blocker), blocker);
      };
      best.startWeeks.forEach((week, index) => {
        if (!starts.includes(week)) collect(startWeekBlockers(instance, asset, week, occupancy, starts, index === 0));
      });
      const bestFirst = best.startWeeks[0];
      starts.forEach((week, index) => {
        if (best.startWeeks.includes(week)) return;
        if (asset.lockedWeeks.includes(week)) collect([{ kind: "lock" }]);
        else if (
          index === 0 &&
          asset.deadlineWeek !== null &&
          (bestFirst ?? weeks) > asset.deadlineWeek &&
          week < (bestFirst ?? weeks)
        ) {
          collect([{ kind: "deadline", deadlineWeek: asset.deadlineWeek }]);
        }
      });
      if (found.size === 0) {
        const equal = Math.abs(planCost - best.cost) <= EQUAL_COST_TOLERANCE * Math.max(1, Math.abs(planCost));
        found.set("tie", equal ? { kind: "equal-cost" } : { kind: "optimality-gap" });
      }
      bindingConstraints.push(...found.values());
    }

    let alternative: AssetPlanOutcome["alternative"] = null;
    if (asset.maximumCleanings === 1 && asset.lockedWeeks.length === 0) {
      const current = starts[0] ?? null;
      const options: (number | null)[] = [null, ...Array.from({ length: weeks }, (_, week) => week)];
      for (const option of options) {
        if (option === current) continue;
        if (startWeekBlockers(instance, asset, option, occupancy, starts, true).length > 0) continue;
        const costIncrease = scheduleCost(asset.costs, weeks, option === null ? [] : [option]) - planCost;
        if (!alternative || costIncrease < alternative.costIncrease) alternative = { week: option, costIncrease };
      }
    }

    return {
      assetId: asset.id,
      startWeeks: [...starts],
      planCost,
      noCleaningCost,
      savingVsNoCleaning: noCleaningCost - planCost,
      individuallyBestWeeks: best.startWeeks,
      individuallyBestCost: best.cost,
      bindingConstraints,
      alternative,
      earliestWeek: asset.earliestWeek,
      deadlineWeek: asset.deadlineWeek,
    };
  });
}
