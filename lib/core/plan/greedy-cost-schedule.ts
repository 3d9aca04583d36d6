import { candidateStartWeeks } from "./candidate-start-weeks";
import type { PlanOccupancy } from "./plan-occupancy";
import { scheduleCost } from "./schedule-cost";
import type { InstanceAsset, PlanningInstance } from "./types";

/**
 * greedyCostSchedule: a quick feasible schedule used as a MIP start: locks kept, then the given fixed schedules
 * (e.g. the least-lateness schedule of the assets with a deadline) as they are; then the remaining assets with a
 * deadline, earliest deadline first, each at its cheapest free candidate week up to the deadline; then every other
 * asset in order of its best possible saving against no cleaning, at its cheapest free candidate week if that beats
 * no cleaning. "Free" means a crew is left and no member of its groups is out. One cleaning per asset it places.
 *
 * @param instance planning instance
 * @param locked lockedOccupancy(instance)
 * @param fixed schedules to keep as given (assumed feasible together with the locks)
 * @returns start weeks per asset id, or null when some remaining deadline cannot be met this way
 */
export function greedyCostSchedule(
  instance: PlanningInstance,
  locked: PlanOccupancy,
  fixed: Readonly<Record<string, readonly number[]>> = {},
): Record<string, number[]> | null {
  const weeks = instance.weeks;
  const load = [...locked.load];
  const out = locked.outByWeek.map((ids) => new Set(ids));
  const mates = new Map<string, Set<string>>();
  for (const group of instance.groups) {
    for (const id of group.assetIds) {
      const set = mates.get(id) ?? new Set<string>();
      for (const other of group.assetIds) if (other !== id) set.add(other);
      mates.set(id, set);
    }
  }
  const schedule: Record<string, number[]> = {};
  const options = new Map<string, { week: number; cost: number }[]>();
  for (const asset of instance.assets) {
    schedule[asset.id] = [...asset.lockedWeeks];
    if (asset.lockedWeeks.length > 0) continue;
    options.set(
      asset.id,
      candidateStartWeeks(instance, asset, locked)
        .map((week) => ({ week, cost: scheduleCost(asset.costs, weeks, [week]) }))
        .sort((a, b) => a.cost - b.cost || a.week - b.week),
    );
  }
  const fits = (asset: InstanceAsset, start: number): boolean => {
    const own = mates.get(asset.id) ?? new Set<string>();
    for (let week = start; week < Math.min(weeks, start + asset.durationWeeks); week += 1) {
      if ((load[week] as number) >= (instance.crewCapacity[week] as number)) return false;
      for (const id of out[week] as Set<string>) if (own.has(id)) return false;
    }
    return true;
  };
  const take = (asset: InstanceAsset, start: number): void => {
    for (let week = start; week < Math.min(weeks, start + asset.durationWeeks); week += 1) {
      load[week] = (load[week] as number) + 1;
      (out[week] as Set<string>).add(asset.id);
    }
    schedule[asset.id] = [start];
  };
  for (const asset of instance.assets) {
    const given = fixed[asset.id];
    if (!given || asset.lockedWeeks.length > 0) continue;
    for (const start of given) {
      for (let week = start; week < Math.min(weeks, start + asset.durationWeeks); week += 1) {
        load[week] = (load[week] as number) + 1;
        (out[week] as Set<string>).add(asset.id);
      }
    }
    schedule[asset.id] = [...given];
  }
  const free = instance.assets.filter((asset) => asset.lockedWeeks.length === 0 && fixed[asset.id] === undefined);
  const urgent = free
    .filter((asset) => asset.deadlineWeek !== null)
    .sort((a, b) => (a.deadlineWeek as number) - (b.deadlineWeek as number) || a.id.localeCompare(b.id));
  for (const asset of urgent) {
    const choice = (options.get(asset.id) ?? []).find((option) => option.week <= (asset.deadlineWeek as number) && fits(asset, option.week));
    if (!choice) return null;
    take(asset, choice.week);
  }
  const saving = (asset: InstanceAsset): number =>
    scheduleCost(asset.costs, weeks, []) - ((options.get(asset.id) ?? [])[0]?.cost ?? Infinity);
  const rest = free.filter((asset) => asset.deadlineWeek === null).sort((a, b) => saving(b) - saving(a) || a.id.localeCompare(b.id));
  for (const asset of rest) {
    const none = scheduleCost(asset.costs, weeks, []);
    const choice = (options.get(asset.id) ?? []).find((option) => option.cost < none && fits(asset, option.week));
    if (choice) take(asset, choice.week);
  }
  return schedule;
}
