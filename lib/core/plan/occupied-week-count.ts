import { DAYS_PER_WEEK } from "./constants";

/**
 * occupiedWeekCount: planning weeks a cleaning occupies from its start week, ceil(outage days / 7), at least 1.
 *
 * @param outageDays outage duration, days (> 0)
 * @returns whole weeks
 * @example occupiedWeekCount(3) // 1; occupiedWeekCount(8) // 2
 */
export function occupiedWeekCount(outageDays: number): number {
  return Math.max(1, Math.ceil(outageDays / DAYS_PER_WEEK));
}
