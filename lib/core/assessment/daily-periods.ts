import type { AssessmentPeriod } from "./types";

const MS_PER_DAY = 86_400_000;

/**
 * dailyPeriods: usable sub-daily periods averaged into UTC days (periods already daily pass through unchanged).
 *
 * Formula: for each UTC day, the arithmetic mean of each temperature, flow and duty over its usable periods; the day
 * starts at its UTC midnight. The mean of U over a day differs from U of the mean operating point only by the
 * curvature of the rating over the day's spread, which is small for screened steady periods (common practice in
 * performance monitoring; the same choice as the screening module's period aggregation).
 * Valid: periods sorted by startMs; unusable periods are dropped.
 *
 * @param periods screened periods (not modified)
 * @returns one usable period per day that had any usable period, ascending
 */
export function dailyPeriods(periods: readonly AssessmentPeriod[]): AssessmentPeriod[] {
  const result: AssessmentPeriod[] = [];
  let current: { day: number; count: number; sums: Omit<AssessmentPeriod, "startMs" | "usable"> } | null = null;
  const flush = () => {
    if (current === null) return;
    const { day, count, sums } = current;
    result.push({
      startMs: day * MS_PER_DAY,
      hotInK: sums.hotInK / count,
      hotOutK: sums.hotOutK / count,
      coldInK: sums.coldInK / count,
      coldOutK: sums.coldOutK / count,
      hotFlowKgPerS: sums.hotFlowKgPerS / count,
      coldFlowKgPerS: sums.coldFlowKgPerS / count,
      dutyW: sums.dutyW / count,
      usable: true,
    });
  };
  for (const period of periods) {
    if (!period.usable) continue;
    const day = Math.floor(period.startMs / MS_PER_DAY);
    if (current === null || current.day !== day) {
      flush();
      current = { day, count: 0, sums: { hotInK: 0, hotOutK: 0, coldInK: 0, coldOutK: 0, hotFlowKgPerS: 0, coldFlowKgPerS: 0, dutyW: 0 } };
    }
    const sums = current.sums;
    sums.hotInK += period.hotInK;
    sums.hotOutK += period.hotOutK;
    sums.coldInK += period.coldInK;
    sums.coldOutK += period.coldOutK;
    sums.hotFlowKgPerS += period.hotFlowKgPerS;
    sums.coldFlowKgPerS += period.coldFlowKgPerS;
    sums.dutyW += period.dutyW;
    current.count += 1;
  }
  flush();
  return result;
}
