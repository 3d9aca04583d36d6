/**
 * lagOneAutocorrelation: sample autocorrelation at lag one of a series in time order.
 *
 * Formula: r₁ = Σ_(i=1..n−1) (eᵢ − ē)(eᵢ₊₁ − ē) / Σ_(i=1..n) (eᵢ − ē)².
 * Valid: n ≥ 3 and a series that is not constant (otherwise null). Observations are taken as equally spaced: a gap in
 * the data is treated as one step (which understates the correlation per day across gaps).
 * Source: Box, Jenkins & Reinsel (2008), Time Series Analysis, 4th ed., Eq. 2.1.12 (from memory).
 *
 * @param series values in time order
 * @returns r₁ in [−1, 1], or null
 * @example lagOneAutocorrelation([1, 2, 3, 4]) // 0.25
 */
export function lagOneAutocorrelation(series: readonly number[]): number | null {
  const n = series.length;
  if (n < 3) return null;
  let mean = 0;
  for (const value of series) mean += value;
  mean /= n;
  let denominator = 0;
  let numerator = 0;
  for (let i = 0; i < n; i += 1) {
    const deviation = (series[i] as number) - mean;
    denominator += deviation * deviation;
    if (i + 1 < n) numerator += deviation * ((series[i + 1] as number) - mean);
  }
  return denominator > 0 ? numerator / denominator : null;
}
