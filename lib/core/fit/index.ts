/**
 * Least-squares core: Householder QR with column pivoting, linear (weighted) least squares, bounded
 * Levenberg–Marquardt, Student-t quantiles. Pure functions; matrices row-major; results plain objects.
 */
export type { ConvergenceReason, LeastSquaresProblem, LevenbergMarquardtOptions, LinearFit, NonlinearFit, QrDecomposition } from "./types";
export { householderQr } from "./householder-qr";
export { applyQTranspose } from "./apply-q-transpose";
export { solveUpperTriangular } from "./solve-upper-triangular";
export { leastSquaresSolve } from "./least-squares-solve";
export { unscaledCovariance } from "./unscaled-covariance";
export { linearLeastSquares, type LinearLeastSquaresInput } from "./linear-least-squares";
export { finiteDifferenceJacobian } from "./finite-difference-jacobian";
export { levenbergMarquardt } from "./levenberg-marquardt";
export {
  resolveLevenbergMarquardtOptions,
  LEVENBERG_MARQUARDT_DEFAULTS,
  type ResolvedLevenbergMarquardtOptions,
} from "./resolve-levenberg-marquardt-options";
export { studentTQuantile } from "./student-t-quantile";
