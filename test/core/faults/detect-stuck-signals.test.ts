import { describe, expect, it } from "vitest";
import { detectStuckSignals } from "../../../lib/core/faults";
import type { ExchangerModel, InstrumentUncertainties, ReadingColumns } from "../../../lib/core/screening";
import { seededRandom } from "../../../lib/core/simulate";

const HOUR_MS = 3_600_000;
const MODEL: ExchangerModel = {
  arrangement: { kind: "counterflow" },
  areaM2: 10,
  hotHeatCapacity: { kind: "constant", jPerKgK: 2000 },
  coldHeatCapacity: { kind: "constant", jPerKgK: 4181 },
  instruments: [
    { role: "hotIn", tag: "TI-1A", standardUncertainty: 0.5 },
    { role: "hotOut", tag: "TI-1B", standardUncertainty: 0.5 },
    { role: "coldIn", tag: "TI-1C", standardUncertainty: 0.5 },
    { role: "coldOut", tag: "TI-1D", standardUncertainty: 0.5 },
    { role: "hotFlow", tag: "FI-1A", standardUncertainty: 0.2 },
    { role: "coldFlow", tag: "FI-1B", standardUncertainty: 0.4 },
  ],
};
const SIGMA: InstrumentUncertainties = { hotIn: 0.5, hotOut: 0.5, coldIn: 0.5, coldOut: 0.5, hotFlow: 0.02, coldFlow: 0.02, referenceFlows: { hotKgPerS: 10, coldKgPerS: 20 } };

function noisyColumns(count: number, seed: number): ReadingColumns {
  const random = seededRandom(seed);
  const series = (base: number, sigma: number) => Float64Array.from({ length: count }, () => Math.round((base + sigma * random.normal()) * 100) / 100);
  return {
    timeMs: Float64Array.from({ length: count }, (_, index) => index * HOUR_MS),
    hotInK: series(420, 0.5),
    hotOutK: series(360, 0.5),
    coldInK: series(300, 0.5),
    coldOutK: series(320, 0.5),
    hotFlowKgPerS: series(10, 0.2),
    coldFlowKgPerS: series(20, 0.4),
  };
}

describe("detectStuckSignals", () => {
  it("raises a stuck alert from the first frozen reading to the first changed one", () => {
    const columns = noisyColumns(200, 1);
    const frozen = columns.coldFlowKgPerS[59] as number;
    columns.coldFlowKgPerS.fill(frozen, 60, 120);
    columns.coldFlowKgPerS[80] = Number.NaN;
    const alerts = detectStuckSignals(columns, MODEL, SIGMA);
    expect(alerts).toHaveLength(1);
    const [alert] = alerts;
    // simulation with known truth: frozen from sample 60 (repeats the reading of 59) to sample 119; a gap does not break it
    expect(alert).toMatchObject({ role: "coldFlow", instrumentTag: "FI-1B", kind: "stuck", startMs: 60 * HOUR_MS, endMs: 120 * HOUR_MS, size: frozen, sizeUnit: "kg/s" });
    // definition: detected at the 12th repeated reading (sample 71)
    expect(alert?.detectedMs).toBe(71 * HOUR_MS);
    expect(alert?.evidence).toContain("frozen at");
  });

  it("keeps an alert open when the reading is still frozen at the end, and ignores short runs", () => {
    const columns = noisyColumns(100, 2);
    columns.hotInK.fill(columns.hotInK[89] as number, 90, 100);
    columns.coldOutK.fill(columns.coldOutK[19] as number, 20, 30);
    // definition: 10 repeats (< 12) on coldOut are not an alert; hotIn repeats only 10 times too
    expect(detectStuckSignals(columns, MODEL, SIGMA)).toHaveLength(0);
    columns.hotInK.fill(columns.hotInK[79] as number, 80, 100);
    const [alert] = detectStuckSignals(columns, MODEL, SIGMA);
    expect(alert).toMatchObject({ role: "hotIn", endMs: null, sizeUnit: "K" });
  });

  it("does not alert when the whole plant is idle (nothing else moves) or outside the samples considered", () => {
    const columns = noisyColumns(100, 3);
    for (const column of [columns.hotInK, columns.hotOutK, columns.coldInK, columns.coldOutK, columns.hotFlowKgPerS, columns.coldFlowKgPerS]) column.fill(column[39] as number, 40, 70);
    // common practice: a historian that stops updating every tag is an outage, not a stuck instrument
    expect(detectStuckSignals(columns, MODEL, SIGMA)).toHaveLength(0);
    const parked = noisyColumns(100, 4);
    parked.hotFlowKgPerS.fill(0.03, 40, 70);
    const consider = new Uint8Array(100).fill(1).fill(0, 40, 70);
    expect(detectStuckSignals(parked, MODEL, SIGMA)).toHaveLength(1);
    // definition: samples outside `consider` (a shutdown) are passed over
    expect(detectStuckSignals(parked, MODEL, SIGMA, { consider })).toHaveLength(0);
  });
});
