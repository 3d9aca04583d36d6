import type { QrDecomposition } from "./types";

/** Relative size below which a pivot |R_kk| counts as zero: max(m, n)·ε_machine (LAPACK practice, from memory). */
function defaultRankTolerance(rows: number, columns: number): number {
  return Math.max(rows, columns) * Number.EPSILON;
}

/**
 * householderQr: QR factorisation with column pivoting, A·P = Q·R, by Householder reflections.
 *
 * Algorithm: at step k the remaining column with the largest norm is swapped into place (Businger & Golub 1965),
 * then a reflection H_k = I − τ_k·v_k·v_kᵀ zeroes it below the diagonal; β = −sign(x₀)·‖x‖, τ = (β − x₀)/β,
 * v = x/(x₀ − β) with v₀ = 1 (LAPACK dlarfg convention). Remaining column norms are recomputed exactly at each
 * step (the columns are few here, so the downdating shortcut is not needed).
 * Valid: any m×n matrix of finite numbers; rank-deficient matrices give a numerical rank below min(m, n).
 * Source: Golub & Van Loan (2013), Matrix Computations, 4th ed., Algorithm 5.2.1 (Householder QR) and
 * Algorithm 5.4.1 (QR with column pivoting); Businger & Golub (1965), Numer. Math. 7:269–276.
 *
 * @param matrix row-major m×n values (not modified)
 * @param rows m ≥ 1
 * @param columns n ≥ 1
 * @param rankTolerance relative pivot size counted as zero [max(m, n)·ε]
 * @returns the compact factorisation (see QrDecomposition)
 * @throws RangeError when the sizes do not match the array or are not positive
 */
export function householderQr(
  matrix: Float64Array | readonly number[],
  rows: number,
  columns: number,
  rankTolerance: number = defaultRankTolerance(rows, columns),
): QrDecomposition {
  if (!(rows >= 1 && columns >= 1) || matrix.length !== rows * columns) {
    throw new RangeError(`householderQr: a ${rows}×${columns} matrix needs ${rows * columns} values, got ${matrix.length}`);
  }
  const factors = new Float64Array(rows * columns);
  for (let i = 0; i < rows; i += 1) {
    for (let j = 0; j < columns; j += 1) factors[j * rows + i] = matrix[i * columns + j] as number;
  }
  const steps = Math.min(rows, columns);
  const scalars = new Float64Array(steps);
  const permutation = new Int32Array(columns);
  for (let j = 0; j < columns; j += 1) permutation[j] = j;

  let firstPivot = 0;
  let rank = 0;
  for (let k = 0; k < steps; k += 1) {
    let best = k;
    let bestNorm = -1;
    for (let j = k; j < columns; j += 1) {
      let sum = 0;
      const offset = j * rows;
      for (let i = k; i < rows; i += 1) {
        const value = factors[offset + i] as number;
        sum += value * value;
      }
      if (sum > bestNorm) {
        bestNorm = sum;
        best = j;
      }
    }
    if (best !== k) {
      for (let i = 0; i < rows; i += 1) {
        const a = k * rows + i;
        const b = best * rows + i;
        const swap = factors[a] as number;
        factors[a] = factors[b] as number;
        factors[b] = swap;
      }
      const swapIndex = permutation[k] as number;
      permutation[k] = permutation[best] as number;
      permutation[best] = swapIndex;
    }
    const offset = k * rows;
    const head = factors[offset + k] as number;
    const norm = Math.sqrt(bestNorm);
    if (norm === 0) {
      scalars[k] = 0;
      continue;
    }
    const beta = head >= 0 ? -norm : norm;
    const tau = (beta - head) / beta;
    const divisor = head - beta;
    for (let i = k + 1; i < rows; i += 1) factors[offset + i] = (factors[offset + i] as number) / divisor;
    factors[offset + k] = beta;
    scalars[k] = tau;
    for (let j = k + 1; j < columns; j += 1) {
      const column = j * rows;
      let dot = factors[column + k] as number;
      for (let i = k + 1; i < rows; i += 1) dot += (factors[offset + i] as number) * (factors[column + i] as number);
      dot *= tau;
      factors[column + k] = (factors[column + k] as number) - dot;
      for (let i = k + 1; i < rows; i += 1) factors[column + i] = (factors[column + i] as number) - dot * (factors[offset + i] as number);
    }
    if (k === 0) firstPivot = Math.abs(beta);
    if (Math.abs(beta) > rankTolerance * firstPivot) rank = k + 1;
  }
  return { rows, columns, factors, scalars, permutation, rank };
}
