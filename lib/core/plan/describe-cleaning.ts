import { WEEK_MS } from "./constants";
import { describeBindingConstraint } from "./describe-binding-constraint";
import { formatUtcDate } from "./format-utc-date";
import type { AssetPlanOutcome, CleaningPlan, PlannedCleaning } from "./types";

function weekDate(plan: CleaningPlan, week: number): string {
  return formatUtcDate(plan.horizon.startMs + week * WEEK_MS);
}

/** Options of {@link describeCleaning}. */
export interface DescribeOptions {
  /** Currency code appended to amounts (e.g. "EUR"); default none. */
  currency?: string;
}

function amount(value: number, currency: string | undefined): string {
  const rounded = Math.round(value);
  return currency ? `${rounded} ${currency}` : String(rounded);
}

/**
 * describeCleaning: a plain-text explanation of one planned cleaning, one statement per line: dates and method, the
 * saving against not cleaning and the next best choice, the threshold dates it beats, the window, and what moved it
 * from the asset's individually best week.
 *
 * @param plan the plan (for dates and tags)
 * @param cleaning the cleaning
 * @param outcome the asset's outcome in the plan
 */
export function describeCleaning(
  plan: CleaningPlan,
  cleaning: PlannedCleaning,
  outcome: AssetPlanOutcome,
  options: DescribeOptions = {},
): string {
  const currency = options.currency;
  const lines: string[] = [];
  lines.push(
    `Clean ${cleaning.tag} from ${formatUtcDate(cleaning.startMs)} (week ${cleaning.startWeek}), ` +
      `back in service ${formatUtcDate(cleaning.returnMs)}; method ${cleaning.method}, ${cleaning.outageDays} days out.`,
  );
  lines.push(
    `Saves ${amount(outcome.savingVsNoCleaning, currency)} over the horizon against no cleaning (fouling, fuel, CO2, outage, end-of-horizon state).`,
  );
  if (outcome.alternative) {
    const where = outcome.alternative.week === null ? "no cleaning" : `week ${outcome.alternative.week} (${weekDate(plan, outcome.alternative.week)})`;
    lines.push(`Next best choice: ${where}, ${amount(outcome.alternative.costIncrease, currency)} more.`);
  }
  for (const margin of cleaning.thresholds) {
    const days = Math.round(Math.abs(margin.marginDays));
    lines.push(
      margin.marginDays >= 0
        ? `Starts ${days} days before the ${margin.quantile.toUpperCase()} threshold crossing (${formatUtcDate(margin.crossingMs)}).`
        : `Starts ${days} days after the ${margin.quantile.toUpperCase()} threshold crossing (${formatUtcDate(margin.crossingMs)}).`,
    );
  }
  lines.push(
    cleaning.window.kind === "turnaround"
      ? `Inside turnaround ${cleaning.window.name}: ${cleaning.chargedOutageDays} outage days charged with lost production.`
      : `Routine outage: ${cleaning.chargedOutageDays} days charged with lost production and bypass energy.`,
  );
  if (cleaning.locked) lines.push("Date locked by the planner.");
  if (outcome.bindingConstraints.length > 0) {
    const best = outcome.individuallyBestWeeks.length === 0 ? "no cleaning" : `week ${outcome.individuallyBestWeeks.join(" and ")}`;
    const reasons = outcome.bindingConstraints.map((constraint) => describeBindingConstraint(plan, constraint));
    lines.push(`Its individually best choice is ${best}; kept from it by ${reasons.join("; ")}.`);
  }
  return lines.join("\n");
}
