import { beforeAll, describe, expect, it } from "vitest";
import { DEMO_END_MS, DEMO_START_MS, simulateDemoFleet, type DemoAssetSimulation } from "../../lib/demo";
import {
  cycleIndexAt,
  cycleResistance,
  foulingHistory,
  INSTRUMENT_ROLES,
  isFlowRole,
  referenceDuty,
  trueThresholdCrossing,
  type FoulingCycle,
  type InstrumentRole,
  type Reading,
  type TruthPoint,
} from "../../lib/core/simulate";
import { correctionFactor, streamDuty } from "../../lib/core/thermal";

const HOUR_MS = 3_600_000;
const DAY_MS = 86_400_000;
const READING_KEY: Record<InstrumentRole, keyof Omit<Reading, "timeMs">> = {
  hotIn: "hotInK",
  hotOut: "hotOutK",
  coldIn: "coldInK",
  coldOut: "coldOutK",
  hotFlow: "hotFlowKgPerS",
  coldFlow: "coldFlowKgPerS",
};

let fleet: DemoAssetSimulation[];
let elapsedMs: number;

function simulationOf(tag: string): DemoAssetSimulation {
  const found = fleet.find((simulation) => simulation.asset.spec.tag === tag);
  if (!found) throw new Error(`no simulation for ${tag}`);
  return found;
}

function isSpike(simulation: DemoAssetSimulation, timeMs: number, role: InstrumentRole): boolean {
  return simulation.result.grossErrors.some((spike) => spike.timeMs === timeMs && spike.role === role);
}

beforeAll(() => {
  const started = performance.now();
  fleet = simulateDemoFleet();
  elapsedMs = performance.now() - started;
  console.info(`simulateDemoFleet: ${fleet.length} assets × ${fleet[0]?.result.truth.length} steps in ${(elapsedMs / 1000).toFixed(2)} s`);
}, 120_000);

