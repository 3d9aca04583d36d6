import { PlanInputError } from "./errors";
import type { PlanOptions } from "./types";

/** Planner options with every default filled in. */
export type ResolvedPlanOptions = Required<PlanOptions>;

/**
 * resolvePlanOptions: the planner's defaults in one place: deadline at the P10 threshold crossing, steady-cycle
 * end-of-horizon charge, 60 s time limit, relative gap 1e-4 (HiGHS's own default).
 *
 * @throws PlanInputError for a non-positive time limit or a negative gap
 */
export function resolvePlanOptions(options: PlanOptions = {}): ResolvedPlanOptions {
  const resolved: ResolvedPlanOptions = {
    deadlineQuantile: options.deadlineQuantile ?? "p10",
    endOfHorizon: options.endOfHorizon ?? "steady-cycle",
    timeLimitSeconds: options.timeLimitSeconds ?? 60,
    relativeGap: options.relativeGap ?? 1e-4,
  };
  if (!(resolved.timeLimitSeconds > 0)) {
    throw new PlanInputError("timeLimitSeconds", `time limit must be positive, got ${resolved.timeLimitSeconds} s`);
  }
  if (!(resolved.relativeGap >= 0) || !Number.isFinite(resolved.relativeGap)) {
    throw new PlanInputError("relativeGap", `relative gap must be a finite number >= 0, got ${resolved.relativeGap}`);
  }
  return resolved;
}
