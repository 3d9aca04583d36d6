import type { Highs } from "highs";
import { deadlineMiss } from "./deadline-miss";
import { buildScheduleModel, type ScheduleModel, type ScheduleModelSpec } from "./build-schedule-model";
import { greedyCostSchedule } from "./greedy-cost-schedule";
import { greedyDeadlineSchedule } from "./greedy-deadline-schedule";
import { lockedOccupancy } from "./locked-occupancy";
import { planOccupancy } from "./plan-occupancy";
import { runHighsModel, type HighsRun } from "./run-highs-model";
import { scheduleCost } from "./schedule-cost";
import { startWeekBlockers } from "./start-week-blockers";
import type { BindingConstraint, InstanceSolution, PlanningInstance, PlanViolation, SolverPhase } from "./types";

/** Options of {@link solvePlanningInstance}. */
export interface SolveInstanceOptions {
  /** Time limit over all phases, s; default 60. */
  timeLimitSeconds?: number;
  /** Relative MIP gap for the cost phases; default 1e-4. */
  relativeGap?: number;
  /**
   * HiGHS presolve; default "off": the model is built with only candidate columns and non-redundant rows, and on the
   * 500-asset benchmark presolve cost more time than it saved (docs/planner.md).
   */
  presolve?: "off" | "choose" | "on";
  /**
   * Accept a schedule rounded from the LP relaxation when it is within the gap of the relaxation's bound, without
   * branch and cut; default true. False always runs HiGHS's MIP solver (started from the rounding).
   */
  lpRounding?: boolean;
}

/** Absolute gap on money at which a plan counts as optimal (HiGHS's default mip_abs_gap). */
const MONEY_ABSOLUTE_GAP = 1e-6;

/** Distinct blockers by kind (and group), first occurrence kept. */
function distinctBlockers(blockers: readonly BindingConstraint[]): BindingConstraint[] {
  const seen = new Map<string, BindingConstraint>();
  for (const blocker of blockers) {
    const key = blocker.kind === "group-conflict" ? `${blocker.kind}:${blocker.group}` : blocker.kind;
    if (!seen.has(key)) seen.set(key, blocker);
  }
  return [...seen.values()];
}

/**
 * solvePlanningInstance: the cheapest cleaning schedule of an instance with HiGHS, in up to three phases.
 *
 * 1. cost: minimise the plan cost with hard deadlines (first cleaning by the deadline week).
 * 2. lateness (only if phase 1 is infeasible or finds nothing): with deadlines soft, over the assets that have a
 *    deadline or a lock (the others can stay uncleaned), minimise first the number of assets that miss their
 *    deadline, then the total weeks late (deadlineMiss; one weighted integer objective solved to optimality), in at
 *    most half the remaining time, starting from an earliest-deadline-first schedule (greedyDeadlineSchedule).
 * 3. cost-within-lateness: minimise the plan cost with at most the phase-2 misses and weeks late (two rows; with the
 *    misses at their minimum this is the lexicographic order), starting from the best of: the LP rounding, the LP
 *    rounding with the assets of phase 2 kept in their phase-2 weeks, and the phase-2 schedule completed greedily
 *    with the other assets (greedyCostSchedule).
 * Every missed deadline is reported as a "deadline" violation with the constraints that blocked the weeks up to it;
 * lock conflicts (lockedOccupancy) are reported as they are. Without any solution the result holds the locks only.
 *
 * @param highs a loaded HiGHS runtime (await highsLoader())
 * @param instance planning instance (buildPlanningInstance, or hand-made)
 * @returns start weeks per asset, status, solver report and violations
 */
