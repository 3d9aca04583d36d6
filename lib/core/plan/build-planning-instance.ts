import { assetCostTable } from "./asset-cost-table";
import { checkPlanInput } from "./check-plan-input";
import { cleaningSpacingWeeks } from "./cleaning-spacing-weeks";
import { DAY_MS, WEEK_MS } from "./constants";
import { occupiedWeekCount } from "./occupied-week-count";
import { resolvePlanOptions } from "./resolve-plan-options";
import type { InstanceAsset, PlanAsset, PlanInput, PlanningInstance, PlanOptions } from "./types";
import { weekOfInstant } from "./week-of-instant";

/**
 * Latest start week of the first cleaning: the week containing the chosen threshold crossing (week 0 if it has
 * already happened), or null when it falls after the horizon or is not forecast.
 */
function deadlineWeekOf(asset: PlanAsset, startMs: number, weeks: number, quantile: "p10" | "p50" | "p90"): number | null {
  const crossing = asset.thresholdCrossing;
  if (!crossing) return null;
  const crossingMs = quantile === "p10" ? crossing.p10Ms : quantile === "p50" ? crossing.p50Ms : (crossing.p90Ms ?? null);
  if (crossingMs === null) return null;
  const week = Math.max(0, weekOfInstant(startMs, crossingMs));
  return week >= weeks ? null : week;
}

/**
 * buildPlanningInstance: the week-level instance of a plan input: crew capacity per week, blackouts, groups without
 * excluded assets, and per planned asset its duration in weeks, earliest and deadline weeks, spacing, locks and cost
 * table (assetCostTable).
 *
 * Earliest week: first week starting at or after lastReturnToService + minimumDaysBetweenCleanings.
 * Deadline week: week of the threshold crossing at the chosen quantile (P10 by default), 0 if already crossed.
 *
 * @throws PlanInputError on malformed input (checkPlanInput)
 */
export function buildPlanningInstance(input: PlanInput, options: PlanOptions = {}): PlanningInstance {
  checkPlanInput(input);
  const resolved = resolvePlanOptions(options);
  const { startMs, weeks } = input.horizon;
  const capacity = input.site.crewCapacity;
  const crewCapacity = typeof capacity === "number" ? Array.from({ length: weeks }, () => capacity) : [...capacity];
  const turnarounds = input.site.turnarounds ?? [];
  const planned = input.assets.filter((asset) => !asset.excluded);
  const plannedIds = new Set(planned.map((asset) => asset.id));

  const assets: InstanceAsset[] = planned.map((asset) => {
    const outageDays = asset.economics.method.outageDays;
    const minimumDays = asset.minimumDaysBetweenCleanings ?? 0;
    const earliestMs = asset.lastReturnToServiceMs + minimumDays * DAY_MS;
    const earliestWeek = Math.max(0, Math.ceil((earliestMs - startMs) / WEEK_MS));
    const { costs } = assetCostTable(asset, { horizon: input.horizon, turnarounds, endOfHorizon: resolved.endOfHorizon });
    return {
      id: asset.id,
      label: asset.tag,
      durationWeeks: occupiedWeekCount(outageDays),
      earliestWeek,
      deadlineWeek: deadlineWeekOf(asset, startMs, weeks, resolved.deadlineQuantile),
      maximumCleanings: asset.maximumCleanings ?? 1,
      spacingWeeks: cleaningSpacingWeeks(outageDays, minimumDays),
      lockedWeeks: [...(asset.lockedWeeks ?? [])].sort((a, b) => a - b),
      costs,
    };
  });
  return {
    weeks,
    crewCapacity,
    blackoutWeeks: [...new Set(input.site.blackoutWeeks ?? [])].sort((a, b) => a - b),
    groups: (input.site.groups ?? []).map((group) => ({
      name: group.name,
      assetIds: group.assetIds.filter((id) => plannedIds.has(id)),
    })),
    assets,
  };
}
