// A stored plan run as the CLI (`plan --json`), the API and the planner page show it.
import type { PlanRun } from "../../generated/prisma/client";
import { describeBindingConstraint, describeCleaning, WEEK_MS, type CleaningPlan, type PlanComparison } from "../core/plan";
import { ADVISORY_NOTICE } from "../data/assessment-document";
import { isoDate } from "./planning-calendar";
import type { LoadedPlanInput } from "./load-plan-input";

/** What a run records besides the plan itself (PlanRun.inputs). */
export interface PlanRunInputs {
  site: LoadedPlanInput["site"];
  settings: LoadedPlanInput["settings"];
  calendar: LoadedPlanInput["calendar"];
  excluded: LoadedPlanInput["excluded"];
  turnarounds: { name: string; firstWeek: number; lastWeek: number }[];
  blackoutWeeks: number[];
  crewCapacity: number[];
  /** what-if runs: the scenario */
  scenario?: { fuelPriceFactor?: number; co2PriceFactor?: number; crewCapacityDelta?: number };
}

export interface PlanDocument {
  id: number;
  kind: string;
  createdAt: string;
  createdBy: string;
  site: PlanRunInputs["site"];
  horizon: { start: string; end: string; weeks: number };
  status: string;
  solver: { status: string; gap: number | null; solveSeconds: number; objective: number; bestBound: number | null; phases: CleaningPlan["solver"]["phases"] };
  totals: { planCost: number; noCleaningCost: number; saving: number; currency: string };
  settings: PlanRunInputs["settings"];
  scenario: PlanRunInputs["scenario"] | null;
  weeks: { index: number; start: string; crewCapacity: number; crewLoad: number; blackout: boolean; turnaround: string | null; out: string[] }[];
  cleanings: {
    tag: string;
    start: string;
    returnToService: string;
    week: number;
    outageDays: number;
    method: string;
    /** booked: a planner has fixed this week (accepted or moved); proposed: the optimiser's choice */
    state: "booked" | "proposed";
    window: string;
    chargedOutageDays: number;
    savingVsNoCleaning: number;
    thresholds: { quantile: string; crossing: string; marginDays: number }[];
    explanation: string[];
  }[];
  assets: {
    tag: string;
    weeks: number[];
    planCost: number;
    noCleaningCost: number;
    saving: number;
    individuallyBestWeeks: number[];
    movedBy: string[];
    deadlineWeek: number | null;
    earliestWeek: number;
  }[];
  violations: { kind: string; tags: string[]; weeks: number[]; message: string }[];
  excluded: PlanRunInputs["excluded"];
  calendar: PlanRunInputs["calendar"];
  comparison: (PlanComparisonDocument & { previousRunId: number }) | null;
  advisory: string;
}

export interface PlanComparisonDocument {
  changes: { tag: string; change: string; from: string[]; to: string[]; costDifference: number }[];
  unchangedAssets: number;
  costDifference: number;
  savingDifference: number;
}

/** The comparison of two plans with week indices written as the dates of the weeks. */
export function comparisonDocument(plan: CleaningPlan, comparison: PlanComparison): PlanComparisonDocument {
  const date = (week: number) => isoDate(plan.horizon.startMs + week * WEEK_MS);
  return {
    changes: comparison.changes.map((change) => ({ tag: change.tag, change: change.change, from: change.fromWeeks.map(date), to: change.toWeeks.map(date), costDifference: change.costDifference })),
    unchangedAssets: comparison.unchangedAssets,
    costDifference: comparison.costDifference,
    savingDifference: comparison.savingDifference,
  };
}

/** The core names weeks by index ("week 4"); people read the date of the week beside it. */
function withWeekDates(message: string, weekStart: (week: number) => string): string {
  return message.replace(/\bweek (\d+)\b/g, (_, week: string) => `week ${week} (${weekStart(Number(week))})`);
}

