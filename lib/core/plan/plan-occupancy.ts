import type { PlanningInstance } from "./types";

/** Who is out in each week of a schedule. */
export interface PlanOccupancy {
  /** Cleanings in progress per week, length W. */
  load: number[];
  /** Asset ids out per week, length W. */
  outByWeek: string[][];
}

/**
 * planOccupancy: cleanings in progress per week for given start weeks (a cleaning occupies weeks
 * s..s + durationWeeks − 1; weeks past the horizon end are not counted).
 *
 * @param instance planning instance
 * @param startWeeks start weeks per asset id (assets not listed have none)
 */
export function planOccupancy(instance: PlanningInstance, startWeeks: Readonly<Record<string, readonly number[]>>): PlanOccupancy {
  const load = Array.from({ length: instance.weeks }, () => 0);
  const outByWeek: string[][] = Array.from({ length: instance.weeks }, () => []);
  for (const asset of instance.assets) {
    for (const start of startWeeks[asset.id] ?? []) {
      for (let week = start; week < Math.min(instance.weeks, start + asset.durationWeeks); week += 1) {
        load[week] = (load[week] as number) + 1;
        (outByWeek[week] as string[]).push(asset.id);
      }
    }
  }
  return { load, outByWeek };
}
