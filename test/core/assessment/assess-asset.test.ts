import { beforeAll, describe, expect, it } from "vitest";
import { assessAsset, cleaningEffectiveness, cycleOrigins, dailyPeriods as aggregateDays, type AssessmentInput } from "../../../lib/core/assessment";
import { referenceRating } from "../../../lib/core/forecast";
import { DEMO_END_MS, simulateDemoFleet, type DemoAssetSimulation } from "../../../lib/demo";
import { assessmentAsset, cleaningRecords, dailyPeriods, hourlyPeriods } from "./demo-periods";

const DAY_MS = 86_400_000;

function deepFreeze<T>(value: T): T {
  if (typeof value === "object" && value !== null) {
    for (const inner of Object.values(value)) deepFreeze(inner);
    Object.freeze(value);
  }
  return value;
}

/** Every number in a value tree is finite (no NaN, no Infinity). */
function allFinite(value: unknown): boolean {
  if (typeof value === "number") return Number.isFinite(value);
  if (Array.isArray(value)) return value.every(allFinite);
  if (typeof value === "object" && value !== null) return Object.values(value).every(allFinite);
  return true;
}

let simulation: DemoAssetSimulation;
let input: AssessmentInput;

beforeAll(() => {
  // demo asset E-2206 (counterflow hairpin, one full cleaning): simulation with known truth
  [simulation] = simulateDemoFleet({ assets: ["E-2206"] }) as [DemoAssetSimulation];
  input = { asset: assessmentAsset(simulation), periods: dailyPeriods(simulation), cleanings: cleaningRecords(simulation), asOfMs: DEMO_END_MS };
}, 60_000);

describe("assessAsset", () => {
  it("returns a plain object that survives JSON without NaN or Infinity", () => {
    const assessment = assessAsset(input);
    expect(allFinite(assessment)).toBe(true);
    expect(JSON.parse(JSON.stringify(assessment))).toEqual(assessment);
    expect(assessment.asOf).toBe(new Date(DEMO_END_MS).toISOString());
  });

  it("does not modify its input and gives the same result twice", () => {
    // STYLE.md: inputs never mutated; no hidden state
    const frozen = deepFreeze(structuredClone(input));
    const first = assessAsset(frozen);
    expect(assessAsset(structuredClone(input))).toEqual(first);
  });

  it("aggregates hourly periods into the same assessment as the equivalent daily periods", () => {
    // the daily helper averages the same usable hours, in the same order
    const hourly = assessAsset({ ...input, periods: hourlyPeriods(simulation) });
    const daily = assessAsset(input);
    expect(hourly.foulingResistance.current).toBeCloseTo(daily.foulingResistance.current as number, 12);
    expect(hourly.forecasts.duty.p50Ms).toBe(daily.forecasts.duty.p50Ms);
  });

  it("ignores periods and cleanings after asOf", () => {
    const asOfMs = DEMO_END_MS - 200 * DAY_MS;
    const assessment = assessAsset({ ...input, asOfMs });
    const last = assessment.foulingResistance.series[assessment.foulingResistance.series.length - 1];
    expect((last?.timeMs as number) <= asOfMs + DAY_MS / 2).toBe(true);
    expect(assessment.cycles.every((cycle) => Date.parse(cycle.start) <= asOfMs)).toBe(true);
  });

  it("reports the duty loss at reference conditions and the energy lost in the current cycle", () => {
    const assessment = assessAsset(input);
    const duty = assessment.referenceDuty;
    expect(duty.lossW).toBeCloseTo(duty.cleanW - (duty.currentW as number), 6);
    expect(duty.lossW as number).toBeGreaterThan(0);
    expect(duty.lossEnergyJ as number).toBeGreaterThan(0);
    // the energy cannot exceed the current loss rate times the cycle length (the loss grows over the cycle)
    const cycleDays = (DEMO_END_MS - Date.parse(assessment.cycles[assessment.cycles.length - 1]?.start as string)) / DAY_MS;
    expect(duty.lossEnergyJ as number).toBeLessThan((duty.lossW as number) * cycleDays * 86_400);
    expect(assessment.currentObservedU?.percentOfClean).toBeLessThan(100);
  });

  it("forecasts outlet limits: a minimum cold outlet (heater) and a maximum hot outlet (cooler)", () => {
    const base = assessAsset(input);
    const conditions = {
      arrangement: input.asset.arrangement,
      areaM2: input.asset.areaM2,
      hotHeatCapacity: input.asset.hotHeatCapacity,
      coldHeatCapacity: input.asset.coldHeatCapacity,
      reference: input.asset.reference,
      cleanResistanceM2KPerW: base.cleanModel?.cleanResistanceAtReferenceM2KPerW as number,
    };
    const now = referenceRating(conditions, base.foulingResistance.current as number);
    // limits 1 K beyond today's outlets at reference conditions: not yet broken, so they lie ahead
    const cold = assessAsset({ ...input, asset: { ...input.asset, minimumOutlet: { stream: "cold", temperatureK: now.coldOutletK - 1 } } });
    expect(cold.forecasts.minimumOutlet?.criterion).toBe("cold-outlet");
    expect(cold.forecasts.minimumOutlet?.status).toBe("ahead");
    expect(cold.forecasts.minimumOutlet?.criticalFoulingM2KPerW as number).toBeGreaterThan(base.foulingResistance.current as number);
    const hot = assessAsset({ ...input, asset: { ...input.asset, minimumOutlet: { stream: "hot", temperatureK: now.hotOutletK + 1 } } });
    expect(hot.forecasts.minimumOutlet?.criterion).toBe("hot-outlet");
    expect(hot.forecasts.minimumOutlet?.status).toBe("ahead");
    // limits already passed today: already crossed
    const passed = assessAsset({ ...input, asset: { ...input.asset, minimumOutlet: { stream: "cold", temperatureK: now.coldOutletK + 1 } } });
    expect(passed.forecasts.minimumOutlet?.status).toBe("already-crossed");
    expect(base.forecasts.minimumOutlet).toBeNull();
  });

  it("falls back to the data sheet without usable periods", () => {
    const assessment = assessAsset({ ...input, periods: [] });
    expect(assessment.cleanModel).toBeNull();
    expect(assessment.trend).toBeNull();
    expect(assessment.forecasts.duty.status).toBe("no-trend");
    expect(allFinite(assessment)).toBe(true);
  });

  it("rejects a non-positive horizon with a message", () => {
    expect(() => assessAsset({ ...input, options: { horizonDays: 0 } })).toThrow("assessAsset: horizonDays must be a positive number of days, got 0");
  });
});

