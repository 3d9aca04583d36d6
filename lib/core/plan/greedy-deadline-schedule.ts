import { candidateStartWeeks } from "./candidate-start-weeks";
import type { PlanOccupancy } from "./plan-occupancy";
import type { PlanningInstance } from "./types";

/**
 * greedyDeadlineSchedule: a quick feasible schedule that tries to meet deadlines, used as a MIP start for the
 * least-lateness phase: assets with a deadline in order of deadline (earliest-deadline-first list scheduling), each
 * given the earliest candidate week whose crews and group slots are still free (before or after its deadline);
 * assets that cannot start by their deadline are deferred and then placed as early as still possible (a two-pass
 * variant that keeps overloaded weeks for assets that can still be on time); locked assets keep their locks; every
 * other asset stays uncleaned.
 * Source: earliest-deadline-first rule, Jackson (1955), "Scheduling a production line to minimize maximum
 * tardiness", UCLA Management Science Research Project report 43 (from memory).
 *
 * @param instance planning instance
 * @param locked lockedOccupancy(instance)
 * @returns start weeks per asset id
 */
export function greedyDeadlineSchedule(instance: PlanningInstance, locked: PlanOccupancy): Record<string, number[]> {
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
  for (const asset of instance.assets) schedule[asset.id] = [...asset.lockedWeeks];
  const order = instance.assets
    .filter((asset) => asset.deadlineWeek !== null && asset.lockedWeeks.length === 0)
    .sort((a, b) => (a.deadlineWeek as number) - (b.deadlineWeek as number) || a.id.localeCompare(b.id));
  const place = (asset: (typeof order)[number], latestStart: number): boolean => {
    const own = mates.get(asset.id) ?? new Set<string>();
    for (const start of candidateStartWeeks(instance, asset, locked)) {
      if (start > latestStart) return false;
      let free = true;
      for (let week = start; free && week < Math.min(instance.weeks, start + asset.durationWeeks); week += 1) {
        if ((load[week] as number) >= (instance.crewCapacity[week] as number)) free = false;
        else if ([...(out[week] as Set<string>)].some((id) => own.has(id))) free = false;
      }
      if (!free) continue;
      for (let week = start; week < Math.min(instance.weeks, start + asset.durationWeeks); week += 1) {
        load[week] = (load[week] as number) + 1;
        (out[week] as Set<string>).add(asset.id);
      }
      schedule[asset.id] = [start];
      return true;
    }
    return false;
  };
  // First pass: on time or not at all; second pass: the late ones, as early as still possible.
  const late = order.filter((asset) => !place(asset, asset.deadlineWeek as number));
  for (const asset of late) place(asset, instance.weeks - 1);
  return schedule;
}
