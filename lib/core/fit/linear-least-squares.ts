import { householderQr } from "./householder-qr";
import { leastSquaresSolve } from "./least-squares-solve";
import { unscaledCovariance } from "./unscaled-covariance";
import type { LinearFit } from "./types";

/** Input of linearLeastSquares. */
export interface LinearLeastSquaresInput {
  /** Design matrix X, row-major n×p. */
  design: Float64Array | readonly number[];
  /** Response y, length n. */
  response: Float64Array | readonly number[];
  /** p, the number of columns of X. */
  columns: number;
  /** Optional non-negative weights wᵢ (e.g. 1/σᵢ²); default all 1. */
  weights?: Float64Array | readonly number[];
}

/**
 * linearLeastSquares: ordinary or weighted linear least squares by Householder QR with column pivoting.
 *
 * Formula: b̂ = argmin Σ wᵢ(yᵢ − xᵢᵀb)², solved as the least-squares problem W^½X·b ≈ W^½y (never through the
 * normal equations); s² = RSS/(n − p); Cov(b̂) = s²·(XᵀWX)⁻¹ = s²·P·R⁻¹R⁻ᵀ·Pᵀ; R² = 1 − RSS/TSS with TSS about the
 * weighted mean (the design is assumed to contain an intercept column when R² is used).
 * Valid: n ≥ p; a rank-deficient design gives the basic solution and null covariance.
 * Source: Golub & Van Loan (2013), Matrix Computations, 4th ed., Sect. 5.3.3; Björck (1996), Numerical Methods for
 * Least Squares Problems, Sect. 2.8; validated on NIST StRD Norris (certified values, ≥ 10 digits).
 *
 * @param input design (row-major), response, column count, optional weights (inputs not modified)
 * @returns coefficients, standard errors, covariance, RSS, degrees of freedom, s, R², rank, residuals
 * @throws RangeError for mismatched sizes, fewer rows than columns, negative or non-finite weights
 * @example linearLeastSquares({ design: [1, 1, 1, 2, 1, 3], response: [1, 2, 3], columns: 2 }).coefficients // [0, 1]
 */
export function linearLeastSquares(input: LinearLeastSquaresInput): LinearFit {
  const { design, response, columns } = input;
  const rows = response.length;
  if (!(columns >= 1) || design.length !== rows * columns) {
    throw new RangeError(`linearLeastSquares: design must hold ${rows}×${columns} values, got ${design.length}`);
  }
  if (rows < columns) throw new RangeError(`linearLeastSquares: need at least ${columns} observations, got ${rows}`);
  const weights = input.weights;
  if (weights !== undefined && weights.length !== rows) {
    throw new RangeError(`linearLeastSquares: need ${rows} weights, got ${weights.length}`);
  }
  const scaledDesign = new Float64Array(rows * columns);
  const scaledResponse = new Float64Array(rows);
  let weightSum = 0;
  let weightedResponseSum = 0;
  for (let i = 0; i < rows; i += 1) {
    const weight = weights === undefined ? 1 : (weights[i] as number);
    if (!(weight >= 0) || !Number.isFinite(weight)) throw new RangeError(`linearLeastSquares: weight ${i} must be finite and non-negative, got ${weight}`);
    const root = Math.sqrt(weight);
    for (let j = 0; j < columns; j += 1) scaledDesign[i * columns + j] = root * (design[i * columns + j] as number);
    scaledResponse[i] = root * (response[i] as number);
    weightSum += weight;
    weightedResponseSum += weight * (response[i] as number);
  }
  const decomposition = householderQr(scaledDesign, rows, columns);
  const { solution, residualSumOfSquares } = leastSquaresSolve(decomposition, scaledResponse);
  const coefficients = Array.from(solution);
  const residuals = new Array<number>(rows);
  for (let i = 0; i < rows; i += 1) {
    let fitted = 0;
    for (let j = 0; j < columns; j += 1) fitted += (design[i * columns + j] as number) * (solution[j] as number);
    residuals[i] = (response[i] as number) - fitted;
  }
  const degreesOfFreedom = rows - decomposition.rank;
  const variance = degreesOfFreedom > 0 ? residualSumOfSquares / degreesOfFreedom : null;
  const unscaled = unscaledCovariance(decomposition);
  const covariance = unscaled !== null && variance !== null ? unscaled.map((row) => row.map((value) => value * variance)) : null;
  const standardErrors = coefficients.map((_, j) => {
    const entry = covariance?.[j]?.[j];
    return entry === undefined ? null : Math.sqrt(entry);
  });
  let totalSumOfSquares = 0;
  if (weightSum > 0) {
    const mean = weightedResponseSum / weightSum;
    for (let i = 0; i < rows; i += 1) {
      const weight = weights === undefined ? 1 : (weights[i] as number);
      const deviation = (response[i] as number) - mean;
      totalSumOfSquares += weight * deviation * deviation;
    }
  }
  return {
    coefficients,
    standardErrors,
    covariance,
    unscaledCovariance: unscaled,
    residualSumOfSquares,
    degreesOfFreedom,
    residualStandardDeviation: variance === null ? null : Math.sqrt(variance),
    rSquared: totalSumOfSquares > 0 ? 1 - residualSumOfSquares / totalSumOfSquares : null,
    rank: decomposition.rank,
    residuals,
  };
}
