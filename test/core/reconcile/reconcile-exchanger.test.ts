import { beforeAll, describe, expect, it } from "vitest";
import { exchangerBalance, reconcileExchanger, type ExchangerReconciliationInput } from "../../../lib/core/reconcile";
import type { InstrumentUncertainties } from "../../../lib/core/screening";
import { seededRandom, type TruthPoint } from "../../../lib/core/simulate";
import { simulateDemoFleet } from "../../../lib/demo";

const UNCERTAINTIES: InstrumentUncertainties = {
  hotIn: 0.4,
  hotOut: 0.4,
  coldIn: 0.4,
  coldOut: 0.4,
  hotFlow: 0.015,
  coldFlow: 0.015,
  referenceFlows: { hotKgPerS: 13, coldKgPerS: 105 },
};

let truth: TruthPoint[];
let input: (point: TruthPoint) => ExchangerReconciliationInput;

beforeAll(() => {
  // E-1101 (crude / kerosene, linear cp on both sides), 3 months of hourly truth
  const [simulation] = simulateDemoFleet({ assets: ["E-1101"], endMs: Date.UTC(2024, 11, 1) });
  if (simulation === undefined) throw new Error("no simulation");
  truth = simulation.result.truth.filter((point) => point.mode === "normal");
  const spec = simulation.asset.spec;
  input = (point) => ({
    measured: point,
    uncertainties: UNCERTAINTIES,
    hotHeatCapacity: spec.hotStream.heatCapacity,
    coldHeatCapacity: spec.coldStream.heatCapacity,
  });
});

function noisy(point: TruthPoint, random: ReturnType<typeof seededRandom>): TruthPoint {
  return {
    ...point,
    hotInK: point.hotInK + UNCERTAINTIES.hotIn * random.normal(),
    hotOutK: point.hotOutK + UNCERTAINTIES.hotOut * random.normal(),
    coldInK: point.coldInK + UNCERTAINTIES.coldIn * random.normal(),
    coldOutK: point.coldOutK + UNCERTAINTIES.coldOut * random.normal(),
    hotFlowKgPerS: point.hotFlowKgPerS * (1 + UNCERTAINTIES.hotFlow * random.normal()),
    coldFlowKgPerS: point.coldFlowKgPerS * (1 + UNCERTAINTIES.coldFlow * random.normal()),
  };
}

describe("reconcileExchanger", () => {
  it("returns values that close the energy balance to 1e-9 of the duty", () => {
    const random = seededRandom(101);
    for (const point of truth.slice(0, 300)) {
      const result = reconcileExchanger(input(noisy(point, random)));
      const check = exchangerBalance(result.reconciled, input(point).hotHeatCapacity, input(point).coldHeatCapacity);
      // brief: g(x̂) = 0 to 1e-9 relative
      expect(Math.abs(check.residualW) / result.dutyW).toBeLessThan(1e-9);
      expect(result.iterations).toBeLessThan(10);
    }
  });

  it("changes nothing when the data are noise-free", () => {
    for (const point of truth.slice(0, 50)) {
      const result = reconcileExchanger(input(point));
      // simulation with known truth: the simulator balances hot and cold duty to its 1e-9 K iteration tolerance
      expect(Math.abs(result.adjustments.coldOutK)).toBeLessThan(1e-7);
      expect(Math.abs(result.adjustments.hotFlowKgPerS) / point.hotFlowKgPerS).toBeLessThan(1e-9);
      expect(result.globalTest).toBeLessThan(1e-12);
      expect(result.dutyW / point.dutyW - 1).toBeCloseTo(0, 8);
    }
  });

  it("rejects at about α on noisy data without gross errors", () => {
    const random = seededRandom(202);
    const trials = 2000;
    let rejections = 0;
    for (let trial = 0; trial < trials; trial += 1) {
      const point = truth[trial % truth.length] as TruthPoint;
      if (reconcileExchanger(input(noisy(point, random))).globalTestRejects) rejections += 1;
    }
    const rate = rejections / trials;
    console.info(`global test rejection rate without gross errors: ${rate.toFixed(4)} (α = 0.05, ${trials} trials)`);
    // simulation with known truth: Binomial(2000, 0.05) has σ = 0.0049; ±3.5σ gives [0.033, 0.067]
    expect(rate).toBeGreaterThan(0.033);
    expect(rate).toBeLessThan(0.067);
  });

  it("cannot name the instrument: all measurement-test statistics are equal (single constraint)", () => {
    const random = seededRandom(303);
    const point = noisy(truth[10] as TruthPoint, random);
    const result = reconcileExchanger(input({ ...point, coldOutK: point.coldOutK + 3 }));
    const tests = result.measurementTests.filter((value): value is number => value !== null);
    expect(tests).toHaveLength(6);
    // FIELD-NOTES §6: with one constraint z_i = √γ for every measurement
    for (const z of tests) expect(z / Math.sqrt(result.globalTest)).toBeCloseTo(1, 6);
    expect(result.globalTestRejects).toBe(true);
  });

  it("leaves its input unchanged", () => {
    const frozen = Object.freeze({ ...input(truth[0] as TruthPoint), measured: Object.freeze({ ...(truth[0] as TruthPoint) }) });
    expect(() => reconcileExchanger(frozen)).not.toThrow();
  });
});
