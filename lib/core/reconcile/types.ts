/**
 * Results of data reconciliation and gross-error tests. Plain serialisable objects: null (never NaN) where a value
 * does not exist.
 */

/** Global and measurement tests of one reconciliation (Mah & Tamhane 1982; FIELD-NOTES §6). */
export interface GrossErrorTests {
  /** γ = aᵀV⁻¹a = rᵀ(AVAᵀ)⁻¹r, chi-square with degreesOfFreedom under no gross error. */
  globalTest: number;
  degreesOfFreedom: number;
  /** χ²_(1−α)(degreesOfFreedom). */
  globalTestCritical: number;
  /** γ > critical. */
  globalTestRejects: boolean;
  /** z_i = |a_i|/√W_ii per measurement; null for a measurement in no constraint (W_ii = 0). */
  measurementTests: (number | null)[];
  /** Šidák per-test level β = 1 − (1 − α)^(1/n), n = measurements in at least one constraint. */
  sidakLevel: number;
  /** Two-sided critical value Φ⁻¹(1 − β/2). */
  measurementTestCritical: number;
  alpha: number;
}

/** Result of {@link reconcileLinear}. */
export interface LinearReconciliation extends GrossErrorTests {
  /** Reconciled values x̂. */
  estimates: number[];
  /** Adjustments a = y − x̂ (measured minus reconciled). */
  adjustments: number[];
  /** Constraint residuals of the measurements, r = A·y. */
  constraintResidual: number[];
}
