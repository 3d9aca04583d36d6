import type { Highs } from "highs";
import { PlanInputError } from "./errors";
import type { PlanLock } from "./locks-from-plan";
import { planCleanings } from "./plan-cleanings";
import type { CleaningPlan, PlanInput, PlanOptions } from "./types";

/**
 * replanWithLocks: plans again with the given cleanings fixed (they replace each listed asset's lockedWeeks) and the
 * rest optimised, e.g. after the planner has confirmed some dates (locksFromPlan). Lock conflicts are reported as
 * violations, as for any lock.
 *
 * @throws PlanInputError for a lock on an unknown or excluded asset, or malformed locks
 */
export function replanWithLocks(highs: Highs, input: PlanInput, locks: readonly PlanLock[], options: PlanOptions = {}): CleaningPlan {
  const byId = new Map(locks.map((lock) => [lock.assetId, lock.startWeeks]));
  for (const lock of locks) {
    const asset = input.assets.find((candidate) => candidate.id === lock.assetId);
    if (!asset || asset.excluded) {
      throw new PlanInputError("locks", `cannot lock "${lock.assetId}": no such planned asset`);
    }
  }
  const assets = input.assets.map((asset) => {
    const weeks = byId.get(asset.id);
    return weeks ? { ...asset, lockedWeeks: [...weeks] } : asset;
  });
  return planCleanings(highs, { ...input, assets }, options);
}
