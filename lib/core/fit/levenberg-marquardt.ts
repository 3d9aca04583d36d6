import { finiteDifferenceJacobian } from "./finite-difference-jacobian";
import { householderQr } from "./householder-qr";
import { leastSquaresSolve } from "./least-squares-solve";
import { resolveLevenbergMarquardtOptions } from "./resolve-levenberg-marquardt-options";
import type { ConvergenceReason, LeastSquaresProblem, LevenbergMarquardtOptions, NonlinearFit } from "./types";
import { unscaledCovariance } from "./unscaled-covariance";

/** Step acceptance threshold on the gain ratio ρ (Madsen, Nielsen & Tingleff 2004, Sect. 2.4, from memory). */
const ACCEPT_GAIN_RATIO = 1e-4;
/** Damping beyond which no further progress is possible in double precision. */
const MAXIMUM_DAMPING = 1e32;

function sumOfSquares(vector: Float64Array): number {
  let sum = 0;
  for (let i = 0; i < vector.length; i += 1) sum += (vector[i] as number) * (vector[i] as number);
  return sum;
}

function allFinite(vector: Float64Array): boolean {
  for (let i = 0; i < vector.length; i += 1) if (!Number.isFinite(vector[i] as number)) return false;
  return true;
}

function columnNorms(jacobian: Float64Array, rows: number, columns: number): Float64Array {
  const norms = new Float64Array(columns);
  for (let i = 0; i < rows; i += 1) {
    for (let j = 0; j < columns; j += 1) {
      const value = jacobian[i * columns + j] as number;
      norms[j] = (norms[j] as number) + value * value;
    }
  }
  for (let j = 0; j < columns; j += 1) norms[j] = Math.sqrt(norms[j] as number);
  return norms;
}

function gradient(jacobian: Float64Array, residuals: Float64Array, rows: number, columns: number): Float64Array {
  const result = new Float64Array(columns);
  for (let i = 0; i < rows; i += 1) {
    const value = residuals[i] as number;
    for (let j = 0; j < columns; j += 1) result[j] = (result[j] as number) + (jacobian[i * columns + j] as number) * value;
  }
  return result;
}

/** Indices of the parameters not held at a bound: a parameter on a bound stays there while −∇ points outwards. */
function freeIndices(parameters: Float64Array, grad: Float64Array, lower: Float64Array, upper: Float64Array): number[] {
  const free: number[] = [];
  for (let j = 0; j < parameters.length; j += 1) {
    const value = parameters[j] as number;
    const slope = grad[j] as number;
    const heldLow = value <= (lower[j] as number) && slope > 0;
    const heldHigh = value >= (upper[j] as number) && slope < 0;
    if (!heldLow && !heldHigh) free.push(j);
  }
  return free;
}

function weightedNorm(vector: Float64Array, scale: Float64Array): number {
  let sum = 0;
  for (let j = 0; j < vector.length; j += 1) {
    const value = (scale[j] as number) * (vector[j] as number);
    sum += value * value;
  }
  return Math.sqrt(sum);
}

