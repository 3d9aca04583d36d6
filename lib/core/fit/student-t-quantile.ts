import tQuantile from "@stdlib/stats-base-dists-t-quantile";

/**
 * studentTQuantile: the p-quantile of Student's t distribution with ν degrees of freedom.
 *
 * Formula: t_p(ν) = F⁻¹(p; ν) (inverse of the regularised incomplete beta function, via @stdlib 0.2.3).
 * Valid: 0 < p < 1, ν > 0 (non-integer ν allowed, as needed for an effective sample size).
 * Source: Abramowitz & Stegun (1964), Handbook of Mathematical Functions, 26.7; check values FIELD-NOTES §8
 * (t_0.975(3) = 3.182446, t_0.975(10) = 2.2281389).
 *
 * @param probability p in (0, 1)
 * @param degreesOfFreedom ν > 0
 * @returns the quantile
 * @throws RangeError for p outside (0, 1) or ν not positive
 * @example studentTQuantile(0.975, 10) // 2.2281388519862744
 */
export function studentTQuantile(probability: number, degreesOfFreedom: number): number {
  if (!(probability > 0 && probability < 1)) throw new RangeError(`studentTQuantile: probability must be in (0, 1), got ${probability}`);
  if (!(degreesOfFreedom > 0)) throw new RangeError(`studentTQuantile: degrees of freedom must be positive, got ${degreesOfFreedom}`);
  return tQuantile(probability, degreesOfFreedom);
}
