import { levenbergMarquardt, type LevenbergMarquardtOptions } from "../fit";
import { correctedAkaike } from "./corrected-akaike";
import { lagOneAutocorrelation } from "./lag-one-autocorrelation";
import { TREND_MODELS } from "./trend-models";
import type { TrendData, TrendFit, TrendModelKind, TrendPrior } from "./types";
import { varianceInflationFromAutocorrelation } from "./variance-inflation-from-autocorrelation";

/** Options of fitTrendModel; defaults in brackets. */
export interface FitTrendOptions {
  /** Gaussian prior on the shape parameter [none]. Must be for the same model kind. */
  prior?: TrendPrior | null;
  /** "ar1": inflate the covariance and shrink the degrees of freedom by the AR(1) effective sample size ["ar1"]. */
  autocorrelation?: "ar1" | "none";
  /** Passed to levenbergMarquardt [its defaults]. */
  levenbergMarquardt?: LevenbergMarquardtOptions;
}

function checkData(data: TrendData): void {
  const n = data.timeDays.length;
  if (data.foulingM2KPerW.length !== n) throw new RangeError(`fitTrendModel: ${n} times but ${data.foulingM2KPerW.length} values`);
  if (data.weights !== undefined && data.weights.length !== n) throw new RangeError(`fitTrendModel: ${n} times but ${data.weights.length} weights`);
  for (let i = 0; i < n; i += 1) {
    const time = data.timeDays[i] as number;
    if (!Number.isFinite(time) || time < 0) throw new RangeError(`fitTrendModel: time ${i} must be finite and ≥ 0 days, got ${time}`);
    if (i > 0 && time < (data.timeDays[i - 1] as number)) throw new RangeError("fitTrendModel: times must be ascending");
    if (!Number.isFinite(data.foulingM2KPerW[i] as number)) throw new RangeError(`fitTrendModel: value ${i} is not finite`);
    const weight = data.weights?.[i] ?? 1;
    if (!(weight > 0) || !Number.isFinite(weight)) throw new RangeError(`fitTrendModel: weight ${i} must be positive and finite, got ${weight}`);
  }
}

/**
 * fitTrendModel: fits one fouling curve (linear, asymptotic or falling-rate) to one cycle's Rf series.
 *
 * Method: (1) start by variable projection — for each trial shape value (θ or n) the model is linear in (r0, k0 or A),
 * a weighted straight line in the model's basis function, solved by the centred formulas; the best trial starts (2) bounded Levenberg–Marquardt on all
 * parameters, residuals sqrt(wᵢ)·(f(tᵢ) − yᵢ), analytic gradient. With a prior, one pseudo-observation
 * residualScale·(φ − mean)/sd is appended (Theil–Goldberger mixed estimation), so the covariance s²(JᵀJ)⁻¹ is the
 * posterior covariance and the degrees of freedom count the prior as one observation.
 * (3) Serial correlation: ρ = lag-one autocorrelation of the residuals; the covariance is multiplied by
 * (1 + ρ)/(1 − ρ) and the degrees of freedom become n·(1 − ρ)/(1 + ρ) + priors − p (at least 1).
 * AICc from the data RSS with K = p + 1 (the prior is not counted as data).
 * Valid: times in days since the cycle origin, ascending; n ≥ p (2 or 3) points.
 * Source: Golub & Pereyra (1973), SIAM J. Numer. Anal. 10:413–432 (variable projection); Theil & Goldberger (1961),
 * Int. Econ. Rev. 2:65–78 (mixed estimation); Hurvich & Tsai (1989) (AICc); Wilks (2011) Eq. 5.12 (effective
 * sample size); models: see linear-trend, asymptotic-trend, falling-rate-trend.
 *
 * @param kind the model
 * @param data one cycle's times (days), Rf (m²·K/W) and optional weights (not modified)
 * @param options prior, autocorrelation handling, LM options
 * @returns the fit, or null with fewer points than parameters
 * @throws RangeError for malformed data or a prior of another model kind
 */
