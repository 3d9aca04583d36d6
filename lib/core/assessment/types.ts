/**
 * Input and result types of the fouling assessment. SI inside: K, kg/s, W, m², W/(m²·K), m²·K/W, J; instants as
 * epoch ms (and ISO-8601 strings in the result); durations in days unless a name says otherwise.
 */
import type { CleanModelFit } from "../clean-model";
import type { CrossingForecast } from "../forecast";
import type { Arrangement, HeatCapacity } from "../thermal";
import type { ModelSelectionRow, TrendModelKind, TrendParameter } from "../trend";

/** One screened, reconciled period (hour or day) of operating data. */
export interface AssessmentPeriod {
  /** Period start, epoch ms. */
  startMs: number;
  hotInK: number;
  hotOutK: number;
  coldInK: number;
  coldOutK: number;
  hotFlowKgPerS: number;
  coldFlowKgPerS: number;
  /** Reconciled duty, W. */
  dutyW: number;
  /** False for periods the screening rejected; they are ignored. */
  usable: boolean;
}

/** What the assessment needs to know about the exchanger. */
export interface AssessmentAsset {
  arrangement: Arrangement;
  areaM2: number;
  hotHeatCapacity: HeatCapacity;
  coldHeatCapacity: HeatCapacity;
  /** Data-sheet service (fouled) U, W/(m²·K). */
  designUWPerM2K: number;
  /** Data-sheet fouling allowance, m²·K/W. */
  designFoulingM2KPerW: number;
  /** Reference (rating) conditions: inlet temperatures K and flows kg/s. */
  reference: { hotInletK: number; coldInletK: number; hotFlowKgPerS: number; coldFlowKgPerS: number };
  /** Duty at reference conditions below which the exchanger is due for cleaning, W. */
  dutyThresholdW: number;
  /**
   * Outlet-temperature limit at reference conditions. stream "cold": a minimum cold outlet (a heater: the cold outlet
   * falls as fouling grows). stream "hot": a maximum hot outlet (a cooler: the hot outlet rises as fouling grows).
   */
  minimumOutlet?: { stream: "hot" | "cold"; temperatureK: number };
}

/**
 * A cleaning record. timeMs is the return to service (end of the cleaning) where known: the fouling clock of the
 * next cycle starts there. A record before the first period (the last cleaning or commissioning before the data)
 * sets the origin of the first cycle; without one the first cycle starts at the first usable period.
 */
export interface AssessmentCleaning {
  timeMs: number;
  method?: string;
  costCents?: number;
}

/** Options of assessAsset; defaults in resolveAssessmentOptions. */
export interface AssessmentOptions {
  /** Length of the clean-model windows, days [30]. */
  cleanWindowDays?: number;
  /** Windows of the clean-model fit: the whole record tiled, or only after cleanings ["tiled"]; see fitCleanModel. */
  cleanWindows?: "tiled" | "after-cleanings";
  /** Fit the film exponents within [0.5, 1] instead of holding them at 0.8 [false]. */
  fitExponents?: boolean;
  /** Hot and cold film shares of the clean resistance at reference, used when a term is not identifiable [0.45, 0.45]. */
  designSplit?: { hotFilm: number; coldFilm: number };
  /** Clean U at reference conditions, W/(m²·K), when known better than the data sheet [1/(1/U_design − Rf_design)]. */
  cleanUAtReferenceWPerM2K?: number;
  /** Chronological share of the clean points kept for validation [0.3]. */
  validationFraction?: number;
  /** Forecast horizon, days [1826, five years]. */
  horizonDays?: number;
  /** Days of usable data whose median gives the current observed U [7]. */
  recentDays?: number;
  /** Days on each side of a cleaning whose median Rf gives its effectiveness [7]. */
  effectivenessWindowDays?: number;
  /** Spacing of the band points returned for charts, days [7]. */
  bandStepDays?: number;
  /** Borrow shape priors for a cycle from the earlier cycles of the asset [true]. */
  usePriors?: boolean;
  /** AR(1) variance inflation of the trend bands ["ar1"]. */
  autocorrelation?: "ar1" | "none";
  /** Aggregate sub-daily periods to UTC days before fitting ["daily"]. */
  aggregation?: "daily" | "none";
}

