import type { TrendModelKind, TrendParameter } from "./types";

/**
 * A per-cycle fouling curve: value and gradient in its internal parameters, bounds, the index of the shape parameter
 * that a prior may constrain, and the conversion to reported parameters.
 */
export interface TrendModel {
  kind: TrendModelKind;
  parameterNames: readonly string[];
  /** Index of the internal parameter a TrendPrior applies to. */
  shapeIndex: number;
  value(parameters: ArrayLike<number>, timeDays: number, referenceDays: number): number;
  /** Writes ∂value/∂parameters into `out`. */
  gradient(parameters: ArrayLike<number>, timeDays: number, referenceDays: number, out: Float64Array): void;
  /** Box bounds of the internal parameters for data spanning spanDays. */
  bounds(spanDays: number): { lower: number[]; upper: number[] };
  /** Grid of trial shape values for the variable-projection start (internal units). */
  shapeGrid(spanDays: number): number[];
  /**
   * The model at a fixed shape value is a straight line in one basis function: value = p0 + p1·basis(t), so the start
   * can be found by linear least squares (variable projection, Golub & Pereyra 1973). Returns basis(t).
   */
  linearBasis(shape: number, timeDays: number, referenceDays: number): number;
  /** Assembles the internal vector from the two linear coefficients and the shape value. */
  assemble(linear: [number, number], shape: number): number[];
  /** Reported parameters (natural units) with standard errors from the internal covariance. */
  report(parameters: readonly number[], covariance: (number | null)[][] | null, referenceDays: number): TrendParameter[];
}
