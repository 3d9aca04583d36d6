/**
 * Types of the fouling-trend core. Time inside a cycle is in days since the cycle origin (the return to service
 * after a cleaning, or the first data of the series); fouling resistance in m²·K/W.
 */

/** The three per-cycle fouling curves (Epstein's classification; FIELD-NOTES §4). */
export type TrendModelKind = "linear" | "asymptotic" | "falling-rate";

/** Fouling-resistance observations of one cycle. */
export interface TrendData {
  /** Days since the cycle origin, non-negative, ascending. */
  timeDays: readonly number[];
  /** Fouling resistance, m²·K/W. */
  foulingM2KPerW: readonly number[];
  /** Optional relative weights (proportional to 1/variance); default all 1. */
  weights?: readonly number[];
}

/**
 * A Gaussian prior on a model's shape parameter (ln θ for the asymptotic model, n for the falling-rate model, the
 * rate k in m²·K/W per day for the linear model), added to the least squares as one pseudo-observation
 * residualScale·(p − mean)/standardDeviation (Theil & Goldberger 1961 mixed estimation).
 */
export interface TrendPrior {
  kind: TrendModelKind;
  /** Name of the internal parameter it applies to. */
  parameter: string;
  mean: number;
  standardDeviation: number;
  /** Residual standard deviation that scales the pseudo-observation, m²·K/W (pooled from the source cycles). */
  residualScale: number;
  /** Indices of the cycles the prior was estimated from. */
  sourceCycles: number[];
}

/** One reported model parameter. */
export interface TrendParameter {
  name: string;
  value: number;
  /** Standard error (including the autocorrelation inflation); null when not estimable (at a bound, singular). */
  standardError: number | null;
  unit: string;
}

/** A fitted per-cycle trend model, plain and serialisable. */
export interface TrendFit {
  kind: TrendModelKind;
  /** Internal parameter vector the band and forecast functions use (see the model definitions). */
  internalParameters: number[];
  /** Covariance of the internal parameters, inflated for lag-one autocorrelation; null when not estimable. */
  covariance: (number | null)[][] | null;
  /** Parameters as reported (natural units, e.g. θ in days rather than ln θ). */
  parameters: TrendParameter[];
  /** Time scale of the falling-rate model's amplitude (the data span), days; 0 for the other models. */
  referenceDays: number;
  observationCount: number;
  /** Σ wᵢ(yᵢ − ŷᵢ)² over the data (the prior pseudo-observation not included), (m²·K/W)². */
  residualSumOfSquares: number;
  /** s, the residual standard deviation for a future observation of average weight, m²·K/W; null without dof. */
  residualStandardDeviation: number | null;
  /** Degrees of freedom for the Student-t quantiles, after the effective-sample-size correction (≥ 1). */
  degreesOfFreedom: number;
  /** Lag-one autocorrelation of the residuals in time order; null with fewer than 3 points. */
  lagOneAutocorrelation: number | null;
  /** Variance inflation (1 + ρ)/(1 − ρ) applied to the covariance (1 when ρ ≤ 0 or switched off). */
  varianceInflation: number;
  /** AICc (Hurvich & Tsai 1989); null when n ≤ K + 1. */
  aicc: number | null;
  converged: boolean;
  /** Levenberg–Marquardt stopping reason. */
  reason: string;
  prior: TrendPrior | null;
}

/** One point of a prediction band. */
export interface BandPoint {
  timeDays: number;
  /** Central (fitted) fouling resistance, m²·K/W. */
  center: number;
  /** Standard error of the fitted mean, sqrt(gᵀ·Cov·g), m²·K/W. */
  standardErrorMean: number;
  /** Standard error for a new observation, sqrt(gᵀ·Cov·g + s²), m²·K/W. */
  standardErrorPrediction: number;
  /** 80 % prediction band (10th and 90th percentiles). */
  lower80: number;
  upper80: number;
  /** 95 % prediction band. */
  lower95: number;
  upper95: number;
}
