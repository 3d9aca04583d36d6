import { autoregressiveDrift } from "./autoregressive-drift";
import { deriveSeed } from "./derive-seed";
import { seededRandom } from "./seeded-random";
import type { ExchangerSpec, InletTemperatureVariation, OperatingMode, SimulationPlan } from "./types";

/** Mode codes used in the Uint8Array column, in this order. */
export const OPERATING_MODES: readonly OperatingMode[] = ["normal", "transient", "shutdown", "startup", "cleaning"];
const NORMAL = 0;
const TRANSIENT = 1;
const SHUTDOWN = 2;
const STARTUP = 3;
const CLEANING = 4;

const MS_PER_HOUR = 3_600_000;
const MS_PER_DAY = 86_400_000;
const HOURS_PER_YEAR = 8766;
const DAYS_PER_YEAR = 365.2425;
/** Flow ramps of a shutdown (common practice: a controlled ramp down and a slower start-up). */
const RAMP_DOWN_HOURS = 2;
const RAMP_UP_HOURS = 4;
/** Trip durations drawn uniformly from this range, hours (invented for the demo). */
const TRIP_HOURS: [number, number] = [6, 30];
/** Hour (UTC) of the daily throughput maximum (invented for the demo). */
const THROUGHPUT_PEAK_HOUR_UTC = 14;
/** Throughput multiplier (with the stream's own drift) is kept in this range before shutdowns apply. */
const FLOW_FACTOR_RANGE: [number, number] = [0.5, 1.5];

export interface TimeGrid {
  startMs: number;
  stepMs: number;
  count: number;
}

/** True inlet temperatures, flows and operating mode at each grid time, as columns. */
export interface OperatingConditions {
  timeMs: Float64Array;
  hotInK: Float64Array;
  coldInK: Float64Array;
  hotFlowKgPerS: Float64Array;
  coldFlowKgPerS: Float64Array;
  /** Index into OPERATING_MODES. */
  mode: Uint8Array;
}

interface OutageWindow {
  startMs: number;
  endMs: number;
  mode: typeof SHUTDOWN | typeof CLEANING;
}

function clampFactor(value: number): number {
  return Math.min(FLOW_FACTOR_RANGE[1], Math.max(FLOW_FACTOR_RANGE[0], value));
}

/**
 * Flow fraction during an outage window: linear ramp down to the floor, hold, linear ramp up;
 * ramps are shortened to a third of the window each for short windows.
 */
function outageFraction(window: OutageWindow, timeMs: number, floor: number): number {
  const durationMs = window.endMs - window.startMs;
  const downMs = Math.min(RAMP_DOWN_HOURS * MS_PER_HOUR, durationMs / 3);
  const upMs = Math.min(RAMP_UP_HOURS * MS_PER_HOUR, durationMs / 3);
  const sinceStart = timeMs - window.startMs;
  const untilEnd = window.endMs - timeMs;
  if (sinceStart < downMs) return 1 - (1 - floor) * (sinceStart / downMs);
  if (untilEnd < upMs) return floor + (1 - floor) * (1 - untilEnd / upMs);
  return floor;
}

/** Daily cosine: amplitude·cos(2π(hour − peakHour)/24), hour of day in UTC. */
function dailyCosine(amplitude: number, peakHourUtc: number, timeMs: number): number {
  const hourOfDay = (((timeMs % MS_PER_DAY) + MS_PER_DAY) % MS_PER_DAY) / MS_PER_HOUR;
  return amplitude * Math.cos((2 * Math.PI * (hourOfDay - peakHourUtc)) / 24);
}

/** Annual and daily cosines: amplitude·cos(2π(day − peakDay)/365.2425) + daily cosine, UTC calendar. */
function periodicTemperature(variation: InletTemperatureVariation, timeMs: number): number {
  const dayOfYear = (timeMs - Date.UTC(new Date(timeMs).getUTCFullYear(), 0, 1)) / MS_PER_DAY;
  return (
    variation.seasonalAmplitudeK * Math.cos((2 * Math.PI * (dayOfYear - variation.seasonalPeakDayOfYear)) / DAYS_PER_YEAR) +
    dailyCosine(variation.dailyAmplitudeK, variation.dailyPeakHourUtc, timeMs)
  );
}

/**
 * operatingConditions: true inlet temperatures and flows of one exchanger over a time grid.
 *
 * Flow = reference · throughput · (1 + stream drift) · outage fraction, where throughput = level·(1 + drift
 * + daily swing); the level follows step changes (a Poisson process, new level uniform in levelRange) through
 * a first-order lag. Outages are the plan's unit shutdowns, the exchanger's cleanings (isolation) and random
 * trips; during them flow ramps down to shutdownFlowFraction of reference (never zero) and back.
 * Inlet temperature = reference + seasonal and daily cosines + AR(1) drift; the hot inlet is kept at least
 * minimumInletDifferenceK above the cold inlet.
 * Every concern draws from its own seeded stream in time order, so a shorter grid gives a prefix of a longer one.
 *
 * @param spec reference flows and inlet temperatures.
 * @param plan operating plan and cleanings.
 * @param grid time grid.
 * @param seed asset seed.
 * @returns columns of length grid.count.
 */
