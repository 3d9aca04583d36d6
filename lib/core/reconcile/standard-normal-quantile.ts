import { probit } from "simple-statistics";
import { standardNormalCdf } from "./standard-normal-cdf";

const INVERSE_SQRT_TWO_PI = 1 / Math.sqrt(2 * Math.PI);

/**
 * standardNormalQuantile: Φ⁻¹(p), the standard normal quantile, to about 1e-14.
 *
 * Method: start from simple-statistics' probit (Winitzki's closed-form inverse error function, about 1e-3
 * relative), then Halley steps z ← z − e/(1 + z·e/2), e = (Φ(z) − p)/φ(z), on the lower tail (p ≤ 1/2) and by
 * symmetry Φ⁻¹(p) = −Φ⁻¹(1 − p) above, so small tail probabilities keep their relative precision.
 * Valid: 0 < p < 1 (0 → −∞, 1 → +∞). Source: Halley's method, e.g. Press et al. (2007), Numerical Recipes 3rd
 * ed., Sect. 9.4 (from memory); Φ from standardNormalCdf.
 *
 * @throws RangeError for p outside [0, 1] or NaN.
 * @example standardNormalQuantile(0.975) // 1.959963984540054
 */
export function standardNormalQuantile(p: number): number {
  if (!(p >= 0 && p <= 1)) throw new RangeError(`probability must be in [0, 1], got ${p}`);
  if (p === 0) return Number.NEGATIVE_INFINITY;
  if (p === 1) return Number.POSITIVE_INFINITY;
  if (p > 0.5) return -standardNormalQuantile(1 - p);
  let z = probit(p);
  if (!Number.isFinite(z)) z = -Math.sqrt(-2 * Math.log(p));
  for (let iteration = 0; iteration < 8; iteration += 1) {
    const density = INVERSE_SQRT_TWO_PI * Math.exp(-0.5 * z * z);
    const error = (standardNormalCdf(z) - p) / density;
    const step = error / (1 + (z * error) / 2);
    z -= step;
    if (Math.abs(step) <= 1e-15 * Math.max(1, Math.abs(z))) break;
  }
  return z;
}
