/**
 * Types of the fleet cleaning planner.
 *
 * Time: instants in epoch ms (UTC); the horizon is W whole weeks counted from a start date, week w covering days
 * [7w, 7w + 7) after it; a cleaning "in week w" starts at the beginning of week w. Durations of outages in days.
 * Money: plain numbers in the site currency (as in lib/core/economics), no rounding inside the core.
 */
import type { AssetEconomics, DutyLossForecast } from "../economics";

// ---------------------------------------------------------------------------------------------------------------
// Input filled by the caller (database + fouling forecast)
// ---------------------------------------------------------------------------------------------------------------

/** The planning horizon. */
export interface PlanningHorizon {
  /** 00:00 UTC of the first planning day (a calendar date, e.g. a Monday), epoch ms. */
  startMs: number;
  /** Number of weeks, 1..105 (two years). */
  weeks: number;
}

/** A plant turnaround: the plant is down, so a cleaning inside it costs no lost production or bypass energy. */
export interface TurnaroundWindow {
  name: string;
  /** First and last week of the window (inclusive), week indices of the horizon. */
  firstWeek: number;
  lastWeek: number;
}

/** Exchangers of which at most one may be out of service in any week (same train, shared bypass). */
export interface ExclusionGroup {
  name: string;
  assetIds: readonly string[];
}

/** Site-wide constraints. */
export interface SiteCalendar {
  /**
   * Cleanings that may be in progress in one week (crews): one number for every week, or one per week.
   * A cleaning occupies ceil(outage days / 7) consecutive weeks from its start week.
   */
  crewCapacity: number | readonly number[];
  /** Weeks in which no cleaning may start or run (peak season, permits, site events). */
  blackoutWeeks?: readonly number[];
  turnarounds?: readonly TurnaroundWindow[];
  groups?: readonly ExclusionGroup[];
}

/** Dates at which the forecast duty first falls below the asset's threshold, by forecast quantile. */
export interface ThresholdCrossing {
  /** 10 % of forecast paths have crossed by then (the early, cautious date), epoch ms; null: not within the forecast. */
  p10Ms: number | null;
  /** Median crossing, epoch ms; null: not within the forecast. */
  p50Ms: number | null;
  /** 90 % of paths have crossed by then, epoch ms; null or absent: not within the forecast. */
  p90Ms?: number | null;
}

/** One exchanger to plan. */
export interface PlanAsset {
  /** Stable identifier (database id as text). */
  id: string;
  /** Plant tag shown to people, e.g. "E-1203A". */
  tag: string;
  economics: AssetEconomics;
  /** Duty loss of the cycle the exchanger is in, against days since lastReturnToServiceMs. */
  currentCycle: DutyLossForecast;
  /** Duty loss of a new cycle after a cleaning (the clean-state model), against days since return to service. */
  cleanCycle: DutyLossForecast;
  /** End of the last cleaning (or commissioning), epoch ms. */
  lastReturnToServiceMs: number;
  /**
   * Minimum days in service between a return to service and the next cleaning start (also between cleanings planned
   * inside the horizon); default 0.
   */
  minimumDaysBetweenCleanings?: number;
  /** Most cleanings of this asset in the horizon, >= 1; default 1. */
  maximumCleanings?: number;
  /** Forecast threshold crossings; the chosen quantile (P10 by default) sets the latest allowed start week. */
  thresholdCrossing?: ThresholdCrossing | null;
  /** Start weeks fixed by the planner (at most maximumCleanings, respecting the spacing). */
  lockedWeeks?: readonly number[];
  /** Leave this asset out of the plan (no decision is made for it). */
  excluded?: boolean;
}

/** Options of the planner; defaults resolved once (resolvePlanOptions). */
export interface PlanOptions {
  /** Forecast quantile whose threshold crossing is the deadline; default "p10". */
  deadlineQuantile?: "p10" | "p50" | "p90";
  /**
   * Charge for the state each exchanger is left in at the horizon end: "steady-cycle" (default) adds the relative
   * value h(age) of relativeCycleValue, so the plan is not biased against cleaning late in the horizon; "none"
   * counts costs inside the horizon only.
   */
  endOfHorizon?: "steady-cycle" | "none";
  /** Time limit of the whole solve (all phases), s; default 60. */
  timeLimitSeconds?: number;
  /** Relative MIP gap at which HiGHS stops, on the saving against doing nothing; default 1e-4. */
  relativeGap?: number;
}

