import fc from "fast-check";
import { beforeAll, describe, expect, it } from "vitest";
import { assessDataQuality, type DataQualityAssessment } from "../../../lib/core/data-quality";
import { exchangerBalance } from "../../../lib/core/reconcile";
import { EXCLUSION_REASONS, readingColumnsFromRows, type ExchangerModel, type ReadingColumns } from "../../../lib/core/screening";
import { seededRandom } from "../../../lib/core/simulate";
import { rate } from "../../../lib/core/thermal";
import { simulateDemoFleet } from "../../../lib/demo";
import { exchangerModelFromSpec } from "./exchanger-model-from-spec";

/** Every number in a value, recursively (to prove no NaN or infinity leaks into the output). */
function numbersIn(value: unknown, found: number[] = []): number[] {
  if (typeof value === "number") found.push(value);
  else if (Array.isArray(value)) for (const item of value) numbersIn(item, found);
  else if (typeof value === "object" && value !== null) for (const item of Object.values(value)) numbersIn(item, found);
  return found;
}

function copyColumns(columns: ReadingColumns): ReadingColumns {
  return {
    timeMs: Float64Array.from(columns.timeMs),
    hotInK: Float64Array.from(columns.hotInK),
    hotOutK: Float64Array.from(columns.hotOutK),
    coldInK: Float64Array.from(columns.coldInK),
    coldOutK: Float64Array.from(columns.coldOutK),
    hotFlowKgPerS: Float64Array.from(columns.hotFlowKgPerS),
    coldFlowKgPerS: Float64Array.from(columns.coldFlowKgPerS),
  };
}

function deepFreeze<T>(value: T): T {
  if (typeof value === "object" && value !== null && !ArrayBuffer.isView(value)) {
    for (const inner of Object.values(value)) deepFreeze(inner);
    Object.freeze(value);
  }
  return value;
}

function checkCountsAndValues(assessment: DataQualityAssessment, model: ExchangerModel): void {
  const { sampleCounts } = assessment;
  // definition: total = used + Σ excluded, over all samples and per period
  expect(sampleCounts.used + EXCLUSION_REASONS.reduce((sum, reason) => sum + sampleCounts.excluded[reason], 0)).toBe(sampleCounts.total);
  let periodTotal = 0;
  for (const period of assessment.periods) {
    expect(period.samplesUsed + EXCLUSION_REASONS.reduce((sum, reason) => sum + period.excluded[reason], 0)).toBe(period.samplesTotal);
    periodTotal += period.samplesTotal;
    if (period.reconciled !== null) {
      const balance = exchangerBalance(period.reconciled, model.hotHeatCapacity, model.coldHeatCapacity);
      // brief: reconciled values satisfy the balance (1e-9 of the duty)
      expect(Math.abs(balance.residualW)).toBeLessThanOrEqual(1e-9 * period.reconciled.dutyW);
      expect(period.usable).toBe(true);
    }
    if (!period.usable) expect(period.reconciled).toBeNull();
  }
  expect(periodTotal).toBe(sampleCounts.total);
  // definition: serialisable, no NaN or infinity anywhere
  expect(numbersIn(assessment).every(Number.isFinite)).toBe(true);
  expect(JSON.parse(JSON.stringify(assessment))).toEqual(assessment);
}

describe("assessDataQuality on a demo exchanger (E-3104: stuck meter, cleanings, spikes, gaps)", () => {
  let columns: ReadingColumns;
  let model: ExchangerModel;
  let hourly: DataQualityAssessment;
  beforeAll(() => {
    const [simulation] = simulateDemoFleet({ assets: ["E-3104"] });
    if (simulation === undefined) throw new Error("no simulation");
    columns = readingColumnsFromRows(simulation.result.readings);
    model = exchangerModelFromSpec(simulation.asset.spec);
    hourly = assessDataQuality(columns, model);
  });

  it("accounts for every sample, reconciles usable hours onto the balance and outputs no NaN", () => {
    checkCountsAndValues(hourly, model);
    const usable = hourly.periods.filter((period) => period.usable);
    // simulation with known truth: most hours of a running exchanger are usable (measured 79 %)
    expect(usable.length / hourly.periods.length).toBeGreaterThan(0.7);
    // FIELD-NOTES §6: χ²₀.₉₅(1) = 3.8415
    expect(usable[0]?.globalTestCritical).toBeCloseTo(3.8415, 4);
    const rejected = usable.filter((period) => (period.globalTest ?? 0) > (period.globalTestCritical ?? Infinity)).length;
    // simulation with known truth: outside the stuck-meter weeks (excluded) the global test rejects about α of the hours
    expect(rejected / usable.length).toBeLessThan(0.1);
  });

  it("resolves and reports its settings (historian settings for hourly data)", () => {
    // lib/core/data-quality: hourly data → flows only, R < 3; half a period (1 sample) for an hourly period
    expect(hourly.settings).toMatchObject({ periodS: 3600, alpha: 0.05, minimumSamples: 1, nominalStepS: 3600, steadyState: { signals: ["hotFlow", "coldFlow"], criticalValue: 3 } });
  });

  it("aggregates days as well, with the same accounting", () => {
    const daily = assessDataQuality(columns, model, { periodS: 86400, alpha: 0.01 });
    checkCountsAndValues(daily, model);
    // definition: 12 of 24 hourly samples make a usable day
    expect(daily.settings.minimumSamples).toBe(12);
    // scipy.stats.chi2.ppf(0.99, 1) = 6.634896601021214 (from memory)
    expect(daily.periods.find((period) => period.usable)?.globalTestCritical).toBeCloseTo(6.6349, 4);
    expect(daily.alerts).toEqual(hourly.alerts);
  });

  it("leaves its inputs unchanged", () => {
    const before = copyColumns(columns);
    const frozenModel = deepFreeze(structuredClone(model));
    const again = assessDataQuality(columns, frozenModel);
    // STYLE.md: pure functions, inputs never mutated; same input, same output
    expect(columns).toEqual(before);
    expect(again).toEqual(hourly);
  });
});

