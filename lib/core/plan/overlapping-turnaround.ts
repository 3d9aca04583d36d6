import { DAYS_PER_WEEK } from "./constants";
import type { TurnaroundWindow } from "./types";

/**
 * overlappingTurnaround: the turnaround window that covers most of an outage, or null if none overlaps it.
 *
 * @param startWeek week the cleaning starts
 * @param outageDays outage duration, days
 * @param turnarounds turnaround windows in weeks
 */
export function overlappingTurnaround(
  startWeek: number,
  outageDays: number,
  turnarounds: readonly TurnaroundWindow[],
): TurnaroundWindow | null {
  const start = DAYS_PER_WEEK * startWeek;
  const end = start + outageDays;
  let best: TurnaroundWindow | null = null;
  let bestOverlap = 0;
  for (const window of turnarounds) {
    const overlap = Math.min(end, DAYS_PER_WEEK * (window.lastWeek + 1)) - Math.max(start, DAYS_PER_WEEK * window.firstWeek);
    if (overlap > bestOverlap) {
      bestOverlap = overlap;
      best = window;
    }
  }
  return best;
}