/** Everything the planner needs. */
export interface PlanInput {
  horizon: PlanningHorizon;
  site: SiteCalendar;
  assets: readonly PlanAsset[];
}

// ---------------------------------------------------------------------------------------------------------------
// Week-level instance: what the mixed-integer programme sees
// ---------------------------------------------------------------------------------------------------------------

/**
 * Costs of one asset over the horizon, from which the cost of any schedule follows (scheduleCost):
 * no cleaning: currentCycle[W] + currentEndCharge;
 * cleanings starting in weeks s1 < … < sk: currentCycle[s1] + Σ event[si] + Σ newCycle[s(i+1) − si]
 * + newCycle[W − sk] + newEndCharge[W − sk].
 */
export interface AssetCostTable {
  /** [w], w = 0..W: fouling cost of the running cycle from the horizon start to the start of week w. */
  currentCycle: readonly number[];
  /** Charge for the running cycle left uncleaned at the horizon end. */
  currentEndCharge: number;
  /** [w], w = 0..W−1: cost of one cleaning event started in week w (method + outage outside turnarounds). */
  event: readonly number[];
  /** [g], g = 0..W: fouling cost of a new cycle from the return to service after a cleaning that started g weeks
   *  earlier, up to the start of week (start + g). */
  newCycle: readonly number[];
  /** [g], g = 0..W: end-of-horizon charge when the last cleaning started g weeks before the horizon end. */
  newEndCharge: readonly number[];
}

/** One asset of a planning instance. */
export interface InstanceAsset {
  id: string;
  /** Name used in messages (the plant tag); default the id. */
  label?: string;
  /** Weeks occupied by one cleaning, >= 1. */
  durationWeeks: number;
  /** First week an unlocked cleaning may start (spacing after the previous cleaning); may be >= W. */
  earliestWeek: number;
  /** Latest start week of the first cleaning (threshold deadline); null: no deadline inside the horizon. */
  deadlineWeek: number | null;
  /** K >= 1. */
  maximumCleanings: number;
  /** Minimum weeks between successive starts, >= durationWeeks. */
  spacingWeeks: number;
  lockedWeeks: readonly number[];
  costs: AssetCostTable;
}

/** A planning instance in weeks and money only. */
export interface PlanningInstance {
  weeks: number;
  /** Per week, length W, integers >= 0. */
  crewCapacity: readonly number[];
  blackoutWeeks: readonly number[];
  groups: readonly ExclusionGroup[];
  assets: readonly InstanceAsset[];
}

// ---------------------------------------------------------------------------------------------------------------
// Results
// ---------------------------------------------------------------------------------------------------------------

/** A constraint that kept an asset from a week (or from its individually best schedule). */
export type BindingConstraint =
  | { kind: "crew-capacity"; week: number }
  | { kind: "blackout"; week: number }
  | { kind: "group-conflict"; week: number; group: string; assetIds: string[] }
  | { kind: "lock" }
  | { kind: "earliest-spacing"; earliestWeek: number }
  | { kind: "deadline"; deadlineWeek: number }
  /** Moving would be feasible and cost the same. */
  | { kind: "equal-cost" }
  /** Moving would be feasible and cheaper: the solver stopped within its gap or time limit. */
  | { kind: "optimality-gap" };

/** A rule the returned plan does not keep, reported instead of being silently broken. */
export interface PlanViolation {
  /**
   * deadline: the first cleaning starts after the deadline week (or there is none);
   * lock-blackout / lock-before-earliest: a locked cleaning overrides a blackout or the spacing;
   * lock-capacity / lock-group: locked cleanings alone exceed the crews or put two of a group out together.
   */
  kind: "deadline" | "lock-blackout" | "lock-before-earliest" | "lock-capacity" | "lock-group";
  assetIds: string[];
  weeks: number[];
  /** For "deadline": why no week up to the deadline was possible. */
  blockedBy: BindingConstraint[];
  message: string;
}

