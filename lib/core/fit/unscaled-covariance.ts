import type { QrDecomposition } from "./types";

/**
 * unscaledCovariance: (AᵀA)⁻¹ from a pivoted QR factorisation A·P = Q·R, without forming AᵀA.
 *
 * Formula: (AᵀA)⁻¹ = P·R⁻¹·R⁻ᵀ·Pᵀ, with R⁻¹ by back substitution column by column.
 * Valid: full column rank (rank = n); otherwise null.
 * Source: Björck (1996), Numerical Methods for Least Squares Problems, SIAM, Sect. 2.8.3 (covariance matrix from
 * the R factor); Golub & Van Loan (2013), 4th ed., Sect. 5.3.2.
 *
 * @param decomposition householderQr of A (m×n)
 * @returns n×n matrix in the original column order, or null when A is rank-deficient
 */
export function unscaledCovariance(decomposition: QrDecomposition): number[][] | null {
  const { rows, columns, factors, permutation, rank } = decomposition;
  if (rank < columns) return null;
  const n = columns;
  // inverse[j*n + i] = (R⁻¹)_ij, upper triangular
  const inverse = new Float64Array(n * n);
  for (let j = 0; j < n; j += 1) {
    inverse[j * n + j] = 1 / (factors[j * rows + j] as number);
    for (let i = j - 1; i >= 0; i -= 1) {
      let sum = 0;
      for (let k = i + 1; k <= j; k += 1) sum += (factors[k * rows + i] as number) * (inverse[j * n + k] as number);
      inverse[j * n + i] = -sum / (factors[i * rows + i] as number);
    }
  }
  const result: number[][] = Array.from({ length: n }, () => new Array<number>(n).fill(0));
  for (let a = 0; a < n; a += 1) {
    for (let b = a; b < n; b += 1) {
      let sum = 0;
      for (let k = b; k < n; k += 1) sum += (inverse[k * n + a] as number) * (inverse[k * n + b] as number);
      const rowIndex = permutation[a] as number;
      const columnIndex = permutation[b] as number;
      (result[rowIndex] as number[])[columnIndex] = sum;
      (result[columnIndex] as number[])[rowIndex] = sum;
    }
  }
  return result;
}