export function operatingConditions(
  spec: ExchangerSpec,
  plan: Pick<SimulationPlan, "operation" | "cleanings">,
  grid: TimeGrid,
  seed: number,
): OperatingConditions {
  const operation = plan.operation;
  const reference = spec.reference;
  const { startMs, stepMs, count } = grid;
  const stepHours = stepMs / MS_PER_HOUR;

  const throughputRandom = seededRandom(operation.throughput.seed ?? deriveSeed(seed, "throughput"));
  const tripRandom = seededRandom(deriveSeed(seed, "trips"));
  const throughputDrift = autoregressiveDrift(throughputRandom, operation.throughput.drift, stepMs);
  const hotFlowDrift = autoregressiveDrift(seededRandom(deriveSeed(seed, "hot-flow")), operation.hotFlowDrift, stepMs);
  const coldFlowDrift = autoregressiveDrift(seededRandom(deriveSeed(seed, "cold-flow")), operation.coldFlowDrift, stepMs);
  const hotInletDrift = autoregressiveDrift(seededRandom(deriveSeed(seed, "hot-inlet")), operation.hotInlet.drift, stepMs);
  const coldInletDrift = autoregressiveDrift(seededRandom(deriveSeed(seed, "cold-inlet")), operation.coldInlet.drift, stepMs);

  const plannedWindows: OutageWindow[] = [
    ...operation.shutdowns.map((shutdown) => ({
      startMs: shutdown.startMs,
      endMs: shutdown.startMs + shutdown.durationHours * MS_PER_HOUR,
      mode: SHUTDOWN as typeof SHUTDOWN,
    })),
    ...plan.cleanings.map((cleaning) => ({ startMs: cleaning.startMs, endMs: cleaning.endMs, mode: CLEANING as typeof CLEANING })),
  ];

  const stepProbability = (operation.throughput.stepChangesPerYear * stepHours) / HOURS_PER_YEAR;
  const tripProbability = (operation.tripsPerYear * stepHours) / HOURS_PER_YEAR;
  const lagFactor = 1 - Math.exp(-stepHours / operation.throughput.transientTimeConstantHours);
  const settleMs = operation.settleHours * MS_PER_HOUR;
  const [lowLevel, highLevel] = operation.throughput.levelRange;
  const floor = operation.shutdownFlowFraction;

  const conditions: OperatingConditions = {
    timeMs: new Float64Array(count),
    hotInK: new Float64Array(count),
    coldInK: new Float64Array(count),
    hotFlowKgPerS: new Float64Array(count),
    coldFlowKgPerS: new Float64Array(count),
    mode: new Uint8Array(count),
  };

  let level = 1;
  let targetLevel = 1;
  let lastStepMs = Number.NEGATIVE_INFINITY;
  let trip: OutageWindow | null = null;
  let lastTripEndMs = Number.NEGATIVE_INFINITY;

  for (let index = 0; index < count; index += 1) {
    const timeMs = startMs + index * stepMs;
    conditions.timeMs[index] = timeMs;

    // Throughput: step changes through a first-order lag, drift and a daily swing.
    if (throughputRandom.chance(stepProbability)) {
      targetLevel = throughputRandom.between(lowLevel, highLevel);
      lastStepMs = timeMs;
    }
    level += (targetLevel - level) * lagFactor;
    const throughput =
      level * (1 + throughputDrift() + dailyCosine(operation.throughput.dailyRelativeAmplitude, THROUGHPUT_PEAK_HOUR_UTC, timeMs));

    // Outages: planned windows (a cleaning wins over a shutdown), then random trips.
    let window: OutageWindow | null = null;
    let lastEndMs = lastTripEndMs;
    for (const candidate of plannedWindows) {
      if (timeMs >= candidate.startMs && timeMs < candidate.endMs) {
        if (window === null || candidate.mode === CLEANING) window = candidate;
      } else if (candidate.endMs <= timeMs && candidate.endMs > lastEndMs) {
        lastEndMs = candidate.endMs;
      }
    }
    if (trip !== null && timeMs >= trip.endMs) {
      lastTripEndMs = trip.endMs;
      lastEndMs = Math.max(lastEndMs, lastTripEndMs);
      trip = null;
    }
    const tripStarts = tripRandom.chance(tripProbability); // drawn every step to keep the stream aligned
    if (window === null && trip === null && tripStarts) {
      const durationHours = tripRandom.integer(TRIP_HOURS[0], TRIP_HOURS[1]);
      trip = { startMs: timeMs, endMs: timeMs + durationHours * MS_PER_HOUR, mode: SHUTDOWN };
    }
    if (window === null && trip !== null) window = trip;

    let mode: number = NORMAL;
    let outage = 1;
    if (window !== null) {
      mode = window.mode;
      outage = outageFraction(window, timeMs, floor);
    } else if (timeMs - lastEndMs < settleMs) {
      mode = STARTUP;
    } else if (timeMs - lastStepMs < settleMs) {
      mode = TRANSIENT;
    }
    conditions.mode[index] = mode;

    const hotFactor = clampFactor(throughput * (1 + hotFlowDrift()));
    const coldFactor = clampFactor(throughput * (1 + coldFlowDrift()));
    conditions.hotFlowKgPerS[index] = reference.hotFlowKgPerS * Math.max(floor, hotFactor * outage);
    conditions.coldFlowKgPerS[index] = reference.coldFlowKgPerS * Math.max(floor, coldFactor * outage);

    const coldIn = reference.coldInletK + periodicTemperature(operation.coldInlet, timeMs) + coldInletDrift();
    const hotIn = reference.hotInletK + periodicTemperature(operation.hotInlet, timeMs) + hotInletDrift();
    conditions.coldInK[index] = coldIn;
    conditions.hotInK[index] = Math.max(hotIn, coldIn + operation.minimumInletDifferenceK);
  }
  return conditions;
}