/** Input of assessAsset. */
export interface AssessmentInput {
  asset: AssessmentAsset;
  periods: readonly AssessmentPeriod[];
  cleanings: readonly AssessmentCleaning[];
  /** The assessment instant, epoch ms (periods after it are ignored). */
  asOfMs: number;
  options?: AssessmentOptions;
}

/** A parameter with its standard error (null when not estimable or held fixed). */
export interface EstimatedValue {
  value: number;
  standardError: number | null;
}

/** One point of the fouling-resistance series (daily when aggregated). */
export interface FoulingSeriesPoint {
  time: string;
  timeMs: number;
  foulingM2KPerW: number;
  cycle: number;
}

/** One point of the forecast band, for charts. */
export interface ForecastBandPoint {
  time: string;
  timeMs: number;
  /** Rf percentiles of the 80 % prediction band and its centre, m²·K/W. */
  p10: number;
  p50: number;
  p90: number;
  /** 95 % prediction band, m²·K/W. */
  lower95: number;
  upper95: number;
}

/** One fouling cycle in the data. */
export interface AssessmentCycle {
  index: number;
  /** Cycle origin (ISO-8601) and the start of the next cycle or null for the current one. */
  start: string;
  end: string | null;
  usablePoints: number;
  /** Chosen trend model, or null with too few points. */
  model: TrendModelKind | null;
  /** Effectiveness of the cleaning that ended this cycle; null for the current cycle or without data around it. */
  effectivenessOfCleaningThatEndedIt: CleaningEffectiveness | null;
}

/**
 * Effectiveness of a cleaning, (Rf before − Rf after)/Rf before, from the medians of the observed Rf over the last
 * windowDays of usable data before the cleaning and the first windowDays after it.
 */
export interface CleaningEffectiveness extends EstimatedValue {
  beforeM2KPerW: number;
  afterM2KPerW: number;
  pointsBefore: number;
  pointsAfter: number;
  windowDays: number;
}

/** The assessment of one asset: plain and serialisable (no NaN, no Infinity; null where unknown). */
export interface Assessment {
  asOf: string;
  asOfMs: number;
  cleanModel: CleanModelFit | null;
  /** Robust current observed U: median over the last `recentDays` of usable data. */
  currentObservedU: { uWPerM2K: number; percentOfClean: number; periods: number } | null;
  foulingResistance: {
    /** Rf at asOf from the current cycle's trend (or the recent median when there is no trend), m²·K/W. */
    current: number | null;
    /** Median of the observed Rf over the last `recentDays`, m²·K/W. */
    recentMedian: number | null;
    series: FoulingSeriesPoint[];
  };
  referenceDuty: {
    /** Duty at reference conditions when clean, now, and their difference, W. */
    cleanW: number;
    currentW: number | null;
    lossW: number | null;
    /** Energy lost in the current cycle up to asOf, J (duty loss at reference conditions along the fitted trend). */
    lossEnergyJ: number | null;
  };
  trend: {
    model: TrendModelKind;
    parameters: TrendParameter[];
    aiccTable: ModelSelectionRow[];
    reason: string;
    priorUsed: { parameter: string; mean: number; standardDeviation: number; sourceCycles: number[] } | null;
    lagOneAutocorrelation: number | null;
    varianceInflation: number;
    band: ForecastBandPoint[];
  } | null;
  forecasts: {
    duty: CrossingForecast;
    foulingAllowance: CrossingForecast;
    minimumOutlet: CrossingForecast | null;
  };
  cycles: AssessmentCycle[];
  notes: string[];
}
