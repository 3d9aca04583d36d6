/**
 * Fouling-trend core: per-cycle linear, asymptotic (Kern & Seaton) and falling-rate models, AICc selection,
 * empirical-Bayes shape priors from earlier cycles, and delta-method prediction bands. Time in days since the cycle
 * origin; fouling resistance in m²·K/W.
 */
export type { BandPoint, TrendData, TrendFit, TrendModelKind, TrendParameter, TrendPrior } from "./types";
export type { TrendModel } from "./trend-model";
export { LINEAR_TREND } from "./linear-trend";
export { ASYMPTOTIC_TREND } from "./asymptotic-trend";
export { FALLING_RATE_TREND } from "./falling-rate-trend";
export { TREND_MODELS } from "./trend-models";
export { covarianceStandardError } from "./covariance-standard-error";
export { correctedAkaike } from "./corrected-akaike";
export { lagOneAutocorrelation } from "./lag-one-autocorrelation";
export { varianceInflationFromAutocorrelation, MAXIMUM_AUTOCORRELATION } from "./variance-inflation-from-autocorrelation";
export { fitTrendModel, type FitTrendOptions } from "./fit-trend-model";
export { trendValue } from "./trend-value";
export { trendBand } from "./trend-band";
export { trendBandQuantiles, type BandQuantiles } from "./trend-band-quantiles";
export { trendPriorFromFits, type PriorFloors, type PriorSource } from "./trend-prior-from-fits";
export { selectTrendModel, type ModelSelection, type ModelSelectionRow } from "./select-trend-model";
