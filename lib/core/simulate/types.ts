/**
 * Types shared by the exchanger simulator. All quantities are SI: kelvin, kg/s, W, m², W/(m²·K),
 * m²·K/W, seconds for durations inside models and epoch milliseconds for instants.
 */
import type { Arrangement, HeatCapacity } from "../thermal";

/** The six instruments around a two-stream exchanger. */
export type InstrumentRole = "hotIn" | "hotOut" | "coldIn" | "coldOut" | "hotFlow" | "coldFlow";

/** Roles in the fixed order used by columns and random-number draws. */
export const INSTRUMENT_ROLES: readonly InstrumentRole[] = ["hotIn", "hotOut", "coldIn", "coldOut", "hotFlow", "coldFlow"];

/** True for the two flow meters, false for the four temperature instruments. */
export function isFlowRole(role: InstrumentRole): boolean {
  return role === "hotFlow" || role === "coldFlow";
}

export interface InstrumentSpec {
  role: InstrumentRole;
  tag: string;
  /**
   * Standard uncertainty in SI: K for temperatures, kg/s for flows. For flow meters this is the
   * uncertainty at the reference flow; the simulator keeps the relative uncertainty constant,
   * so at a flow F it uses standardUncertainty · F / referenceFlow (a "percent of reading" meter).
   */
  standardUncertainty: number;
}

/** What a plant data sheet and instrument list say about one exchanger. */
export interface ExchangerSpec {
  tag: string;
  name: string;
  unitCode: string;
  /** Duty in plain words, e.g. "crude preheat", "product cooler". */
  service: string;
  arrangement: Arrangement;
  tubePasses: number;
  areaM2: number;
  hotStream: { name: string; heatCapacity: HeatCapacity };
  coldStream: { name: string; heatCapacity: HeatCapacity };
  /** Data-sheet duty at the reference conditions with the design fouling allowance, W. */
  designDutyW: number;
  /** Data-sheet service (fouled) overall coefficient, W/(m²·K). */
  designUWPerM2K: number;
  /** Data-sheet fouling allowance, m²·K/W. */
  designFoulingM2KPerW: number;
  reference: { hotInletK: number; coldInletK: number; hotFlowKgPerS: number; coldFlowKgPerS: number };
  /** Duty at reference conditions below which the exchanger is due for cleaning, W. */
  dutyThresholdW: number;
  instruments: InstrumentSpec[];
}

/**
 * True clean overall coefficient, in the grey-box form the estimator fits:
 * 1/U_clean = hotFilmResistanceRef·(mh/mh_ref)^(−exponentHot) + coldFilmResistanceRef·(mc/mc_ref)^(−exponentCold) + wallResistance.
 */
export interface CleanCoefficientParameters {
  hotFilmResistanceRefM2KPerW: number;
  coldFilmResistanceRefM2KPerW: number;
  wallResistanceM2KPerW: number;
  exponentHot: number;
  exponentCold: number;
  hotFlowRefKgPerS: number;
  coldFlowRefKgPerS: number;
}

/**
 * Fouling resistance growth within one cycle, as a function of the time t (s) since the cycle started.
 * - linear: Rf = initial + rate·t
 * - asymptotic (Kern & Seaton 1959): Rf = asymptote·(1 − e^(−t/timeConstant))
 * - falling-rate power law: Rf = coefficient·t^exponent, 0 < exponent < 1 (coefficient in m²·K/W per s^exponent)
 */
export type FoulingModel =
  | { kind: "linear"; initialM2KPerW: number; rateM2KPerWPerS: number }
  | { kind: "asymptotic"; asymptoteM2KPerW: number; timeConstantS: number }
  | { kind: "falling-rate"; coefficient: number; exponent: number };

/** A cleaning: the exchanger is isolated from startMs to endMs and returns with part of its fouling removed. */
export interface PlannedCleaning {
  startMs: number;
  endMs: number;
  /** Fraction of the fouling resistance removed, 0..1: residual = (1 − effectiveness)·Rf before cleaning. */
  effectiveness: number;
  method: string;
}

/**
 * Fouling history. cycles[0] runs from serviceStartMs (the last cleaning or commissioning before the data)
 * starting from initialResistanceM2KPerW; cycles[i] runs after cleanings[i − 1]. Within a cycle
 * Rf(t) = residual + model(t − returnToService), with the residual frozen while the exchanger is isolated.
 */
export interface FoulingPlan {
  serviceStartMs: number;
  initialResistanceM2KPerW: number;
  cycles: FoulingModel[];
}

/** A fault to inject into one instrument's readings. */
export interface PlannedFault {
  role: InstrumentRole;
  /**
   * drift: offset grows linearly from 0 to `size` over rampMs, then stays until endMs (K or kg/s).
   * bias: a constant offset `size` from startMs to endMs (K or kg/s).
   * scale: the reading is multiplied by (1 + size) from startMs to endMs (a calibration error).
   * stuck: the reading freezes at its last value before startMs until endMs (size ignored).
   */
  kind: "drift" | "bias" | "scale" | "stuck";
  startMs: number;
  /** null: the fault lasts to the end of the data. */
  endMs: number | null;
  size: number;
  /** Only for drift. */
  rampMs?: number;
  description: string;
}

/** First-order autoregressive (AR(1)) drift: stationary standard deviation and correlation time. */
export interface RandomDrift {
  standardDeviation: number;
  correlationHours: number;
}

