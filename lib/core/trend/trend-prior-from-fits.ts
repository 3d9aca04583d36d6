import { TREND_MODELS } from "./trend-models";
import type { TrendFit, TrendModelKind, TrendPrior } from "./types";

/** Smallest between-cycle standard deviation of each shape parameter (see trendPriorFromFits). */
export interface PriorFloors {
  /** ln θ of the asymptotic model [0.35, i.e. θ within about ×/÷ 1.4 at one SD]. */
  logTimeConstant?: number;
  /** n of the falling-rate model [0.1]. */
  exponent?: number;
  /** Rate k of the linear model, relative to the prior mean rate [0.3]. */
  relativeRate?: number;
}

/** One earlier cycle's fit offered as a prior source. */
export interface PriorSource {
  cycleIndex: number;
  fit: TrendFit;
}

const DEFAULT_FLOORS: Required<PriorFloors> = { logTimeConstant: 0.35, exponent: 0.1, relativeRate: 0.3 };

/**
 * trendPriorFromFits: an empirical-Bayes Gaussian prior for a cycle's shape parameter from the same asset's earlier
 * cycles fitted with the same model.
 *
 * Formula (random-effects pooling of the earlier estimates φ_k with variances v_k): w_k = 1/v_k,
 * φ_FE = Σw_kφ_k/Σw_k, Q = Σw_k(φ_k − φ_FE)², τ² = max(0, (Q − (K − 1))/(Σw_k − Σw_k²/Σw_k)) (DerSimonian–Laird);
 * τ² is then raised to at least floor² (a single earlier cycle says nothing about the spread between cycles);
 * mean μ = Σw*_kφ_k/Σw*_k with w*_k = 1/(v_k + τ²); prior SD = sqrt(τ² + 1/Σw*_k) (predictive for a new cycle);
 * residual scale = sqrt(mean s_k²) of the source fits. Floors: ln θ 0.35, n 0.1, linear rate 30 % of |μ|
 * (judgement: cycles of one exchanger differ in crude slate, season and cleaning quality; common practice).
 * Valid: sources that converged with a finite standard error of the shape parameter; otherwise they are skipped.
 * Source: DerSimonian & Laird (1986), Control. Clin. Trials 7:177–188 (τ² estimator); Theil & Goldberger (1961)
 * (the prior enters the fit as a pseudo-observation, see fitTrendModel).
 *
 * @param kind the model the prior is for
 * @param sources earlier cycles' fits (fits of other kinds are ignored; not modified)
 * @param floors between-cycle SD floors
 * @returns the prior, or null when no usable source exists
 */
export function trendPriorFromFits(kind: TrendModelKind, sources: readonly PriorSource[], floors: PriorFloors = {}): TrendPrior | null {
  const model = TREND_MODELS[kind];
  const floor = { ...DEFAULT_FLOORS, ...floors };
  const usable: { cycleIndex: number; estimate: number; variance: number; residualSd: number }[] = [];
  for (const source of sources) {
    const fit = source.fit;
    if (fit.kind !== kind || !fit.converged || fit.residualStandardDeviation === null) continue;
    const variance = fit.covariance?.[model.shapeIndex]?.[model.shapeIndex];
    const estimate = fit.internalParameters[model.shapeIndex];
    if (typeof variance !== "number" || !(variance > 0) || !Number.isFinite(variance) || estimate === undefined) continue;
    usable.push({ cycleIndex: source.cycleIndex, estimate, variance, residualSd: fit.residualStandardDeviation });
  }
  if (usable.length === 0) return null;

  let weightSum = 0;
  let weightSquaredSum = 0;
  let weightedSum = 0;
  for (const item of usable) {
    const weight = 1 / item.variance;
    weightSum += weight;
    weightSquaredSum += weight * weight;
    weightedSum += weight * item.estimate;
  }
  const fixedMean = weightedSum / weightSum;
  let heterogeneity = 0;
  for (const item of usable) heterogeneity += ((item.estimate - fixedMean) * (item.estimate - fixedMean)) / item.variance;
  const denominator = weightSum - weightSquaredSum / weightSum;
  const between = usable.length > 1 && denominator > 0 ? Math.max(0, (heterogeneity - (usable.length - 1)) / denominator) : 0;

  const pooled = (betweenVariance: number): { mean: number; precision: number } => {
    let precision = 0;
    let sum = 0;
    for (const item of usable) {
      const weight = 1 / (item.variance + betweenVariance);
      precision += weight;
      sum += weight * item.estimate;
    }
    return { mean: sum / precision, precision };
  };
  let floorValue: number;
  switch (kind) {
    case "asymptotic":
      floorValue = floor.logTimeConstant;
      break;
    case "falling-rate":
      floorValue = floor.exponent;
      break;
    case "linear":
      floorValue = floor.relativeRate * Math.abs(pooled(between).mean);
      break;
  }
  const betweenVariance = Math.max(between, floorValue * floorValue);
  const { mean, precision } = pooled(betweenVariance);
  let residualVariance = 0;
  for (const item of usable) residualVariance += item.residualSd * item.residualSd;
  return {
    kind,
    parameter: model.parameterNames[model.shapeIndex] as string,
    mean,
    standardDeviation: Math.sqrt(betweenVariance + 1 / precision),
    residualScale: Math.sqrt(residualVariance / usable.length),
    sourceCycles: usable.map((item) => item.cycleIndex),
  };
}
