import { medianValue } from "../screening/median-value";

const DAY_MS = 86_400_000;

/** Options of {@link movingBalanceOffset}; defaults in brackets. */
export interface MovingOffsetOptions {
  /** Length of the reference window, s [60 days]. */
  windowS?: number;
  /** Gap between the reference window and the day it serves, s, so that a developing fault does not move its own reference [7 days]. */
  guardS?: number;
  /** Days with a daily median needed in the window; with fewer the start-up reference is used [10]. */
  minimumDays?: number;
  /** Samples a day needs for a daily mean [6]. */
  minimumDaySamples?: number;
}

/**
 * movingBalanceOffset: the in-control centre of a normalised residual for each sample, from a trailing reference
 * window that ends a guard interval before the sample's day (heat losses, a small calibration offset present from
 * the start, cp errors: a slowly varying non-zero mean that is not an instrument fault).
 *
 * Formula: μ(d) = median of the daily means of days [d − guard − window, d − guard); while fewer than minimumDays
 * such days exist (the start of the data), μ = median of the daily means of the first window of data.
 * Daily means are efficient (the values are screened, outliers already removed); the median across days keeps an
 * odd day (an undetected short upset) from moving the reference. With 60 days of about 20 samples the reference has
 * a standard error of about 0.04 σ, small beside the CUSUM's reference value k = 0.5.
 * Valid: faults that develop faster than the guard interval (days); slower changes are absorbed as a new normal.
 * Source: common practice (a moving, robust baseline for a CUSUM on process data; the median of block means as a
 * robust location, cf. Rousseeuw & Bassett 1990, J. Am. Stat. Assoc. 85:97, remedian; from memory).
 *
 * @param timeMs sample times, sorted.
 * @param values residuals, NaN where not available; not modified.
 * @returns offset per sample (NaN where the value is NaN; 0 if no day has enough samples).
 */
export function movingBalanceOffset(timeMs: Float64Array, values: Float64Array, options: MovingOffsetOptions = {}): Float64Array {
  const windowDays = Math.max(1, Math.round((options.windowS ?? 60 * 86_400) / 86_400));
  const guardDays = Math.max(0, Math.round((options.guardS ?? 7 * 86_400) / 86_400));
  const minimumDays = options.minimumDays ?? 10;
  const minimumDaySamples = options.minimumDaySamples ?? 6;
  const count = values.length;

  const dayMedians = new Map<number, number>();
  const days: number[] = [];
  {
    let currentDay = Number.NaN;
    let members: number[] = [];
    const flush = (): void => {
      if (members.length >= minimumDaySamples) {
        dayMedians.set(currentDay, members.reduce((sum, value) => sum + value, 0) / members.length);
        days.push(currentDay);
      }
      members = [];
    };
    for (let index = 0; index < count; index += 1) {
      const value = values[index] as number;
      if (!Number.isFinite(value)) continue;
      const day = Math.floor((timeMs[index] as number) / DAY_MS);
      if (day !== currentDay) {
        flush();
        currentDay = day;
      }
      members.push(value);
    }
    flush();
  }
  const result = new Float64Array(count).fill(Number.NaN);
  if (days.length === 0) {
    for (let index = 0; index < count; index += 1) if (Number.isFinite(values[index] as number)) result[index] = 0;
    return result;
  }
  const firstDay = days[0] as number;
  const startup = medianValue(days.filter((day) => day < firstDay + windowDays).map((day) => dayMedians.get(day) as number));
  const offsetByDay = new Map<number, number>();
  const offsetFor = (day: number): number => {
    const known = offsetByDay.get(day);
    if (known !== undefined) return known;
    const reference: number[] = [];
    for (let d = day - guardDays - windowDays; d < day - guardDays; d += 1) {
      const median = dayMedians.get(d);
      if (median !== undefined) reference.push(median);
    }
    const offset = reference.length >= minimumDays ? medianValue(reference) : startup;
    offsetByDay.set(day, offset);
    return offset;
  };
  for (let index = 0; index < count; index += 1) {
    if (!Number.isFinite(values[index] as number)) continue;
    result[index] = offsetFor(Math.floor((timeMs[index] as number) / DAY_MS));
  }
  return result;
}