/**
 * levenbergMarquardt: bounded nonlinear least squares, min ½‖r(p)‖² subject to lower ≤ p ≤ upper.
 *
 * Algorithm: at each iteration the damped Gauss–Newton step h solves the least-squares problem
 * [J_F; sqrt(λ)·D_F]·h = −[r; 0] by Householder QR (never forming JᵀJ), over the free parameters F;
 * D = diag of the largest column norms of J seen so far (Marquardt's scaling, kept non-decreasing as in Moré 1978).
 * Bounds by projection: p_new = clamp(p + h); a parameter sitting on a bound with the negative gradient pointing out
 * of the box is held there for the step (projected Levenberg–Marquardt, Kanzow, Yamashita & Fukushima 2004).
 * The step is accepted when the gain ratio ρ = (F(p) − F(p_new))/(L(0) − L(p_new − p)) > 1e-4, L the linear model;
 * damping update λ ← λ·max(1/3, 1 − (2ρ − 1)³) on success, λ ← λ·ν, ν ← 2ν on failure (Nielsen 1999).
 * Stops on: scaled gradient max_j |g_j|/(‖J_j‖‖r‖) ≤ gradientTolerance; scaled step ‖D·h‖ ≤ stepTolerance·(‖D·p‖ +
 * stepTolerance); actual and predicted relative cost reduction ≤ costTolerance; zero residual; or failure reasons
 * "no-progress", "diverging", "maximum-iterations", "non-finite" (converged = false for these). A stop at a point
 * where J_F is rank-deficient is reported as "singular", not converged (NIST BoxBOD from start 1 ends so: the rate
 * runs off to where the model is a constant and the gradient vanishes).
 * Covariance at the solution: s²·(J_FᵀJ_F)⁻¹ from the R factor of J_F (s² = ‖r‖²/(m − |F|)); parameters held at a
 * bound get null standard errors.
 * Valid: r continuously differentiable; m ≥ 1. For a fit, the covariance assumes independent residuals of equal
 * variance (after any weighting built into r).
 * Source: Levenberg (1944), Q. Appl. Math. 2:164–168; Marquardt (1963), J. SIAM 11:431–441; Moré (1978), Springer
 * LNM 630:105–116; Nielsen (1999), IMM-REP-1999-05; Madsen, Nielsen & Tingleff (2004), Methods for
 * Non-linear Least Squares Problems, 2nd ed., Algorithm 3.16; Kanzow, Yamashita & Fukushima (2004), J. Comput. Appl.
 * Math. 172:375–397. Validated on NIST StRD Misra1a, Misra1b and BoxBOD (certified values).
 *
 * @param problem residual function, optional analytic Jacobian, start, optional bounds (not modified)
 * @param options tolerances and limits (see resolveLevenbergMarquardtOptions)
 * @returns parameters, standard errors, covariance, RSS, degrees of freedom, convergence information
 * @throws RangeError for inconsistent sizes or bounds, or a non-finite start
 */
