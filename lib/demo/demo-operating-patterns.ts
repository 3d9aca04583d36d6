import { deriveSeed, type InletTemperatureVariation, type NoiseSettings, type OperatingPlan, type PlannedShutdown } from "../core/simulate";
import { DEMO_SEED } from "./demo-constants";
import type { DemoInletPattern } from "./demo-asset-definition";

/**
 * Inlet-temperature patterns of the demo (invented, sized from common practice for a coastal NW-European site).
 * Seasonal peaks near early August (day 215), daily peaks mid-afternoon local time (about 13:00–14:00 UTC).
 */
export const DEMO_INLET_PATTERNS: Record<DemoInletPattern, InletTemperatureVariation> = {
  // Column side draws and pumparounds: controlled, a little seasonal and daily, some process drift.
  "column-draw": { seasonalAmplitudeK: 1, seasonalPeakDayOfYear: 215, dailyAmplitudeK: 0.4, dailyPeakHourUtc: 14, drift: { standardDeviation: 1.5, correlationHours: 12 } },
  // Crude from tankage through the train: follows the seasons and the crude slate.
  crude: { seasonalAmplitudeK: 3, seasonalPeakDayOfYear: 215, dailyAmplitudeK: 0.8, dailyPeakHourUtc: 15, drift: { standardDeviation: 1.2, correlationHours: 24 } },
  // Cooling-water supply from a cooling tower: ±6 K over the year (as the brief asks), ±1 K over the day.
  "cooling-water": { seasonalAmplitudeK: 6, seasonalPeakDayOfYear: 215, dailyAmplitudeK: 1, dailyPeakHourUtc: 15, drift: { standardDeviation: 0.5, correlationHours: 24 } },
  // Ambient air for the air cooler: ±8 K seasonal, ±4 K daily, weather drift.
  "ambient-air": { seasonalAmplitudeK: 8, seasonalPeakDayOfYear: 205, dailyAmplitudeK: 4, dailyPeakHourUtc: 13, drift: { standardDeviation: 2.5, correlationHours: 36 } },
  // Other process streams: small variation.
  process: { seasonalAmplitudeK: 0.5, seasonalPeakDayOfYear: 215, dailyAmplitudeK: 0.3, dailyPeakHourUtc: 14, drift: { standardDeviation: 1, correlationHours: 12 } },
};

/** Planned outages per process unit (the rundown coolers stop with the crude unit). Invented dates. */
export const DEMO_UNIT_SHUTDOWNS: Record<string, PlannedShutdown[]> = {
  "CDU-1": [
    { startMs: Date.UTC(2025, 2, 22, 4), durationHours: 30 },
    { startMs: Date.UTC(2026, 1, 9, 8), durationHours: 12 },
  ],
  "RDC-3": [
    { startMs: Date.UTC(2025, 2, 22, 4), durationHours: 30 },
    { startMs: Date.UTC(2026, 1, 9, 8), durationHours: 12 },
  ],
  "HTU-2": [
    { startMs: Date.UTC(2025, 9, 18, 6), durationHours: 168 },
    { startMs: Date.UTC(2026, 5, 27, 2), durationHours: 20 },
  ],
};

/** Step changes in throughput per year, by unit (invented). */
const STEP_CHANGES_PER_YEAR: Record<string, number> = { "CDU-1": 6, "HTU-2": 5, "RDC-3": 6 };

/**
 * demoOperatingPlan: the operating plan of one demo asset. Throughput (drift and step changes) is shared by
 * the assets of a unit through a unit seed; each stream adds its own ±3 % drift, so throughput varies
 * by roughly ±10–15 % overall.
 */
export function demoOperatingPlan(unitCode: string, hotInlet: DemoInletPattern, coldInlet: DemoInletPattern): OperatingPlan {
  return {
    throughput: {
      seed: deriveSeed(DEMO_SEED, `unit:${unitCode === "RDC-3" ? "CDU-1" : unitCode}`),
      drift: { standardDeviation: 0.04, correlationHours: 96 },
      dailyRelativeAmplitude: 0.01,
      stepChangesPerYear: STEP_CHANGES_PER_YEAR[unitCode] ?? 4,
      levelRange: [0.88, 1.06],
      transientTimeConstantHours: 3,
    },
    hotFlowDrift: { standardDeviation: 0.03, correlationHours: 48 },
    coldFlowDrift: { standardDeviation: 0.03, correlationHours: 48 },
    hotInlet: DEMO_INLET_PATTERNS[hotInlet],
    coldInlet: DEMO_INLET_PATTERNS[coldInlet],
    shutdowns: DEMO_UNIT_SHUTDOWNS[unitCode] ?? [],
    tripsPerYear: 1,
    shutdownFlowFraction: 0.01,
    settleHours: 12,
    minimumInletDifferenceK: 5,
  };
}

/** Measurement disturbances shared by all demo assets (the brief's rates: 0.1 % spikes, short gaps). */
export const DEMO_NOISE: NoiseSettings = {
  temperatureResolutionK: 0.01,
  flowResolutionKgPerS: 0.001,
  grossErrorProbability: 1e-3,
  grossTemperatureRangeK: [10, 30],
  grossFlowFractionRange: [0.15, 0.3],
  gapProbability: 4e-4,
  gapMaxHours: 8,
  outageProbability: 2e-4,
  outageMaxHours: 24,
};
