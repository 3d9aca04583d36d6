import type { ExchangerSpec, SimulationPlan } from "../../../lib/core/simulate";

/** Shared test fixture: one invented exchanger and a one-year plan with every kind of disturbance. */
export const HOUR_MS = 3_600_000;
export const DAY_MS = 86_400_000;
export const FIXTURE_START_MS = Date.UTC(2025, 0, 1);
/** One year of hourly samples: 8760 steps. */
export const FIXTURE_END_MS = FIXTURE_START_MS + 365 * DAY_MS - HOUR_MS;
export const FIXTURE_SEED = 12_345;

export function fixtureSpec(): ExchangerSpec {
  return {
    tag: "E-9001",
    name: "Test gas oil cooler",
    unitCode: "TU-9",
    service: "product cooler",
    arrangement: { kind: "shell-and-tube", shells: 1 },
    tubePasses: 2,
    areaM2: 100,
    hotStream: { name: "gas oil", heatCapacity: { kind: "linear", interceptJPerKgK: 760, slopeJPerKgK2: 3.7 } },
    coldStream: { name: "cooling water", heatCapacity: { kind: "constant", jPerKgK: 4181 } },
    designDutyW: 2_440_000,
    designUWPerM2K: 425,
    designFoulingM2KPerW: 0.00035,
    reference: { hotInletK: 450, coldInletK: 300, hotFlowKgPerS: 10, coldFlowKgPerS: 15 },
    dutyThresholdW: 2_250_000,
    instruments: [
      { role: "hotIn", tag: "TI-9001A", standardUncertainty: 0.5 },
      { role: "hotOut", tag: "TI-9001B", standardUncertainty: 0.4 },
      { role: "coldIn", tag: "TI-9001C", standardUncertainty: 0.3 },
      { role: "coldOut", tag: "TI-9001D", standardUncertainty: 0.3 },
      { role: "hotFlow", tag: "FI-9001A", standardUncertainty: 0.15 },
      { role: "coldFlow", tag: "FI-9001B", standardUncertainty: 0.3 },
    ],
  };
}

export const FIXTURE_SHUTDOWN = { startMs: FIXTURE_START_MS + 100 * DAY_MS, durationHours: 24 };
export const FIXTURE_CLEANING = { startMs: FIXTURE_START_MS + 200 * DAY_MS, endMs: FIXTURE_START_MS + 203 * DAY_MS, effectiveness: 0.85, method: "hydroblast" };
export const FIXTURE_DRIFT = { role: "coldOut" as const, kind: "drift" as const, startMs: FIXTURE_START_MS + 250 * DAY_MS, endMs: FIXTURE_START_MS + 320 * DAY_MS, size: 6, rampMs: 21 * DAY_MS, description: "drifting thermocouple" };
export const FIXTURE_STUCK = { role: "hotFlow" as const, kind: "stuck" as const, startMs: FIXTURE_START_MS + 280 * DAY_MS + 5 * HOUR_MS, endMs: FIXTURE_START_MS + 320 * DAY_MS, size: 0, description: "stuck flow meter" };
export const FIXTURE_SCALE = { role: "coldFlow" as const, kind: "scale" as const, startMs: FIXTURE_START_MS + 330 * DAY_MS, endMs: null, size: -0.05, description: "span error" };

export function fixturePlan(): SimulationPlan {
  return {
    cleanCoefficient: {
      hotFilmResistanceRefM2KPerW: 0.0012,
      coldFilmResistanceRefM2KPerW: 0.0006,
      wallResistanceM2KPerW: 0.0002,
      exponentHot: 0.8,
      exponentCold: 0.8,
      hotFlowRefKgPerS: 10,
      coldFlowRefKgPerS: 15,
    },
    fouling: {
      serviceStartMs: FIXTURE_START_MS - 30 * DAY_MS,
      initialResistanceM2KPerW: 0.00005,
      cycles: [
        { kind: "asymptotic", asymptoteM2KPerW: 0.0008, timeConstantS: 120 * 86_400 },
        { kind: "linear", initialM2KPerW: 0, rateM2KPerWPerS: 0.0006 / (365.25 * 86_400) },
      ],
    },
    cleanings: [FIXTURE_CLEANING],
    operation: {
      throughput: {
        seed: null,
        drift: { standardDeviation: 0.04, correlationHours: 96 },
        dailyRelativeAmplitude: 0.01,
        stepChangesPerYear: 6,
        levelRange: [0.88, 1.06],
        transientTimeConstantHours: 3,
      },
      hotFlowDrift: { standardDeviation: 0.03, correlationHours: 48 },
      coldFlowDrift: { standardDeviation: 0.03, correlationHours: 48 },
      hotInlet: { seasonalAmplitudeK: 1, seasonalPeakDayOfYear: 215, dailyAmplitudeK: 0.4, dailyPeakHourUtc: 14, drift: { standardDeviation: 1.5, correlationHours: 12 } },
      coldInlet: { seasonalAmplitudeK: 6, seasonalPeakDayOfYear: 215, dailyAmplitudeK: 1, dailyPeakHourUtc: 15, drift: { standardDeviation: 0.5, correlationHours: 24 } },
      shutdowns: [FIXTURE_SHUTDOWN],
      tripsPerYear: 2,
      shutdownFlowFraction: 0.01,
      settleHours: 12,
      minimumInletDifferenceK: 5,
    },
    faults: [FIXTURE_DRIFT, FIXTURE_STUCK, FIXTURE_SCALE],
    noise: {
      temperatureResolutionK: 0.01,
      flowResolutionKgPerS: 0.001,
      grossErrorProbability: 1e-3,
      grossTemperatureRangeK: [10, 30],
      grossFlowFractionRange: [0.15, 0.3],
      gapProbability: 4e-4,
      gapMaxHours: 8,
      outageProbability: 2e-4,
      outageMaxHours: 24,
    },
  };
}