export function levenbergMarquardt(problem: LeastSquaresProblem, options: LevenbergMarquardtOptions = {}): NonlinearFit {
  const settings = resolveLevenbergMarquardtOptions(options);
  const columns = problem.initial.length;
  if (columns < 1) throw new RangeError("levenbergMarquardt: need at least one parameter");
  const lower = Float64Array.from(problem.lower ?? new Array<number>(columns).fill(Number.NEGATIVE_INFINITY));
  const upper = Float64Array.from(problem.upper ?? new Array<number>(columns).fill(Number.POSITIVE_INFINITY));
  if (lower.length !== columns || upper.length !== columns) {
    throw new RangeError(`levenbergMarquardt: bounds must have ${columns} entries`);
  }
  const parameters = new Float64Array(columns);
  for (let j = 0; j < columns; j += 1) {
    const start = problem.initial[j] as number;
    if (!Number.isFinite(start)) throw new RangeError(`levenbergMarquardt: starting value ${j} must be finite, got ${start}`);
    if (!((lower[j] as number) <= (upper[j] as number))) throw new RangeError(`levenbergMarquardt: lower bound ${j} exceeds upper bound`);
    parameters[j] = Math.min(upper[j] as number, Math.max(lower[j] as number, start));
  }

  let residualEvaluations = 0;
  let jacobianEvaluations = 0;
  const evaluate = (point: Float64Array): Float64Array => {
    residualEvaluations += 1;
    return problem.residuals(Float64Array.from(point));
  };
  let residuals = evaluate(parameters);
  const rows = residuals.length;
  const jacobianAt = (point: Float64Array, base: Float64Array): Float64Array => {
    jacobianEvaluations += 1;
    if (problem.jacobian !== undefined) {
      const result = problem.jacobian(Float64Array.from(point));
      if (result.length !== rows * columns) throw new RangeError(`levenbergMarquardt: Jacobian must hold ${rows}×${columns} values, got ${result.length}`);
      return result;
    }
    const numeric = finiteDifferenceJacobian(problem.residuals, point, base, lower, upper);
    residualEvaluations += numeric.evaluations;
    return numeric.jacobian;
  };

  let converged = false;
  let reason: ConvergenceReason = "maximum-iterations";
  let iterations = 0;
  if (rows < 1 || !allFinite(residuals)) {
    reason = "non-finite";
    return finish();
  }
  let cost = 0.5 * sumOfSquares(residuals);
  let jacobian = jacobianAt(parameters, residuals);
  const scale = columnNorms(jacobian, rows, columns);
  for (let j = 0; j < columns; j += 1) if (!((scale[j] as number) > 0)) scale[j] = 1;
  const residualNorm0 = Math.sqrt(2 * cost);
  const referenceSize = new Float64Array(columns);
  for (let j = 0; j < columns; j += 1) {
    referenceSize[j] = Math.max(Math.abs(parameters[j] as number), residualNorm0 / (scale[j] as number), Number.MIN_VALUE);
  }
  let damping = settings.initialDamping;
  let growth = 2;

  for (iterations = 0; iterations < settings.maximumIterations; iterations += 1) {
    if (cost === 0) {
      converged = true;
      reason = "zero-residual";
      break;
    }
    const grad = gradient(jacobian, residuals, rows, columns);
    const free = freeIndices(parameters, grad, lower, upper);
    const norms = columnNorms(jacobian, rows, columns);
    const residualNorm = Math.sqrt(2 * cost);
    let scaledGradient = 0;
    for (const j of free) {
      const norm = norms[j] as number;
      if (norm > 0) scaledGradient = Math.max(scaledGradient, Math.abs(grad[j] as number) / (norm * residualNorm));
    }
    if (free.length === 0 || scaledGradient <= settings.gradientTolerance) {
      converged = true;
      reason = "gradient";
      break;
    }

    // Damped subproblem over the free parameters: [J_F; sqrt(λ)·D_F]·h = −[r; 0].
    const freeCount = free.length;
    const augmentedRows = rows + freeCount;
    const augmented = new Float64Array(augmentedRows * freeCount);
    for (let i = 0; i < rows; i += 1) {
      for (let f = 0; f < freeCount; f += 1) augmented[i * freeCount + f] = jacobian[i * columns + (free[f] as number)] as number;
    }
    const root = Math.sqrt(damping);
    for (let f = 0; f < freeCount; f += 1) augmented[(rows + f) * freeCount + f] = root * (scale[free[f] as number] as number);
    const rightHandSide = new Float64Array(augmentedRows);
    for (let i = 0; i < rows; i += 1) rightHandSide[i] = -(residuals[i] as number);
    const { solution } = leastSquaresSolve(householderQr(augmented, augmentedRows, freeCount), rightHandSide);

    const candidate = Float64Array.from(parameters);
    for (let f = 0; f < freeCount; f += 1) {
      const j = free[f] as number;
      candidate[j] = Math.min(upper[j] as number, Math.max(lower[j] as number, (parameters[j] as number) + (solution[f] as number)));
    }
    const step = new Float64Array(columns);
    for (let j = 0; j < columns; j += 1) step[j] = (candidate[j] as number) - (parameters[j] as number);
    const stepNorm = weightedNorm(step, scale);
    const parameterNorm = weightedNorm(parameters, scale);
    const tinyStep = stepNorm <= settings.stepTolerance * (parameterNorm + settings.stepTolerance);

    // Predicted reduction of the linear model for the projected step.
    let linearSum = 0;
    for (let i = 0; i < rows; i += 1) {
      let value = residuals[i] as number;
      for (let j = 0; j < columns; j += 1) value += (jacobian[i * columns + j] as number) * (step[j] as number);
      linearSum += value * value;
    }
    const predicted = cost - 0.5 * linearSum;
    const candidateResiduals = stepNorm > 0 ? evaluate(candidate) : residuals;
    const candidateFinite = allFinite(candidateResiduals);
    const candidateCost = candidateFinite ? 0.5 * sumOfSquares(candidateResiduals) : Number.POSITIVE_INFINITY;
    const actual = cost - candidateCost;
    const gain = predicted > 0 ? actual / predicted : -1;

    if (gain > ACCEPT_GAIN_RATIO && actual > 0) {
      const smallReduction = actual <= settings.costTolerance * cost && predicted <= settings.costTolerance * cost;
      parameters.set(candidate);
      residuals = candidateResiduals;
      cost = candidateCost;
      jacobian = jacobianAt(parameters, residuals);
      const newNorms = columnNorms(jacobian, rows, columns);
      for (let j = 0; j < columns; j += 1) scale[j] = Math.max(scale[j] as number, newNorms[j] as number);
      damping *= Math.max(1 / 3, 1 - Math.pow(2 * gain - 1, 3));
      growth = 2;
      let diverging = false;
      for (let j = 0; j < columns; j += 1) {
        if (Math.abs(parameters[j] as number) > settings.divergenceLimit * (referenceSize[j] as number)) diverging = true;
      }
      if (diverging) {
        reason = "diverging";
        iterations += 1;
        break;
      }
      if (tinyStep) {
        converged = true;
        reason = "step";
        iterations += 1;
        break;
      }
      if (smallReduction) {
        converged = true;
        reason = "cost";
        iterations += 1;
        break;
      }
    } else {
      if (tinyStep) {
        converged = true;
        reason = "step";
        iterations += 1;
        break;
      }
      damping *= growth;
      growth *= 2;
      if (damping > MAXIMUM_DAMPING) {
        reason = "no-progress";
        iterations += 1;
        break;
      }
    }
  }
  return finish();

  function finish(): NonlinearFit {
    const finiteResiduals = rows > 0 && allFinite(residuals);
    const residualSumOfSquares = finiteResiduals ? sumOfSquares(residuals) : Number.NaN;
    const atBound = new Array<boolean>(columns).fill(false);
    let covariance: (number | null)[][] | null = null;
    const standardErrors: (number | null)[] = new Array<number | null>(columns).fill(null);
    let degreesOfFreedom = rows - columns;
    if (finiteResiduals && reason !== "non-finite") {
      const finalJacobian = jacobianAt(parameters, residuals);
      const grad = gradient(finalJacobian, residuals, rows, columns);
      const free = freeIndices(parameters, grad, lower, upper);
      for (let j = 0; j < columns; j += 1) atBound[j] = !free.includes(j);
      degreesOfFreedom = rows - free.length;
      if (free.length > 0 && degreesOfFreedom > 0) {
        const reduced = new Float64Array(rows * free.length);
        for (let i = 0; i < rows; i += 1) {
          for (let f = 0; f < free.length; f += 1) reduced[i * free.length + f] = finalJacobian[i * columns + (free[f] as number)] as number;
        }
        const unscaled = unscaledCovariance(householderQr(reduced, rows, free.length));
        if (unscaled === null && converged) {
          converged = false;
          reason = "singular";
        }
        if (unscaled !== null) {
          const variance = residualSumOfSquares / degreesOfFreedom;
          covariance = Array.from({ length: columns }, () => new Array<number | null>(columns).fill(null));
          for (let a = 0; a < free.length; a += 1) {
            for (let b = 0; b < free.length; b += 1) {
              (covariance[free[a] as number] as (number | null)[])[free[b] as number] = variance * ((unscaled[a] as number[])[b] as number);
            }
            standardErrors[free[a] as number] = Math.sqrt(variance * ((unscaled[a] as number[])[a] as number));
          }
        }
      }
    }
    return {
      parameters: Array.from(parameters),
      standardErrors,
      covariance,
      residualSumOfSquares: Number.isFinite(residualSumOfSquares) ? residualSumOfSquares : null,
      degreesOfFreedom,
      residualStandardDeviation: degreesOfFreedom > 0 && Number.isFinite(residualSumOfSquares) ? Math.sqrt(residualSumOfSquares / degreesOfFreedom) : null,
      residuals: finiteResiduals ? Array.from(residuals) : [],
      atBound,
      converged,
      reason,
      iterations,
      residualEvaluations,
      jacobianEvaluations,
    };
  }
}