describe("simulateDemoFleet", () => {
  it("simulates every asset hourly from 2024-09-01T00:00Z to 2026-11-30T23:00Z", () => {
    expect(fleet).toHaveLength(24);
    expect(elapsedMs).toBeGreaterThan(0);
    for (const { result } of fleet) {
      // 821 days × 24 h = 19 704 steps (hand arithmetic: 365 + 365 + 91 days).
      expect(result.truth).toHaveLength(19_704);
      expect(result.readings[0]?.timeMs).toBe(DEMO_START_MS);
      expect(result.readings[19_703]?.timeMs).toBe(DEMO_END_MS);
    }
  });

  it("balances energy at every step of every asset to 1e-6 relative", () => {
    for (const { asset, result } of fleet) {
      for (const point of result.truth) {
        const hot = streamDuty({ massFlowKgPerS: point.hotFlowKgPerS, heatCapacity: asset.spec.hotStream.heatCapacity, inletK: point.hotInK, outletK: point.hotOutK });
        const cold = streamDuty({ massFlowKgPerS: point.coldFlowKgPerS, heatCapacity: asset.spec.coldStream.heatCapacity, inletK: point.coldInK, outletK: point.coldOutK });
        if (!(Math.abs(hot - cold) / hot < 1e-6)) throw new Error(`${asset.spec.tag} at ${point.timeMs}: hot ${hot} W, cold ${cold} W`);
      }
    }
  });

  it("has no temperature cross or non-positive flow in the truth", () => {
    for (const { asset, result } of fleet) {
      result.truth.forEach((point, index) => {
        const ok =
          point.hotFlowKgPerS > 0 &&
          point.coldFlowKgPerS > 0 &&
          point.hotInK > point.coldInK &&
          point.hotOutK > point.coldInK &&
          point.coldOutK < point.hotInK &&
          point.hotOutK <= point.hotInK &&
          point.coldOutK >= point.coldInK;
        if (!ok) throw new Error(`${asset.spec.tag} at ${point.timeMs}: ${JSON.stringify(point)}`);
        // The thermal core's own temperature-cross checks (every 5th step keeps the crossflow inversions cheap).
        if (index % 5 === 0) {
          correctionFactor({ hotInK: point.hotInK, hotOutK: point.hotOutK, coldInK: point.coldInK, coldOutK: point.coldOutK }, asset.spec.arrangement);
        }
      });
    }
  });

  it("adds noise with sample sd within 10 % of the stated uncertainty on every fault-free instrument", () => {
    for (const simulation of fleet) {
      const { asset, result } = simulation;
      const faulty = new Set(asset.plan.faults.map((fault) => fault.role));
      for (const role of INSTRUMENT_ROLES) {
        if (faulty.has(role)) continue;
        const instrument = asset.spec.instruments.find((candidate) => candidate.role === role);
        const reference = role === "hotFlow" ? asset.spec.reference.hotFlowKgPerS : asset.spec.reference.coldFlowKgPerS;
        let count = 0;
        let sum = 0;
        let sumSquares = 0;
        result.readings.forEach((reading, index) => {
          const measured = reading[READING_KEY[role]];
          if (measured === null || isSpike(simulation, reading.timeMs, role)) return;
          const truth = (result.truth[index] as TruthPoint)[READING_KEY[role]] as number;
          // Flow meters keep a constant percent of reading: scale the error back to the reference flow.
          const error = isFlowRole(role) ? ((measured - truth) * reference) / truth : measured - truth;
          count += 1;
          sum += error;
          sumSquares += error * error;
        });
        const std = Math.sqrt((sumSquares - (sum * sum) / count) / (count - 1));
        // Brief: within 10 %; with ~19 500 samples the sd estimate itself has about 0.5 % spread.
        expect(Math.abs(std / (instrument?.standardUncertainty ?? Number.NaN) - 1), `${asset.spec.tag} ${role}`).toBeLessThan(0.1);
      }
    }
  });

  it("drifts the faulty thermocouple to +6 K after three weeks", () => {
    const simulation = simulationOf("E-1105");
    const fault = simulation.asset.plan.faults[0];
    expect(fault?.kind).toBe("drift");
    if (!fault || fault.kind !== "drift") return;
    const key = READING_KEY[fault.role];
    const offsets = (fromMs: number, toMs: number): number => {
      const values: number[] = [];
      for (let timeMs = fromMs; timeMs < toMs; timeMs += HOUR_MS) {
        const index = (timeMs - DEMO_START_MS) / HOUR_MS;
        const measured = simulation.result.readings[index]?.[key];
        if (measured === null || measured === undefined || isSpike(simulation, timeMs, fault.role)) continue;
        values.push(measured - ((simulation.result.truth[index] as TruthPoint)[key] as number));
      }
      return values.reduce((total, value) => total + value, 0) / values.length;
    };
    const rampEnd = fault.startMs + 21 * DAY_MS;
    // Week means of ~168 readings with 0.5 K noise: standard error 0.04 K; tolerance 0.15 K.
    expect(Math.abs(offsets(rampEnd, rampEnd + 7 * DAY_MS) - 6)).toBeLessThan(0.15);
    expect(Math.abs(offsets(DEMO_END_MS - 7 * DAY_MS, DEMO_END_MS) - 6)).toBeLessThan(0.15);
    expect(Math.abs(offsets(fault.startMs - 7 * DAY_MS, fault.startMs))).toBeLessThan(0.15);
    const recorded = simulation.result.faults[0];
    expect(recorded).toMatchObject({ assetTag: "E-1105", kind: "drift", size: 6, sizeUnit: "K", endMs: null });
  });

  it("keeps the stuck flow meter constant during its fault", () => {
    const simulation = simulationOf("E-3104");
    const fault = simulation.asset.plan.faults[0];
    expect(fault?.kind).toBe("stuck");
    if (!fault || fault.endMs === null) return;
    const key = READING_KEY[fault.role];
    const first = (fault.startMs - DEMO_START_MS) / HOUR_MS;
    const last = Math.ceil((fault.endMs - DEMO_START_MS) / HOUR_MS);
    const during = simulation.result.readings.slice(first, last).map((reading) => reading[key]).filter((value) => value !== null);
    expect(during.length).toBeGreaterThan(1000);
    expect(new Set(during).size).toBe(1);
    expect(simulation.result.faults[0]?.size).toBe(during[0]);
  });

  it("reads the re-ranged flow meter 8 % high", () => {
    const simulation = simulationOf("E-2201");
    const fault = simulation.asset.plan.faults[0];
    expect(fault?.kind).toBe("scale");
    if (!fault) return;
    const key = READING_KEY[fault.role];
    const ratios: number[] = [];
    for (let index = (fault.startMs - DEMO_START_MS) / HOUR_MS; index < simulation.result.readings.length; index += 1) {
      const reading = simulation.result.readings[index] as Reading;
      const measured = reading[key];
      if (measured === null || isSpike(simulation, reading.timeMs, fault.role)) continue;
      ratios.push(measured / ((simulation.result.truth[index] as TruthPoint)[key] as number));
    }
    // ~1850 readings with 1.5 % noise: standard error of the mean ratio 0.0004; tolerance 0.003.
    expect(Math.abs(ratios.reduce((total, value) => total + value, 0) / ratios.length - 1.08)).toBeLessThan(0.003);
  });

  it("records the duty at reference conditions as rated with the current fouling", () => {
    for (const { asset, result } of fleet) {
      for (let index = 0; index < result.truth.length; index += 211) {
        const point = result.truth[index] as TruthPoint;
        const exact = referenceDuty(asset.spec, asset.plan.cleanCoefficient, point.foulingM2KPerW);
        expect(Math.abs(point.referenceDutyW - exact) / exact).toBeLessThan(1e-9);
      }
    }
  });

  it("reports true crossings that agree with a daily brute-force scan of the current cycle", () => {
    for (const { asset, trueCrossingMs } of fleet) {
      expect(trueCrossingMs).toBe(trueThresholdCrossing(asset.spec, asset.plan, DEMO_END_MS));
      const cycles = foulingHistory(asset.plan.fouling, asset.plan.cleanings);
      const cycle = cycles[cycleIndexAt(cycles, DEMO_END_MS)] as FoulingCycle;
      const below = (timeMs: number): boolean =>
        referenceDuty(asset.spec, asset.plan.cleanCoefficient, cycleResistance(cycle, timeMs)) < asset.spec.dutyThresholdW;
      let scanned: number | null = null;
      for (let timeMs = cycle.startMs; timeMs <= DEMO_END_MS + 3653 * DAY_MS; timeMs += DAY_MS) {
        if (below(timeMs)) {
          scanned = timeMs;
          break;
        }
      }
      if (scanned === null) {
        expect(trueCrossingMs, asset.spec.tag).toBeNull();
      } else {
        expect(trueCrossingMs, asset.spec.tag).not.toBeNull();
        expect(trueCrossingMs as number).toBeLessThanOrEqual(scanned);
        expect(trueCrossingMs as number).toBeGreaterThan(scanned - DAY_MS);
      }
    }
  });

  it("follows the cooling-water season and keeps most of the data at steady state", () => {
    const cooler = simulationOf("E-3101").result.truth;
    const monthMean = (year: number, month: number): number => {
      const points = cooler.filter((point) => new Date(point.timeMs).getUTCFullYear() === year && new Date(point.timeMs).getUTCMonth() === month);
      return points.reduce((total, point) => total + point.coldInK, 0) / points.length;
    };
    // Annual cosine ±6 K peaking in early August: July/August vs January/February differ by about 11 K.
    const summerMinusWinter = (monthMean(2025, 6) + monthMean(2025, 7)) / 2 - (monthMean(2025, 0) + monthMean(2025, 1)) / 2;
    expect(summerMinusWinter).toBeGreaterThan(8);
    expect(summerMinusWinter).toBeLessThan(14);
    for (const { result } of fleet) {
      expect(result.truth.filter((point) => point.steady).length / result.truth.length).toBeGreaterThan(0.9);
      expect(result.truth.some((point) => point.mode === "shutdown")).toBe(true);
    }
  });

  it("is deterministic, and selecting assets or an earlier end gives the same data", () => {
    const selected = simulateDemoFleet({ assets: ["E-3106", "E-1101"] });
    expect(selected.map((simulation) => simulation.asset.spec.tag)).toEqual(["E-1101", "E-3106"]);
    expect(selected[0]?.result).toEqual(simulationOf("E-1101").result);
    expect(selected[1]?.result).toEqual(simulationOf("E-3106").result);
    const shorter = simulateDemoFleet({ assets: ["E-2203"], endMs: DEMO_START_MS + 100 * DAY_MS });
    const full = simulationOf("E-2203").result;
    expect(shorter[0]?.result.readings).toEqual(full.readings.slice(0, 2401));
  });

  it("rejects unknown tags and an end before the start", () => {
    expect(() => simulateDemoFleet({ assets: ["E-0000"] })).toThrow("simulateDemoFleet: unknown asset tags: E-0000");
    expect(() => simulateDemoFleet({ endMs: DEMO_START_MS - 1 })).toThrow("simulateDemoFleet: endMs is before the demo start (2024-09-01T00:00Z)");
  });
});
