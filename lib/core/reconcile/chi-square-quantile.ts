import { gammaln } from "simple-statistics";
import { regularizedLowerGamma } from "./regularized-lower-gamma";
import { standardNormalQuantile } from "./standard-normal-quantile";

/**
 * chiSquareQuantile: the p-quantile of the chi-square distribution with ν degrees of freedom, χ²_p(ν).
 *
 * Formula: ν = 1: χ² = z²(1 − (1 − p)/2) exactly (the square of a two-sided normal quantile); ν = 2: χ² = −2·ln(1 − p)
 * exactly; otherwise start from Wilson–Hilferty, χ² ≈ ν·(1 − 2/(9ν) + z_p·√(2/(9ν)))³, and refine with Newton steps
 * on P(ν/2, χ²/2) = p (P the regularized lower incomplete gamma), kept positive by halving.
 * Valid: 0 < p < 1, ν a positive integer (any ν > 0 works). Source: Wilson & Hilferty (1931), Proc. Natl. Acad. Sci.
 * 17:684–688; Abramowitz & Stegun (1964), Eqs. 26.4.17 and 26.4.19 (from memory).
 *
 * @throws RangeError for p outside (0, 1) or ν ≤ 0.
 * @example chiSquareQuantile(0.95, 1) // 3.841458820694124
 */
export function chiSquareQuantile(p: number, degreesOfFreedom: number): number {
  if (!(p > 0 && p < 1)) throw new RangeError(`probability must be in (0, 1), got ${p}`);
  if (!(degreesOfFreedom > 0)) throw new RangeError(`degrees of freedom must be positive, got ${degreesOfFreedom}`);
  if (degreesOfFreedom === 1) {
    const z = standardNormalQuantile(1 - (1 - p) / 2);
    return z * z;
  }
  if (degreesOfFreedom === 2) return -2 * Math.log1p(-p);
  const nu = degreesOfFreedom;
  const z = standardNormalQuantile(p);
  const cube = 1 - 2 / (9 * nu) + z * Math.sqrt(2 / (9 * nu));
  let x = cube > 0 ? nu * cube * cube * cube : nu * 1e-3;
  const half = nu / 2;
  const logNormaliser = half * Math.log(2) + gammaln(half);
  for (let iteration = 0; iteration < 60; iteration += 1) {
    const error = regularizedLowerGamma(half, x / 2) - p;
    const density = Math.exp((half - 1) * Math.log(x) - x / 2 - logNormaliser);
    let step = error / density;
    while (x - step <= 0) step /= 2;
    x -= step;
    if (Math.abs(step) <= 1e-13 * x) break;
  }
  return x;
}
