import { csvCell } from "./csv-cell";
import { describeBindingConstraint } from "./describe-binding-constraint";
import { formatUtcDate } from "./format-utc-date";
import type { CleaningPlan } from "./types";

/** Column names of {@link planToCsv}, in order. */
export const PLAN_CSV_COLUMNS = [
  "tag",
  "asset_id",
  "start_date",
  "return_date",
  "start_week",
  "outage_days",
  "method",
  "locked",
  "window",
  "charged_outage_days",
  "saving_vs_no_cleaning",
  "next_best",
  "next_best_cost_increase",
  "p10_crossing",
  "p10_margin_days",
  "p50_crossing",
  "p50_margin_days",
  "moved_by",
  "violations",
] as const;

const money = (value: number): number => Math.round(value * 100) / 100;

/**
 * planToCsv: the plan's cleanings as CSV (RFC 4180: header row, comma separated, CRLF line ends), one row per
 * cleaning with dates, method, window, saving, next best choice, threshold margins, what moved it and the asset's
 * violations; text cells neutralised against spreadsheet formula injection (csvCell). Money rounded to 0.01.
 */
export function planToCsv(plan: CleaningPlan): string {
  const outcomes = new Map(plan.assets.map((outcome) => [outcome.assetId, outcome]));
  const rows: (string | number | null)[][] = [[...PLAN_CSV_COLUMNS]];
  for (const cleaning of plan.cleanings) {
    const outcome = outcomes.get(cleaning.assetId);
    const margin = (quantile: "p10" | "p50") => cleaning.thresholds.find((entry) => entry.quantile === quantile);
    const p10 = margin("p10");
    const p50 = margin("p50");
    const alternative = outcome?.alternative ?? null;
    rows.push([
      cleaning.tag,
      cleaning.assetId,
      formatUtcDate(cleaning.startMs),
      formatUtcDate(cleaning.returnMs),
      cleaning.startWeek,
      cleaning.outageDays,
      cleaning.method,
      cleaning.locked ? "yes" : "no",
      cleaning.window.kind === "turnaround" ? `turnaround ${cleaning.window.name}` : "routine",
      cleaning.chargedOutageDays,
      outcome ? money(outcome.savingVsNoCleaning) : null,
      alternative ? (alternative.week === null ? "no cleaning" : `week ${alternative.week}`) : null,
      alternative ? money(alternative.costIncrease) : null,
      p10 ? formatUtcDate(p10.crossingMs) : null,
      p10 ? Math.round(p10.marginDays * 10) / 10 : null,
      p50 ? formatUtcDate(p50.crossingMs) : null,
      p50 ? Math.round(p50.marginDays * 10) / 10 : null,
      outcome ? outcome.bindingConstraints.map((constraint) => describeBindingConstraint(plan, constraint)).join("; ") : null,
      plan.violations
        .filter((violation) => violation.assetIds.includes(cleaning.assetId))
        .map((violation) => violation.message)
        .join("; "),
    ]);
  }
  return rows.map((row) => row.map(csvCell).join(",")).join("\r\n") + "\r\n";
}
