import { deriveSeed } from "./derive-seed";
import { faultActive, instrumentFaultEffect } from "./instrument-fault-effect";
import { seededRandom } from "./seeded-random";
import {
  INSTRUMENT_ROLES,
  isFlowRole,
  type ExchangerSpec,
  type GrossError,
  type InjectedFault,
  type InstrumentRole,
  type NoiseSettings,
  type PlannedFault,
  type Reading,
} from "./types";

/** True values by role, one column per instrument. */
export type TrueColumns = Record<InstrumentRole, Float64Array>;

export interface MeasuredData {
  readings: Reading[];
  grossErrors: GrossError[];
  faults: InjectedFault[];
}

function quantise(value: number, resolution: number): number {
  return resolution > 0 ? Math.round(value / resolution) * resolution : value;
}

/**
 * measureReadings: what the instruments report, from the true values.
 *
 * For each instrument and step, in this order:
 * 1. noise: value = true + u·z, z standard normal; u is the instrument's standard uncertainty
 *    (for flow meters scaled by true flow / reference flow: a constant percent of reading);
 * 2. fault: drift, bias, scale or stuck (see instrumentFaultEffect); a stuck reading freezes at the
 *    instrument's last reported value before the fault;
 * 3. gross error: with probability grossErrorProbability per step one random instrument (not a stuck one)
 *    gets a spike, ± a uniform size from the temperature range (K) or the flow range (fraction of reading);
 * 4. quantisation to the stated resolution;
 * 5. gaps: short per-instrument gaps and whole-row historian outages give null.
 * An instrument missing from spec.instruments reads null throughout. Each step draws the same number of
 * random numbers from each stream, so a shorter series is a prefix of a longer one.
 *
 * @param spec instruments and reference flows.
 * @param timeMs grid times.
 * @param truth true values by role.
 * @param noise noise, spike and gap settings.
 * @param faults planned faults (role must have an instrument).
 * @param seed asset seed.
 * @throws if a fault names a role without an instrument.
 * @returns readings, the injected spikes and the faults as they happened (overlapping the data only).
 */
