import type { Arrangement, HeatCapacity } from "../core/thermal";
import type { InstrumentRole, PlannedFault } from "../core/simulate";

/** How fouling grows in each cycle; magnitudes are solved from `target` (see buildDemoAsset). */
export type DemoFoulingShape =
  | { kind: "linear" }
  | { kind: "asymptotic"; timeConstantDays: number }
  | { kind: "falling-rate"; exponent: number };

export interface DemoFoulingDefinition {
  shape: DemoFoulingShape;
  /** Last cleaning or commissioning before the data start (ISO date-time, UTC). */
  serviceStart: string;
  /** Fouling left at serviceStart, in units of the cycle scale (the Rf one year of multiplier-1 fouling gives). */
  initialFraction: number;
  /** Relative fouling severity of each cycle (cleanings + 1 entries): cycles differ as crude slates and seasons do. */
  cycleMultipliers: number[];
  /**
   * crossing: the current cycle is scaled so that the duty at reference conditions reaches the threshold
   * at this instant (ISO, UTC). ultimateFraction (asymptotic current cycle only): the cycle levels off at
   * this fraction of the fouling resistance at which the threshold is reached, so it never crosses.
   */
  target: { crossing: string } | { ultimateFraction: number };
}

export interface DemoCleaningDefinition {
  /** Isolation start (ISO, UTC). */
  start: string;
  durationDays: number;
  effectiveness: number;
  method: string;
}

export interface DemoFaultDefinition {
  role: InstrumentRole;
  kind: PlannedFault["kind"];
  start: string;
  /** null: lasts to the end of the data. */
  end: string | null;
  size: number;
  rampDays?: number;
  description: string;
}

/** One row of the demo fleet: data-sheet values plus the invented truth behind the simulated data. */
export interface DemoAssetDefinition {
  tag: string;
  name: string;
  unitCode: string;
  service: string;
  arrangement: Arrangement;
  tubePasses: number;
  areaM2: number;
  hotStream: { name: string; heatCapacity: HeatCapacity };
  coldStream: { name: string; heatCapacity: HeatCapacity };
  reference: { hotInletK: number; coldInletK: number; hotFlowKgPerS: number; coldFlowKgPerS: number };
  designDutyW: number;
  designUWPerM2K: number;
  designFoulingM2KPerW: number;
  /** Shares of the clean resistance 1/U_clean at reference flows taken by the hot and cold films; the wall takes the rest. */
  hotFilmShare: number;
  coldFilmShare: number;
  /** Threshold as a fraction of the clean duty at reference conditions. */
  thresholdFraction: number;
  temperatureUncertaintyK: number;
  /** Flow meter standard uncertainty as a fraction of reading. */
  flowUncertaintyFraction: number;
  /** Which inlet-temperature pattern each stream follows (see demo operating patterns). */
  hotInletPattern: DemoInletPattern;
  coldInletPattern: DemoInletPattern;
  fouling: DemoFoulingDefinition;
  cleanings: DemoCleaningDefinition[];
  faults: DemoFaultDefinition[];
  /** One sentence on what this asset is meant to show in the demo. */
  notes: string;
}

export type DemoInletPattern = "column-draw" | "crude" | "cooling-water" | "ambient-air" | "process";
