/**
 * Types of the least-squares core. Matrices cross the API as row-major Float64Arrays (entry (i, j) of an
 * m×n matrix at i·n + j); results are plain serialisable objects (number arrays, null where undefined).
 */

/** Householder QR factorisation with column pivoting of an m×n matrix A: A·P = Q·R (see householderQr). */
export interface QrDecomposition {
  rows: number;
  columns: number;
  /**
   * Column-major m×n array: R on and above the diagonal; below it the Householder vectors v_k (v_k[k] = 1 is
   * implicit), so that H_k = I − scalars[k]·v_k·v_kᵀ and Qᵀ = H_(K−1)···H_0.
   */
  factors: Float64Array;
  /** Householder scalars τ_k, one per reflection (K = min(m, n)). */
  scalars: Float64Array;
  /** permutation[k] = original index of the k-th pivoted column. */
  permutation: Int32Array;
  /** Numerical rank: the number of leading |R_kk| above rankTolerance·|R_00|. */
  rank: number;
}

/** Result of linearLeastSquares. */
export interface LinearFit {
  coefficients: number[];
  /** Standard errors s·sqrt(diag((XᵀWX)⁻¹)); null when the design is rank-deficient or there is no degree of freedom. */
  standardErrors: (number | null)[];
  /** s²·(XᵀWX)⁻¹; null when rank-deficient or without degrees of freedom. */
  covariance: number[][] | null;
  /** (XᵀWX)⁻¹ without the s² factor; null when rank-deficient. */
  unscaledCovariance: number[][] | null;
  /** Σ wᵢ·(yᵢ − ŷᵢ)². */
  residualSumOfSquares: number;
  /** n − rank. */
  degreesOfFreedom: number;
  /** s = sqrt(RSS/dof); null without degrees of freedom. */
  residualStandardDeviation: number | null;
  /** 1 − RSS/Σ wᵢ(yᵢ − ȳ_w)² (ȳ_w the weighted mean); null when the response does not vary. */
  rSquared: number | null;
  rank: number;
  /** yᵢ − ŷᵢ (unweighted). */
  residuals: number[];
}

/** Why Levenberg–Marquardt stopped. */
export type ConvergenceReason =
  /** The scaled gradient (cosine between residual and every Jacobian column) is below gradientTolerance. */
  | "gradient"
  /** The last accepted step was below stepTolerance relative to the (scaled) parameters. */
  | "step"
  /** The actual and predicted relative reductions of the cost were below costTolerance. */
  | "cost"
  /** The residuals are zero to machine precision. */
  | "zero-residual"
  /** No step reduces the cost although the gradient test is not met (damping exhausted). */
  | "no-progress"
  /** A parameter ran away (|p| grew past divergenceLimit times its start scale): the fit is not trusted. */
  | "diverging"
  /**
   * A stopping test was met, but the Jacobian of the free parameters is rank-deficient there (e.g. an exponential
   * rate run off to where the model is flat), so the parameters are not determined: reported as not converged.
   */
  | "singular"
  | "maximum-iterations"
  /** The residual function returned a non-finite value at the starting point. */
  | "non-finite";

/** A nonlinear least-squares problem: minimise ½‖r(p)‖² subject to lower ≤ p ≤ upper. */
export interface LeastSquaresProblem {
  /** Residual vector r(p) (for a fit: model − observation, each row optionally multiplied by sqrt(weight)). */
  residuals: (parameters: Float64Array) => Float64Array;
  /** Jacobian ∂r/∂p, row-major m×n; forward differences when omitted. */
  jacobian?: (parameters: Float64Array) => Float64Array;
  initial: readonly number[];
  /** Lower bounds (−Infinity allowed); default none. */
  lower?: readonly number[];
  /** Upper bounds (+Infinity allowed); default none. */
  upper?: readonly number[];
}

/** Options of levenbergMarquardt; defaults in resolveLevenbergMarquardtOptions. */
export interface LevenbergMarquardtOptions {
  maximumIterations?: number;
  gradientTolerance?: number;
  stepTolerance?: number;
  costTolerance?: number;
  /** Initial damping relative to the largest diagonal entry of JᵀJ (Madsen, Nielsen & Tingleff 2004, τ). */
  initialDamping?: number;
  /** A parameter is declared diverging when |p_j| exceeds this multiple of max(|p_j(start)|, scale_j). */
  divergenceLimit?: number;
}

/** Result of levenbergMarquardt. Plain, serialisable. */
export interface NonlinearFit {
  parameters: number[];
  /** sqrt of the covariance diagonal; null for a parameter held at a bound or when JᵀJ is singular. */
  standardErrors: (number | null)[];
  /** s²·(JᵀJ)⁻¹ over the free parameters (rows and columns of parameters at an active bound are null). */
  covariance: (number | null)[][] | null;
  /** ‖r‖² at the solution; null when the residuals are not finite. */
  residualSumOfSquares: number | null;
  /** m − (number of free parameters). */
  degreesOfFreedom: number;
  /** sqrt(RSS/dof); null without degrees of freedom. */
  residualStandardDeviation: number | null;
  residuals: number[];
  /** True where the parameter ends on a bound with the gradient pushing outwards (held there). */
  atBound: boolean[];
  converged: boolean;
  reason: ConvergenceReason;
  iterations: number;
  residualEvaluations: number;
  jacobianEvaluations: number;
}
