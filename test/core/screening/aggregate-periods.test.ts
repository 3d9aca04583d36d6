import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { aggregatePeriods, EXCLUSION_REASONS, type ExchangerModel, type ReadingColumns, type SampleFlags } from "../../../lib/core/screening";
import { heatBalance } from "../../../lib/core/thermal";

const HOUR_MS = 3_600_000;
const MODEL: ExchangerModel = {
  arrangement: { kind: "counterflow" },
  areaM2: 50,
  hotHeatCapacity: { kind: "linear", interceptJPerKgK: 800, slopeJPerKgK2: 3.5 },
  coldHeatCapacity: { kind: "constant", jPerKgK: 4181 },
  instruments: [
    { role: "hotIn", tag: "TI-1", standardUncertainty: 0.5 },
    { role: "hotOut", tag: "TI-2", standardUncertainty: 0.5 },
    { role: "coldIn", tag: "TI-3", standardUncertainty: 0.3 },
    { role: "coldOut", tag: "TI-4", standardUncertainty: 0.3 },
    { role: "hotFlow", tag: "FI-1", standardUncertainty: 0.2 },
    { role: "coldFlow", tag: "FI-2", standardUncertainty: 0.4 },
  ],
};

function columnsOf(count: number, stepMs: number, startMs = 0): ReadingColumns {
  const make = (base: number, swing: number) => Float64Array.from({ length: count }, (_, index) => base + swing * Math.sin(index));
  return {
    timeMs: Float64Array.from({ length: count }, (_, index) => startMs + index * stepMs),
    hotInK: make(420, 1),
    hotOutK: make(360, 1),
    coldInK: make(300, 0.5),
    coldOutK: make(320, 0.5),
    hotFlowKgPerS: make(10, 0.1),
    coldFlowKgPerS: make(16, 0.1),
  };
}

function noFlags(count: number): SampleFlags {
  return {
    missing: new Uint8Array(count),
    transient: new Uint8Array(count),
    outlier: new Uint8Array(count),
    impossible: new Uint8Array(count),
    fault: new Uint16Array(count),
    faultLabels: [],
  };
}

