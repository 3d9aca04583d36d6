import { hampelDeviations, type HampelDeviationOptions } from "./hampel-deviations";

/** Options of {@link hampelFilter}; defaults in brackets. */
export interface HampelOptions extends HampelDeviationOptions {
  /** t: outlier when |x − median| > t·scale [3]. */
  threshold?: number;
}


/**
 * hampelFilter: flags outliers with the Hampel identifier (a moving-window median/MAD test); values are not changed.
 *
 * Formula: outlier_i ⇔ |x_i − m_i| > t·S_i, m_i = median(x_(i−k..i+k)), S_i = max(1.4826·median|x_j − m_i|, floors)
 * (hampelDeviations). Missing values are never flagged.
 * Valid: isolated spikes shorter than k + 1 samples; a step change is not flagged, since each side of the step holds
 * the majority of any window centred on it. Runs of k + 1 or more bad samples are not outliers to this test.
 * Source: Hampel (1974), J. Am. Stat. Assoc. 69:383–393; Pearson (2002), IEEE Trans. Control Syst. Technol.
 * 10(1):55–63; Liu, Shah & Jiang (2004), Comput. Chem. Eng. 28:1635 (from memory). The scale floors keep a quantised
 * or very quiet signal (MAD = 0) from flagging every small wiggle.
 *
 * @param values the signal, NaN where missing; not modified.
 * @param options half-width k ≥ 1 (integer), threshold t > 0, scale floors ≥ 0.
 * @throws RangeError for a bad half-width, threshold or floor.
 * @returns 1 where the sample is an outlier, else 0.
 * @example hampelFilter(new Float64Array([1, 1.1, 0.9, 1, 9, 1, 1.05, 0.95]), { halfWidth: 3 })[4] // 1
 */
export function hampelFilter(values: Float64Array, options: HampelOptions = {}): Uint8Array {
  const threshold = options.threshold ?? 3;
  if (!(threshold > 0)) throw new RangeError(`threshold must be positive, got ${threshold}`);
  const deviations = hampelDeviations(values, options);
  const flags = new Uint8Array(values.length);
  for (let index = 0; index < values.length; index += 1) if ((deviations[index] as number) > threshold) flags[index] = 1;
  return flags;
}
