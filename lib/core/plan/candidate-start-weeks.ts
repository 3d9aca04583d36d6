import type { PlanOccupancy } from "./plan-occupancy";
import type { InstanceAsset, PlanningInstance } from "./types";

/**
 * candidateStartWeeks: weeks in which an unlocked cleaning of the asset may start, before the crews are shared out:
 * from its earliest week to W − 1, with none of the occupied weeks (inside the horizon) in a blackout, left without
 * crew by locked cleanings, or taken by a locked cleaning of another member of one of its groups. The deadline is
 * not applied here.
 *
 * @param instance planning instance
 * @param asset the asset
 * @param locked occupancy of the locked cleanings (lockedOccupancy)
 * @returns ascending week indices
 */
export function candidateStartWeeks(instance: PlanningInstance, asset: InstanceAsset, locked: PlanOccupancy): number[] {
  const blackout = new Set(instance.blackoutWeeks);
  const mates = new Set<string>();
  for (const group of instance.groups) {
    if (group.assetIds.includes(asset.id)) for (const id of group.assetIds) if (id !== asset.id) mates.add(id);
  }
  const weeks: number[] = [];
  for (let start = Math.max(0, asset.earliestWeek); start < instance.weeks; start += 1) {
    let allowed = true;
    for (let week = start; allowed && week < Math.min(instance.weeks, start + asset.durationWeeks); week += 1) {
      if (blackout.has(week)) allowed = false;
      else if ((locked.load[week] as number) >= (instance.crewCapacity[week] as number)) allowed = false;
      else if ((locked.outByWeek[week] as string[]).some((id) => mates.has(id))) allowed = false;
    }
    if (allowed) weeks.push(start);
  }
  return weeks;
}
