/**
 * Fleet cleaning planner: pure functions (HiGHS solves in memory). Weeks from a UTC start date, epoch ms for instants,
 * money in the site currency (see types.ts).
 */
export * from "./types";
export { DAY_MS, DAYS_PER_WEEK, WEEK_MS, MAXIMUM_HORIZON_WEEKS } from "./constants";
export { PlanInputError } from "./errors";
export { resolvePlanOptions, type ResolvedPlanOptions } from "./resolve-plan-options";
export { checkPlanInput } from "./check-plan-input";
export { occupiedWeekCount } from "./occupied-week-count";
export { cleaningSpacingWeeks } from "./cleaning-spacing-weeks";
export { weekOfInstant } from "./week-of-instant";
export { chargedOutageDays } from "./charged-outage-days";
export { overlappingTurnaround } from "./overlapping-turnaround";
export { scheduleCost } from "./schedule-cost";
export { deadlineMiss, type DeadlineMiss } from "./deadline-miss";
export { assetCostTable, type AssetCostContext } from "./asset-cost-table";
export { buildPlanningInstance } from "./build-planning-instance";
export { planOccupancy, type PlanOccupancy } from "./plan-occupancy";
export { lockedOccupancy } from "./locked-occupancy";
export { candidateStartWeeks } from "./candidate-start-weeks";
export { buildScheduleModel, type ScheduleModel, type ScheduleModelSpec } from "./build-schedule-model";
export { runHighsModel, type HighsRun, type HighsRunOptions } from "./run-highs-model";
export { solvePlanningInstance, type SolveInstanceOptions } from "./solve-planning-instance";
export { greedyDeadlineSchedule } from "./greedy-deadline-schedule";
export { greedyCostSchedule } from "./greedy-cost-schedule";
export { startWeekBlockers } from "./start-week-blockers";
export { individuallyBestSchedule } from "./individually-best-schedule";
export { explainSolution } from "./explain-solution";
export { assemblePlan } from "./assemble-plan";
export { planCleanings } from "./plan-cleanings";
export { comparePlans, type PlanComparison, type ScheduleChange } from "./compare-plans";
export { locksFromPlan, type PlanLock } from "./locks-from-plan";
export { replanWithLocks } from "./replan-with-locks";
export { whatIfPlan, type WhatIfResult, type WhatIfScenario } from "./what-if-plan";
export { formatUtcDate } from "./format-utc-date";
export { describeCleaning, type DescribeOptions } from "./describe-cleaning";
export { describeBindingConstraint } from "./describe-binding-constraint";
export { escapeICalendarText } from "./escape-icalendar-text";
export { foldICalendarLine } from "./fold-icalendar-line";
export { planToICalendar, ADVISORY_CAUTION, type ICalendarOptions } from "./plan-to-icalendar";
export { csvCell } from "./csv-cell";
export { planToCsv, PLAN_CSV_COLUMNS } from "./plan-to-csv";
