import type { QrDecomposition } from "./types";

/**
 * solveUpperTriangular: back substitution R₁₁·z = c for the leading size×size block of the R factor.
 *
 * Formula: z_k = (c_k − Σ_(j>k) R_kj·z_j)/R_kk, k = size−1 … 0.
 * Valid: size ≤ rank (non-zero diagonal).
 * Source: Golub & Van Loan (2013), Matrix Computations, 4th ed., Algorithm 3.1.2 (row-oriented back substitution).
 *
 * @param decomposition from householderQr
 * @param rightHandSide c, at least size values (only the first size are read; not modified)
 * @param size leading block size [decomposition.rank]
 * @returns z in pivoted order, length size
 */
export function solveUpperTriangular(
  decomposition: QrDecomposition,
  rightHandSide: Float64Array | readonly number[],
  size: number = decomposition.rank,
): Float64Array {
  const { rows, factors } = decomposition;
  const solution = new Float64Array(size);
  for (let k = size - 1; k >= 0; k -= 1) {
    let sum = rightHandSide[k] as number;
    for (let j = k + 1; j < size; j += 1) sum -= (factors[j * rows + k] as number) * (solution[j] as number);
    solution[k] = sum / (factors[k * rows + k] as number);
  }
  return solution;
}
