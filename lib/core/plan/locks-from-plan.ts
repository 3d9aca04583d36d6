import type { CleaningPlan } from "./types";

/** Start weeks to fix for one asset. */
export interface PlanLock {
  assetId: string;
  startWeeks: number[];
}

/**
 * locksFromPlan: the cleanings of a plan to keep when re-planning: those of the listed assets and/or those starting
 * no later than a week (e.g. the frozen next four weeks). With no filter every cleaning is kept.
 *
 * @param plan a plan
 * @param filter assetIds to keep and/or the last start week to keep (inclusive)
 */
export function locksFromPlan(plan: CleaningPlan, filter: { assetIds?: readonly string[]; throughWeek?: number } = {}): PlanLock[] {
  const keepIds = filter.assetIds ? new Set(filter.assetIds) : null;
  const locks = new Map<string, number[]>();
  for (const cleaning of plan.cleanings) {
    if (keepIds && !keepIds.has(cleaning.assetId)) continue;
    if (filter.throughWeek !== undefined && cleaning.startWeek > filter.throughWeek) continue;
    locks.set(cleaning.assetId, [...(locks.get(cleaning.assetId) ?? []), cleaning.startWeek]);
  }
  return [...locks.entries()].map(([assetId, startWeeks]) => ({ assetId, startWeeks: startWeeks.sort((a, b) => a - b) }));
}
