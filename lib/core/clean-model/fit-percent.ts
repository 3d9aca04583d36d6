/**
 * fitPercent: normalised-root-mean-square fit percentage of a model output against data, per group baseline.
 *
 * Formula: fit = 100·(1 − ‖y − ŷ‖/‖y − ȳ_g‖), ȳ_g the mean of y within each point's group (a single group gives
 * Ljung's definition with the overall mean). 100 is a perfect fit, 0 no better than the group means; it can be negative.
 * Valid: at least one group with two or more distinct values; otherwise null.
 * Source: Ljung (1999), System Identification: Theory for the User, 2nd ed., Sect. 16.6 (model validation);
 * MathWorks System Identification Toolbox, `compare` documentation, NRMSE fit definition (from memory).
 *
 * @param observed y
 * @param predicted ŷ (same length)
 * @param groups group label of each point (same length)
 * @returns percentage, or null
 */
export function fitPercent(observed: readonly number[], predicted: readonly number[], groups: readonly number[]): number | null {
  const sums = new Map<number, { sum: number; count: number }>();
  observed.forEach((value, i) => {
    const group = groups[i] as number;
    const entry = sums.get(group) ?? { sum: 0, count: 0 };
    entry.sum += value;
    entry.count += 1;
    sums.set(group, entry);
  });
  let error = 0;
  let spread = 0;
  observed.forEach((value, i) => {
    const entry = sums.get(groups[i] as number) as { sum: number; count: number };
    const residual = value - (predicted[i] as number);
    const deviation = value - entry.sum / entry.count;
    error += residual * residual;
    spread += deviation * deviation;
  });
  if (!(spread > 0)) return null;
  return 100 * (1 - Math.sqrt(error) / Math.sqrt(spread));
}
