import { medianValue } from "./median-value";

/**
 * nominalStep: the typical sampling interval of a time column, ms: the median of the positive successive
 * differences (robust to gaps and to the odd irregular sample). NaN when fewer than two samples.
 * When more than half of the differences equal the first one (a regular grid with gaps), that value is the median
 * and is returned without sorting.
 * Source: common practice (median spacing as the nominal rate of an irregular series).
 *
 * @example nominalStep(new Float64Array([0, 3600000, 7200000, 36000000])) // 3600000
 */
export function nominalStep(timeMs: Float64Array): number {
  let first = Number.NaN;
  let positive = 0;
  let equal = 0;
  for (let index = 1; index < timeMs.length; index += 1) {
    const difference = (timeMs[index] as number) - (timeMs[index - 1] as number);
    if (!(difference > 0 && Number.isFinite(difference))) continue;
    positive += 1;
    if (Number.isNaN(first)) first = difference;
    if (difference === first) equal += 1;
  }
  if (positive === 0) return Number.NaN;
  if (equal * 2 > positive) return first;
  const differences = new Float64Array(positive);
  let filled = 0;
  for (let index = 1; index < timeMs.length; index += 1) {
    const difference = (timeMs[index] as number) - (timeMs[index - 1] as number);
    if (difference > 0 && Number.isFinite(difference)) {
      differences[filled] = difference;
      filled += 1;
    }
  }
  return medianValue(differences);
}
