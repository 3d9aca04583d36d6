import { grossErrorTests } from "./gross-error-tests";
import { invertPositiveDefinite } from "./invert-positive-definite";
import type { LinearReconciliation } from "./types";

/** Input of {@link reconcileLinear}. */
export interface LinearReconciliationInput {
  /** Measurements y (n values). */
  measurements: readonly number[];
  /** Covariance V: n variances (diagonal) or an n×n symmetric positive semi-definite matrix. */
  covariance: readonly number[] | readonly (readonly number[])[];
  /** Constraint matrix A (m rows of n), constraints A·x = 0, rows linearly independent. */
  constraints: readonly (readonly number[])[];
  /** Significance level of the tests [0.05]. */
  alpha?: number;
}

function covarianceMatrix(covariance: LinearReconciliationInput["covariance"], n: number): number[][] {
  if (covariance.length !== n) throw new RangeError(`covariance must have ${n} entries, got ${covariance.length}`);
  const first = covariance[0];
  if (typeof first === "number" || first === undefined) {
    return Array.from({ length: n }, (_, i) => Array.from({ length: n }, (__, j) => (i === j ? ((covariance as readonly number[])[i] as number) : 0)));
  }
  return (covariance as readonly (readonly number[])[]).map((row) => {
    if (row.length !== n) throw new RangeError("covariance matrix must be n×n");
    return [...row];
  });
}

/**
 * reconcileLinear: weighted least-squares data reconciliation under linear constraints, with gross-error tests.
 *
 * Formula: x̂ = y − VAᵀ(AVAᵀ)⁻¹A·y (minimises (y − x)ᵀV⁻¹(y − x) subject to A·x = 0); r = A·y;
 * γ = rᵀ(AVAᵀ)⁻¹r ~ χ²(m); W = VAᵀ(AVAᵀ)⁻¹AV; z_i = |a_i|/√W_ii.
 * Valid: linear constraints of full row rank m, normal errors with covariance V, AVAᵀ non-singular.
 * Source: Kuehn & Davidson (1961), Chem. Eng. Prog. 57(6):44–47; FIELD-NOTES §6 (closed form and the splitter check
 * y = (100, 60, 38), V = I → x̂ = (99.3333, 60.6667, 38.6667), γ = 1.3333, z_i = 1.1547).
 * Limit: with a single constraint every z_i equals √γ (FIELD-NOTES §6), so the measurement test cannot say which
 * measurement is wrong; fault isolation needs redundancy over time (lib/core/faults).
 *
 * @throws RangeError for inconsistent sizes or singular AVAᵀ.
 * @example reconcileLinear({ measurements: [100, 60, 38], covariance: [1, 1, 1], constraints: [[1, -1, -1]] }).estimates
 *   // [99.333…, 60.666…, 38.666…]
 */
export function reconcileLinear(input: LinearReconciliationInput): LinearReconciliation {
  const y = input.measurements;
  const n = y.length;
  const a = input.constraints;
  const m = a.length;
  if (m === 0) throw new RangeError("at least one constraint is needed");
  for (const row of a) if (row.length !== n) throw new RangeError(`each constraint row must have ${n} entries`);
  const alpha = input.alpha ?? 0.05;
  const v = covarianceMatrix(input.covariance, n);

  // VAᵀ (n×m) and AVAᵀ (m×m).
  const vat: number[][] = Array.from({ length: n }, (_, i) =>
    Array.from({ length: m }, (__, k) => {
      let sum = 0;
      for (let j = 0; j < n; j += 1) sum += ((v[i] as number[])[j] as number) * ((a[k] as readonly number[])[j] as number);
      return sum;
    }),
  );
  const ava: number[][] = Array.from({ length: m }, (_, k) =>
    Array.from({ length: m }, (__, l) => {
      let sum = 0;
      for (let j = 0; j < n; j += 1) sum += ((a[k] as readonly number[])[j] as number) * ((vat[j] as number[])[l] as number);
      return sum;
    }),
  );
  const inverse = invertPositiveDefinite(ava);
  const residual = a.map((row) => row.reduce((sum, value, j) => sum + value * (y[j] as number), 0));
  const weighted = inverse.map((row) => row.reduce((sum, value, l) => sum + value * (residual[l] as number), 0));
  const adjustments = vat.map((row) => row.reduce((sum, value, k) => sum + value * (weighted[k] as number), 0));
  const estimates = y.map((value, i) => value - (adjustments[i] as number));
  const globalTest = residual.reduce((sum, value, k) => sum + value * (weighted[k] as number), 0);
  const adjustmentVariances = vat.map((row) => {
    let sum = 0;
    for (let k = 0; k < m; k += 1) for (let l = 0; l < m; l += 1) sum += (row[k] as number) * ((inverse[k] as number[])[l] as number) * (row[l] as number);
    return sum;
  });
  return {
    estimates,
    adjustments,
    constraintResidual: residual,
    ...grossErrorTests({ globalTest, adjustments, adjustmentVariances, degreesOfFreedom: m, alpha }),
  };
}
