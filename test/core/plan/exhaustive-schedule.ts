import type { AssetCostTable, PlanningInstance } from "../../../lib/core/plan";

/** Cost of one asset's schedule, written out again from the AssetCostTable definition (independent of scheduleCost). */
export function referenceScheduleCost(costs: AssetCostTable, weeks: number, starts: readonly number[]): number {
  const at = (array: readonly number[], index: number): number => array[index] as number;
  if (starts.length === 0) return at(costs.currentCycle, weeks) + costs.currentEndCharge;
  let total = at(costs.currentCycle, starts[0] as number);
  starts.forEach((start, index) => {
    total += at(costs.event, start);
    const next = starts[index + 1];
    total += next === undefined ? at(costs.newCycle, weeks - start) + at(costs.newEndCharge, weeks - start) : at(costs.newCycle, next - start);
  });
  return total;
}

/** Deadline miss as the planner specifies it: [missed 0/1, weeks late], no cleaning counting as a start in week W. */
export function referenceLateness(deadline: number | null, weeks: number, starts: readonly number[]): [number, number] {
  if (deadline === null) return [0, 0];
  const first = starts[0] ?? weeks;
  return first <= deadline ? [0, 0] : [1, first - deadline];
}

/** Lexicographic comparison of (missed, weeks late, cost). */
function better(a: { missed: number; weeksLate: number; cost: number }, b: { missed: number; weeksLate: number; cost: number }): boolean {
  if (a.missed !== b.missed) return a.missed < b.missed;
  if (a.weeksLate !== b.weeksLate) return a.weeksLate < b.weeksLate;
  return a.cost < b.cost;
}

/** Every schedule of one asset that respects its own rules (count, spacing, locks, earliest week, blackouts). */
function assetOptions(instance: PlanningInstance, index: number): number[][] {
  const asset = instance.assets[index];
  if (!asset) return [];
  const blackout = new Set(instance.blackoutWeeks);
  const locks = new Set(asset.lockedWeeks);
  const options: number[][] = [];
  const extend = (schedule: number[]): void => {
    if ([...locks].every((lock) => schedule.includes(lock))) options.push([...schedule]);
    if (schedule.length === asset.maximumCleanings) return;
    const from = schedule.length === 0 ? 0 : (schedule[schedule.length - 1] as number) + asset.spacingWeeks;
    for (let week = from; week < instance.weeks; week += 1) {
      if (!locks.has(week)) {
        if (week < asset.earliestWeek) continue;
        let clear = true;
        for (let t = week; t < Math.min(instance.weeks, week + asset.durationWeeks); t += 1) if (blackout.has(t)) clear = false;
        if (!clear) continue;
      }
      schedule.push(week);
      extend(schedule);
      schedule.pop();
    }
  };
  extend([]);
  return options;
}

/**
 * Exhaustive search over all joint schedules: the least (assets missing their deadline, total weeks late, total cost)
 * in lexicographic order subject to
 * crew capacity (unlocked cleanings share what locked ones leave) and groups (at most one member out; none beside a
 * locked member). Written from the planner's specification, sharing no code with it.
 */
export interface ExhaustiveOptimum {
  missed: number;
  weeksLate: number;
  cost: number;
  startWeeks: Record<string, number[]>;
}

export function exhaustiveSchedule(instance: PlanningInstance): ExhaustiveOptimum | null {
  const weeks = instance.weeks;
  const options = instance.assets.map((_, index) => assetOptions(instance, index));
  const lockedLoad = Array.from({ length: weeks }, () => 0);
  const lockedOut: Set<string>[] = Array.from({ length: weeks }, () => new Set());
  instance.assets.forEach((asset) => {
    for (const lock of asset.lockedWeeks) {
      for (let t = lock; t < Math.min(weeks, lock + asset.durationWeeks); t += 1) {
        lockedLoad[t] = (lockedLoad[t] as number) + 1;
        (lockedOut[t] as Set<string>).add(asset.id);
      }
    }
  });
  const room = instance.crewCapacity.map((capacity, week) => Math.max(0, capacity - (lockedLoad[week] as number)));
  const unlockedLoad = Array.from({ length: weeks }, () => 0);
  const unlockedOut: Set<string>[] = Array.from({ length: weeks }, () => new Set());
  let best: ExhaustiveOptimum | null = null;
  const chosen: number[][] = [];

  const groupAllows = (id: string, week: number): boolean => {
    for (const group of instance.groups) {
      if (!group.assetIds.includes(id)) continue;
      for (const other of group.assetIds) {
        if (other === id) continue;
        if ((lockedOut[week] as Set<string>).has(other) || (unlockedOut[week] as Set<string>).has(other)) return false;
      }
    }
    return true;
  };

  const search = (index: number, missed: number, weeksLate: number, cost: number): void => {
    if (index === instance.assets.length) {
      if (!best || better({ missed, weeksLate, cost }, best)) {
        const startWeeks: Record<string, number[]> = {};
        instance.assets.forEach((asset, position) => (startWeeks[asset.id] = [...(chosen[position] as number[])]));
        best = { missed, weeksLate, cost, startWeeks };
      }
      return;
    }
    const asset = instance.assets[index];
    if (!asset) return;
    for (const schedule of options[index] as number[][]) {
      const occupied: number[] = [];
      let fits = true;
      for (const start of schedule) {
        if (asset.lockedWeeks.includes(start)) continue;
        for (let t = start; t < Math.min(weeks, start + asset.durationWeeks); t += 1) {
          if ((unlockedLoad[t] as number) + 1 > (room[t] as number) || !groupAllows(asset.id, t)) fits = false;
          occupied.push(t);
        }
      }
      if (!fits) continue;
      for (const t of occupied) {
        unlockedLoad[t] = (unlockedLoad[t] as number) + 1;
        (unlockedOut[t] as Set<string>).add(asset.id);
      }
      chosen.push(schedule);
      const [assetMissed, assetWeeksLate] = referenceLateness(asset.deadlineWeek, weeks, schedule);
      search(index + 1, missed + assetMissed, weeksLate + assetWeeksLate, cost + referenceScheduleCost(asset.costs, weeks, schedule));
      chosen.pop();
      for (const t of occupied) {
        unlockedLoad[t] = (unlockedLoad[t] as number) - 1;
        (unlockedOut[t] as Set<string>).delete(asset.id);
      }
    }
  };
  search(0, 0, 0, 0);
  return best;
}