export function measureReadings(
  spec: ExchangerSpec,
  timeMs: Float64Array,
  truth: TrueColumns,
  noise: NoiseSettings,
  faults: readonly PlannedFault[],
  seed: number,
): MeasuredData {
  const count = timeMs.length;
  const noiseRandom = seededRandom(deriveSeed(seed, "noise"));
  const spikeRandom = seededRandom(deriveSeed(seed, "spikes"));
  const gapRandom = seededRandom(deriveSeed(seed, "gaps"));
  const stepMs = count > 1 ? (timeMs[1] as number) - (timeMs[0] as number) : 3_600_000;
  const gapMaxSteps = Math.max(1, Math.round((noise.gapMaxHours * 3_600_000) / stepMs));
  const outageMaxSteps = Math.max(1, Math.round((noise.outageMaxHours * 3_600_000) / stepMs));

  const instruments = INSTRUMENT_ROLES.map((role) => spec.instruments.find((instrument) => instrument.role === role) ?? null);
  const referenceFlow: Record<InstrumentRole, number> = {
    hotIn: 1,
    hotOut: 1,
    coldIn: 1,
    coldOut: 1,
    hotFlow: spec.reference.hotFlowKgPerS,
    coldFlow: spec.reference.coldFlowKgPerS,
  };
  const faultsByRole = INSTRUMENT_ROLES.map((role) => faults.filter((fault) => fault.role === role));
  for (const fault of faults) {
    if (!instruments[INSTRUMENT_ROLES.indexOf(fault.role)]) {
      throw new Error(`measureReadings: fault on ${fault.role}, but ${spec.tag} has no such instrument`);
    }
  }

  const columns = INSTRUMENT_ROLES.map(() => new Array<number | null>(count));
  const lastReported: (number | null)[] = INSTRUMENT_ROLES.map(() => null);
  const frozen = new Map<PlannedFault, number>();
  const gapRemaining = INSTRUMENT_ROLES.map(() => 0);
  let outageRemaining = 0;
  const grossErrors: GrossError[] = [];

  for (let index = 0; index < count; index += 1) {
    const time = timeMs[index] as number;
    const spikeDrawn = spikeRandom.chance(noise.grossErrorProbability);
    const spikeRole = spikeDrawn ? spikeRandom.integer(0, INSTRUMENT_ROLES.length - 1) : -1;
    const spikeSign = spikeDrawn ? (spikeRandom.chance(0.5) ? 1 : -1) : 0;
    const spikeFraction = spikeDrawn ? spikeRandom.uniform() : 0;
    if (outageRemaining === 0 && gapRandom.chance(noise.outageProbability)) {
      outageRemaining = gapRandom.integer(1, outageMaxSteps);
    }

    for (let roleIndex = 0; roleIndex < INSTRUMENT_ROLES.length; roleIndex += 1) {
      const role = INSTRUMENT_ROLES[roleIndex] as InstrumentRole;
      const standardNormal = noiseRandom.normal();
      const gapStarts = gapRandom.chance(noise.gapProbability);
      const gapLength = gapStarts ? gapRandom.integer(1, gapMaxSteps) : 0;
      const instrument = instruments[roleIndex];
      const column = columns[roleIndex] as (number | null)[];
      if (!instrument) {
        column[index] = null;
        continue;
      }
      const trueValue = (truth[role] as Float64Array)[index] as number;
      const flow = isFlowRole(role);
      const resolution = flow ? noise.flowResolutionKgPerS : noise.temperatureResolutionK;
      const uncertainty = flow ? (instrument.standardUncertainty * trueValue) / referenceFlow[role] : instrument.standardUncertainty;
      let value = trueValue + uncertainty * standardNormal;

      let stuck = false;
      for (const fault of faultsByRole[roleIndex] as PlannedFault[]) {
        if (!faultActive(fault, time)) continue;
        if (fault.kind === "stuck") {
          if (!frozen.has(fault)) frozen.set(fault, lastReported[roleIndex] ?? quantise(value, resolution));
          stuck = true;
        }
        value = instrumentFaultEffect(fault, time, value, frozen.get(fault) ?? value);
      }

      if (spikeRole === roleIndex && !stuck) {
        const offset = flow
          ? spikeSign * (noise.grossFlowFractionRange[0] + spikeFraction * (noise.grossFlowFractionRange[1] - noise.grossFlowFractionRange[0])) * value
          : spikeSign * (noise.grossTemperatureRangeK[0] + spikeFraction * (noise.grossTemperatureRangeK[1] - noise.grossTemperatureRangeK[0]));
        value += offset;
        grossErrors.push({ timeMs: time, role, offset });
      }
      if (!stuck) value = quantise(value, resolution);

      if (gapRemaining[roleIndex] === 0 && gapStarts) gapRemaining[roleIndex] = gapLength;
      const remaining = gapRemaining[roleIndex] as number;
      const missing = outageRemaining > 0 || remaining > 0;
      if (remaining > 0) gapRemaining[roleIndex] = remaining - 1;
      column[index] = missing ? null : value;
      if (!missing) lastReported[roleIndex] = value;
    }
    if (outageRemaining > 0) outageRemaining -= 1;
  }

  const readings: Reading[] = new Array<Reading>(count);
  for (let index = 0; index < count; index += 1) {
    readings[index] = {
      timeMs: timeMs[index] as number,
      hotInK: (columns[0] as (number | null)[])[index] ?? null,
      hotOutK: (columns[1] as (number | null)[])[index] ?? null,
      coldInK: (columns[2] as (number | null)[])[index] ?? null,
      coldOutK: (columns[3] as (number | null)[])[index] ?? null,
      hotFlowKgPerS: (columns[4] as (number | null)[])[index] ?? null,
      coldFlowKgPerS: (columns[5] as (number | null)[])[index] ?? null,
    };
  }

  const firstMs = count > 0 ? (timeMs[0] as number) : 0;
  const lastMs = count > 0 ? (timeMs[count - 1] as number) : -1;
  const injected: InjectedFault[] = faults
    .filter((fault) => fault.startMs <= lastMs && (fault.endMs === null || fault.endMs > firstMs))
    .map((fault) => {
      const instrument = instruments[INSTRUMENT_ROLES.indexOf(fault.role)];
      const flow = isFlowRole(fault.role);
      const unit = fault.kind === "scale" ? "fraction" : flow ? "kg/s" : "K";
      return {
        assetTag: spec.tag,
        role: fault.role,
        instrumentTag: instrument ? instrument.tag : "",
        kind: fault.kind,
        startMs: fault.startMs,
        endMs: fault.endMs,
        size: fault.kind === "stuck" ? (frozen.get(fault) ?? Number.NaN) : fault.size,
        sizeUnit: unit,
        rampMs: fault.kind === "drift" ? (fault.rampMs ?? 0) : null,
        description: fault.description,
      };
    });
  return { readings, grossErrors, faults: injected };
}
