import { DAYS_PER_WEEK } from "./constants";
import type { TurnaroundWindow } from "./types";

/**
 * chargedOutageDays: days of an outage that fall outside every turnaround window (overlapping windows counted once).
 *
 * Formula: d_charged = d − |[7s, 7s + d) ∩ ∪ windows [7·first, 7·(last + 1))|, days from the horizon start.
 *
 * @param startWeek week the cleaning starts (at its first day)
 * @param outageDays outage duration, days
 * @param turnarounds turnaround windows in weeks
 * @returns days in [0, outageDays]
 */
export function chargedOutageDays(startWeek: number, outageDays: number, turnarounds: readonly TurnaroundWindow[]): number {
  const start = DAYS_PER_WEEK * startWeek;
  const end = start + outageDays;
  const pieces = turnarounds
    .map((window) => [Math.max(start, DAYS_PER_WEEK * window.firstWeek), Math.min(end, DAYS_PER_WEEK * (window.lastWeek + 1))] as const)
    .filter(([from, to]) => to > from)
    .sort((a, b) => a[0] - b[0]);
  let covered = 0;
  let reach = start;
  for (const [from, to] of pieces) {
    const begin = Math.max(from, reach);
    if (to > begin) {
      covered += to - begin;
      reach = to;
    }
  }
  return Math.max(0, outageDays - covered);
}
