/**
 * sidakLevel: the per-test significance level that keeps the family-wise level at α over n independent tests.
 *
 * Formula: β = 1 − (1 − α)^(1/n).
 * Valid: 0 < α < 1, n ≥ 1. Source: Šidák (1967), J. Am. Stat. Assoc. 62:626–633; used for the measurement test by
 * Mah & Tamhane (1982), AIChE J. 28(5):828–830 (FIELD-NOTES §6, check value β = 0.016952 for α = 0.05, n = 3 [C]).
 *
 * @throws RangeError for α outside (0, 1) or n < 1.
 * @example sidakLevel(0.05, 3) // 0.016952427508441503
 */
export function sidakLevel(alpha: number, count: number): number {
  if (!(alpha > 0 && alpha < 1)) throw new RangeError(`alpha must be in (0, 1), got ${alpha}`);
  if (!(count >= 1)) throw new RangeError(`number of tests must be at least 1, got ${count}`);
  return -Math.expm1(Math.log1p(-alpha) / count);
}
