import type { Highs } from "highs";
import { assemblePlan } from "./assemble-plan";
import { buildPlanningInstance } from "./build-planning-instance";
import { resolvePlanOptions } from "./resolve-plan-options";
import { solvePlanningInstance } from "./solve-planning-instance";
import type { CleaningPlan, PlanInput, PlanOptions } from "./types";

/**
 * planCleanings: the fleet cleaning plan: builds the week-level instance from economics and forecasts
 * (buildPlanningInstance), solves it with HiGHS (solvePlanningInstance) and explains it (assemblePlan).
 *
 * @param highs a loaded HiGHS runtime (await highsLoader() once per process)
 * @param input horizon, site calendar and assets
 * @param options deadline quantile, end-of-horizon charge, time limit, gap (resolvePlanOptions)
 * @throws PlanInputError on malformed input; infeasibilities are reported in plan.violations instead
 */
export function planCleanings(highs: Highs, input: PlanInput, options: PlanOptions = {}): CleaningPlan {
  const resolved = resolvePlanOptions(options);
  const instance = buildPlanningInstance(input, resolved);
  const solution = solvePlanningInstance(highs, instance, {
    timeLimitSeconds: resolved.timeLimitSeconds,
    relativeGap: resolved.relativeGap,
  });
  return assemblePlan(input, instance, solution);
}
