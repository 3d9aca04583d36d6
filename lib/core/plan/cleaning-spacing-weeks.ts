import { DAYS_PER_WEEK } from "./constants";
import { occupiedWeekCount } from "./occupied-week-count";

/**
 * cleaningSpacingWeeks: minimum weeks between the starts of two successive cleanings of one asset, so that the
 * second starts at least `minimumDaysInService` after the first one's return to service and not while it runs.
 *
 * Formula: max(ceil(d/7), ceil((d + m)/7)), d = outage days, m = minimum days in service (weeks start on day 7w).
 */
export function cleaningSpacingWeeks(outageDays: number, minimumDaysInService: number): number {
  return Math.max(occupiedWeekCount(outageDays), Math.ceil((outageDays + minimumDaysInService) / DAYS_PER_WEEK));
}