export function solvePlanningInstance(highs: Highs, instance: PlanningInstance, options: SolveInstanceOptions = {}): InstanceSolution {
  const timeLimitSeconds = options.timeLimitSeconds ?? 60;
  const relativeGap = options.relativeGap ?? 1e-4;
  const presolve = options.presolve ?? "off";
  const lpRounding = options.lpRounding ?? true;
  const locked = lockedOccupancy(instance);
  const phases: SolverPhase[] = [];
  const used = () => phases.reduce((sum, phase) => sum + phase.seconds, 0);

  const solvePhase = (
    name: SolverPhase["name"],
    phaseInstance: PlanningInstance,
    spec: ScheduleModelSpec,
    limits: { relative: number; absolute: number; seconds: number },
    fallbackStart?: Record<string, number[]>,
    keepInRounding?: Record<string, number[]>,
  ): { built: ScheduleModel; result: HighsRun } => {
    const built = buildScheduleModel(phaseInstance, locked, spec);
    const record = (result: HighsRun, method: SolverPhase["method"], seconds: number) => {
      phases.push({ name, method, status: result.status, seconds, columns: built.model.numCols, rows: built.model.numRows });
      return { built, result };
    };
    // 1. LP relaxation: a proven bound, and a guide for rounding.
    const { integrality: _integrality, ...relaxation } = built.model;
    const lp = runHighsModel(highs, relaxation, { timeLimitSeconds: limits.seconds, relativeGap: limits.relative, presolve });
    if (lp.infeasible) return record(lp, "lp-relaxation", lp.seconds);
    // 2. Round it; if the rounded schedule is within the gap of the bound, it is the answer.
    const objectiveOf = (schedule: Record<string, number[]> | null | undefined): { values: Float64Array; objective: number } | null => {
      const values = schedule ? built.encode(schedule) : null;
      if (!values) return null;
      let objective = 0;
      values.forEach((entry, index) => (objective += entry * (built.model.colCost[index] as number)));
      return { values, objective };
    };
    const candidates = lp.optimal
      ? [objectiveOf(built.round(lp.columnValues)), keepInRounding ? objectiveOf(built.round(lp.columnValues, keepInRounding)) : null]
      : [];
    const rounded = candidates.reduce<ReturnType<typeof objectiveOf>>(
      (best, candidate) => (candidate && (!best || candidate.objective < best.objective) ? candidate : best),
      null,
    );
    const fallback = objectiveOf(fallbackStart);
    const start = rounded && (!fallback || rounded.objective <= fallback.objective) ? rounded : fallback;
    if (lpRounding && lp.optimal && start) {
      const difference = start.objective - lp.objective;
      if (difference <= limits.absolute || difference <= limits.relative * Math.abs(start.objective)) {
        const gap = Math.abs(start.objective) > 0 ? Math.max(0, difference) / Math.abs(start.objective) : 0;
        const accepted: HighsRun = {
          ...lp,
          status: "Optimal",
          optimal: true,
          hasSolution: true,
          columnValues: start.values,
          objective: start.objective,
          dualBound: lp.objective,
          gap,
        };
        return record(accepted, "lp-rounding", lp.seconds);
      }
    }
    // 3. Branch and cut from the best start.
    const result = runHighsModel(highs, built.model, {
      timeLimitSeconds: limits.seconds - lp.seconds,
      relativeGap: limits.relative,
      absoluteGap: limits.absolute,
      start: start?.values ?? null,
      presolve,
    });
    return record(result, "branch-and-cut", lp.seconds + result.seconds);
  };

  let final: { built: ScheduleModel; result: HighsRun; minimisedCost: boolean } | null = null;
  let leastLatenessProven = true;
  const costPhase = solvePhase(
    "cost",
    instance,
    { deadlines: "hard", objective: "cost" },
    { relative: relativeGap, absolute: MONEY_ABSOLUTE_GAP, seconds: timeLimitSeconds },
  );
  if (costPhase.result.hasSolution) {
    final = { ...costPhase, minimisedCost: true };
  } else {
    // Least lateness: only assets with a deadline (or a lock) matter; every other asset can stay uncleaned, which
    // frees crews and group slots, so the optimum of this smaller model is the optimum of the whole.
    const deadlineInstance: PlanningInstance = {
      ...instance,
      assets: instance.assets.filter((asset) => asset.deadlineWeek !== null || asset.lockedWeeks.length > 0),
    };
    const latenessPhase = solvePhase(
      "lateness",
      deadlineInstance,
      { deadlines: "soft", objective: "lateness" },
      { relative: 0, absolute: 1 - 1e-6, seconds: Math.max(0.5 * (timeLimitSeconds - used()), 1e-3) },
      greedyDeadlineSchedule(deadlineInstance, locked),
    );
    leastLatenessProven = latenessPhase.result.optimal;
    if (latenessPhase.result.hasSolution) {
      const leastLate = latenessPhase.built.decode(latenessPhase.result.columnValues);
      const limit = { missed: 0, weeksLate: 0 };
      for (const asset of deadlineInstance.assets) {
        const miss = deadlineMiss(asset.deadlineWeek, instance.weeks, leastLate[asset.id]?.[0] ?? null);
        limit.missed += miss.missed;
        limit.weeksLate += miss.weeksLate;
      }
      const within = solvePhase(
        "cost-within-lateness",
        instance,
        { deadlines: "soft", objective: "cost", latenessLimit: limit },
        { relative: relativeGap, absolute: MONEY_ABSOLUTE_GAP, seconds: timeLimitSeconds - used() },
        greedyCostSchedule(instance, locked, leastLate) ?? leastLate,
        leastLate,
      );
      final = within.result.hasSolution ? { ...within, minimisedCost: true } : { ...latenessPhase, minimisedCost: false };
    }
  }

  const startWeeks: Record<string, number[]> = {};
  for (const asset of instance.assets) startWeeks[asset.id] = [...asset.lockedWeeks];
  if (final) Object.assign(startWeeks, final.built.decode(final.result.columnValues));
  const objective = instance.assets.reduce(
    (sum, asset) => sum + scheduleCost(asset.costs, instance.weeks, startWeeks[asset.id] ?? []),
    0,
  );

  const occupancy = planOccupancy(instance, startWeeks);
  const violations: PlanViolation[] = [...locked.violations];
  for (const asset of instance.assets) {
    const deadline = asset.deadlineWeek;
    const starts = startWeeks[asset.id] ?? [];
    const first = starts[0];
    if (deadline === null || (first !== undefined && first <= deadline)) continue;
    const blockers: BindingConstraint[] = [];
    for (let week = 0; week <= deadline; week += 1) {
      blockers.push(...startWeekBlockers(instance, asset, week, occupancy, starts, true));
    }
    violations.push({
      kind: "deadline",
      assetIds: [asset.id],
      weeks: [deadline],
      blockedBy: distinctBlockers(blockers.filter((blocker) => blocker.kind !== "deadline")),
      message:
        first === undefined
          ? `${asset.label ?? asset.id} cannot be cleaned by its deadline week ${deadline} and is not cleaned in the horizon`
          : `${asset.label ?? asset.id} misses its deadline week ${deadline}: its first cleaning is planned for week ${first}`,
    });
  }

  const last = phases[phases.length - 1];
  return {
    status: !final ? "no-solution" : final.result.optimal && final.minimisedCost && leastLatenessProven ? "optimal" : "feasible",
    startWeeks,
    solver: {
      status: last?.status ?? "Not Set",
      objective,
      bestBound: final?.minimisedCost ? final.built.objectiveOffset + final.result.dualBound : null,
      gap: final?.minimisedCost ? final.result.gap : null,
      solveSeconds: used(),
      phases,
    },
    violations,
  };
}
