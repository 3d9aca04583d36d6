import { MAD_SCALE_FACTOR } from "./mad-scale-factor";

/** Options of {@link hampelDeviations}; defaults in brackets. */
export interface HampelDeviationOptions {
  /** k: the window is the sample and k samples either side [6]. */
  halfWidth?: number;
  /** Lower bound on the scale estimate, in the signal's unit (e.g. the instrument's standard uncertainty) [0]. */
  minimumScale?: number;
  /** Lower bound on the scale as a fraction of |median| (for percent-of-reading instruments) [0]. */
  minimumRelativeScale?: number;
}

/** Inserts a value into the sorted prefix buffer[0..count) (binary search, then a shift); returns the new count. */
function insertSorted(buffer: Float64Array, count: number, value: number): number {
  let low = 0;
  let high = count;
  while (low < high) {
    const middle = (low + high) >> 1;
    if ((buffer[middle] as number) < value) low = middle + 1;
    else high = middle;
  }
  buffer.copyWithin(low + 1, low, count);
  buffer[low] = value;
  return count + 1;
}

/** Removes one copy of a value from the sorted prefix buffer[0..count); returns the new count. */
function removeSorted(buffer: Float64Array, count: number, value: number): number {
  let low = 0;
  let high = count;
  while (low < high) {
    const middle = (low + high) >> 1;
    if ((buffer[middle] as number) < value) low = middle + 1;
    else high = middle;
  }
  if (low < count && buffer[low] === value) {
    buffer.copyWithin(low, low + 1, count);
    return count - 1;
  }
  return count;
}

/**
 * Median of |s_j − m| over a sorted window s[0..count) with median m: the deviations below and above m are each
 * increasing away from m, so merging the two runs outward from m gives them in order (O(count)).
 */
function medianAbsoluteDeviation(sorted: Float64Array, count: number, median: number): number {
  let above = 0;
  while (above < count && (sorted[above] as number) < median) above += 1;
  let below = above - 1;
  const lowerRank = (count - 1) >> 1; // 0-based ranks of the middle deviation(s)
  const upperRank = count >> 1;
  let lowerValue = 0;
  for (let rank = 0; rank <= upperRank; rank += 1) {
    const fromBelow = below >= 0 ? median - (sorted[below] as number) : Number.POSITIVE_INFINITY;
    const fromAbove = above < count ? (sorted[above] as number) - median : Number.POSITIVE_INFINITY;
    let deviation: number;
    if (fromBelow <= fromAbove) {
      deviation = fromBelow;
      below -= 1;
    } else {
      deviation = fromAbove;
      above += 1;
    }
    if (rank === lowerRank) lowerValue = deviation;
    if (rank === upperRank) return (lowerValue + deviation) / 2;
  }
  return lowerValue;
}

function sortedMedian(buffer: Float64Array, count: number): number {
  const middle = count >> 1;
  return count % 2 === 1 ? (buffer[middle] as number) : ((buffer[middle - 1] as number) + (buffer[middle] as number)) / 2;
}

/**
 * hampelDeviations: each sample's distance from its moving-window median in robust scale units, the statistic of the
 * Hampel identifier (hampelFilter flags it above a threshold t).
 *
 * Formula: d_i = |x_i − m_i|/S_i, m_i = median(x_(i−k..i+k)), S_i = max(1.4826·median|x_j − m_i|, floors).
 * Missing values (NaN) are left out of the windows and get d = NaN; so does a centre whose window holds fewer than
 * k + 1 finite values. Near the ends the window is cut short (not padded). S = 0 (constant window, no floors) gives
 * d = 0 at the median and +∞ elsewhere.
 * Source: Hampel (1974), J. Am. Stat. Assoc. 69:383–393; Pearson (2002), IEEE Trans. Control Syst. Technol.
 * 10(1):55–63 (moving-window identifier); Liu, Shah & Jiang (2004), Comput. Chem. Eng. 28:1635 (from memory).
 *
 * @param values the signal, NaN where missing; not modified.
 * @param options half-width k ≥ 1 (integer) and scale floors ≥ 0.
 * @throws RangeError for a bad half-width or floor.
 */
export function hampelDeviations(values: Float64Array, options: HampelDeviationOptions = {}): Float64Array {
  const halfWidth = options.halfWidth ?? 6;
  const minimumScale = options.minimumScale ?? 0;
  const minimumRelativeScale = options.minimumRelativeScale ?? 0;
  if (!(Number.isInteger(halfWidth) && halfWidth >= 1)) throw new RangeError(`half-width must be a positive integer, got ${halfWidth}`);
  if (!(minimumScale >= 0) || !(minimumRelativeScale >= 0)) throw new RangeError("scale floors must not be negative");
  const count = values.length;
  const deviations = new Float64Array(count).fill(Number.NaN);
  // The window [i − k, i + k] is kept sorted and slid one sample at a time (O(k) per sample).
  const window = new Float64Array(2 * halfWidth + 1);
  let filled = 0;
  for (let j = 0; j <= Math.min(halfWidth, count - 1); j += 1) {
    const value = values[j] as number;
    if (Number.isFinite(value)) filled = insertSorted(window, filled, value);
  }
  for (let index = 0; index < count; index += 1) {
    const centre = values[index] as number;
    if (Number.isFinite(centre) && filled >= halfWidth + 1) {
      const median = sortedMedian(window, filled);
      const scale = Math.max(MAD_SCALE_FACTOR * medianAbsoluteDeviation(window, filled, median), minimumScale, minimumRelativeScale * Math.abs(median));
      const distance = Math.abs(centre - median);
      deviations[index] = distance === 0 ? 0 : scale > 0 ? distance / scale : Number.POSITIVE_INFINITY;
    }
    const leaving = index - halfWidth;
    if (leaving >= 0) {
      const value = values[leaving] as number;
      if (Number.isFinite(value)) filled = removeSorted(window, filled, value);
    }
    const entering = index + halfWidth + 1;
    if (entering < count) {
      const value = values[entering] as number;
      if (Number.isFinite(value)) filled = insertSorted(window, filled, value);
    }
  }
  return deviations;
}
