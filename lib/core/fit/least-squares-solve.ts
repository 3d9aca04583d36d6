import { applyQTranspose } from "./apply-q-transpose";
import { solveUpperTriangular } from "./solve-upper-triangular";
import type { QrDecomposition } from "./types";

/**
 * leastSquaresSolve: the x minimising ‖A·x − b‖ from a pivoted QR factorisation of A.
 *
 * Formula: c = Qᵀb; R₁₁·z = c₁ (leading rank×rank block); x_P = (z, 0) (the "basic" solution when A is
 * rank-deficient: the columns pivoted beyond the rank get 0); RSS = Σ_(i ≥ rank) c_i².
 * Source: Golub & Van Loan (2013), Matrix Computations, 4th ed., Sect. 5.3.3 (QR least squares) and
 * Sect. 5.5.5 (basic solutions via QR with column pivoting).
 *
 * @param decomposition householderQr of A (m×n)
 * @param rightHandSide b, length m (not modified)
 * @returns x in the original column order and the residual sum of squares
 */
export function leastSquaresSolve(
  decomposition: QrDecomposition,
  rightHandSide: Float64Array | readonly number[],
): { solution: Float64Array; residualSumOfSquares: number } {
  const transformed = applyQTranspose(decomposition, rightHandSide);
  const pivoted = solveUpperTriangular(decomposition, transformed, decomposition.rank);
  const solution = new Float64Array(decomposition.columns);
  for (let k = 0; k < decomposition.rank; k += 1) solution[decomposition.permutation[k] as number] = pivoted[k] as number;
  let residualSumOfSquares = 0;
  for (let i = decomposition.rank; i < decomposition.rows; i += 1) {
    const value = transformed[i] as number;
    residualSumOfSquares += value * value;
  }
  return { solution, residualSumOfSquares };
}