export function fitTrendModel(kind: TrendModelKind, data: TrendData, options: FitTrendOptions = {}): TrendFit | null {
  checkData(data);
  const model = TREND_MODELS[kind];
  const prior = options.prior ?? null;
  if (prior !== null && prior.kind !== kind) throw new RangeError(`fitTrendModel: a ${prior.kind} prior cannot constrain a ${kind} model`);
  const autocorrelation = options.autocorrelation ?? "ar1";
  const n = data.timeDays.length;
  const parameterCount = model.parameterNames.length;
  if (n < parameterCount) return null;

  const times = data.timeDays;
  const values = data.foulingM2KPerW;
  const weights = Float64Array.from(times, (_, i) => data.weights?.[i] ?? 1);
  const rootWeights = weights.map(Math.sqrt);
  const referenceDays = Math.max(times[n - 1] as number, 1e-9);
  const priorRows = prior === null ? 0 : 1;

  // 1. Variable-projection start: at each trial shape the model is a straight line in its basis function b(t),
  // fitted by the centred weighted formulas (start values only; the final fit is the QR-based LM below).
  const grid = [...model.shapeGrid(referenceDays)];
  if (prior !== null) grid.push(prior.mean);
  const { lower, upper } = model.bounds(referenceDays);
  let weightSum = 0;
  let weightedMean = 0;
  for (let i = 0; i < n; i += 1) {
    weightSum += weights[i] as number;
    weightedMean += (weights[i] as number) * (values[i] as number);
  }
  weightedMean /= weightSum;
  const basisValues = new Float64Array(n);
  let start: Float64Array | null = null;
  let startCost = Number.POSITIVE_INFINITY;
  for (const rawShape of grid) {
    const shape = Math.min(upper[model.shapeIndex] as number, Math.max(lower[model.shapeIndex] as number, rawShape));
    let basisMean = 0;
    for (let i = 0; i < n; i += 1) {
      const value = model.linearBasis(shape, times[i] as number, referenceDays);
      basisValues[i] = value;
      basisMean += (weights[i] as number) * value;
    }
    basisMean /= weightSum;
    let spread = 0;
    let cross = 0;
    for (let i = 0; i < n; i += 1) {
      const deviation = (basisValues[i] as number) - basisMean;
      spread += (weights[i] as number) * deviation * deviation;
      cross += (weights[i] as number) * deviation * ((values[i] as number) - weightedMean);
    }
    if (!(spread > 0)) continue;
    const slope = cross / spread;
    const candidate = Float64Array.from(model.assemble([weightedMean - slope * basisMean, slope], shape));
    let cost = 0;
    for (let i = 0; i < n; i += 1) {
      const residual = model.value(candidate, times[i] as number, referenceDays) - (values[i] as number);
      cost += (weights[i] as number) * residual * residual;
    }
    if (prior !== null) {
      const penalty = (prior.residualScale * ((candidate[model.shapeIndex] as number) - prior.mean)) / prior.standardDeviation;
      cost += penalty * penalty;
    }
    if (cost < startCost) {
      startCost = cost;
      start = candidate;
    }
  }
  if (start === null) return null;

  // 2. Bounded Levenberg–Marquardt with the optional prior pseudo-observation.
  const rows = n + priorRows;
  const gradientBuffer = new Float64Array(parameterCount);
  const fit = levenbergMarquardt(
    {
      initial: Array.from(start),
      lower,
      upper,
      residuals: (parameters) => {
        const residuals = new Float64Array(rows);
        for (let i = 0; i < n; i += 1) {
          residuals[i] = (rootWeights[i] as number) * (model.value(parameters, times[i] as number, referenceDays) - (values[i] as number));
        }
        if (prior !== null) residuals[n] = (prior.residualScale * ((parameters[model.shapeIndex] as number) - prior.mean)) / prior.standardDeviation;
        return residuals;
      },
      jacobian: (parameters) => {
        const jacobian = new Float64Array(rows * parameterCount);
        for (let i = 0; i < n; i += 1) {
          model.gradient(parameters, times[i] as number, referenceDays, gradientBuffer);
          for (let j = 0; j < parameterCount; j += 1) jacobian[i * parameterCount + j] = (rootWeights[i] as number) * (gradientBuffer[j] as number);
        }
        if (prior !== null) jacobian[n * parameterCount + model.shapeIndex] = prior.residualScale / prior.standardDeviation;
        return jacobian;
      },
    },
    options.levenbergMarquardt,
  );

  // 3. Residual statistics, autocorrelation, AICc.
  const parameters = Float64Array.from(fit.parameters);
  const residuals = new Array<number>(n);
  let residualSumOfSquares = 0;
  for (let i = 0; i < n; i += 1) {
    const residual = (values[i] as number) - model.value(parameters, times[i] as number, referenceDays);
    residuals[i] = residual;
    residualSumOfSquares += (weights[i] as number) * residual * residual;
  }
  const freeCount = fit.atBound.filter((held) => !held).length;
  const rho = lagOneAutocorrelation(residuals);
  const inflation = autocorrelation === "ar1" ? varianceInflationFromAutocorrelation(rho) : 1;
  const covariance = fit.covariance === null ? null : fit.covariance.map((row) => row.map((entry) => (entry === null ? null : entry * inflation)));
  const degreesOfFreedom = Math.max(1, n / inflation + priorRows - freeCount);
  const meanWeight = weightSum / n;
  const residualStandardDeviation = fit.residualStandardDeviation === null ? null : fit.residualStandardDeviation / Math.sqrt(meanWeight);

  return {
    kind,
    internalParameters: fit.parameters,
    covariance,
    parameters: model.report(fit.parameters, covariance, referenceDays),
    referenceDays: kind === "falling-rate" ? referenceDays : 0,
    observationCount: n,
    residualSumOfSquares,
    residualStandardDeviation,
    degreesOfFreedom,
    lagOneAutocorrelation: rho,
    varianceInflation: inflation,
    aicc: correctedAkaike(residualSumOfSquares, n, parameterCount),
    converged: fit.converged,
    reason: fit.reason,
    prior,
  };
}