describe("aggregatePeriods", () => {
  it("counts every sample once, under its first reason, so the totals add up (property)", () => {
    fc.assert(
      fc.property(
        fc.array(fc.record({ missing: fc.boolean(), transient: fc.boolean(), outlier: fc.boolean(), fault: fc.boolean(), impossible: fc.boolean() }), { minLength: 1, maxLength: 200 }),
        fc.constantFrom<3600 | 86400>(3600, 86400),
        fc.integer({ min: 1, max: 4 }),
        (marks, periodS, minimumSamples) => {
          const count = marks.length;
          const columns = columnsOf(count, 15 * 60_000);
          const flags = noFlags(count);
          flags.faultLabels = ["coldOut drift"];
          marks.forEach((mark, index) => {
            flags.missing[index] = mark.missing ? 1 : 0;
            flags.transient[index] = mark.transient ? 1 : 0;
            flags.outlier[index] = mark.outlier ? 1 : 0;
            flags.fault[index] = mark.fault ? 1 : 0;
            flags.impossible[index] = mark.impossible ? 1 : 0;
          });
          const periods = aggregatePeriods(columns, flags, MODEL, { periodS, minimumSamples });
          let total = 0;
          for (const period of periods) {
            const excluded = EXCLUSION_REASONS.reduce((sum, reason) => sum + period.excluded[reason], 0);
            // definition: each sample counted once, used or under one reason
            if (period.samplesTotal !== period.samplesUsed + excluded) return false;
            if (period.usable !== (period.samplesUsed >= minimumSamples)) return false;
            if ((period.reason === null) !== period.usable) return false;
            total += period.samplesTotal;
          }
          const expectedUsed = marks.filter((mark) => !mark.missing && !mark.transient && !mark.outlier && !mark.fault && !mark.impossible).length;
          const expectedMissing = marks.filter((mark) => mark.missing).length;
          return (
            total === count &&
            periods.reduce((sum, period) => sum + period.samplesUsed, 0) === expectedUsed &&
            periods.reduce((sum, period) => sum + period.excluded.missing, 0) === expectedMissing
          );
        },
      ),
      { numRuns: 200 },
    );
  });

  it("applies the precedence missing, transient, outlier, fault, impossible", () => {
    const columns = columnsOf(5, HOUR_MS / 5);
    const flags = noFlags(5);
    flags.faultLabels = ["hotFlow scale"];
    flags.transient.fill(1, 0, 2);
    flags.outlier.fill(1, 1, 3);
    flags.fault.fill(1, 2, 4);
    flags.impossible.fill(1, 3, 5);
    const [period] = aggregatePeriods(columns, flags, MODEL, { periodS: 3600, minimumSamples: 1 });
    // definition (EXCLUSION_REASONS): sample 1 is transient (not outlier), 2 outlier (not fault), 3 fault (not impossible)
    expect(period?.excluded).toEqual({ missing: 0, transient: 2, outlier: 1, fault: 1, impossible: 1 });
    expect(period?.reason).toBe("too few usable samples (0 of 5, need 1): 2 transient, 1 outlier, 1 fault, 1 impossible");
  });

  it("names the instrument fault when it excludes most of a period", () => {
    const columns = columnsOf(24, HOUR_MS);
    const flags = noFlags(24);
    flags.faultLabels = ["coldOut drift"];
    flags.fault.fill(1, 0, 20);
    const [day] = aggregatePeriods(columns, flags, MODEL, { periodS: 86400 });
    // definition: half a full day of hourly samples (12) is the default minimum
    expect(day?.usable).toBe(false);
    expect(day?.reason).toBe("instrument fault: coldOut drift (20 of 24 samples)");
  });

  it("averages the used samples, computes their duties and aligns periods to the origin", () => {
    const columns = columnsOf(48, HOUR_MS, 1_800_000);
    const flags = noFlags(48);
    flags.transient[0] = 1;
    const periods = aggregatePeriods(columns, flags, MODEL, { periodS: 86400, originMs: 1_800_000 });
    // definition: two whole days starting at the origin
    expect(periods.map((period) => period.startMs)).toEqual([1_800_000, 1_800_000 + 24 * HOUR_MS]);
    const first = periods[0];
    if (first === undefined) throw new Error("no period");
    const mean = (values: Float64Array) => values.slice(1, 24).reduce((sum, value) => sum + value, 0) / 23;
    // definition: arithmetic means of the 23 used samples
    expect(first.means.hotInK).toBeCloseTo(mean(columns.hotInK), 10);
    expect(first.means.coldFlowKgPerS).toBeCloseTo(mean(columns.coldFlowKgPerS), 10);
    const balance = heatBalance({
      hot: { massFlowKgPerS: mean(columns.hotFlowKgPerS), heatCapacity: MODEL.hotHeatCapacity, inletK: mean(columns.hotInK), outletK: mean(columns.hotOutK) },
      cold: { massFlowKgPerS: mean(columns.coldFlowKgPerS), heatCapacity: MODEL.coldHeatCapacity, inletK: mean(columns.coldInK), outletK: mean(columns.coldOutK) },
    });
    // thermal core heatBalance of the means (same computation)
    expect(first.hotDutyW).toBeCloseTo(balance.hotDutyW, 6);
    expect(first.closure).toBeCloseTo(balance.closure, 12);
  });

  it("gives null means and duties, not NaN, for a period without used samples", () => {
    const columns = columnsOf(2, HOUR_MS);
    const flags = noFlags(2);
    flags.missing.fill(1);
    const periods = aggregatePeriods(columns, flags, MODEL);
    // definition: serialisable output
    expect(periods[0]?.means.hotInK).toBeNull();
    expect(periods[0]?.hotDutyW).toBeNull();
    expect(JSON.parse(JSON.stringify(periods))).toEqual(periods);
  });

  it("rejects other period lengths", () => {
    expect(() => aggregatePeriods(columnsOf(2, HOUR_MS), noFlags(2), MODEL, { periodS: 600 as 3600 })).toThrow("period must be 3600 or 86400 s, got 600");
  });
});
