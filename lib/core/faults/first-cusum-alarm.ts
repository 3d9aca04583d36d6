/** A CUSUM alarm. Indices refer to the values passed in. */
export interface CusumAlarm {
  /** First value at which a CUSUM exceeded h. */
  alarmIndex: number;
  /** First value after the last time the alarming CUSUM was zero: the estimated change point. */
  onsetIndex: number;
  /** +1: the mean rose (upper CUSUM); −1: it fell. */
  direction: 1 | -1;
  /** The CUSUM value at the alarm. */
  statistic: number;
}

/**
 * firstCusumAlarm: runs a two-sided tabular CUSUM from `from` and returns its first alarm (null if none).
 *
 * Formula: C⁺_t = max(0, C⁺_(t−1) + z_t − k), C⁻_t = max(0, C⁻_(t−1) − z_t − k), C⁺_(from−1) = C⁻_(from−1) = 0;
 * alarm when C⁺ or C⁻ exceeds h; change point = one past the last t with C = 0 on the alarming side.
 * NaN values are passed over (no update). Valid: z standardised (zero mean, unit variance in control).
 * Source: Page (1954), Biometrika 41:100–115; tabular form and change-point estimate as in Montgomery (2009),
 * Introduction to Statistical Quality Control, 6th ed., Sect. 9.1.2 (from memory).
 *
 * @param values standardised observations; not modified.
 * @param from first index to use.
 * @param reference k ≥ 0 (half the shift to detect fastest, in σ).
 * @param decisionInterval h > 0.
 */
export function firstCusumAlarm(values: Float64Array, from: number, reference: number, decisionInterval: number): CusumAlarm | null {
  let upper = 0;
  let lower = 0;
  let upperOnset = from;
  let lowerOnset = from;
  for (let index = Math.max(0, from); index < values.length; index += 1) {
    const value = values[index] as number;
    if (!Number.isFinite(value)) continue;
    upper = Math.max(0, upper + value - reference);
    lower = Math.max(0, lower - value - reference);
    if (upper === 0) upperOnset = index + 1;
    if (lower === 0) lowerOnset = index + 1;
    if (upper > decisionInterval) return { alarmIndex: index, onsetIndex: Math.min(upperOnset, index), direction: 1, statistic: upper };
    if (lower > decisionInterval) return { alarmIndex: index, onsetIndex: Math.min(lowerOnset, index), direction: -1, statistic: lower };
  }
  return null;
}