describe("assessDataQuality on random data (property)", () => {
  const model: ExchangerModel = {
    arrangement: { kind: "shell-and-tube", shells: 1 },
    areaM2: 80,
    hotHeatCapacity: { kind: "linear", interceptJPerKgK: 760, slopeJPerKgK2: 3.7 },
    coldHeatCapacity: { kind: "constant", jPerKgK: 4181 },
    instruments: [
      { role: "hotIn", tag: "TI-1A", standardUncertainty: 0.5 },
      { role: "hotOut", tag: "TI-1B", standardUncertainty: 0.5 },
      { role: "coldIn", tag: "TI-1C", standardUncertainty: 0.3 },
      { role: "coldOut", tag: "TI-1D", standardUncertainty: 0.3 },
      { role: "hotFlow", tag: "FI-1A", standardUncertainty: 0.15 },
      { role: "coldFlow", tag: "FI-1B", standardUncertainty: 0.3 },
    ],
  };
  const rated = rate({
    uWPerM2K: 350,
    areaM2: 80,
    arrangement: model.arrangement,
    hot: { massFlowKgPerS: 10, heatCapacity: model.hotHeatCapacity, inletK: 450 },
    cold: { massFlowKgPerS: 15, heatCapacity: model.coldHeatCapacity, inletK: 300 },
  });

  it("always accounts for every sample and never outputs NaN, whatever is missing, spiky or impossible", () => {
    fc.assert(
      fc.property(
        fc.integer({ min: 0, max: 2 ** 31 - 1 }),
        fc.integer({ min: 1, max: 120 }),
        fc.double({ min: 0, max: 0.3, noNaN: true }),
        fc.constantFrom(60_000, 3_600_000),
        (seed, count, badShare, stepMs) => {
          const random = seededRandom(seed);
          const point = [450, rated.hotOutletK, 300, rated.coldOutletK, 10, 15];
          const sigma = [0.5, 0.5, 0.3, 0.3, 0.15, 0.3];
          const rows = Array.from({ length: count }, (_, index) => {
            const value = (k: number): number | null => {
              const draw = random.uniform();
              if (draw < badShare / 3) return null;
              if (draw < (2 * badShare) / 3) return (point[k] as number) * (random.chance(0.5) ? 1.5 : 0.5);
              return (point[k] as number) + (sigma[k] as number) * random.normal();
            };
            return { timeMs: index * stepMs, hotInK: value(0), hotOutK: value(1), coldInK: value(2), coldOutK: value(3), hotFlowKgPerS: value(4), coldFlowKgPerS: value(5) };
          });
          const assessment = assessDataQuality(readingColumnsFromRows(rows), model, { periodS: stepMs === 60_000 ? 3600 : 86400 });
          const { sampleCounts } = assessment;
          const total = sampleCounts.used + EXCLUSION_REASONS.reduce((sum, reason) => sum + sampleCounts.excluded[reason], 0);
          const periodTotal = assessment.periods.reduce((sum, period) => sum + period.samplesTotal, 0);
          // definition: every sample counted once; no NaN in the output
          return total === count && periodTotal === count && numbersIn(assessment).every(Number.isFinite);
        },
      ),
      { numRuns: 40 },
    );
  });

  it("uses the published steady-state settings for one-minute data", () => {
    const rows = Array.from({ length: 200 }, (_, index) => ({
      timeMs: index * 60_000,
      hotInK: 450,
      hotOutK: rated.hotOutletK,
      coldInK: 300,
      coldOutK: rated.coldOutletK,
      hotFlowKgPerS: 10,
      coldFlowKgPerS: 15,
    }));
    const assessment = assessDataQuality(readingColumnsFromRows(rows), model);
    // FIELD-NOTES §6 [V]: inlet temperatures and flows, R < 2; 30 of 60 one-minute samples make a usable hour
    expect(assessment.settings.steadyState).toMatchObject({ signals: ["hotIn", "coldIn", "hotFlow", "coldFlow"], criticalValue: 2 });
    expect(assessment.settings.minimumSamples).toBe(30);
  });

  it("rejects invalid options and a model without its instruments", () => {
    const columns = readingColumnsFromRows([{ timeMs: 0, hotInK: 450, hotOutK: 400, coldInK: 300, coldOutK: 320, hotFlowKgPerS: 10, coldFlowKgPerS: 15 }]);
    expect(() => assessDataQuality(columns, model, { alpha: 1.5 })).toThrow("alpha must be in (0, 1), got 1.5");
    expect(() => assessDataQuality(columns, { ...model, instruments: model.instruments.slice(1) })).toThrow("exchanger model has no hotIn instrument");
  });
});
