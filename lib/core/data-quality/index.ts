/**
 * Data-quality pipeline: raw operating data of one exchanger to screened, reconciled periods and instrument alerts.
 * Pure functions, SI units, serialisable results.
 */
export type { DataQualityAssessment, PeriodResult, ReconciledPeriod, ResolvedDataQualitySettings } from "./types";
export { assessDataQuality, type DataQualityOptions } from "./assess-data-quality";
export { resolveDataQualitySettings, FAST_SAMPLING_LIMIT_S, HISTORIAN_STEADY_STATE } from "./resolve-data-quality-settings";
