import { planOccupancy, type PlanOccupancy } from "./plan-occupancy";
import type { PlanningInstance, PlanViolation } from "./types";

/** Joins consecutive weeks that share the same set of assets into one violation. */
function mergeByAssets(
  entries: { week: number; assetIds: string[] }[],
  make: (assetIds: string[], weeks: number[]) => PlanViolation,
): PlanViolation[] {
  const merged: { assetIds: string[]; weeks: number[] }[] = [];
  for (const entry of entries) {
    const last = merged[merged.length - 1];
    const key = entry.assetIds.join("\u0000");
    if (last && last.assetIds.join("\u0000") === key && (last.weeks[last.weeks.length - 1] as number) === entry.week - 1) {
      last.weeks.push(entry.week);
    } else {
      merged.push({ assetIds: entry.assetIds, weeks: [entry.week] });
    }
  }
  return merged.map((item) => make(item.assetIds, item.weeks));
}

const weekList = (weeks: readonly number[]): string =>
  weeks.length === 1 ? `week ${weeks[0]}` : `weeks ${weeks[0]}–${weeks[weeks.length - 1]}`;

/**
 * lockedOccupancy: the weeks taken by locked cleanings and the rules the locks themselves break (a lock in a
 * blackout or before the asset's earliest week; locks alone over the crew capacity; two locked members of a group out
 * in the same week). Locked cleanings are kept as the planner fixed them; these are reported, not repaired.
 *
 * @returns locked load and assets out per week, and the lock violations
 */
export function lockedOccupancy(instance: PlanningInstance): PlanOccupancy & { violations: PlanViolation[] } {
  const labels = new Map(instance.assets.map((asset) => [asset.id, asset.label ?? asset.id]));
  const names = (ids: readonly string[]): string => ids.map((id) => labels.get(id) ?? id).join(", ");
  const locks: Record<string, readonly number[]> = {};
  for (const asset of instance.assets) locks[asset.id] = asset.lockedWeeks;
  const occupancy = planOccupancy(instance, locks);
  const violations: PlanViolation[] = [];
  const blackout = new Set(instance.blackoutWeeks);

  for (const asset of instance.assets) {
    for (const lock of asset.lockedWeeks) {
      const hit: number[] = [];
      for (let week = lock; week < Math.min(instance.weeks, lock + asset.durationWeeks); week += 1) {
        if (blackout.has(week)) hit.push(week);
      }
      if (hit.length > 0) {
        violations.push({
          kind: "lock-blackout",
          assetIds: [asset.id],
          weeks: hit,
          blockedBy: [],
          message: `locked cleaning of ${names([asset.id])} in week ${lock} runs in blackout ${weekList(hit)}`,
        });
      }
      if (lock < asset.earliestWeek) {
        violations.push({
          kind: "lock-before-earliest",
          assetIds: [asset.id],
          weeks: [lock],
          blockedBy: [],
          message:
            `locked cleaning of ${names([asset.id])} in week ${lock} is before its earliest week ${asset.earliestWeek} ` +
            "(minimum spacing after the last cleaning)",
        });
      }
    }
  }

  const overCapacity: { week: number; assetIds: string[] }[] = [];
  occupancy.load.forEach((load, week) => {
    if (load > (instance.crewCapacity[week] as number)) {
      overCapacity.push({ week, assetIds: [...(occupancy.outByWeek[week] as string[])].sort() });
    }
  });
  violations.push(
    ...mergeByAssets(overCapacity, (assetIds, weeks) => ({
      kind: "lock-capacity",
      assetIds,
      weeks,
      blockedBy: [],
      message: `locked cleanings of ${names(assetIds)} exceed the crew capacity in ${weekList(weeks)}`,
    })),
  );

  for (const group of instance.groups) {
    const members = new Set(group.assetIds);
    const conflicts: { week: number; assetIds: string[] }[] = [];
    occupancy.outByWeek.forEach((out, week) => {
      const inGroup = out.filter((id) => members.has(id));
      if (inGroup.length > 1) conflicts.push({ week, assetIds: [...inGroup].sort() });
    });
    violations.push(
      ...mergeByAssets(conflicts, (assetIds, weeks) => ({
        kind: "lock-group",
        assetIds,
        weeks,
        blockedBy: [],
        message: `locked cleanings of ${names(assetIds)} (group ${group.name}) are out together in ${weekList(weeks)}`,
      })),
    );
  }
  return { ...occupancy, violations };
}
