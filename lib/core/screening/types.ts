/**
 * Types shared by screening, reconciliation, fault detection and the data-quality pipeline.
 * SI throughout: kelvin, kg/s, J/(kg·K), W, epoch milliseconds for instants, seconds for durations.
 */
import type { Arrangement, HeatCapacity } from "../thermal";
import type { InstrumentRole } from "../simulate/types";

export type { InstrumentRole };

/**
 * Operating data of one exchanger as columns, sorted by time (strictly increasing), NaN where a value is missing.
 * All seven arrays have the same length.
 */
export interface ReadingColumns {
  timeMs: Float64Array;
  hotInK: Float64Array;
  hotOutK: Float64Array;
  coldInK: Float64Array;
  coldOutK: Float64Array;
  hotFlowKgPerS: Float64Array;
  coldFlowKgPerS: Float64Array;
}

/** One instrument of the exchanger. */
export interface InstrumentModel {
  role: InstrumentRole;
  tag: string;
  /**
   * Standard uncertainty in SI: K for temperatures; kg/s at the reference flow for flow meters.
   * Flow meters are treated as "percent of reading": the relative uncertainty σ/F_ref applies at every flow
   * (F_ref from ExchangerModel.referenceFlows, else the median valid reading of that meter).
   */
  standardUncertainty: number;
}

/** What the screening and reconciliation need to know about an exchanger. */
export interface ExchangerModel {
  arrangement: Arrangement;
  areaM2: number;
  hotHeatCapacity: HeatCapacity;
  coldHeatCapacity: HeatCapacity;
  instruments: InstrumentModel[];
  /**
   * Flows at which the flow-meter uncertainties are stated, kg/s. When absent, the median of each meter's valid
   * readings stands in for its reference flow.
   */
  referenceFlows?: { hotKgPerS: number; coldKgPerS: number };
}

/** Why a sample is not used. */
export type ExclusionReason = "missing" | "transient" | "outlier" | "fault" | "impossible";

/**
 * Order of precedence: a sample excluded for several reasons is counted under the first of these.
 * Missing first (nothing else can be judged without the values), then transient (the process is moving, so an
 * apparent outlier or imbalance is not evidence against an instrument), outlier (one bad reading), fault (a
 * known instrument problem over a stretch of time) and impossible last (what is left is physically inconsistent).
 */
export const EXCLUSION_REASONS: readonly ExclusionReason[] = ["missing", "transient", "outlier", "fault", "impossible"];

/** Counts of samples by exclusion reason. */
export type ExclusionCounts = Record<ExclusionReason, number>;

/**
 * Per-sample screening results, one byte (0 or 1) per sample for each reason. `fault` holds 0 where no instrument
 * fault applies and k ≥ 1 where the fault described by faultLabels[k − 1] applies.
 */
export interface SampleFlags {
  missing: Uint8Array;
  transient: Uint8Array;
  outlier: Uint8Array;
  impossible: Uint8Array;
  fault: Uint16Array;
  /** Plain-language fault descriptions, e.g. "coldOut drift"; indexed by fault value − 1. */
  faultLabels: string[];
}

/** The six values of an operating point (readings, means or reconciled values), in SI. */
export interface OperatingPoint {
  hotInK: number;
  hotOutK: number;
  coldInK: number;
  coldOutK: number;
  hotFlowKgPerS: number;
  coldFlowKgPerS: number;
}

/** The six measured means of a period, null where no sample was used. */
export interface PeriodMeans {
  hotInK: number | null;
  hotOutK: number | null;
  coldInK: number | null;
  coldOutK: number | null;
  hotFlowKgPerS: number | null;
  coldFlowKgPerS: number | null;
}

/** One aggregated period (hour or day) of screened samples. */
export interface PeriodAggregate {
  /** Period start, epoch ms (aligned to multiples of the period from originMs). */
  startMs: number;
  lengthS: number;
  samplesTotal: number;
  samplesUsed: number;
  excluded: ExclusionCounts;
  /** True when at least minimumSamples samples were used. */
  usable: boolean;
  /** Why the period is not usable, in plain words; null when usable. */
  reason: string | null;
  /** Means of the used samples. */
  means: PeriodMeans;
}
