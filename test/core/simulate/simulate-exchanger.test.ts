import { beforeAll, describe, expect, it } from "vitest";
import {
  cleanOverallCoefficient,
  foulingHistory,
  foulingResistanceAt,
  INSTRUMENT_ROLES,
  isFlowRole,
  simulateExchanger,
  type InstrumentRole,
  type Reading,
  type SimulationResult,
  type TruthPoint,
} from "../../../lib/core/simulate";
import { correctionFactor, streamDuty } from "../../../lib/core/thermal";
import {
  DAY_MS,
  FIXTURE_CLEANING,
  FIXTURE_DRIFT,
  FIXTURE_END_MS,
  FIXTURE_SCALE,
  FIXTURE_SEED,
  FIXTURE_SHUTDOWN,
  FIXTURE_START_MS,
  FIXTURE_STUCK,
  HOUR_MS,
  fixturePlan,
  fixtureSpec,
} from "./fixture-exchanger";

const READING_KEY: Record<InstrumentRole, keyof Omit<Reading, "timeMs">> = {
  hotIn: "hotInK",
  hotOut: "hotOutK",
  coldIn: "coldInK",
  coldOut: "coldOutK",
  hotFlow: "hotFlowKgPerS",
  coldFlow: "coldFlowKgPerS",
};

const spec = fixtureSpec();
const plan = fixturePlan();
const options = { start: FIXTURE_START_MS, end: FIXTURE_END_MS, seed: FIXTURE_SEED };
let result: SimulationResult;

function indexAt(timeMs: number): number {
  return Math.round((timeMs - FIXTURE_START_MS) / HOUR_MS);
}

beforeAll(() => {
  result = simulateExchanger(spec, plan, options);
});

