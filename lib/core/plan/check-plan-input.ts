import { checkAssetEconomics } from "../economics";
import { cleaningSpacingWeeks } from "./cleaning-spacing-weeks";
import { DAY_MS, MAXIMUM_HORIZON_WEEKS } from "./constants";
import { PlanInputError } from "./errors";
import type { PlanInput } from "./types";

function requireWeekIndex(value: number, weeks: number, field: string): void {
  if (!Number.isInteger(value) || value < 0 || value >= weeks) {
    throw new PlanInputError(field, `${field} must be a whole week index in 0..${weeks - 1}, got ${value}`);
  }
}

/**
 * checkPlanInput: throws PlanInputError (naming the field) unless the input is well formed: a whole-day UTC start,
 * 1..105 weeks, whole non-negative crew capacities, week indices inside the horizon, unique asset ids, groups naming
 * known assets, valid economics, and locks that are whole weeks, no more than the asset's maximum cleanings and at
 * least its spacing apart. Infeasible combinations (a lock in a blackout, a deadline nobody can meet) are not input
 * errors: the planner reports them as violations.
 */
export function checkPlanInput(input: PlanInput): void {
  const { startMs, weeks } = input.horizon;
  if (!Number.isInteger(startMs) || startMs % DAY_MS !== 0) {
    throw new PlanInputError("horizon.startMs", `horizon start must be 00:00 UTC of a date (whole days since 1970), got ${startMs}`);
  }
  if (!Number.isInteger(weeks) || weeks < 1 || weeks > MAXIMUM_HORIZON_WEEKS) {
    throw new PlanInputError("horizon.weeks", `horizon must be 1..${MAXIMUM_HORIZON_WEEKS} whole weeks, got ${weeks}`);
  }
  const capacity = input.site.crewCapacity;
  const capacities = typeof capacity === "number" ? [capacity] : capacity;
  if (typeof capacity !== "number" && capacity.length !== weeks) {
    throw new PlanInputError("site.crewCapacity", `crew capacity needs one value per week (${weeks}), got ${capacity.length}`);
  }
  capacities.forEach((value, index) => {
    if (!Number.isInteger(value) || value < 0) {
      throw new PlanInputError("site.crewCapacity", `crew capacity must be a whole number >= 0, got ${value} (entry ${index})`);
    }
  });
  (input.site.blackoutWeeks ?? []).forEach((week, index) => requireWeekIndex(week, weeks, `site.blackoutWeeks[${index}]`));
  (input.site.turnarounds ?? []).forEach((window, index) => {
    requireWeekIndex(window.firstWeek, weeks, `site.turnarounds[${index}].firstWeek`);
    requireWeekIndex(window.lastWeek, weeks, `site.turnarounds[${index}].lastWeek`);
    if (window.lastWeek < window.firstWeek) {
      throw new PlanInputError(
        `site.turnarounds[${index}]`,
        `turnaround "${window.name}" ends (week ${window.lastWeek}) before it starts (week ${window.firstWeek})`,
      );
    }
  });

  const ids = new Set<string>();
  input.assets.forEach((asset, index) => {
    const field = `assets[${index}]`;
    if (ids.has(asset.id)) throw new PlanInputError(`${field}.id`, `asset id "${asset.id}" appears more than once`);
    ids.add(asset.id);
    if (asset.excluded) return;
    try {
      checkAssetEconomics(asset.economics);
    } catch (error) {
      throw new PlanInputError(`${field}.economics`, `asset ${asset.tag}: ${(error as Error).message}`);
    }
    if (!Number.isFinite(asset.lastReturnToServiceMs)) {
      throw new PlanInputError(
        `${field}.lastReturnToServiceMs`,
        `asset ${asset.tag}: last return to service must be an epoch ms, got ${asset.lastReturnToServiceMs}`,
      );
    }
    const spacingDays = asset.minimumDaysBetweenCleanings ?? 0;
    if (!Number.isFinite(spacingDays) || spacingDays < 0) {
      throw new PlanInputError(`${field}.minimumDaysBetweenCleanings`, `asset ${asset.tag}: minimum days between cleanings must be >= 0, got ${spacingDays}`);
    }
    const maximumCleanings = asset.maximumCleanings ?? 1;
    if (!Number.isInteger(maximumCleanings) || maximumCleanings < 1) {
      throw new PlanInputError(`${field}.maximumCleanings`, `asset ${asset.tag}: maximum cleanings must be a whole number >= 1, got ${maximumCleanings}`);
    }
    const locks = [...(asset.lockedWeeks ?? [])];
    locks.forEach((week, lockIndex) => requireWeekIndex(week, weeks, `${field}.lockedWeeks[${lockIndex}]`));
    if (locks.length > maximumCleanings) {
      throw new PlanInputError(`${field}.lockedWeeks`, `asset ${asset.tag}: ${locks.length} locked cleanings exceed its maximum of ${maximumCleanings}`);
    }
    const outageDays = asset.economics.method.outageDays;
    const spacingWeeks = cleaningSpacingWeeks(outageDays, spacingDays);
    locks.sort((a, b) => a - b);
    for (let lockIndex = 1; lockIndex < locks.length; lockIndex += 1) {
      const gap = (locks[lockIndex] as number) - (locks[lockIndex - 1] as number);
      if (gap < spacingWeeks) {
        throw new PlanInputError(
          `${field}.lockedWeeks`,
          `asset ${asset.tag}: locked weeks ${locks[lockIndex - 1]} and ${locks[lockIndex]} are closer than its spacing of ${spacingWeeks} weeks`,
        );
      }
    }
  });
  (input.site.groups ?? []).forEach((group, index) => {
    for (const id of group.assetIds) {
      if (!ids.has(id)) {
        throw new PlanInputError(`site.groups[${index}]`, `group "${group.name}" names unknown asset "${id}"`);
      }
    }
  });
}
