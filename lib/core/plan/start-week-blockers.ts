import type { PlanOccupancy } from "./plan-occupancy";
import type { BindingConstraint, InstanceAsset, PlanningInstance } from "./types";

/**
 * startWeekBlockers: the constraints that stop one asset from starting a cleaning in a given week (or from having no
 * cleaning, week = null) while every other asset keeps its place in the plan: a lock on the asset, its earliest week,
 * its deadline (for a first cleaning), a blackout, a full crew, or another member of one of its groups being out.
 * The first week of each kind is reported.
 *
 * @param instance planning instance
 * @param asset the asset
 * @param week candidate start week, or null for "no cleaning"
 * @param occupancy occupancy of the whole plan (planOccupancy), this asset included
 * @param ownStartWeeks this asset's start weeks in the plan (their load is taken out of the occupancy)
 * @param asFirstCleaning whether the candidate would be the asset's first cleaning (the deadline applies)
 * @returns the blocking constraints; empty when the move is allowed
 */
export function startWeekBlockers(
  instance: PlanningInstance,
  asset: InstanceAsset,
  week: number | null,
  occupancy: PlanOccupancy,
  ownStartWeeks: readonly number[],
  asFirstCleaning: boolean,
): BindingConstraint[] {
  const blockers: BindingConstraint[] = [];
  if (asset.lockedWeeks.length > 0 && (week === null || !asset.lockedWeeks.includes(week))) blockers.push({ kind: "lock" });
  if (week === null) {
    if (asset.deadlineWeek !== null) blockers.push({ kind: "deadline", deadlineWeek: asset.deadlineWeek });
    return blockers;
  }
  if (week < asset.earliestWeek) blockers.push({ kind: "earliest-spacing", earliestWeek: asset.earliestWeek });
  if (asFirstCleaning && asset.deadlineWeek !== null && week > asset.deadlineWeek) {
    blockers.push({ kind: "deadline", deadlineWeek: asset.deadlineWeek });
  }
  const ownOut = new Set<number>();
  for (const start of ownStartWeeks) {
    for (let t = start; t < start + asset.durationWeeks; t += 1) ownOut.add(t);
  }
  const blackout = new Set(instance.blackoutWeeks);
  const groups = instance.groups.filter((group) => group.assetIds.includes(asset.id));
  let blackoutWeek: number | null = null;
  let capacityWeek: number | null = null;
  const groupConflicts = new Map<string, BindingConstraint>();
  for (let t = week; t < Math.min(instance.weeks, week + asset.durationWeeks); t += 1) {
    if (blackoutWeek === null && blackout.has(t)) blackoutWeek = t;
    const othersLoad = (occupancy.load[t] as number) - (ownOut.has(t) ? 1 : 0);
    if (capacityWeek === null && othersLoad >= (instance.crewCapacity[t] as number)) capacityWeek = t;
    const out = occupancy.outByWeek[t] as string[];
    for (const group of groups) {
      if (groupConflicts.has(group.name)) continue;
      const others = out.filter((id) => id !== asset.id && group.assetIds.includes(id));
      if (others.length > 0) groupConflicts.set(group.name, { kind: "group-conflict", week: t, group: group.name, assetIds: others });
    }
  }
  if (blackoutWeek !== null) blockers.push({ kind: "blackout", week: blackoutWeek });
  if (capacityWeek !== null) blockers.push({ kind: "crew-capacity", week: capacityWeek });
  blockers.push(...groupConflicts.values());
  return blockers;
}
