/**
 * Instrument alerts found by the fault detectors. Plain serialisable objects (no NaN).
 */
import type { InstrumentRole } from "../screening/types";
import type { Arrangement, HeatCapacity } from "../thermal";

/** What is wrong with an instrument. */
export type AlertKind = "drift" | "bias" | "scale" | "stuck" | "spikes";

/** One instrument problem over a stretch of time. */
export interface InstrumentAlert {
  role: InstrumentRole;
  /** The instrument's tag from the exchanger model. */
  instrumentTag: string;
  kind: AlertKind;
  /** Estimated start, epoch ms. */
  startMs: number;
  /** Estimated end (exclusive), epoch ms; null when still present at the end of the data. */
  endMs: number | null;
  /** Time of the last sample the detector needed to raise and name the alert (detection time), epoch ms. */
  detectedMs: number;
  /**
   * drift: offset at the end of the alert (K); bias: mean offset (K); scale: span error as a fraction of reading
   * (reading = true·(1 + size)); stuck: the frozen reading (K or kg/s); spikes: number of outliers.
   */
  size: number;
  sizeUnit: "K" | "fraction" | "kg/s" | "count";
  /** Plain-language evidence: statistic, threshold, window. */
  evidence: string;
}

/**
 * Flow-dependent model of the overall coefficient over a short window, fouling changing linearly:
 * 1/U = intercept + hotCoefficient·m_h^(−exponent) + coldCoefficient·m_c^(−exponent) + timeCoefficient·(t − referenceTimeMs)/day.
 */
export interface OverallCoefficientModel {
  /** m²·K/W */
  intercept: number;
  hotCoefficient: number;
  coldCoefficient: number;
  exponent: number;
  /** Change of 1/U per day (the fouling rate), m²·K/W per day. */
  timeCoefficient: number;
  /** Epoch ms at which the time term is zero. */
  referenceTimeMs: number;
  /** Robust standard deviation of the relative residual of U in the fit window. */
  relativeResidualStandardDeviation: number;
  /** Points used in the final fit. */
  count: number;
}

/** What the heat-transfer rate residual needs: h = w·Q_hot + (1 − w)·Q_cold − U(m_h, m_c)·A·F·LMTD. */
export interface RateEquationSetup {
  areaM2: number;
  arrangement: Arrangement;
  hotHeatCapacity: HeatCapacity;
  coldHeatCapacity: HeatCapacity;
  coefficient: OverallCoefficientModel;
  /** Weight w of the hot duty in the duty estimate (inverse-variance weighting of the two sides). */
  hotWeight: number;
}