describe("dailyPeriods", () => {
  it("averages the usable periods of each UTC day", () => {
    const base = { hotInK: 400, hotOutK: 350, coldInK: 300, coldOutK: 320, hotFlowKgPerS: 10, coldFlowKgPerS: 12, dutyW: 1e6, usable: true };
    const days = aggregateDays([
      { ...base, startMs: 0 },
      { ...base, startMs: 3_600_000, hotInK: 402, dutyW: 1.2e6 },
      { ...base, startMs: 7_200_000, hotInK: 999, usable: false },
      { ...base, startMs: DAY_MS },
    ]);
    expect(days).toHaveLength(2);
    expect(days[0]?.hotInK).toBe(401);
    expect(days[0]?.dutyW).toBeCloseTo(1.1e6, 6);
    expect(days[1]?.startMs).toBe(DAY_MS);
  });
});

describe("cycleOrigins", () => {
  it("starts the first cycle at the last cleaning before the data and each later one at a cleaning", () => {
    const result = cycleOrigins(100, [{ timeMs: 50 }, { timeMs: 20 }, { timeMs: 300 }, { timeMs: 900 }], 500);
    expect(result).toEqual({ originsMs: [50, 300], firstIsRecorded: true });
    expect(cycleOrigins(100, [], 500)).toEqual({ originsMs: [100], firstIsRecorded: false });
  });
});

describe("cleaningEffectiveness", () => {
  it("compares the medians of the weeks before and after a cleaning", () => {
    // definition (Rf_b − Rf_a)/Rf_b with medians: before 1e-3, after 2e-4 → 0.8
    const times = [1, 2, 3, 4, 10, 11, 12, 13].map((day) => day * DAY_MS);
    const fouling = [0.99e-3, 1e-3, 1.01e-3, 1e-3, 2e-4, 1.9e-4, 2.1e-4, 2e-4];
    const result = cleaningEffectiveness(times, fouling, 9 * DAY_MS, 7);
    expect(result?.value).toBeCloseTo(0.8, 12);
    expect(result?.pointsBefore).toBe(4);
    expect(result?.pointsAfter).toBe(4);
    expect(result?.standardError as number).toBeGreaterThan(0);
    expect(cleaningEffectiveness(times.slice(0, 5), fouling.slice(0, 5), 9 * DAY_MS, 7)).toBeNull();
  });
});
