/**
 * Screening of raw operating data: missing values, Hampel outliers, steady-state identification (Cao–Rhinehart),
 * physical plausibility, and aggregation into hourly or daily periods. Pure functions, SI units.
 */
export type {
  ExchangerModel,
  ExclusionCounts,
  ExclusionReason,
  InstrumentModel,
  InstrumentRole,
  OperatingPoint,
  PeriodAggregate,
  PeriodMeans,
  ReadingColumns,
  SampleFlags,
} from "./types";
export { EXCLUSION_REASONS } from "./types";
export { readingColumnsFromRows, type ReadingRow } from "./reading-columns-from-rows";
export { roleColumn, ROLE_COLUMN_KEYS } from "./role-column";
export { operatingPointAt } from "./operating-point-at";
export { standardDeviationsAt } from "./standard-deviations-at";
export { medianValue } from "./median-value";
export { nominalStep } from "./nominal-step";
export { instrumentUncertainties, type InstrumentUncertainties } from "./instrument-uncertainties";
export { caoRhinehartRStatistic, R_STATISTIC_DEFAULTS, type RStatisticOptions } from "./cao-rhinehart-r-statistic";
export { steadyStateFlags, STEADY_STATE_CRITICAL_VALUE, STEADY_STATE_SIGNALS, type SteadyStateFlags, type SteadyStateOptions } from "./steady-state-flags";
export { MAD_SCALE_FACTOR } from "./mad-scale-factor";
export { hampelDeviations, type HampelDeviationOptions } from "./hampel-deviations";
export { hampelFilter, type HampelOptions } from "./hampel-filter";
export { inServiceFlags, type InServiceOptions } from "./in-service-flags";
export { plausibilityFlags, IMPOSSIBLE_CHECKS, type PlausibilityFlags, type PlausibilityOptions } from "./plausibility-flags";
export { screenSamples, type ScreeningOptions, type ScreeningResult } from "./screen-samples";
export { exclusionReasonAt } from "./exclusion-reason-at";
export { aggregatePeriods, type AggregateOptions, type PeriodAggregateWithDuties } from "./aggregate-periods";
