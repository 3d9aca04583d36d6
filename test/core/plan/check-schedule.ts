import type { InstanceSolution, PlanningInstance } from "../../../lib/core/plan";
import { referenceScheduleCost } from "./exhaustive-schedule";

/**
 * Independent checker of a planner result: returns the list of rules the schedule breaks without reporting them
 * (empty = valid). Locked cleanings may break site rules only if a matching violation is reported; every missed
 * deadline must be reported, and nothing else may be reported as missed.
 */
export function checkSchedule(instance: PlanningInstance, solution: InstanceSolution): string[] {
  const problems: string[] = [];
  const weeks = instance.weeks;
  const blackout = new Set(instance.blackoutWeeks);
  const reported = (kind: string, id: string, week?: number) =>
    solution.violations.some(
      (violation) => violation.kind === kind && violation.assetIds.includes(id) && (week === undefined || violation.weeks.includes(week)),
    );
  const lockedLoad = Array.from({ length: weeks }, () => 0);
  const unlockedLoad = Array.from({ length: weeks }, () => 0);
  const out: { id: string; locked: boolean }[][] = Array.from({ length: weeks }, () => []);

  for (const asset of instance.assets) {
    const starts = solution.startWeeks[asset.id];
    if (!starts) {
      problems.push(`${asset.id}: no schedule returned`);
      continue;
    }
    if (starts.length > asset.maximumCleanings) problems.push(`${asset.id}: ${starts.length} cleanings > ${asset.maximumCleanings}`);
    starts.forEach((start, index) => {
      if (!Number.isInteger(start) || start < 0 || start >= weeks) problems.push(`${asset.id}: start ${start} outside the horizon`);
      const previous = starts[index - 1];
      if (previous !== undefined && start - previous < asset.spacingWeeks) problems.push(`${asset.id}: starts ${previous}, ${start} closer than ${asset.spacingWeeks}`);
      const locked = asset.lockedWeeks.includes(start);
      if (start < asset.earliestWeek && !(locked && reported("lock-before-earliest", asset.id, start))) {
        problems.push(`${asset.id}: start ${start} before earliest week ${asset.earliestWeek}`);
      }
      for (let t = start; t < Math.min(weeks, start + asset.durationWeeks); t += 1) {
        if (blackout.has(t) && !(locked && reported("lock-blackout", asset.id, t))) problems.push(`${asset.id}: out in blackout week ${t}`);
        if (locked) lockedLoad[t] = (lockedLoad[t] as number) + 1;
        else unlockedLoad[t] = (unlockedLoad[t] as number) + 1;
        (out[t] as { id: string; locked: boolean }[]).push({ id: asset.id, locked });
      }
    });
    for (const lock of asset.lockedWeeks) if (!starts.includes(lock)) problems.push(`${asset.id}: locked week ${lock} not kept`);
    const deadline = asset.deadlineWeek;
    const missed = deadline !== null && (starts[0] === undefined || (starts[0] as number) > deadline);
    if (missed && !reported("deadline", asset.id)) problems.push(`${asset.id}: misses deadline ${deadline} unreported`);
    if (!missed && reported("deadline", asset.id)) problems.push(`${asset.id}: deadline violation reported but kept`);
  }

  for (let t = 0; t < weeks; t += 1) {
    const capacity = instance.crewCapacity[t] as number;
    const locked = lockedLoad[t] as number;
    if ((unlockedLoad[t] as number) > Math.max(0, capacity - locked)) problems.push(`week ${t}: ${unlockedLoad[t]} unlocked cleanings with room ${Math.max(0, capacity - locked)}`);
    if (locked > capacity) {
      for (const entry of out[t] as { id: string; locked: boolean }[]) {
        if (entry.locked && !reported("lock-capacity", entry.id, t)) problems.push(`week ${t}: locks over capacity unreported`);
      }
    }
    for (const group of instance.groups) {
      const members = (out[t] as { id: string; locked: boolean }[]).filter((entry) => group.assetIds.includes(entry.id));
      if (members.length <= 1) continue;
      if (members.some((entry) => !entry.locked)) problems.push(`week ${t}: group ${group.name} has ${members.map((m) => m.id).join(", ")} out`);
      else if (!members.every((entry) => reported("lock-group", entry.id, t))) problems.push(`week ${t}: locked group conflict unreported`);
    }
  }

  const cost = instance.assets.reduce(
    (sum, asset) => sum + referenceScheduleCost(asset.costs, weeks, solution.startWeeks[asset.id] ?? []),
    0,
  );
  if (Math.abs(cost - solution.solver.objective) > 1e-9 * Math.max(1, Math.abs(cost))) {
    problems.push(`reported objective ${solution.solver.objective} differs from the schedule cost ${cost}`);
  }
  return problems;
}
