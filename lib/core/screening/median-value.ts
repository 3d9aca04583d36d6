/**
 * Rearranges buffer[0..count) so that buffer[k] holds the k-th smallest value, smaller ones before it and larger ones
 * after it (Hoare's selection with a median-of-three pivot; expected O(n)).
 */
function selectInPlace(buffer: Float64Array, count: number, k: number): void {
  let left = 0;
  let right = count - 1;
  while (right > left) {
    const middle = (left + right) >> 1;
    const a = buffer[left] as number;
    const b = buffer[middle] as number;
    const c = buffer[right] as number;
    const pivot = a < b ? (b < c ? b : a < c ? c : a) : a < c ? a : b < c ? c : b;
    let i = left;
    let j = right;
    while (i <= j) {
      while ((buffer[i] as number) < pivot) i += 1;
      while ((buffer[j] as number) > pivot) j -= 1;
      if (i <= j) {
        const swap = buffer[i] as number;
        buffer[i] = buffer[j] as number;
        buffer[j] = swap;
        i += 1;
        j -= 1;
      }
    }
    if (k <= j) right = j;
    else if (k >= i) left = i;
    else return;
  }
}

/**
 * medianValue: the median of the finite values among `values` (NaN when there are none).
 *
 * Formula: middle order statistic (mean of the two middle ones for an even count), found in expected O(n) by Hoare's
 * selection (Hoare 1961, Commun. ACM 4(7):321, "Find") on a copy, so the input is not modified.
 * Source: definition (e.g. Hampel, Ronchetti, Rousseeuw & Stahel 1986, Robust Statistics, Sect. 2.3).
 *
 * @example medianValue(new Float64Array([3, NaN, 1, 2])) // 2
 */
export function medianValue(values: ArrayLike<number>): number {
  const buffer = new Float64Array(values.length);
  let count = 0;
  for (let index = 0; index < values.length; index += 1) {
    const value = values[index] as number;
    if (Number.isFinite(value)) {
      buffer[count] = value;
      count += 1;
    }
  }
  if (count === 0) return Number.NaN;
  const upper = count >> 1;
  selectInPlace(buffer, count, upper);
  const upperValue = buffer[upper] as number;
  if (count % 2 === 1) return upperValue;
  let lowerValue = Number.NEGATIVE_INFINITY;
  for (let index = 0; index < upper; index += 1) lowerValue = Math.max(lowerValue, buffer[index] as number);
  return (lowerValue + upperValue) / 2;
}
