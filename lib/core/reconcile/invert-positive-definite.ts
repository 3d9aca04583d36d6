/**
 * invertPositiveDefinite: the inverse of a symmetric positive-definite matrix by Cholesky factorisation.
 *
 * Formula: M = L·Lᵀ (L lower triangular), M⁻¹ = L⁻ᵀ·L⁻¹.
 * Valid: symmetric positive-definite M (only the lower triangle is read). Source: Golub & Van Loan (2013),
 * Matrix Computations 4th ed., Algorithm 4.2.1 (Cholesky; from memory).
 *
 * @param matrix n×n, rows as arrays; not modified.
 * @throws RangeError if the matrix is not square or not positive definite (a pivot ≤ 1e-14 of the largest diagonal
 *   entry: the constraints are linearly dependent or a constraint involves no uncertain measurement).
 * @returns the inverse as new arrays.
 * @example invertPositiveDefinite([[4, 2], [2, 3]]) // [[0.375, -0.25], [-0.25, 0.5]]
 */
export function invertPositiveDefinite(matrix: readonly (readonly number[])[]): number[][] {
  const n = matrix.length;
  for (const row of matrix) if (row.length !== n) throw new RangeError("matrix must be square");
  let largest = 0;
  for (let i = 0; i < n; i += 1) largest = Math.max(largest, Math.abs((matrix[i] as readonly number[])[i] as number));
  const lower: number[][] = Array.from({ length: n }, () => new Array<number>(n).fill(0));
  for (let j = 0; j < n; j += 1) {
    const rowJ = lower[j] as number[];
    let diagonal = (matrix[j] as readonly number[])[j] as number;
    for (let k = 0; k < j; k += 1) diagonal -= (rowJ[k] as number) ** 2;
    if (!(diagonal > 1e-14 * largest)) {
      throw new RangeError("matrix is not positive definite (dependent constraints, or a constraint without uncertain measurements)");
    }
    const pivot = Math.sqrt(diagonal);
    rowJ[j] = pivot;
    for (let i = j + 1; i < n; i += 1) {
      const rowI = lower[i] as number[];
      let sum = (matrix[i] as readonly number[])[j] as number;
      for (let k = 0; k < j; k += 1) sum -= (rowI[k] as number) * (rowJ[k] as number);
      rowI[j] = sum / pivot;
    }
  }
  // Invert L (lower triangular), then M⁻¹ = L⁻ᵀ L⁻¹.
  const inverseLower: number[][] = Array.from({ length: n }, () => new Array<number>(n).fill(0));
  for (let i = 0; i < n; i += 1) {
    const rowI = lower[i] as number[];
    const inverseRowI = inverseLower[i] as number[];
    inverseRowI[i] = 1 / (rowI[i] as number);
    for (let j = 0; j < i; j += 1) {
      let sum = 0;
      for (let k = j; k < i; k += 1) sum += (rowI[k] as number) * ((inverseLower[k] as number[])[j] as number);
      inverseRowI[j] = -sum / (rowI[i] as number);
    }
  }
  const inverse: number[][] = Array.from({ length: n }, () => new Array<number>(n).fill(0));
  for (let i = 0; i < n; i += 1) {
    for (let j = 0; j <= i; j += 1) {
      let sum = 0;
      for (let k = i; k < n; k += 1) sum += ((inverseLower[k] as number[])[i] as number) * ((inverseLower[k] as number[])[j] as number);
      (inverse[i] as number[])[j] = sum;
      (inverse[j] as number[])[i] = sum;
    }
  }
  return inverse;
}
