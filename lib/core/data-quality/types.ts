/**
 * Results of the data-quality pipeline: plain serialisable objects (null, never NaN), SI units.
 */
import type { InstrumentAlert } from "../faults/types";
import type { ExclusionCounts, InstrumentRole, PeriodMeans } from "../screening/types";

/** Reconciled means of a period (K, kg/s) and the reconciled duty (W). */
export interface ReconciledPeriod {
  hotInK: number;
  hotOutK: number;
  coldInK: number;
  coldOutK: number;
  hotFlowKgPerS: number;
  coldFlowKgPerS: number;
  dutyW: number;
}

/** One period (hour or day) of screened, reconciled data. */
export interface PeriodResult {
  startMs: number;
  lengthS: number;
  samplesTotal: number;
  samplesUsed: number;
  /** Samples not used, by reason (each sample under its first reason: missing, transient, outlier, fault, impossible). */
  excluded: ExclusionCounts;
  usable: boolean;
  reason: string | null;
  /** Measured means of the used samples. */
  means: PeriodMeans;
  hotDutyW: number | null;
  coldDutyW: number | null;
  /** (hot − cold)/mean duty. */
  closure: number | null;
  /** Reconciled means (usable periods only). */
  reconciled: ReconciledPeriod | null;
  /** Global test γ (χ², 1 degree of freedom) of the period means, and its critical value at α. */
  globalTest: number | null;
  globalTestCritical: number | null;
  /**
   * The instrument under an alert for most of the period's samples, else null. The measurement test cannot name one:
   * with a single balance every z_i is equal (FIELD-NOTES §6), so a failed global test alone gives no suspect.
   */
  suspectRole: InstrumentRole | null;
}

/** Settings actually used (defaults resolved). */
export interface ResolvedDataQualitySettings {
  periodS: 3600 | 86400;
  alpha: number;
  minimumSamples: number;
  originMs: number;
  /** Median sampling interval of the data, s (null with fewer than two samples). */
  nominalStepS: number | null;
  hampel: { halfWidth: number; threshold: number };
  steadyState: { signals: InstrumentRole[]; criticalValue: number; meanFilter: number; varianceFilter: number; differenceFilter: number };
  minimumFlowFraction: number;
  plausibilityCoverage: number;
}

/** Result of {@link assessDataQuality}. */
export interface DataQualityAssessment {
  periods: PeriodResult[];
  alerts: InstrumentAlert[];
  /** All samples: total = used + Σ excluded. */
  sampleCounts: { total: number; used: number; excluded: ExclusionCounts };
  settings: ResolvedDataQualitySettings;
}
