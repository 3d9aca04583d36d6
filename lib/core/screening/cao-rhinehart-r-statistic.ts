import { nominalStep } from "./nominal-step";

/** Options of {@link caoRhinehartRStatistic}; defaults in brackets. */
export interface RStatisticOptions {
  /** λ1, filter factor of the filtered value [0.2]. */
  meanFilter?: number;
  /** λ2, filter factor of the filtered squared deviation from the filtered value [0.1]. */
  varianceFilter?: number;
  /** λ3, filter factor of the filtered squared successive difference [0.1]. */
  differenceFilter?: number;
  /** Updates after a (re)start during which R is not reported (NaN) [round(1/λ3) = 10]. */
  warmupSamples?: number;
  /** The filters restart when more than this many sampling intervals pass without an update [3]. */
  restartAfterSteps?: number;
  /** Samples (1) to leave out of the filters, e.g. Hampel outliers; they repeat the last R and do not restart. */
  skip?: Uint8Array;
}

/** Resolved defaults (Cao & Rhinehart 1995; FIELD-NOTES §6 [V]). */
export const R_STATISTIC_DEFAULTS = {
  meanFilter: 0.2,
  varianceFilter: 0.1,
  differenceFilter: 0.1,
  restartAfterSteps: 3,
} as const;

/**
 * caoRhinehartRStatistic: the Cao–Rhinehart ratio-of-variances statistic R of one signal, sample by sample.
 *
 * Formula (per used sample i): ν²_i = λ2·(x_i − x̄_(i−1))² + (1 − λ2)·ν²_(i−1); x̄_i = λ1·x_i + (1 − λ1)·x̄_(i−1);
 * δ²_i = λ3·(x_i − x_(i−1))² + (1 − λ3)·δ²_(i−1); R_i = (2 − λ1)·ν²_i/δ²_i.
 * For white noise about a constant E[ν²] = 2σ²/(2 − λ1) and E[δ²] = 2σ², so R ≈ 1; a trend or step inflates ν²
 * more than δ², so R ≫ 1 while the process moves.
 * Valid: any sampling interval, as long as the measurement noise is not dominated by autocorrelated process noise
 * at that interval (then R > 1 even at steady state, and the critical value must be raised).
 * Source: Cao & Rhinehart (1995), J. Process Control 5(6):363–374, Eqs. 1–7 (FIELD-NOTES §6 [V], filters as
 * in `auralius/steady-state-detection:rhinehart/CalculateR.m`).
 *
 * Missing (NaN) and skipped samples leave the filters unchanged; a missing sample gets R = NaN (not steady), a
 * skipped one (a known outlier) repeats the last R of its segment, since one bad reading says nothing about
 * whether the process moved. The filters restart (x̄ = x,
 * ν² = δ² = 0) at the first sample and after a gap of more than restartAfterSteps nominal intervals; starting
 * both variances at zero with λ2 = λ3 keeps their ratio unbiased, and the first warmupSamples updates report NaN.
 * When δ² = 0 (a perfectly constant signal) R is 0 if ν² is 0 too, else +∞.
 *
 * @param values the signal, NaN where missing; not modified.
 * @param timeMs sample times, epoch ms, increasing (same length).
 * @param options filter factors in (0, 1], warm-up and restart settings.
 * @throws RangeError for filter factors outside (0, 1] or columns of different length.
 * @returns R per sample, NaN where not available.
 */
export function caoRhinehartRStatistic(values: Float64Array, timeMs: Float64Array, options: RStatisticOptions = {}): Float64Array {
  const meanFilter = options.meanFilter ?? R_STATISTIC_DEFAULTS.meanFilter;
  const varianceFilter = options.varianceFilter ?? R_STATISTIC_DEFAULTS.varianceFilter;
  const differenceFilter = options.differenceFilter ?? R_STATISTIC_DEFAULTS.differenceFilter;
  for (const [name, factor] of [["λ1", meanFilter], ["λ2", varianceFilter], ["λ3", differenceFilter]] as const) {
    if (!(factor > 0 && factor <= 1)) throw new RangeError(`filter factor ${name} must be in (0, 1], got ${factor}`);
  }
  if (values.length !== timeMs.length) throw new RangeError("values and timeMs must have the same length");
  const warmupSamples = options.warmupSamples ?? Math.round(1 / differenceFilter);
  const restartAfterSteps = options.restartAfterSteps ?? R_STATISTIC_DEFAULTS.restartAfterSteps;
  const step = nominalStep(timeMs);
  const restartGapMs = Number.isFinite(step) ? restartAfterSteps * step * (1 + 1e-9) : Number.POSITIVE_INFINITY;
  const skip = options.skip;

  const result = new Float64Array(values.length).fill(Number.NaN);
  let filtered = 0;
  let previous = 0;
  let variance = 0;
  let difference = 0;
  let updates = 0;
  let lastTimeMs = Number.NEGATIVE_INFINITY;
  let lastStatistic = Number.NaN;
  for (let index = 0; index < values.length; index += 1) {
    const value = values[index] as number;
    const time = timeMs[index] as number;
    if (!Number.isFinite(value)) continue;
    if (skip !== undefined && skip[index] === 1) {
      if (time - lastTimeMs <= restartGapMs) result[index] = lastStatistic;
      continue;
    }
    if (updates === 0 || time - lastTimeMs > restartGapMs) {
      lastStatistic = Number.NaN;
      filtered = value;
      previous = value;
      variance = 0;
      difference = 0;
      updates = 1;
      lastTimeMs = time;
      continue;
    }
    const deviation = value - filtered;
    variance = varianceFilter * deviation * deviation + (1 - varianceFilter) * variance;
    filtered = meanFilter * value + (1 - meanFilter) * filtered;
    const change = value - previous;
    difference = differenceFilter * change * change + (1 - differenceFilter) * difference;
    previous = value;
    lastTimeMs = time;
    updates += 1;
    if (updates <= warmupSamples) continue;
    lastStatistic = difference > 0 ? ((2 - meanFilter) * variance) / difference : variance > 0 ? Number.POSITIVE_INFINITY : 0;
    result[index] = lastStatistic;
  }
  return result;
}
