import { complementaryErrorFunction } from "./complementary-error-function";

/**
 * standardNormalCdf: Φ(z), the standard normal distribution function, accurate in both tails.
 *
 * Formula: Φ(z) = erfc(−z/√2)/2.
 * Valid: all real z. Source: Abramowitz & Stegun (1964), Eq. 26.2.29 (from memory).
 *
 * @example standardNormalCdf(1.959963984540054) // 0.975
 */
export function standardNormalCdf(z: number): number {
  return 0.5 * complementaryErrorFunction(-z / Math.SQRT2);
}