/** Solver statistics of one HiGHS run. */
export interface SolverPhase {
  /** cost: hard deadlines; lateness: least lateness; cost-within-lateness: cheapest plan with that lateness. */
  name: "cost" | "lateness" | "cost-within-lateness";
  /**
   * lp-relaxation: the relaxation was infeasible (so is the phase); lp-rounding: a schedule rounded from the LP
   * relaxation was within the gap of its bound; branch-and-cut: HiGHS's MIP solver, started from the best rounding.
   */
  method: "lp-relaxation" | "lp-rounding" | "branch-and-cut";
  status: string;
  seconds: number;
  columns: number;
  rows: number;
}

/** What HiGHS reports about the final solve. */
export interface SolverReport {
  /** HiGHS model status of the final phase ("Optimal", "Time limit reached", "Infeasible", ...). */
  status: string;
  /** Plan cost over the horizon including end charges (recomputed from the cost tables). */
  objective: number;
  /** Proven lower bound on the plan cost (HiGHS dual bound plus the no-cleaning offset); null when the final phase
   *  did not minimise cost or found nothing. */
  bestBound: number | null;
  /** HiGHS relative gap |objective − bound| / |objective| of the saving objective (cost minus no-cleaning cost);
   *  null as for bestBound. */
  gap: number | null;
  /** Solver seconds over all phases. */
  solveSeconds: number;
  phases: SolverPhase[];
}

/** Solution of a planning instance. */
export interface InstanceSolution {
  /** "optimal": proven within the gap; "feasible": a limit stopped the solver; "no-solution": nothing found. */
  status: "optimal" | "feasible" | "no-solution";
  /** Start weeks per asset id (ascending; empty = no cleaning), for every instance asset. */
  startWeeks: Record<string, number[]>;
  solver: SolverReport;
  violations: PlanViolation[];
}

/** How a cleaning relates to the threshold forecast. */
export interface ThresholdMargin {
  quantile: "p10" | "p50" | "p90";
  crossingMs: number;
  /** Crossing minus cleaning start, days; negative when the cleaning starts after the crossing. */
  marginDays: number;
}

/** A proposed (or locked) cleaning. */
export interface PlannedCleaning {
  assetId: string;
  tag: string;
  startWeek: number;
  startMs: number;
  /** Planned return to service, epoch ms. */
  returnMs: number;
  outageDays: number;
  method: string;
  locked: boolean;
  /** Outage days charged with lost production and bypass energy (outside turnarounds). */
  chargedOutageDays: number;
  window: { kind: "turnaround"; name: string } | { kind: "routine" };
  thresholds: ThresholdMargin[];
}

/** The decision for one asset and why. */
export interface AssetPlanOutcome {
  assetId: string;
  tag: string;
  startWeeks: number[];
  /** Cost of this asset's schedule over the horizon, end charge included. */
  planCost: number;
  noCleaningCost: number;
  /** noCleaningCost − planCost. */
  savingVsNoCleaning: number;
  /** Cheapest schedule of this asset alone, ignoring every constraint but its own cleaning spacing and count. */
  individuallyBestWeeks: number[];
  individuallyBestCost: number;
  /** Why the plan differs from the individually best schedule; empty when it does not. */
  bindingConstraints: BindingConstraint[];
  /** Cheapest other feasible choice with the rest of the plan fixed (week null = no cleaning); single-cleaning assets. */
  alternative: { week: number | null; costIncrease: number } | null;
  earliestWeek: number;
  deadlineWeek: number | null;
}

/** A fleet cleaning plan. */
export interface CleaningPlan {
  horizon: PlanningHorizon;
  status: InstanceSolution["status"];
  solver: SolverReport;
  cleanings: PlannedCleaning[];
  assets: AssetPlanOutcome[];
  violations: PlanViolation[];
  excludedAssetIds: string[];
  totals: { planCost: number; noCleaningCost: number; saving: number };
}
