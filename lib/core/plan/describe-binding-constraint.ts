import { WEEK_MS } from "./constants";
import { formatUtcDate } from "./format-utc-date";
import type { BindingConstraint, CleaningPlan } from "./types";

function weekDate(plan: CleaningPlan, week: number): string {
  return formatUtcDate(plan.horizon.startMs + week * WEEK_MS);
}

/**
 * describeBindingConstraint: one binding constraint in words, with week dates and plant tags, e.g.
 * "crews fully booked in week 12 (2025-03-24)".
 */
export function describeBindingConstraint(plan: CleaningPlan, constraint: BindingConstraint): string {
  const tags = new Map(plan.assets.map((outcome) => [outcome.assetId, outcome.tag]));
  switch (constraint.kind) {
    case "crew-capacity":
      return `crews fully booked in week ${constraint.week} (${weekDate(plan, constraint.week)})`;
    case "blackout":
      return `site blackout in week ${constraint.week} (${weekDate(plan, constraint.week)})`;
    case "group-conflict":
      return `${constraint.assetIds.map((id) => tags.get(id) ?? id).join(", ")} of group ${constraint.group} out in week ${constraint.week}`;
    case "lock":
      return "date locked by the planner";
    case "earliest-spacing":
      return `minimum spacing after the last cleaning (earliest week ${constraint.earliestWeek})`;
    case "deadline":
      return `threshold deadline (week ${constraint.deadlineWeek}, ${weekDate(plan, constraint.deadlineWeek)})`;
    case "equal-cost":
      return "an equally cheap choice";
    case "optimality-gap":
      return "the solver's gap or time limit (a cheaper feasible week exists)";
  }
}