describe("simulateExchanger", () => {
  it("returns one reading and one truth point per hour from start to end inclusive", () => {
    expect(result.readings).toHaveLength(8760);
    expect(result.truth).toHaveLength(8760);
    expect(result.readings[0]?.timeMs).toBe(FIXTURE_START_MS);
    expect(result.truth[8759]?.timeMs).toBe(FIXTURE_END_MS);
  });

  it("balances energy: true hot duty equals true cold duty to 1e-6 relative at every step", () => {
    for (const point of result.truth) {
      const hot = streamDuty({ massFlowKgPerS: point.hotFlowKgPerS, heatCapacity: spec.hotStream.heatCapacity, inletK: point.hotInK, outletK: point.hotOutK });
      const cold = streamDuty({ massFlowKgPerS: point.coldFlowKgPerS, heatCapacity: spec.coldStream.heatCapacity, inletK: point.coldInK, outletK: point.coldOutK });
      expect(Math.abs(hot - cold) / hot).toBeLessThan(1e-6);
      expect(Math.abs(point.dutyW - hot) / hot).toBeLessThan(1e-6);
    }
  });

  it("records U = 1/(1/U_clean + Rf) with U_clean from the grey-box model at the true flows", () => {
    const cycles = foulingHistory(plan.fouling, plan.cleanings);
    for (const point of result.truth) {
      expect(point.cleanUWPerM2K).toBeCloseTo(cleanOverallCoefficient(plan.cleanCoefficient, point.hotFlowKgPerS, point.coldFlowKgPerS), 9);
      expect(point.foulingM2KPerW).toBe(foulingResistanceAt(cycles, point.timeMs));
      expect(Math.abs(1 / point.uWPerM2K - (1 / point.cleanUWPerM2K + point.foulingM2KPerW))).toBeLessThan(1e-15);
    }
  });

  it("never produces a temperature cross or a non-positive flow in the truth", () => {
    for (const point of result.truth) {
      expect(point.hotFlowKgPerS).toBeGreaterThan(0);
      expect(point.coldFlowKgPerS).toBeGreaterThan(0);
      expect(point.hotInK).toBeGreaterThan(point.coldInK);
      expect(point.hotOutK).toBeLessThan(point.hotInK);
      expect(point.coldOutK).toBeGreaterThan(point.coldInK);
      expect(point.hotOutK).toBeGreaterThan(point.coldInK);
      expect(point.hotInK).toBeGreaterThan(point.coldOutK);
      // The thermal core throws "temperature-cross" when P reaches the 1-shell limit for R.
      expect(() =>
        correctionFactor({ hotInK: point.hotInK, hotOutK: point.hotOutK, coldInK: point.coldInK, coldOutK: point.coldOutK }, spec.arrangement),
      ).not.toThrow();
    }
  });

  it("adds noise with the stated standard uncertainty on fault-free instruments (spikes excluded)", () => {
    const spikes = new Set(result.grossErrors.map((spike) => `${spike.timeMs}/${spike.role}`));
    const faulty = new Set(plan.faults.map((fault) => fault.role));
    for (const role of INSTRUMENT_ROLES.filter((candidate) => !faulty.has(candidate))) {
      const instrument = spec.instruments.find((candidate) => candidate.role === role);
      const errors: number[] = [];
      result.readings.forEach((reading, index) => {
        const measured = reading[READING_KEY[role]];
        const truth = result.truth[index] as TruthPoint;
        if (measured === null || spikes.has(`${reading.timeMs}/${role}`)) return;
        errors.push(measured - (truth[READING_KEY[role]] as number));
      });
      const mean = errors.reduce((sum, value) => sum + value, 0) / errors.length;
      const std = Math.sqrt(errors.reduce((sum, value) => sum + (value - mean) ** 2, 0) / (errors.length - 1));
      // Brief: sample sd within 10 % of the stated uncertainty; with ~8700 samples its own sd is ~0.8 %.
      expect(Math.abs(std / (instrument?.standardUncertainty ?? Number.NaN) - 1)).toBeLessThan(0.1);
      expect(Math.abs(mean)).toBeLessThan(0.05 * (instrument?.standardUncertainty ?? 0) + 1e-3);
    }
  });

  it("drifts the faulty thermocouple linearly to +6 K over three weeks, then keeps the offset until the stated end", () => {
    const offsetsBetween = (fromMs: number, toMs: number): number => {
      const offsets: number[] = [];
      for (let index = indexAt(fromMs); index < indexAt(toMs); index += 1) {
        const measured = result.readings[index]?.coldOutK;
        if (measured === null || measured === undefined) continue;
        if (result.grossErrors.some((spike) => spike.timeMs === result.readings[index]?.timeMs && spike.role === "coldOut")) continue;
        offsets.push(measured - (result.truth[index] as TruthPoint).coldOutK);
      }
      return offsets.reduce((sum, value) => sum + value, 0) / offsets.length;
    };
    // Means over windows of about 170 hourly samples with 0.3 K noise: standard error 0.023 K; tolerance 0.15 K
    // also covers the ramp's own slope inside a window (0.012 K/h · 12 h either side).
    const rampEnd = FIXTURE_DRIFT.startMs + FIXTURE_DRIFT.rampMs;
    expect(offsetsBetween(rampEnd, rampEnd + 7 * DAY_MS)).toBeCloseTo(6, 0);
    expect(Math.abs(offsetsBetween(rampEnd, rampEnd + 7 * DAY_MS) - 6)).toBeLessThan(0.15);
    const halfway = FIXTURE_DRIFT.startMs + FIXTURE_DRIFT.rampMs / 2;
    expect(Math.abs(offsetsBetween(halfway - 12 * HOUR_MS, halfway + 12 * HOUR_MS) - 3)).toBeLessThan(0.25);
    expect(Math.abs(offsetsBetween(FIXTURE_DRIFT.startMs - 7 * DAY_MS, FIXTURE_DRIFT.startMs))).toBeLessThan(0.15);
    expect(Math.abs(offsetsBetween(FIXTURE_DRIFT.endMs, FIXTURE_DRIFT.endMs + 7 * DAY_MS))).toBeLessThan(0.15);
  });

  it("freezes the stuck meter at its last reading for the whole fault", () => {
    const first = indexAt(FIXTURE_STUCK.startMs);
    const last = indexAt(FIXTURE_STUCK.endMs) - 1;
    const previous = [...result.readings.slice(0, first)].reverse().find((reading) => reading.hotFlowKgPerS !== null)?.hotFlowKgPerS;
    const during = result.readings.slice(first, last + 1).map((reading) => reading.hotFlowKgPerS).filter((value) => value !== null);
    expect(during.length).toBeGreaterThan(900);
    expect(new Set(during).size).toBe(1);
    expect(during[0]).toBe(previous);
    const after = result.readings.slice(last + 1, last + 100).map((reading) => reading.hotFlowKgPerS).filter((value) => value !== null);
    expect(new Set(after).size).toBeGreaterThan(50);
    const recorded = result.faults.find((fault) => fault.kind === "stuck");
    expect(recorded).toMatchObject({ assetTag: "E-9001", role: "hotFlow", instrumentTag: "FI-9001A", size: previous, sizeUnit: "kg/s" });
  });

  it("applies the span error to the cold flow meter from its start", () => {
    const ratios: number[] = [];
    for (let index = indexAt(FIXTURE_SCALE.startMs); index < result.readings.length; index += 1) {
      const measured = result.readings[index]?.coldFlowKgPerS;
      if (measured === null || measured === undefined) continue;
      if (result.grossErrors.some((spike) => spike.timeMs === result.readings[index]?.timeMs && spike.role === "coldFlow")) continue;
      ratios.push(measured / (result.truth[index] as TruthPoint).coldFlowKgPerS);
    }
    // Mean ratio 0.95 (size -0.05); noise 2 % per reading over ~840 samples gives a standard error of 0.0007.
    expect(Math.abs(ratios.reduce((sum, value) => sum + value, 0) / ratios.length - 0.95)).toBeLessThan(0.004);
  });

  it("records faults with their instrument, kind, dates and size", () => {
    expect(result.faults.map((fault) => [fault.role, fault.kind, fault.startMs, fault.endMs, fault.sizeUnit])).toEqual([
      ["coldOut", "drift", FIXTURE_DRIFT.startMs, FIXTURE_DRIFT.endMs, "K"],
      ["hotFlow", "stuck", FIXTURE_STUCK.startMs, FIXTURE_STUCK.endMs, "kg/s"],
      ["coldFlow", "scale", FIXTURE_SCALE.startMs, null, "fraction"],
    ]);
    expect(result.faults[0]).toMatchObject({ size: 6, rampMs: 21 * DAY_MS, instrumentTag: "TI-9001D" });
  });

  it("injects rare spikes of the stated size and short gaps of missing values", () => {
    // 0.1 % of 8760 steps: Poisson mean 8.8; 1..25 is beyond 5 sd on either side.
    expect(result.grossErrors.length).toBeGreaterThanOrEqual(1);
    expect(result.grossErrors.length).toBeLessThanOrEqual(25);
    for (const spike of result.grossErrors) {
      if (isFlowRole(spike.role)) {
        const truth = result.truth[indexAt(spike.timeMs)] as TruthPoint;
        const flow = spike.role === "hotFlow" ? truth.hotFlowKgPerS : truth.coldFlowKgPerS;
        expect(Math.abs(spike.offset) / flow).toBeGreaterThan(0.13);
        expect(Math.abs(spike.offset) / flow).toBeLessThan(0.33);
      } else {
        expect(Math.abs(spike.offset)).toBeGreaterThanOrEqual(10);
        expect(Math.abs(spike.offset)).toBeLessThanOrEqual(30);
      }
    }
    const missing = result.readings.reduce((sum, reading) => sum + INSTRUMENT_ROLES.filter((role) => reading[READING_KEY[role]] === null).length, 0);
    expect(missing).toBeGreaterThan(0);
    expect(missing / (6 * result.readings.length)).toBeLessThan(0.03);
  });

  it("marks shutdowns, start-ups and cleanings as not steady and drops flow to near zero in them", () => {
    const middle = result.truth[indexAt(FIXTURE_SHUTDOWN.startMs + 12 * HOUR_MS)] as TruthPoint;
    expect(middle.mode).toBe("shutdown");
    expect(middle.steady).toBe(false);
    expect(middle.hotFlowKgPerS / spec.reference.hotFlowKgPerS).toBeLessThan(0.02);
    const afterRestart = result.truth[indexAt(FIXTURE_SHUTDOWN.startMs + 30 * HOUR_MS)] as TruthPoint;
    expect(afterRestart.mode).toBe("startup");
    const cleaning = result.truth[indexAt(FIXTURE_CLEANING.startMs + DAY_MS)] as TruthPoint;
    expect(cleaning.mode).toBe("cleaning");
    expect(cleaning.coldFlowKgPerS / spec.reference.coldFlowKgPerS).toBeLessThan(0.02);
    for (const point of result.truth) expect(point.steady).toBe(point.mode === "normal");
    expect(result.truth.filter((point) => point.steady).length / result.truth.length).toBeGreaterThan(0.9);
  });

  it("varies throughput by roughly ±10–15 % and the cooling water inlet by ±6 K over the year", () => {
    const steady = result.truth.filter((point) => point.steady);
    const ratios = steady.map((point) => point.coldFlowKgPerS / spec.reference.coldFlowKgPerS).sort((a, b) => a - b);
    const low = ratios[Math.floor(0.025 * ratios.length)] as number;
    const high = ratios[Math.floor(0.975 * ratios.length)] as number;
    expect(low).toBeGreaterThan(0.7);
    expect(high).toBeLessThan(1.3);
    expect(high - low).toBeGreaterThan(0.15);
    // Least-squares annual harmonic of the cold inlet: amplitude should be the plan's 6 K (drift and daily terms
    // average out; tolerance 0.6 K for a single year of AR(1) drift with sd 0.5 K).
    let cosine = 0;
    let sine = 0;
    const mean = result.truth.reduce((sum, point) => sum + point.coldInK, 0) / result.truth.length;
    for (const point of result.truth) {
      const angle = (2 * Math.PI * (point.timeMs - Date.UTC(2025, 0, 1) - 215 * DAY_MS)) / (365.2425 * DAY_MS);
      cosine += (point.coldInK - mean) * Math.cos(angle);
      sine += (point.coldInK - mean) * Math.sin(angle);
    }
    const amplitude = (2 / result.truth.length) * Math.hypot(cosine, sine);
    expect(Math.abs(amplitude - 6)).toBeLessThan(0.6);
  });

  it("reports cleanings in the window with fouling before and after", () => {
    expect(result.cleanings).toHaveLength(1);
    const cleaning = result.cleanings[0];
    expect(cleaning?.startMs).toBe(FIXTURE_CLEANING.startMs);
    expect(cleaning?.foulingAfterM2KPerW).toBeCloseTo(0.15 * (cleaning?.foulingBeforeM2KPerW ?? 0), 15);
    const before = result.truth[indexAt(FIXTURE_CLEANING.startMs) - 1] as TruthPoint;
    const after = result.truth[indexAt(FIXTURE_CLEANING.startMs)] as TruthPoint;
    expect(after.foulingM2KPerW / before.foulingM2KPerW).toBeCloseTo(0.15, 3);
  });

  it("is deterministic: the same seed gives identical output, another seed different readings", () => {
    expect(simulateExchanger(spec, plan, options)).toEqual(result);
    const other = simulateExchanger(spec, plan, { ...options, seed: FIXTURE_SEED + 1 });
    expect(other.readings).not.toEqual(result.readings);
  });

  it("gives a prefix of the long series when simulating a shorter window", () => {
    const short = simulateExchanger(spec, plan, { ...options, end: FIXTURE_START_MS + 120 * DAY_MS });
    expect(short.readings).toEqual(result.readings.slice(0, short.readings.length));
    expect(short.truth.map((point) => point.mode)).toEqual(result.truth.slice(0, short.truth.length).map((point) => point.mode));
    expect(short.truth.map((point) => point.hotOutK)).toEqual(result.truth.slice(0, short.truth.length).map((point) => point.hotOutK));
  });

  it("does not change its inputs", () => {
    const frozenSpec = structuredClone(spec);
    const frozenPlan = structuredClone(plan);
    simulateExchanger(spec, plan, { ...options, end: FIXTURE_START_MS + 10 * DAY_MS });
    expect(spec).toEqual(frozenSpec);
    expect(plan).toEqual(frozenPlan);
  });

  it("rejects a window that ends before it starts and a non-positive step", () => {
    expect(() => simulateExchanger(spec, plan, { ...options, end: FIXTURE_START_MS - 1 })).toThrow("simulateExchanger: end must not be before start");
    expect(() => simulateExchanger(spec, plan, { ...options, stepMs: 0 })).toThrow("simulateExchanger: stepMs must be positive, got 0");
  });
});
