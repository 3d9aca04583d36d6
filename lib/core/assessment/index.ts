/**
 * Fouling assessment of one exchanger: clean-U model, fouling-resistance series and cycles, per-cycle trends with
 * prediction bands, and P10/P50/P90 forecasts of the duty, fouling-allowance and outlet limits.
 */
export type {
  Assessment,
  AssessmentAsset,
  AssessmentCleaning,
  AssessmentCycle,
  AssessmentInput,
  AssessmentOptions,
  AssessmentPeriod,
  CleaningEffectiveness,
  EstimatedValue,
  FoulingSeriesPoint,
  ForecastBandPoint,
} from "./types";
export { assessAsset } from "./assess-asset";
export { resolveAssessmentOptions, type ResolvedAssessmentOptions } from "./resolve-assessment-options";
export { dailyPeriods } from "./daily-periods";
export { observedResistances, type ObservedResistance } from "./observed-resistances";
export { cycleOrigins } from "./cycle-origins";
export { cleaningEffectiveness } from "./cleaning-effectiveness";
export { medianOf } from "./median-of";
export { medianStandardError } from "./median-standard-error";
