/**
 * Types of the forecast core. SI: K, kg/s, W, m², m²·K/W, J; instants epoch ms and ISO-8601; durations in days.
 */
import type { Arrangement, HeatCapacity } from "../thermal";

/** What is needed to rate the exchanger at its reference conditions for a given fouling resistance. */
export interface ReferenceConditions {
  arrangement: Arrangement;
  areaM2: number;
  hotHeatCapacity: HeatCapacity;
  coldHeatCapacity: HeatCapacity;
  reference: { hotInletK: number; coldInletK: number; hotFlowKgPerS: number; coldFlowKgPerS: number };
  /** 1/U_clean at the reference flows, m²·K/W. */
  cleanResistanceM2KPerW: number;
}

/**
 * A limit that fouling eventually breaks, each monotone in Rf at reference conditions:
 * duty falls below a minimum; Rf exceeds an allowance; the cold outlet falls below a minimum (heaters);
 * the hot outlet rises above a maximum (coolers).
 */
export type CrossingCriterion =
  | { kind: "duty"; minimumDutyW: number }
  | { kind: "fouling-allowance"; allowanceM2KPerW: number }
  | { kind: "cold-outlet"; minimumK: number }
  | { kind: "hot-outlet"; maximumK: number };

/** Result of criticalFoulingResistance. */
export interface CriticalFouling {
  /** Rf at which the limit is reached, m²·K/W; 0 when even the clean exchanger breaks it; null when it never is. */
  foulingM2KPerW: number | null;
  status: "found" | "broken-when-clean" | "never-broken";
}

/**
 * When a limit is crossed: P50 from the central Rf forecast, P10 (earliest plausible) from the upper 80 % band,
 * P90 from the lower 80 % band. Dates are null when the crossing lies beyond the horizon.
 */
export interface CrossingForecast {
  criterion: CrossingCriterion["kind"];
  criticalFoulingM2KPerW: number | null;
  /**
   * ahead: the central forecast crosses within the horizon; already-crossed: the central curve crossed before asOf
   * (crossedAt says when, within the current cycle); beyond-horizon: no central crossing within the horizon;
   * broken-when-clean: the limit cannot be met even clean; never-broken: no finite Rf breaks it;
   * no-trend: no trend model for the current cycle.
   */
  status: "ahead" | "already-crossed" | "beyond-horizon" | "broken-when-clean" | "never-broken" | "no-trend";
  p10: string | null;
  p50: string | null;
  p90: string | null;
  p10Ms: number | null;
  p50Ms: number | null;
  p90Ms: number | null;
  crossedAt: string | null;
  crossedAtMs: number | null;
  /** End of the search window, ISO-8601. */
  horizonEnd: string;
}
