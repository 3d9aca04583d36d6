import { medianOf } from "./median-of";
import { medianStandardError } from "./median-standard-error";
import type { CleaningEffectiveness } from "./types";

const MS_PER_DAY = 86_400_000;

/**
 * cleaningEffectiveness: the fraction of the fouling resistance a cleaning removed, from the observed Rf around it.
 *
 * Formula: e = (Rf_b − Rf_a)/Rf_b, Rf_b = median of the observed Rf over the last windowDays of usable data before the
 * cleaning, Rf_a = median over the first windowDays of usable data after it; SE by first-order propagation,
 * SE_e² = (Rf_a/Rf_b²)²·SE_b² + (1/Rf_b)²·SE_a², with medianStandardError for SE_b and SE_a. The "after" window
 * already holds a few days of new growth, so e is slightly understated for fast fouling.
 * Valid: Rf_b > 0 and at least 3 points on each side; otherwise null.
 * Source: definition of cleaning effectiveness as the removed fraction of Rf (common practice; the simulator uses
 * residual = (1 − e)·Rf_before); error propagation (e.g. JCGM 100:2008 GUM, Eq. 10).
 *
 * @param timesMs point times, ascending (not modified)
 * @param fouling observed Rf at those times, m²·K/W
 * @param cleaningMs the cleaning's return to service
 * @param windowDays window on each side, days
 * @returns the effectiveness with its standard error and window details, or null
 */
export function cleaningEffectiveness(
  timesMs: readonly number[],
  fouling: readonly number[],
  cleaningMs: number,
  windowDays: number,
): CleaningEffectiveness | null {
  const before: number[] = [];
  const after: number[] = [];
  let lastBefore = Number.NEGATIVE_INFINITY;
  let firstAfter = Number.POSITIVE_INFINITY;
  timesMs.forEach((time) => {
    if (time < cleaningMs) lastBefore = Math.max(lastBefore, time);
    else firstAfter = Math.min(firstAfter, time);
  });
  timesMs.forEach((time, index) => {
    const value = fouling[index] as number;
    if (time < cleaningMs && time > lastBefore - windowDays * MS_PER_DAY) before.push(value);
    if (time >= cleaningMs && time < firstAfter + windowDays * MS_PER_DAY) after.push(value);
  });
  if (before.length < 3 || after.length < 3) return null;
  const beforeMedian = medianOf(before) as number;
  const afterMedian = medianOf(after) as number;
  if (!(beforeMedian > 0)) return null;
  const beforeError = medianStandardError(before) as number;
  const afterError = medianStandardError(after) as number;
  const value = (beforeMedian - afterMedian) / beforeMedian;
  const standardError = Math.sqrt(((afterMedian / (beforeMedian * beforeMedian)) * beforeError) ** 2 + (afterError / beforeMedian) ** 2);
  return {
    value,
    standardError,
    beforeM2KPerW: beforeMedian,
    afterM2KPerW: afterMedian,
    pointsBefore: before.length,
    pointsAfter: after.length,
    windowDays,
  };
}