/** Inlet temperature around its reference value. Annual and daily terms are cosines peaking at the given times (UTC). */
export interface InletTemperatureVariation {
  seasonalAmplitudeK: number;
  seasonalPeakDayOfYear: number;
  dailyAmplitudeK: number;
  dailyPeakHourUtc: number;
  drift: RandomDrift;
}

/** Plant throughput (a multiplier on both reference flows) with drift, daily swing and occasional step changes. */
export interface ThroughputVariation {
  /** Seed shared by all exchangers of a process unit so they move together; null derives one from the asset seed. */
  seed: number | null;
  /** AR(1) drift, standard deviation as a fraction of the reference flow. */
  drift: RandomDrift;
  dailyRelativeAmplitude: number;
  stepChangesPerYear: number;
  /** New throughput levels are drawn uniformly from this range (fractions of reference). */
  levelRange: [number, number];
  /** First-order time constant of the approach to a new level. */
  transientTimeConstantHours: number;
}

/** A planned outage of the whole process unit (shared by its exchangers). */
export interface PlannedShutdown {
  startMs: number;
  durationHours: number;
}

export interface OperatingPlan {
  throughput: ThroughputVariation;
  /** Independent AR(1) drift of each stream's flow around the throughput (fraction of reference). */
  hotFlowDrift: RandomDrift;
  coldFlowDrift: RandomDrift;
  hotInlet: InletTemperatureVariation;
  coldInlet: InletTemperatureVariation;
  shutdowns: PlannedShutdown[];
  /** Random short shutdowns (trips) of this exchanger, per year. */
  tripsPerYear: number;
  /** Flow during a shutdown or cleaning, as a fraction of reference (kept above zero). */
  shutdownFlowFraction: number;
  /** Hours after a restart or step change during which the exchanger is not at steady state. */
  settleHours: number;
  /** The true hot inlet is kept at least this far above the true cold inlet, K. */
  minimumInletDifferenceK: number;
}

export interface NoiseSettings {
  /** Reading resolution (quantisation step); 0 for none. */
  temperatureResolutionK: number;
  flowResolutionKgPerS: number;
  /** Probability per time step that one randomly chosen instrument shows a spike. */
  grossErrorProbability: number;
  /** Spike size ranges: temperatures ± K, flows ± fraction of reading. */
  grossTemperatureRangeK: [number, number];
  grossFlowFractionRange: [number, number];
  /** Probability per step and instrument that a short gap of missing values starts. */
  gapProbability: number;
  gapMaxHours: number;
  /** Probability per step that all six values go missing (historian outage). */
  outageProbability: number;
  outageMaxHours: number;
}

/** Everything the simulator needs beyond the spec: the truth and how the data are disturbed. */
export interface SimulationPlan {
  cleanCoefficient: CleanCoefficientParameters;
  fouling: FoulingPlan;
  cleanings: PlannedCleaning[];
  operation: OperatingPlan;
  faults: PlannedFault[];
  noise: NoiseSettings;
}

export interface SimulationOptions {
  /** First time step, epoch ms. */
  start: number;
  /** Last time step (inclusive if on the grid), epoch ms. */
  end: number;
  /** Default 3_600_000 (hourly). */
  stepMs?: number;
  seed: number;
}

/** One row of measured data; null where the value is missing. */
export interface Reading {
  timeMs: number;
  hotInK: number | null;
  hotOutK: number | null;
  coldInK: number | null;
  coldOutK: number | null;
  hotFlowKgPerS: number | null;
  coldFlowKgPerS: number | null;
}

/** normal: steady operation; transient: after a throughput step; shutdown: outage or trip; startup: settling after it; cleaning: isolated. */
export type OperatingMode = "normal" | "transient" | "shutdown" | "startup" | "cleaning";

export interface TruthPoint {
  timeMs: number;
  hotInK: number;
  hotOutK: number;
  coldInK: number;
  coldOutK: number;
  hotFlowKgPerS: number;
  coldFlowKgPerS: number;
  foulingM2KPerW: number;
  cleanUWPerM2K: number;
  uWPerM2K: number;
  dutyW: number;
  /** True only in mode "normal". */
  steady: boolean;
  mode: OperatingMode;
  /** Duty at the spec's reference conditions with the current fouling, W. */
  referenceDutyW: number;
}

export interface InjectedFault {
  assetTag: string;
  role: InstrumentRole;
  instrumentTag: string;
  kind: PlannedFault["kind"];
  startMs: number;
  /** null: lasts to the end of the data. */
  endMs: number | null;
  /** drift and bias: offset (K or kg/s); scale: fraction; stuck: the frozen reading (K or kg/s). */
  size: number;
  sizeUnit: "K" | "kg/s" | "fraction";
  rampMs: number | null;
  description: string;
}

export interface Cleaning {
  startMs: number;
  endMs: number;
  effectiveness: number;
  method: string;
  foulingBeforeM2KPerW: number;
  foulingAfterM2KPerW: number;
}

/** An injected spike: reading = value without the spike + offset. */
export interface GrossError {
  timeMs: number;
  role: InstrumentRole;
  offset: number;
}

export interface SimulationResult {
  readings: Reading[];
  truth: TruthPoint[];
  faults: InjectedFault[];
  cleanings: Cleaning[];
  grossErrors: GrossError[];
}