/** planDocument: the stored run with dates instead of week indices, explanations in words and the crew load per week. */
export function planDocument(run: PlanRun): PlanDocument {
  const plan = run.result as unknown as CleaningPlan;
  const inputs = run.inputs as unknown as PlanRunInputs;
  const tags = new Map(plan.assets.map((outcome) => [outcome.assetId, outcome.tag]));
  const outcomes = new Map(plan.assets.map((outcome) => [outcome.assetId, outcome]));
  const weekStart = (week: number) => isoDate(plan.horizon.startMs + week * WEEK_MS);
  const weeks: PlanDocument["weeks"] = Array.from({ length: plan.horizon.weeks }, (_, index) => ({
    index,
    start: weekStart(index),
    crewCapacity: inputs.crewCapacity[index] ?? 0,
    crewLoad: 0,
    blackout: inputs.blackoutWeeks.includes(index),
    turnaround: inputs.turnarounds.find((window) => index >= window.firstWeek && index <= window.lastWeek)?.name ?? null,
    out: [],
  }));
  for (const cleaning of plan.cleanings) {
    const span = Math.max(1, Math.ceil(cleaning.outageDays / 7));
    for (let week = cleaning.startWeek; week < Math.min(plan.horizon.weeks, cleaning.startWeek + span); week += 1) {
      const entry = weeks[week];
      if (entry) {
        entry.crewLoad += 1;
        entry.out.push(cleaning.tag);
      }
    }
  }
  const comparison = run.comparison as unknown as PlanComparisonDocument | null;
  return {
    id: run.id,
    kind: run.kind,
    createdAt: run.createdAt.toISOString(),
    createdBy: run.createdBy,
    site: inputs.site,
    horizon: { start: weekStart(0), end: weekStart(plan.horizon.weeks), weeks: plan.horizon.weeks },
    status: plan.status,
    solver: { status: plan.solver.status, gap: plan.solver.gap, solveSeconds: plan.solver.solveSeconds, objective: plan.solver.objective, bestBound: plan.solver.bestBound, phases: plan.solver.phases },
    totals: { ...plan.totals, currency: inputs.site.currency },
    settings: inputs.settings,
    scenario: inputs.scenario ?? null,
    weeks,
    cleanings: plan.cleanings.map((cleaning) => {
      const outcome = outcomes.get(cleaning.assetId);
      return {
        tag: cleaning.tag,
        start: isoDate(cleaning.startMs),
        returnToService: isoDate(cleaning.returnMs),
        week: cleaning.startWeek,
        outageDays: cleaning.outageDays,
        method: cleaning.method,
        state: cleaning.locked ? "booked" : "proposed",
        window: cleaning.window.kind === "turnaround" ? `turnaround ${cleaning.window.name}` : "routine",
        chargedOutageDays: cleaning.chargedOutageDays,
        savingVsNoCleaning: outcome?.savingVsNoCleaning ?? 0,
        thresholds: cleaning.thresholds.map((margin) => ({ quantile: margin.quantile, crossing: isoDate(margin.crossingMs), marginDays: margin.marginDays })),
        explanation: outcome ? describeCleaning(plan, cleaning, outcome, { currency: inputs.site.currency }).split("\n") : [],
      };
    }),
    assets: plan.assets.map((outcome) => ({
      tag: outcome.tag,
      weeks: outcome.startWeeks,
      planCost: outcome.planCost,
      noCleaningCost: outcome.noCleaningCost,
      saving: outcome.savingVsNoCleaning,
      individuallyBestWeeks: outcome.individuallyBestWeeks,
      movedBy: outcome.bindingConstraints.map((constraint) => describeBindingConstraint(plan, constraint)),
      deadlineWeek: outcome.deadlineWeek,
      earliestWeek: outcome.earliestWeek,
    })),
    violations: plan.violations.map((violation) => ({ kind: violation.kind, tags: violation.assetIds.map((id) => tags.get(id) ?? id), weeks: violation.weeks, message: withWeekDates(violation.message, weekStart) })),
    excluded: inputs.excluded,
    calendar: inputs.calendar,
    comparison: comparison && run.previousRunId !== null ? { ...comparison, previousRunId: run.previousRunId } : null,
    advisory: ADVISORY_NOTICE,
  };
}
