import { criticalValuesFor, type CriticalValues } from "./critical-values-for";
import type { GrossErrorTests } from "./types";

/** Input of {@link grossErrorTests}. */
export interface GrossErrorTestInput {
  /** γ = rᵀ(AVAᵀ)⁻¹r (equivalently aᵀV⁻¹a), computed by the reconciliation. */
  globalTest: number;
  /** a = y − x̂. */
  adjustments: readonly number[];
  /** W_ii, the variances of the adjustments (0 for a measurement in no constraint). */
  adjustmentVariances: readonly number[];
  /** m, the number of independent constraints. */
  degreesOfFreedom: number;
  /** Significance level in (0, 1). */
  alpha: number;
  /**
   * Critical values computed beforehand for this α, m and number of tested measurements (criticalValuesFor), to
   * save the quantile computations when many small reconciliations share them.
   */
  criticalValues?: CriticalValues;
}



/**
 * grossErrorTests: the global test and the measurement tests of a reconciliation.
 *
 * Formula: gross error in the set when γ > χ²_(1−α)(m); in measurement i when z_i = |a_i|/√W_ii > Φ⁻¹(1 − β/2),
 * W = VAᵀ(AVAᵀ)⁻¹AV, β = 1 − (1 − α)^(1/n) (Šidák), n = measurements with W_ii > 0.
 * Valid: normal random errors with known covariance V and m independent constraints.
 * Source: global test, Reilly & Carpani (1963), measurement test, Mah & Tamhane (1982), AIChE J. 28(5):828–830;
 * Narasimhan & Jordache (2000), Data Reconciliation and Gross Error Detection, ch. 7 (from memory); FIELD-NOTES §6.
 */
export function grossErrorTests(input: GrossErrorTestInput): GrossErrorTests {
  const { adjustments, adjustmentVariances, degreesOfFreedom, alpha, globalTest } = input;
  let scale = 0;
  for (const value of adjustmentVariances) scale = Math.max(scale, Math.abs(value));
  const measurementTests = adjustments.map((adjustment, i) => {
    const variance = adjustmentVariances[i] as number;
    return variance > 1e-12 * scale && variance > 0 ? Math.abs(adjustment) / Math.sqrt(variance) : null;
  });
  const tested = Math.max(1, measurementTests.filter((value) => value !== null).length);
  const critical = input.criticalValues ?? criticalValuesFor(alpha, degreesOfFreedom, tested);
  return {
    globalTest,
    degreesOfFreedom,
    globalTestCritical: critical.globalTestCritical,
    globalTestRejects: globalTest > critical.globalTestCritical,
    measurementTests,
    sidakLevel: critical.sidakLevel,
    measurementTestCritical: critical.measurementTestCritical,
    alpha,
  };
}
